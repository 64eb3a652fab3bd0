package org.cupel.config;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.cfg.CoercionAction;
import com.fasterxml.jackson.databind.cfg.CoercionInputShape;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.fasterxml.jackson.databind.type.LogicalType;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import com.fasterxml.jackson.dataformat.yaml.YAMLMapper;
import java.util.ArrayList;
import java.util.Collection;
import java.util.Iterator;
import java.util.List;
import java.util.Map;

/**
 * A project's settings, read from {@code cupel.yaml}. Each feature package owns its section and binds it
 * with {@link #section(String, Class, Object)} over its own defaults, so a folder without a config file
 * works and a config only needs the settings a user wants to change.
 *
 * <p>Example:
 * <pre>
 * project: Tallow Creek 2025 drilling
 * ingest:
 *   decimalComma: false
 *   negativeMeansBelowDetection: true
 * duplicates:
 *   limitMultipleOfDetection: 10
 * </pre>
 */
public final class CupelConfig {
    /** The one top-level key that is not a section: the project's name. */
    public static final String PROJECT = "project";

    private static final ObjectMapper YAML = yamlMapper();

    private final ObjectNode root;
    private final String source;
    private final Map<List<String>, YamlScan.Place> places;

    private CupelConfig(ObjectNode root, String source, Map<List<String>, YamlScan.Place> places) {
        this.root = root;
        this.source = source;
        this.places = places;
    }

    /**
     * Strict binding: unknown keys, a missing value for a number or switch, a fraction where a whole number
     * is expected, a number where a choice of words is expected, and 0/1 for true/false are all errors rather
     * than silently turned into something else.
     */
    private static ObjectMapper yamlMapper() {
        ObjectMapper m = YAMLMapper.builder(new YAMLFactory())
                .enable(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES)
                .enable(DeserializationFeature.FAIL_ON_NULL_FOR_PRIMITIVES)
                .enable(DeserializationFeature.FAIL_ON_NUMBERS_FOR_ENUMS)
                .disable(DeserializationFeature.ACCEPT_FLOAT_AS_INT)
                .build();
        m.coercionConfigFor(LogicalType.Boolean).setCoercion(CoercionInputShape.Integer, CoercionAction.Fail);
        return m;
    }

    /** No file: every setting at its default. */
    public static CupelConfig defaults() {
        return new CupelConfig(JsonNodeFactory.instance.objectNode(), "(defaults)", Map.of());
    }

    /**
     * Parses YAML text.
     *
     * @param sourceName file name used in messages
     * @throws ConfigException naming the file, line and column of a syntax error, a key given twice or an
     *     alias
     */
    public static CupelConfig fromYaml(String yaml, String sourceName) {
        try {
            Map<List<String>, YamlScan.Place> places = YamlScan.scan(yaml, sourceName);
            JsonNode node = YAML.readTree(yaml);
            if (node == null || node.isMissingNode() || node.isNull()) {
                return new CupelConfig(JsonNodeFactory.instance.objectNode(), sourceName, places);
            }
            if (!node.isObject()) {
                throw new ConfigException(sourceName + ": the config must be a mapping of settings (key: value), "
                        + "found " + SettingWords.found(node) + "; start from the example in docs/config.md.");
            }
            return new CupelConfig((ObjectNode) node, sourceName, places);
        } catch (JsonProcessingException e) {
            var loc = e.getLocation();
            String where = loc == null ? sourceName : sourceName + ":" + loc.getLineNr() + ":" + loc.getColumnNr();
            throw new ConfigException(where + ": not valid YAML (" + oneLine(e.getOriginalMessage())
                    + "). Fix the syntax, or remove the file to use the defaults.", e);
        }
    }

    /**
     * The parser's explanation without its echo of the offending text and position lines (those are
     * indented), so that the message stays one line on the terminal and the position is given once.
     */
    private static String oneLine(String parserMessage) {
        if (parserMessage == null) {
            return "unreadable";
        }
        String kept = parserMessage.lines()
                .filter(l -> !l.isBlank() && !Character.isWhitespace(l.charAt(0)))
                .map(String::strip)
                .collect(java.util.stream.Collectors.joining("; "));
        return kept.isEmpty() ? parserMessage.strip().replaceAll("\\s+", " ") : kept;
    }

    /** Where the settings came from: a file name or "(defaults)". */
    public String source() {
        return source;
    }

    /** The project's name, or {@code fallback} when the config does not give one. */
    public String projectName(String fallback) {
        JsonNode n = root.get("project");
        return n != null && n.isTextual() && !n.asText().isBlank() ? n.asText() : fallback;
    }

    /**
     * Binds section {@code name} onto {@code defaults}: keys the user gave override, the rest keep their
     * default. Works with records.
     *
     * @throws ConfigException one sentence naming the file, line and column of the bad key or value, what was
     *     expected there (in the user's words, with "did you mean" for a mistyped key) and how to fix it
     */
    public <T> T section(String name, Class<T> type, T defaults) {
        JsonNode user = root.get(name);
        if (user == null || user.isNull()) {
            return defaults;
        }
        if (!user.isObject()) {
            throw new ConfigException(at(List.of(name), true) + name + " must be " + SettingWords.expected(type)
                    + ", found " + SettingWords.found(user) + "; indent its settings under '" + name + ":' as in "
                    + "docs/config.md.");
        }
        SettingProblem.requireKnownKeys(this, List.of(name), type, user);
        JsonNode merged = merge(YAML.valueToTree(defaults), user);
        try {
            return YAML.treeToValue(merged, type);
        } catch (JsonProcessingException | IllegalArgumentException e) {
            throw SettingProblem.describe(this, name, type, e);
        }
    }

