package org.cupel.recovery;

import java.util.List;
import org.cupel.project.DataIssue;

/**
 * Everything the recovery analysis found. Censored loss assays are counted at their detection limit in
 * every list except {@link #conditionsCensoredAtZero()}; each comparison carries both verdicts.
 *
 * @param settings settings in force
 * @param analytes analytes analysed
 * @param heads head grade per feed and analyte
 * @param smelts per-smelt recoveries (censored at the limit)
 * @param conditions per-condition recoveries (censored at the limit)
 * @param conditionsCensoredAtZero the same with censored loss assays counted as zero
 * @param comparisons every pair of conditions per analyte
 * @param balances reconciled balance per smelt and analyte
 * @param deportment per-condition deportment
 * @param smeltDeportment per-smelt deportment
 * @param anyCensoredLoss whether any loss assay was below detection
 * @param notes statements about the method that belong beside the numbers
 * @param issues input problems found while reading
 */
public record RecoveryResult(RecoverySettings settings, List<String> analytes, List<HeadGrade> heads,
                             List<SmeltRecovery> smelts, List<ConditionRecovery> conditions,
                             List<ConditionRecovery> conditionsCensoredAtZero, List<PairComparison> comparisons,
                             List<SmeltBalance> balances, List<Deportment> deportment, List<Deportment> smeltDeportment,
                             boolean anyCensoredLoss, List<String> notes, List<DataIssue> issues) {
    public RecoveryResult {
        analytes = List.copyOf(analytes);
        heads = List.copyOf(heads);
        smelts = List.copyOf(smelts);
        conditions = List.copyOf(conditions);
        conditionsCensoredAtZero = List.copyOf(conditionsCensoredAtZero);
        comparisons = List.copyOf(comparisons);
        balances = List.copyOf(balances);
        deportment = List.copyOf(deportment);
        smeltDeportment = List.copyOf(smeltDeportment);
        notes = List.copyOf(notes);
        issues = List.copyOf(issues);
    }

    /** The caution on fire assay and smelting hazards that every output carries. */
    public String safetyCaution() {
        return SafetyCaution.TEXT;
    }
}
