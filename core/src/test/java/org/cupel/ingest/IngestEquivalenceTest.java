package org.cupel.ingest;

import java.io.IOException;
import java.nio.file.Path;
import org.cupel.demo.DemoOnDisk;
import org.cupel.testing.GoldenText;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The column-wise reader loads what the reader before it did (commit ef122a1), against golden texts under
 * testdata/golden/: the full {@link ProjectDump} of the messy fixture project (every row and cell), first
 * written by that reader; and the {@link ProjectDump#summary} of the default demo project (accounts and
 * exceptions in full, batches by role, cells by class with exact sums), written when the check of the
 * demo's full dump (1,053,934 characters) by SHA-256 digest was replaced, from an implementation whose dump
 * still gave the old reader's digest.
 *
 * <p>Rewrite after an intended change of ingest with
 * {@code mvn -B -o -pl core test -Dtest=IngestEquivalenceTest -Dcupel.golden.update=true}, then review
 * {@code git diff testdata/golden}.
 */
class IngestEquivalenceTest {
    private static final Path MESSY = Path.of(System.getProperty("cupel.testdata"), "fixtures", "ingest",
            "messy-project");

    @TempDir
    Path dir;

    @Test
    void messyProjectLoadsAsBefore() {
        GoldenText.assertMatches("ingest-messy-project.txt", ProjectDump.dump(ProjectLoader.inspect(MESSY)));
    }

    @Test
    void defaultDemoLoadsAsBefore() throws IOException {
        DemoOnDisk.write(dir);
        GoldenText.assertMatches("ingest-default-demo.txt", ProjectDump.summary(ProjectLoader.load(dir)));
    }
}
