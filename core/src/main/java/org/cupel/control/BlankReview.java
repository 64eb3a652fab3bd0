package org.cupel.control;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.cupel.assay.AnalyteColumn;
import org.cupel.assay.AssayValue;
import org.cupel.assay.IntArrayBuilder;
import org.cupel.assay.LimitComparison;
import org.cupel.assay.Numbers;
import org.cupel.assay.QcRole;
import org.cupel.assay.SampleTable;
import org.cupel.project.Project;

/**
 * Judges every blank against its threshold ({@link BlankVerdict}), pairs it with the sample run before it
 * (carry-over) and summarises per analyte ({@link CarryOver}).
 */
public final class BlankReview {
    private BlankReview() {
    }

    /** Every blank of every analyte of the project, with the settings of config section {@code blanks}. */
    public static BlankReport review(Project project) {
        return review(project, BatchSequence.of(project.samples()));
    }

    /** As {@link #review(Project)}, with the batch sequence of the project's table already built. */
    public static BlankReport review(Project project, BatchSequence seq) {
        BlankSettings settings = project.config().section("blanks", BlankSettings.class, BlankSettings.DEFAULTS);
        int[] blanks = seq.inRunOrder(project.samples().rowsWithRole(QcRole.BLANK));
        int[] preceding = preceding(seq, blanks);
        List<BlankObservations> all = new ArrayList<>();
        for (AnalyteColumn col : project.analytes().values()) {
            all.add(observations(project.samples(), col, blanks, preceding));
        }
        return review(BlankObservations.concat(all), settings);
    }

    /**
     * The blanks of one analyte in batch and run order, each with the sample before it. The detection
     * limit is the one reported with the blank; when the lab gave none, the smallest limit reported for
     * the same analyte and method elsewhere in the project.
     */
    public static List<BlankObservation> observations(SampleTable table, BatchSequence seq, AnalyteColumn col) {
        int[] blanks = seq.inRunOrder(table.rowsWithRole(QcRole.BLANK));
        return observations(table, col, blanks, preceding(seq, blanks));
    }

    /** The row run before each of {@code rows} in its batch, -1 for one that opens its batch. */
    private static int[] preceding(BatchSequence seq, int[] rows) {
        int[] out = new int[rows.length];
        for (int i = 0; i < rows.length; i++) {
            out[i] = seq.preceding(rows[i]);
        }
        return out;
    }

    /** The observations read from the column when asked for; only the rows, preceding rows and limits are kept. */
    private static BlankObservations observations(SampleTable table, AnalyteColumn col, int[] blanksInRunOrder,
                                                  int[] preceding) {
        Map<String, Double> methodLimit = null;
        double[] limits = new double[blanksInRunOrder.length];
        for (int i = 0; i < limits.length; i++) {
            int row = blanksInRunOrder[i];
            double dl = col.limit(row);
            if (!(dl > 0) || col.qualifier(row) == org.cupel.assay.Qualifier.ABOVE_UPPER_LIMIT) {
                // Only blanks without a usable limit of their own need the scan of the whole column.
                methodLimit = methodLimit == null ? methodLimits(col) : methodLimit;
                dl = methodLimit.getOrDefault(col.method(row), Double.NaN);
            }
            limits[i] = dl;
        }
        return BlankObservations.of(table, col, blanksInRunOrder, preceding, limits);
    }

    /** Judges the observations (any mix of analytes); missing blank results are counted, not judged. */
    public static BlankReport review(List<BlankObservation> observations, BlankSettings settings) {
        return review(BlankObservations.of(observations), settings);
    }

    /**
     * Judges each observation into columns ({@link JudgedBlanks}): the thresholds, which depend only on the
     * analyte and its limit and so change rarely from row to row, are kept once per change, with the first
     * result they apply to.
     */
    private static BlankReport review(BlankObservations obs, BlankSettings settings) {
        Map<String, IntArrayBuilder> byAnalyte = new LinkedHashMap<>();
        Map<String, Integer> missing = new HashMap<>();
        Map<String, String> units = new HashMap<>();
        IntArrayBuilder judged = new IntArrayBuilder();
        IntArrayBuilder thresholdFrom = new IntArrayBuilder();
        byte[] decided = new byte[obs.size()];
        List<BlankThreshold> thresholds = new ArrayList<>();
        IntArrayBuilder current = null;
        String currentAnalyte = null;
        String thresholdAnalyte = null;
        double thresholdLimit = Double.NaN;
        int offset = 0;
        for (BlankObservations part : obs.parts()) {
            // Read each part directly: a joined list would look up the part at every read.
            for (int k = 0; k < part.size(); k++) {
                int i = offset + k;
                String analyte = part.analyte(k);
                if (!analyte.equals(currentAnalyte)) {
                    // Observations come analyte by analyte: look the analyte up once per run of it.
                    currentAnalyte = analyte;
                    current = byAnalyte.computeIfAbsent(currentAnalyte, a -> new IntArrayBuilder());
                }
                units.put(analyte, part.unit(k));
                AssayValue value = part.value(k);
                if (value.isMissing()) {
                    missing.merge(analyte, 1, Integer::sum);
                    continue;
                }
                double dl = part.detectionLimit(k);
                if (thresholds.isEmpty() || !analyte.equals(thresholdAnalyte)
                        || Double.compare(dl, thresholdLimit) != 0) {
                    thresholdAnalyte = analyte;
                    thresholdLimit = dl;
                    thresholds.add(settings.thresholdFor(thresholdAnalyte, thresholdLimit).orElse(null));
                    thresholdFrom.add(judged.size());
                }
                BlankThreshold t = thresholds.get(thresholds.size() - 1);
                int d = BlankVerdict.decide(value, t);
                boolean carry = BlankVerdict.verdictOf(d) == Verdict.FAIL
                        && carryOver(part.precedingGrade(k), t, settings);
                current.add(judged.size());
                decided[judged.size()] = JudgedBlanks.code(d, carry);
                judged.add(i);
            }
            offset += part.size();
        }
        JudgedBlanks results = new JudgedBlanks(obs, judged.toArray(), thresholdFrom.toArray(), thresholds,
                java.util.Arrays.copyOf(decided, judged.size()));
        List<BlankSummary> summaries = new ArrayList<>();
        for (Map.Entry<String, IntArrayBuilder> e : byAnalyte.entrySet()) {
            summaries.add(summary(e.getKey(), units.get(e.getKey()), results, e.getValue().toArray(),
                    missing.getOrDefault(e.getKey(), 0)));
        }
        return new BlankReport(results, summaries, settings);
    }

