package org.cupel.charts;

import java.awt.Color;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.Rectangle;
import java.awt.RenderingHints;
import java.awt.geom.Line2D;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.internal.chartpart.Chart;
import org.knowm.xchart.style.XYStyler;

/**
 * A figure: one XChart chart, or a grid of lettered panels, with everything that is not data drawn outside
 * the plots. XChart places annotation boxes inside the plot, where they hide points; here a chart's small
 * print (n, thinning, fitted lines) goes in a strip under it, category names beside the axis they name, and a
 * key shared by the panels at the foot of the figure (or in the grid's empty cell). Panels are XChart charts
 * painted into their own region of the one image, so the PNG pipeline ({@link PngWriter}, {@link PngEncoder},
 * {@link SpriteMarker}) draws a figure as it draws a chart.
 *
 * <p>Sizes are in figure units, XChart's points: a figure {@code width} units wide prints at the report's
 * text width. The layout of strips, headings and key is fixed when the figure is built, from measured text;
 * the labels of {@link FigureDecoration}s are placed when the charts are painted. {@link #layout()} gives
 * both, so tests can check that nothing written covers a plot and no two labels collide.
 */
public final class ChartFigure extends Chart<XYStyler, XYSeries> {
        /** The small print under a chart. */
    public static final Font NOTE_FONT = new Font(ChartStyle.FONT, Font.PLAIN, 12);
    /** The small print under a panel of a grid. */
    public static final Font PANEL_NOTE_FONT = new Font(ChartStyle.FONT, Font.PLAIN, 11);
    static final Font HEADING_FONT = new Font(ChartStyle.FONT, Font.PLAIN, 14);
    static final Font LETTER_FONT = new Font(ChartStyle.FONT, Font.BOLD, 14);
    static final Font KEY_FONT = new Font(ChartStyle.FONT, Font.PLAIN, 12);
    /** Text outside the plots. */
    public static final Color INK = new Color(40, 40, 40);
    static final Color NOTE_INK = new Color(70, 70, 70);
    private static final double PAD = 10;
    private static final double SWATCH = 30;
    private static final Pattern LETTER = Pattern.compile("^(\\([a-z]\\))\\s+(.*)$");

    private final List<Cell> cells;
    private final List<KeyBox> key;
    private final Rectangle2D keyArea;
    private volatile Layout painted;

    /**
     * One panel: its chart and what goes around it.
     *
     * @param heading drawn above the chart, a leading "(a)" in bold; empty for none (a lone chart keeps its own title)
     * @param note the small print under the chart; empty for none
     * @param key entries of the panel's own key, drawn under its chart (the figure's key serves every panel)
     * @param decorations labels placed from the painted chart
     */
    public record Panel(String heading, Chart<?, ?> chart, String note, List<KeyEntry> key,
                        List<FigureDecoration> decorations) {
        public Panel {
            key = List.copyOf(key);
            decorations = List.copyOf(decorations);
        }

        public Panel(String heading, Chart<?, ?> chart, String note) {
            this(heading, chart, note, List.of(), List.of());
        }

        public Panel withKey(List<KeyEntry> entries) {
            return new Panel(heading, chart, note, entries, decorations);
        }

        public Panel with(FigureDecoration d) {
            List<FigureDecoration> all = new ArrayList<>(decorations);
            all.add(d);
            return new Panel(heading, chart, note, key, all);
        }
    }

    /**
     * Where everything is, in figure units: each panel's chart region, heading, note and key, the figure's
     * key, and the labels placed on the last painting.
     */
    public record Layout(int width, int height, List<Rectangle2D> charts, List<Rectangle2D> headings,
                         List<Rectangle2D> notes, List<Rectangle2D> keys, List<FigureLabel> labels) {
        public Layout {
            charts = List.copyOf(charts);
            headings = List.copyOf(headings);
            notes = List.copyOf(notes);
            keys = List.copyOf(keys);
            labels = List.copyOf(labels);
        }
    }

