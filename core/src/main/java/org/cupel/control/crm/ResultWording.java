package org.cupel.control.crm;

import org.cupel.assay.Numbers;

/**
 * How the results of one CRM series are described: "VH0001 VHC-23 Au 1.31 g/t is 1.60 SD above certified
 * 1.236", the certified value as the catalog writes it, with the rules that fired, or the swap it matches. Held once per series so that a result's
 * sentence is written only when a table or JSON reads it.
 */
public record ResultWording(String crm, String analyte, String unit, String certified, double swapWithinSd,
                            double blankLevelMultiple) {

    static ResultWording of(CrmSeries s, CrmSettings settings) {
        return new ResultWording(s.crm(), s.analyte().name(), s.analyte().unit().symbol(),
                s.certificate().valueText(), settings.swapWithinSd(), settings.blankLevelMultiple());
    }

    String reason(CrmResult r) {
        if (r.isSwap()) {
            String match = r.swapWith().equals(SwapCheck.BLANK) ? "is at blank level (≤ "
                    + Numbers.compact(blankLevelMultiple) + "× its detection limit)"
                    : "lies within " + Numbers.compact(swapWithinSd) + " SD of CRM " + r.swapWith();
            return describe(r) + " but " + match + ": probable swap or mislabel, not a lab failure; check the "
                    + "insertion record";
        }
        boolean violated = !r.rules().equals(AnalyteJudgement.NO_RULE);
        return describe(r) + (violated ? " (" + String.join(", ", r.rules()) + ")" : "");
    }

    private String describe(CrmResult r) {
        CrmPoint p = r.point();
        double zi = r.z();
        return p.sampleId() + ' ' + crm + ' ' + analyte + ' ' + p.value().display() + ' ' + unit + " is "
                + sdMultiple(Math.abs(zi)) + " SD " + (zi >= 0 ? "above" : "below") + " certified "
                + certified;
    }

    /**
     * How many SD from the certified value, with two decimals below 10 so that a result just beyond a limit
     * never reads as on it (3.02, not "3", beside a 1-3s failure; exactly 3.00 passes, a result on a limit is
     * not beyond it), and three significant digits further out, where the rules are long decided (82, 170).
     */
    static String sdMultiple(double absZ) {
        return absZ < 10 ? String.format(java.util.Locale.ROOT, "%.2f", absZ) : Numbers.significant(absZ, 3);
    }
}
