package org.cupel.report;

import java.util.List;
import java.util.Map;

/**
 * A numbered section of the QC appendix (scope, verdicts, CRMs, ...), built from analysis results.
 * Sections compute nothing: they format records that the core analyses returned.
 *
 * @param id anchor for the table of contents ("crms")
 * @param title heading ("CRM control")
 * @param blocks content in reading order
 * @param headlines the section's headline figures for {@code summary.json} (name to number or text)
 * @param references the sources of the formulas and thresholds the section uses; the report lists them
 *     all under "Methods and references"
 */
public record ReportSection(String id, String title, List<ReportBlock> blocks, Map<String, Object> headlines,
                            List<Reference> references) {
    public ReportSection {
        blocks = List.copyOf(blocks);
        headlines = Map.copyOf(headlines);
        references = List.copyOf(references);
    }

    /** A section that cites no source. */
    public ReportSection(String id, String title, List<ReportBlock> blocks, Map<String, Object> headlines) {
        this(id, title, blocks, headlines, List.of());
    }
}
