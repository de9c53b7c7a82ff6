package org.ampturn.chart;

import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;

/**
 * The one-line terminal preview of a figure: a sparkline of its main curve in block characters
 * (▁ to █, eight levels between the curve's minimum and maximum), then the range in words.
 */
public final class Preview {
    private Preview() {}

    private static final String LEVELS = "▁▂▃▄▅▆▇█";
    /** Characters in a sparkline. */
    public static final int WIDTH = 32;

    /**
     * The sparkline of y over x: the x range is cut into {@code width} equal slices and each slice
     * shows the mean of its points (an empty slice repeats the one before). NaN points are skipped.
     */
    public static String sparkline(double[] x, double[] y, int width) {
        if (x.length != y.length) throw new IllegalArgumentException("sparkline needs as many x as y values, got " + x.length + " and " + y.length);
        if (width < 1) throw new IllegalArgumentException("sparkline width must be at least 1, got " + width);
        double xLo = Double.POSITIVE_INFINITY, xHi = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < x.length; i++) {
            if (Double.isFinite(x[i]) && Double.isFinite(y[i])) {
                xLo = Math.min(xLo, x[i]);
                xHi = Math.max(xHi, x[i]);
            }
        }
        if (!(xLo <= xHi)) return " ".repeat(width);
        double[] sum = new double[width];
        int[] n = new int[width];
        double span = xHi - xLo;
        for (int i = 0; i < x.length; i++) {
            if (!Double.isFinite(x[i]) || !Double.isFinite(y[i])) continue;
            int k = span == 0 ? 0 : (int) ((x[i] - xLo) / span * width);
            k = Math.min(width - 1, Math.max(0, k));
            sum[k] += y[i];
            n[k]++;
        }
        double[] mean = new double[width];
        double lo = Double.POSITIVE_INFINITY, hi = Double.NEGATIVE_INFINITY;
        double last = Double.NaN;
        for (int k = 0; k < width; k++) {
            mean[k] = n[k] > 0 ? sum[k] / n[k] : last;
            last = mean[k];
            if (!Double.isNaN(mean[k])) {
                lo = Math.min(lo, mean[k]);
                hi = Math.max(hi, mean[k]);
            }
        }
        StringBuilder sb = new StringBuilder(width);
        for (int k = 0; k < width; k++) {
            if (Double.isNaN(mean[k])) {
                sb.append(' ');
            } else if (hi == lo) {
                sb.append(LEVELS.charAt(3));
            } else {
                int level = (int) Math.round((mean[k] - lo) / (hi - lo) * (LEVELS.length() - 1));
                sb.append(LEVELS.charAt(level));
            }
        }
        return sb.toString();
    }

    /** The preview line of a figure. */
    public static String of(FigureData d) {
        if (d instanceof FigureData.Lines l) {
            Panel p = l.panels().get(0);
            Trace t = p.traces().get(0);
            double[] r = range(t.ys());
            double[] xr = range(t.xs());
            String over = l.xLabels().isEmpty()
                    ? q(xr[0], l.xDimension()) + " … " + q(xr[1], l.xDimension())
                    : l.xLabels().get(0) + " … " + l.xLabels().get(l.xLabels().size() - 1);
            return t.name() + " " + sparkline(t.xs(), t.ys(), WIDTH) + "  " + q(r[0], p.dimension()) + " … " + q(r[1], p.dimension())
                    + " over " + l.xQuantity() + " " + over;
        }
        if (d instanceof FigureData.Histogram h) {
            Bins b = Bins.of(h.raw(), h.lower(), h.upper());
            double[] x = new double[b.counts().length];
            double[] y = new double[x.length];
            for (int i = 0; i < x.length; i++) {
                x[i] = i;
                y[i] = b.counts()[i];
            }
            double[] r = range(h.raw());
            return h.quantity() + " " + sparkline(x, y, Math.min(WIDTH, x.length)) + "  " + q(r[0], h.dimension()) + " … "
                    + q(r[1], h.dimension()) + ", " + b.summary();
        }
        FigureData.HeatMap m = (FigureData.HeatMap) d;
        double[] r = range(m.zs());
        return m.zQuantity() + " over " + m.xQuantity() + " and " + m.yQuantity() + ": " + q(r[0], m.zDimension()) + " … "
                + q(r[1], m.zDimension()) + " in " + m.zs().length + " cells";
    }

    private static String q(double si, Dimension d) {
        return Quantity.of(si, d).toString();
    }

    private static double[] range(double[] v) {
        double lo = Double.POSITIVE_INFINITY, hi = Double.NEGATIVE_INFINITY;
        for (double d : v) if (Double.isFinite(d)) { lo = Math.min(lo, d); hi = Math.max(hi, d); }
        if (lo > hi) return new double[] {Double.NaN, Double.NaN};
        return new double[] {lo, hi};
    }
}
