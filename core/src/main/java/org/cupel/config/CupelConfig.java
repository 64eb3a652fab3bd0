package org.cupel.config;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import com.fasterxml.jackson.dataformat.yaml.YAMLMapper;
import java.util.Iterator;
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
    private static final ObjectMapper YAML = YAMLMapper.builder(new YAMLFactory())
            .enable(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES)
            .build();

    private final ObjectNode root;
    private final String source;

    private CupelConfig(ObjectNode root, String source) {
        this.root = root;
        this.source = source;
    }

    /** No file: every setting at its default. */
    public static CupelConfig defaults() {
        return new CupelConfig(JsonNodeFactory.instance.objectNode(), "(defaults)");
    }

    /**
     * Parses YAML text.
     *
     * @param sourceName file name used in messages
     * @throws ConfigException naming the file, line and column of a syntax error
     */
    public static CupelConfig fromYaml(String yaml, String sourceName) {
        try {
            JsonNode node = YAML.readTree(yaml);
            if (node == null || node.isMissingNode() || node.isNull()) {
                return new CupelConfig(JsonNodeFactory.instance.objectNode(), sourceName);
            }
            if (!node.isObject()) {
                throw new ConfigException(sourceName + ": the config must be a mapping of settings (key: value), "
                        + "found a " + node.getNodeType().toString().toLowerCase(java.util.Locale.ROOT));
            }
            return new CupelConfig((ObjectNode) node, sourceName);
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
     * @throws ConfigException naming the section and the bad key or value
     */
    public <T> T section(String name, Class<T> type, T defaults) {
        JsonNode user = root.get(name);
        if (user == null || user.isNull()) {
            return defaults;
        }
        JsonNode merged = merge(YAML.valueToTree(defaults), user);
        try {
            return YAML.treeToValue(merged, type);
        } catch (com.fasterxml.jackson.databind.exc.ValueInstantiationException e) {
            // The settings record rejected a value: its own IllegalArgumentException says why in the user's
            // terms; anything else (a null from an empty value) must not surface as a Java class name.
            Throwable cause = e.getCause();
            String why = cause instanceof IllegalArgumentException && cause.getMessage() != null ? cause.getMessage()
                    : "a value is empty or of the wrong kind, for example a key with nothing after its colon";
            throw new ConfigException(source + ": section '" + name + "' has a setting Cupel cannot use ("
                    + why + "). Check the key names and value types against docs/config.md.", e);
        } catch (JsonProcessingException | IllegalArgumentException e) {
            String msg = e instanceof JsonProcessingException
                    ? ((JsonProcessingException) e).getOriginalMessage() : e.getMessage();
            throw new ConfigException(source + ": section '" + name + "' has a setting Cupel cannot use ("
                    + msg + "). Check the key names and value types against docs/config.md.", e);
        }
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
        Iterator<Map.Entry<String, JsonNode>> it = override.fields();
        while (it.hasNext()) {
            Map.Entry<String, JsonNode> e = it.next();
            JsonNode prior = out.get(e.getKey());
            out.set(e.getKey(), prior == null ? e.getValue() : merge(prior, e.getValue()));
        }
        return out;
    }
}
