package org.cupel.control.crm;

import org.cupel.assay.Numbers;
import org.cupel.project.CrmCertificate;

/**
 * Control limits from the certificate: certified value ± 2 SD (warning) and ± 3 SD (failure) with the
 * certificate's between-lab SD, never the confidence interval of the certified value, which describes
 * how well the mean is known and would be far too narrow for single results (common practice).
 *
 * <p>Shown as the certificate writes them: the certified value and the SD with the decimals of the catalog
 * ({@code 1.236}, not {@code 1.24}); a limit {@code value ± k·SD} (k whole) is exact with the larger of the
 * two counts of decimals, and is shown so, but with at most one decimal more than the certified value (a
 * limit is no more precise than the value it is built on; Cupel's choice). The judgement uses the exact
 * limits, never the rounded text.
 *
 * @param valueDecimals decimals of the certified value as written, or {@link Numbers#UNKNOWN_DECIMALS}
 * @param sdDecimals decimals of the SD as written, or {@link Numbers#UNKNOWN_DECIMALS}
 */
public record CertifiedLimits(double certified, double sd, double warnLow, double warnHigh, double failLow,
                              double failHigh, int valueDecimals, int sdDecimals) {

    public static CertifiedLimits of(CrmCertificate c) {
        double m = c.certifiedValue();
        double s = c.sd();
        return new CertifiedLimits(m, s, m - 2 * s, m + 2 * s, m - 3 * s, m + 3 * s, c.valueDecimals(),
                c.sdDecimals());
    }

    /** z = (x − certified) / SD (ISO 13528 with σ_pt the certificate SD). */
    public double z(double x) {
        return (x - certified) / sd;
    }

    /** The certified value at the certificate's precision; four significant digits when that is not known. */
    public String certifiedText() {
        return valueDecimals < 0 ? Numbers.significant(certified, 4) : Numbers.fixed(certified, valueDecimals);
    }

    /** The certificate SD as written; three significant digits when that is not known. */
    public String sdText() {
        return sdDecimals < 0 ? Numbers.significant(sd, 3) : Numbers.fixed(sd, sdDecimals);
    }

    /**
     * The decimals a limit is shown with: max(value's, SD's) decimals, which is exact for value ± k·SD, capped
     * at the value's decimals + 1; unknown when either count is unknown.
     */
    public int limitDecimals() {
        if (valueDecimals < 0 || sdDecimals < 0) {
            return Numbers.UNKNOWN_DECIMALS;
        }
        return Math.min(Math.max(valueDecimals, sdDecimals), valueDecimals + 1);
    }

    /** A limit (or any number on this certificate's scale) with {@link #limitDecimals()} decimals. */
    public String limitText(double limit) {
        int d = limitDecimals();
        return d < 0 ? Numbers.significant(limit, 4) : Numbers.fixed(limit, d);
    }
}
