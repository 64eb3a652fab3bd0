package org.cupel.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.stream.Collectors;
import org.cupel.demo.DemoOnDisk;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The jshell example of docs/java-api.md runs as written: its {@code jshell} block is fed to the JDK's jshell,
 * with the built Cupel classes and their libraries on the class path, in a folder holding the demo project
 * as {@code demo-project}, and what it prints must be the page's {@code text} block, line for line.
 */
class JavaApiExampleTest {
    private static final Path PAGE = Path.of("..", "docs", "java-api.md");

    @Test
    void theDocumentedJshellExamplePrintsWhatThePageShows(@TempDir Path dir) throws Exception {
        Path jshell = Path.of(System.getProperty("java.home"), "bin", "jshell");
        assumeTrue(Files.isExecutable(jshell), "jshell is not in this JDK (" + jshell + "); the example is not run");
        String page = Files.readString(PAGE, StandardCharsets.UTF_8);
        String snippet = block(page, "jshell", 0);
        String expected = block(page, "text", page.indexOf("```jshell"));

        DemoOnDisk.write(dir.resolve("demo-project"));
        Path script = dir.resolve("example.jsh");
        Files.writeString(script, snippet + "/exit\n", StandardCharsets.UTF_8);
        Path output = dir.resolve("output.txt");
        // -R sets the locale of the JVM that runs the snippets, -J that of jshell itself: the page's numbers are
        // written with an English locale, as it says.
        List<String> command = new ArrayList<>(List.of(jshell.toString(), "-J-Duser.language=en",
                "-J-Duser.country=US", "-R-Duser.language=en", "-R-Duser.country=US", "-R-Djava.awt.headless=true",
                "--class-path", builtClassPath(), script.getFileName().toString()));
        Process p = new ProcessBuilder(command).directory(dir.toFile()).redirectErrorStream(true)
                .redirectOutput(output.toFile()).start();
        boolean finished = p.waitFor(10, TimeUnit.MINUTES);
        if (!finished) {
            p.destroyForcibly();
        }
        String printed = Files.readString(output, StandardCharsets.UTF_8);
        assertTrue(finished, "jshell did not finish; it printed:\n" + printed);
        assertEquals(0, p.exitValue(), "jshell failed; it printed:\n" + printed);
        assertEquals(lines(expected), lines(printed), "the example's output differs from docs/java-api.md");
    }

    /**
     * The class path of this test without its test classes and test libraries: the main classes (the jars when
     * the build has packaged them) of core, charts and cli, and their libraries, as in {@code cupel.jar}.
     */
    private static String builtClassPath() {
        String sep = System.getProperty("path.separator");
        return java.util.Arrays.stream(System.getProperty("java.class.path").split(sep))
                .filter(e -> !e.endsWith("test-classes") && !e.contains("-tests.jar") && !e.contains("junit")
                        && !e.contains("opentest4j") && !e.contains("apiguardian"))
                .collect(Collectors.joining(sep));
    }

    /** The body of the first fenced block of {@code language} at or after {@code from}. */
    private static String block(String page, String language, int from) {
        String fence = "```" + language + "\n";
        int start = page.indexOf(fence, from);
        assertTrue(start >= 0, "docs/java-api.md has no ```" + language + " block");
        int end = page.indexOf("\n```", start + fence.length());
        return page.substring(start + fence.length(), end + 1);
    }

    /** The lines, without trailing spaces and without blank lines at the end. */
    private static List<String> lines(String text) {
        List<String> out = new ArrayList<>(text.lines().map(String::stripTrailing).toList());
        while (!out.isEmpty() && out.get(out.size() - 1).isEmpty()) {
            out.remove(out.size() - 1);
        }
        return out;
    }
}
