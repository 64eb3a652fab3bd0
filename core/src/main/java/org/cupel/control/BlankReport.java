package org.cupel.control;

import java.util.List;

/**
 * Every blank result judged, with per-analyte summaries.
 *
 * @param results one per blank and analyte with a result, in batch and sequence order
 * @param summaries one per analyte, in analyte order
 * @param settings the settings in force
 */
public record BlankReport(List<BlankResult> results, List<BlankSummary> summaries, BlankSettings settings) {
    public BlankReport {
        results = results instanceof JudgedBlanks ? results : List.copyOf(results);
        summaries = List.copyOf(summaries);
    }

    /** The outcomes in the common form, for {@link BatchVerdicts} and {@link ReassayList}. */
    public List<ControlOutcome> outcomes() {
        if (results instanceof JudgedBlanks judged) {
            return judged.outcomes();
        }
        return ControlOutcomes.of(results.stream().map(BlankResult::outcome).toList());
    }

    /** Failing blanks that follow a high-grade sample. */
    public List<BlankResult> carryOverFindings() {
        if (results instanceof JudgedBlanks judged) {
            List<BlankResult> out = new java.util.ArrayList<>();
            for (int i = 0; i < judged.size(); i++) {
                if (judged.carryOver(i)) {
                    out.add(judged.get(i));
                }
            }
            return List.copyOf(out);
        }
        return results.stream().filter(BlankResult::carryOver).toList();
    }
}
