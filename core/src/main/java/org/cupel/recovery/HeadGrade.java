package org.cupel.recovery;

import java.util.List;
import org.cupel.assay.AssayValue;

/**
 * The head grade of a feed for one analyte, from its replicate head assays: the mean and its standard error
 * s/√n with ν = n − 1 (a type A evaluation, JCGM 100:2008 §4.2). A single assay has no scatter: its standard
 * uncertainty is then the configured assay precision (type B, ν = ∞), and the note says so.
 *
 * @param feed the feed
 * @param analyte the analyte
 * @param n head assays used
 * @param meanGpt mean head grade in g/t
 * @param standardError standard uncertainty of the mean in g/t
 * @param df degrees of freedom of that uncertainty ({@code Infinity} for type B)
 * @param note how the uncertainty was obtained or why there is no head grade
 */
public record HeadGrade(String feed, String analyte, int n, double meanGpt, double standardError, double df,
                        String note) {

    public boolean usable() {
        return n > 0 && meanGpt > 0;
    }

    public double relativeStandardError() {
        return standardError / meanGpt;
    }

    static HeadGrade of(String feed, String analyte, List<AssayValue> assays, RecoverySettings settings) {
        double[] values = assays.stream().filter(v -> !v.isMissing()).mapToDouble(AssayValue::value).toArray();
        boolean censored = assays.stream().anyMatch(AssayValue::isCensored);
        String censoredNote = censored ? "censored head assays counted at their limit; " : "";
        if (values.length == 0) {
            return new HeadGrade(feed, analyte, 0, Double.NaN, Double.NaN, Double.NaN,
                    "no head assay for feed '" + feed + "': recovery against the head cannot be computed");
        }
        SampleSummary s = SampleSummary.of(values);
        if (!(s.mean() > 0)) {
            return new HeadGrade(feed, analyte, s.n(), s.mean(), Double.NaN, Double.NaN,
                    "head grade is not positive: recovery against the head cannot be computed");
        }
        if (s.n() == 1) {
            double u = settings.assayUncertainty("head", "head", s.mean());
            return new HeadGrade(feed, analyte, 1, s.mean(), u, Double.POSITIVE_INFINITY, censoredNote
                    + "one head assay: its uncertainty is the configured assay precision (type B)");
        }
        return new HeadGrade(feed, analyte, s.n(), s.mean(), s.standardError(), s.n() - 1.0,
                censoredNote + "SE of " + s.n() + " replicate head assays (type A)");
    }
}
