package org.cupel.project;

import org.cupel.assay.Numbers;
import org.cupel.units.GradeUnit;

/**
 * The certified value of one CRM for one analyte, from its certificate.
 *
 * @param code the project's code for the CRM
 * @param analyte analyte name
 * @param unit unit of the certified value and SD (converted to the project's unit for the analyte at load)
 * @param certifiedValue the certified (consensus) value
 * @param sd the certificate's between-lab 1 SD, which sets control limits; never the CI of the mean
 * @param ci95Low lower end of the certificate's 95 % interval of the certified value, NaN when not given
 * @param ci95High upper end of that interval, NaN when not given
 * @param method the certified method, empty when not given
 * @param valueDecimals the decimals the certified value is written with in the catalog ({@code 1.236}: 3),
 *     so that it is shown at the certificate's precision; {@link Numbers#UNKNOWN_DECIMALS} when not known
 * @param sdDecimals the decimals of the SD as written, or {@link Numbers#UNKNOWN_DECIMALS}
 */
public record CrmCertificate(String code, String analyte, GradeUnit unit, double certifiedValue, double sd,
                             double ci95Low, double ci95High, String method, int valueDecimals,
                             int sdDecimals) {
    public CrmCertificate {
        if (!(sd > 0) || !Double.isFinite(certifiedValue)) {
            throw new IllegalArgumentException("CRM " + code + " " + analyte
                    + ": certified value must be finite and SD positive");
        }
        method = method == null ? "" : method;
    }

    /** A certificate whose written decimals are not known. */
    public CrmCertificate(String code, String analyte, GradeUnit unit, double certifiedValue, double sd,
                          double ci95Low, double ci95High, String method) {
        this(code, analyte, unit, certifiedValue, sd, ci95Low, ci95High, method, Numbers.UNKNOWN_DECIMALS,
                Numbers.UNKNOWN_DECIMALS);
    }

    /** The same certificate expressed in {@code target}; the written decimals move with a power-of-ten factor. */
    public CrmCertificate in(GradeUnit target) {
        double f = unit.convert(1.0, target);
        return new CrmCertificate(code, analyte, target, certifiedValue * f, sd * f, ci95Low * f, ci95High * f, method,
                Numbers.decimalsAfterScaling(valueDecimals, f), Numbers.decimalsAfterScaling(sdDecimals, f));
    }

    /** The certified value as the certificate writes it: {@code 1.236}, not {@code 1.24}. */
    public String valueText() {
        return Numbers.fixed(certifiedValue, valueDecimals);
    }

    /** The SD as the certificate writes it. */
    public String sdText() {
        return Numbers.fixed(sd, sdDecimals);
    }
}
