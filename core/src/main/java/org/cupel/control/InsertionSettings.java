package org.cupel.control;

import org.cupel.assay.QcRole;

/**
 * Target insertion rates, as QC samples per routine sample in a batch, bound from config section
 * {@code insertion}. Defaults: about 1 in 20 (0.05) for CRMs, blanks and each duplicate type (common
 * practice); lab repeats and umpire checks have no per-batch target (0) unless set. Abzalov (2008),
 * "Quality control of assay data: a review of procedures for measuring and monitoring precision and
 * accuracy", Exploration and Mining Geology 17, gives field duplicates 5–10 %, pulp duplicates 3–5 %,
 * standards 3–5 % and about 5 % to an umpire lab.
 *
 * <pre>
 * insertion:
 *   crm: 0.05
 *   blank: 0.05
 *   fieldDuplicate: 0.05
 * </pre>
 */
public record InsertionSettings(double crm, double blank, double fieldDuplicate, double coarseDuplicate,
                                double pulpDuplicate, double labRepeat, double umpire) {

    public static final InsertionSettings DEFAULTS = new InsertionSettings(0.05, 0.05, 0.05, 0.05, 0.05, 0, 0);

    public InsertionSettings {
        for (double t : new double[] {crm, blank, fieldDuplicate, coarseDuplicate, pulpDuplicate, labRepeat, umpire}) {
            if (!(t >= 0 && t <= 1)) {
                throw new IllegalArgumentException("insertion: targets are fractions between 0 and 1 (0.05 = 1 in 20), got "
                        + t);
            }
        }
    }

    /** The target for a QC role; 0 when there is none. */
    public double target(QcRole role) {
        switch (role) {
            case CRM: return crm;
            case BLANK: return blank;
            case FIELD_DUPLICATE: return fieldDuplicate;
            case COARSE_DUPLICATE: return coarseDuplicate;
            case PULP_DUPLICATE: return pulpDuplicate;
            case LAB_REPEAT: return labRepeat;
            case UMPIRE: return umpire;
            default: return 0;
        }
    }

    /** A builder holding {@link #DEFAULTS}: {@code InsertionSettings.withDefaults().someSetting(value).build()}. */
    public static Builder withDefaults() {
        return DEFAULTS.toBuilder();
    }

    /** A builder holding these settings, to change some of them. */
    public Builder toBuilder() {
        return new Builder(this);
    }

    /**
     * Sets any of the settings, each named as its record component; {@link #build} checks them together, as the
     * config does, so the order of the calls does not matter.
     */
    public static final class Builder {
        private double crm;
        private double blank;
        private double fieldDuplicate;
        private double coarseDuplicate;
        private double pulpDuplicate;
        private double labRepeat;
        private double umpire;

        private Builder(InsertionSettings s) {
            crm = s.crm();
            blank = s.blank();
            fieldDuplicate = s.fieldDuplicate();
            coarseDuplicate = s.coarseDuplicate();
            pulpDuplicate = s.pulpDuplicate();
            labRepeat = s.labRepeat();
            umpire = s.umpire();
        }

        public Builder crm(double value) {
            crm = value;
            return this;
        }

        public Builder blank(double value) {
            blank = value;
            return this;
        }

        public Builder fieldDuplicate(double value) {
            fieldDuplicate = value;
            return this;
        }

        public Builder coarseDuplicate(double value) {
            coarseDuplicate = value;
            return this;
        }

        public Builder pulpDuplicate(double value) {
            pulpDuplicate = value;
            return this;
        }

        public Builder labRepeat(double value) {
            labRepeat = value;
            return this;
        }

        public Builder umpire(double value) {
            umpire = value;
            return this;
        }

        /** @throws org.cupel.config.SettingException or IllegalArgumentException for a value out of range */
        public InsertionSettings build() {
            return new InsertionSettings(crm, blank, fieldDuplicate, coarseDuplicate, pulpDuplicate, labRepeat, umpire);
        }
    }
}
