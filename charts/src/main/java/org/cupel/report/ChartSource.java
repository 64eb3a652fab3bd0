package org.cupel.report;

import java.util.function.Supplier;
import org.knowm.xchart.internal.chartpart.Chart;

/**
 * Builds a figure's chart from the results it captures, until the report writer has drawn it and lets
 * those results go ({@link #release}). A figure's builder holds what its chart plots (at a million samples,
 * the CRM, blank, duplicate and censored series of the whole project: about half a gigabyte); the written
 * report needs only the chart's file after it is drawn, so the heap the PDF and the Word copy are laid out in
 * no longer carries the data of the charts already drawn.
 */
final class ChartSource implements Supplier<Chart<?, ?>> {
    private volatile Supplier<Chart<?, ?>> build;

    private ChartSource(Supplier<Chart<?, ?>> build) {
        this.build = build;
    }

    /** {@code build} itself when it is a chart source already, so that release reaches the one in use. */
    static ChartSource of(Supplier<Chart<?, ?>> build) {
        return build instanceof ChartSource source ? source : new ChartSource(build);
    }

    /**
     * A new chart.
     *
     * @throws IllegalStateException after {@link #release}: a chart is drawn before its figure's data is let go
     */
    @Override
    public Chart<?, ?> get() {
        Supplier<Chart<?, ?>> b = build;
        if (b == null) {
            throw new IllegalStateException("the chart was drawn and its data released; draw a figure before "
                    + "releasing it");
        }
        return b.get();
    }

    /** Lets the captured results go; the chart cannot be built again. */
    void release() {
        build = null;
    }
}
