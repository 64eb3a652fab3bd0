package org.cupel.units;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * The unit an analyte is reported in, and why: the unit set in {@code ingest.units}, else the unit word
 * the lab files use, or, when files disagree, the one most results were reported in (ties go to the unit
 * read first). g/t and ppm are the same number, so between them only the label changes; the trade expects
 * the lab's own word (common practice).
 *
 * @param analyte analyte name
 * @param unit the reporting unit
 * @param basis why that unit
 * @param files per unit word read, how many lab files used it for this analyte, in the order first read
 * @param results per unit word read, how many results (cells with a value or a code) were written in it
 */
public record UnitChoice(String analyte, GradeUnit unit, Basis basis, Map<GradeUnit, Integer> files,
                         Map<GradeUnit, Long> results) {

    /** Why the reporting unit was chosen. */
    public enum Basis {
        /** {@code ingest.units} in cupel.yaml. */
        CONFIGURED,
        /** Every lab file writes the analyte in this unit. */
        ONLY_UNIT,
        /** The lab files disagree; most results are written in this unit. */
        MAJORITY
    }

    public UnitChoice {
        files = Collections.unmodifiableMap(new LinkedHashMap<>(files));
        results = Collections.unmodifiableMap(new LinkedHashMap<>(results));
    }

    /**
     * The choice for an analyte read in the units counted: {@code configured} when not null, else the unit
     * of most results (the first read among equals).
     */
    public static UnitChoice of(String analyte, GradeUnit configured, Map<GradeUnit, Integer> files,
                                Map<GradeUnit, Long> results) {
        if (configured != null) {
            return new UnitChoice(analyte, configured, Basis.CONFIGURED, files, results);
        }
        GradeUnit best = null;
        long most = -1;
        for (Map.Entry<GradeUnit, Long> e : results.entrySet()) {
            if (e.getValue() > most) {
                best = e.getKey();
                most = e.getValue();
            }
        }
        if (best == null) {
            throw new IllegalArgumentException("no unit was read for " + analyte);
        }
        return new UnitChoice(analyte, best, results.size() == 1 ? Basis.ONLY_UNIT : Basis.MAJORITY, files, results);
    }

    /** Whether the lab files write this analyte in more than one unit word. */
    public boolean filesDisagree() {
        return results.size() > 1;
    }

    /**
     * One sentence for the scope of a report: "Au is reported in ppm: 24 lab files (2,481 results) write
     * ppm, 10 files (800 results) write g/t; 1 g/t = 1 ppm, so only the label differs. Set ingest.units to
     * choose."
     */
    public String sentence() {
        StringBuilder sb = new StringBuilder(analyte).append(" is reported in ").append(unit.symbol());
        if (basis == Basis.CONFIGURED) {
            sb.append(" (ingest.units in cupel.yaml)");
        }
        if (!filesDisagree() && results.containsKey(unit)) {
            return sb.append(", the unit of every lab file.").toString();
        }
        sb.append(basis == Basis.MAJORITY ? ", the unit most results are written in: " : ": the lab files write ");
        List<GradeUnit> read = List.copyOf(results.keySet());
        for (int i = 0; i < read.size(); i++) {
            GradeUnit u = read.get(i);
            int n = files.getOrDefault(u, 0);
            sb.append(i == 0 ? "" : ", ").append(String.format(Locale.US, "%,d %s (%,d results) %s", n,
                    n == 1 ? "file" : "files", results.get(u), u.symbol()));
        }
        boolean sameNumbers = read.stream().allMatch(u -> u.gramsPerTonne() == unit.gramsPerTonne());
        sb.append(sameNumbers ? "; the numbers are equal in these units (1 g/t = 1 ppm), only the label differs"
                : "; values in other units are converted to " + unit.symbol());
        return sb.append(basis == Basis.CONFIGURED ? "." : ". Set ingest.units in cupel.yaml to choose another.")
                .toString();
    }
}
