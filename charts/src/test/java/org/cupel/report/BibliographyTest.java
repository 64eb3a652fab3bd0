package org.cupel.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;

/** The one bibliography: complete entries, one per source, each found by the way the text cites it. */
class BibliographyTest {
    private static final Bibliography B = Bibliography.standard();

    private static Bibliography read(String yaml) throws IOException {
        return Bibliography.read(new ByteArrayInputStream(yaml.getBytes(StandardCharsets.UTF_8)));
    }

    @Test
    void everyEntryIsComplete() {
        assertFalse(B.entries().isEmpty());
        for (Bibliography.Entry e : B.entries()) {
            Reference r = e.reference();
            assertFalse(r.authors().isBlank() || r.title().isBlank() || e.shortForm().isBlank(), e.key());
            assertTrue(r.year() > 0 || r.publication().startsWith("https://"),
                    e.key() + ": a year, or the address of the undated page");
            assertTrue(r.year() == 0 || e.shortForm().contains(String.valueOf(r.year())),
                    e.key() + ": the short form gives the year: " + e.shortForm());
        }
    }

    @Test
    void noTwoEntriesShareAuthorsAndYearOrTitleOrShortForm() {
        Set<String> authorsYear = new HashSet<>();
        Set<String> titles = new HashSet<>();
        Set<String> shortForms = new HashSet<>();
        for (Bibliography.Entry e : B.entries()) {
            Reference r = e.reference();
            assertTrue(authorsYear.add(Bibliography.normalise(r.authors()) + " " + r.year()), e.key());
            assertTrue(titles.add(Bibliography.normalise(r.title())), e.key());
            assertTrue(shortForms.add(e.shortForm()), e.key());
        }
    }

    /** Each dated entry is found by its first author (as the text writes it) and year, and by nothing else. */
    @Test
    void eachEntryIsFoundByTheWayTheTextCitesIt() {
        for (Bibliography.Entry e : B.entries()) {
            if (e.reference().year() > 0) {
                assertEquals(List.of(e), B.resolve(new Citations.Cited(e.citedAs(), e.reference().year())), e.key());
            }
        }
    }

    @Test
    void everyMethodCitesEntriesThatExist() {
        assertFalse(B.methods().isEmpty());
        for (Bibliography.Method m : B.methods()) {
            assertFalse(m.sources().isEmpty(), m.name() + " has a source");
            m.sources().forEach(k -> assertTrue(B.entry(k).isPresent(), m.name() + ": " + k));
        }
    }

    @Test
    void methodNamesAreFoundAsTheTextWritesThem() {
        assertTrue(method("Welch t-test").pattern().matcher("Welch p").find());
        assertFalse(method("Holm step-down").pattern().matcher("Holmwood Assay").find(), "a whole word");
        assertTrue(method("Games–Howell").pattern().matcher("Games-Howell p").find(), "either dash");
        assertTrue(method("Kaplan–Meier").pattern().matcher("Kaplan–Meier: probability").find());
        assertTrue(method("Reduced major axis").pattern().matcher("Reduced major axis after Miller").find());
        assertTrue(method("Maximum-likelihood").pattern().matcher("MLE lognormal").find());
    }

    private static Bibliography.Method method(String prefix) {
        return B.methods().stream().filter(m -> m.name().startsWith(prefix)).findFirst().orElseThrow();
    }

    /** The case the report once had: one paper filed twice, in two places, with different details. */
    @Test
    void aSecondEntryForOneSourceIsRefused() {
        String shaw = "    authors: Shaw, W. J.\n    year: 1997\n    title: Validation of sampling and assaying quality\n";
        IllegalStateException twice = assertThrows(IllegalStateException.class, () -> read("entries:\n"
                + "  - key: shaw1997\n    short: Shaw 1997\n" + shaw + "    publication: AusIMM, Melbourne\n"
                + "  - key: shaw1997b\n    short: Shaw 1997b\n" + shaw + "    publication: AusIMM, Wollongong\n"));
        assertTrue(twice.getMessage().contains("same authors and year"), twice.getMessage());
        IllegalStateException title = assertThrows(IllegalStateException.class, () -> read("entries:\n"
                + "  - key: a\n    short: A 2001\n    authors: A, B.\n    year: 2001\n    title: One title\n"
                + "  - key: b\n    short: C 2002\n    authors: C, D.\n    year: 2002\n    title: One  Title\n"));
        assertTrue(title.getMessage().contains("same title"), title.getMessage());
    }

    @Test
    void aMethodCitingAKeyWithoutEntryOrAnEntryWithoutAFieldIsRefused() {
        IllegalStateException unknown = assertThrows(IllegalStateException.class, () -> read("entries: []\n"
                + "methods:\n  - name: Welch t\n    pattern: 'Welch'\n    sources: [welch1974]\n"));
        assertTrue(unknown.getMessage().contains("welch1974, which has no entry"), unknown.getMessage());
        IllegalStateException noTitle = assertThrows(IllegalStateException.class, () -> read("entries:\n"
                + "  - key: a\n    short: A 2001\n    authors: A, B.\n    year: 2001\n"));
        assertTrue(noTitle.getMessage().contains("a has no title"), noTitle.getMessage());
        IllegalStateException undated = assertThrows(IllegalStateException.class, () -> read("entries:\n"
                + "  - key: a\n    short: A\n    authors: A\n    year: 0\n    title: T\n    publication: a book\n"));
        assertTrue(undated.getMessage().contains("needs its web address"), undated.getMessage());
    }

    /** docs/references.md says how each entry was checked; an entry without that line is not finished. */
    @Test
    void everyEntryHasItsCheckInDocsReferences() throws IOException {
        Path doc = Path.of("..", "docs", "references.md");
        assertTrue(Files.isRegularFile(doc), "docs/references.md exists beside the modules");
        String text = Files.readString(doc);
        for (Bibliography.Entry e : B.entries()) {
            assertTrue(text.contains("`" + e.key() + "`"), "docs/references.md has a line for " + e.key());
        }
    }
}