    private record Cell(Panel panel, Rectangle chart, Rectangle2D area, Rectangle2D heading, List<String> note,
                        Rectangle2D noteBox, Font noteFont, List<KeyBox> key, Rectangle2D keyArea) {
    }

    private record KeyBox(KeyEntry entry, Rectangle2D swatch, Rectangle2D label, Font font) {
    }

    private ChartFigure(int width, int height, List<Cell> cells, List<KeyBox> key, Rectangle2D keyArea) {
        super(width, height, new XYStyler());
        this.cells = List.copyOf(cells);
        this.key = List.copyOf(key);
        this.keyArea = keyArea;
    }

    /** One chart at its own size, with its note in a strip under it. */
    public static ChartFigure of(Chart<?, ?> chart, String note) {
        return of(new Panel("", chart, note));
    }

    /** One panel, the chart at its own size (the decorations' room taken from its width, added to its height). */
    public static ChartFigure of(Panel panel) {
        int width = panel.chart().getWidth();
        double left = panel.decorations().stream().mapToDouble(FigureDecoration::left).max().orElse(0);
        Cell cell = cell(panel, 0, 0, width, panel.chart().getHeight(), left, NOTE_FONT);
        return new ChartFigure(width, (int) Math.ceil(cell.area().getHeight()), List.of(cell), List.of(), null);
    }

    /**
     * Panels in rows of {@code columns}, each chart {@code chartHeight} units high, and the key shared by
     * them: in the grid's empty cell when there is one and the key fits there, else across the foot.
     */
    public static ChartFigure grid(int width, int columns, int chartHeight, List<Panel> panels, List<KeyEntry> key) {
        if (panels.isEmpty() || columns < 1) {
            throw new IllegalArgumentException("a grid needs a panel and a column");
        }
        double cellWidth = (double) width / columns;
        // Every cell of a row as high as the row's highest, so that the charts of a row align.
        double[] rowHeights = rowHeights(panels, columns, cellWidth, chartHeight);
        List<Cell> cells = new ArrayList<>();
        double top = 0;
        for (int i = 0; i < panels.size(); i++) {
            if (i > 0 && i % columns == 0) {
                top += rowHeights[i / columns - 1];
            }
            cells.add(cell(panels.get(i), (i % columns) * cellWidth, top, (int) cellWidth, chartHeight,
                    left(panels.get(i)), PANEL_NOTE_FONT));
        }
        double gridHeight = 0;
        for (double h : rowHeights) {
            gridHeight += h;
        }
        int free = panels.size() % columns == 0 ? 0 : columns - panels.size() % columns;
        List<KeyBox> keyBoxes = List.of();
        Rectangle2D keyArea = null;
        if (!key.isEmpty() && free > 0) {
            double x = (columns - free) * cellWidth;
            keyBoxes = flow(key, KEY_FONT, x + 2 * PAD, top + 2 * PAD, free * cellWidth - 3 * PAD);
            keyArea = bounds(keyBoxes);
            if (keyArea.getMaxY() > gridHeight) {
                keyBoxes = List.of();
                keyArea = null;
            }
        }
        if (!key.isEmpty() && keyArea == null) {
            keyBoxes = flow(key, KEY_FONT, PAD, gridHeight + PAD / 2, width - 2 * PAD);
            keyArea = bounds(keyBoxes);
            gridHeight = keyArea.getMaxY() + PAD;
        }
        return new ChartFigure(width, (int) Math.ceil(gridHeight), cells, keyBoxes, keyArea);
    }

    private static double[] rowHeights(List<Panel> panels, int columns, double cellWidth, int chartHeight) {
        double[] heights = new double[(panels.size() + columns - 1) / columns];
        for (int i = 0; i < panels.size(); i++) {
            double h = cell(panels.get(i), 0, 0, (int) cellWidth, chartHeight, left(panels.get(i)), PANEL_NOTE_FONT)
                    .area().getHeight();
            heights[i / columns] = Math.max(heights[i / columns], h);
        }
        return heights;
    }

