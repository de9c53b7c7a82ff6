package org.ampturn.chart;

import java.util.Arrays;

/**
 * One curve: a name for the legend and paired x and y values in SI. The arrays are copied in;
 * NaN marks a gap (a failed sweep row, for instance) and is not drawn.
 */
public final class Trace {
    private final String name;
    private final double[] x;
    private final double[] y;

    private Trace(String name, double[] x, double[] y) {
        this.name = name;
        this.x = x;
        this.y = y;
    }

    /** A curve from SI arrays of equal length (copied). */
    public static Trace of(String name, double[] x, double[] y) {
        if (name == null) throw new IllegalArgumentException("trace name is missing (null)");
        if (x == null || y == null) throw new IllegalArgumentException("trace \"" + name + "\" needs x and y values, got null");
        if (x.length != y.length) {
            throw new IllegalArgumentException("trace \"" + name + "\" has " + x.length + " x values but " + y.length
                    + " y values; they must pair up");
        }
        if (x.length == 0) throw new IllegalArgumentException("trace \"" + name + "\" has no points");
        return new Trace(name, x.clone(), y.clone());
    }

    /** Shares the arrays without copying; for adapters that already hold private copies. */
    static Trace wrap(String name, double[] x, double[] y) {
        if (x.length != y.length) throw new IllegalArgumentException("trace \"" + name + "\": " + x.length + " x values, " + y.length + " y values");
        return new Trace(name, x, y);
    }

    public String name() { return name; }
    public int size() { return x.length; }
    public double[] x() { return x.clone(); }
    public double[] y() { return y.clone(); }

    double[] xs() { return x; }
    double[] ys() { return y; }

    /** Largest |y| over the finite values, 0 when there are none. */
    double maxAbsY() { return maxAbs(y); }
    double maxAbsX() { return maxAbs(x); }

    static double maxAbs(double[] v) {
        double m = 0;
        for (double d : v) if (Double.isFinite(d) && Math.abs(d) > m) m = Math.abs(d);
        return m;
    }

    @Override
    public String toString() {
        return "trace " + name + ", " + x.length + " points";
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Trace t && t.name.equals(name) && Arrays.equals(t.x, x) && Arrays.equals(t.y, y);
    }

    @Override
    public int hashCode() {
        return name.hashCode() * 31 + Arrays.hashCode(y);
    }
}
