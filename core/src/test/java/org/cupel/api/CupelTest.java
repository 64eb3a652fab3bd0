package org.cupel.api;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import org.cupel.assay.QcRole;
import org.cupel.config.ConfigException;
import org.cupel.control.crm.CrmReview;
import org.cupel.demo.DemoOnDisk;
import org.cupel.duplicates.DuplicateReport;
import org.cupel.duplicates.DuplicateSetResult;
import org.cupel.project.BatchSelection;
import org.cupel.project.DataIssue;
import org.cupel.project.InputException;
import org.cupel.recovery.ConditionRecovery;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The Java entry point on the demo project read from disk, as a user's code reads it: each analysis is the one
 * its core class computes, is computed once, and is the same whether asked for one by one or side by side;
 * settings given in code reach the analyses as user settings; narrowing to batches narrows every analysis.
 */
class CupelTest {
    @TempDir
    static Path demo;

    @BeforeAll
    static void writeDemo() throws IOException {
        DemoOnDisk.write(demo);
    }

    @Test
    void eachAnalysisIsComputedOnceAndIsTheCoreClassResult() {
        Cupel cupel = Cupel.open(demo);
        assertSame(cupel.crm(), cupel.crm());
        assertSame(cupel.duplicates(), cupel.duplicates());
        CrmReview direct = CrmReview.of(cupel.project());
        assertEquals(direct.failures(), cupel.crm().failures());
        assertEquals(direct.warnings(), cupel.crm().warnings());
        assertEquals(direct.swaps(), cupel.crm().swaps());
        assertEquals(direct.series().size(), cupel.crm().series().size());
        assertSame(cupel.batches().blanks(), cupel.blanks());
        assertTrue(cupel.recovery().isPresent(), "the demo has testwork");
        assertThrows(UnsupportedOperationException.class, () -> cupel.duplicates().clear());
    }

    /** Side by side on threads, or one at a time on the caller's thread: the same numbers (each is deterministic). */
    @Test
    void analyseAllGivesTheResultsOfTheAnalysesAskedOneByOne() {
        Cupel together = Cupel.open(demo);
        assertEquals(List.of("crm", "batches", "censored", "duplicates", "recovery"),
                List.copyOf(together.analyseAll().keySet()));
        Cupel oneByOne = Cupel.open(demo);
        assertEquals(oneByOne.crm().failures(), together.crm().failures());
        assertEquals(oneByOne.batches().verdicts(), together.batches().verdicts());
        assertEquals(oneByOne.censored().stream().map(c -> c.below()).toList(),
                together.censored().stream().map(c -> c.below()).toList());
        assertEquals(rmsCvs(oneByOne.duplicates()), rmsCvs(together.duplicates()));
        assertEquals(oneByOne.recovery().orElseThrow().conditions().stream().map(ConditionRecovery::mean).toList(),
                together.recovery().orElseThrow().conditions().stream().map(ConditionRecovery::mean).toList());
    }

    private static List<Double> rmsCvs(List<DuplicateReport> reports) {
        return reports.stream().flatMap(r -> r.sets().stream()).map(s -> s.precision().rmsCv().value()).toList();
    }

    /** The default pulp HARD limit is 10 % (DuplicateSettings); 5 % given in code is used and labelled a user's. */
    @Test
    void settingsGivenInCodeReachTheAnalysesAsUserSettings() {
        String key = "duplicates.pulpHardLimitPercent";
        Cupel defaults = Cupel.open(demo);
        assertFalse(defaults.project().config().isUserSet(key));
        assertEquals(List.of(0.10, 0.10), pulpHardLimits(defaults));

        Cupel strict = Cupel.open(demo, s -> s.toBuilder()
                .duplicates(s.duplicates().toBuilder().pulpHardLimitPercent(5).build()).build());
        assertEquals(5, strict.settings().duplicates().pulpHardLimitPercent());
        assertTrue(strict.project().config().isUserSet(key));
        assertEquals(List.of(0.05, 0.05), pulpHardLimits(strict));
    }

    private static List<Double> pulpHardLimits(Cupel cupel) {
        return cupel.duplicates(null, QcRole.PULP_DUPLICATE).stream().flatMap(r -> r.sets().stream())
                .map(DuplicateSetResult::precision).map(p -> p.hardLimit()).toList();
    }

    @Test
    void selectNarrowsEveryAnalysisAndRefusesAnEmptySelection() {
        Cupel all = Cupel.open(demo);
        assertSame(all, all.select(BatchSelection.ALL));
        String first = all.project().samples().batches().get(0).id();
        Cupel one = all.select(new BatchSelection(null, null, Set.of(first)));
        assertTrue(one.project().samples().size() < all.project().samples().size());
        assertEquals(List.of(first), one.batches().verdicts().stream().map(v -> v.batch()).distinct().toList());
        assertSame(all.recovery(), one.recovery(), "the testwork is not tied to batches");
        InputException e = assertThrows(InputException.class,
                () -> all.select(new BatchSelection(null, null, Set.of("NO-SUCH-BATCH"))));
        assertTrue(e.getMessage().startsWith("no samples in "), e.getMessage());
    }

    /** open refuses a setting out of range; inspect (cupel check) lists it as a fatal entry instead. */
    @Test
    void inspectListsWhatOpenRefuses(@TempDir Path dir) throws IOException {
        DemoOnDisk.write(dir);
        Files.writeString(dir.resolve("cupel.yaml"), "duplicates:\n  pulpHardLimitPercent: 500\n");
        assertThrows(ConfigException.class, () -> Cupel.open(dir));
        List<DataIssue> fatal = Cupel.inspect(dir).exceptions().withSeverity(DataIssue.Severity.FATAL);
        assertEquals(1, fatal.size(), fatal.toString());
        assertTrue(fatal.get(0).problem().contains("pulpHardLimitPercent"), fatal.get(0).problem());
    }
}