    private static double left(Panel p) {
        return p.decorations().stream().mapToDouble(FigureDecoration::left).max().orElse(0);
    }

    /** "(a)", "(b)", ... for the panel at {@code index}. */
    public static String letter(int index) {
        return "(" + (char) ('a' + index) + ")";
    }

    /** The charts of the panels, in order. */
    public List<Chart<?, ?>> charts() {
        return cells.stream().<Chart<?, ?>>map(c -> c.panel().chart()).toList();
    }

    /** The panels, in order. */
    public List<Panel> panels() {
        return cells.stream().map(Cell::panel).toList();
    }

    /**
     * Where everything is. The labels of decorations come from the last painting; when the figure has not
     * been painted yet it is painted once, at one pixel per unit, to place them.
     */
    public Layout layout() {
        Layout l = painted;
        if (l == null) {
            BufferedImage scratch = new BufferedImage(getWidth(), getHeight(), BufferedImage.TYPE_INT_RGB);
            Graphics2D g = scratch.createGraphics();
            try {
                paint(g, getWidth(), getHeight());
            } finally {
                g.dispose();
            }
            l = painted;
        }
        return l;
    }

    @Override
    public void paint(Graphics2D g, int width, int height) {
        g.setColor(Color.WHITE);
        g.fillRect(0, 0, getWidth(), getHeight());
        List<FigureLabel> labels = new ArrayList<>();
        for (Cell c : cells) {
            Graphics2D cg = (Graphics2D) g.create();
            try {
                cg.translate(c.chart().x, c.chart().y);
                cg.clipRect(0, 0, c.chart().width, c.chart().height);
                c.panel().chart().paint(cg, c.chart().width, c.chart().height);
            } finally {
                cg.dispose();
            }
            Graphics2D tg = text(g);
            try {
                if (c.heading() != null) {
                    heading(tg, c.panel().heading(), c.heading());
                }
                tg.setColor(NOTE_INK);
                Text.draw(tg, c.note(), c.noteFont(), c.noteBox(), Text.Align.LEFT);
                drawKey(tg, c.key());
                for (FigureDecoration d : c.panel().decorations()) {
                    for (FigureLabel label : d.place(c.panel().chart(), c.chart(), c.area())) {
                        draw(tg, label);
                        labels.add(label);
                    }
                }
            } finally {
                tg.dispose();
            }
        }
        Graphics2D tg = text(g);
        try {
            drawKey(tg, key);
        } finally {
            tg.dispose();
        }
        List<Rectangle2D> keys = new ArrayList<>();
        cells.stream().map(Cell::keyArea).filter(k -> k != null).forEach(keys::add);
        if (keyArea != null) {
            keys.add(keyArea);
        }
        painted = new Layout(getWidth(), getHeight(), cells.stream().<Rectangle2D>map(Cell::chart).toList(),
                cells.stream().map(Cell::heading).filter(h -> h != null).toList(),
                cells.stream().map(Cell::noteBox).filter(n -> n.getHeight() > 0).toList(), keys, labels);
    }

    /** Lays out one panel in its cell: heading, then the chart (decorations' room left of and below it), key, note. */
    private static Cell cell(Panel p, double x, double y, int width, int chartHeight, double left, Font noteFont) {
        double top = y;
        Rectangle2D heading = null;
        if (!p.heading().isEmpty()) {
            heading = new Rectangle2D.Double(x + PAD, top + PAD / 2, width - 2 * PAD, Text.lineHeight(HEADING_FONT));
            top = heading.getMaxY() + 2;
        }
        double below = p.decorations().stream().mapToDouble(FigureDecoration::below).max().orElse(0);
        Rectangle chart = new Rectangle((int) Math.round(x + left), (int) Math.round(top), (int) Math.round(width - left),
                chartHeight);
        top = chart.getMaxY() + below;
        List<KeyBox> key = List.of();
        Rectangle2D keyArea = null;
        if (!p.key().isEmpty()) {
            key = flow(p.key(), noteFont, x + PAD, top + PAD / 2, width - 2 * PAD);
            keyArea = bounds(key);
            top = keyArea.getMaxY();
        }
        List<String> note = Text.wrap(p.note(), noteFont, width - 2 * PAD);
        double noteHeight = note.size() * Text.lineHeight(noteFont);
        Rectangle2D noteBox = new Rectangle2D.Double(x + PAD, top + (note.isEmpty() ? 0 : PAD / 2), width - 2 * PAD,
                noteHeight);
        double bottom = noteBox.getMaxY() + (note.isEmpty() && key.isEmpty() ? 0 : PAD / 2);
        return new Cell(p, chart, new Rectangle2D.Double(x, y, width, bottom - y), heading, note, noteBox, noteFont,
                key, keyArea);
    }

