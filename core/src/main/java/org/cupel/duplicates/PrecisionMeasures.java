package org.cupel.duplicates;

import java.util.function.Function;
import org.cupel.assay.LimitComparison;
import org.cupel.assay.QcRole;

/** Computes a {@link PrecisionSummary} from screened pairs: HARD acceptance, average CV, repeatability. */
final class PrecisionMeasures {
    /** ISO 5725-6 factor 2.8 ≈ 1.96·√2: the repeatability limit r = 2.8·s_r. */
    public static final double REPEATABILITY_FACTOR = 2.8;
    /** Ranges this short are finished by insertion sort: a Thompson–Howarth group of 11 never partitions. */
    private static final int INSERTION_SORT_BELOW = 16;

    private PrecisionMeasures() {
    }

    /** The summary of a set, its RMS CV with a 95 % interval; the rule is the plain share within the limit. */
    public static PrecisionSummary summarise(QcRole type, ScreenedPairs set, DuplicateSettings settings) {
        ScreenedPairs.Members rel = set.relative();
        return summary(type, set, settings, rmsCv(rel.sharedA(), rel.sharedB(), settings), within -> !within.available()
                ? RuleOutcome.NOT_JUDGED : LimitComparison.atLeast(within.value(), settings.acceptancePercent())
                ? RuleOutcome.PASS : RuleOutcome.FAIL);
    }

    /**
     * The summary of one batch: as {@link #summarise}, but the RMS CV is a point estimate and the rule is
     * {@code rule}, the binomial test of {@link #batchRule}. A batch is judged by that rule and by the test of its
     * RMS CV against the set's ({@link BatchDispersion}); an interval over a batch's few pairs would add nothing
     * to that and cost a bootstrap per batch.
     */
    public static PrecisionSummary summariseBatch(QcRole type, ScreenedPairs batch, DuplicateSettings settings,
                                                  BatchRuleTest rule) {
        ScreenedPairs.Members rel = batch.relative();
        return summary(type, batch, settings, rmsCvPoint(rel.sharedA(), rel.sharedB()), within -> rule.outcome());
    }

    /**
     * {@link #summariseBatch} of a batch that holds the whole set (a pairs file without batches), from the set's
     * summary: the share within the limit, mean CV, median HARD and s_r are the set's, computed once instead of
     * twice (the median HARD of ten million pairs is a selection over all of them); the RMS CV is the set's
     * without its interval (the same root of the same mean square), and the rule is {@code rule}.
     */
    public static PrecisionSummary summariseWholeSetAsBatch(PrecisionSummary set, BatchRuleTest rule) {
        Estimate cv = set.rmsCv();
        return new PrecisionSummary(set.type(), set.pairs(), set.usedAbsolute(), set.usedRelative(),
                set.excludedAbsolute(), set.excludedRelative(), set.limitUnknown(), set.limitMultiple(),
                set.hardLimit(), set.acceptancePercent(), set.percentWithinLimit(), rule.outcome(),
                cv.available() ? Estimate.point(cv.value(), cv.n()) : cv, set.meanCv(), set.medianHard(),
                set.repeatabilitySd(), set.repeatabilityLimit());
    }

    /** The acceptance rule of one batch as a binomial test ({@link BatchRuleTest}). */
    public static BatchRuleTest batchRule(QcRole type, ScreenedPairs batch, DuplicateSettings settings) {
        ScreenedPairs.Members rel = batch.relative();
        return BatchRuleTest.of(countWithin(rel.sharedA(), rel.sharedB(), settings.hardLimit(type)), rel.size(),
                settings.acceptancePercent(), settings.batchRuleAlpha());
    }

    private static PrecisionSummary summary(QcRole type, ScreenedPairs set, DuplicateSettings settings,
                                            Estimate rmsCv, Function<Estimate, RuleOutcome> ruleOf) {
        ScreenedPairs.Members rel = set.relative();
        ScreenedPairs.Members abs = set.absolute();
        double[] ra = rel.sharedA();
        double[] rb = rel.sharedB();
        double limit = settings.hardLimit(type);
        Estimate within = percentWithin(ra, rb, limit);
        RuleOutcome rule = ruleOf.apply(within);
        Estimate sr = repeatabilitySd(abs.sharedA(), abs.sharedB());
        Estimate r = sr.available() ? Estimate.point(REPEATABILITY_FACTOR * sr.value(), sr.n()) : sr;
        return new PrecisionSummary(type, set.pairs().size(), abs.size(), rel.size(), set.excludedAbsolute(),
                set.excludedRelative(), set.limitUnknown(), settings.limitMultipleOfDetection(), limit,
                settings.acceptancePercent(), within, rule, rmsCv, meanCv(ra, rb), medianHard(ra, rb), sr, r);
    }

