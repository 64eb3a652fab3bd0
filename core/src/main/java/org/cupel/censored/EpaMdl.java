package org.cupel.censored;

import java.util.Arrays;
import org.apache.commons.math3.stat.StatUtils;
import org.cupel.assay.Numbers;

/**
 * The two method detection limits of US EPA, 40 CFR Part 136 Appendix B, "Definition and procedure for the
 * determination of the method detection limit — Revision 2" (82 FR 40836, 2017): the MDL is the greater of
 * <ul>
 * <li>MDL_s, from at least seven low-level spiked samples: {@code MDL_s = t(n − 1, 0.99)·s_s}, s_s their SD;</li>
 * <li>MDL_b, from at least seven method blanks, by how many gave a numerical result (§ II(2)(b)):
 *     none — MDL_b does not apply; all — {@code MDL_b = X̄ + t(n − 1, 0.99)·s_b}, with zero in place of a
 *     negative mean X̄; some but not all — the highest numerical blank result, or with 100 blanks or more the
 *     blank of rank round(0.99·n) in ascending order (the 99th percentile).</li>
 * </ul>
 * The definition and the initial estimate "mean plus three times the SD of method blanks" were checked against the
 * published text; the details of § II(2)(b) and the year of the Federal Register notice are recalled from memory.
 * A value below detection ({@code <DL}) has no number, the regulation's "ND": it counts among the n blanks and
 * ranks below every numerical result at or above its limit (it is placed at its limit, below an equal detect).
 * A value above range ranks above every other. Applied to blanks, the spiked-sample formula omits the blank mean
 * and so understates the limit whenever the blanks read above zero.
 */
final class EpaMdl {
    /** Replicates the procedure asks for, spiked samples and method blanks alike. */
    public static final int MIN_REPLICATES = 7;
    /** From this many blanks the 99th percentile replaces the highest result. */
    public static final int PERCENTILE_BLANKS = 100;
    public static final String SOURCE = "US EPA, 40 CFR Part 136 Appendix B, Revision 2";

    private EpaMdl() {
    }

    /** MDL_s = t(n − 1, 0.99)·s, from replicate spiked samples. */
    public static BlankLimits.LimitEstimate spiked(int n, Estimate sd) {
        String rule = "t(n − 1, 0.99)·s for low-level spiked samples; from blanks it leaves out the blank mean";
        if (!sd.isAvailable()) {
            return new BlankLimits.LimitEstimate("EPA MDL_s", Estimate.unavailable(sd.note()), rule, SOURCE);
        }
        double t = BlankLimits.tQuantile(n - 1, 0.99);
        return new BlankLimits.LimitEstimate("EPA MDL_s", Estimate.of(t * sd.value(), join(sd.note(), fewNote(n))),
                rule + "; t = " + Numbers.compact(Math.round(t * 1000) / 1000.0), SOURCE);
    }

    /** MDL_b from method blanks, the case chosen by how many gave a numerical result. */
    public static BlankLimits.LimitEstimate blanks(CensoredSample s) {
        int n = s.size();
        int numerical = s.count(Censoring.DETECTED);
        if (numerical == 0) {
            return new BlankLimits.LimitEstimate("EPA MDL_b", Estimate.unavailable("no blank gave a numerical "
                    + "result, so MDL_b does not apply (§ II(2)(b)(i)); the limit rests on spiked samples"),
                    "none of the blanks numerical", SOURCE);
        }
        if (numerical == n) {
            if (n < 2) {
                return new BlankLimits.LimitEstimate("EPA MDL_b", Estimate.unavailable("one blank: no SD"),
                        "X̄ + t(n − 1, 0.99)·s_b", SOURCE);
            }
            double[] x = s.detects();
            double mean = StatUtils.mean(x);
            double sd = Math.sqrt(StatUtils.variance(x));
            double t = BlankLimits.tQuantile(n - 1, 0.99);
            return new BlankLimits.LimitEstimate("EPA MDL_b", Estimate.of(Math.max(mean, 0) + t * sd, fewNote(n)),
                    "every blank numerical: X̄ + t(n − 1, 0.99)·s_b (zero for a negative mean), t = "
                            + Numbers.compact(Math.round(t * 1000) / 1000.0), SOURCE);
        }
        return ranked(s, n, numerical);
    }

    /** Some blanks without a number: the highest numerical result, or the 99th percentile from 100 blanks. */
    private static BlankLimits.LimitEstimate ranked(CensoredSample s, int n, int numerical) {
        String counts = numerical + " of " + n + " blanks numerical";
        if (n < PERCENTILE_BLANKS) {
            double[] x = s.detects();
            return new BlankLimits.LimitEstimate("EPA MDL_b", Estimate.of(x[x.length - 1], fewNote(n)),
                    counts + ": the highest numerical blank result", SOURCE);
        }
        int rank = (int) Math.round(0.99 * n);
        Ranked r = rankedValue(s, rank);
        String rule = counts + ": the blank of rank " + rank + " of " + n + " (round(0.99·n), the 99th percentile)";
        String note = switch (r.kind()) {
            case BELOW -> "the blank of that rank is below detection at " + Numbers.compact(r.value())
                    + ": MDL_b is at most that limit";
            case ABOVE -> "the blank of that rank is above range at " + Numbers.compact(r.value())
                    + ": MDL_b is above that limit";
            default -> "";
        };
        return new BlankLimits.LimitEstimate("EPA MDL_b", Estimate.of(r.value(), note), rule, SOURCE);
    }

    private record Ranked(double value, Censoring kind) {
    }

    /** The observation of 1-based {@code rank} in ascending order, values below detection placed at their limit. */
    static Ranked rankedValue(CensoredSample s, int rank) {
        int n = s.size();
        double[] key = new double[n];
        Censoring[] kind = new Censoring[n];
        Integer[] order = new Integer[n];
        for (int i = 0; i < n; i++) {
            kind[i] = s.kind(i);
            key[i] = switch (kind[i]) {
                case BELOW -> s.upper(i);
                case ABOVE -> Double.POSITIVE_INFINITY;
                default -> s.lower(i);
            };
            order[i] = i;
        }
        // Equal keys: a value below a limit lies under a detect at that limit; above-range values last by limit.
        Arrays.sort(order, (a, b) -> {
            int c = Double.compare(key[a], key[b]);
            if (c != 0) {
                return c;
            }
            if (kind[a] == Censoring.ABOVE && kind[b] == Censoring.ABOVE) {
                return Double.compare(s.lower(a), s.lower(b));
            }
            return Boolean.compare(kind[a] != Censoring.BELOW, kind[b] != Censoring.BELOW);
        });
        int i = order[rank - 1];
        return new Ranked(kind[i] == Censoring.ABOVE ? s.lower(i) : key[i], kind[i]);
    }

    private static String join(String a, String b) {
        return a.isEmpty() ? b : b.isEmpty() ? a : a + "; " + b;
    }

    private static String fewNote(int n) {
        return n < MIN_REPLICATES ? "only " + n + " replicates; the procedure asks for at least " + MIN_REPLICATES : "";
    }
}
