package org.cupel.charts;

import java.awt.BasicStroke;
import java.awt.Graphics2D;
import java.awt.Stroke;
import java.awt.geom.Ellipse2D;
import org.knowm.xchart.style.markers.Marker;

/**
 * An open circle about twice a marker's size, drawn around a point to mark it (a result the review flagged)
 * while the point keeps its own shape and colour, and so its series, visible inside. Flagged points are few,
 * so the shape is drawn directly rather than through a {@link SpriteMarker}.
 */
public final class RingMarker extends Marker {
    /** The one ring every chart shares. */
    public static final Marker RING = new RingMarker();

    private RingMarker() {
    }

    @Override
    public void paint(Graphics2D g, double xOffset, double yOffset, int markerSize) {
        double r = markerSize;
        Stroke before = g.getStroke();
        g.setStroke(new BasicStroke(Math.max(1.5f, markerSize / 3.5f)));
        g.draw(new Ellipse2D.Double(xOffset - r, yOffset - r, 2 * r, 2 * r));
        g.setStroke(before);
    }
}
