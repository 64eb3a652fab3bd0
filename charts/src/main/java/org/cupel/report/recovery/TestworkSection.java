package org.cupel.report.recovery;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.stream.Collectors;
import org.cupel.charts.recovery.DeportmentChart;
import org.cupel.charts.recovery.DifferenceChart;
import org.cupel.charts.recovery.RecoveryByConditionChart;
import org.cupel.recovery.ComparisonVerdict;
import org.cupel.recovery.ConditionRecovery;
import org.cupel.recovery.Deportment;
import org.cupel.recovery.PairComparison;
import org.cupel.recovery.RecoveryAnalysis;
import org.cupel.recovery.RecoveryInterval;
import org.cupel.recovery.RecoveryResult;
import org.cupel.recovery.SmeltBalance;
import org.cupel.recovery.SmeltRecovery;
import org.cupel.report.Cell;
import org.cupel.report.ReportBlock;
import org.cupel.report.ReportColumn;
import org.cupel.report.ReportSection;
import org.cupel.report.ReportTable;

/**
 * The metallurgical testwork section of the QC appendix: recoveries with intervals, pairwise verdicts,
 * the balance check, deportment, charts, and the caution on fire assay hazards. It formats the records of
 * {@link RecoveryResult}; it computes nothing. The tables are public so the CLI prints the same ones.
 */
public final class TestworkSection {
    private static final String DASH = "—";

    private TestworkSection() {
    }

    public static ReportSection build(RecoveryResult r) {
        List<ReportBlock> blocks = new ArrayList<>();
        blocks.addAll(findings(r));
        blocks.add(new ReportBlock.Paragraph(summary(r)));
        blocks.add(new ReportBlock.Table(recoveries(r)));
        for (String a : r.analytes()) {
            blocks.add(new ReportBlock.Figure("recovery-" + a, a + " recovery per condition: mean (diamond), "
                    + "t-interval (bar) and each smelt (points).", () -> RecoveryByConditionChart.of(r, a)));
        }
        blocks.add(new ReportBlock.Table(comparisons(r)));
        for (String a : r.analytes()) {
            blocks.add(new ReportBlock.Figure("recovery-differences-" + a, a + ": difference between each pair of "
                    + "conditions with its Welch CI (per pair, not adjusted; the verdicts use the Holm-adjusted p), "
                    + "against zero and the equivalence margin.",
                    () -> DifferenceChart.of(r, a)));
        }
        blocks.add(new ReportBlock.Table(balance(r)));
        blocks.add(new ReportBlock.Table(deportment(r)));
        for (String a : r.analytes()) {
            blocks.add(new ReportBlock.Figure("deportment-" + a, a + " deportment: mean share of the metal in each "
                    + "product, per condition.", () -> DeportmentChart.of(r, a)));
        }
        r.notes().forEach(n -> blocks.add(new ReportBlock.Callout(ReportBlock.Level.INFO, n)));
        blocks.add(new ReportBlock.Callout(ReportBlock.Level.CAUTION, r.safetyCaution()));
        Map<String, Object> headlines = new LinkedHashMap<>();
        headlines.put("recovery.smelts", r.smelts().stream().map(s -> s.smelt().testId()).distinct().count());
        headlines.put("recovery.conditions", r.conditions().stream().map(ConditionRecovery::condition).distinct()
                .count());
        for (ComparisonVerdict v : ComparisonVerdict.values()) {
            headlines.put("recovery.pairs." + v.name().toLowerCase(Locale.ROOT),
                    r.comparisons().stream().filter(p -> p.verdict() == v).count());
        }
        headlines.put("recovery.balancesNotClosing", r.smelts().stream().filter(s -> s.usable() && !s.balanceCloses())
                .count());
        return new ReportSection("testwork", "Metallurgical testwork: smelt recoveries", blocks, headlines);
    }

