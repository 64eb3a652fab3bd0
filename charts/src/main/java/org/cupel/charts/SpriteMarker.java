package org.cupel.charts;

import java.awt.AlphaComposite;
import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.Stroke;
import java.awt.geom.AffineTransform;
import java.awt.image.BufferedImage;
import java.util.Map;
import java.util.Objects;
import java.util.concurrent.ConcurrentHashMap;
import org.knowm.xchart.style.markers.Marker;

/**
 * A marker drawn as a copy of a small image of itself. A scatter chart draws thousands of identical
 * markers, and filling each as an antialiased shape (an ellipse is four curves, cut into lines and swept
 * scanline by scanline) was the largest single cost of drawing a chart at print resolution. Here the
 * wrapped marker paints itself once per colour, size, scale and sub-pixel position into a transparent
 * image; each point then copies that image onto the chart, which gives the same coverage at a small
 * fraction of the cost.
 *
 * <p>The sub-pixel position is kept to a quarter pixel ({@value #PHASES} steps per axis), so a marker is
 * at most an eighth of a pixel from where the shape itself would be drawn: 0.01 mm at print resolution.
 * Graphics that are rotated or sheared, or that do not composite by plain "source over", get the shape
 * itself. Thread-safe: the charts of a report are drawn on several threads.
 */
public final class SpriteMarker extends Marker {
    /** Sub-pixel positions per axis. */
    static final int PHASES = 4;
    /** Transparent pixels around the shape's bounds, for its antialiased edge and stroke. */
    private static final int MARGIN = 2;

    private final Marker shape;
    private final Map<Key, Sprite> sprites = new ConcurrentHashMap<>();

    public SpriteMarker(Marker shape) {
        this.shape = shape;
    }

    @Override
    public void paint(Graphics2D g, double xOffset, double yOffset, int markerSize) {
        AffineTransform t = g.getTransform();
        if (!scalesOnly(t) || !AlphaComposite.SrcOver.equals(g.getComposite())) {
            shape.paint(g, xOffset, yOffset, markerSize);
            return;
        }
        double x = t.getScaleX() * xOffset + t.getTranslateX();
        double y = t.getScaleY() * yOffset + t.getTranslateY();
        long px = Math.round(x * PHASES);
        long py = Math.round(y * PHASES);
        Key key = new Key(g.getColor().getRGB(), markerSize, t.getScaleX(), t.getScaleY(),
                Math.floorMod(px, PHASES), Math.floorMod(py, PHASES),
                g.getRenderingHint(RenderingHints.KEY_ANTIALIASING));
        Sprite s = sprites.computeIfAbsent(key, k -> draw(k, g.getColor(), g.getRenderingHints()));
        g.setTransform(new AffineTransform());
        try {
            g.drawImage(s.image(), (int) Math.floorDiv(px, PHASES) - s.centre(),
                    (int) Math.floorDiv(py, PHASES) - s.centre(), null);
        } finally {
            g.setTransform(t);
        }
        // What painting the shape would have left behind in the graphics.
        g.setStroke(s.stroke());
        g.setColor(s.colour());
    }

    private static boolean scalesOnly(AffineTransform t) {
        return t.getShearX() == 0 && t.getShearY() == 0 && t.getScaleX() > 0 && t.getScaleY() > 0;
    }

    private Sprite draw(Key k, Color colour, RenderingHints hints) {
        int centre = (int) Math.ceil(k.size() * Math.max(k.scaleX(), k.scaleY()) / 2) + MARGIN;
        BufferedImage image = new BufferedImage(2 * centre + 1, 2 * centre + 1, BufferedImage.TYPE_INT_ARGB_PRE);
        Graphics2D g = image.createGraphics();
        try {
            g.setRenderingHints(hints);
            g.setColor(colour);
            g.translate(centre + k.phaseX() / (double) PHASES, centre + k.phaseY() / (double) PHASES);
            g.scale(k.scaleX(), k.scaleY());
            shape.paint(g, 0, 0, k.size());
            return new Sprite(image, centre, g.getStroke(), g.getColor());
        } finally {
            g.dispose();
        }
    }

    /**
     * What a sprite depends on. Written out rather than a record: a record's {@code equals} and {@code hashCode}
     * go through method handles, which the C1 compiler alone (as the launcher runs Cupel) does not inline, and
     * they run once per point drawn.
     */
    private static final class Key {
        private final int argb;
        private final int size;
        private final double scaleX;
        private final double scaleY;
        private final int phaseX;
        private final int phaseY;
        private final Object antialias;

        Key(int argb, int size, double scaleX, double scaleY, int phaseX, int phaseY, Object antialias) {
            this.argb = argb;
            this.size = size;
            this.scaleX = scaleX;
            this.scaleY = scaleY;
            this.phaseX = phaseX;
            this.phaseY = phaseY;
            this.antialias = antialias;
        }

        int size() {
            return size;
        }

        double scaleX() {
            return scaleX;
        }

        double scaleY() {
            return scaleY;
        }

        int phaseX() {
            return phaseX;
        }

        int phaseY() {
            return phaseY;
        }

        @Override
        public boolean equals(Object o) {
            return o instanceof Key k && argb == k.argb && size == k.size && Double.compare(scaleX, k.scaleX) == 0
                    && Double.compare(scaleY, k.scaleY) == 0 && phaseX == k.phaseX && phaseY == k.phaseY
                    && Objects.equals(antialias, k.antialias);
        }

        @Override
        public int hashCode() {
            int h = argb;
            h = 31 * h + size;
            h = 31 * h + Double.hashCode(scaleX);
            h = 31 * h + Double.hashCode(scaleY);
            h = 31 * h + phaseX;
            h = 31 * h + phaseY;
            return 31 * h + Objects.hashCode(antialias);
        }
    }

    private record Sprite(BufferedImage image, int centre, Stroke stroke, Color colour) {
    }
}
