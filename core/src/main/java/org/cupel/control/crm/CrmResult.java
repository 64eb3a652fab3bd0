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
 * @param rules ids of the rules that decided the verdict ("1-3s", "probable swap"); "within 2 SD" on a pass
 * @param reason one sentence for the report
 * @param triggersReassay whether routine samples around it go on the re-assay list
 * @param swapWith the CRM code the value matches, "blank" for a blank-level value, empty when no swap
 */
public record CrmResult(CrmPoint point, double z, ZBand band, double runningMean, Verdict verdict,
                        List<String> rules, String reason, boolean triggersReassay, String swapWith) {
    public CrmResult {
        rules = List.copyOf(rules);
    }

    public boolean isSwap() {
        return !swapWith.isEmpty();
    }

    public ControlOutcome outcome(String analyte) {
        return new ControlOutcome(point.row(), analyte, verdict, String.join(", ", rules), reason,
                triggersReassay);
    }
}
