package org.cupel.report;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HashSet;
import java.util.HexFormat;
import java.util.Locale;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Turns IDs (sample IDs, CRM codes, table and chart names from the data) into file names that are safe
 * on Linux, macOS and Windows, and hands out unique ones within one output folder.
 *
 * <p>Rules of {@link #safe(String)}: only ASCII letters, digits, {@code . _ -} are kept, every other
 * character (path separators, control characters, spaces, non-ASCII) becomes {@code _}; runs of dots and
 * underscores shrink to one {@code _}, so no {@code ..} survives; leading and trailing {@code . _ -} are
 * removed, so no hidden file and no trailing dot (which Windows drops); a name whose stem is a reserved
 * Windows device name (CON, PRN, AUX, NUL, COM1–9, LPT1–9, any case) gets a {@code _} right after the device
 * name, since Windows takes the device name followed by any extension as the device ({@code nul.txt} becomes
 * {@code nul_.txt}; {@code nul.txt_} would still be NUL); names
 * longer than {@value #MAX_LENGTH} characters are cut and end with 8 hex digits of the SHA-256 of the
 * original ID so that different long IDs stay different; an ID with nothing left becomes {@code item}.
 */
public final class FileNames {
    /** Longest stem handed out, well under the 255-byte limit of common file systems with room for suffixes. */
    public static final int MAX_LENGTH = 80;

    private static final Pattern DISALLOWED = Pattern.compile("[^A-Za-z0-9._-]");
    private static final Pattern DOT_RUNS = Pattern.compile("[._]{2,}");
    private static final Pattern EDGES = Pattern.compile("^[._-]+|[._-]+$");
    private static final Pattern RESERVED = Pattern.compile("(?i)(con|prn|aux|nul|com[1-9]|lpt[1-9])(\\..*)?");

    private final Set<String> used = new HashSet<>();

    /** A safe stem for {@code id}; see the class comment. Deterministic: the same ID gives the same stem. */
    public static String safe(String id) {
        String s = DISALLOWED.matcher(id == null ? "" : id).replaceAll("_");
        s = DOT_RUNS.matcher(s).replaceAll("_");
        s = EDGES.matcher(s).replaceAll("");
        if (s.isEmpty()) {
            s = "item";
        }
        if (s.length() > MAX_LENGTH) {
            s = EDGES.matcher(s.substring(0, MAX_LENGTH - 9)).replaceAll("") + "-" + hash8(id);
        }
        Matcher reserved = RESERVED.matcher(s);
        if (reserved.matches()) {
            s = reserved.group(1) + "_" + (reserved.group(2) == null ? "" : reserved.group(2));
        }
        return s;
    }

    /**
     * A stem for {@code id} not handed out before by this instance: {@link #safe(String)}, then
     * {@code -2}, {@code -3}, ... on a collision. Collisions are judged ignoring case, because Windows
     * and macOS file systems do. The result depends only on the order of calls, so a report written
     * twice gets the same names.
     */
    public String unique(String id) {
        String base = safe(id);
        String name = base;
        for (int k = 2; !used.add(name.toLowerCase(Locale.ROOT)); k++) {
            name = base + "-" + k;
        }
        return name;
    }

    private static String hash8(String id) {
        try {
            byte[] d = MessageDigest.getInstance("SHA-256").digest(id.getBytes(StandardCharsets.UTF_8));
            return HexFormat.of().formatHex(d, 0, 4);
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is part of every Java runtime", e);
        }
    }
}
