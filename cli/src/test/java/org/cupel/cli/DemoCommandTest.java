package org.cupel.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class DemoCommandTest {

    @TempDir
    Path parent;

    private List<String> siblings() throws IOException {
        try (Stream<Path> s = Files.list(parent)) {
            return s.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }

    @Test
    void writesTheProjectAndSummarisesThePlantedProblems() throws IOException {
        Path target = parent.resolve("demo-project");
        CliRun r = CliRun.run("demo", target.toString());
        assertEquals(CupelCommand.OK, r.code(), r.err());
        assertTrue(r.out().contains("25 lab batches"), r.out());
        assertTrue(r.out().contains("CRM_SWAP"), r.out());
        assertTrue(Files.isRegularFile(target.resolve("register.csv")));
        assertTrue(Files.isRegularFile(target.resolve("crm-catalog.csv")));
        assertTrue(Files.isRegularFile(target.resolve("lab/OAL-00001.csv")));
        assertTrue(Files.isRegularFile(target.resolve("testwork/smelts.csv")));
        assertEquals(List.of("demo-project"), siblings(), "no temporary folder left behind");
    }

    @Test
    void refusesANonEmptyFolderWithoutForceAndReplacesItWithForce() throws IOException {
        Path target = parent.resolve("p");
        Files.createDirectories(target);
        Files.writeString(target.resolve("notes.txt"), "mine");
        CliRun refused = CliRun.run("demo", target.toString());
        assertEquals(CupelCommand.INPUT_ERROR, refused.code());
        assertTrue(refused.err().contains("--force"), refused.err());
        assertTrue(Files.exists(target.resolve("notes.txt")));

        CliRun forced = CliRun.run("demo", target.toString(), "--force", "--seed", "5");
        assertEquals(CupelCommand.OK, forced.code(), forced.err());
        assertFalse(Files.exists(target.resolve("notes.txt")));
        assertTrue(Files.exists(target.resolve("register.csv")));
        assertEquals(List.of("p"), siblings());
    }

    @Test
    void anEmptyFolderIsFilled() throws IOException {
        Path target = parent.resolve("empty");
        Files.createDirectories(target);
        assertEquals(CupelCommand.OK, CliRun.run("demo", target.toString()).code());
        assertTrue(Files.exists(target.resolve("register.csv")));
    }

    @Test
    void sameSeedWritesTheSameBytes() throws IOException {
        assertEquals(CupelCommand.OK, CliRun.run("demo", parent.resolve("a").toString(), "--seed", "9").code());
        assertEquals(CupelCommand.OK, CliRun.run("demo", parent.resolve("b").toString(), "--seed", "9").code());
        assertArrayEquals(Files.readAllBytes(parent.resolve("a/register.csv")),
                Files.readAllBytes(parent.resolve("b/register.csv")));
        assertArrayEquals(Files.readAllBytes(parent.resolve("a/lab/OAL-00012.csv")),
                Files.readAllBytes(parent.resolve("b/lab/OAL-00012.csv")));
    }

    @Test
    void badArgumentsAreInputErrors() throws IOException {
        Path file = parent.resolve("file.txt");
        Files.writeString(file, "x");
        CliRun onFile = CliRun.run("demo", file.toString());
        assertEquals(CupelCommand.INPUT_ERROR, onFile.code());
        assertTrue(onFile.err().contains("is a file"), onFile.err());
        CliRun tooSmall = CliRun.run("demo", parent.resolve("q").toString(), "--samples", "10");
        assertEquals(CupelCommand.INPUT_ERROR, tooSmall.code());
        assertTrue(tooSmall.err().contains("--samples 10"), tooSmall.err());
        assertFalse(Files.exists(parent.resolve("q")));
    }
}
