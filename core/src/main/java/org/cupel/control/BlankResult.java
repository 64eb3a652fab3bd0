package org.cupel.control;

/**
 * The judgement of one blank result and its carry-over context.
 *
 * @param observation the blank, its value and the sample before it
 * @param threshold levels in force; {@code null} when none could be set
 * @param verdict pass / warn / fail / cannot judge, with the rule
 * @param contaminationRatio blank value ÷ preceding grade, when both are detected and the grade is positive;
 *     else {@code NaN} with {@code ratioNote} saying why
 * @param ratioNote empty when the ratio is given, else why not
 * @param carryOver a failing blank that follows a high-grade sample (probable carry-over)
 * @param outcome the common form for batch verdicts and re-assay lists (a FAIL triggers re-assay)
 */
public record BlankResult(BlankObservation observation, BlankThreshold threshold, BlankVerdict verdict,
                          double contaminationRatio, String ratioNote, boolean carryOver, ControlOutcome outcome) {
}
