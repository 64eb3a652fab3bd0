package org.cupel.charts;

import java.awt.BasicStroke;
import java.awt.Color;
import org.knowm.xchart.style.markers.Marker;

/**
 * One entry of a figure's key: a swatch drawn with the very colour, stroke and marker of the series it names
 * (build both from the same values), and its label.
 *
 * @param stroke the line, or null for points only
 * @param marker the point marker, or null for a line only
 * @param markerSize the marker's size, as the chart draws it
 */
public record KeyEntry(String label, Color colour, BasicStroke stroke, Marker marker, int markerSize) {
    public KeyEntry {
        if (stroke == null && marker == null) {
            throw new IllegalArgumentException("a key entry needs a line or a marker: " + label);
        }
    }

    /** An entry whose marker has the charts' usual size. */
    public KeyEntry(String label, Color colour, BasicStroke stroke, Marker marker) {
        this(label, colour, stroke, marker, ChartStyle.MARKER_SIZE);
    }

    /** The same entry with its marker drawn at {@code size}, as a chart with larger markers draws it. */
    public KeyEntry sized(int size) {
        return new KeyEntry(label, colour, stroke, marker, size);
    }

    public static KeyEntry line(String label, Color colour, BasicStroke stroke) {
        return new KeyEntry(label, colour, stroke, null);
    }

    public static KeyEntry points(String label, Color colour, Marker marker) {
        return new KeyEntry(label, colour, null, marker);
    }
}
