package org.cupel.config;

import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import com.fasterxml.jackson.dataformat.yaml.YAMLParser;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * One pass over the YAML tokens of a config that notes where each key and value stands (so that a message
 * about a setting can name its line and column), and refuses the two constructs that a tree of settings
 * would silently misread:
 * <ul>
 *   <li>a key given twice in one mapping (a YAML reader keeps one of them and drops the other without a
 *       word);</li>
 *   <li>an alias ({@code *name}): Jackson's YAML reader gives the alias's name as if it were the value, so
 *       {@code failMultiple: *strict} would be read as the text "strict". Aliases are refused rather than
 *       expanded, which also rules out alias bombs (a few lines that expand to millions of nodes).</li>
 * </ul>
 */
final class YamlScan {
    private static final YAMLFactory FACTORY = new YAMLFactory();

    /** Line and column (both from 1) of a key and of its value. */
    record Place(int keyLine, int keyColumn, int valueLine, int valueColumn) {
    }

    private YamlScan() {
    }

    /**
     * The place of every key, by its path of keys from the top (list items by their index, from 0).
     *
     * @throws ConfigException for a duplicate key or an alias, naming line and column
     * @throws JsonProcessingException for a syntax error (the caller words it)
     */
    static Map<List<String>, Place> scan(String yaml, String source) throws JsonProcessingException {
        Map<List<String>, Place> places = new HashMap<>();
        Deque<Frame> stack = new ArrayDeque<>();
        try (YAMLParser p = FACTORY.createParser(yaml)) {
            for (JsonToken t = p.nextToken(); t != null; t = p.nextToken()) {
                JsonLocation at = p.currentTokenLocation();
                Frame top = stack.peek();
                if (t == JsonToken.FIELD_NAME) {
                    top.key(p.currentName(), at, source, places, stack);
                    continue;
                }
                if (t == JsonToken.END_OBJECT || t == JsonToken.END_ARRAY) {
                    stack.pop();
                    continue;
                }
                if (p.isCurrentAlias()) {
                    throw new ConfigException(source + ":" + at.getLineNr() + ":" + at.getColumnNr() + ": '*"
                            + p.getText() + "' is a YAML alias, which Cupel does not expand (it would be read as the "
                            + "text '" + p.getText() + "'); write the value out in full here.");
                }
                if (top != null) {
                    top.value(at, places, stack);
                }
                if (t == JsonToken.START_OBJECT || t == JsonToken.START_ARRAY) {
                    stack.push(new Frame(t == JsonToken.START_ARRAY));
                }
            }
        } catch (JsonProcessingException e) {
            throw e;
        } catch (IOException e) {
            throw new UncheckedIOException("reading a string cannot fail", e);
        }
        return places;
    }

    /** One open mapping or list: the keys seen in it and the key (or index) of the value being read. */
    private static final class Frame {
        private final boolean list;
        private final Map<String, Integer> keyLines = new HashMap<>();
        private String current;
        private int index = -1;
        private JsonLocation keyAt;

        Frame(boolean list) {
            this.list = list;
        }

        void key(String name, JsonLocation at, String source, Map<List<String>, Place> places, Deque<Frame> stack) {
            Integer first = keyLines.putIfAbsent(name, at.getLineNr());
            if (first != null) {
                throw new ConfigException(source + ":" + at.getLineNr() + ":" + at.getColumnNr() + ": the key '"
                        + name + "' is given twice in one section (first on line " + first + "), and only one "
                        + "of the two would be read; keep one of them.");
            }
            current = name;
            keyAt = at;
            places.put(path(stack), new Place(at.getLineNr(), at.getColumnNr(), at.getLineNr(), at.getColumnNr()));
        }

        void value(JsonLocation at, Map<List<String>, Place> places, Deque<Frame> stack) {
            if (list) {
                index++;
                current = Integer.toString(index);
                keyAt = at;
            }
            places.put(path(stack), new Place(keyAt.getLineNr(), keyAt.getColumnNr(), at.getLineNr(),
                    at.getColumnNr()));
        }

        /** The path from the top to the current key of the innermost frame (the stack is innermost first). */
        private static List<String> path(Deque<Frame> stack) {
            List<String> path = new ArrayList<>();
            stack.descendingIterator().forEachRemaining(f -> path.add(f.current));
            return List.copyOf(path);
        }
    }
}
