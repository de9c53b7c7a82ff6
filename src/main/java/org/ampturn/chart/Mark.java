package org.ampturn.chart;

/**
 * A key value marked on a chart, in SI. With both x and y it is a point (a peak, an operating
 * point); with only x (y NaN) a vertical line (a time constant, a pull-in time); with only y
 * (x NaN) a horizontal line (a limit, a saturation flux density).
 *
 * @param label what the mark is, e.g. "τ" or "peak switch voltage"; the value is added when drawn
 * @param x     position on the x axis in SI, or NaN
 * @param y     position on the y axis in SI, or NaN
 * @param trace the trace (or panel quantity) it belongs to; null for the first panel
 * @param text  the label drawn as it is, instead of the label and the mark's value; null for that default
 */
public record Mark(String label, double x, double y, String trace, String text) {
    public Mark {
        if (label == null) throw new IllegalArgumentException("mark label is missing (null)");
        if (Double.isNaN(x) && Double.isNaN(y)) {
            throw new IllegalArgumentException("mark \"" + label + "\" needs an x or a y position, both are NaN");
        }
    }

    /** A mark labelled with its label and value, as drawn by default. */
    public Mark(String label, double x, double y, String trace) {
        this(label, x, y, trace, null);
    }

    /** The same mark drawn with this text (a metric's value, say) instead of its label and position. */
    public Mark withText(String drawn) {
        return new Mark(label, x, y, trace, drawn);
    }

    public static Mark vertical(String label, double x) { return new Mark(label, x, Double.NaN, null); }
    public static Mark horizontal(String label, double y) { return new Mark(label, Double.NaN, y, null); }
    public static Mark point(String label, double x, double y, String trace) { return new Mark(label, x, y, trace); }

    boolean isPoint() { return !Double.isNaN(x) && !Double.isNaN(y); }
    boolean isVertical() { return Double.isNaN(y); }
    boolean isHorizontal() { return Double.isNaN(x); }
}
