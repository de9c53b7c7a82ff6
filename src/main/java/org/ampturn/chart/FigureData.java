package org.ampturn.chart;

import java.util.List;
import org.ampturn.units.Dimension;

/**
 * What a figure shows, in SI, independent of how it is drawn: stacked line panels sharing an x
 * axis, a histogram with limits, or a heat map over two parameters.
 */
public sealed interface FigureData {
    /** The title drawn above the figure (may be empty). */
    String title();

    /** The kind of figure in one word, used for default names: "lines", "histogram", "map". */
    String kind();

    /**
     * Line panels stacked one above the other, sharing the x axis.
     *
     * @param marks   vertical marks with no trace go through every panel; the others go to the panel
     *                holding their trace (or quantity), else the first
     * @param xLabels tick labels for x = 0, 1, 2 … when x is a list of named choices (wire sizes);
     *                empty for a numeric x
     */
    record Lines(String title, String xQuantity, Dimension xDimension, List<Panel> panels, List<Mark> marks, List<String> xLabels)
            implements FigureData {
        public Lines {
            if (title == null) title = "";
            if (xQuantity == null || xDimension == null) throw new IllegalArgumentException("the x axis needs a quantity word and a dimension");
            if (panels == null || panels.isEmpty()) throw new IllegalArgumentException("a line figure needs at least one panel");
            panels = List.copyOf(panels);
            marks = marks == null ? List.of() : List.copyOf(marks);
            xLabels = xLabels == null ? List.of() : List.copyOf(xLabels);
        }

        /** Panels over a numeric x axis. */
        public Lines(String title, String xQuantity, Dimension xDimension, List<Panel> panels, List<Mark> marks) {
            this(title, xQuantity, xDimension, panels, marks, List.of());
        }

        @Override public String kind() { return "lines"; }

        public Lines withMarks(List<Mark> more) {
            java.util.ArrayList<Mark> all = new java.util.ArrayList<>(marks);
            all.addAll(more);
            return new Lines(title, xQuantity, xDimension, panels, all, xLabels);
        }
    }

    /**
     * A histogram of outcomes (a tolerance run), with the lower and upper limits drawn; a limit
     * that does not apply is NaN. NaN values (failed runs) are counted apart, not binned.
     */
    record Histogram(String title, String quantity, Dimension dimension, double[] values, double lower, double upper)
            implements FigureData {
        public Histogram {
            if (title == null) title = "";
            if (quantity == null || dimension == null) throw new IllegalArgumentException("a histogram needs a quantity word and a dimension");
            if (values == null || values.length == 0) throw new IllegalArgumentException("histogram of " + quantity + " has no values");
            values = values.clone();
            if (!Double.isNaN(lower) && !Double.isNaN(upper) && !(lower < upper)) {
                throw new IllegalArgumentException("histogram of " + quantity + ": lower limit (" + lower + ") must be below the upper limit (" + upper + ")");
            }
        }

        @Override public String kind() { return "histogram"; }

        @Override public double[] values() { return values.clone(); }

        double[] raw() { return values; }
    }

    /**
     * A heat map of z over a two-parameter grid, one cell per (x, y) row; NaN z cells are left blank.
     * Overlays are lines in the same x and y (NaN breaks a line) drawn over the map: the first as
     * outlines, the others as contour lines (a flux plot: region outlines, then flux lines).
     */
    record HeatMap(String title, String xQuantity, Dimension xDimension, double[] x,
                   String yQuantity, Dimension yDimension, double[] y,
                   String zQuantity, Dimension zDimension, double[] z, List<Trace> overlays) implements FigureData {
        /** A map with no overlays. */
        public HeatMap(String title, String xQuantity, Dimension xDimension, double[] x, String yQuantity, Dimension yDimension, double[] y,
                       String zQuantity, Dimension zDimension, double[] z) {
            this(title, xQuantity, xDimension, x, yQuantity, yDimension, y, zQuantity, zDimension, z, List.of());
        }

        public HeatMap {
            overlays = overlays == null ? List.of() : List.copyOf(overlays);
            if (title == null) title = "";
            if (x == null || y == null || z == null) throw new IllegalArgumentException("a heat map needs x, y and z values");
            if (x.length != y.length || y.length != z.length) {
                throw new IllegalArgumentException("a heat map needs as many x, y and z values, got " + x.length + ", " + y.length + ", " + z.length);
            }
            if (x.length == 0) throw new IllegalArgumentException("heat map of " + zQuantity + " has no cells");
            x = x.clone();
            y = y.clone();
            z = z.clone();
        }

        @Override public String kind() { return "map"; }
        @Override public double[] x() { return x.clone(); }
        @Override public double[] y() { return y.clone(); }
        @Override public double[] z() { return z.clone(); }
        double[] xs() { return x; }
        double[] ys() { return y; }
        double[] zs() { return z; }
    }
}
