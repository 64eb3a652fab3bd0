package org.cupel.charts.duplicates;

import java.util.ArrayList;
import java.util.List;
import org.cupel.assay.QcRole;
import org.cupel.charts.ChartFigure;
import org.cupel.charts.ChartStyle;
import org.cupel.charts.KeyEntry;
import org.cupel.duplicates.DuplicateReport;
import org.cupel.duplicates.DuplicateSetResult;

/**
 * The three figures of an analyte's duplicates, each a grid of one panel per duplicate type and a last panel
 * that puts the types side by side: {@link #pairs} (original against duplicate, ranked HARD), {@link #bias}
 * (relative difference, mean bias) and {@link #precision} (Thompson–Howarth, precision by grade). Three
 * figures instead of four charts per type: the same pairs, lines and decisions in a third of the pages.
 */
public final class DuplicateFigures {
    static final int COLUMNS = 2;
    /** Height of each panel's chart: three rows of panels and their notes fill a page at the text width. */
    static final int CHART_HEIGHT = 270;

    private DuplicateFigures() {
    }

    /** (a)... original against duplicate per type; last: ranked HARD of every type. */
    public static ChartFigure pairs(DuplicateReport r) {
        List<KeyEntry> key = new ArrayList<>(List.of(DuplicatePlots.KEY_PAIRS,
                DuplicatePlots.flaggedKey("pair beyond the HARD limit (flagged)"), DuplicatePlots.KEY_ONE_TO_ONE,
                DuplicatePlots.KEY_HARD_LINES));
        if (r.sets().stream().anyMatch(s -> s.type() == QcRole.UMPIRE && s.bias().rma().available())) {
            key.add(KeyEntry.line("reduced major axis (umpire)", ChartStyle.SECOND, DuplicatePlots.RMA));
        }
        return figure(r, DuplicateCharts::scatter, DuplicateSummaryCharts::rankedHard, key);
    }

    /** (a)... relative difference against pair mean per type; last: mean relative bias of every type. */
    public static ChartFigure bias(DuplicateReport r) {
        return figure(r, DuplicateCharts::relativeDifference, DuplicateSummaryCharts::bias, List.of(
                DuplicatePlots.KEY_PAIRS, DuplicatePlots.flaggedKey("pair beyond the HARD limit (flagged)"),
                KeyEntry.line("mean", ChartStyle.SECOND, DuplicatePlots.MEAN),
                KeyEntry.line("95 % interval of the mean", ChartStyle.SECOND, DuplicatePlots.MEAN_INTERVAL),
                KeyEntry.line("zero", ChartStyle.REFERENCE, DuplicatePlots.ZERO),
                KeyEntry.line("type's HARD limit (±2 × limit)", ChartStyle.WARNING, DuplicatePlots.HARD_LINES)));
    }

    /** (a)... Thompson–Howarth plot per type; last: precision by grade of every type. */
    public static ChartFigure precision(DuplicateReport r) {
        return figure(r, DuplicateCharts::thompsonHowarth, DuplicateSummaryCharts::precision, List.of(
                DuplicatePlots.KEY_PAIRS, DuplicatePlots.flaggedKey("pair above the 99 % line (flagged)"),
                KeyEntry.points("group median |d|", ChartStyle.BLACK, DuplicatePlots.MEDIAN_MARKER)
                        .sized(ChartStyle.PANEL_MARKER_SIZE),
                KeyEntry.line("fitted median |d|", ChartStyle.REFERENCE, DuplicatePlots.FITTED),
                KeyEntry.line("90 % line", ChartStyle.WARNING, DuplicatePlots.LINE90),
                KeyEntry.line("99 % line", ChartStyle.FAILURE, DuplicatePlots.LINE99),
                KeyEntry.line("|d| at the type's HARD limit", ChartStyle.REDDISH_PURPLE, DuplicatePlots.TARGET)));
    }

    /** A panel of one type, lettered, at a size. */
    private interface TypePanel {
        ChartFigure.Panel of(DuplicateSetResult set, String letter, int width, int height);
    }

    /** The panel that compares the types, lettered, at a size. */
    private interface SummaryPanel {
        ChartFigure.Panel of(List<DuplicateSetResult> sets, String letter, int width, int height);
    }

    private static ChartFigure figure(DuplicateReport r, TypePanel perType, SummaryPanel summary, List<KeyEntry> key) {
        List<ChartFigure.Panel> panels = new ArrayList<>();
        List<DuplicateSetResult> sets = r.sets();
        int width = ChartStyle.WIDTH / COLUMNS;
        for (int i = 0; i < sets.size(); i++) {
            panels.add(perType.of(sets.get(i), ChartFigure.letter(i), width, CHART_HEIGHT));
        }
        panels.add(summary.of(sets, ChartFigure.letter(sets.size()), width, CHART_HEIGHT));
        return ChartFigure.grid(ChartStyle.WIDTH, COLUMNS, CHART_HEIGHT, panels, key);
    }

    /**
     * What the panels of each figure show, in order: "(a) field duplicates, (b) pulp duplicates", for a caption.
     */
    public static String typePanels(DuplicateReport r) {
        List<String> parts = new ArrayList<>();
        for (int i = 0; i < r.sets().size(); i++) {
            parts.add(ChartFigure.letter(i) + " " + r.sets().get(i).type().label() + "s");
        }
        return String.join(", ", parts);
    }

    /** The letter of the last panel, which compares the types. */
    public static String summaryLetter(DuplicateReport r) {
        return ChartFigure.letter(r.sets().size());
    }
}
