package org.ampturn.units;

/**
 * Argument checks for the library's surface. Each failure names the parameter, the value given and
 * the valid range, so a user at the console sees at once what to change.
 */
public final class Require {
    private Require() {}

    /** The SI value of {@code q}; fails unless it has dimension {@code d} and is finite. */
    public static double si(String name, Quantity q, Dimension d) {
        if (q == null) throw new IllegalArgumentException(name + " is missing (null); give a " + d.name());
        if (!q.dimension().equals(d)) {
            throw new IllegalArgumentException(name + " must be a " + d.name() + ", got " + q + " (" + q.dimension().name() + ")");
        }
        if (!Double.isFinite(q.si())) throw new IllegalArgumentException(name + " must be a finite " + d.name() + ", got " + q);
        return q.si();
    }

    /** The SI value of {@code q}, which must be of dimension {@code d} and greater than zero. */
    public static double positive(String name, Quantity q, Dimension d) {
        double v = si(name, q, d);
        if (!(v > 0)) throw new IllegalArgumentException(name + " must be greater than zero, got " + q);
        return v;
    }

    /** The SI value of {@code q}, which must be of dimension {@code d} and zero or more. */
    public static double nonNegative(String name, Quantity q, Dimension d) {
        double v = si(name, q, d);
        if (!(v >= 0)) throw new IllegalArgumentException(name + " must be zero or more, got " + q);
        return v;
    }

    public static double positive(String name, double v) {
        if (!(v > 0) || Double.isInfinite(v)) throw new IllegalArgumentException(name + " must be a finite number greater than zero, got " + v);
        return v;
    }

    public static double nonNegative(String name, double v) {
        if (!(v >= 0) || Double.isInfinite(v)) throw new IllegalArgumentException(name + " must be a finite number, zero or more, got " + v);
        return v;
    }

    public static double finite(String name, double v) {
        if (!Double.isFinite(v)) throw new IllegalArgumentException(name + " must be a finite number, got " + v);
        return v;
    }

    public static int positive(String name, int n) {
        if (n <= 0) throw new IllegalArgumentException(name + " must be a whole number of at least 1, got " + n);
        return n;
    }

    /** {@code v} within [lo, hi]; the message gives the range. */
    public static double between(String name, double v, double lo, double hi) {
        if (!(v >= lo && v <= hi)) throw new IllegalArgumentException(name + " must be between " + lo + " and " + hi + ", got " + v);
        return v;
    }
}
