package org.cupel.control;

/**
 * Which samples a failed control sends back to the lab, bound from config section {@code reassay}.
 *
 * <pre>
 * reassay:
 *   scope: BRACKET             # or WHOLE_BATCH
 *   crmBracket: PASSING_CRM    # or PASSING_CONTROL
 *   blankFollowing: 0          # 0: up to the next passing blank; N: at most N samples after a failed blank
 * </pre>
 *
 * @param scope {@link Scope#BRACKET} (default, common practice) or {@link Scope#WHOLE_BATCH}
 * @param crmBracket what bounds the bracket of a failed CRM: the nearest passing CRMs (default) or the nearest
 *     passing control of any kind, blanks included
 * @param blankFollowing at most this many samples after a failed blank go back (still stopping at the next passing
 *     blank); 0 (default) for no cap
 */
public record ReassaySettings(Scope scope, CrmBracket crmBracket, int blankFollowing) {
    public static final ReassaySettings DEFAULTS = new ReassaySettings(Scope.BRACKET, CrmBracket.PASSING_CRM, 0);

    public ReassaySettings {
        scope = scope == null ? Scope.BRACKET : scope;
        crmBracket = crmBracket == null ? CrmBracket.PASSING_CRM : crmBracket;
        if (blankFollowing < 0) {
            throw new IllegalArgumentException("reassay.blankFollowing must be 0 (up to the next passing blank) or "
                    + "a positive number of samples, got " + blankFollowing);
        }
    }

    /** How far a re-assay request reaches. */
    public enum Scope {
        /**
         * A failed CRM: the samples between the nearest passing controls before and after it ({@link CrmBracket});
         * a failed blank: the samples after it up to the next passing blank.
         */
        BRACKET,
        /** Every non-control sample of the batch. */
        WHOLE_BATCH
    }

    /**
     * What bounds the bracket of a failed CRM. A CRM tests accuracy at grade; a blank tests contamination at
     * detection level and says nothing about a bias at grade, so by default only a passing CRM shows that the
     * samples beyond it were measured accurately (common practice).
     */
    public enum CrmBracket {
        /** The nearest passing CRM (of the same analyte) before and after the failed one (default). */
        PASSING_CRM,
        /** The nearest passing control of any kind, a blank included (how Cupel bracketed before this setting). */
        PASSING_CONTROL
    }

    /** A builder holding {@link #DEFAULTS}: {@code ReassaySettings.withDefaults().someSetting(value).build()}. */
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
        private Scope scope;
        private CrmBracket crmBracket;
        private int blankFollowing;

        private Builder(ReassaySettings s) {
            scope = s.scope();
            crmBracket = s.crmBracket();
            blankFollowing = s.blankFollowing();
        }

        public Builder scope(Scope value) {
            scope = value;
            return this;
        }

        public Builder crmBracket(CrmBracket value) {
            crmBracket = value;
            return this;
        }

        public Builder blankFollowing(int value) {
            blankFollowing = value;
            return this;
        }

        /** @throws org.cupel.config.SettingException or IllegalArgumentException for a value out of range */
        public ReassaySettings build() {
            return new ReassaySettings(scope, crmBracket, blankFollowing);
        }
    }
}
