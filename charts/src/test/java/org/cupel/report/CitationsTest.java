package org.cupel.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.cupel.config.CupelConfig;
import org.junit.jupiter.api.Test;

/** Author–year citations as the sections write them; expected readings are the plain sense of the text. */
class CitationsTest {
    private static List<Citations.Cited> scan(String text) {
        Set<Citations.Cited> out = new LinkedHashSet<>();
        Citations.scan(text, out);
        return List.copyOf(out);
    }

    @Test
    void readsTheUsualForms() {
        assertEquals(List.of(new Citations.Cited("Stanley & Lawie", 2007)), scan("RMS CV after Stanley & Lawie (2007);"));
        assertEquals(List.of(new Citations.Cited("Westgard, Barry, Hunt & Groth", 1981)),
                scan("Westgard, Barry, Hunt & Groth 1981, A multi-rule"));
        assertEquals(List.of(new Citations.Cited("Thompson–Howarth", 1978)), scan("Thompson–Howarth (1978): groups"));
        assertEquals(List.of(new Citations.Cited("Kuehn & Davidson", 1961), new Citations.Cited("Hodouin & Everell", 1980)),
                scan("(Kuehn & Davidson 1961; Hodouin & Everell 1980)"));
    }

    @Test
    void datesRegulationsAndMonthsAreNotCitations() {
        assertEquals(List.of(), scan("reported from 2025-03-03 to 2025-09-11; batch OAL-00016 2025"));
        assertEquals(List.of(), scan("29 CFR 1910.1025 and in March 2025"));
    }

    @Test
    void everyCitationInTheTextIsListedOrFlagged() {
        ReportSection s = new ReportSection("x", "X", List.of(new ReportBlock.Paragraph(
                "After Helsel–Cohn 1988 and Nobody & Known 2001."),
                new ReportBlock.Table(new ReportTable("t", "T", List.of("Source"),
                        List.of(List.of("Nelson 1984, tests for special causes")), ""))), Map.of());
        ReportSection m = MethodsSection.build(List.of(s), CupelConfig.defaults());
        ReportTable refs = (ReportTable) m.blocks().stream().filter(b -> b instanceof ReportBlock.Table)
                .map(b -> ((ReportBlock.Table) b).table()).findFirst().orElseThrow();
        assertTrue(refs.rows().get(0).get(1).startsWith("Helsel, D. R. and Cohn, T. A. (1988)."));
        assertTrue(refs.rows().get(1).get(1).startsWith("Nelson, L. S. (1984)."));
        assertTrue(m.blocks().stream().anyMatch(b -> b instanceof ReportBlock.Callout c
                && c.text().contains("Nobody & Known 2001")), "an unknown source is flagged, not dropped");
        assertEquals(1, m.headlines().get("citationsWithoutReference"));
    }
}
