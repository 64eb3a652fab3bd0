package org.cupel.control.crm;

import java.util.AbstractList;
import java.util.ArrayList;
import java.util.List;
import java.util.RandomAccess;
import org.cupel.control.Verdict;

/**
 * The results of a {@link SeriesReview} as an unmodifiable list whose fields can be read by index: those the
 * review judged are columns ({@link #judged}: z, running mean, the bits of the rules completed, verdict, re-assay
 * flag and swap); others are the objects given. A {@link CrmResult} with its point is made when an element is
 * read.
 */
abstract class CrmResults extends AbstractList<CrmResult> implements RandomAccess {
    private static final CrmRule[] RULES = CrmRule.values();
    private static final List<String> SWAP = List.of(CrmReview.SWAP_RULE);
    private static final Verdict[] VERDICTS = Verdict.values();
    private static final int REASSAY = 0x10;

    int row(int i) {
        return get(i).point().row();
    }

    double z(int i) {
        return get(i).z();
    }

    Verdict verdict(int i) {
        return get(i).verdict();
    }

    boolean isSwap(int i) {
        return get(i).isSwap();
    }

    boolean triggersReassay(int i) {
        return get(i).triggersReassay();
    }

    /** The rule of the result's outcome ({@link CrmResult#outcome}). */
    String rule(int i) {
        return ruleText(get(i).rules());
    }

    static String ruleText(List<String> rules) {
        return rules.size() == 1 ? rules.get(0) : String.join(", ", rules);
    }

    /** {@code results} as they are when already this kind of list, else an unmodifiable copy. */
    static CrmResults of(List<CrmResult> results) {
        return results instanceof CrmResults r ? r : new Listed(List.copyOf(results));
    }

    /**
     * The column byte of a judged result: its verdict and whether it triggers a re-assay.
     */
    static byte code(Verdict verdict, boolean reassay) {
        return (byte) (verdict.ordinal() | (reassay ? REASSAY : 0));
    }

    /**
     * The results of one series from the review's columns.
     *
     * @param points the series' points
     * @param z each result's z
     * @param runningMean each result's running mean of the judged results up to it
     * @param ruleBits each result's rules completed, bit {@code 1 << ordinal} of {@link CrmRule}
     * @param codes each result's {@link #code}
     * @param swaps each result's swap label, empty when none; {@code null} when the series has no swap
     * @param wording the series' words for a result's reason
     */
    static CrmResults judged(PointList points, double[] z, double[] runningMean, int[] ruleBits, byte[] codes,
                             String[] swaps, ResultWording wording) {
        return new Judged(points, z, runningMean, ruleBits, codes, swaps, wording);
    }

    /**
     * The rule ids of a judged result that completed the rules {@code ruleBits}, listed in the order they are
     * found: the within-series rules in {@link CrmRule} order, then R₄s.
     */
    static List<String> ruleIds(int ruleBits) {
        if (ruleBits == 0) {
            return AnalyteJudgement.NO_RULE;
        }
        List<String> ids = new ArrayList<>();
        for (CrmRule r : RULES) {
            if (r != CrmRule.W_R_4S && (ruleBits & 1 << r.ordinal()) != 0) {
                ids.add(r.id());
            }
        }
        if ((ruleBits & 1 << CrmRule.W_R_4S.ordinal()) != 0) {
            ids.add(CrmRule.W_R_4S.id());
        }
        return ids;
    }

    private static final class Listed extends CrmResults {
        private final List<CrmResult> results;

        Listed(List<CrmResult> results) {
            this.results = results;
        }

        @Override
        public CrmResult get(int i) {
            return results.get(i);
        }

        @Override
        public int size() {
            return results.size();
        }
    }

    private static final class Judged extends CrmResults {
        private final PointList points;
        private final double[] z;
        private final double[] runningMean;
        private final int[] ruleBits;
        private final byte[] codes;
        private final String[] swaps;
        private final ResultWording wording;

        Judged(PointList points, double[] z, double[] runningMean, int[] ruleBits, byte[] codes, String[] swaps,
               ResultWording wording) {
            this.points = points;
            this.z = z;
            this.runningMean = runningMean;
            this.ruleBits = ruleBits;
            this.codes = codes;
            this.swaps = swaps;
            this.wording = wording;
        }

        @Override
        public CrmResult get(int i) {
            return new CrmResult(points.get(i), z[i], ZBand.of(z[i]), runningMean[i], verdict(i), rules(i),
                    triggersReassay(i), swapWith(i), wording);
        }

        @Override
        public int size() {
            return z.length;
        }

        private String swapWith(int i) {
            return swaps == null ? "" : swaps[i];
        }

        private List<String> rules(int i) {
            return isSwap(i) ? SWAP : ruleIds(ruleBits[i]);
        }

        @Override
        int row(int i) {
            return points.row(i);
        }

        @Override
        double z(int i) {
            return z[i];
        }

        @Override
        Verdict verdict(int i) {
            return VERDICTS[codes[i] & (REASSAY - 1)];
        }

        @Override
        boolean isSwap(int i) {
            return !swapWith(i).isEmpty();
        }

        @Override
        boolean triggersReassay(int i) {
            return (codes[i] & REASSAY) != 0;
        }

        @Override
        String rule(int i) {
            return ruleText(rules(i));
        }
    }
}
