package org.cupel.robust;

import static org.junit.jupiter.api.Assertions.assertNull;

import java.io.IOException;
import java.util.List;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;

/**
 * Guarantee 1 (issue 9), bounded for CI: every reader, reached through the command line, on damaged copies
 * of well-formed files, ends with a result or exit code 2 and one clear line naming the file. The long run
 * with many more inputs is {@link LongFuzzRun} (docs/robustness.md).
 */
class CliFuzzProperties {

    @Provide
    Arbitrary<byte[]> rawBytes() {
        return Arbitraries.bytes().array(byte[].class).ofMaxSize(3000);
    }

    @Property(tries = 120, seed = "20261202")
    void damagedInputEndsInAResultOrAClearInputError(@ForAll FuzzTarget target,
                                                     @ForAll("mutations") List<Mutation> damage) throws IOException {
        assertNull(FuzzCheck.problem(target, Mutation.applyAll(target.seed(), damage)));
    }

    @Property(tries = 40, seed = "20261202")
    void randomBytesEndInAResultOrAClearInputError(@ForAll FuzzTarget target, @ForAll("rawBytes") byte[] content)
            throws IOException {
        assertNull(FuzzCheck.problem(target, content));
    }

    @Provide
    Arbitrary<List<Mutation>> mutations() {
        return Mutation.some();
    }
}
