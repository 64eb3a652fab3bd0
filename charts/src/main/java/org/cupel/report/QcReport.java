package org.cupel.report;

import java.time.Instant;
import java.util.List;

/**
 * The whole QC appendix, ready to render: the project, what was selected, when it was generated, and the
 * sections in reading order.
 *
 * @param project project name
 * @param selection the batches covered, in words ("all batches")
 * @param generated generation time shown in the HTML and PDF (fixed by {@code SOURCE_DATE_EPOCH})
 * @param sections sections in reading order
 */
public record QcReport(String project, String selection, Instant generated, List<ReportSection> sections) {
    public QcReport {
        sections = List.copyOf(sections);
    }

    /**
     * Every table of the appendix in reading order: what the HTML, PDF and Word pages show and
     * {@code tables/*.csv} holds. Each is a Tablesaw table through {@link ReportTable#toTablesaw()}.
     */
    public List<ReportTable> tables() {
        return new ReportFiles(this).tables();
    }

    /** "QC appendix", the running title of every page. */
    public static final String TITLE = "QC appendix";
}
