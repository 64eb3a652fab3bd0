package org.cupel.cli;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.json.JsonMapper;
import java.io.PrintWriter;
import org.cupel.report.JsonNumbers;

/**
 * The one JSON writer of the CLI: records as objects, stable key order, pretty-printed; a number that could
 * not be computed is {@code null} ({@link JsonNumbers}), its reason in the record's note where it has one.
 */
public final class Json {
    private static final ObjectMapper MAPPER = JsonMapper.builder()
            .enable(SerializationFeature.INDENT_OUTPUT)
            .enable(SerializationFeature.ORDER_MAP_ENTRIES_BY_KEYS)
            .disable(SerializationFeature.FAIL_ON_EMPTY_BEANS)
            .addModule(JsonNumbers.module())
            .build();

    private Json() {
    }

    public static void print(PrintWriter out, Object value) {
        try {
            out.println(MAPPER.writeValueAsString(value));
            out.flush();
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("could not write JSON: " + e.getOriginalMessage(), e);
        }
    }
}
