package org.cupel.ingest;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.cupel.demo.DemoOnDisk;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The column-wise reader loads exactly what the reader before it did (commit ef122a1): the full
 * {@link ProjectDump} of the messy fixture project, and the digest of the dump of the default demo
 * project, both written by that reader.
 */
class IngestEquivalenceTest {
    private static final Path FIXTURES = Path.of(System.getProperty("cupel.testdata"), "fixtures", "ingest");
    /** SHA-256 of the old reader's dump of the default demo (1,053,934 characters). */
    private static final String DEFAULT_DEMO_DIGEST = "f95e24191746db0f75fc4e70443ec721a64c6c218a91cfa0b60e633b09b579aa";

    @TempDir
    Path dir;

    @Test
    void messyProjectLoadsAsBefore() throws IOException {
        String expected = Files.readString(FIXTURES.resolve("messy-project.dump.txt"), StandardCharsets.UTF_8);
        assertEquals(expected, ProjectDump.dump(ProjectLoader.inspect(FIXTURES.resolve("messy-project"))));
    }

    @Test
    void defaultDemoLoadsAsBefore() throws IOException {
        DemoOnDisk.write(dir);
        String dump = ProjectDump.dump(ProjectLoader.load(dir));
        assertEquals(1_053_934, dump.length());
        assertEquals(DEFAULT_DEMO_DIGEST, ProjectDump.digest(dump));
    }
}
