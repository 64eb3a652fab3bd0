package org.cupel.control;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.cupel.assay.Analyte;
import org.cupel.assay.AnalyteColumn;
import org.cupel.assay.AssayValue;
import org.cupel.assay.Batch;
import org.cupel.assay.MethodSelector;
import org.cupel.assay.MethodValue;
import org.cupel.assay.MissingReason;
import org.cupel.assay.QcRole;
import org.cupel.assay.SampleTable;
import org.cupel.assay.SourceLocation;
import org.cupel.config.CupelConfig;
import org.cupel.control.crm.CrmData;
import org.cupel.control.crm.CrmResult;
import org.cupel.control.crm.CrmReview;
import org.cupel.control.crm.CrmSettings;
import org.cupel.control.crm.RuleAction;
import org.cupel.control.crm.SeriesReview;
import org.cupel.project.CrmCatalog;
import org.cupel.project.CrmCertificate;
import org.cupel.project.ExceptionRegister;
import org.cupel.project.Project;
import org.cupel.testing.GoldenText;
import org.cupel.testing.SeededTries;
import org.cupel.units.GradeUnit;
import org.junit.jupiter.api.Test;

/**
 * The CRM and blank results, control outcomes, batch verdicts and re-assay lists of generated projects are
 * exactly what they were when every result was an object of its own (issue 19: results kept in primitive
 * columns, records made when read). Each project has one to five batches (some undated) of routine samples,
 * CRMs of three certified codes, an unknown and an empty code, blanks and field duplicates, two analytes in
 * different units, and the values a lab reports: detected values near and far from the certified value and
 * the blank thresholds, values below detection with and without a limit, above the upper limit, and missing
 * for each reason; CRM rule actions, blank multiples and re-assay scope vary from project to project.
 *
 * <p>{@link #controlResultsAsAt23678bd} compares a digest of everything the reviews give ({@link #dump}: every
 * CRM result with its reason and outcome, every series' counts, findings and drift, every blank result with
 * its observation, verdict, explanation, ratio and outcome, every outcome list, the batch verdicts and the
 * re-assay list with its entries and brackets, also from a second source of outcomes that names the same controls
 * again) for 150 fixed seeds with testdata/golden/control-columns-projects.txt, written by the per-object
 * implementation of commit 23678bd (this test's digest method run on that commit's sources). A differing seed is
 * reproduced by {@link #project} with {@code new Random(seed)}.
 */
class ControlColumnsProperties {
    private static final long GOLDEN_SEED = 20_261_204_002L;
    private static final int GOLDEN_PROJECTS = 150;
    private static final String[] CODES = {"CRM-A", "CRM-B", "CRM-C", "CRM-X", ""};
    private static final MissingReason[] MISSING = {MissingReason.NOT_RECEIVED, MissingReason.INSUFFICIENT_SAMPLE,
        MissingReason.NOT_ANALYSED, MissingReason.BLANK_CELL};

    @Test
    void controlResultsAsAt23678bd() {
        StringBuilder digests = new StringBuilder();
        for (int i = 0; i < GOLDEN_PROJECTS; i++) {
            long seed = SeededTries.trySeed(GOLDEN_SEED, i);
            digests.append("seed ").append(seed).append(' ').append(GoldenText.sha256(dump(new Random(seed))))
                    .append('\n');
        }
        GoldenText.assertMatches("control-columns-projects.txt", digests.toString());
    }

    /**
     * The generated projects reach the cases the columns store differently: probable swaps, CRM exceptions, every
     * blank verdict, carry-over, blanks without a preceding sample, re-assay entries with several triggers.
     */
    @Test
    void generatedProjectsReachEveryCase() {
        Map<String, Integer> seen = new java.util.TreeMap<>();
        for (int i = 0; i < GOLDEN_PROJECTS; i++) {
            Project p = project(new Random(SeededTries.trySeed(GOLDEN_SEED, i)));
            CrmReview crm = CrmReview.of(p);
            BatchReview batches = BatchReview.of(p, crm.outcomes());
            seen.merge("swap", (int) crm.swaps(), Integer::sum);
            seen.merge("crm fail", (int) crm.failures(), Integer::sum);
            seen.merge("crm exception", crm.exceptions().size(), Integer::sum);
            for (BlankResult b : batches.blanks().results()) {
                seen.merge("blank " + b.verdict().verdict(), 1, Integer::sum);
                seen.merge("carry-over", b.carryOver() ? 1 : 0, Integer::sum);
                seen.merge("first in batch", b.observation().precedingId().isEmpty() ? 1 : 0, Integer::sum);
                seen.merge("ratio", Double.isNaN(b.contaminationRatio()) ? 0 : 1, Integer::sum);
            }
            for (ReassayEntry e : batches.reassay().entries()) {
                seen.merge("several triggers", e.triggeredBy().size() > 1 ? 1 : 0, Integer::sum);
            }
        }
        for (String c : List.of("swap", "crm fail", "crm exception", "blank PASS", "blank WARN", "blank FAIL",
                "blank CANNOT_JUDGE", "carry-over", "first in batch", "ratio", "several triggers")) {
            org.junit.jupiter.api.Assertions.assertTrue(seen.getOrDefault(c, 0) > 0, c + " never reached: " + seen);
        }
    }