    /**
     * Share of pairs with HARD ≤ {@code limit}, in %. "≤" by {@link LimitComparison#atMost}: 1.1 / 0.9 has
     * HARD exactly 10 % in its decimals (the double is 0.10000000000000003) and is within a 10 % limit.
     */
    public static Estimate percentWithin(double[] a, double[] b, double limit) {
        int n = a.length;
        if (n == 0) {
            return Estimate.unavailable(0, "no pair usable for relative measures");
        }
        return Estimate.point(100.0 * countWithin(a, b, limit) / n, n);
    }

    /** Pairs with HARD ≤ {@code limit} ({@link LimitComparison#atMost}). */
    public static int countWithin(double[] a, double[] b, double limit) {
        int within = 0;
        for (int i = 0; i < a.length; i++) {
            if (LimitComparison.atMost(PairMeasures.hard(a[i], b[i]), limit)) {
                within++;
            }
        }
        return within;
    }

    /**
     * The RMS CV with the interval the settings call for: the bootstrap ({@link #rmsCv(double[], double[], int,
     * long)}) up to {@link DuplicateSettings#bootstrapMaxPairs()} pairs, the large-sample interval
     * ({@link #rmsCvLargeSample}) above.
     */
    public static Estimate rmsCv(double[] a, double[] b, DuplicateSettings settings) {
        return settings.bootstraps(a.length) ? rmsCv(a, b, settings.bootstrapResamples(), settings.bootstrapSeed())
                : rmsCvLargeSample(a, b, settings.bootstrapMaxPairs());
    }

    /**
     * RMS CV = √((1/n)·Σ CVᵢ²), CVᵢ = √2·|aᵢ − bᵢ|/(aᵢ + bᵢ) (Stanley, C.R. and Lawie, D., 2007, "Average
     * relative error in geochemical determinations: clarification, calculation, and a plea for consistency",
     * Exploration and Mining Geology 16, 267–275), with a seeded percentile-bootstrap 95 % interval.
     */
    public static Estimate rmsCv(double[] a, double[] b, int resamples, long seed) {
        int n = a.length;
        if (n < 2) {
            return tooFewForRmsCv(n);
        }
        double[] squares = squaredCvs(a, b);
        double[] ci = Bootstrap.percentileInterval(Bootstrap.rootMeanSquareReplicates(squares, resamples, seed));
        return Estimate.of(Math.sqrt(mean(squares)), ci[0], ci[1], n,
                "95 % percentile bootstrap over pairs, " + resamples + " resamples, seed " + seed);
    }

    /**
     * The RMS CV with a large-sample 95 % interval: the mean Q̄ of the n squared pair CVs has the normal
     * interval Q̄ ± z·s_Q/√n (central limit theorem; s_Q the SD of the squares, divisor n − 1), and the RMS CV
     * interval is the square root of its ends (the lower end floored at 0). Taking the root of the ends,
     * rather than a delta-method interval around √Q̄, keeps the interval inside [0, ∞) and, like the percentile
     * bootstrap, does not depend on whether the mean square or its root is taken as the statistic (Efron and
     * Tibshirani 1993, ch. 13: the percentile interval respects monotone transformations; recalled from memory).
     *
     * @param bootstrapMaxPairs the bootstrap budget that was exceeded, for the note
     */
    public static Estimate rmsCvLargeSample(double[] a, double[] b, int bootstrapMaxPairs) {
        int n = a.length;
        if (n < 2) {
            return tooFewForRmsCv(n);
        }
        double[] squares = squaredCvs(a, b);
        double q = mean(squares);
        double ss = 0;
        for (double v : squares) {
            ss += (v - q) * (v - q);
        }
        double[] ci = NormalInterval.around(q, ss / (n - 1) / n);
        return Estimate.of(Math.sqrt(q), Math.sqrt(Math.max(0, ci[0])), Math.sqrt(ci[1]), n,
                "95 % normal interval for the mean of squared pair CVs, square-rooted; bootstrap skipped above "
                        + "duplicates.bootstrapMaxPairs = " + bootstrapMaxPairs + " pairs");
    }

