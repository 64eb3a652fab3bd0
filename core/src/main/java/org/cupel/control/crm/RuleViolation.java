package org.cupel.control.crm;

import java.util.List;

/**
 * One firing of a run rule.
 *
 * @param rule the rule
 * @param signal index (in the sequence evaluated) of the result that completes the pattern
 * @param involved indices of every result of the pattern, ascending, the signal included
 */
record RuleViolation(CrmRule rule, int signal, List<Integer> involved) {
    public RuleViolation {
        involved = List.copyOf(involved);
    }
}