    /** Key entries left to right, wrapping at {@code width}. */
    private static List<KeyBox> flow(List<KeyEntry> entries, Font font, double x0, double y0, double width) {
        double rowHeight = Math.max(Text.lineHeight(font), 14) + 4;
        double x = x0;
        double y = y0;
        List<KeyBox> out = new ArrayList<>();
        for (KeyEntry e : entries) {
            double w = SWATCH + 6 + Text.width(e.label(), font);
            if (x > x0 && x + w > x0 + width) {
                x = x0;
                y += rowHeight;
            }
            Rectangle2D swatch = new Rectangle2D.Double(x, y, SWATCH, rowHeight - 4);
            Rectangle2D label = new Rectangle2D.Double(x + SWATCH + 6, y + (rowHeight - 4 - Text.lineHeight(font)) / 2,
                    Text.width(e.label(), font), Text.lineHeight(font));
            out.add(new KeyBox(e, swatch, label, font));
            x += w + 18;
        }
        return out;
    }

    private static Rectangle2D bounds(List<KeyBox> boxes) {
        Rectangle2D r = null;
        for (KeyBox b : boxes) {
            Rectangle2D both = b.swatch().createUnion(b.label());
            r = r == null ? both : r.createUnion(both);
        }
        return r;
    }

    private static Graphics2D text(Graphics2D g) {
        Graphics2D t = (Graphics2D) g.create();
        t.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        t.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
        t.setRenderingHint(RenderingHints.KEY_FRACTIONALMETRICS, RenderingHints.VALUE_FRACTIONALMETRICS_ON);
        return t;
    }

    private static void heading(Graphics2D g, String text, Rectangle2D box) {
        g.setColor(INK);
        Matcher m = LETTER.matcher(text);
        float baseline = (float) (box.getY() + Text.ascent(HEADING_FONT));
        float x = (float) box.getX();
        if (m.matches()) {
            g.setFont(LETTER_FONT);
            g.drawString(m.group(1), x, baseline);
            x += (float) (Text.width(m.group(1) + " ", LETTER_FONT));
            text = m.group(2);
        }
        g.setFont(HEADING_FONT);
        g.drawString(text, x, baseline);
    }

    private static void drawKey(Graphics2D g, List<KeyBox> boxes) {
        for (KeyBox b : boxes) {
            KeyEntry e = b.entry();
            Rectangle2D s = b.swatch();
            g.setColor(e.colour());
            if (e.stroke() != null) {
                g.setStroke(e.stroke());
                g.draw(new Line2D.Double(s.getX(), s.getCenterY(), s.getMaxX(), s.getCenterY()));
            }
            if (e.marker() != null) {
                e.marker().paint(g, s.getCenterX(), s.getCenterY(), e.markerSize());
            }
            g.setColor(INK);
            Text.draw(g, List.of(e.label()), b.font(), b.label(), Text.Align.LEFT);
        }
    }

    private static void draw(Graphics2D g, FigureLabel label) {
        if (label.leader() != null) {
            g.setColor(new Color(120, 120, 120));
            g.setStroke(ChartStyle.solid(0.7f));
            g.draw(label.leader());
        }
        g.setColor(label.colour());
        Text.draw(g, label.lines(), label.font(), label.box(), label.align());
    }
}
