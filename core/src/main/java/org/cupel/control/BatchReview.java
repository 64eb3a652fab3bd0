package org.cupel.control;

import java.util.List;
import org.cupel.project.Project;

/**
 * The batch-by-batch review of a project: blanks judged, batch verdicts and the re-assay list from the
 * blank outcomes and any other control outcomes given (the CRM review's), and insertion rates. Settings
 * from the config sections {@code blanks}, {@code reassay} and {@code insertion}.
 *
 * @param verdicts one per batch, in table order
 * @param reassay the re-assay list
 * @param blanks the blank review
 * @param insertion insertion rates per batch and overall
 * @param outcomes every control outcome the verdicts were built from (other sources first, then blanks)
 * @param groups the verdicts split into primary and umpire-lab batches
 * @param resubmit the samples the lab reported insufficient or not received
 */
public record BatchReview(List<BatchVerdict> verdicts, ReassayList reassay, BlankReport blanks,
                          InsertionRates insertion, List<ControlOutcome> outcomes, BatchGroups groups,
                          ResubmitList resubmit) {

    public BatchReview {
        verdicts = List.copyOf(verdicts);
        outcomes = ControlOutcomes.of(outcomes);
    }

    /** @param otherOutcomes outcomes of other control reviews (CRMs), in any order; may be empty */
    public static BatchReview of(Project project, List<ControlOutcome> otherOutcomes) {
        BatchSequence seq = BatchSequence.of(project.samples());
        BlankReport blanks = BlankReview.review(project, seq);
        ControlOutcomes all = ControlOutcomes.concat(ControlOutcomes.of(otherOutcomes),
                ControlOutcomes.of(blanks.outcomes()));
        ReassaySettings reassay = project.config().section("reassay", ReassaySettings.class, ReassaySettings.DEFAULTS);
        InsertionSettings insertion = project.config().section("insertion", InsertionSettings.class,
                InsertionSettings.DEFAULTS);
        List<BatchVerdict> verdicts = BatchVerdicts.judge(project.samples(), seq, all);
        return new BatchReview(verdicts, ReassayList.build(project.samples(), seq, all, reassay), blanks,
                InsertionRates.compute(project.samples(), seq, insertion), all,
                BatchGroups.of(project.samples(), seq, verdicts),
                ResubmitList.of(project.samples(), seq, project.analytes().values()));
    }

    public boolean anyBatchFailed() {
        return BatchVerdicts.anyFailed(verdicts);
    }
}
