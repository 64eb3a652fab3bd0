package org.cupel.censored;

import java.util.ArrayList;
import java.util.List;

/**
 * Substitution of a fixed fraction of the detection limit for values below detection (0, DL/2, DL/√2,
 * DL), with values above range taken at their limit and interval values at their midpoint. Offered only
 * as a labelled comparison: substitution has no statistical basis and biases estimates by amounts that
 * depend on the censoring pattern (Helsel 2006, "Fabricating data: how substituting values for
 * nondetects can ruin results", Chemosphere 65; Helsel 2012, ch. 1).
 */
public final class Substitution {
    /** The fraction of the limit substituted. */
    public enum Rule {
        ZERO(0, "0"), HALF(0.5, "DL/2"), ROOT_HALF(Math.sqrt(0.5), "DL/√2"), LIMIT(1, "DL");

        private final double fraction;
        private final String label;

        Rule(double fraction, String label) {
            this.fraction = fraction;
            this.label = label;
        }

        public double fraction() {
            return fraction;
        }

        public String label() {
            return label;
        }
    }

    private Substitution() {
    }

    public static String method(Rule rule) {
        return "Substitution " + rule.label();
    }

    public static CensoredSummary summarise(CensoredSample sample, Rule rule) {
        int n = sample.size();
        int nCens = sample.censoredCount();
        if (n == 0) {
            return CensoredSummary.notApplicable(method(rule), 0, 0, "no values");
        }
        CensoredSample.IntervalGroups intervals = sample.intervalGroups();
        Tally.Counter filled = new Tally.Counter();
        add(filled, sample.detectTally(), 1);
        add(filled, sample.belowTally(), rule.fraction());
        add(filled, sample.aboveTally(), 1);
        for (int g = 0; g < intervals.distinct(); g++) {
            filled.add((intervals.low()[g] + intervals.high()[g]) / 2, intervals.counts()[g]);
        }
        List<String> notes = new ArrayList<>();
        notes.add("comparison only: values below detection replaced by " + rule.label()
                + (sample.count(Censoring.ABOVE) > 0 ? ", values above range by their limit" : ""));
        return OrdinarySummary.of(method(rule), filled.tally(), nCens, notes,
                nCens == 0 ? null : "no standard error: substituted values are not measurements");
    }

    /** Each value of {@code t} times {@code factor}, with its count (the distinct values only). */
    private static void add(Tally.Counter to, Tally t, double factor) {
        for (int i = 0; i < t.distinct(); i++) {
            to.add(factor * t.value(i), t.count(i));
        }
    }

    /** All four rules, in the order of {@link Rule}. */
    public static List<CensoredSummary> all(CensoredSample sample) {
        List<CensoredSummary> out = new ArrayList<>();
        for (Rule r : Rule.values()) {
            out.add(summarise(sample, r));
        }
        return out;
    }
}
