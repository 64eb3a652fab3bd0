package org.cupel.demo;

import org.cupel.assay.QcRole;

/**
 * One sample of a batch while it is being generated: a drill interval, a CRM, a blank or a duplicate.
 * Only one batch of these lives at a time, so the scaled project streams.
 */
final class Submission {

    final QcRole role;
    /** Drill interval of a routine sample, or of the original for duplicates and umpire pulps; null for CRM and blank. */
    final DrillInterval interval;
    /** The original sample of a duplicate or umpire pulp. */
    final Submission original;
    /** The CRM code registered for a CRM. */
    final String crmCode;
    /** True grade of the material analysed, per analyte. */
    final double[] truth;
    /** Reported value per analyte, before censoring at the limits. */
    double[] values;
    String id;
    /** A missing-value code written in every analyte cell (IS, NR), or null. */
    String rowCode;
    /** Cell text that replaces the value of one analyte (planted typo), or null. */
    String typoText;
    /** Excluded from being the original of a duplicate: it carries a planted problem. */
    boolean special;
    /** The lab re-analyses this sample and reports a repeat row after it. */
    boolean labRepeat;
    /** The register lists it but the lab never received it: no lab row. */
    boolean neverReceived;

    Submission(QcRole role, DrillInterval interval, Submission original, String crmCode, double[] truth) {
        this.role = role;
        this.interval = interval;
        this.original = original;
        this.crmCode = crmCode;
        this.truth = truth;
    }

    /** The register's reference: CRM code, or the original sample's ID. */
    String reference() {
        if (role == QcRole.CRM) {
            return crmCode;
        }
        return original == null ? "" : original.id;
    }
}
