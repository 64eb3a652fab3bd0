package org.cupel.assay;

/** Why a result has no value. Labs write these as text codes; the ingest maps them here. */
public enum MissingReason {
    NONE,
    NOT_RECEIVED,
    INSUFFICIENT_SAMPLE,
    NOT_ANALYSED,
    BLANK_CELL,
    /** A text code the project config maps to "missing" without a more specific reason. */
    OTHER_CODE
}
