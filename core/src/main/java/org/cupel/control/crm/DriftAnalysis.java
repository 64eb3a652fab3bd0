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

    /** @param outlier for each judged result, whether it is an isolated outlier ({@link IsolatedOutliers}) */
    static SeriesDrift of(List<CrmResult> judged, boolean[] outlier, CrmSettings s) {
        List<CrmResult> used = new ArrayList<>(judged.size());
        List<DriftOutlier> outliers = new ArrayList<>();
        for (int i = 0; i < judged.size(); i++) {
            CrmResult r = judged.get(i);
            if (outlier[i]) {
                outliers.add(new DriftOutlier(i, r.point().sampleId(), r.point().batchId(), r.z()));
            } else {
                used.add(r);
            }
        }
        return of(used, outliers, s);
    }

    private static SeriesDrift of(List<CrmResult> judged, List<DriftOutlier> outliers, CrmSettings s) {
        int n = judged.size();
        double[] z = new double[n];
        double[] t = new double[n];
        long[] day = new long[n];
        long origin = Long.MAX_VALUE;
        boolean dated = n > 0;
        for (int i = 0; i < n; i++) {
            LocalDate d = judged.get(i).point().date();
            if (d == null) {
                dated = false;
            } else {
                day[i] = d.toEpochDay();
                origin = Math.min(origin, day[i]);
            }
        }
        for (int i = 0; i < n; i++) {
            z[i] = judged.get(i).z();
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
            CrmResult r = judged.get(ewma.firstSignal());
            findings.add(String.format(Locale.ROOT, "EWMA (λ = %s, L = %s) outside its limits from %s (batch %s, "
                            + "result %d of %d), %d results outside in all", Numbers.compact(s.ewmaLambda()),
                    Numbers.compact(s.ewmaWidth()), r.point().sampleId(), r.point().batchId(),
                    SeriesDrift.judgedIndex(ewma.firstSignal(), outliers) + 1, n + outliers.size(),
                    ewma.signals().size()));
        }
        if (cusum.firstSignal() >= 0) {
            int i = cusum.firstSignal();
            CrmResult r = judged.get(i);
            String side = cusum.upper().get(i) > s.cusumH() ? "results read high" : "results read low";
            findings.add(String.format(Locale.ROOT, "CUSUM (k = %s, h = %s) above h from %s (batch %s, result %d of "
                            + "%d): %s", Numbers.compact(s.cusumK()), Numbers.compact(s.cusumH()), r.point().sampleId(),
                    r.point().batchId(), SeriesDrift.judgedIndex(i, outliers) + 1, n + outliers.size(), side));
        }
        return new SeriesDrift(axis, trend, ewma, cusum, !findings.isEmpty(), findings, outliers);
    }

    private static String signed(double v) {
        return (v >= 0 ? "+" : "") + Numbers.significant(v, 3);
    }
}
