package org.cupel.control.crm;

/**
 * The run rules Cupel can apply to a CRM series, each labelled with its published source. Rules work on
 * z-scores, z = (x − certified) / SD, so "beyond 2 SD" means |z| &gt; 2.
 *
 * <p>Edge cases, the same for every rule (docs/control-rules.md):
 * <ul>
 *   <li>"beyond k SD" is strict: |z| &gt; k; "within 1 SD" is strict: |z| &lt; 1. A point exactly on a
 *       limit is neither beyond nor within it. (The ISO 13528 bands in {@link ZBand} use ≥ 3 instead.)
 *       "Exactly on a limit" is judged on the reported decimals with the relative tolerance of
 *       {@link org.cupel.assay.LimitComparison}: 1.100 on 1.000 ± 0.050 is on +2 SD although the double
 *       z is 2.0000000000000018.</li>
 *   <li>"on one side" is strict: a point exactly on the certified value (z = 0) breaks a run.</li>
 *   <li>"consecutive" / "in a row" means consecutive results of the same CRM and analyte in series order
 *       (batch date, then position), across batch boundaries. Only R₄s looks within one batch, over every
 *       CRM of the analyte in that batch.</li>
 *   <li>"k of m" rules look at the window of m results ending at the current one; the current result
 *       must itself be one of the k (so the flagged point is always an extreme one).</li>
 *   <li>The flagged point is the one that completes the pattern; the result lists the other points of the
 *       pattern as well. A run that goes on flags each further point.</li>
 *   <li>"increasing"/"decreasing"/"alternating" use strict differences; a tie breaks the run.</li>
 * </ul>
 */
public enum CrmRule {
    /** Westgard 1₂s: the single-result warning. */
    W_1_2S("1-2s", "one result beyond ±2 SD (warning)", Source.WESTGARD),
    /** Westgard 1₃s. */
    W_1_3S("1-3s", "one result beyond ±3 SD", Source.WESTGARD),
    /** Westgard 2₂s. */
    W_2_2S("2-2s", "two consecutive results beyond the same 2 SD limit", Source.WESTGARD),
    /** Westgard R₄s, within one batch. */
    W_R_4S("R-4s", "in one batch, one result above +2 SD and another below −2 SD", Source.WESTGARD),
    /** Westgard 4₁s. */
    W_4_1S("4-1s", "four consecutive results beyond the same 1 SD limit", Source.WESTGARD),
    /** Westgard 10ₓ. */
    W_10_X("10-x", "ten consecutive results on the same side of the certified value", Source.WESTGARD),
    WE_1("WE-1", "one result beyond 3 SD", Source.WESTERN_ELECTRIC),
    WE_2("WE-2", "two of three consecutive results beyond 2 SD on the same side", Source.WESTERN_ELECTRIC),
    WE_3("WE-3", "four of five consecutive results beyond 1 SD on the same side", Source.WESTERN_ELECTRIC),
    WE_4("WE-4", "eight consecutive results on the same side of the certified value", Source.WESTERN_ELECTRIC),
    N_1("N-1", "one result beyond 3 SD", Source.NELSON),
    N_2("N-2", "nine results in a row on the same side of the certified value", Source.NELSON),
    N_3("N-3", "six results in a row steadily increasing or decreasing", Source.NELSON),
    N_4("N-4", "fourteen results in a row alternating up and down", Source.NELSON),
    N_5("N-5", "two of three results in a row beyond 2 SD on the same side", Source.NELSON),
    N_6("N-6", "four of five results in a row beyond 1 SD on the same side", Source.NELSON),
    N_7("N-7", "fifteen results in a row within 1 SD", Source.NELSON),
    N_8("N-8", "eight results in a row beyond 1 SD, on either side", Source.NELSON);

    /** Where a rule was published. */
    public enum Source {
        WESTGARD("Westgard, Barry, Hunt & Groth 1981, A multi-rule Shewhart chart for quality control in "
                + "clinical chemistry, Clin. Chem. 27(3)"),
        WESTERN_ELECTRIC("Western Electric Co. 1956, Statistical Quality Control Handbook"),
        NELSON("Nelson 1984, The Shewhart control chart: tests for special causes, J. Qual. Technol. 16(4)");

        private final String citation;

        Source(String citation) {
            this.citation = citation;
        }

        public String citation() {
            return citation;
        }
    }

    private final String id;
    private final String description;
    private final Source source;

    CrmRule(String id, String description, Source source) {
        this.id = id;
        this.description = description;
        this.source = source;
    }

    /** Short id used in config keys, tables and JSON ("1-3s", "WE-2", "N-7"). */
    public String id() {
        return id;
    }

    public String description() {
        return description;
    }

    public Source source() {
        return source;
    }

    /** The rule with {@code id} (case-insensitive), or an exception listing the valid ids. */
    public static CrmRule byId(String id) {
        for (CrmRule r : values()) {
            if (r.id.equalsIgnoreCase(id.strip())) {
                return r;
            }
        }
        StringBuilder ids = new StringBuilder();
        for (CrmRule r : values()) {
            ids.append(ids.length() == 0 ? "" : ", ").append(r.id);
        }
        throw new IllegalArgumentException("unknown CRM rule '" + id + "'; expected one of " + ids);
    }
}
