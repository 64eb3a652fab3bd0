package org.cupel.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.cupel.censored.CensoredSettings;
import org.cupel.config.CupelConfig;
import org.cupel.control.BlankSettings;
import org.cupel.control.InsertionSettings;
import org.cupel.control.ReassaySettings;
import org.cupel.control.crm.CrmRule;
import org.cupel.control.crm.CrmSettings;
import org.cupel.control.crm.RuleAction;
import org.cupel.duplicates.DuplicateSettings;
import org.cupel.recovery.RecoverySettings;
import org.cupel.settings.ProjectSettings;

/**
 * The table "Thresholds in force" of Methods and references: every decision threshold the analyses apply,
 * read from their settings records (so the table shows what was used), with its origin: the user's setting
 * when the config sets it ({@link CupelConfig#isUserSet}), otherwise the origin of the default as the
 * settings record documents it (a published source, or common practice).
 */
final class ThresholdsInForce {
    private static final String PRACTICE = "common practice";

    private final CupelConfig config;
    private final List<List<String>> rows = new ArrayList<>();

    private ThresholdsInForce(CupelConfig config) {
        this.config = config;
    }

    static ReportTable table(CupelConfig config) {
        ThresholdsInForce t = new ThresholdsInForce(config);
        ProjectSettings settings = ProjectSettings.of(config);
        t.crm(settings.crm());
        t.blanks(settings.blanks());
        t.duplicates(settings.duplicates());
        t.insertion(settings.insertion());
        t.reassay(settings.reassay());
        t.censored(settings.censored());
        t.recovery(settings.recovery());
        return new ReportTable("thresholds", "Thresholds in force",
                List.of("Setting", "Value", "What it decides", "Origin"), t.rows,
                "Read from the settings the analyses used; \"user setting\" marks a value set in the project "
                        + "config, every other value is Cupel's documented default (docs/config.md).");
    }

    private void add(String path, Object value, String meaning, String defaultOrigin) {
        String shown = value instanceof Double && (Double) value == Math.rint((Double) value)
                ? String.valueOf(((Double) value).longValue()) : String.valueOf(value);
        rows.add(List.of(path, shown, meaning, config.isUserSet(path) ? "user setting" : defaultOrigin));
    }

    private void crm(CrmSettings s) {
        for (Map.Entry<CrmRule, RuleAction> e : s.actions().entrySet()) {
            if (e.getValue() != RuleAction.OFF) {
                add("crm.rules." + e.getKey().id(), e.getValue().name().toLowerCase(java.util.Locale.ROOT),
                        "CRM run rule: " + e.getKey().description(), shortCitation(e.getKey().source()));
            }
        }
        add("crm.ewmaLambda", s.ewmaLambda(), "EWMA weight λ of the drift check", PRACTICE);
        add("crm.ewmaWidth", s.ewmaWidth(), "EWMA limit width L", PRACTICE);
        add("crm.cusumK", s.cusumK(), "CUSUM reference value k, in SD", PRACTICE);
        add("crm.cusumH", s.cusumH(), "CUSUM decision interval h, in SD", PRACTICE);
        add("crm.driftAlpha", s.driftAlpha(), "a trend in z with p below this is drift", PRACTICE);
        add("crm.swapWithinSd", s.swapWithinSd(), "a failing result within this many SD of another CRM is a "
                + "probable swap", PRACTICE);
        add("crm.blankLevelMultiple", s.blankLevelMultiple(), "a failing result at or below this × DL is a "
                + "probable blank in a CRM slot", PRACTICE);
        add("crm.confidence", s.confidence(), "level of bias and slope intervals", PRACTICE);
        add("crm.projectLimitsMinN", s.projectLimitsMinN(), "results needed before project limits are shown",
                PRACTICE);
    }

    /** Author and year only ("Westgard et al. 1981"); the full reference is in the references table. */
    private static String shortCitation(CrmRule.Source source) {
        switch (source) {
            case WESTGARD: return "Westgard et al. 1981";
            case WESTERN_ELECTRIC: return "Western Electric 1956";
            default: return "Nelson 1984";
        }
    }

    private void blanks(BlankSettings s) {
        add("blanks.failMultiple", s.failMultiple(), "a blank fails above this × DL", PRACTICE);
        add("blanks.warnMultiple", s.warnMultiple(), "a blank warns above this × DL", PRACTICE);
        add("blanks.highGradeMultiple", s.highGradeMultiple(), "a failing blank after a sample above this × the "
                + "failure threshold is probable carry-over", PRACTICE);
        s.absolute().forEach((analyte, limits) -> add("blanks.absolute." + analyte, limits,
                "absolute blank thresholds of " + analyte, PRACTICE));
    }