    /**
     * What the batch verdicts, re-assay list, report and charts read by index or by filter from the columns is
     * what the records made from them say: each outcome's row, analyte, verdict, rule, reason and trigger; each
     * blank result's verdict and carry-over; one analyte's blanks, the non-passing ones and the carry-over ones;
     * a series' failures, warnings and probable swaps; the re-assay list's distinct samples.
     */
    @Test
    void fieldsReadByIndexAgreeWithTheRecords() {
        SeededTries.forAll(150, ControlColumnsProperties::project, p -> {
            CrmReview crm = CrmReview.of(p);
            BatchReview batches = BatchReview.of(p, crm.outcomes());
            for (List<ControlOutcome> list : List.of(crm.outcomes(), batches.blanks().outcomes(), batches.outcomes())) {
                ControlOutcomes os = ControlOutcomes.of(list);
                assertEquals(os, List.copyOf(os));
                for (int i = 0; i < os.size(); i++) {
                    ControlOutcome o = os.get(i);
                    assertEquals(List.of(o.row(), o.analyte(), o.verdict(), o.rule(), o.reason(), o.triggersReassay()),
                            List.of(os.row(i), os.analyte(i), os.verdict(i), os.rule(i), os.reason(i),
                                    os.triggersReassay(i)), "outcome " + i);
                }
            }
            BlankReport blanks = batches.blanks();
            List<BlankResult> all = List.copyOf(blanks.results());
            for (BlankSummary sum : blanks.summaries()) {
                assertEquals(all.stream().filter(r -> r.observation().analyte().equals(sum.analyte())).toList(),
                        List.copyOf(blanks.results(sum.analyte())));
            }
            assertEquals(all.stream().filter(r -> r.verdict().verdict() != Verdict.PASS).toList(),
                    List.copyOf(blanks.notPassing()));
            assertEquals(all.stream().filter(BlankResult::carryOver).toList(), blanks.carryOverFindings());
            for (SeriesReview s : crm.series()) {
                List<CrmResult> rs = List.copyOf(s.results());
                assertEquals(rs.stream().filter(r -> r.verdict() == Verdict.FAIL).count(), s.failures());
                assertEquals(rs.stream().filter(r -> r.verdict() == Verdict.WARN && !r.isSwap()).count(),
                        s.warnings());
                assertEquals(rs.stream().filter(CrmResult::isSwap).toList(), s.probableSwaps());
                assertEquals(rs.stream().filter(CrmResult::isSwap).count(), s.swaps());
            }
            ReassayList reassay = batches.reassay();
            assertEquals(List.copyOf(reassay.entries()).stream().map(ReassayEntry::sampleId).distinct().count(),
                    reassay.sampleCount());
        });
    }

