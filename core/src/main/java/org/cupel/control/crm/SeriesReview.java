package org.cupel.control.crm;

import java.util.List;
import org.cupel.assay.Analyte;
import org.cupel.control.Verdict;
import org.cupel.project.CrmCertificate;

/**
 * Everything the review found for one CRM and analyte.
 *
 * @param analyte the analyte and its unit
 * @param certificate the certificate in the analyte's unit
 * @param limits certified limits
 * @param projectLimits limits from the project's own results
 * @param results every numeric result, in series order
 * @param bias bias of the judged results (swaps left out)
 * @param drift trend, EWMA and CUSUM of the judged results
 * @param findings rule violations of this series
 */
public record SeriesReview(Analyte analyte, CrmCertificate certificate, CertifiedLimits limits,
                           ProjectLimits projectLimits, List<CrmResult> results, BiasEstimate bias,
                           SeriesDrift drift, List<RuleFinding> findings) {
    public SeriesReview {
        results = List.copyOf(results);
        findings = List.copyOf(findings);
    }

    public String crm() {
        return certificate.code();
    }

    public int n() {
        return results.size();
    }

    public long failures() {
        return results.stream().filter(r -> r.verdict() == Verdict.FAIL).count();
    }

    /** Warnings other than swaps. */
    public long warnings() {
        return results.stream().filter(r -> r.verdict() == Verdict.WARN && !r.isSwap()).count();
    }

    public long swaps() {
        return results.stream().filter(CrmResult::isSwap).count();
    }
}
