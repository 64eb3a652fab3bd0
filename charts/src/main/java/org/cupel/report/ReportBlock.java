package org.cupel.report;

import java.util.function.Supplier;
import org.knowm.xchart.internal.chartpart.Chart;

/** One piece of a report section, in reading order. Renderers (HTML, PDF) handle each kind. */
public sealed interface ReportBlock permits ReportBlock.Paragraph, ReportBlock.Table, ReportBlock.Figure,
        ReportBlock.Callout {

    /** A paragraph of plain text (escaped by the renderer). */
    record Paragraph(String text) implements ReportBlock {
    }

    /** A table; also exported as CSV. */
    record Table(ReportTable table) implements ReportBlock {
    }

    /**
     * A chart, drawn when the report is written so that screen and print resolution both come from one
     * definition.
     *
     * @param name file stem for {@code charts/<name>.png} (sanitised when written)
     * @param caption caption under the chart
     * @param chart builds the chart; called once per output resolution, until the report writer has drawn
     *     the figure and {@linkplain #release released} what the chart is built from
     */
    record Figure(String name, String caption, Supplier<Chart<?, ?>> chart) implements ReportBlock {
        public Figure {
            chart = ChartSource.of(chart);
        }

        /** Lets the results the chart is built from go, once the chart is drawn; it cannot be built again. */
        void release() {
            ((ChartSource) chart).release();
        }
    }

    /** A highlighted statement: a verdict, a caution. */
    record Callout(Level level, String text) implements ReportBlock {
    }

    /**
     * How a callout is shown. CANNOT_JUDGE is a check with nothing to judge (no control sample), which is
     * never shown as a pass.
     */
    enum Level { INFO, PASS, WARN, FAIL, CAUTION, CANNOT_JUDGE }
}
