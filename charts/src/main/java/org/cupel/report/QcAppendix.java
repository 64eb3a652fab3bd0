package org.cupel.report;

import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.cupel.control.BatchReview;
import org.cupel.project.Project;
import org.cupel.project.ProjectSummary;
import org.cupel.recovery.RecoveryResult;
import org.cupel.report.censored.DetectionLimitSection;
import org.cupel.report.control.BlankSection;
import org.cupel.report.control.CrmSection;
import org.cupel.report.control.InsertionRateSection;
import org.cupel.report.control.VerdictSection;
import org.cupel.report.duplicates.DuplicatesSection;
import org.cupel.report.recovery.TestworkSection;

/**
 * The one place that lists the sections of the QC appendix, in the order a reviewer reads them: scope and
 * insertion rates, batch verdicts and the re-assay list, data exceptions and the detection-limit
 * treatment, CRMs, blanks, duplicates, metallurgical testwork (when given), methods and references,
 * cautions. The core analyses compute every result; each section builder only formats them.
 */
public final class QcAppendix {
    private QcAppendix() {
    }

    /**
     * The report for {@code project}, which is already narrowed to the batches under review.
     *
     * @param testwork the recovery results of the project's testwork, when it has any
     * @param selection the batches covered, in words, for the title page
     * @param generated generation time shown in the HTML and PDF
     */
    public static QcReport build(Project project, Optional<RecoveryResult> testwork, String selection,
                                 Instant generated) {
        return build(project, AppendixAnalyses.of(project), testwork, selection, generated);
    }

    /** The report of {@code project} from analyses already computed (so a caller can time them). */
    public static QcReport build(Project project, AppendixAnalyses analyses, Optional<RecoveryResult> testwork,
                                 String selection, Instant generated) {
        BatchReview batches = analyses.batches();
        List<ReportSection> sections = new ArrayList<>();
        sections.add(ScopeSection.build(ProjectSummary.of(project), selection));
        sections.add(InsertionRateSection.build(batches.insertion()));
        sections.add(VerdictSection.build(batches.verdicts(), batches.reassay()));
        sections.add(DataExceptionsSection.build(project));
        sections.add(DetectionLimitSection.build(analyses.censoring()));
        sections.add(CrmSection.of(analyses.crms()));
        sections.add(BlankSection.build(batches.blanks(), project.config()));
        sections.add(DuplicatesSection.build(analyses.duplicates(),
                path -> project.config().isUserSet(path)));
        testwork.ifPresent(r -> sections.add(TestworkSection.build(r)));
        ReportSection cautions = CautionsSection.build();
        List<ReportSection> citing = new ArrayList<>(sections);
        citing.add(cautions);
        sections.add(MethodsSection.build(citing, project.config()));
        sections.add(cautions);
        return new QcReport(project.name(), selection, generated, sections);
    }

    /** The report of a project without testwork. */
    public static QcReport build(Project project, String selection, Instant generated) {
        return build(project, Optional.empty(), selection, generated);
    }
}
