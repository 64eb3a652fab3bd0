package org.cupel.project;

import java.util.List;
import java.util.Locale;

/**
 * Input text as messages echo it: characters a reader cannot see (a byte-order mark, a zero-width space,
 * a no-break space, control characters) written as {@code <U+FEFF>}, and long texts and lists cut short
 * with a count of what was left out, so that a 10,000-column header or a 1 MB cell gives a message of a
 * few lines, not of 100 KB.
 */
public final class MessageText {
    /** Characters of one echoed text kept before it is cut. */
    static final int MAX_CHARS = 120;
    /** Characters of an echoed list kept before the remaining items are counted instead. */
    static final int MAX_LIST_CHARS = 240;

    private MessageText() {
    }

    /** {@code text} with every invisible or control character written as {@code <U+XXXX>}. */
    public static String visible(String text) {
        StringBuilder sb = null;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (isInvisible(c)) {
                if (sb == null) {
                    sb = new StringBuilder(text.length() + 8).append(text, 0, i);
                }
                sb.append(String.format(Locale.ROOT, "<U+%04X>", (int) c));
            } else if (sb != null) {
                sb.append(c);
            }
        }
        return sb == null ? text : sb.toString();
    }

    /** {@link #visible} of {@code text}, cut after {@value #MAX_CHARS} characters with the count of the rest. */
    public static String clip(String text) {
        return visible(shorten(text));
    }

    /** {@code text} as it is when short, else its beginning with the count of the characters left out. */
    public static String shorten(String text) {
        if (text.length() <= MAX_CHARS) {
            return text;
        }
        return text.substring(0, MAX_CHARS) + "… (" + String.format(Locale.ROOT, "%,d", text.length() - MAX_CHARS)
                + " more characters)";
    }

    /** The items as {@code [a, b, c]}, each {@link #clip}ped, the list cut with a count of the items left out. */
    public static String list(List<String> items) {
        StringBuilder sb = new StringBuilder("[");
        for (int i = 0; i < items.size(); i++) {
            if (i > 0 && sb.length() > MAX_LIST_CHARS) {
                sb.append(", … and ").append(String.format(Locale.ROOT, "%,d", items.size() - i)).append(" more");
                break;
            }
            sb.append(i > 0 ? ", " : "").append(clip(items.get(i)));
        }
        return sb.append(']').toString();
    }

    /**
     * Whether {@code c} shows as nothing or as a plain space though it is not one: control characters (tab,
     * CR, NUL...), format characters (byte-order mark, zero-width space and joiners, direction marks), the
     * space separators other than the ASCII space (no-break and narrow spaces), line and paragraph separators.
     */
    static boolean isInvisible(char c) {
        if (c == ' ') {
            return false;
        }
        int type = Character.getType(c);
        return type == Character.CONTROL || type == Character.FORMAT || type == Character.SPACE_SEPARATOR
                || type == Character.LINE_SEPARATOR || type == Character.PARAGRAPH_SEPARATOR;
    }
}
