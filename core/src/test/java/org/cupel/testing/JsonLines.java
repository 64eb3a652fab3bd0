package org.cupel.testing;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.Map;
import java.util.function.BiPredicate;

/**
 * A JSON tree written as lines for a golden text, each prefixed by its path: a list item (a CRM result, a
 * batch verdict, a control outcome) is one line ({@code .batches.verdicts[] {"batch":...}}) unless it holds a
 * long list itself, and an object too long for one line ({@link #MAX_LINE} characters of compact JSON) is split
 * into its fields. So a change shows in a diff as the lines of the items it touched.
 *
 * <p>The compact form ({@link #compact}) leaves out the list items a predicate accepts (the passing items of
 * a large project) and writes each long list of numbers (a drift statistic per result) as its length and end
 * values; a line per list counts what was left out, so a change in their number still shows.
 */
public final class JsonLines {
    /** Longest compact JSON kept on one line unless it is a list item. */
    public static final int MAX_LINE = 400;
    /** Longer lists of numbers are summarised in the compact form. */
    static final int MAX_NUMBERS = 20;

    private final BiPredicate<String, JsonNode> leaveOut;
    private final boolean summariseNumbers;
    private final StringBuilder out = new StringBuilder();

    private JsonLines(BiPredicate<String, JsonNode> leaveOut, boolean summariseNumbers) {
        this.leaveOut = leaveOut;
        this.summariseNumbers = summariseNumbers;
    }

    /** Every part of the tree, as lines under the root path. */
    public static String of(String root, JsonNode node) {
        JsonLines lines = new JsonLines((path, n) -> false, false);
        lines.write(root, node, false);
        return lines.out.toString();
    }

    /**
     * The compact form: list items that {@code leaveOut} accepts (given the list's path and the item) are
     * counted on the line {@code <path>[] not listed: n}, and lists of more than {@value #MAX_NUMBERS} numbers are written as
     * {@code <path> n numbers, first a, last b}.
     */
    public static String compact(String root, JsonNode node, BiPredicate<String, JsonNode> leaveOut) {
        JsonLines lines = new JsonLines(leaveOut, true);
        lines.write(root, node, false);
        return lines.out.toString();
    }

    private void write(String path, JsonNode node, boolean listItem) {
        if (summariseNumbers && isLongNumberList(node)) {
            out.append(path).append(' ').append(node.size()).append(" numbers, first ").append(node.get(0))
                    .append(", last ").append(node.get(node.size() - 1)).append('\n');
        } else if (!node.isContainerNode() || node.toString().length() <= MAX_LINE
                || listItem && !holdsLongList(node)) {
            out.append(path).append(' ').append(node).append('\n');
        } else if (node.isObject()) {
            for (Map.Entry<String, JsonNode> e : node.properties()) {
                write(path + "." + e.getKey(), e.getValue(), false);
            }
        } else {
            int left = 0;
            for (JsonNode element : node) {
                if (leaveOut.test(path, element)) {
                    left++;
                } else {
                    write(path + "[]", element, true);
                }
            }
            if (left > 0) {
                out.append(path).append("[] not listed: ").append(left).append('\n');
            }
        }
    }

    private static boolean isLongNumberList(JsonNode node) {
        if (!node.isArray() || node.size() <= MAX_NUMBERS) {
            return false;
        }
        for (JsonNode e : node) {
            // Jackson writes NaN as the text "NaN"
            if (!e.isNumber() && !"NaN".equals(e.asText())) {
                return false;
            }
        }
        return true;
    }

    /** Whether a list too long for one line sits anywhere inside the node. */
    private static boolean holdsLongList(JsonNode node) {
        for (JsonNode child : node) {
            if (child.isArray() && child.toString().length() > MAX_LINE || child.isContainerNode() && holdsLongList(child)) {
                return true;
            }
        }
        return false;
    }
}
