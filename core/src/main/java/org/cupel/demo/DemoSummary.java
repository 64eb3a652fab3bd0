package org.cupel.demo;

import java.util.Collections;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import org.cupel.assay.QcRole;

/**
 * What the demo generator wrote.
 *
 * @param files         relative paths of the files, in the order written
 * @param registered    register rows per QC role (enum order); lab repeats are the lab's own rows, not registered
 * @param labRepeats    lab repeat rows in the primary lab's files
 * @param labBatches    primary-lab batches
 * @param umpireBatches umpire-lab batches
 * @param reassayFiles  gravimetric re-assay files
 * @param analytes      analytes reported by the primary lab
 * @param planted       the planted problems, in the order of the list in docs/demo.md
 */
public record DemoSummary(List<String> files, Map<QcRole, Long> registered, long labRepeats, int labBatches,
                          int umpireBatches, int reassayFiles, List<DemoAnalyte> analytes,
                          List<PlantedProblem> planted) {

    public DemoSummary {
        files = List.copyOf(files);
        registered = Collections.unmodifiableMap(new EnumMap<>(registered));
        analytes = List.copyOf(analytes);
        planted = List.copyOf(planted);
    }

    /** The planted problem of one kind; every kind is planted once. */
    public PlantedProblem planted(PlantedProblem.Kind kind) {
        return planted.stream().filter(p -> p.kind() == kind).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("no planted problem of kind " + kind));
    }

    /** Register rows of every role. */
    public long registeredTotal() {
        return registered.values().stream().mapToLong(Long::longValue).sum();
    }
}
