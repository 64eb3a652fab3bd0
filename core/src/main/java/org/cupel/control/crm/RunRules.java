package org.cupel.control.crm;

import java.util.ArrayList;
import java.util.List;
import java.util.function.DoublePredicate;
import org.cupel.assay.LimitComparison;

/**
 * Evaluates the {@link CrmRule run rules} on a sequence of z-scores in series order. The edge cases
 * (strict limits, what "in a row" means, which points are flagged) are set out on {@link CrmRule}. Every
 * comparison of z with ±1, ±2 or ±3 goes through {@link LimitComparison}, so a result exactly on a limit
 * in its reported decimals is on it, whatever the last bit of the computed z.
 */
final class RunRules {
    private RunRules() {
    }

    /**
     * Every firing of {@code rule} on {@code z}.
     *
     * @param z z-scores in series order
     * @param batch batch number of each result (only {@link CrmRule#W_R_4S} reads it)
     */
    public static List<RuleViolation> evaluate(CrmRule rule, double[] z, int[] batch) {
        switch (rule) {
            case W_1_2S: return single(rule, z, 2);
            case W_1_3S: case WE_1: case N_1: return single(rule, z, 3);
            case W_2_2S: return sameSideInARow(rule, z, 2, 2);
            case W_R_4S: return rangeWithinBatch(rule, z, batch);
            case W_4_1S: return sameSideInARow(rule, z, 4, 1);
            case W_10_X: return sameSideInARow(rule, z, 10, 0);
            case WE_2: case N_5: return kOfM(rule, z, 2, 3, 2);
            case WE_3: case N_6: return kOfM(rule, z, 4, 5, 1);
            case WE_4: return sameSideInARow(rule, z, 8, 0);
            case N_2: return sameSideInARow(rule, z, 9, 0);
            case N_3: return trend(rule, z, 6);
            case N_4: return alternating(rule, z, 14);
            case N_7: return inARow(rule, z, 15, v -> LimitComparison.within(v, 1));
            case N_8: return inARow(rule, z, 8, v -> LimitComparison.beyond(v, 1));
            default: throw new IllegalStateException("no evaluation for " + rule);
        }
    }

    private static List<RuleViolation> single(CrmRule rule, double[] z, double limit) {
        List<RuleViolation> out = new ArrayList<>();
        for (int i = 0; i < z.length; i++) {
            if (LimitComparison.beyond(z[i], limit)) {
                out.add(new RuleViolation(rule, i, List.of(i)));
            }
        }
        return out;
    }

    /** {@code n} in a row beyond {@code +limit}, or {@code n} in a row beyond {@code −limit}. */
    private static List<RuleViolation> sameSideInARow(CrmRule rule, double[] z, int n, double limit) {
        List<RuleViolation> out = new ArrayList<>(inARow(rule, z, n, v -> LimitComparison.above(v, limit)));
        out.addAll(inARow(rule, z, n, v -> LimitComparison.below(v, -limit)));
        out.sort((a, b) -> Integer.compare(a.signal(), b.signal()));
        return out;
    }

    private static List<RuleViolation> inARow(CrmRule rule, double[] z, int n, DoublePredicate holds) {
        List<RuleViolation> out = new ArrayList<>();
        int run = 0;
        for (int i = 0; i < z.length; i++) {
            run = holds.test(z[i]) ? run + 1 : 0;
            if (run >= n) {
                out.add(new RuleViolation(rule, i, range(i - n + 1, i)));
            }
        }
        return out;
    }

    /** At least {@code k} of the {@code m} results ending at i beyond {@code limit} on the side of result i. */
    private static List<RuleViolation> kOfM(CrmRule rule, double[] z, int k, int m, double limit) {
        List<RuleViolation> out = new ArrayList<>();
        for (int i = m - 1; i < z.length; i++) {
            double side = LimitComparison.above(z[i], limit) ? 1 : LimitComparison.below(z[i], -limit) ? -1 : 0;
            if (side == 0) {
                continue;
            }
            List<Integer> hits = new ArrayList<>();
            for (int j = i - m + 1; j <= i; j++) {
                if (LimitComparison.above(side * z[j], limit)) {
                    hits.add(j);
                }
            }
            if (hits.size() >= k) {
                out.add(new RuleViolation(rule, i, hits));
            }
        }
        return out;
    }

    /** {@code n} results in a row each strictly above (or each strictly below) the one before. */
    private static List<RuleViolation> trend(CrmRule rule, double[] z, int n) {
        List<RuleViolation> out = new ArrayList<>();
        int up = 1;
        int down = 1;
        for (int i = 1; i < z.length; i++) {
            up = z[i] > z[i - 1] ? up + 1 : 1;
            down = z[i] < z[i - 1] ? down + 1 : 1;
            if (up >= n || down >= n) {
                out.add(new RuleViolation(rule, i, range(i - n + 1, i)));
            }
        }
        return out;
    }

    /** {@code n} results in a row whose successive differences alternate in sign (no tie). */
    private static List<RuleViolation> alternating(CrmRule rule, double[] z, int n) {
        List<RuleViolation> out = new ArrayList<>();
        int run = 1;
        double previousStep = 0;
        for (int i = 1; i < z.length; i++) {
            double step = Math.signum(z[i] - z[i - 1]);
            if (step == 0) {
                run = 1;
            } else if (previousStep != 0 && step != previousStep) {
                run++;
            } else {
                run = 2;
            }
            previousStep = step;
            if (run >= n) {
                out.add(new RuleViolation(rule, i, range(i - n + 1, i)));
            }
        }
        return out;
    }

    /**
     * Westgard R₄s within one batch: a result above +2 SD and another below −2 SD in the same batch. The
     * signal is the later of the two extreme results; both are involved. Results need not be adjacent.
     * Results of one batch are contiguous in series order, so only the current batch is searched.
     */
    private static List<RuleViolation> rangeWithinBatch(CrmRule rule, double[] z, int[] batch) {
        List<RuleViolation> out = new ArrayList<>();
        int batchStart = 0;
        int lastHigh = -1;
        int lastLow = -1;
        for (int i = 0; i < z.length; i++) {
            if (i > 0 && batch[i] != batch[i - 1]) {
                batchStart = i;
                lastHigh = -1;
                lastLow = -1;
            }
            boolean high = LimitComparison.above(z[i], 2);
            boolean low = LimitComparison.below(z[i], -2);
            int opposite = high ? lastLow : low ? lastHigh : -1;
            if (opposite >= batchStart && opposite >= 0) {
                out.add(new RuleViolation(rule, i, List.of(opposite, i)));
            }
            if (high && lastHigh < 0) {
                lastHigh = i;
            } else if (low && lastLow < 0) {
                lastLow = i;
            }
        }
        return out;
    }

    private static List<Integer> range(int from, int to) {
        List<Integer> r = new ArrayList<>(to - from + 1);
        for (int i = from; i <= to; i++) {
            r.add(i);
        }
        return r;
    }
}
