package org.cupel.control.crm;

import java.util.List;

/**
 * Drift of a CRM series (or of all CRMs of an analyte): least-squares trend of z on time, EWMA and
 * tabular CUSUM of z, over the judged results less the isolated outliers ({@link IsolatedOutliers}), which
 * are listed apart: a single result far out is an outlier, not drift. Time is days since {@code origin}
 * when every result is dated, else the sequence number (and {@code timeAxis} says so).
 *
 * @param timeAxis "days since 2025-03-01" or "sequence number (some batches undated)"
 * @param trend z on time; slope in z per day (or per result)
 * @param ewma EWMA of z over the results used (outliers left out; {@link #judgedIndex} maps its indices back)
 * @param cusum tabular CUSUM of z over the same results
 * @param drifting whether the trend is significant at the drift α, or EWMA or CUSUM signalled, on the results used
 * @param findings one sentence per drift finding, empty when none
 * @param outliers the isolated outliers left out, in series order
 */
public record SeriesDrift(String timeAxis, LinearFit trend, Ewma ewma, TabularCusum cusum, boolean drifting,
                          List<String> findings, List<DriftOutlier> outliers) {
    public SeriesDrift {
        findings = List.copyOf(findings);
        outliers = List.copyOf(outliers);
    }

    /** The index among all judged results of the {@code used}-th result the statistics were computed over. */
    public int judgedIndex(int used) {
        return judgedIndex(used, outliers);
    }

    static int judgedIndex(int used, List<DriftOutlier> outliers) {
        int index = used;
        for (DriftOutlier o : outliers) {
            if (o.index() <= index) {
                index++;
            }
        }
        return index;
    }
}
