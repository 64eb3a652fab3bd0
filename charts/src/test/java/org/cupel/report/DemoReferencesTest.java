package org.cupel.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.cupel.demo.DemoOnDisk;
import org.cupel.ingest.ProjectLoader;
import org.cupel.ingest.ValueConventions;
import org.cupel.project.Project;
import org.cupel.recovery.RecoveryAnalysis;
import org.cupel.recovery.RecoverySettings;
import org.cupel.recovery.TestworkReader;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The references of the demo appendix (the default demo project with its testwork, as {@code cupel report
 * --demo} reads it), read as the person who signs it would check them: every author–year citation names one
 * entry, every method the report names has its sources listed, no text hedges about a reference, and
 * {@code summary.json} counts nothing without a reference.
 */
class DemoReferencesTest {
    /**
     * Methods a QC appendix may name, spelt as the text would, kept here independently of the bibliography's
     * own list: a name found in the text that the bibliography does not recognise fails the test.
     */
    private static final Map<String, Pattern> METHODS = new LinkedHashMap<>();

    static {
        for (String[] m : new String[][] {{"Welch", "\\bWelch\\b"}, {"Holm", "\\bHolm\\b"},
                {"Games–Howell", "Games[–-]Howell"}, {"Tukey", "\\bTukey\\b"}, {"Bonferroni", "Bonferroni"},
                {"Fieller", "\\bFieller\\b"}, {"TOST", "\\bTOST\\b"}, {"Schuirmann", "Schuirmann"},
                {"ISO 13528", "ISO 13528"}, {"GUM", "\\bGUM\\b"}, {"Satterthwaite", "Satterthwaite"},
                {"Kaplan–Meier", "Kaplan[–-]Meier"}, {"ROS", "\\bROS\\b"}, {"Helsel–Cohn", "Helsel[–-]Cohn"},
                {"maximum likelihood", "(?i)maximum likelihood|\\bMLE\\b"}, {"Thompson–Howarth", "Thompson[–-]Howarth"},
                {"RMA", "\\bRMA\\b"}, {"reduced major axis", "(?i)reduced major axis"}, {"Westgard", "Westgard"},
                {"Shewhart", "Shewhart"}, {"Western Electric", "Western Electric"}, {"Nelson", "\\bNelson\\b"},
                {"Currie", "\\bCurrie\\b"}, {"EPA MDL", "EPA MDL"}, {"ISO 5725", "ISO 5725"}, {"HARD", "\\bHARD\\b"},
                {"RMS CV", "RMS CV"}, {"Spearman", "Spearman"}, {"Wilcoxon", "Wilcoxon"}, {"Mann–Whitney", "Mann[–-]Whitney"},
                {"Kruskal–Wallis", "Kruskal"}, {"Student t", "\\bStudent\\b"}, {"bootstrap", "(?i)bootstrap"},
                {"EWMA", "\\bEWMA\\b"}, {"CUSUM", "\\bCUSUM\\b"}, {"chi-square", "(?i)chi-square"},
                {"HC3", "\\bHC3\\b"}, {"sign test", "(?i)sign[ -]test"}, {"binomial test", "(?i)binomial"},
                {"least squares", "(?i)least[ -]squares"}, {"reconciliation", "(?i)reconciliation"},
                {"Grubbs", "Grubbs"}, {"Shapiro–Wilk", "Shapiro"}}) {
            METHODS.put(m[0], Pattern.compile(m[1]));
        }
    }

    /** Words that say a reference was not checked. */
    private static final List<String> HEDGES = List.of("from memory", "not verified", "unverified", "recalled",
            "to be checked", "should be checked", "not checked", "exact title", "to be confirmed", "todo");

    @TempDir
    static Path dir;
    static QcReport report;
    static ReportSection methods;

    @BeforeAll
    static void buildTheDemoAppendix() throws IOException {
        DemoOnDisk.write(dir);
        Project project = ProjectLoader.load(dir);
        RecoverySettings settings = RecoverySettings.DEFAULTS;
        var testwork = RecoveryAnalysis.run(TestworkReader.read(dir, settings, ValueConventions.DEFAULTS), settings);
        report = QcAppendix.build(project, Optional.of(testwork), "all batches", Instant.EPOCH);
        methods = report.sections().stream().filter(s -> s.id().equals(MethodsSection.ID)).findFirst().orElseThrow();
    }

    private static ReportTable table(String id) {
        return methods.blocks().stream().filter(b -> b instanceof ReportBlock.Table t && t.table().id().equals(id))
                .map(b -> ((ReportBlock.Table) b).table()).findFirst().orElseThrow();
    }