    /**
     * The findings in plain words, one callout per analyte (recovery of each condition with its t-interval,
     * the pairs that differ, how many cannot be told apart or are equivalent) and, when some smelt's metal
     * balance does not close, a warning naming them. The summary of the appendix shows the same callouts.
     */
    public static List<ReportBlock.Callout> findings(RecoveryResult r) {
        List<ReportBlock.Callout> out = new ArrayList<>();
        for (String a : r.analytes()) {
            out.add(new ReportBlock.Callout(ReportBlock.Level.INFO, analyteFinding(r, a)));
        }
        List<String> open = r.smelts().stream().filter(s -> s.usable() && !s.balanceCloses())
                .map(s -> s.smelt().testId() + " " + s.analyte()).toList();
        long balances = r.smelts().stream().filter(SmeltRecovery::usable).count();
        String tolerance = num(100 * r.settings().balanceTolerance(), 1);
        out.add(open.isEmpty()
                ? new ReportBlock.Callout(ReportBlock.Level.PASS, "The metal balance closes within ±" + tolerance
                        + "% for all " + balances + " smelt balances.")
                : new ReportBlock.Callout(ReportBlock.Level.WARN, "The metal balance does not close within ±"
                        + tolerance + "% for " + open.size() + " of " + balances + " smelt balances: "
                        + String.join(", ", open) + "; check the weights and assays of these smelts."));
        return out;
    }

    private static String analyteFinding(RecoveryResult r, String analyte) {
        int conf = (int) Math.round(100 * r.settings().confidence());
        List<String> conditions = new ArrayList<>();
        for (ConditionRecovery c : r.conditions()) {
            if (c.analyte().equals(analyte)) {
                RecoveryInterval t = c.tInterval();
                conditions.add(c.condition() + " " + num(c.mean(), 2) + "%" + (t.computed()
                        ? " (" + num(t.lower(), 2) + " to " + num(t.upper(), 2) + ")" : ""));
            }
        }
        List<PairComparison> mine = r.comparisons().stream().filter(p -> p.analyte().equals(analyte)).toList();
        List<String> differ = mine.stream().filter(p -> p.verdict() == ComparisonVerdict.DIFFERENT)
                .map(TestworkSection::difference).toList();
        long cannotTell = mine.stream().filter(p -> p.verdict() == ComparisonVerdict.CANNOT_TELL).count();
        long equivalent = mine.stream().filter(p -> p.verdict() == ComparisonVerdict.EQUIVALENT).count();
        StringBuilder sb = new StringBuilder(analyte + " recovery (" + r.settings().recoveryDefinition().label()
                + ", mean with " + conf + "% t-interval): " + String.join("; ", conditions) + ". ");
        sb.append(differ.isEmpty() ? "No pair of conditions is shown to differ" : "Different: "
                + String.join("; ", differ));
        sb.append(". ").append(cannotTell).append(" of ").append(mine.size()).append(" pairs cannot be told apart "
                + "with this many replicates; ").append(equivalent).append(" shown equivalent within ±")
                .append(num(r.settings().equivalenceMargin(), 2)).append(" pp.");
        return sb.toString();
    }

    /** "LIT90-1050 higher than LIT60-1050 by 6.08 pp (Holm p = 0.001)", with the larger recovery first. */
    private static String difference(PairComparison p) {
        double d = p.welch().difference();
        String higher = d >= 0 ? p.first() : p.second();
        String lower = d >= 0 ? p.second() : p.first();
        String holm = p.holmP() < 0.001 ? "Holm p < 0.001" : "Holm p = " + pValue(p.holmP());
        return higher + " higher than " + lower + " by " + num(Math.abs(d), 2) + " pp (" + holm
                + (p.conclusionDependsOnCensoring() ? "; " + p.verdictCensoredAtZero().label() + " when censored loss "
                + "assays count as zero" : "") + ")";
    }

    static String summary(RecoveryResult r) {
        long smelts = r.smelts().stream().map(s -> s.smelt().testId()).distinct().count();
        long conditions = r.conditions().stream().map(ConditionRecovery::condition).distinct().count();
        return String.format(Locale.ROOT, "%d smelts under %d conditions, analysed for %s. Recoveries are %s, with "
                + "%.0f%% confidence intervals; conditions are compared pairwise (Welch t with Holm and Games–Howell "
                + "family-wise control, and TOST equivalence within ±%s percentage points).", smelts, conditions,
                String.join(" and ", r.analytes()), r.settings().recoveryDefinition().label(),
                100 * r.settings().confidence(), num(r.settings().equivalenceMargin(), 2));
    }

