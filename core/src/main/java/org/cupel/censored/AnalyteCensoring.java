package org.cupel.censored;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import org.cupel.assay.AnalyteColumn;
import org.cupel.assay.QcRole;
import org.cupel.assay.Qualifier;
import org.cupel.assay.SampleTable;
import org.cupel.project.Project;

/**
 * How detection limits and censored values occur for one analyte of a project, and the censored
 * summary of its routine samples: what the appendix section on detection limits reports.
 *
 * @param analyteLabel "Au (g/t)"
 * @param detectionLimits distinct detection limits stated on detected and below-detection values, ascending
 * @param upperLimits distinct upper limits stated on above-range values, ascending
 * @param values non-missing reported values, all roles
 * @param below of which below detection
 * @param above of which above the upper range
 * @param missing rows without a value
 * @param methodCounts how many reported values came from each method (empty name: none given)
 * @param routine censored summary of the routine samples
 * @param blanks detection limits estimated from the project's blanks (n = 0 when it has none)
 */
public record AnalyteCensoring(String analyteLabel, List<Double> detectionLimits, List<Double> upperLimits, int values,
                               int below, int above, int missing, Map<String, Integer> methodCounts,
                               CensoredAnalysis routine, BlankLimits blanks) {

    public AnalyteCensoring {
        detectionLimits = List.copyOf(detectionLimits);
        upperLimits = List.copyOf(upperLimits);
        methodCounts = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(methodCounts));
    }

    public static List<AnalyteCensoring> of(Project project, CensoredSettings settings) {
        List<AnalyteCensoring> out = new ArrayList<>();
        for (AnalyteColumn column : project.analytes().values()) {
            out.add(of(column, project.samples(), settings));
        }
        return out;
    }

    public static AnalyteCensoring of(AnalyteColumn column, SampleTable samples, CensoredSettings settings) {
        Tally.Counter dls = new Tally.Counter();
        Tally.Counter uls = new Tally.Counter();
        int below = 0;
        int above = 0;
        int missing = 0;
        for (int row = 0; row < column.size(); row++) {
            Qualifier q = column.qualifier(row);
            double limit = column.limit(row);
            switch (q) {
                case MISSING -> missing++;
                case BELOW_DETECTION -> below++;
                case ABOVE_UPPER_LIMIT -> above++;
                default -> { }
            }
            if (Double.isNaN(limit) || q == Qualifier.MISSING) {
                continue;
            }
            if (q == Qualifier.ABOVE_UPPER_LIMIT) {
                uls.add(limit);
            } else {
                dls.add(limit);
            }
        }
        CensoredSample routine = CensoredSample.of(column, samples.rowsWithRole(QcRole.ROUTINE));
        CensoredAnalysis analysis = CensoredAnalysis.of(routine, settings);
        BlankLimits blanks = BlankLimits.of(CensoredSample.of(column, samples.rowsWithRole(QcRole.BLANK)), settings);
        return new AnalyteCensoring(column.analyte().label(), distinct(dls), distinct(uls),
                column.size() - missing, below, above, missing, column.reportedMethodCounts(), analysis, blanks);
    }

    private static List<Double> distinct(Tally.Counter limits) {
        return Arrays.stream(limits.tally().distinctValues()).boxed().toList();
    }
}
