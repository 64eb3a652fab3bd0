package org.cupel.charts;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.knowm.xchart.AnnotationTextPanel;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;

/** The layout of a figure: small print under its chart, panels in a grid with one key, text wrapped to fit. */
class ChartFigureTest {

    static XYChart chart(int w, int h) {
        XYChart c = new XYChartBuilder().width(w).height(h).title("t").xAxisTitle("x").yAxisTitle("y").build();
        ChartStyle.apply(c);
        c.addSeries("points", new double[] {1, 2, 3}, new double[] {3, 1, 2});
        return c;
    }

    @Test
    void aChartsNoteGoesInAStripUnderItWrappedToItsWidth() {
        String note = "n = 2,493; 65 censored (3 %); " + "a long explanation of what the lines mean ".repeat(6).strip();
        ChartFigure f = ChartFigure.of(chart(900, 560), note);
        ChartFigure.Layout l = f.layout();
        Rectangle2D chart = l.charts().get(0);
        Rectangle2D strip = l.notes().get(0);
        assertEquals(new Rectangle2D.Double(0, 0, 900, 560), chart);
        assertTrue(strip.getY() >= chart.getMaxY(), "under the chart: " + strip);
        assertTrue(strip.getMaxX() <= 900 && strip.getMaxY() <= f.getHeight(), strip + " inside the figure");
        assertTrue(f.getHeight() > 560, "the figure grows by the strip");
        for (String line : Text.wrap(note, ChartFigure.NOTE_FONT, strip.getWidth())) {
            assertTrue(Text.width(line, ChartFigure.NOTE_FONT) <= strip.getWidth(), line);
        }
        FigureChecks.writingStaysOutOfThePlots("single", f);
    }

    @Test
    void withoutANoteTheFigureIsTheChart() {
        ChartFigure f = ChartFigure.of(chart(900, 560), "");
        assertEquals(560, f.getHeight());
        assertTrue(f.layout().notes().isEmpty());
    }

    @Test
    void panelsAlignInRowsAndTheKeyTakesTheEmptyCell() {
        List<ChartFigure.Panel> panels = new ArrayList<>();
        for (int i = 0; i < 3; i++) {
            // The first panel's note is three times longer: its row grows, and both charts of the row still align.
            panels.add(new ChartFigure.Panel(ChartFigure.letter(i) + " Panel " + i, chart(450, 270),
                    "note; ".repeat(i == 0 ? 60 : 20).strip()));
        }
        List<KeyEntry> key = List.of(KeyEntry.points("pair", ChartStyle.DATA, ChartMarkers.CIRCLE),
                KeyEntry.line("1:1", ChartStyle.REFERENCE, ChartStyle.solid(1.5f)));
        ChartFigure f = ChartFigure.grid(900, 2, 270, panels, key);
        ChartFigure.Layout l = f.layout();
        assertEquals(l.charts().get(0).getY(), l.charts().get(1).getY(), "a row's charts at one height");
        assertTrue(l.charts().get(2).getY() > l.notes().get(0).getMaxY(), "next row under the longest note");
        assertEquals(450, l.charts().get(2).getWidth(), 1);
        Rectangle2D key0 = l.keys().get(0);
        assertTrue(key0.getX() >= 450 && key0.getY() >= l.charts().get(2).getY() - 30,
                "the key sits in the fourth, empty cell: " + key0);
        assertTrue(f.getHeight() <= l.notes().get(2).getMaxY() + 20, "no strip under the grid for the key");
        FigureChecks.writingStaysOutOfThePlots("grid", f);
    }

    @Test
    void aFullGridHasItsKeyAcrossTheFoot() {
        List<ChartFigure.Panel> panels = List.of(new ChartFigure.Panel("(a) A", chart(450, 270), "n = 1"),
                new ChartFigure.Panel("(b) B", chart(450, 270), "n = 2"));
        ChartFigure f = ChartFigure.grid(900, 2, 270, panels,
                List.of(KeyEntry.line("zero", ChartStyle.REFERENCE, ChartStyle.solid(1f))));
        ChartFigure.Layout l = f.layout();
        assertTrue(l.keys().get(0).getY() > l.notes().get(1).getMaxY(), "under the panels");
        assertTrue(l.keys().get(0).getMaxY() <= f.getHeight());
    }

    @Test
    void lettersRunFromA() {
        assertEquals("(a)", ChartFigure.letter(0));
        assertEquals("(f)", ChartFigure.letter(5));
    }

    @Test
    void aKeyEntryNeedsALineOrAMarker() {
        assertThrows(IllegalArgumentException.class, () -> new KeyEntry("nothing", ChartStyle.DATA, null, null));
    }

    @Test
    void wrappingBreaksAtSeparatorsFirstThenBetweenWords() {
        String text = "n = 118 pairs, both detected; 32 beyond the HARD limit; RMA y = 0.0273 + 0.996·x";
        double oneSeparatorPart = Text.width("n = 118 pairs, both detected; 32 beyond the HARD limit;",
                ChartFigure.NOTE_FONT);
        List<String> lines = Text.wrap(text, ChartFigure.NOTE_FONT, oneSeparatorPart + 1);
        assertEquals(List.of("n = 118 pairs, both detected; 32 beyond the HARD limit;", "RMA y = 0.0273 + 0.996·x"),
                lines);
        List<String> narrow = Text.wrap("alpha beta gamma", ChartFigure.NOTE_FONT,
                Text.width("alpha beta", ChartFigure.NOTE_FONT) + 1);
        assertEquals(List.of("alpha beta", "gamma"), narrow);
        assertEquals(List.of("first", "second"), Text.wrap("first\nsecond", ChartFigure.NOTE_FONT, 500));
        assertTrue(Text.wrap("", ChartFigure.NOTE_FONT, 100).isEmpty());
    }

    /** The checks themselves catch what they are for: a note box inside a plot, labels on top of each other. */
    @Test
    void theChecksCatchABoxInsideThePlotAndCollidingLabels() {
        XYChart c = chart(900, 560);
        c.addAnnotation(new AnnotationTextPanel("n = 3", 100, 400, true));
        ChartFigure boxed = ChartFigure.of(c, "");
        assertThrows(AssertionError.class, () -> FigureChecks.writingStaysOutOfThePlots("boxed", boxed));
        FigureDecoration twice = (painted, region, panel) -> List.of(
                new FigureLabel(List.of("1.21"), ChartFigure.NOTE_FONT, ChartFigure.INK,
                        new Rectangle2D.Double(10, 10, 30, 14), Text.Align.LEFT, null),
                new FigureLabel(List.of("0.48"), ChartFigure.NOTE_FONT, ChartFigure.INK,
                        new Rectangle2D.Double(20, 15, 30, 14), Text.Align.LEFT, null));
        ChartFigure collide = ChartFigure.of(new ChartFigure.Panel("", chart(900, 560), "").with(twice));
        assertThrows(AssertionError.class, () -> FigureChecks.labelsApart("collide", collide));
        assertFalse(collide.layout().labels().isEmpty());
    }
}
