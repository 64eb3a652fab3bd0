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
        results = List.copyOf(results);
        summaries = List.copyOf(summaries);
    }

    /** The outcomes in the common form, for {@link BatchVerdicts} and {@link ReassayList}. */
    public List<ControlOutcome> outcomes() {
        return results.stream().map(BlankResult::outcome).toList();
    }

    /** Failing blanks that follow a high-grade sample. */
    public List<BlankResult> carryOverFindings() {
        return results.stream().filter(BlankResult::carryOver).toList();
    }
}
