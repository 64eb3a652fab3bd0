package org.cupel.control;

/**
 * Which samples a failed control sends back to the lab, bound from config section {@code reassay}.
 *
 * <pre>
 * reassay:
 *   scope: BRACKET      # or WHOLE_BATCH
 * </pre>
 *
 * @param scope {@link Scope#BRACKET} (default, common practice) or {@link Scope#WHOLE_BATCH}
 */
public record ReassaySettings(Scope scope) {
    public static final ReassaySettings DEFAULTS = new ReassaySettings(Scope.BRACKET);

    public ReassaySettings {
        scope = scope == null ? Scope.BRACKET : scope;
    }

    /** How far a re-assay request reaches. */
    public enum Scope {
        /**
         * A failed CRM: the samples between the nearest passing control samples before and after it; a
         * failed blank: the samples after it up to the next passing blank.
         */
        BRACKET,
        /** Every non-control sample of the batch. */
        WHOLE_BATCH
    }
}
