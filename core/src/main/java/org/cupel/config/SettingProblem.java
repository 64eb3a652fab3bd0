package org.cupel.config;

import com.fasterxml.jackson.annotation.JsonIgnoreProperties;
import com.fasterxml.jackson.databind.JsonMappingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.exc.UnrecognizedPropertyException;
import com.fasterxml.jackson.databind.exc.ValueInstantiationException;
import java.lang.reflect.Type;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * Turns the binder's refusal of a config section into one sentence in the user's terms: where (file, line,
 * column), which setting, what was expected and what was found, and how to fix it. Java class names never
 * reach the message.
 */
final class SettingProblem {
    private static final String DOCS = "docs/config.md";

    private SettingProblem() {
    }

    /**
     * Refuses the first key, at any depth of {@code user}, that the settings type has no place for. The binder
     * would refuse it too, but a record with a missing required value reports that first ("fail has no
     * value" for a mistyped {@code fial:}), which points the user at the wrong key.
     */
    static void requireKnownKeys(CupelConfig config, List<String> path, Type type, JsonNode user) {
        Class<?> raw = SettingWords.raw(type);
        if (raw == null || user == null || !user.isContainerNode()) {
            return;
        }
        List<String> known = SettingWords.keysOf(type);
        int index = 0;
        for (JsonNode item : user.isArray() ? user : List.<JsonNode>of()) {
            requireKnownKeys(config, with(path, Integer.toString(index++)), SettingWords.typeAt(type,
                    List.of("0")), item);
        }
        for (Map.Entry<String, JsonNode> e : user.properties()) {
            List<String> at = with(path, e.getKey());
            if (raw.isRecord() && !known.contains(e.getKey()) && !ignoresUnknown(raw)) {
                throw unknownKey(config, at, known, null);
            }
            requireKnownKeys(config, at, SettingWords.typeAt(type, List.of(e.getKey())), e.getValue());
        }
    }

    /** A type that binds a part of a section on purpose ({@code @JsonIgnoreProperties(ignoreUnknown = true)}). */
    private static boolean ignoresUnknown(Class<?> type) {
        JsonIgnoreProperties a = type.getAnnotation(JsonIgnoreProperties.class);
        return a != null && a.ignoreUnknown();
    }

    private static List<String> with(List<String> path, String key) {
        List<String> out = new ArrayList<>(path);
        out.add(key);
        return out;
    }

    static ConfigException describe(CupelConfig config, String section, Type type, Exception e) {
        List<String> path = new ArrayList<>(List.of(section));
        List<String> inSection = e instanceof JsonMappingException m ? keys(m) : List.of();
        path.addAll(inSection);
        if (e instanceof UnrecognizedPropertyException u) {
            List<String> parent = inSection.subList(0, Math.max(inSection.size() - 1, 0));
            return unknownKey(config, path, SettingWords.keysOf(SettingWords.typeAt(type, parent)), u);
        }
        if (e instanceof ValueInstantiationException v) {
            return refused(config, path, v);
        }
        Type expected = SettingWords.typeAt(type, inSection);
        JsonNode found = config.userValue(path);
        return new ConfigException(config.at(path, true) + dotted(path) + " should be "
                + SettingWords.expected(expected, found) + ", but the config has " + SettingWords.found(found)
                + "; correct the value (" + DOCS + " describes each setting).", e);
    }

    private static ConfigException unknownKey(CupelConfig config, List<String> path, List<String> known,
                                              Exception cause) {
        String key = path.get(path.size() - 1);
        List<String> parent = path.subList(0, path.size() - 1);
        String suggestion = Suggestion.closest(key, known).map(k -> "; did you mean '" + k + "'?").orElse(".");
        return new ConfigException(config.at(path, false) + "'" + key + "' is not a setting of " + dotted(parent)
                + suggestion + " The settings there are " + String.join(", ", known) + " (" + DOCS
                + "); correct or remove the key.", cause);
    }

    /** A settings record refused a value: its own message says why; a {@link SettingException} says where. */
    private static ConfigException refused(CupelConfig config, List<String> path, ValueInstantiationException v) {
        Throwable cause = v.getCause();
        if (cause instanceof SettingException s) {
            List<String> at = new ArrayList<>(path);
            at.addAll(s.key());
            return new ConfigException(config.at(at, true) + dotted(at) + ": " + s.getMessage(), v);
        }
        String why = cause instanceof IllegalArgumentException && cause.getMessage() != null ? cause.getMessage()
                : "a value is empty or of the wrong kind, for example a key with nothing after its colon";
        return new ConfigException(config.at(path, false) + dotted(path) + " has a setting Cupel cannot use ("
                + why + "); correct it as described in " + DOCS + ".", v);
    }

    /** The keys of the binder's path (map keys and record components by name, list items by index). */
    private static List<String> keys(JsonMappingException m) {
        List<String> keys = new ArrayList<>();
        for (JsonMappingException.Reference r : m.getPath()) {
            keys.add(r.getFieldName() != null ? r.getFieldName() : Integer.toString(r.getIndex()));
        }
        return keys;
    }

    private static String dotted(List<String> path) {
        return String.join(".", path);
    }
}
