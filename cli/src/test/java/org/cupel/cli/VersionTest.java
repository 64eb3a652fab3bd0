package org.cupel.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.net.URL;
import java.util.jar.JarFile;
import org.junit.jupiter.api.Test;
import picocli.CommandLine;

class VersionTest {

    /**
     * The version is the Implementation-Version of the manifest of the jar that holds the class: picocli's own
     * jar stands in for the shaded cupel.jar here (its manifest says Implementation-Version: 4.7.7), read the
     * same way through its Package.
     */
    @Test
    void theVersionComesFromTheJarManifest() throws IOException {
        URL jar = CommandLine.class.getProtectionDomain().getCodeSource().getLocation();
        String written;
        try (JarFile f = new JarFile(jar.getPath())) {
            written = f.getManifest().getMainAttributes().getValue("Implementation-Version");
        }
        assertEquals("cupel " + written, CupelCommand.Version.text(CommandLine.class));
    }

    /** Under Surefire the classes come from target/classes: no manifest, and --version says so. */
    @Test
    void runFromClassesTheVersionSaysSo() {
        CliRun r = CliRun.ok("--version");
        assertEquals("cupel " + CupelCommand.Version.FROM_CLASSES, r.out().strip());
    }
}
