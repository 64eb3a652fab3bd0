package org.cupel.demo;

import java.util.ArrayList;
import java.util.List;

/**
 * An invented certified reference material: certified value and between-lab 1 SD per analyte, indexed
 * like the analyte list of the run. Gold and silver values are written out; the other analytes of the
 * full suite are certified at {@code max(level x median, 10 DL (i + 1))} for the i-th CRM (so no CRM sits
 * near detection) with an SD of 4 % of the value.
 *
 * @param code      the CRM code written in the register and catalog
 * @param certified certified value per analyte (already rounded as the catalog writes it)
 * @param sd        certified between-lab SD per analyte (rounded likewise)
 */
record DemoCrm(String code, double[] certified, double[] sd) {

    /** The code of the CRM whose gold drifts high over the programme (planted problem 1). */
    static final String DRIFTING = "VHC-23";
    /** The code registered for the swapped CRM result (planted problem 2). */
    static final String SWAP_REGISTERED = "VHC-11";
    /** The code whose material the swapped result really is. */
    static final String SWAP_ACTUAL = "VHC-35";

    private static final String[] CODES = {"VHC-11", "VHC-23", "VHC-35", "VHC-48"};
    private static final double[] AU = {0.412, 1.236, 3.574, 7.912};
    private static final double[] AU_SD = {0.018, 0.047, 0.112, 0.231};
    private static final double[] AG = {3.8, 11.4, 28.9, 61.5};
    private static final double[] AG_SD = {0.3, 0.6, 1.2, 2.4};
    private static final double[] LEVELS = {0.4, 1.2, 3.5, 8.0};

    /** The four CRMs of the programme, from low to high grade, certified for every analyte in {@code analytes}. */
    static List<DemoCrm> catalog(List<DemoAnalyte> analytes) {
        List<DemoCrm> crms = new ArrayList<>();
        for (int i = 0; i < CODES.length; i++) {
            double[] value = new double[analytes.size()];
            double[] sd = new double[analytes.size()];
            for (int a = 0; a < analytes.size(); a++) {
                DemoAnalyte an = analytes.get(a);
                if (an == DemoAnalyte.GOLD) {
                    value[a] = AU[i];
                    sd[a] = AU_SD[i];
                } else if (an == DemoAnalyte.SILVER) {
                    value[a] = AG[i];
                    sd[a] = AG_SD[i];
                } else {
                    int d = an.decimals() + 1;
                    value[a] = FixedDecimal.round(
                            Math.max(an.median() * LEVELS[i], 10 * an.detectionLimit() * (i + 1)), d);
                    sd[a] = Math.max(FixedDecimal.round(value[a] * 0.04, d), Math.pow(10, -d));
                }
            }
            crms.add(new DemoCrm(CODES[i], value, sd));
        }
        return List.copyOf(crms);
    }

    static DemoCrm byCode(List<DemoCrm> crms, String code) {
        for (DemoCrm c : crms) {
            if (c.code.equals(code)) {
                return c;
            }
        }
        throw new IllegalArgumentException("no demo CRM " + code);
    }
}
