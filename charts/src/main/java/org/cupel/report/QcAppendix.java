package org.cupel.report;

import java.time.Instant;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.function.Supplier;
import org.cupel.control.BatchReview;
import org.cupel.project.Project;
import org.cupel.project.ProjectSummary;
import org.cupel.project.Workers;
import org.cupel.recovery.RecoveryResult;
import org.cupel.report.censored.DetectionLimitSection;
import org.cupel.report.control.BlankSection;
import org.cupel.report.control.CrmSection;
import org.cupel.report.control.InsertionRateSection;
import org.cupel.report.control.VerdictSection;
import org.cupel.report.duplicates.DuplicatesSection;
import org.cupel.report.recovery.TestworkSection;

/**
 * The one place that lists the sections of the QC appendix, in the order a reviewer reads them: the summary
 * (the verdict in plain words), scope and insertion rates, batch verdicts and the re-assay list, data exceptions and the detection-limit
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
        List<Supplier<ReportSection>> builders = new ArrayList<>();
        builders.add(() -> ScopeSection.build(ProjectSummary.of(project), selection));
        builders.add(() -> InsertionRateSection.build(batches.insertion()));
        builders.add(() -> VerdictSection.build(batches.groups(), batches.reassay(), batches.resubmit()));
        builders.add(() -> DataExceptionsSection.build(project));
        builders.add(() -> DetectionLimitSection.build(analyses.censoring()));
        builders.add(() -> CrmSection.of(analyses.crms()));
        builders.add(() -> BlankSection.build(batches.blanks(), project.config()));
        builders.add(() -> DuplicatesSection.build(analyses.duplicates(), path -> project.config().isUserSet(path)));
        testwork.ifPresent(r -> builders.add(() -> TestworkSection.build(r)));
        builders.add(0, () -> SummarySection.build(batches, analyses.crms(), analyses.duplicates(), testwork));
        List<ReportSection> sections = buildAll(builders);
        ReportSection cautions = CautionsSection.build();
        List<ReportSection> citing = new ArrayList<>(sections);
        citing.add(cautions);
        sections.add(MethodsSection.build(citing, project.config()));
        sections.add(cautions);
        return new QcReport(project.name(), selection, generated, sections);
    }

    /**
     * The sections, in the order given, built on up to two threads. Each builder only formats results
     * that are already computed and shares nothing with the others, so the sections are the same as when
     * built one after the other; at a million samples the formatting takes a few seconds of one core.
     * They are started last to first, so that the largest (duplicates, near the end) does not finish alone.
     */
    private static List<ReportSection> buildAll(List<Supplier<ReportSection>> builders) {
        int threads = Math.max(1, Math.min(2, Runtime.getRuntime().availableProcessors()));
        ExecutorService pool = Executors.newFixedThreadPool(threads, Workers.daemonThreads("cupel-sections"));
        try {
            List<Future<ReportSection>> built = new ArrayList<>(Collections.nCopies(builders.size(), null));
            for (int i = builders.size() - 1; i >= 0; i--) {
                built.set(i, pool.submit(builders.get(i)::get));
            }
            List<ReportSection> sections = new ArrayList<>(builders.size());
            for (Future<ReportSection> f : built) {
                sections.add(Workers.result(f, "the report sections"));
            }
            return sections;
        } finally {
            pool.shutdownNow();
        }
    }

    /** The report of a project without testwork. */
    public static QcReport build(Project project, String selection, Instant generated) {
        return build(project, Optional.empty(), selection, generated);
    }
}
