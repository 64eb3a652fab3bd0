package org.cupel.report;

import java.util.ArrayList;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;

/**
 * The file name of every chart ({@code charts/<name>.png}) and table ({@code tables/<id>.csv}) of a report,
 * assigned once in reading order so that the HTML, the PDF and the files on disk agree, and so that the
 * same report always gets the same names.
 */
public final class ReportFiles {
    private final Map<ReportBlock.Figure, String> charts = new IdentityHashMap<>();
    private final Map<ReportTable, String> tables = new IdentityHashMap<>();
    private final List<ReportBlock.Figure> figureOrder = new ArrayList<>();
    private final List<ReportTable> tableOrder = new ArrayList<>();

    public ReportFiles(QcReport report) {
        FileNames chartNames = new FileNames();
        FileNames tableNames = new FileNames();
        for (ReportSection s : report.sections()) {
            for (ReportBlock b : s.blocks()) {
                if (b instanceof ReportBlock.Figure f) {
                    charts.put(f, "charts/" + chartNames.unique(f.name()) + ".png");
                    figureOrder.add(f);
                } else if (b instanceof ReportBlock.Table t) {
                    tables.put(t.table(), "tables/" + tableNames.unique(t.table().id()) + ".csv");
                    tableOrder.add(t.table());
                }
            }
        }
    }

    /** Relative path of the chart's PNG, with forward slashes. */
    public String chart(ReportBlock.Figure f) {
        return charts.get(f);
    }

    /** Relative path of the table's CSV, with forward slashes. */
    public String table(ReportTable t) {
        return tables.get(t);
    }

    public List<ReportBlock.Figure> figures() {
        return List.copyOf(figureOrder);
    }

    public List<ReportTable> tables() {
        return List.copyOf(tableOrder);
    }
}