    /**
     * This config with section {@code name} bound to {@code settings}, for settings given in code rather than
     * in the file. Each key of the section whose value differs from what the section binds to now is written
     * over the file's, so that it counts as set by the user ({@link #isUserSet}) and the report labels it so;
     * every other key keeps its origin, the file or the default.
     *
     * @throws IllegalArgumentException when the section cannot bind to {@code settings}: a key left out of a map
     *     of settings (such as {@code crm.rules}) comes back with its default, as it would in the file
     */
    public <T> CupelConfig with(String name, Class<T> type, T defaults, T settings) {
        T current = section(name, type, defaults);
        if (current.equals(settings)) {
            return this;
        }
        JsonNode now = YAML.valueToTree(current);
        ObjectNode copy = root.deepCopy();
        ObjectNode section = copy.get(name) instanceof ObjectNode given ? given : copy.putObject(name);
        JsonNode wanted = YAML.valueToTree(settings);
        for (Map.Entry<String, JsonNode> e : wanted.properties()) {
            if (!e.getValue().equals(now.get(e.getKey()))) {
                section.set(e.getKey(), e.getValue());
            }
        }
        CupelConfig out = new CupelConfig(copy, source, places);
        if (!out.section(name, type, defaults).equals(settings)) {
            throw new IllegalArgumentException("the " + name + " settings cannot be set as given: a map of settings "
                    + "keeps the default of every key it leaves out; start from the settings in force (toBuilder) "
                    + "and change the values, leaving no key out");
        }
        return out;
    }

    /**
     * Refuses a top-level key that is neither {@value #PROJECT} nor one of {@code sections} (a misspelt
     * section would otherwise be ignored with all its settings), and a project name that is not text.
     *
     * @throws ConfigException naming the key's line and column, with "did you mean" when it is near a section
     */
    public void requireKnownSections(Collection<String> sections) {
        List<String> known = new ArrayList<>();
        known.add(PROJECT);
        known.addAll(sections);
        Iterator<String> keys = root.fieldNames();
        while (keys.hasNext()) {
            String key = keys.next();
            if (!known.contains(key)) {
                throw new ConfigException(at(List.of(key), false) + "'" + key + "' is not a section of the config"
                        + Suggestion.closest(key, known).map(k -> "; did you mean '" + k + "'?").orElse(".")
                        + " The top-level keys are " + String.join(", ", known) + " (docs/config.md); correct or "
                        + "remove it.");
            }
        }
        JsonNode project = root.get(PROJECT);
        if (project != null && !project.isNull() && !project.isValueNode()) {
            throw new ConfigException(at(List.of(PROJECT), true) + "project must be text (the project's name), "
                    + "found " + SettingWords.found(project) + "; write it on one line: project: My project.");
        }
    }

    /**
     * {@code file:line:column: } of a key (or of its value), or of its nearest enclosing key the file has,
     * or just {@code file: } for settings not from a file.
     */
    String at(List<String> path, boolean value) {
        for (int n = path.size(); n > 0; n--) {
            YamlScan.Place p = places.get(path.subList(0, n));
            if (p != null) {
                return value && n == path.size() ? source + ":" + p.valueLine() + ":" + p.valueColumn() + ": "
                        : source + ":" + p.keyLine() + ":" + p.keyColumn() + ": ";
            }
        }
        return source + ": ";
    }

    /** What the user wrote at {@code path}, or {@code null} when the file does not set it. */
    JsonNode userValue(List<String> path) {
        JsonNode n = root;
        for (String key : path) {
            n = n == null ? null : n.isArray() && key.chars().allMatch(Character::isDigit)
                    ? n.get(Integer.parseInt(key)) : n.get(key);
        }
        return n;
    }

    /** Whether the user set {@code dotted.path} (so reports can label a threshold "user setting"). */
    public boolean isUserSet(String dottedPath) {
        JsonNode n = root;
        for (String part : dottedPath.split("\\.")) {
            n = n == null ? null : n.get(part);
        }
        return n != null && !n.isNull();
    }

    /** The raw tree, for reports that echo the settings in force. */
    public JsonNode tree() {
        return root.deepCopy();
    }

    private static JsonNode merge(JsonNode base, JsonNode override) {
        if (!(base instanceof ObjectNode) || !override.isObject()) {
            return override;
        }
        ObjectNode out = ((ObjectNode) base).deepCopy();
        for (Map.Entry<String, JsonNode> e : override.properties()) {
            JsonNode prior = out.get(e.getKey());
            out.set(e.getKey(), prior == null ? e.getValue() : merge(prior, e.getValue()));
        }
        return out;
    }
}
