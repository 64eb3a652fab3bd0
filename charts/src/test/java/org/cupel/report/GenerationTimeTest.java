package org.cupel.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.Map;
import org.cupel.project.InputException;
import org.junit.jupiter.api.Test;

/** SOURCE_DATE_EPOCH as specified by reproducible-builds.org: whole seconds since 1970-01-01 00:00:00 UTC. */
class GenerationTimeTest {
    private final Clock clock = Clock.fixed(Instant.parse("2030-05-06T07:08:09.123Z"), ZoneOffset.UTC);

    @Test
    void theVariableFixesTheTime() {
        // 1767225600 s = 2026-01-01T00:00:00Z (20454 days of 86400 s since the epoch).
        assertEquals(Instant.parse("2026-01-01T00:00:00Z"),
                GenerationTime.from(Map.of("SOURCE_DATE_EPOCH", "1767225600"), clock));
    }

    @Test
    void withoutItTheClockIsUsedToTheSecond() {
        assertEquals(Instant.parse("2030-05-06T07:08:09Z"), GenerationTime.from(Map.of(), clock));
    }

    @Test
    void aMalformedValueIsAnInputError() {
        assertThrows(InputException.class, () -> GenerationTime.from(Map.of("SOURCE_DATE_EPOCH", "yesterday"), clock));
        assertThrows(InputException.class, () -> GenerationTime.from(Map.of("SOURCE_DATE_EPOCH", "-5"), clock));
    }

    @Test
    void theTimeShowsInThePageInUtc() {
        QcReport r = ReportFixture.report();
        String html = HtmlReport.render(r, new ReportFiles(r));
        assertEquals(true, html.contains("generated 2026-01-01 00:00 UTC"));
    }
}
