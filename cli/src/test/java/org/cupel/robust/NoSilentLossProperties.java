package org.cupel.robust;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.util.List;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;

/**
 * Guarantee 2 (issue 9) over fuzzed projects: whatever damage a lab file, the register or the catalog
 * suffers, every row read is analysed or listed as excluded. The named cases (duplicate sample IDs, a
 * duplicate whose original is missing, a CRM code not in the catalog, a result without a register entry)
 * are asserted line by line in {@code org.cupel.ingest.ProjectLoaderTest#plantedProblemsAreListed}.
 */
class NoSilentLossProperties {

    @Provide
    Arbitrary<FuzzTarget> projectFiles() {
        return Arbitraries.of(FuzzTarget.LAB_FILE_CHECK, FuzzTarget.REGISTER_CHECK, FuzzTarget.CATALOG);
    }

    @Provide
    Arbitrary<List<Mutation>> mutations() {
        return Mutation.some();
    }

    @Property(tries = 100, seed = "20261202")
    void everyRowReadIsAnalysedOrListed(@ForAll("projectFiles") FuzzTarget target,
                                        @ForAll("mutations") List<Mutation> damage) throws IOException {
        assertEquals(0, RowAccounting.unaccountedRows(target, Mutation.applyAll(target.seed(), damage)));
    }
}
