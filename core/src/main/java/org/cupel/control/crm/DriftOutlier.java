package org.cupel.control.crm;

import java.util.Locale;
import org.cupel.assay.Numbers;

/**
 * A single result left out of the drift statistics because it is an isolated outlier ({@link IsolatedOutliers}):
 * an outlier finding, not a drift finding.
 *
 * @param index 0-based number of the result among the results the drift was judged over (series order)
 * @param sampleId the result's sample
 * @param batchId its batch
 * @param z its z-score
 */
public record DriftOutlier(int index, String sampleId, String batchId, double z) {

    /** "VH0001 (batch J3, z = +5.0): beyond 3 SD, no neighbour beyond 2 SD on its side: ...". */
    public String finding() {
        return String.format(Locale.ROOT, "%s (batch %s, result %d, z = %s%s): beyond 3 SD with no neighbour beyond "
                        + "2 SD on its side, a single-result problem (1-3s), not drift; left out of the trend, EWMA and "
                        + "CUSUM", sampleId, batchId, index + 1, z >= 0 ? "+" : "", Numbers.significant(z, 2));
    }
}
