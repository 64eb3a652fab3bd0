package org.cupel.robust;

import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.DynamicTest.dynamicTest;

import java.util.List;
import java.util.stream.LongStream;
import java.util.stream.Stream;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.TestFactory;

/**
 * Guarantee 1 (issues 9 and 15), bounded for CI: every reader, reached through the command line, on damaged
 * copies of well-formed files (and on random bytes), ends with a result or exit code 2 and one clear line
 * naming the file. Each case is made from its own seed ({@link FuzzCase}); a failure prints the seed, the
 * damage and the input. The long run with many more inputs is {@link LongFuzzRun} (docs/robustness.md).
 */
class CliFuzzProperties {
    /** Case {@code i} of a property is made from seed {@code SEED + i}. */
    static final long SEED = 20_261_202_000L;
    private static final List<FuzzTarget> TARGETS = List.of(FuzzTarget.values());

    @TestFactory
    Stream<DynamicTest> damagedInputEndsInAResultOrAClearInputError() {
        return cases(120, SEED, seed -> FuzzCase.damaged(seed, TARGETS));
    }

    @TestFactory
    Stream<DynamicTest> randomBytesEndInAResultOrAClearInputError() {
        return cases(40, SEED + 1_000_000, seed -> FuzzCase.randomBytes(seed, TARGETS, 3000));
    }

    private static Stream<DynamicTest> cases(int tries, long first, java.util.function.LongFunction<FuzzCase> make) {
        return LongStream.range(first, first + tries).mapToObj(make).map(c -> dynamicTest(c.title(), () -> {
            String problem = FuzzCheck.problem(c);
            assertNull(problem, () -> c.describe() + "\n=> " + problem);
        }));
    }
}
