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
import org.cupel.api.Cupel;
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
 * cautions. The core analyses ({@link Cupel}) compute every result; each section builder only formats them.
 */
public final class QcAppendix {
    private QcAppendix() {
    }

    /**
     * The report of the project of {@code cupel}, which is already narrowed to the batches under review
     * ({@link Cupel#select}). The analyses not yet computed are computed side by side first
     * ({@link Cupel#analyseAll()}).
     *
     * @param selection the batches covered, in words, for the title page
     * @param generated generation time shown in the HTML and PDF
     */
    public static QcReport build(Cupel cupel, String selection, Instant generated) {
        cupel.analyseAll();
        Project project = cupel.project();
        BatchReview batches = cupel.batches();
        Optional<RecoveryResult> testwork = cupel.recovery();
        List<Supplier<ReportSection>> builders = new ArrayList<>();
        builders.add(() -> ScopeSection.build(ProjectSummary.of(project), selection));
        builders.add(() -> InsertionRateSection.build(batches.insertion()));
        builders.add(() -> VerdictSection.build(batches.groups(), batches.reassay(), batches.resubmit()));
        builders.add(() -> DataExceptionsSection.build(project));
        builders.add(() -> DetectionLimitSection.build(cupel.censored()));
        builders.add(() -> CrmSection.of(cupel.crm()));
        builders.add(() -> BlankSection.build(cupel.blanks(), project.config()));
        builders.add(() -> DuplicatesSection.build(cupel.duplicates(), path -> project.config().isUserSet(path)));
        testwork.ifPresent(r -> builders.add(() -> TestworkSection.build(r)));
        builders.add(0, () -> SummarySection.build(batches, cupel.crm(), cupel.duplicates(), testwork));
        List<ReportSection> sections = buildAll(builders);
        ReportSection cautions = CautionsSection.build();
        List<ReportSection> citing = new ArrayList<>(sections);
        citing.add(cautions);
        sections.add(MethodsSection.build(citing, project.config()));
        sections.add(cautions);
        return new QcReport(project.name(), selection, generated, sections);
    }

    /**
     * The report of a project built in memory or read by other means ({@link Cupel#of(Project, Optional)}).
     *
     * @param testwork the recovery results of the project's testwork, when it has any
     */
    public static QcReport build(Project project, Optional<RecoveryResult> testwork, String selection,
                                 Instant generated) {
        return build(Cupel.of(project, testwork), selection, generated);
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

    /** The report of a project built in memory or read by other means, without testwork. */
    public static QcReport build(Project project, String selection, Instant generated) {
        return build(Cupel.of(project), selection, generated);
    }
}
