package org.cupel.report;

/**
 * The one HTML escaper of the report. Every text that reaches {@code index.html} (IDs, codes, file names,
 * config text, captions) passes through {@link #escape(String)}, in element content and in quoted
 * attribute values alike.
 */
public final class Html {
    private Html() {
    }

    /**
     * Escapes {@code & < > " '} as character references, the set that makes a string safe in element
     * content and in single- or double-quoted attributes (OWASP Cross Site Scripting Prevention Cheat
     * Sheet, rule 1). Control characters other than tab, line feed and carriage return are not allowed in
     * HTML text and are replaced by U+FFFD so they show up rather than vanish.
     */
    public static String escape(String s) {
        if (s == null) {
            return "";
        }
        StringBuilder sb = new StringBuilder(s.length() + 16);
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
                case '&': sb.append("&amp;"); break;
                case '<': sb.append("&lt;"); break;
                case '>': sb.append("&gt;"); break;
                case '"': sb.append("&quot;"); break;
                case '\'': sb.append("&#39;"); break;
                default:
                    if ((c < 0x20 && c != '\t' && c != '\n' && c != '\r') || c == 0x7f) {
                        sb.append('\uFFFD');
                    } else {
                        sb.append(c);
                    }
            }
        }
        return sb.toString();
    }
}
