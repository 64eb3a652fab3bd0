package org.cupel.control.crm;

import org.cupel.project.CrmCertificate;

/**
 * Control limits from the certificate: certified value ± 2 SD (warning) and ± 3 SD (failure) with the
 * certificate's between-lab SD, never the confidence interval of the certified value, which describes
 * how well the mean is known and would be far too narrow for single results (common practice).
 */
public record CertifiedLimits(double certified, double sd, double warnLow, double warnHigh, double failLow,
                              double failHigh) {

    public static CertifiedLimits of(CrmCertificate c) {
        double m = c.certifiedValue();
        double s = c.sd();
        return new CertifiedLimits(m, s, m - 2 * s, m + 2 * s, m - 3 * s, m + 3 * s);
    }

    /** z = (x − certified) / SD (ISO 13528 with σ_pt the certificate SD). */
    public double z(double x) {
        return (x - certified) / sd;
    }
}
