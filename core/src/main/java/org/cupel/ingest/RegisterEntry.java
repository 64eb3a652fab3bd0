package org.cupel.ingest;

import org.cupel.assay.QcRole;
import org.cupel.assay.SourceLocation;

/**
 * One submitted sample in the sample register.
 *
 * @param reference CRM code, or the original sample's ID for a duplicate; empty otherwise
 * @param holeId drill hole, empty when not given
 * @param from interval start in metres, NaN when not given
 * @param to interval end in metres, NaN when not given
 */
record RegisterEntry(String sampleId, QcRole role, String reference, String holeId, double from, double to,
                            SourceLocation source) {
}
