package org.cupel.ingest;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.cupel.assay.Analyte;
import org.cupel.assay.AssayValue;
import org.cupel.assay.MethodSelector;
import org.cupel.assay.MethodValue;
import org.cupel.assay.Qualifier;

/**
 * Chooses the reported result among several for one sample and analyte, by rules applied in order:
 * <ol>
 *   <li>a result in range (detected) beats a censored or missing one: an over-limit result ({@code >10})
 *       gives way to the method that measured it (e.g. a gravimetric finish), a below-detection result to
 *       the lower-limit method that measured it;</li>
 *   <li>among several in-range results, the configured priority of methods for the analyte
 *       ({@code ingest.methodPriority}) decides; methods not listed come after listed ones;</li>
 *   <li>when none is in range: among over-limit results the highest limit, among below-detection results
 *       the lowest limit, as the most informative bound;</li>
 *   <li>remaining ties: the first result read (files are read in name order).</li>
 * </ol>
 * The reason returned names the rule, so outputs can show why a value was reported.
 */
final class MethodPriority implements MethodSelector {
    private final Map<String, List<String>> priority;

    /** @param priority analyte → methods, most preferred first */
    public MethodPriority(Map<String, List<String>> priority) {
        this.priority = Map.copyOf(priority);
    }

    @Override
    public Selection select(Analyte analyte, List<MethodValue> candidates) {
        List<Integer> detected = indicesWith(candidates, Qualifier.DETECTED);
        if (detected.size() == 1) {
            return new Selection(detected.get(0), inRangeReason(candidates, detected.get(0)));
        }
        if (detected.size() > 1) {
            return byPriority(analyte, candidates, detected);
        }
        List<Integer> above = indicesWith(candidates, Qualifier.ABOVE_UPPER_LIMIT);
        List<Integer> below = indicesWith(candidates, Qualifier.BELOW_DETECTION);
        if (!above.isEmpty() && below.isEmpty()) {
            int best = extreme(candidates, above, true);
            return new Selection(best, "no result in range; the highest upper limit ("
                    + candidates.get(best).value().display() + ") is the most informative");
        }
        if (!below.isEmpty() && above.isEmpty()) {
            int best = extreme(candidates, below, false);
            return new Selection(best, "no result in range; the lowest detection limit ("
                    + candidates.get(best).value().display() + ") is the most informative");
        }
        if (above.isEmpty()) {
            return new Selection(0, "no result has a value; the first read is kept");
        }
        List<Integer> censored = new ArrayList<>(above);
        censored.addAll(below);
        censored.sort(null);
        return byPriority(analyte, candidates, censored);
    }

    private static String inRangeReason(List<MethodValue> all, int chosen) {
        String method = label(all.get(chosen));
        for (int i = 0; i < all.size(); i++) {
            AssayValue v = all.get(i).value();
            if (i == chosen) {
                continue;
            }
            if (v.qualifier() == Qualifier.ABOVE_UPPER_LIMIT) {
                return "in range beats censored: over-limit " + v.display() + " (" + label(all.get(i))
                        + ") replaced by the over-limit method " + method;
            }
            if (v.qualifier() == Qualifier.BELOW_DETECTION) {
                return "in range beats censored: below-detection " + v.display() + " (" + label(all.get(i))
                        + ") replaced by the lower-limit method " + method;
            }
        }
        return "the only result with a value (" + method + ")";
    }

    private Selection byPriority(Analyte analyte, List<MethodValue> all, List<Integer> among) {
        List<String> order = priority.getOrDefault(analyte.name(), List.of());
        int best = among.get(0);
        int bestRank = rank(order, all.get(best).method());
        for (int i : among) {
            int r = rank(order, all.get(i).method());
            if (r < bestRank) {
                best = i;
                bestRank = r;
            }
        }
        if (bestRank < order.size() && distinctRanks(order, all, among)) {
            return new Selection(best, "method priority for " + analyte.name() + ": " + String.join(" > ", order)
                    + " (reported " + label(all.get(best)) + ")");
        }
        return new Selection(best, "first result read among " + among.size() + " results of equal priority");
    }

    private static boolean distinctRanks(List<String> order, List<MethodValue> all, List<Integer> among) {
        int first = rank(order, all.get(among.get(0)).method());
        return among.stream().anyMatch(i -> rank(order, all.get(i).method()) != first);
    }

    private static int rank(List<String> order, String method) {
        for (int i = 0; i < order.size(); i++) {
            if (order.get(i).equalsIgnoreCase(method)) {
                return i;
            }
        }
        return order.size();
    }

    private static int extreme(List<MethodValue> all, List<Integer> among, boolean highest) {
        int best = among.get(0);
        for (int i : among) {
            double v = all.get(i).value().value();
            double b = all.get(best).value().value();
            if (highest ? v > b : v < b) {
                best = i;
            }
        }
        return best;
    }

    private static List<Integer> indicesWith(List<MethodValue> all, Qualifier q) {
        List<Integer> out = new ArrayList<>();
        for (int i = 0; i < all.size(); i++) {
            if (all.get(i).value().qualifier() == q) {
                out.add(i);
            }
        }
        return out;
    }

    private static String label(MethodValue v) {
        return v.method().isEmpty() ? "method not named" : v.method();
    }
}
