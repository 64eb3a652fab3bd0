package org.cupel.report;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.MapperFeature;
import com.fasterxml.jackson.databind.json.JsonMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.TreeMap;

/**
 * Writes {@code summary.json}: every section's headline figures, keyed by section ID, with keys sorted at
 * every level so that the same report gives the same bytes. The generation time is left out on purpose:
 * the file depends on the inputs only. JSON has no NaN or infinity, so a non-finite number is written as
 * {@code null}, as in every JSON Cupel writes ({@link JsonNumbers}); the section's own text says why.
 */
public final class SummaryJson {
    /** Format version of summary.json; raised when a key changes meaning. */
    public static final int FORMAT = 1;

    private static final ObjectMapper MAPPER = JsonMapper.builder()
            .enable(SerializationFeature.INDENT_OUTPUT)
            .enable(SerializationFeature.ORDER_MAP_ENTRIES_BY_KEYS)
            .enable(MapperFeature.SORT_PROPERTIES_ALPHABETICALLY)
            .addModule(JsonNumbers.module())
            .build();

    private SummaryJson() {
    }

    public static void write(QcReport report, Path file) throws IOException {
        Files.writeString(file, toJson(report) + "\n");
    }

    public static String toJson(QcReport report) throws IOException {
        Map<String, Object> sections = new TreeMap<>();
        for (ReportSection s : report.sections()) {
            Map<String, Object> sec = new TreeMap<>();
            sec.put("title", s.title());
            Map<String, Object> h = new TreeMap<>();
            h.putAll(s.headlines());
            sec.put("headlines", h);
            sections.put(s.id(), sec);
        }
        Map<String, Object> root = new LinkedHashMap<>();
        root.put("format", FORMAT);
        root.put("project", report.project());
        root.put("selection", report.selection());
        root.put("sections", sections);
        return MAPPER.writeValueAsString(root);
    }
}