    public static ReportTable recoveries(RecoveryResult r) {
        int conf = (int) Math.round(100 * r.settings().confidence());
        List<List<Cell>> rows = new ArrayList<>();
        for (int i = 0; i < r.conditions().size(); i++) {
            ConditionRecovery c = r.conditions().get(i);
            ConditionRecovery z = r.conditionsCensoredAtZero().get(i);
            List<String> notes = new ArrayList<>();
            for (RecoveryInterval iv : List.of(c.tInterval(), c.gum(), c.fieller())) {
                if (!iv.note().isEmpty()) {
                    notes.add(iv.method() + ": " + iv.note());
                }
            }
            notes.addAll(c.excluded());
            rows.add(List.of(Cell.text(c.analyte()), Cell.text(c.condition()), Cell.count(c.n()), number(c.mean(), 2),
                    number(c.sd(), 2), interval(c.tInterval()), interval(c.gum()), number(c.gum().df(), 1),
                    interval(c.fieller()), bounds(c), r.anyCensoredLoss() ? number(z.mean(), 2) : dash(""),
                    Cell.text(String.join("; ", notes))));
        }
        return ReportTable.typed("recovery-by-condition", "Recovery per condition (" + r.settings().recoveryDefinition()
                .label() + ")", List.of(ReportColumn.text("Analyte", "analyte"), ReportColumn.text("Condition", "condition"),
                ReportColumn.count("n", "n"), ReportColumn.number("Mean (%)", "mean", "%").withNote(),
                ReportColumn.number("SD (pp)", "sd", "pp").withNote(), range(conf + "% CI, t (%)", "ci_t", "%"),
                range(conf + "% CI, GUM (%)", "ci_gum", "%"), ReportColumn.number("ν_eff", "nu_eff", "").withNote(),
                range(conf + "% CI, Fieller (%)", "ci_fieller", "%"),
                range("Bounds, censored loss (%)", "bounds_censored_loss", "%"),
                ReportColumn.number("Mean, censored = 0 (%)", "mean_censored_zero", "%").withNote(),
                ReportColumn.text("Notes", "notes")), rows, "Intervals marked † are computed on the log of the loss and "
                + "cannot pass 100%. Censored loss assays are counted at their detection limit unless stated. "
                + RecoveryAnalysis.bootstrapNote(r.conditions()));
    }

    /** Two numbers, lower to upper; the CSV note says when they were computed on the log of the loss. */
    private static ReportColumn range(String header, String key, String unit) {
        return ReportColumn.parts(header, key, new ReportColumn.Part("lower", unit, ReportColumn.CsvType.DOUBLE),
                new ReportColumn.Part("upper", unit, ReportColumn.CsvType.DOUBLE)).withNote();
    }

    public static ReportTable comparisons(RecoveryResult r) {
        int conf = (int) Math.round(100 * r.settings().confidence());
        String delta = num(r.settings().powerDifference(), 2);
        List<List<Cell>> rows = new ArrayList<>();
        for (PairComparison p : r.comparisons()) {
            boolean cannotTell = p.verdict() == ComparisonVerdict.CANNOT_TELL;
            Cell plan = !cannotTell ? dash("") : p.plan().note().isEmpty()
                    ? new Cell.Number(p.plan().perCondition(), Integer.toString(p.plan().perCondition()),
                    p.plan().perCondition() + " per condition") : Cell.notComputed(p.plan().note());
            rows.add(List.of(Cell.text(p.analyte()), Cell.text(p.first() + " − " + p.second()),
                    number(p.welch().difference(), 2),
                    p.welch().computed() ? range(p.welch().lower(), p.welch().upper(), "") : dash(""),
                    pCell(p.welch().p()), pCell(p.holmP()), pCell(p.gamesHowell().p()), pCell(p.tost().p()),
                    Cell.text(p.verdict().label()), Cell.text(r.anyCensoredLoss() ? p.verdictCensoredAtZero().label()
                            + (p.conclusionDependsOnCensoring() ? " (changes)" : "") : DASH), plan,
                    Cell.text(String.join("; ", java.util.stream.Stream.of(holmReason(r, p), p.welch().note())
                            .filter(x -> !x.isEmpty()).toList()))));
        }
        return ReportTable.typed("recovery-comparisons", "Pairwise comparison of conditions", List.of(
                ReportColumn.text("Analyte", "analyte"), ReportColumn.text("Pair", "pair"),
                ReportColumn.number("Difference (pp)", "difference", "pp").withNote(),
                range(conf + "% CI (pp)", "ci", "pp"), ReportColumn.number("Welch p", "p_welch", "").withNote(),
                ReportColumn.number("Holm p", "p_holm", "").withNote(),
                ReportColumn.number("Games–Howell p", "p_games_howell", "").withNote(),
                ReportColumn.number("TOST p (±" + num(r.settings().equivalenceMargin(), 2) + " pp)", "p_tost", "")
                        .withNote(), ReportColumn.text("Verdict", "verdict"),
                ReportColumn.text("Verdict, censored = 0", "verdict_censored_zero"),
                ReportColumn.number("Smelts needed to detect " + delta + " pp", "smelts_needed_per_condition", "")
                        .withNote(), ReportColumn.text("Notes", "notes")), rows,
                "Equivalent: TOST p < α. Different: Holm-adjusted Welch p < α. Otherwise cannot tell; the replicate "
                        + "count is for " + Math.round(100 * r.settings().power()) + "% power at α = "
                        + num(r.settings().alpha(), 3) + " with the pooled replicate SD (noncentral t).");
    }

