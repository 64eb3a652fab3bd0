package org.cupel.control.crm;

import java.util.List;

/**
 * Drift of a CRM series (or of all CRMs of an analyte): least-squares trend of z on time, EWMA and
 * tabular CUSUM of z. Time is days since {@code origin} when every result is dated, else the sequence
 * number (and {@code timeAxis} says so).
 *
 * @param timeAxis "days since 2025-03-01" or "sequence number (some batches undated)"
 * @param trend z on time; slope in z per day (or per result)
 * @param ewma EWMA of z
 * @param cusum tabular CUSUM of z
 * @param drifting whether the trend is significant at the drift α, or EWMA or CUSUM signalled
 * @param findings one sentence per finding, empty when none
 */
public record SeriesDrift(String timeAxis, LinearFit trend, Ewma ewma, TabularCusum cusum, boolean drifting,
                          List<String> findings) {
    public SeriesDrift {
        findings = List.copyOf(findings);
    }
}
