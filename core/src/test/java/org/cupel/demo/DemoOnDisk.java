package org.cupel.demo;

import java.io.BufferedWriter;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

/** Writes the default demo project into a test's folder, for tests that read it back as a user would. */
public final class DemoOnDisk {
    private DemoOnDisk() {
    }

    public static DemoSummary write(Path dir) throws IOException {
        return DemoGenerator.generate(DemoSettings.defaults(), relative -> {
            Path file = dir.resolve(relative);
            Files.createDirectories(file.getParent());
            return new BufferedWriter(Files.newBufferedWriter(file, StandardCharsets.UTF_8));
        });
    }
}
