package org.cupel.control.crm;

import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.Map;
import org.cupel.config.SettingException;

/**
 * Settings of the CRM review, config section {@code crm} (docs/config.md, docs/control-rules.md).
 *
 * @param rules action per rule id ({@link CrmRule#id()}): off, warn or fail. Defaults: 1-2s warn, 1-3s
 *     and 2-2s fail (the assay-practice failure rule; Westgard et al. 1981), every other rule off. Keys
 *     given in the config override these one by one.
 * @param ewmaLambda EWMA weight λ (default 0.2)
 * @param ewmaWidth EWMA limit width L (default 3)
 * @param cusumK CUSUM reference value k in SD (default 0.5)
 * @param cusumH CUSUM decision interval h in SD (default 5)
 * @param projectLimitsMinN results of a CRM needed before project-derived limits are shown (default 20)
 * @param swapWithinSd a failing result within this many SD of another CRM is a probable swap (default 2)
 * @param blankLevelMultiple a failing result at or below this multiple of its detection limit is a
 *     probable blank in a CRM slot (default 5, the blank failure multiple)
 * @param confidence level of bias and slope intervals (default 0.95)
 * @param driftAlpha a trend in z with p below this is reported as drift (default 0.05)
 */
public record CrmSettings(Map<String, RuleAction> rules, double ewmaLambda, double ewmaWidth, double cusumK,
                          double cusumH, int projectLimitsMinN, double swapWithinSd, double blankLevelMultiple,
                          double confidence, double driftAlpha) {

    public static final CrmSettings DEFAULTS = new CrmSettings(defaultRules(), 0.2, 3, 0.5, 5, 20, 2, 5, 0.95,
            0.05);

    public CrmSettings {
        Map<String, RuleAction> copy = new LinkedHashMap<>();
        for (Map.Entry<String, RuleAction> e : rules.entrySet()) {
            try {
                copy.put(CrmRule.byId(e.getKey()).id(), e.getValue());
            } catch (IllegalArgumentException unknown) {
                throw new SettingException(unknown.getMessage() + "; correct the rule id", "rules", e.getKey());
            }
        }
        rules = java.util.Collections.unmodifiableMap(copy);
        if (!(confidence > 0 && confidence < 1) || !(driftAlpha > 0 && driftAlpha < 1)) {
            throw new IllegalArgumentException("confidence and driftAlpha must lie between 0 and 1");
        }
        requireRange(ewmaLambda > 0 && ewmaLambda <= 1, "ewmaLambda", ewmaLambda,
                "the EWMA weight lies in 0 < λ ≤ 1 (default 0.2)");
        requireRange(ewmaWidth > 0 && Double.isFinite(ewmaWidth), "ewmaWidth", ewmaWidth,
                "the EWMA limit width is a positive number of SDs (default 3)");
        requireRange(cusumK >= 0 && Double.isFinite(cusumK), "cusumK", cusumK,
                "the CUSUM reference value is 0 or more SDs (default 0.5)");
        requireRange(cusumH > 0 && Double.isFinite(cusumH), "cusumH", cusumH,
                "the CUSUM decision interval is a positive number of SDs (default 5)");
        if (!(swapWithinSd > 0) || !(blankLevelMultiple >= 0) || projectLimitsMinN < 3) {
            throw new IllegalArgumentException("swapWithinSd must be > 0, blankLevelMultiple >= 0, "
                    + "projectLimitsMinN >= 3");
        }
    }

    /** The EWMA and CUSUM parameters are checked here, in the user's terms, before a chart refuses them. */
    private static void requireRange(boolean ok, String key, double value, String rule) {
        if (!ok) {
            throw new SettingException(org.cupel.assay.Numbers.compact(value) + " is out of range: " + rule
                    + "; correct the value", key);
        }
    }

    /** The action of every rule, OFF for rules the map does not name. */
    public Map<CrmRule, RuleAction> actions() {
        Map<CrmRule, RuleAction> out = new EnumMap<>(CrmRule.class);
        for (CrmRule r : CrmRule.values()) {
            out.put(r, rules.getOrDefault(r.id(), RuleAction.OFF));
        }
        return out;
    }

    private static Map<String, RuleAction> defaultRules() {
        Map<String, RuleAction> m = new LinkedHashMap<>();
        for (CrmRule r : CrmRule.values()) {
            m.put(r.id(), RuleAction.OFF);
        }
        m.put(CrmRule.W_1_2S.id(), RuleAction.WARN);
        m.put(CrmRule.W_1_3S.id(), RuleAction.FAIL);
        m.put(CrmRule.W_2_2S.id(), RuleAction.FAIL);
        return m;
    }

    /** A builder holding {@link #DEFAULTS}: {@code CrmSettings.withDefaults().someSetting(value).build()}. */
    public static Builder withDefaults() {
        return DEFAULTS.toBuilder();
    }

    /** A builder holding these settings, to change some of them. */
    public Builder toBuilder() {
        return new Builder(this);
    }

    /**
     * Sets any of the settings, each named as its record component; {@link #build} checks them together, as the
     * config does, so the order of the calls does not matter.
     */
    public static final class Builder {
        private Map<String, RuleAction> rules;
        private double ewmaLambda;
        private double ewmaWidth;
        private double cusumK;
        private double cusumH;
        private int projectLimitsMinN;
        private double swapWithinSd;
        private double blankLevelMultiple;
        private double confidence;
        private double driftAlpha;

        private Builder(CrmSettings s) {
            rules = s.rules();
            ewmaLambda = s.ewmaLambda();
            ewmaWidth = s.ewmaWidth();
            cusumK = s.cusumK();
            cusumH = s.cusumH();
            projectLimitsMinN = s.projectLimitsMinN();
            swapWithinSd = s.swapWithinSd();
            blankLevelMultiple = s.blankLevelMultiple();
            confidence = s.confidence();
            driftAlpha = s.driftAlpha();
        }

        public Builder rules(Map<String, RuleAction> value) {
            rules = value;
            return this;
        }

        public Builder ewmaLambda(double value) {
            ewmaLambda = value;
            return this;
        }

        public Builder ewmaWidth(double value) {
            ewmaWidth = value;
            return this;
        }

        public Builder cusumK(double value) {
            cusumK = value;
            return this;
        }

        public Builder cusumH(double value) {
            cusumH = value;
            return this;
        }

        public Builder projectLimitsMinN(int value) {
            projectLimitsMinN = value;
            return this;
        }

        public Builder swapWithinSd(double value) {
            swapWithinSd = value;
            return this;
        }

        public Builder blankLevelMultiple(double value) {
            blankLevelMultiple = value;
            return this;
        }

        public Builder confidence(double value) {
            confidence = value;
            return this;
        }

        public Builder driftAlpha(double value) {
            driftAlpha = value;
            return this;
        }

        /** @throws org.cupel.config.SettingException or IllegalArgumentException for a value out of range */
        public CrmSettings build() {
            return new CrmSettings(rules, ewmaLambda, ewmaWidth, cusumK, cusumH, projectLimitsMinN, swapWithinSd,
                    blankLevelMultiple, confidence, driftAlpha);
        }
    }
}
