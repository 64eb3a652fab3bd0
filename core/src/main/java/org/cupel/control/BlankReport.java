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

    /**
     * The results of one analyte, in batch and sequence order. The results of a review are made when read: a
     * chart reads its analyte's this way rather than filtering every result of the project.
     */
    public List<BlankResult> results(String analyte) {
        if (results instanceof JudgedBlanks judged) {
            return judged.picked(judged.indicesWhere(i -> judged.analyte(i).equals(analyte)));
        }
        return results.stream().filter(r -> r.observation().analyte().equals(analyte)).toList();
    }

    /** The results that did not pass (warnings, failures, and those that cannot be judged), in order. */
    public List<BlankResult> notPassing() {
        if (results instanceof JudgedBlanks judged) {
            return judged.picked(judged.indicesWhere(i -> judged.verdict(i) != Verdict.PASS));
        }
        return results.stream().filter(r -> r.verdict().verdict() != Verdict.PASS).toList();
    }

    /** Failing blanks that follow a high-grade sample. */
    public List<BlankResult> carryOverFindings() {
        if (results instanceof JudgedBlanks judged) {
            return List.copyOf(judged.picked(judged.indicesWhere(judged::carryOver)));
        }
        return results.stream().filter(BlankResult::carryOver).toList();
    }
}
