package org.cupel.control.crm;

import java.util.List;
import java.util.stream.IntStream;
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
 * @param results every numeric result, in series order (those of a review are kept as columns and made when read)
 * @param bias bias of the judged results (swaps left out)
 * @param drift trend, EWMA and CUSUM of the judged results
 * @param findings rule violations of this series
 */
public record SeriesReview(Analyte analyte, CrmCertificate certificate, CertifiedLimits limits,
                           ProjectLimits projectLimits, List<CrmResult> results, BiasEstimate bias,
                           SeriesDrift drift, List<RuleFinding> findings) {
    public SeriesReview {
        results = CrmResults.of(results);
        findings = List.copyOf(findings);
    }

    public String crm() {
        return certificate.code();
    }

    public int n() {
        return results.size();
    }

    public long failures() {
        CrmResults rs = resultList();
        return IntStream.range(0, rs.size()).filter(i -> rs.verdict(i) == Verdict.FAIL).count();
    }

    /** Warnings other than swaps. */
    public long warnings() {
        CrmResults rs = resultList();
        return IntStream.range(0, rs.size()).filter(i -> rs.verdict(i) == Verdict.WARN && !rs.isSwap(i)).count();
    }

    public long swaps() {
        CrmResults rs = resultList();
        return IntStream.range(0, rs.size()).filter(rs::isSwap).count();
    }

    /** The results judged probable swaps, in series order. */
    public List<CrmResult> probableSwaps() {
        CrmResults rs = resultList();
        return IntStream.range(0, rs.size()).filter(rs::isSwap).mapToObj(rs::get).toList();
    }

    /** The results, their fields readable by index. */
    CrmResults resultList() {
        return (CrmResults) results;
    }
}
