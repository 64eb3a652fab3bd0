package org.cupel.demo;

import java.util.List;

/**
 * Drill holes of the invented programme, sampled in 1 m intervals, one interval at a time.
 *
 * <p>Gold in each hole is a hole effect plus an AR(1) process along the hole in log space
 * ({@code z_t = 0.6 z_{t-1} + 0.8 e_t}, unit variance), so grades come in runs as ore zones do; the
 * other analytes follow through their {@link DemoAnalyte#goldCorrelation()}.
 */
final class DrillHoles {

    private static final double RHO = 0.6;
    private static final double HOLE_EFFECT_SD = 0.4;

    private final DemoRandom random;
    private final List<DemoAnalyte> analytes;
    private int holes;
    private String hole;
    private int remaining;
    private double depth;
    private double z;
    private double holeEffect;

    DrillHoles(DemoRandom random, List<DemoAnalyte> analytes) {
        this.random = random;
        this.analytes = analytes;
    }

    DrillInterval next() {
        if (remaining == 0) {
            startHole();
        }
        remaining--;
        z = RHO * z + Math.sqrt(1 - RHO * RHO) * random.gaussian();
        double[] grade = new double[analytes.size()];
        for (int a = 0; a < grade.length; a++) {
            DemoAnalyte an = analytes.get(a);
            double r = an.goldCorrelation();
            double factor = r == 1.0 ? z : r * z + Math.sqrt(1 - r * r) * random.gaussian();
            double g = an.median() * Math.exp(an.logSd() * factor + r * holeEffect);
            grade[a] = an.capBelowUpper() ? Math.min(g, 0.8 * an.upperLimit()) : g;
        }
        double from = depth;
        depth += 1.0;
        return new DrillInterval(hole, from, depth, grade);
    }

    private void startHole() {
        holes++;
        hole = "VHD" + pad(holes, 5);
        remaining = 60 + random.below(141);
        depth = Math.round(20 + 100 * random.uniform()) / 10.0;
        z = random.gaussian();
        holeEffect = HOLE_EFFECT_SD * random.gaussian();
    }

    static String pad(long n, int width) {
        String s = Long.toString(n);
        return s.length() >= width ? s : "0".repeat(width - s.length()) + s;
    }
}