    /**
     * Every section as a reader sees it; the methods section without its two bibliography tables, under the
     * name of the table in it that cites (the thresholds in force).
     */
    private static List<ReportSection> citingSections() {
        List<ReportSection> out = new ArrayList<>();
        for (ReportSection s : report.sections()) {
            if (s.id().equals(MethodsSection.ID)) {
                List<ReportBlock> rest = s.blocks().stream().filter(b -> !(b instanceof ReportBlock.Table t
                        && List.of("references", "method-sources").contains(t.table().id()))).toList();
                out.add(new ReportSection(s.id(), table("thresholds").title(), rest, Map.of()));
            } else {
                out.add(s);
            }
        }
        return out;
    }

    private static List<String> listed() {
        return table("references").rows().stream().map(r -> r.get(1)).toList();
    }

    @Test
    void everyAuthorYearCitationNamesExactlyOneListedEntry() {
        List<String> listed = listed();
        int citations = 0;
        for (ReportSection s : citingSections()) {
            for (Citations.Cited c : Citations.in(s)) {
                List<Bibliography.Entry> found = Bibliography.standard().resolve(c);
                assertEquals(1, found.size(), s.title() + ": \"" + c.asWritten() + "\" names " + found.size() + " entries");
                assertTrue(listed.contains(found.get(0).reference().citation()), c.asWritten() + " is listed");
                citations++;
            }
        }
        assertTrue(citations >= 20, "the demo cites its sources by author and year: " + citations);
    }

    @Test
    void everyListedReferenceIsTheBibliographysOwnAndListedOnce() {
        List<String> listed = listed();
        assertEquals(listed.size(), new java.util.HashSet<>(listed).size());
        for (String citation : listed) {
            assertTrue(Bibliography.standard().entries().stream().anyMatch(e -> e.reference().citation().equals(citation)),
                    citation);
        }
        for (ReportSection s : report.sections()) {
            for (Reference r : s.references()) {
                assertTrue(Bibliography.standard().entryOf(r).isPresent(), s.title() + " lists " + r.citation());
            }
        }
    }

    @Test
    void everyMethodTheTextNamesHasItsSourcesListed() {
        List<String> listed = listed();
        List<List<String>> rows = table("method-sources").rows();
        List<String> named = new ArrayList<>();
        for (ReportSection s : citingSections()) {
            Citations.texts(s, text -> {
                for (Map.Entry<String, Pattern> m : METHODS.entrySet()) {
                    Matcher at = m.getValue().matcher(text);
                    if (!at.find()) {
                        continue;
                    }
                    Bibliography.Method known = Bibliography.standard().methods().stream()
                            .filter(k -> overlaps(k.pattern().matcher(text), at.start(), at.end())).findFirst()
                            .orElse(null);
                    assertTrue(known != null, s.title() + " names " + m.getKey() + " without a source: " + text);
                    assertTrue(rows.stream().anyMatch(r -> r.get(0).equals(known.name())
                            && r.get(2).contains(s.title())), known.name() + " is listed as used in " + s.title());
                    for (String key : known.sources()) {
                        assertTrue(listed.contains(Bibliography.get(key).citation()), known.name() + ": " + key);
                    }
                    if (!named.contains(m.getKey())) {
                        named.add(m.getKey());
                    }
                }
            });
        }
        for (String expected : List.of("Welch", "Holm", "Games–Howell", "Fieller", "TOST", "GUM", "ISO 13528",
                "Kaplan–Meier", "ROS", "Thompson–Howarth", "RMA", "Westgard", "Currie", "EPA MDL")) {
            assertTrue(named.contains(expected), "the demo names " + expected + ": " + named);
        }
    }

    /** Whether a match of {@code m} overlaps the span [start, end): the two patterns name the same words. */
    private static boolean overlaps(Matcher m, int start, int end) {
        while (m.find()) {
            if (m.start() < end && start < m.end()) {
                return true;
            }
        }
        return false;
    }

    @Test
    void noTextHedgesAboutAReference() {
        for (ReportSection s : report.sections()) {
            Citations.texts(s, text -> {
                String lower = text.toLowerCase(Locale.ROOT);
                for (String hedge : HEDGES) {
                    assertFalse(lower.contains(hedge), s.title() + " says \"" + hedge + "\": " + text);
                }
            });
        }
    }

    @Test
    void summaryJsonCountsNothingWithoutAReference() throws IOException {
        assertTrue(methods.blocks().stream().noneMatch(b -> b instanceof ReportBlock.Callout c
                && c.level() == ReportBlock.Level.WARN), "no warning in Methods and references");
        JsonNode json = new ObjectMapper().readTree(SummaryJson.toJson(report));
        JsonNode headlines = json.path("sections").path(MethodsSection.ID).path("headlines");
        assertEquals(0, headlines.path("citationsWithoutReference").asInt(-1), headlines.toString());
        assertEquals(listed().size(), headlines.path("references").asInt());
        assertEquals(table("method-sources").rows().size(), headlines.path("methodsNamed").asInt());
    }
}