    /** The RMS CV without interval. */
    public static Estimate rmsCvPoint(double[] a, double[] b) {
        int n = a.length;
        return n < 2 ? tooFewForRmsCv(n) : Estimate.point(Math.sqrt(mean(squaredCvs(a, b))), n);
    }

    private static Estimate tooFewForRmsCv(int n) {
        return Estimate.unavailable(n, "needs at least 2 pairs usable for relative measures, has " + n);
    }

    private static double[] squaredCvs(double[] a, double[] b) {
        double[] squares = new double[a.length];
        for (int i = 0; i < squares.length; i++) {
            double cv = PairMeasures.cv(a[i], b[i]);
            squares[i] = cv * cv;
        }
        return squares;
    }

    private static double mean(double[] x) {
        double sum = 0;
        for (double v : x) {
            sum += v;
        }
        return sum / x.length;
    }

    /** Arithmetic mean of the pair CVs; biased low as an average CV (Stanley and Lawie 2007). */
    public static Estimate meanCv(double[] a, double[] b) {
        int n = a.length;
        if (n == 0) {
            return Estimate.unavailable(0, "no pair usable for relative measures");
        }
        double sum = 0;
        for (int i = 0; i < n; i++) {
            sum += PairMeasures.cv(a[i], b[i]);
        }
        return Estimate.of(sum / n, Double.NaN, Double.NaN, n,
                "arithmetic mean of pair CVs: biased low (Stanley and Lawie 2007); shown for comparison only");
    }

    public static Estimate medianHard(double[] a, double[] b) {
        int n = a.length;
        if (n == 0) {
            return Estimate.unavailable(0, "no pair usable for relative measures");
        }
        double[] h = new double[n];
        for (int i = 0; i < n; i++) {
            h[i] = PairMeasures.hard(a[i], b[i]);
        }
        return Estimate.point(medianInPlace(h, n), n);
    }

    /**
     * Repeatability standard deviation from duplicates, s_r = √(Σ dᵢ² / (2n)) (ISO 5725-2:1994 "Accuracy
     * (trueness and precision) of measurement methods and results — Part 2", with duplicates as cells of
     * two replicates); in the analyte's unit. Meaningful for a set over a narrow grade range.
     */
    public static Estimate repeatabilitySd(double[] a, double[] b) {
        int n = a.length;
        if (n == 0) {
            return Estimate.unavailable(0, "no pair with two detected values");
        }
        double sum = 0;
        for (int i = 0; i < n; i++) {
            double d = a[i] - b[i];
            sum += d * d;
        }
        return Estimate.point(Math.sqrt(sum / (2.0 * n)), n);
    }

    /**
     * The median of the first {@code n} entries of {@code values}, found by selection (Hoare's quickselect with a
     * median-of-three pivot; insertion sort on short ranges) rather than a full sort. Reorders those entries, so
     * callers pass a scratch array.
     */
    static double medianInPlace(double[] values, int n) {
        int upper = n / 2;
        double high = select(values, n, upper);
        if (n % 2 == 1) {
            return high;
        }
        double low = values[0];
        for (int i = 1; i < upper; i++) {
            low = Math.max(low, values[i]);
        }
        return (low + high) / 2.0;
    }

    /**
     * Moves the k-th smallest of v[0, n) to v[k], with no larger value before it and no smaller one after.
     * Values must not be NaN.
     */
    private static double select(double[] v, int n, int k) {
        int from = 0;
        int to = n - 1;
        while (to - from > INSERTION_SORT_BELOW) {
            double pivot = medianOfThree(v[from], v[(from + to) >>> 1], v[to]);
            int i = from;
            int j = to;
            while (i <= j) {
                while (v[i] < pivot) {
                    i++;
                }
                while (v[j] > pivot) {
                    j--;
                }
                if (i <= j) {
                    double t = v[i];
                    v[i++] = v[j];
                    v[j--] = t;
                }
            }
            // Now v[from..j] <= pivot <= v[i..to], and anything between j and i equals the pivot.
            if (k <= j) {
                to = j;
            } else if (k >= i) {
                from = i;
            } else {
                return v[k];
            }
        }
        for (int i = from + 1; i <= to; i++) {
            double x = v[i];
            int j = i - 1;
            while (j >= from && v[j] > x) {
                v[j + 1] = v[j];
                j--;
            }
            v[j + 1] = x;
        }
        return v[k];
    }

    private static double medianOfThree(double x, double y, double z) {
        return Math.max(Math.min(x, y), Math.min(Math.max(x, y), z));
    }
}
