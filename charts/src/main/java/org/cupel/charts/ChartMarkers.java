package org.cupel.charts;

import java.util.Arrays;
import java.util.IdentityHashMap;
import java.util.Map;
import org.knowm.xchart.style.markers.Marker;
import org.knowm.xchart.style.markers.SeriesMarkers;
import org.knowm.xchart.style.markers.XChartSeriesMarkers;

/**
 * The point markers of every Cupel chart: XChart's shapes, drawn through {@link SpriteMarker} so that
 * charts of thousands of points stay cheap to draw at print resolution. Use these instead of
 * {@link SeriesMarkers} (whose {@link SeriesMarkers#NONE} stays the way to draw no marker). One
 * {@link SpriteMarker} per shape, shared by all charts, so each image of a marker is drawn once per run.
 */
public final class ChartMarkers {
    private static final Map<Marker, Marker> SPRITES = new IdentityHashMap<>();

    public static final Marker CIRCLE = of(SeriesMarkers.CIRCLE);
    public static final Marker DIAMOND = of(SeriesMarkers.DIAMOND);
    public static final Marker SQUARE = of(SeriesMarkers.SQUARE);
    public static final Marker TRIANGLE_UP = of(SeriesMarkers.TRIANGLE_UP);
    public static final Marker TRIANGLE_DOWN = of(SeriesMarkers.TRIANGLE_DOWN);

    /** One shape per thing compared on one chart, with {@link ChartStyle#CATEGORIES}. */
    public static final Marker[] CATEGORIES = {CIRCLE, SQUARE, DIAMOND, TRIANGLE_UP, TRIANGLE_DOWN};

    private ChartMarkers() {
    }

    /** XChart's default marker sequence (for series given none), in its order. */
    static Marker[] defaults() {
        return Arrays.stream(new XChartSeriesMarkers().getSeriesMarkers()).map(ChartMarkers::of)
                .toArray(Marker[]::new);
    }

    private static synchronized Marker of(Marker shape) {
        return SPRITES.computeIfAbsent(shape, SpriteMarker::new);
    }
}