    /** Every control result of the project drawn from {@code r}, with settings drawn from it too, as text. */
    static String dump(Random r) {
        Project p = project(r);
        CrmSettings crmSettings = crmSettings(r);
        BlankSettings blankSettings = BlankSettings.withDefaults().failMultiple(4 + r.nextInt(3))
                .warnMultiple(2 + r.nextInt(2)).highGradeMultiple(5 + r.nextInt(10)).build();
        ReassaySettings reassay = ReassaySettings.withDefaults()
                .scope(r.nextInt(4) == 0 ? ReassaySettings.Scope.WHOLE_BATCH : ReassaySettings.Scope.BRACKET)
                .crmBracket(r.nextBoolean() ? ReassaySettings.CrmBracket.PASSING_CRM
                        : ReassaySettings.CrmBracket.PASSING_CONTROL)
                .blankFollowing(r.nextInt(3) == 0 ? 1 + r.nextInt(4) : 0).build();
        StringBuilder out = new StringBuilder();
        CrmReview crm = CrmReview.of(CrmData.of(p), p.catalog(), crmSettings);
        for (SeriesReview s : crm.series()) {
            out.append(s.crm()).append(' ').append(s.analyte()).append(' ').append(s.n()).append(' ')
                    .append(s.failures()).append('/').append(s.warnings()).append('/').append(s.swaps()).append('\n')
                    .append(s.limits()).append(s.projectLimits()).append(s.bias()).append(s.drift())
                    .append(s.findings()).append('\n');
            for (CrmResult x : s.results()) {
                out.append(x).append(" | ").append(x.reason()).append(" | ").append(x.isSwap()).append(" | ")
                        .append(x.outcome(s.analyte().name())).append('\n');
            }
        }
        out.append(crm.analytes()).append('\n').append(crm.exceptions()).append('\n')
                .append(crm.failures()).append('/').append(crm.warnings()).append('/').append(crm.swaps()).append('\n');
        List<ControlOutcome> crmOutcomes = crm.outcomes();
        out.append(crmOutcomes).append('\n');
        BatchSequence seq = BatchSequence.of(p.samples());
        List<BlankObservation> observations = new ArrayList<>();
        for (AnalyteColumn col : p.analytes().values()) {
            List<BlankObservation> of = BlankReview.observations(p.samples(), seq, col);
            out.append(of).append('\n');
            observations.addAll(of);
        }
        BlankReport blanks = BlankReview.review(observations, blankSettings);
        out.append(blanks).append('\n').append(blanks.outcomes()).append('\n').append(blanks.carryOverFindings())
                .append('\n');
        for (BlankResult b : blanks.results()) {
            out.append(BlankReview.describe(b)).append(" | ").append(b.outcome().reason()).append('\n');
        }
        BlankReport projectBlanks = BlankReview.review(p);
        out.append(projectBlanks.equals(BlankReview.review(observations, BlankSettings.DEFAULTS))).append('\n');
        List<ControlOutcome> all = new ArrayList<>(crmOutcomes);
        all.addAll(blanks.outcomes());
        out.append(BatchVerdicts.judge(p.samples(), seq, all)).append('\n');
        ReassayList list = ReassayList.build(p.samples(), seq, all, reassay);
        out.append(list).append('\n').append(list.sampleCount()).append('\n');
        // A second source naming the same controls again: repeated triggers of one sample, ties within a row.
        List<ControlOutcome> again = new ArrayList<>(all);
        for (int i = 0; i < all.size(); i += 2) {
            ControlOutcome o = all.get(i);
            again.add(new ControlOutcome(o.row(), o.analyte(), r.nextBoolean() ? Verdict.FAIL : Verdict.WARN,
                    r.nextBoolean() ? o.rule() : "second look", "seen again", o.triggersReassay() || r.nextBoolean()));
        }
        java.util.Collections.shuffle(again, r);
        out.append(BatchVerdicts.judge(p.samples(), seq, again)).append('\n')
                .append(ReassayList.build(p.samples(), seq, again, reassay)).append('\n');
        BatchReview review = BatchReview.of(p, crmOutcomes);
        out.append(review.verdicts()).append('\n').append(review.reassay()).append('\n').append(review.outcomes())
                .append('\n');
        return out.toString();
    }

    private static CrmSettings crmSettings(Random r) {
        Map<String, RuleAction> rules = new LinkedHashMap<>(CrmSettings.DEFAULTS.rules());
        for (String id : List.copyOf(rules.keySet())) {
            if (r.nextInt(3) == 0) {
                rules.put(id, RuleAction.values()[r.nextInt(RuleAction.values().length)]);
            }
        }
        return CrmSettings.withDefaults().rules(rules).build();
    }