    static BlankResult judge(BlankObservation o, BlankSettings settings) {
        BlankThreshold t = settings.thresholdFor(o.analyte(), o.detectionLimit()).orElse(null);
        int d = BlankVerdict.decide(o.value(), t);
        boolean carry = BlankVerdict.verdictOf(d) == Verdict.FAIL && carryOver(o.precedingGrade(), t, settings);
        return result(o, t, BlankVerdict.of(d, o.value(), t, o.unit()), carry);
    }

    /**
     * Whether a failing blank follows a high-grade sample: {@code prev} at least highGradeMultiple × the failure
     * level.
     */
    private static boolean carryOver(AssayValue prev, BlankThreshold t, BlankSettings settings) {
        return t != null && !prev.isMissing() && prev.qualifier() != org.cupel.assay.Qualifier.BELOW_DETECTION
                && LimitComparison.atLeast(prev.value(), settings.highGradeMultiple() * t.fail());
    }

    /**
     * The result of observation {@code o} judged {@code v} under {@code t}, with its contamination ratio and its
     * outcome (the reason written when read).
     */
    static BlankResult result(BlankObservation o, BlankThreshold t, BlankVerdict v, boolean carry) {
        AssayValue prev = o.precedingGrade();
        double ratio = Double.NaN;
        String ratioNote = "";
        if (prev.isMissing()) {
            ratioNote = o.precedingId().isEmpty() ? "first sample in the batch" : "preceding sample has no result";
        } else if (!o.value().isDetected()) {
            ratioNote = "blank not a detected value";
        } else if (!prev.isDetected() || !(prev.value() > 0)) {
            ratioNote = "preceding grade not a positive detected value";
        } else {
            ratio = o.value().value() / prev.value();
        }
        ControlOutcome outcome = ControlOutcome.described(o.row(), o.analyte(), v.verdict(), v.rule(),
                () -> reason(o, v, carry), v.verdict() == Verdict.FAIL);
        return new BlankResult(o, t, v, ratio, ratioNote, carry, outcome);
    }

    /** "B12 Au: 0.3 g/t is above the failure threshold 0.025 g/t; follows S11 at 9.1 g/t (probable carry-over)". */
    private static String reason(BlankObservation o, BlankVerdict v, boolean carry) {
        AssayValue prev = o.precedingGrade();
        String reason = o.sampleId() + " " + o.analyte() + ": " + v.explanation();
        if (!prev.isMissing() && v.verdict() != Verdict.PASS) {
            reason += "; follows " + o.precedingId() + " at " + prev.display() + " " + o.unit();
        }
        if (carry) {
            reason += " (probable carry-over)";
        }
        return reason;
    }

    private static BlankSummary summary(String analyte, String unit, JudgedBlanks results, int[] mine, int missing) {
        int[] counts = new int[Verdict.values().length];
        int carry = 0;
        for (int i : mine) {
            counts[results.verdict(i).ordinal()]++;
            carry += results.carryOver(i) ? 1 : 0;
        }
        return new BlankSummary(analyte, unit, mine.length, counts[Verdict.PASS.ordinal()],
                counts[Verdict.WARN.ordinal()], counts[Verdict.FAIL.ordinal()],
                counts[Verdict.CANNOT_JUDGE.ordinal()], missing, carry, CarryOver.relation(analyte, mine.length,
                        k -> results.value(mine[k]), k -> results.precedingGrade(mine[k])));
    }

    private static Map<String, Double> methodLimits(AnalyteColumn col) {
        Map<String, Double> out = new HashMap<>();
        for (int row = 0; row < col.size(); row++) {
            double l = col.limit(row);
            if (l > 0 && col.qualifier(row) != org.cupel.assay.Qualifier.ABOVE_UPPER_LIMIT) {
                out.merge(col.method(row), l, Math::min);
            }
        }
        return out;
    }

    /** "0.21 g/t (42×DL)", for tables. */
    public static String describe(BlankResult r) {
        BlankObservation o = r.observation();
        String s = o.value().display() + " " + o.unit();
        if (o.detectionLimit() > 0 && o.value().isDetected()) {
            s += " (" + Numbers.significant(o.value().value() / o.detectionLimit(), 3) + "×DL)";
        }
        return s;
    }
}
