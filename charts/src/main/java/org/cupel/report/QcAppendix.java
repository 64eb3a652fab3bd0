package org.cupel.report;

import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import org.cupel.project.Project;
import org.cupel.project.ProjectSummary;

/**
 * The one place that lists the sections of the QC appendix, in the order a reviewer reads them: scope,
 * data exceptions, the analyses' sections, methods and references, cautions. Each section builder
 * formats results of core analyses; nothing is computed here.
 */
public final class QcAppendix {
    private QcAppendix() {
    }

    /**
     * The report for {@code project}, which is already narrowed to the batches under review.
     *
     * @param selection the batches covered, in words, for the title page
     * @param generated generation time shown in the HTML and PDF
     */
    public static QcReport build(Project project, String selection, Instant generated) {
        List<ReportSection> sections = new ArrayList<>();
        sections.add(ScopeSection.build(ProjectSummary.of(project), selection));
        sections.add(DataExceptionsSection.build(project));
        sections.add(CautionsSection.build());
        sections.add(sections.size() - 1, MethodsSection.build(sections, project.config()));
        return new QcReport(project.name(), selection, generated, sections);
    }
}
