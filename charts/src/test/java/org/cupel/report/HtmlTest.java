package org.cupel.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.cupel.testing.Gen;
import org.cupel.testing.SeededTries;
import org.junit.jupiter.api.Test;

class HtmlTest {
    @Test
    void aCalloutDoesNotRepeatItsLabel() {
        assertEquals("Fire assay is hazardous.", HtmlReport.body(new ReportBlock.Callout(ReportBlock.Level.CAUTION,
                "Caution: fire assay is hazardous.")));
        assertEquals("Caution: keep.", HtmlReport.body(new ReportBlock.Callout(ReportBlock.Level.INFO, "Caution: keep.")));
    }

    /** Expected text follows the OWASP XSS Prevention Cheat Sheet, rule 1 (the five characters to escape). */
    @Test
    void escapesTheFiveSpecialCharacters() {
        assertEquals("&lt;script&gt;alert(1)&lt;/script&gt;", Html.escape("<script>alert(1)</script>"));
        assertEquals("a &amp; b &quot;c&quot; &#39;d&#39;", Html.escape("a & b \"c\" 'd'"));
        assertEquals("x\uFFFDy", Html.escape("x\u0000y"));
        assertEquals("", Html.escape(null));
    }

    @Test
    void escapedTextHoldsNoMarkupCharacters() {
        // Nothing, and text that already looks escaped (its & must be escaped again).
        List<Gen<String>> edges = List.of(Gen.constant(""), Gen.constant("&amp;&lt;&#39;&"), Gen.constant("<>\"'&"));
        SeededTries.forAll(500, edges, Gen.anyStrings(255), s -> {
            String e = Html.escape(s);
            assertFalse(e.contains("<") || e.contains(">") || e.contains("\"") || e.contains("'"));
            assertTrue(e.replace("&amp;", "").replace("&lt;", "").replace("&gt;", "").replace("&quot;", "")
                    .replace("&#39;", "").indexOf('&') < 0, "every & starts one of our references");
        });
    }

    @Test
    void hostileTextAppearsOnlyAsTextInThePage() {
        QcReport r = ReportFixture.report();
        String html = HtmlReport.render(r, new ReportFiles(r));
        assertFalse(html.contains("<script"), "no script element, ever");
        assertFalse(html.contains("<b>project"), "markup in the project name is text");
        assertTrue(html.contains("&lt;script&gt;alert(1)&lt;/script&gt;"));
        assertTrue(html.contains("Test &lt;b&gt;project&lt;/b&gt;"));
        var links = java.util.regex.Pattern.compile("(src|href)=\"([^\"]*)\"").matcher(html);
        int n = 0;
        while (links.find()) {
            n++;
            assertTrue(links.group(2).matches("#s-[A-Za-z0-9._-]+|(charts|tables)/[A-Za-z0-9._-]+\\.(png|csv)"),
                    "every link is an anchor or a file inside the folder: " + links.group(2));
        }
        assertTrue(n > 10);
        assertTrue(html.contains("\">../../x</td>"), "the traversal ID shows as text");
        assertTrue(html.contains("src=\"charts/script_alert_1_script.png\""));
    }
}