    private void duplicates(DuplicateSettings s) {
        add("duplicates.fieldHardLimitPercent", s.fieldHardLimitPercent(), "HARD limit of field duplicates, %",
                PRACTICE);
        add("duplicates.coarseHardLimitPercent", s.coarseHardLimitPercent(), "HARD limit of coarse-reject "
                + "duplicates, %", PRACTICE);
        add("duplicates.pulpHardLimitPercent", s.pulpHardLimitPercent(), "HARD limit of pulp duplicates, %",
                PRACTICE);
        add("duplicates.labRepeatHardLimitPercent", s.labRepeatHardLimitPercent(), "HARD limit of lab repeats, %",
                PRACTICE);
        add("duplicates.umpireHardLimitPercent", s.umpireHardLimitPercent(), "HARD limit of umpire checks, %",
                PRACTICE);
        add("duplicates.acceptancePercent", s.acceptancePercent(), "share of pairs that must lie within the "
                + "HARD limit, %", PRACTICE);
        add("duplicates.limitMultipleOfDetection", s.limitMultipleOfDetection(), "pairs with a mean below this "
                + "× DL are left out of relative measures", PRACTICE);
        add("duplicates.batchTestAlpha", s.batchTestAlpha(), "significance level of a batch's RMS CV against "
                + "its set's", PRACTICE);
        add("duplicates.batchRuleAlpha", s.batchRuleAlpha(), "a batch fails the acceptance rule only when the "
                + "one-sided binomial test of its share within the HARD limit gives p below this", PRACTICE);
        add("duplicates.thGroupSize", s.thGroupSize(), "pairs per Thompson–Howarth group",
                "Thompson & Howarth 1978");
        add("duplicates.thMinimumPairs", s.thMinimumPairs(), "fewest usable pairs for a precision model",
                PRACTICE);
    }

    private void insertion(InsertionSettings s) {
        String abzalov = "Abzalov 2008; " + PRACTICE;
        add("insertion.crm", s.crm(), "target CRMs per routine sample", abzalov);
        add("insertion.blank", s.blank(), "target blanks per routine sample", PRACTICE);
        add("insertion.fieldDuplicate", s.fieldDuplicate(), "target field duplicates per routine sample", abzalov);
        add("insertion.coarseDuplicate", s.coarseDuplicate(), "target coarse-reject duplicates per routine "
                + "sample", PRACTICE);
        add("insertion.pulpDuplicate", s.pulpDuplicate(), "target pulp duplicates per routine sample", abzalov);
        add("insertion.labRepeat", s.labRepeat(), "target lab repeats per routine sample (0: no target)", PRACTICE);
        add("insertion.umpire", s.umpire(), "target umpire checks per routine sample (0: no target)", PRACTICE);
    }

    private void reassay(ReassaySettings s) {
        add("reassay.scope", s.scope().name().toLowerCase(java.util.Locale.ROOT), "which samples a failed control "
                + "sends for re-assay", PRACTICE);
        add("reassay.crmBracket", s.crmBracket().name().toLowerCase(java.util.Locale.ROOT), "what bounds the "
                + "bracket of a failed CRM (passing CRMs; blanks do not test accuracy at grade)", PRACTICE);
        add("reassay.blankFollowing", s.blankFollowing(), "most samples a failed blank sends back (0: up to the "
                + "next passing blank)", PRACTICE);
    }

    private void censored(CensoredSettings s) {
        add("censored.kmLowestMass", s.kmLowestMass(), "where Kaplan–Meier puts the mass below the lowest detect",
                "Helsel 2012");
        add("censored.kmSdDivisor", s.kmSdDivisor(), "Kaplan–Meier SD convention", "Helsel 2012");
    }

    private void recovery(RecoverySettings s) {
        add("recovery.confidence", s.confidence(), "level of recovery intervals", PRACTICE);
        add("recovery.alpha", s.alpha(), "significance level of the comparisons and the replicate plan",
                PRACTICE);
        add("recovery.equivalenceMargin", s.equivalenceMargin(), "± margin of the TOST equivalence test, "
                + "percentage points", "Schuirmann 1987 (test); margin: " + PRACTICE);
        add("recovery.balanceTolerance", s.balanceTolerance(), "a smelt's balance closes when |accountability "
                + "− 1| is at most this", PRACTICE);
        add("recovery.power", s.power(), "target power of the replicate plan", PRACTICE);
    }
}
