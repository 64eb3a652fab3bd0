package org.cupel.testing;

import java.lang.reflect.Array;
import java.lang.reflect.RecordComponent;
import java.util.Collection;

/**
 * A property input as text for a failure message: arrays, lists and records element by element, strings
 * quoted with every character outside printable ASCII escaped (a NUL or a lone surrogate must show), doubles
 * exactly as {@link Double#toString} gives them. Cut after {@value #MAX_CHARS} characters: past that the
 * seed, not the message, is the way to the input.
 */
final class Describe {
    static final int MAX_CHARS = 4000;

    private Describe() {
    }

    static String of(Object value) {
        StringBuilder out = new StringBuilder();
        append(out, value);
        if (out.length() <= MAX_CHARS) {
            return out.toString();
        }
        return out.substring(0, MAX_CHARS) + "… (" + (out.length() - MAX_CHARS) + " more characters)";
    }

    private static void append(StringBuilder out, Object value) {
        if (out.length() > MAX_CHARS) {
            return;
        }
        if (value == null) {
            out.append("null");
        } else if (value instanceof CharSequence s) {
            quote(out, s);
        } else if (value.getClass().isArray()) {
            out.append('[');
            int n = Array.getLength(value);
            for (int i = 0; i < n && out.length() <= MAX_CHARS; i++) {
                out.append(i == 0 ? "" : ", ");
                append(out, Array.get(value, i));
            }
            out.append("] (length ").append(n).append(')');
        } else if (value instanceof Collection<?> c) {
            out.append('[');
            String sep = "";
            for (Object o : c) {
                if (out.length() > MAX_CHARS) {
                    break;
                }
                out.append(sep);
                append(out, o);
                sep = ", ";
            }
            out.append("] (size ").append(c.size()).append(')');
        } else if (value instanceof Record r) {
            appendRecord(out, r);
        } else {
            out.append(value);
        }
    }

    private static void appendRecord(StringBuilder out, Record r) {
        out.append(r.getClass().getSimpleName()).append('[');
        String sep = "";
        for (RecordComponent c : r.getClass().getRecordComponents()) {
            out.append(sep).append(c.getName()).append('=');
            sep = ", ";
            try {
                c.getAccessor().setAccessible(true);
                append(out, c.getAccessor().invoke(r));
            } catch (ReflectiveOperationException | RuntimeException e) {
                out.append("(not readable: ").append(e).append(')');
            }
        }
        out.append(']');
    }

    private static void quote(StringBuilder out, CharSequence s) {
        out.append('"');
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (c == '"' || c == '\\') {
                out.append('\\').append(c);
            } else if (c >= 0x20 && c < 0x7F) {
                out.append(c);
            } else {
                out.append(String.format("\\u%04X", (int) c));
            }
        }
        out.append('"');
    }
}
