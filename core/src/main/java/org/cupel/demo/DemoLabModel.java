package org.cupel.demo;

import java.util.List;
import org.cupel.assay.QcRole;

/**
 * How the invented labs measure: the error model of routine samples, duplicates, lab repeats, CRMs and
 * blanks, drawing from the generator's single random stream.
 *
 * <p>A measurement of true grade {@code c} is {@code c exp(0.035 Z1) + 0.3 DL Z2}. A duplicate's true
 * grade is the original's times {@code exp(sigma Z)} with the sampling log SD {@code sigma} of its kind
 * (field {@value #FIELD_SD}, one in ten {@value #FIELD_NUGGET_SD}; coarse reject {@value #COARSE_SD}; both
 * times the analyte's nugget factor; pulp {@value #PULP_SD}, {@value #POOR_PULP_FACTOR} times that in the
 * poor batch; lab repeat {@value #REPEAT_SD}). CRMs read their certified value (plus the planted drift)
 * with {@value #CRM_LAB_SD_FRACTION} of the certified SD; blanks read 0.4 DL with an SD of 0.25 DL, and
 * the contaminated blank adds {@value #CARRY_OVER} of the sample before it.
 */
final class DemoLabModel {

    static final double CRM_LAB_SD_FRACTION = 0.75;
    static final double FIELD_SD = 0.55;
    static final double FIELD_NUGGET_SD = 1.3;
    static final double FIELD_NUGGET_SHARE = 0.1;
    static final double COARSE_SD = 0.22;
    static final double PULP_SD = 0.07;
    static final double POOR_PULP_FACTOR = 6;
    static final double REPEAT_SD = 0.04;
    static final double GRAV_RSD = 0.015;
    static final double CARRY_OVER = 0.023;

    private final DemoRandom random;
    private final List<DemoAnalyte> analytes;
    private final List<DemoCrm> crms;
    private final int batches;
    private final int poorPulpBatch;

    DemoLabModel(DemoRandom random, List<DemoAnalyte> analytes, List<DemoCrm> crms, int batches, int poorPulpBatch) {
        this.random = random;
        this.analytes = analytes;
        this.crms = crms;
        this.batches = batches;
        this.poorPulpBatch = poorPulpBatch;
    }

    double[] measure(double[] truth) {
        double[] v = new double[analytes.size()];
        for (int a = 0; a < v.length; a++) {
            v[a] = measure(analytes.get(a), truth[a]);
        }
        return v;
    }

    double measure(DemoAnalyte a, double truth) {
        return truth * random.logFactor(DemoAnalyte.ANALYTICAL_RSD) + a.absoluteSd() * random.gaussian();
    }

    Submission duplicate(QcRole role, Submission original, int b) {
        double[] truth = new double[analytes.size()];
        for (int a = 0; a < truth.length; a++) {
            DemoAnalyte an = analytes.get(a);
            double g = original.truth[a] * random.logFactor(samplingSd(role, an, b));
            truth[a] = an.capBelowUpper() ? Math.min(g, 0.8 * an.upperLimit()) : g;
        }
        Submission d = new Submission(role, original.interval, original, null, truth);
        d.values = measure(truth);
        return d;
    }

    private double samplingSd(QcRole role, DemoAnalyte a, int b) {
        switch (role) {
            case FIELD_DUPLICATE:
                return a.nugget() * (random.uniform() < FIELD_NUGGET_SHARE ? FIELD_NUGGET_SD : FIELD_SD);
            case COARSE_DUPLICATE:
                return a.nugget() * COARSE_SD;
            case PULP_DUPLICATE:
                return b == poorPulpBatch ? POOR_PULP_FACTOR * PULP_SD : PULP_SD;
            default:
                return REPEAT_SD;
        }
    }

    Submission crm(String registeredCode, int b, boolean swap) {
        DemoCrm material = DemoCrm.byCode(crms, swap ? DemoCrm.SWAP_ACTUAL : registeredCode);
        double[] truth = material.certified().clone();
        if (material.code().equals(DemoCrm.DRIFTING)) {
            truth[0] += PlantedBatches.driftSd(b, batches) * material.sd()[0];
        }
        Submission s = new Submission(QcRole.CRM, null, null, registeredCode, truth);
        s.values = new double[truth.length];
        for (int a = 0; a < truth.length; a++) {
            s.values[a] = truth[a] + CRM_LAB_SD_FRACTION * material.sd()[a] * random.gaussian();
        }
        return s;
    }

    /** A barren blank: true grade 0.4 DL with a constant error of 0.25 DL, so nearly always below detection. */
    Submission blank() {
        double[] truth = new double[analytes.size()];
        Submission s = new Submission(QcRole.BLANK, null, null, null, truth);
        s.values = new double[truth.length];
        for (int a = 0; a < truth.length; a++) {
            double dl = analytes.get(a).detectionLimit();
            truth[a] = 0.4 * dl;
            s.values[a] = 0.4 * dl + 0.25 * dl * random.gaussian();
        }
        return s;
    }

    Submission contaminatedBlank(Submission high) {
        Submission s = blank();
        for (int a = 0; a < s.values.length; a++) {
            s.values[a] += CARRY_OVER * high.values[a];
        }
        return s;
    }

    double[] repeatTruth(Submission s) {
        double[] t = new double[s.truth.length];
        for (int a = 0; a < t.length; a++) {
            t[a] = s.truth[a] * random.logFactor(REPEAT_SD);
        }
        return t;
    }
}
