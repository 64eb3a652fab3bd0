package org.cupel.recovery;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Map;
import org.junit.jupiter.api.Test;

class PowerPlanningTest {

    /** R 4.2 {@code power.t.test(n = 20, delta = 1, sd = 1)} prints power = 0.8689528 (7 decimals printed). */
    @Test
    void twentyPerGroupAtOneSdHasPower08689528() {
        assertEquals(0.8689528, PowerPlanning.power(20, 1, 1, 0.05), 5e-8);
    }

    /**
     * R 4.2 {@code power.t.test(delta = 1, sd = 1, power = 0.90)} prints n = 22.02110. Tolerance 1e-3:
     * R's uniroot stops at tol = .Machine$double.eps^0.25 ≈ 1.2e-4 in n, and we solve to 1e-8.
     */
    @Test
    void ninetyPercentPowerAtOneSdNeeds22Point0211() {
        PowerPlanning.Plan plan = PowerPlanning.replicatesNeeded(1, 1, 0.05, 0.90);
        assertEquals(22.02110, plan.n(), 1e-3);
        assertEquals(23, plan.perCondition());
    }

    /** The grid of testdata/reference/recovery/power.csv (R power.t.test); tolerances as above. */
    @Test
    void matchesRPowerTTestGrid() throws Exception {
        for (Map<String, String> r : ReferenceCsv.rows("power.csv")) {
            double delta = ReferenceCsv.number(r, "delta");
            if (r.get("kind").equals("power")) {
                assertEquals(ReferenceCsv.number(r, "power"),
                        PowerPlanning.power(ReferenceCsv.number(r, "n"), delta, 1, 0.05), 1e-8, r.toString());
            } else {
                double n = PowerPlanning.replicatesNeeded(delta, 1, 0.05, ReferenceCsv.number(r, "power")).n();
                assertEquals(ReferenceCsv.number(r, "n"), n, 1e-3, r.toString());
            }
        }
    }
}
