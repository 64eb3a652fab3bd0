package org.cupel.ingest;

import java.util.List;

/** The header spellings of the non-analyte columns of lab files and registers (matched as {@link RawTable#column}). */
final class LabColumns {
    static final String[] BATCH = {"batch", "job", "batch id", "job no", "job number", "certificate",
        "certificate no", "work order", "lab job"};
    static final String[] DATE = {"date", "date reported", "reported", "date received", "received", "report date"};
    static final String[] POSITION = {"position", "pos", "seq", "sequence", "order", "run order", "tray position"};
    // Not "type" or "sample type": those often describe the material (core, RC chips), not the QC role.
    static final String[] ROLE = {"qc role", "role", "qc type", "qc", "qc code", "control type"};
    static final String[] REFERENCE = {"reference", "ref", "crm", "crm code", "standard", "original",
        "original id", "original sample", "parent", "parent id"};
    /** First-cell texts of a row under the header that states each column's detection limit. */
    static final List<String> DETECTION_LIMIT_ROW = List.of("detection limit", "detection limits", "lod", "lor",
            "dl", "ldl", "lower detection limit", "limit of detection", "lower limit");
    static final String[] HB_LAB = {"lab", "laboratory"};
    static final String[] HB_JOB = {"job", "batch", "certificate", "work order", "job number", "batch number"};
    static final String[] HB_DATE = {"date", "date reported", "reported", "date received", "received"};

    private LabColumns() {
    }

    static String[] sampleId() {
        return TableReader.SAMPLE_ID_ALIASES.toArray(new String[0]);
    }
}
