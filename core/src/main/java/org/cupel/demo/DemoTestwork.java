package org.cupel.demo;

import java.io.IOException;
import java.io.Writer;
import java.util.List;

/**
 * The invented metallurgical testwork set: replicate head assays of one gold–silver concentrate and
 * replicate smelts under four conditions, each smelt split into a lead button (collected), a matte and
 * a slag (losses). Formats: docs/testwork.md.
 *
 * <p>The design: metal in the charge is {@code charge x head}; a smelt puts a fraction {@code fb} of it
 * in the button (normal across replicates), a fraction {@code fm} in the matte (lognormal, log SD 0.15)
 * and the rest in the slag, so the products balance the charge before assay error. Assay errors are
 * multiplicative: 1.2 % for heads, 1 % for buttons, 3 % for mattes, 8 % for slags (plus 0.15 g/t near the
 * slag detection limit of 0.5 g/t Au). Condition {@code LIT60-1050} against {@code LIT90-1050} differs
 * by about 5.6 recovery points with replicate SDs near 1 point (share SD plus the 1 % button assay):
 * clearly different; {@code LIT60-1050} against {@code LIT60-1100} differs by about 0.6 points with
 * replicate SDs near 1.2: cannot tell with three replicates each. {@code LIT60-1050-HALF} is the first
 * condition at half the charge mass.
 */
final class DemoTestwork {

    static final String FEED = "VH-CON-1";
    static final double HEAD_AU = 312.0;
    static final double HEAD_AG = 1850.0;
    static final double SLAG_AU_DL = 0.5;

    /**
     * One smelt condition.
     *
     * @param name       condition label
     * @param replicates number of replicate smelts
     * @param charge     charge mass, g
     * @param buttonAu   mean share of charge Au reporting to the button, and its replicate SD
     * @param matteAu    median share of charge Au in the matte
     * @param buttonAg   mean share of charge Ag in the button, and its replicate SD
     * @param matteAg    median share of charge Ag in the matte
     * @param masses     typical button, matte and slag masses, g
     */
    record Condition(String name, int replicates, double charge, double[] buttonAu, double matteAu,
                     double[] buttonAg, double matteAg, double[] masses) {
    }

    static final List<Condition> CONDITIONS = List.of(
            new Condition("LIT60-1050", 3, 50, new double[] {0.925, 0.006}, 0.050,
                    new double[] {0.880, 0.005}, 0.070, new double[] {30, 3.5, 175}),
            new Condition("LIT90-1050", 3, 50, new double[] {0.981, 0.004}, 0.005,
                    new double[] {0.950, 0.004}, 0.010, new double[] {34, 0.6, 205}),
            new Condition("LIT60-1100", 3, 50, new double[] {0.931, 0.008}, 0.044,
                    new double[] {0.875, 0.006}, 0.065, new double[] {30, 3.1, 178}),
            new Condition("LIT60-1050-HALF", 2, 25, new double[] {0.954, 0.006}, 0.026,
                    new double[] {0.910, 0.005}, 0.040, new double[] {28, 1.8, 150}));

    /** The smelt whose slag Au is planted below detection: condition LIT90-1050, replicate 3. */
    static final String LOW_SLAG_CONDITION = "LIT90-1050";
    static final int LOW_SLAG_REPLICATE = 3;
    private static final double LOW_SLAG_SHARE = 0.0045;

    private DemoTestwork() {
    }

    interface Opener {
        Writer open(String path) throws IOException;
    }

    static void write(DemoRandom random, Opener sink) throws IOException {
        try (Writer w = sink.open("testwork/heads.csv")) {
            writeHeads(w, random);
        }
        try (Writer w = sink.open("testwork/smelts.csv")) {
            writeSmelts(w, random);
        }
    }

    private static void writeHeads(Writer w, DemoRandom random) throws IOException {
        w.write("feed,replicate,Au_g/t,Ag_g/t\n");
        String[] labels = {"1", "2", "3", "4", "5", "5-LD"};
        for (String label : labels) {
            double au = HEAD_AU * random.logFactor(0.012);
            double ag = HEAD_AG * random.logFactor(0.012);
            w.write(FEED + "," + label + "," + FixedDecimal.format(au, 1) + "," + FixedDecimal.format(ag, 0) + "\n");
        }
    }

    private static void writeSmelts(Writer w, DemoRandom random) throws IOException {
        w.write("test_id,condition,replicate,feed,charge_g,product,product_role,mass_g,Au_g/t,Ag_g/t\n");
        int test = 0;
        for (Condition c : CONDITIONS) {
            for (int r = 1; r <= c.replicates(); r++) {
                test++;
                writeSmelt(w, random, c, r, "SM-" + DrillHoles.pad(test, 2));
            }
        }
    }

    private static void writeSmelt(Writer w, DemoRandom random, Condition c, int replicate, String testId)
            throws IOException {
        double charge = FixedDecimal.round(c.charge() * (1 + 0.001 * random.gaussian()), 2);
        double au = charge * HEAD_AU;
        double ag = charge * HEAD_AG;
        double mAu = c.matteAu() * random.logFactor(0.15);
        double bAu = c.buttonAu()[0] + c.buttonAu()[1] * random.gaussian();
        if (c.name().equals(LOW_SLAG_CONDITION) && replicate == LOW_SLAG_REPLICATE) {
            bAu = 1 - mAu - LOW_SLAG_SHARE;
        }
        double mAg = c.matteAg() * random.logFactor(0.15);
        double bAg = c.buttonAg()[0] + c.buttonAg()[1] * random.gaussian();
        double[] mass = new double[3];
        for (int p = 0; p < 3; p++) {
            mass[p] = FixedDecimal.round(c.masses()[p] * random.logFactor(0.05), 2);
        }
        String prefix = testId + "," + c.name() + "," + replicate + "," + FEED + "," + FixedDecimal.format(charge, 2)
                + ",";
        double[][] share = {{bAu, bAg}, {mAu, mAg}, {1 - bAu - mAu, 1 - bAg - mAg}};
        String[] product = {"button", "matte", "slag"};
        double[] rsd = {0.01, 0.03, 0.08};
        for (int p = 0; p < 3; p++) {
            double gAu = au * share[p][0] / mass[p] * random.logFactor(rsd[p]);
            double gAg = ag * share[p][1] / mass[p] * random.logFactor(rsd[p]);
            String auText;
            if (p == 2) {
                gAu += 0.3 * SLAG_AU_DL * random.gaussian();
                auText = gAu < SLAG_AU_DL ? "<" + FixedDecimal.plain(SLAG_AU_DL) : FixedDecimal.format(gAu, 2);
            } else {
                auText = FixedDecimal.format(gAu, 1);
            }
            w.write(prefix + product[p] + "," + (p == 0 ? "collected" : "loss") + "," + FixedDecimal.format(mass[p], 2)
                    + "," + auText + "," + FixedDecimal.format(gAg, p == 2 ? 1 : 0) + "\n");
        }
    }
}
