package org.cupel.report;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;

/** Runs an installed program (chromium, pdftoppm) with a time limit and returns its standard output. */
final class ExternalTool {
    private ExternalTool() {
    }

    static boolean installed(String path) {
        return Files.isExecutable(Path.of(path));
    }

    /**
     * A headless Chromium command line with a fresh profile under {@code dir}: {@code mode} is
     * {@code --dump-dom} or {@code --screenshot=FILE}, the window {@code width} by 2000 pixels.
     */
    static List<String> chromium(String chromium, Path dir, int width, String mode, String url) throws IOException {
        Path profile = Files.createTempDirectory(dir, "chromium-profile");
        return List.of(chromium, "--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run",
                "--disable-background-networking", "--disable-component-update", "--disable-sync",
                "--user-data-dir=" + profile, "--window-size=" + width + ",2000", mode, url);
    }

    static String run(List<String> command, Path workDir, long timeoutSeconds) throws IOException, InterruptedException {
        Path log = Files.createTempFile(workDir, "tool", ".out");
        Process p = new ProcessBuilder(command).directory(workDir.toFile()).redirectErrorStream(false)
                .redirectOutput(log.toFile()).redirectError(ProcessBuilder.Redirect.DISCARD).start();
        if (!p.waitFor(timeoutSeconds, TimeUnit.SECONDS)) {
            p.destroyForcibly();
            p.waitFor(10, TimeUnit.SECONDS);
            throw new IllegalStateException(command.get(0) + " did not finish within " + timeoutSeconds + " s");
        }
        return Files.readString(log, StandardCharsets.UTF_8);
    }

    /** Share of pixels that are not near-white: 0 for a blank page. */
    static double inkShare(java.awt.image.BufferedImage img) {
        long ink = 0;
        for (int y = 0; y < img.getHeight(); y++) {
            for (int x = 0; x < img.getWidth(); x++) {
                int rgb = img.getRGB(x, y);
                int r = (rgb >> 16) & 0xff;
                int g = (rgb >> 8) & 0xff;
                int b = rgb & 0xff;
                if (r < 235 || g < 235 || b < 235) {
                    ink++;
                }
            }
        }
        return ink / (double) ((long) img.getWidth() * img.getHeight());
    }

    /** Pixels close to the chart data colour (Okabe–Ito blue, 0/114/178): only charts draw in it. */
    static long chartBluePixels(java.awt.image.BufferedImage img) {
        long n = 0;
        for (int y = 0; y < img.getHeight(); y++) {
            for (int x = 0; x < img.getWidth(); x++) {
                int rgb = img.getRGB(x, y);
                int r = (rgb >> 16) & 0xff;
                int g = (rgb >> 8) & 0xff;
                int b = rgb & 0xff;
                if (r < 60 && g > 80 && g < 150 && b > 140 && b < 215) {
                    n++;
                }
            }
        }
        return n;
    }
}
