package org.cupel.robust;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.DynamicTest.dynamicTest;

import java.util.List;
import java.util.stream.LongStream;
import java.util.stream.Stream;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.TestFactory;

/**
 * Guarantee 2 (issues 9 and 15) over fuzzed projects: whatever damage a lab file, the register or the
 * catalog suffers (ragged rows, mixed decimal marks and a missing or misnamed register among them), every
 * row read is analysed or listed as excluded. The named cases (duplicate sample IDs, a duplicate whose
 * original is missing, a CRM code not in the catalog, a result without a register entry) are asserted line
 * by line in {@code org.cupel.ingest.ProjectLoaderTest#plantedProblemsAreListed}. A failure prints the
 * case's seed, damage and input.
 */
class NoSilentLossProperties {
    private static final List<FuzzTarget> PROJECT_FILES = List.of(FuzzTarget.LAB_FILE_CHECK,
            FuzzTarget.REGISTER_CHECK, FuzzTarget.CATALOG);

    @TestFactory
    Stream<DynamicTest> everyRowReadIsAnalysedOrListed() {
        long first = CliFuzzProperties.SEED + 2_000_000;
        return LongStream.range(first, first + 100).mapToObj(seed -> FuzzCase.damaged(seed, PROJECT_FILES))
                .map(c -> dynamicTest(c.title(), () -> assertEquals(0, RowAccounting.unaccountedRows(c),
                        () -> "rows unaccounted in " + c.describe())));
    }
}
