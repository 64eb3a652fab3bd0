package org.cupel.control;

/**
 * Blank results of one analyte across a project.
 *
 * @param analyte analyte name
 * @param unit unit symbol
 * @param n blank results judged (missing results excluded)
 * @param pass passing results
 * @param warn results above the warning threshold
 * @param fail results above the failure threshold
 * @param cannotJudge results that could not be judged (detection limit above threshold, no threshold)
 * @param missing blank rows with no result for this analyte
 * @param carryOver failing blanks that follow a high-grade sample
 * @param relation blank vs preceding grade across the project
 */
public record BlankSummary(String analyte, String unit, int n, int pass, int warn, int fail, int cannotJudge,
                           int missing, int carryOver, CarryOverRelation relation) {
}
