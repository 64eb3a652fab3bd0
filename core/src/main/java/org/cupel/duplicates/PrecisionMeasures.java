package org.cupel.duplicates;

import java.util.Arrays;
import org.cupel.assay.QcRole;

/** Computes a {@link PrecisionSummary} from screened pairs: HARD acceptance, average CV, repeatability. */
public final class PrecisionMeasures {
    /** ISO 5725-6 factor 2.8 ≈ 1.96·√2: the repeatability limit r = 2.8·s_r. */
    public static final double REPEATABILITY_FACTOR = 2.8;

    private PrecisionMeasures() {
    }

    public static PrecisionSummary summarise(QcRole type, ScreenedPairs set, DuplicateSettings settings) {
        ScreenedPairs.Members rel = set.relative();
        ScreenedPairs.Members abs = set.absolute();
        double limit = settings.hardLimit(type);
        Estimate within = percentWithin(rel.a(), rel.b(), limit);
        RuleOutcome rule = !within.available() ? RuleOutcome.NOT_JUDGED
                : within.value() >= settings.acceptancePercent() ? RuleOutcome.PASS : RuleOutcome.FAIL;
        Estimate sr = repeatabilitySd(abs.a(), abs.b());
        Estimate r = sr.available() ? Estimate.point(REPEATABILITY_FACTOR * sr.value(), sr.n()) : sr;
        return new PrecisionSummary(type, set.pairs().size(), abs.size(), rel.size(), set.excludedAbsolute(),
                set.excludedRelative(), set.limitUnknown(), settings.limitMultipleOfDetection(), limit,
                settings.acceptancePercent(), within, rule,
                rmsCv(rel.a(), rel.b(), settings.bootstrapResamples(), settings.bootstrapSeed()),
                meanCv(rel.a(), rel.b()), medianHard(rel.a(), rel.b()), sr, r);
    }

    /** Share of pairs with HARD ≤ {@code limit}, in %. */
    public static Estimate percentWithin(double[] a, double[] b, double limit) {
        int n = a.length;
        if (n == 0) {
            return Estimate.unavailable(0, "no pair usable for relative measures");
        }
        int within = 0;
        for (int i = 0; i < n; i++) {
            if (PairMeasures.hard(a[i], b[i]) <= limit) {
                within++;
            }
        }
        return Estimate.point(100.0 * within / n, n);
    }

    /**
     * RMS CV = √((1/n)·Σ CVᵢ²), CVᵢ = √2·|aᵢ − bᵢ|/(aᵢ + bᵢ) (Stanley, C.R. and Lawie, D., 2007, "Average
     * relative error in geochemical determinations: clarification, calculation, and a plea for consistency",
     * Exploration and Mining Geology 16, 267–275), with a seeded percentile-bootstrap 95 % interval.
     */
    public static Estimate rmsCv(double[] a, double[] b, int resamples, long seed) {
        int n = a.length;
        if (n < 2) {
            return Estimate.unavailable(n, "needs at least 2 pairs usable for relative measures, has " + n);
        }
        double[] squares = new double[n];
        double sum = 0;
        for (int i = 0; i < n; i++) {
            double cv = PairMeasures.cv(a[i], b[i]);
            squares[i] = cv * cv;
            sum += squares[i];
        }
        double[] ci = Bootstrap.percentileInterval(Bootstrap.rootMeanSquareReplicates(squares, resamples, seed));
        return Estimate.of(Math.sqrt(sum / n), ci[0], ci[1], n,
                "95 % percentile bootstrap over pairs, " + resamples + " resamples, seed " + seed);
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
        return Estimate.point(median(h), n);
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

    static double median(double[] values) {
        double[] s = values.clone();
        Arrays.sort(s);
        int n = s.length;
        return n % 2 == 1 ? s[n / 2] : (s[n / 2 - 1] + s[n / 2]) / 2.0;
    }
}