    /** A project of one to five batches with the controls and values described in the class comment. */
    static Project project(Random r) {
        Analyte au = new Analyte("Au", GradeUnit.G_PER_T);
        Analyte cu = new Analyte("Cu", GradeUnit.PERCENT);
        SampleTable.Builder table = SampleTable.builder();
        AnalyteColumn.Builder auCol = AnalyteColumn.builder(au);
        AnalyteColumn.Builder cuCol = AnalyteColumn.builder(cu);
        int batches = 1 + r.nextInt(5);
        int line = 1;
        for (int b = 0; b < batches; b++) {
            LocalDate date = r.nextInt(4) == 0 ? null : LocalDate.of(2025, 1 + r.nextInt(3), 1 + r.nextInt(28));
            Batch batch = new Batch("B" + b, r.nextInt(5) == 0 ? "Umpire" : "Lab", date, "lab.csv");
            int size = 1 + r.nextInt(40);
            for (int k = 0; k < size; k++) {
                int pick = r.nextInt(10);
                QcRole role = pick < 5 ? QcRole.ROUTINE : pick < 7 ? QcRole.CRM : pick < 9 ? QcRole.BLANK
                        : QcRole.FIELD_DUPLICATE;
                String ref = role == QcRole.CRM ? CODES[r.nextInt(CODES.length)] : "";
                // Positions sometimes repeat or run backwards, so run order is not row order.
                int position = r.nextInt(6) == 0 ? r.nextInt(size) + 1 : k + 1;
                int row = table.add("S" + b + "-" + k, batch, position, role, ref,
                        new SourceLocation("lab.csv", line++, 0));
                auCol.add(row, new MethodValue("FA", value(r, role, ref, 1.0, 0.005), null));
                cuCol.add(row, new MethodValue(r.nextInt(4) == 0 ? "AR" : "ICP", value(r, role, ref, 0.5, 0.001),
                        null));
            }
        }
        SampleTable t = table.build();
        Map<String, AnalyteColumn> cols = new LinkedHashMap<>();
        cols.put("Au", auCol.build(t.size(), MethodSelector.FIRST));
        cols.put("Cu", cuCol.build(t.size(), MethodSelector.FIRST));
        List<CrmCertificate> certs = new ArrayList<>();
        certs.add(new CrmCertificate("CRM-A", "Au", GradeUnit.G_PER_T, 1.0, 0.05, Double.NaN, Double.NaN, ""));
        certs.add(new CrmCertificate("CRM-B", "Au", GradeUnit.G_PER_T, 1.3, 0.06, Double.NaN, Double.NaN, ""));
        certs.add(new CrmCertificate("CRM-C", "Au", GradeUnit.PPM, 0.2, 0.02, Double.NaN, Double.NaN, ""));
        certs.add(new CrmCertificate("CRM-A", "Cu", GradeUnit.PERCENT, 0.5, 0.02, Double.NaN, Double.NaN, ""));
        certs.add(new CrmCertificate("CRM-B", "Cu", GradeUnit.PERCENT, 0.65, 0.03, Double.NaN, Double.NaN, ""));
        return new Project("generated", null, CupelConfig.defaults(), t, cols, new CrmCatalog(certs),
                new ExceptionRegister(), List.of());
    }

    /**
     * A value as a lab reports it: for a CRM near one of the certified values (sometimes another CRM's, a swap,
     * or blank level), for a blank near its detection limit and sometimes far above, for others a grade; a
     * few below detection (with or without a limit), above the upper limit or missing.
     */
    private static AssayValue value(Random r, QcRole role, String ref, double grade, double dl) {
        int kind = r.nextInt(20);
        double limit = r.nextInt(6) == 0 ? Double.NaN : dl * (1 + r.nextInt(3));
        if (kind == 0) {
            return AssayValue.missing(MISSING[r.nextInt(MISSING.length)]);
        }
        if (kind == 1) {
            return AssayValue.belowDetection(Double.isNaN(limit) ? dl * (1 + r.nextInt(8)) : limit);
        }
        if (kind == 2) {
            return AssayValue.aboveUpperLimit(r.nextBoolean() ? 10 : dl * 2);
        }
        double v;
        if (role == QcRole.BLANK) {
            v = r.nextInt(5) == 0 ? grade * r.nextDouble() : dl * r.nextInt(8);
        } else if (role == QcRole.CRM) {
            double certified = (ref.equals("CRM-B") ? 1.3 : ref.equals("CRM-C") ? 0.2 : 1.0) * grade;
            v = r.nextInt(8) == 0 ? (r.nextBoolean() ? 1.3 * grade : dl) : certified * (1 + 0.08 * r.nextGaussian());
        } else {
            v = grade * Math.exp(2 * r.nextGaussian());
        }
        int decimals = 3;
        v = Math.max(Math.round(v * 1000) / 1000.0, 0.001);
        return new AssayValue(org.cupel.assay.Qualifier.DETECTED, v, limit, MissingReason.NONE, decimals);
    }
}
