package org.cupel.control.crm;

import java.util.List;
import org.cupel.control.ControlOutcome;
import org.cupel.control.Verdict;

/**
 * The judgement on one CRM result.
 *
 * @param point the result
 * @param z (x − certified) / certificate SD
 * @param band ISO 13528 band of z
 * @param runningMean mean of this CRM's judged results up to and including this one (swaps left out)
 * @param verdict pass, warn or fail
 * @param rules ids of the rules that decided the verdict ("1-3s", "probable swap"); "no rule violated" on a pass
 * @param triggersReassay whether routine samples around it go on the re-assay list
 * @param swapWith the CRM code the value matches, "blank" for a blank-level value, empty when no swap
 * @param wording the series' words for {@link #reason()}
 */
public record CrmResult(CrmPoint point, double z, ZBand band, double runningMean, Verdict verdict,
                        List<String> rules, boolean triggersReassay, String swapWith, ResultWording wording) {
    public CrmResult {
        rules = List.copyOf(rules);
    }

    public boolean isSwap() {
        return !swapWith.isEmpty();
    }

    /** One sentence for the report, written when asked for (most results never reach a table). */
    public String reason() {
        return wording.reason(this);
    }

    public ControlOutcome outcome(String analyte) {
        String rule = rules.size() == 1 ? rules.get(0) : String.join(", ", rules);
        return ControlOutcome.described(point.row(), analyte, verdict, rule, this::reason, triggersReassay);
    }
}
