package org.cupel.ingest;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.cupel.project.DataIssue;

/**
 * The sample register as read.
 *
 * @param file file name used in messages
 * @param entries usable entries by sample ID, in file order
 * @param rejectedIds IDs whose register row could not be used (unknown role); their lab rows are left out too
 * @param issues problems found
 * @param rowsRead data rows
 * @param rowsExcluded rows listed as exceptions
 */
public record SampleRegister(String file, Map<String, RegisterEntry> entries, Set<String> rejectedIds,
                             List<DataIssue> issues, long rowsRead, long rowsExcluded) {

    public Optional<RegisterEntry> entry(String sampleId) {
        return Optional.ofNullable(entries.get(sampleId));
    }
}
