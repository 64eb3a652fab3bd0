package org.cupel.config;

import com.fasterxml.jackson.databind.JsonNode;
import java.lang.reflect.ParameterizedType;
import java.lang.reflect.RecordComponent;
import java.lang.reflect.Type;
import java.util.Arrays;
import java.util.Collection;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;

/**
 * Settings types and YAML values described in a user's words ("a whole number", "a list", "the text 'abc'")
 * instead of Java's ({@code LinkedHashMap<String,Double>}), for the messages of {@link CupelConfig}.
 */
final class SettingWords {
    private SettingWords() {
    }

    /**
     * The declared type of the setting at {@code path} below a settings record, following record components,
     * map values and list items; {@code null} when the path leaves the record's shape.
     */
    static Type typeAt(Type root, List<String> path) {
        Type t = root;
        for (String key : path) {
            Class<?> raw = raw(t);
            if (raw == null) {
                return null;
            }
            if (raw.isRecord()) {
                t = Arrays.stream(raw.getRecordComponents()).filter(c -> c.getName().equals(key))
                        .map(RecordComponent::getGenericType).findFirst().orElse(null);
            } else if (Map.class.isAssignableFrom(raw)) {
                t = argument(t, 1);
            } else if (Collection.class.isAssignableFrom(raw)) {
                t = argument(t, 0);
            } else {
                return null;
            }
            if (t == null) {
                return null;
            }
        }
        return t;
    }

    /** The settings a record type accepts, in declaration order. */
    static List<String> keysOf(Type t) {
        Class<?> raw = raw(t);
        return raw != null && raw.isRecord()
                ? Arrays.stream(raw.getRecordComponents()).map(RecordComponent::getName).toList() : List.of();
    }

    /** What a value of type {@code t} looks like, with an article: "a number", "true or false". */
    static String expected(Type t) {
        Class<?> raw = raw(t);
        if (raw == null) {
            return "a value as described in docs/config.md";
        }
        if (raw == boolean.class || raw == Boolean.class) {
            return "true or false";
        }
        if (raw == int.class || raw == Integer.class || raw == long.class || raw == Long.class) {
            return "a whole number";
        }
        if (raw == double.class || raw == Double.class || raw == float.class || raw == Float.class) {
            return "a number";
        }
        if (raw == String.class) {
            return "text";
        }
        if (raw.isEnum()) {
            return "one of " + Arrays.stream(raw.getEnumConstants()).map(Object::toString)
                    .collect(Collectors.joining(", "));
        }
        if (Map.class.isAssignableFrom(raw)) {
            return "a mapping of names to " + plural(argument(t, 1)) + " (name: value, one per line)";
        }
        if (Collection.class.isAssignableFrom(raw)) {
            return "a list of " + plural(argument(t, 0)) + " ([a, b] or one '- item' per line)";
        }
        if (raw.isRecord()) {
            return "a mapping of settings (key: value, one per line, indented under it)";
        }
        return "a value as described in docs/config.md";
    }

    /** As {@link #expected(Type)}, with the range when {@code found} is a whole number too large for the type. */
    static String expected(Type t, JsonNode found) {
        Class<?> raw = raw(t);
        if (found != null && found.isIntegralNumber()) {
            if ((raw == int.class || raw == Integer.class) && !found.canConvertToInt()) {
                return "a whole number from " + Integer.MIN_VALUE + " to " + Integer.MAX_VALUE;
            }
            if ((raw == long.class || raw == Long.class) && !found.canConvertToLong()) {
                return "a whole number from " + Long.MIN_VALUE + " to " + Long.MAX_VALUE;
            }
        }
        return expected(t);
    }

    private static String plural(Type t) {
        String one = expected(t);
        switch (one) {
            case "true or false": return "true or false values";
            case "a whole number": return "whole numbers";
            case "a number": return "numbers";
            case "text": return "texts";
            default: return "values that are each " + one;
        }
    }

    /** What the user wrote, in words: "a list", "a mapping", "the number 5", "the text 'abc'", "nothing". */
    static String found(JsonNode n) {
        if (n == null || n.isNull() || n.isMissingNode()) {
            return "nothing (the key has no value)";
        }
        if (n.isArray()) {
            return "a list";
        }
        if (n.isObject()) {
            return "a mapping (key: value)";
        }
        if (n.isBoolean()) {
            return "the value " + n.asText() + " (YAML reads yes, no, on and off as true and false)";
        }
        if (n.isNumber()) {
            return "the number " + n.asText();
        }
        return "the text '" + n.asText() + "'";
    }

    static Class<?> raw(Type t) {
        if (t instanceof Class<?> c) {
            return c;
        }
        if (t instanceof ParameterizedType p && p.getRawType() instanceof Class<?> c) {
            return c;
        }
        return null;
    }

    private static Type argument(Type t, int i) {
        return t instanceof ParameterizedType p && p.getActualTypeArguments().length > i
                ? p.getActualTypeArguments()[i] : null;
    }
}
