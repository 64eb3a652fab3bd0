package org.cupel.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.cupel.config.CupelConfig;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Author–year citations and method names as the sections write them; expected readings are the plain sense of the text. */
class CitationsTest {
    private static List<Citations.Cited> scan(String text) {
        Set<Citations.Cited> out = new LinkedHashSet<>();
        Citations.scan(text, out);
        return List.copyOf(out);
    }

    private static ReportSection section(String paragraph, List<Reference> listed) {
        return new ReportSection("x", "X", List.of(new ReportBlock.Paragraph(paragraph)), Map.of(), listed);
    }

    private static ReportTable table(ReportSection s, String id) {
        return s.blocks().stream().filter(b -> b instanceof ReportBlock.Table t && t.table().id().equals(id))
                .map(b -> ((ReportBlock.Table) b).table()).findFirst().orElseThrow();
    }

    private static boolean warns(ReportSection methods, String about) {
        return methods.blocks().stream().anyMatch(b -> b instanceof ReportBlock.Callout c
                && c.level() == ReportBlock.Level.WARN && c.text().contains(about));
    }

    @Test
    void readsTheUsualForms() {
        assertEquals(List.of(new Citations.Cited("Stanley & Lawie", 2007)), scan("RMS CV after Stanley & Lawie (2007);"));
        assertEquals(List.of(new Citations.Cited("Westgard, Barry, Hunt & Groth", 1981)),
                scan("Westgard, Barry, Hunt & Groth 1981, A multi-rule"));
        assertEquals(List.of(new Citations.Cited("Thompson–Howarth", 1978)), scan("Thompson–Howarth (1978): groups"));
        assertEquals(List.of(new Citations.Cited("Kuehn & Davidson", 1961), new Citations.Cited("Hodouin & Everell", 1980)),
                scan("(Kuehn & Davidson 1961; Hodouin & Everell 1980)"));
        assertEquals(List.of(new Citations.Cited("Western Electric", 1956)), scan("origin: Western Electric 1956"));
        assertEquals(List.of(new Citations.Cited("Helsel", 2012)), scan("See Helsel 2012, ch. 8"));
    }

    @Test
    void datesRegulationsAndMonthsAreNotCitations() {
        assertEquals(List.of(), scan("reported from 2025-03-03 to 2025-09-11; batch OAL-00016 2025"));
        assertEquals(List.of(), scan("29 CFR 1910.1025 and in March 2025"));
        assertEquals(List.of(), scan("Data Exceptions March 2025"));
    }

    @Test
    void eachCitationNamesTheOneEntryOfItsAuthorAndYear() {
        Bibliography b = Bibliography.standard();
        assertEquals(List.of("helsel1988"), keys(b.resolve(new Citations.Cited("Helsel–Cohn", 1988))));
        assertEquals(List.of("helsel2012"), keys(b.resolve(new Citations.Cited("Helsel", 2012))));
        assertEquals(List.of("stanley2008"), keys(b.resolve(new Citations.Cited("Stanley & Lawie", 2008))));
        assertEquals(List.of("westgard1981"), keys(b.resolve(new Citations.Cited("Westgard et al.", 1981))));
        assertEquals(List.of("westernelectric1956"), keys(b.resolve(new Citations.Cited("Western Electric", 1956))));
        assertEquals(List.of("smee2024"), keys(b.resolve(new Citations.Cited("Smee, Bloom, Arne & Heberlein", 2024))));
        assertEquals(List.of(), keys(b.resolve(new Citations.Cited("Helsel", 2011))), "the year must match");
        assertEquals(List.of(), keys(b.resolve(new Citations.Cited("Helselman", 2012))), "a whole name, not a prefix");
    }

    private static List<String> keys(List<Bibliography.Entry> entries) {
        return entries.stream().map(Bibliography.Entry::key).toList();
    }

    @Test
    void everyCitationInTheTextIsListedOrFlagged() {
        ReportSection s = new ReportSection("x", "X", List.of(new ReportBlock.Paragraph(
                "After Helsel–Cohn 1988 and Nobody & Known 2001."),
                new ReportBlock.Table(new ReportTable("t", "T", List.of("Source"),
                        List.of(List.of("Nelson 1984, tests for special causes")), ""))), Map.of());
        ReportSection m = MethodsSection.build(List.of(s), CupelConfig.defaults());
        ReportTable refs = table(m, "references");
        assertEquals(Bibliography.get("helsel1988").citation(), refs.rows().get(0).get(1));
        assertEquals(Bibliography.get("nelson1984").citation(), refs.rows().get(1).get(1));
        assertTrue(warns(m, "Nobody & Known 2001"), "an unknown source is flagged, not dropped");
        assertEquals(1, m.headlines().get("citationsWithoutReference"));
    }

