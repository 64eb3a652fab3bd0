package org.cupel.recovery;

import java.util.List;
import java.util.Map;
import org.cupel.assay.AssayValue;
import org.cupel.project.DataIssue;

/**
 * The testwork as read: head assays per feed and analyte (replicates and lab duplicates, in g/t), the
 * smelts, and the problems found while reading.
 *
 * @param analytes analyte names in the order first read
 * @param heads feed → analyte → replicate head assays in g/t
 * @param smelts the smelts, in file order
 * @param issues input problems (rows left out, values not usable)
 */
public record Testwork(List<String> analytes, Map<String, Map<String, List<AssayValue>>> heads, List<Smelt> smelts,
                       List<DataIssue> issues) {
    public Testwork {
        analytes = List.copyOf(analytes);
        heads = Map.copyOf(heads);
        smelts = List.copyOf(smelts);
        issues = List.copyOf(issues);
    }

    /** The replicate head assays of {@code feed} for {@code analyte}; empty when there are none. */
    public List<AssayValue> heads(String feed, String analyte) {
        return heads.getOrDefault(feed, Map.of()).getOrDefault(analyte, List.of());
    }
}