    /** Beside a "cannot tell" whose unadjusted interval excludes zero: the Holm adjustment is the reason. */
    private static String holmReason(RecoveryResult r, PairComparison p) {
        if (!p.heldBackByHolm()) {
            return "";
        }
        long family = r.comparisons().stream().filter(c -> c.analyte().equals(p.analyte())).count();
        return "cannot tell although the unadjusted " + Math.round(100 * r.settings().confidence())
                + "% CI excludes 0 (Welch p = " + pValue(p.welch().p()) + "): the Holm-adjusted p = "
                + pValue(p.holmP()) + " over the " + family + " comparisons of " + p.analyte() + " is not below α = "
                + num(r.settings().alpha(), 3);
    }

    public static ReportTable balance(RecoveryResult r) {
        List<List<Cell>> rows = new ArrayList<>();
        for (int i = 0; i < r.smelts().size(); i++) {
            SmeltRecovery s = r.smelts().get(i);
            SmeltBalance b = r.balances().get(i);
            if (!s.usable()) {
                Cell none = dash(s.note());
                rows.add(List.of(Cell.text(s.smelt().testId()), Cell.text(s.smelt().condition()), Cell.text(s.analyte()),
                        none, none, none, Cell.text(DASH), none, none, none, none, Cell.text(s.note())));
                continue;
            }
            rows.add(List.of(Cell.text(s.smelt().testId()), Cell.text(s.smelt().condition()), Cell.text(s.analyte()),
                    number(1000 * s.metalInCharge(), 4), number(s.calculatedHeadGpt(), 3), number(s.accountability(), 4),
                    Cell.text(s.balanceCloses() ? "yes" : "NO"),
                    b.reconciliation() == null ? dash("") : pCell(b.reconciliation().p()),
                    number(b.reconciledRecovery(), 2), number(s.byLoss(), 2), number(s.direct(), 2), Cell.text(b.note())));
        }
        return ReportTable.typed("recovery-balance", "Metal balance per smelt", List.of(ReportColumn.text("Test", "test"),
                ReportColumn.text("Condition", "condition"), ReportColumn.text("Analyte", "analyte"),
                ReportColumn.number("Metal in charge (mg)", "metal_in_charge", "mg").withNote(),
                ReportColumn.number("Calculated head (g/t)", "calculated_head", "g/t").withNote(),
                ReportColumn.number("Accountability", "accountability", "").withNote(),
                ReportColumn.text("Closes (±" + num(100 * r.settings().balanceTolerance(), 1) + "%)", "closes"),
                ReportColumn.number("χ² closure p", "p_chi_square_closure", "").withNote(),
                ReportColumn.number("Reconciled recovery (%)", "reconciled_recovery", "%").withNote(),
                ReportColumn.number("Recovery by loss (%)", "recovery_by_loss", "%").withNote(),
                ReportColumn.number("Direct recovery (%)", "direct_recovery", "%").withNote(),
                ReportColumn.text("Notes", "notes")), rows,
                "Accountability = calculated head ÷ assayed head. Reconciliation: weighted least squares under "
                        + "metal in charge = Σ products (Kuehn & Davidson 1961; Hodouin & Everell 1980), weights from "
                        + "the balance resolution (" + num(r.settings().balanceResolutionGrams(), 4) + " g) and "
                        + "assay precisions " + precisions(r) + ".");
    }