    @Test
    void aReferenceASectionMakesUpItselfIsFlaggedNotListed() {
        // The same author and year as the bibliography's entry, with other details: a second copy of a source.
        Reference copy = new Reference("Shaw, W. J.", 1997, "Validation of sampling and assaying quality for bankable "
                + "feasibility studies", "The Resource Database Towards 2000, AusIMM, Wollongong");
        ReportSection m = MethodsSection.build(List.of(section("Precision.", List.of(copy))), CupelConfig.defaults());
        assertTrue(table(m, "references").rows().stream().noneMatch(r -> r.get(1).equals(copy.citation())));
        assertTrue(warns(m, "not the bibliography's entry"));
        assertEquals(1, m.headlines().get("citationsWithoutReference"));
    }

    @Test
    void aNamedMethodListsItsSourcesEvenWithoutAuthorAndYear() {
        ReportSection s = section("Conditions are compared by Welch t with Holm and Games–Howell control and a "
                + "TOST; intervals by the GUM and by Fieller.", List.of());
        ReportSection m = MethodsSection.build(List.of(s), CupelConfig.defaults());
        List<List<String>> methods = table(m, "method-sources").rows();
        List<String> refs = table(m, "references").rows().stream().map(r -> r.get(1)).toList();
        for (String key : List.of("welch1947", "satterthwaite1946", "holm1979", "games1976", "schuirmann1987",
                "jcgm100", "fieller1954")) {
            assertTrue(refs.contains(Bibliography.get(key).citation()), key);
        }
        List<String> row = methods.stream().filter(r -> r.get(0).startsWith("Welch t-test")).findFirst().orElseThrow();
        int welch = refs.indexOf(Bibliography.get("welch1947").citation()) + 1;
        assertTrue(row.get(1).startsWith("Welch 1947 [" + welch + "]; Satterthwaite 1946 ["), row.get(1));
        assertEquals("X", row.get(2));
        assertEquals(0, m.headlines().get("citationsWithoutReference"));
    }

    @Test
    void aMethodTheBibliographyGivesNoSourceIsFlagged() throws Exception {
        // The report's own file with one more method at the end of its method list, listed without a source.
        String file;
        try (InputStream in = Bibliography.class.getResourceAsStream("references.yaml")) {
            file = new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
        Bibliography b = Bibliography.read(new ByteArrayInputStream((file
                + "  - name: Tukey–Kramer comparisons\n    pattern: 'Tukey'\n    sources: []\n").getBytes(
                        StandardCharsets.UTF_8)));
        assertEquals(0, Citations.methodsIn(section("No such method.", List.of()), b).size());
        ReportSection m = MethodsSection.build(List.of(section("Tukey–Kramer intervals.", List.of())),
                CupelConfig.defaults(), b);
        assertTrue(warns(m, "Tukey–Kramer comparisons (named in X, no source in the bibliography)"));
        assertEquals(1, m.headlines().get("citationsWithoutReference"));
        assertEquals(List.of("Tukey–Kramer comparisons", "", "X"), table(m, "method-sources").rows().get(0));
    }

    /**
     * The methods found in a section's texts joined once are those found by searching every text on its own
     * (the reading before the join), for every section of the demo appendix and a text that puts two method
     * names' halves in neighbouring cells.
     */
    @Test
    void methodsFoundInTheJoinedTextsAreThoseOfEachText(@TempDir Path scratch) throws Exception {
        Bibliography b = Bibliography.standard();
        List<ReportSection> sections = new ArrayList<>(DemoReport.build(scratch).sections());
        sections.add(new ReportSection("y", "Y", List.of(new ReportBlock.Paragraph("least"),
                new ReportBlock.Paragraph("squares, Kaplan"), new ReportBlock.Paragraph("Meier; RMS"),
                new ReportBlock.Paragraph("CV; Welch")), Map.of(), List.of()));
        int named = 0;
        for (ReportSection s : sections) {
            List<Bibliography.Method> eachText = b.methods().stream().filter(m -> {
                boolean[] found = {false};
                Citations.texts(s, text -> found[0] |= m.pattern().matcher(text).find());
                return found[0];
            }).toList();
            assertEquals(eachText, Citations.methodsIn(s, b), s.title());
            named += eachText.size();
        }
        assertTrue(named > 20, "the demo appendix names methods: " + named);
    }

    @Test
    void aMethodPatternWithABackReferenceIsRefused() throws Exception {
        String file;
        try (InputStream in = Bibliography.class.getResourceAsStream("references.yaml")) {
            file = new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
        String withBackReference = file + "  - name: Doubled word\n    pattern: '(\\w+) \\1'\n    sources: []\n";
        IllegalStateException e = assertThrows(IllegalStateException.class, () -> Bibliography.read(
                new ByteArrayInputStream(withBackReference.getBytes(StandardCharsets.UTF_8))));
        assertTrue(e.getMessage().contains("the pattern of Doubled word uses a back-reference"), e.getMessage());
    }
}
