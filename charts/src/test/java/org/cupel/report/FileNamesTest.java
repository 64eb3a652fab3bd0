package org.cupel.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.regex.Pattern;
import org.cupel.testing.Gen;
import org.cupel.testing.SeededTries;
import org.junit.jupiter.api.Test;

class FileNamesTest {
    private static final Pattern SAFE = Pattern.compile("[A-Za-z0-9][A-Za-z0-9._-]*");
    /** Reserved device names: Microsoft, "Naming Files, Paths, and Namespaces" (Win32 documentation). */
    private static final Pattern RESERVED = Pattern.compile("(?i)(con|prn|aux|nul|com[1-9]|lpt[1-9])(\\..*)?");

    @Test
    void hostileIdsBecomePlainNames() {
        assertEquals("script_alert_1_script", FileNames.safe("<script>alert(1)</script>"));
        assertEquals("x", FileNames.safe("../../x"));
        assertEquals("etc_passwd", FileNames.safe("/etc/passwd"));
        assertEquals("C_Windows_x", FileNames.safe("C:\\Windows\\x"));
        assertEquals("a_b", FileNames.safe("a\u0000\nb"));
        assertEquals("item", FileNames.safe(".."));
        assertEquals("item", FileNames.safe(""));
        assertEquals("CRM-AU-12.5", FileNames.safe("CRM-AU-12.5"));
    }

    @Test
    void reservedWindowsDeviceNamesAreChanged() {
        assertEquals("CON_", FileNames.safe("CON"));
        // A device name followed by an extension is still the device: "NUL.txt and NUL.tar.gz are both
        // equivalent to NUL" (same Microsoft page; wording recalled from memory).
        assertEquals("nul_.txt", FileNames.safe("nul.txt"));
        assertEquals("LPT9_.tar.gz", FileNames.safe("LPT9.tar.gz"));
        assertEquals("com1_", FileNames.safe("com1"));
        assertEquals("CONSOLE", FileNames.safe("CONSOLE"));
    }

    @Test
    void longIdsAreCutButStayDistinct() {
        String a = "A".repeat(300) + "1";
        String b = "A".repeat(300) + "2";
        assertTrue(FileNames.safe(a).length() <= FileNames.MAX_LENGTH);
        assertNotEquals(FileNames.safe(a), FileNames.safe(b));
    }

    @Test
    void collisionsGetSuffixesInCallOrderIgnoringCase() {
        FileNames n = new FileNames();
        assertEquals("a_b", n.unique("a/b"));
        assertEquals("a_b-2", n.unique("a\\b"));
        assertEquals("A_B-3", n.unique("A:B"));
        assertEquals("c", n.unique("c"));
        FileNames again = new FileNames();
        assertEquals("a_b", again.unique("a/b"), "same calls, same names");
    }

    @Test
    void everyResultIsASafeName() {
        // Nothing, dots alone, a reserved name with an extension, and the longest IDs of what is unsafe.
        List<Gen<String>> edges = List.of(Gen.constant(""), Gen.constant("."), Gen.constant("..."),
                Gen.constant("lpt9.tar.gz"), Gen.constant("/".repeat(255)), Gen.constant("\u00e9".repeat(255)));
        SeededTries.forAll(1000, edges, Gen.anyStrings(255), id -> {
            String s = FileNames.safe(id);
            assertTrue(SAFE.matcher(s).matches(), s);
            assertFalse(s.contains(".."), s);
            assertFalse(RESERVED.matcher(s).matches(), s);
            assertTrue(s.length() <= FileNames.MAX_LENGTH + 1, s);
        });
    }
}