    private static String precisions(RecoveryResult r) {
        if (r.settings().precisionSigma0() != null && r.settings().precisionK() != null) {
            return "σ_c = " + r.settings().precisionSigma0() + " + " + r.settings().precisionK() + "·c";
        }
        return r.settings().assayRelativeSd().entrySet().stream().sorted(Map.Entry.comparingByKey())
                .map(e -> e.getKey() + " " + num(100 * e.getValue(), 2) + "%").collect(Collectors.joining(", "))
                + " relative SD";
    }

    /** One column per product (every product met, in first-seen order): the mean share of the metal, in %. */
    public static ReportTable deportment(RecoveryResult r) {
        List<String> products = r.deportment().stream().flatMap(d -> d.sharePercent().keySet().stream()).distinct()
                .toList();
        List<List<Cell>> rows = new ArrayList<>();
        for (Deportment d : r.deportment()) {
            List<Cell> row = new ArrayList<>(List.of(Cell.text(d.analyte()), Cell.text(d.condition()), Cell.count(d.n())));
            for (String p : products) {
                Double share = d.sharePercent().get(p);
                row.add(share == null ? Cell.blank() : number(share, 2));
            }
            rows.add(row);
        }
        List<ReportColumn> columns = new ArrayList<>(List.of(ReportColumn.text("Analyte", "analyte"),
                ReportColumn.text("Condition", "condition"), ReportColumn.count("n", "n")));
        products.forEach(p -> columns.add(ReportColumn.number(capitalise(p) + " (%)", "share_" + ReportColumn.slug(p),
                "%").withNote()));
        return ReportTable.typed("recovery-deportment", "Deportment: mean share of the metal in each product",
                columns, rows, "");
    }

    private static String capitalise(String s) {
        return s.isEmpty() ? s : Character.toUpperCase(s.charAt(0)) + s.substring(1);
    }

    /** {@code v} with {@code decimals} decimals; a dash when not a number, ∞ (empty in the CSV) when infinite. */
    private static Cell number(double v, int decimals) {
        if (Double.isNaN(v)) {
            return dash("not computed");
        }
        if (Double.isInfinite(v)) {
            return new Cell.NotComputed(v > 0 ? "infinite" : "minus infinity", v > 0 ? "∞" : "−∞");
        }
        return Cell.fixed(v, decimals);
    }

    private static Cell dash(String reason) {
        return new Cell.NotComputed(reason, DASH);
    }

    private static Cell pCell(double p) {
        return Double.isNaN(p) ? dash("not computed") : new Cell.Number(p, org.cupel.assay.Numbers.significant(p, 3),
                pValue(p));
    }

    private static Cell range(double lower, double upper, String note) {
        return new Cell.Parts(java.util.Arrays.asList(finite(lower), finite(upper)),
                num(lower, 2) + " to " + num(upper, 2) + (note.isEmpty() ? "" : " †"), note);
    }

    private static Cell.Number finite(double v) {
        return Double.isFinite(v) ? Cell.fixedNumber(v, 2) : null;
    }

    static Cell interval(RecoveryInterval iv) {
        if (!iv.computed()) {
            return dash(iv.note());
        }
        return range(iv.lower(), iv.upper(), iv.scale().equals("log loss") ? "computed on the log of the loss" : "");
    }

    private static Cell bounds(ConditionRecovery c) {
        if (c.lowerBound() == c.upperBound() || Double.isNaN(c.lowerBound())) {
            return dash("");
        }
        return range(c.lowerBound(), c.upperBound(), "");
    }

    static String num(double v, int decimals) {
        if (Double.isNaN(v)) {
            return DASH;
        }
        if (Double.isInfinite(v)) {
            return "∞";
        }
        return String.format(Locale.ROOT, "%." + decimals + "f", v);
    }

    static String pValue(double p) {
        if (Double.isNaN(p)) {
            return DASH;
        }
        return p < 0.001 ? "<0.001" : String.format(Locale.ROOT, "%.3f", p);
    }
}
