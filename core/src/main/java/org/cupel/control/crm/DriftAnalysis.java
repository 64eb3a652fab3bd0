package org.cupel.control.crm;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.cupel.assay.Numbers;

/**
 * Builds a {@link SeriesDrift} from judged results in time order: the isolated outliers given are listed as
 * outlier findings and left out; trend, EWMA and CUSUM are computed over the rest.
 */
final class DriftAnalysis {
    private DriftAnalysis() {
    }

    /** The judged results a drift analysis reads, in time order. */
    interface Results {
        int size();

        double z(int k);

        /** The batch date, {@code null} when unknown. */
        LocalDate date(int k);

        String sampleId(int k);

        String batchId(int k);
    }

    /** @param outlier for each judged result, whether it is an isolated outlier ({@link IsolatedOutliers}) */
    static SeriesDrift of(Results judged, boolean[] outlier, CrmSettings s) {
        int[] used = new int[judged.size()];
        int n = 0;
        List<DriftOutlier> outliers = new ArrayList<>();
        for (int i = 0; i < judged.size(); i++) {
            if (outlier[i]) {
                outliers.add(new DriftOutlier(i, judged.sampleId(i), judged.batchId(i), judged.z(i)));
            } else {
                used[n++] = i;
            }
        }
        return of(judged, java.util.Arrays.copyOf(used, n), outliers, s);
    }

    /** @param used the indices of the results the analysis runs over (the isolated outliers left out) */
    private static SeriesDrift of(Results judged, int[] used, List<DriftOutlier> outliers, CrmSettings s) {
        int n = used.length;
        double[] z = new double[n];
        double[] t = new double[n];
        long[] day = new long[n];
        long origin = Long.MAX_VALUE;
        boolean dated = n > 0;
        for (int i = 0; i < n; i++) {
            LocalDate d = judged.date(used[i]);
            if (d == null) {
                dated = false;
            } else {
                day[i] = d.toEpochDay();
                origin = Math.min(origin, day[i]);
            }
        }
        for (int i = 0; i < n; i++) {
            z[i] = judged.z(used[i]);
            t[i] = dated ? day[i] - origin : i + 1;
        }
        String axis = dated ? "days since " + LocalDate.ofEpochDay(origin) : "sequence number (some batches undated)";
        String per = dated ? "per day" : "per result";
        String left = outliers.isEmpty() ? "" : ", " + outliers.size() + " isolated outlier"
                + (outliers.size() == 1 ? "" : "s") + " left out";
        LinearFit trend = LinearFit.of(t, z, s.confidence());
        Ewma ewma = Ewma.of(z, 0, 1, s.ewmaLambda(), s.ewmaWidth());
        TabularCusum cusum = TabularCusum.of(z, 0, 1, s.cusumK(), s.cusumH());
        List<String> findings = new ArrayList<>();
        if (trend.estimated() && trend.pValue() < s.driftAlpha()) {
            findings.add(String.format(Locale.ROOT, "z trend %s SD %s (%d %% CI %s to %s, %s, n = %d%s)",
                    signed(trend.slope()), per, Math.round(s.confidence() * 100), Numbers.significant(trend.slopeLow(), 3),
                    Numbers.significant(trend.slopeHigh(), 3), trend.pText(), n, left));
        }
        if (ewma.firstSignal() >= 0) {
            int r = used[ewma.firstSignal()];
            findings.add(String.format(Locale.ROOT, "EWMA (λ = %s, L = %s) outside its limits from %s (batch %s, "
                            + "result %d of %d), %d results outside in all", Numbers.compact(s.ewmaLambda()),
                    Numbers.compact(s.ewmaWidth()), judged.sampleId(r), judged.batchId(r),
                    SeriesDrift.judgedIndex(ewma.firstSignal(), outliers) + 1, n + outliers.size(),
                    ewma.signals().size()));
        }
        if (cusum.firstSignal() >= 0) {
            int i = cusum.firstSignal();
            int r = used[i];
            String side = cusum.upper().get(i) > s.cusumH() ? "results read high" : "results read low";
            findings.add(String.format(Locale.ROOT, "CUSUM (k = %s, h = %s) above h from %s (batch %s, result %d of "
                            + "%d): %s", Numbers.compact(s.cusumK()), Numbers.compact(s.cusumH()), judged.sampleId(r),
                    judged.batchId(r), SeriesDrift.judgedIndex(i, outliers) + 1, n + outliers.size(), side));
        }
        return new SeriesDrift(axis, trend, ewma, cusum, !findings.isEmpty(), findings, outliers);
    }

    private static String signed(double v) {
        return (v >= 0 ? "+" : "") + Numbers.significant(v, 3);
    }
}
