package org.cupel.report;

import java.time.Clock;
import java.time.Instant;
import java.util.Map;
import org.cupel.project.InputException;

/**
 * The generation time printed in the report: {@code SOURCE_DATE_EPOCH} when set, so that a rebuilt
 * report is identical, else the clock. The variable holds whole seconds since 1970-01-01 00:00:00 UTC
 * (reproducible-builds.org, "SOURCE_DATE_EPOCH" specification); a malformed value is an error rather
 * than silently ignored, as that specification asks.
 */
public final class GenerationTime {
    public static final String VARIABLE = "SOURCE_DATE_EPOCH";

    private GenerationTime() {
    }

    public static Instant from(Map<String, String> env, Clock clock) {
        String v = env.get(VARIABLE);
        if (v == null || v.isBlank()) {
            return clock.instant().truncatedTo(java.time.temporal.ChronoUnit.SECONDS);
        }
        try {
            long seconds = Long.parseLong(v.strip());
            if (seconds < 0) {
                throw new NumberFormatException("negative");
            }
            return Instant.ofEpochSecond(seconds);
        } catch (NumberFormatException | java.time.DateTimeException e) {
            throw new InputException("environment variable " + VARIABLE + " is '" + v
                    + "', expected whole seconds since 1970-01-01 UTC such as 1767225600; fix it or unset it");
        }
    }
}
