package org.cupel.charts.duplicates;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.cupel.assay.AssayValue;
import org.cupel.assay.QcRole;
import org.cupel.duplicates.DuplicateAnalysis;
import org.cupel.duplicates.DuplicatePair;
import org.cupel.duplicates.DuplicateReport;
import org.cupel.duplicates.DuplicateSettings;

/** Invented pulp duplicates and umpire checks with known error models, for chart and section tests. */
public final class SimulatedPairs {
    private SimulatedPairs() {
    }

    /** Pulp duplicates with sigma = 0.01 + 0.05 c, values rounded to 0.01 g/t, DL 0.01; umpire reads 3 % high. */
    public static List<DuplicatePair> pairs(int pulp, int umpire, long seed) {
        Random random = new Random(seed);
        List<DuplicatePair> out = new ArrayList<>();
        for (int i = 0; i < pulp; i++) {
            double c = Math.exp(random.nextGaussian() * 1.1 - 0.5);
            double sd = 0.01 + 0.05 * c;
            out.add(new DuplicatePair("PD" + i, "S" + i, "J" + (i / 20), QcRole.PULP_DUPLICATE,
                    value(c + sd * random.nextGaussian()), value(c + sd * random.nextGaussian())));
        }
        for (int i = 0; i < umpire; i++) {
            double c = Math.exp(random.nextGaussian() * 0.8);
            double sd = 0.01 + 0.04 * c;
            out.add(new DuplicatePair("UM" + i, "S" + (1000 + i), "U1", QcRole.UMPIRE,
                    value(c + sd * random.nextGaussian()), value(1.03 * c + sd * random.nextGaussian())));
        }
        return out;
    }

    /**
     * 300 simulated pulp pairs (seed 7) plus O-HI / D-HI = 1.00 / 1.50 (HARD 0.5 / 2.5 = 20 %, above the 10 %
     * limit) and O-LO / D-LO = 0.01 / 0.09 (mean 0.05, below 10 × the DL of 0.01, so not judged by HARD; |d| =
     * 0.08, about six times σ_c = 0.01 + 0.05·0.05 there, so above the 99 % line).
     */
    public static List<DuplicatePair> withFlaggedPairs() {
        List<DuplicatePair> out = new ArrayList<>(pairs(300, 0, 7L));
        out.add(new DuplicatePair("D-HI", "O-HI", "J1", QcRole.PULP_DUPLICATE, AssayValue.detected(1.00, 0.01),
                AssayValue.detected(1.50, 0.01)));
        out.add(new DuplicatePair("D-LO", "O-LO", "J1", QcRole.PULP_DUPLICATE, AssayValue.detected(0.01, 0.01),
                AssayValue.detected(0.09, 0.01)));
        return out;
    }

    private static AssayValue value(double x) {
        double v = Math.round(x * 100) / 100.0;
        return v < 0.01 ? AssayValue.belowDetection(0.01) : AssayValue.detected(v, 0.01);
    }

    public static DuplicateReport report(int pulp, int umpire) {
        return DuplicateAnalysis.run("Au", "g/t", pairs(pulp, umpire, 7L), List.of(), new double[] {0.5, 2.5},
                DuplicateSettings.DEFAULTS);
    }
}
