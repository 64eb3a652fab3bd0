package org.cupel.control.crm;

import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.Map;

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
            copy.put(CrmRule.byId(e.getKey()).id(), e.getValue());
        }
        rules = java.util.Collections.unmodifiableMap(copy);
        if (!(confidence > 0 && confidence < 1) || !(driftAlpha > 0 && driftAlpha < 1)) {
            throw new IllegalArgumentException("confidence and driftAlpha must lie between 0 and 1");
        }
        if (!(swapWithinSd > 0) || !(blankLevelMultiple >= 0) || projectLimitsMinN < 3) {
            throw new IllegalArgumentException("swapWithinSd must be > 0, blankLevelMultiple >= 0, "
                    + "projectLimitsMinN >= 3");
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
}
