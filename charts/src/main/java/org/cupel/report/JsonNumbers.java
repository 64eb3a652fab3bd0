package org.cupel.report;

import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.databind.JsonSerializer;
import com.fasterxml.jackson.databind.SerializerProvider;
import com.fasterxml.jackson.databind.module.SimpleModule;
import java.io.IOException;

/**
 * Numbers in Cupel's JSON: a number that could not be computed (NaN) or is unbounded (infinity) is written
 * as {@code null}, never as the strings {@code "NaN"} or {@code "Infinity"} (which Jackson writes by
 * default) nor as the bare tokens, which are not JSON (RFC 8259, section 6: "Numeric values that cannot be
 * represented ... (such as Infinity and NaN) are not permitted"). The record that holds such a number
 * carries the reason in a sibling field ({@code note}, {@code ratioNote}) where it has one. Every JSON writer
 * of Cupel registers {@link #module()}.
 */
public final class JsonNumbers {
    private JsonNumbers() {
    }

    /** Serialisers of double, float (boxed and primitive) and their arrays that write null for a non-finite value. */
    public static SimpleModule module() {
        SimpleModule m = new SimpleModule("cupel-finite-numbers");
        JsonSerializer<Double> doubles = new JsonSerializer<>() {
            @Override
            public void serialize(Double v, JsonGenerator g, SerializerProvider p) throws IOException {
                write(v, g);
            }
        };
        JsonSerializer<Float> floats = new JsonSerializer<>() {
            @Override
            public void serialize(Float v, JsonGenerator g, SerializerProvider p) throws IOException {
                if (Float.isFinite(v)) {
                    g.writeNumber(v);
                } else {
                    g.writeNull();
                }
            }
        };
        m.addSerializer(Double.class, doubles);
        m.addSerializer(Double.TYPE, doubles);
        m.addSerializer(Float.class, floats);
        m.addSerializer(Float.TYPE, floats);
        m.addSerializer(double[].class, new JsonSerializer<>() {
            @Override
            public void serialize(double[] values, JsonGenerator g, SerializerProvider p) throws IOException {
                g.writeStartArray(values, values.length);
                for (double v : values) {
                    write(v, g);
                }
                g.writeEndArray();
            }
        });
        return m;
    }

    private static void write(double v, JsonGenerator g) throws IOException {
        if (Double.isFinite(v)) {
            g.writeNumber(v);
        } else {
            g.writeNull();
        }
    }
}
