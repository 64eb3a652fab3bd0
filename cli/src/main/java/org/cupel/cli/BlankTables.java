package org.cupel.cli;

import java.io.PrintWriter;
import org.cupel.assay.Numbers;
import org.cupel.control.BlankReport;
import org.cupel.control.BlankResult;
import org.cupel.control.BlankReview;
import org.cupel.control.BlankSummary;
import org.cupel.control.CarryOverRelation;
import org.cupel.control.Verdict;

/** Terminal tables of a blank review, shared by {@code cupel blanks} and {@code cupel batches}. */
final class BlankTables {
    private BlankTables() {
    }

    static void print(PrintWriter out, BlankReport report) {
        TextTable sum = new TextTable("Analyte", "Blanks", "Pass", "Warn", "Fail", "Cannot judge", "Missing",
                "Carry-over", "Spearman rho", "p", "Slope ± SE", "p (slope)");
        for (BlankSummary s : report.summaries()) {
            CarryOverRelation r = s.relation();
            sum.row(s.analyte(), s.n(), s.pass(), s.warn(), s.fail(), s.cannotJudge(), s.missing(), s.carryOver(),
                    num(r.spearmanRho(), 3), p(r.spearmanP()), Double.isNaN(r.slope()) ? "-" : num(r.slope(), 3) + " ± " + num(r.slopeStdErr(), 2),
                    p(r.slopeP()));
        }
        out.println("Blanks (fail above " + Numbers.compact(report.settings().failMultiple()) + "×DL, warn above "
                + Numbers.compact(report.settings().warnMultiple()) + "×DL unless an absolute threshold is set)");
        sum.print(out);
        for (BlankSummary s : report.summaries()) {
            if (!s.relation().note().isEmpty()) {
                out.println("  " + s.analyte() + ": " + s.relation().note());
            }
        }
        TextTable find = new TextTable("Blank", "Batch", "Pos", "Analyte", "Result", "Verdict", "Rule", "Preceding",
                "Its grade", "Blank/grade", "Carry-over");
        for (BlankResult r : report.results()) {
            if (r.verdict().verdict() == Verdict.PASS) {
                continue;
            }
            var o = r.observation();
            find.row(o.sampleId(), o.batch(), o.position(), o.analyte(), BlankReview.describe(r),
                    r.verdict().verdict().name().toLowerCase(java.util.Locale.ROOT).replace('_', ' '), r.verdict().rule(),
                    o.precedingId(), o.precedingGrade().isMissing() ? "" : o.precedingGrade().display(),
                    Double.isNaN(r.contaminationRatio()) ? "" : Numbers.significant(100 * r.contaminationRatio(), 2) + "%",
                    r.carryOver() ? "yes" : "");
        }
        out.println();
        if (report.results().isEmpty()) {
            out.println("No blank results: blanks cannot be judged.");
        } else if (find.size() == 0) {
            out.println("Every blank passed.");
        } else {
            out.println("Blanks that did not pass");
            find.print(out);
        }
    }

    static String num(double v, int digits) {
        return Double.isNaN(v) ? "-" : Numbers.significant(v, digits);
    }

    static String p(double p) {
        return Double.isNaN(p) ? "-" : p < 1e-4 ? "<0.0001" : Numbers.significant(p, 2);
    }
}
