package org.ampturn.units;

/**
 * Argument checks for the library's surface and its kernels. Each failure is an
 * {@link IllegalArgumentException} whose message is one short line naming the parameter, the value
 * given and the valid range, with numbers in engineering notation ("length must be from 1.000 nm
 * to 10.00 km, got 1.000e200 m"), so a user at the console sees at once what to change. Every
 * check is written so that NaN fails.
 *
 * <p>Ranges that all models share live here: lengths from {@link #MIN_LENGTH} to {@link #MAX_LENGTH}
 * (beyond them squares and products of lengths leave the range of a {@code double} or mean
 * nothing for a coil), absolute temperatures from just above 0 K to {@link #MAX_KELVIN}. A model
 * with a narrower range checks it with {@link #inRange} and names it.
 */
public final class Require {
    private Require() {}

    /** Shortest length any model accepts (m): 1 nm. */
    public static final double MIN_LENGTH = 1e-9;
    /** Longest length any model accepts (m): 10 km. */
    public static final double MAX_LENGTH = 1e4;
    /** Highest absolute temperature any model accepts (K). */
    public static final double MAX_KELVIN = 10_000;
    /** Most turns any coil model accepts. */
    public static final int MAX_TURNS = 10_000_000;
    /** Longest message headline before any detail (characters), as the console shows it. */
    public static final int HEADLINE = 120;

    // ---- quantities -------------------------------------------------------------------------

    /** The SI value of {@code q}; fails unless it has dimension {@code d} and is finite. */
    public static double si(String name, Quantity q, Dimension d) {
        if (d == null) throw fail("the kind of quantity expected for " + name + " is missing (null)");
        if (q == null) throw fail(name + " is missing (null); give a " + d.name());
        if (!q.dimension().equals(d)) {
            throw fail(name + " must be a " + d.name() + ", got " + q + " (" + q.dimension().name() + ")");
        }
        if (!Double.isFinite(q.si())) throw fail(name + " must be a finite " + d.name() + ", got " + q);
        return q.si();
    }

    /** The SI value of {@code q}, which must be of dimension {@code d} and greater than zero. */
    public static double positive(String name, Quantity q, Dimension d) {
        double v = si(name, q, d);
        if (!(v > 0)) throw fail(name + " must be greater than zero, got " + q);
        return v;
    }

    /** The SI value of {@code q}, which must be of dimension {@code d} and zero or more. */
    public static double nonNegative(String name, Quantity q, Dimension d) {
        double v = si(name, q, d);
        if (!(v >= 0)) throw fail(name + " must be zero or more, got " + q);
        return v;
    }

    /** The SI value of {@code q}, of dimension {@code d}, within [lo, hi] (SI values). */
    public static double inRange(String name, Quantity q, Dimension d, double lo, double hi) {
        double v = si(name, q, d);
        if (!(v >= lo && v <= hi)) {
            throw fail(name + " must be from " + show(lo, d) + " to " + show(hi, d) + ", got " + q);
        }
        return v;
    }

    /** The SI value of {@code q}, of dimension {@code d}, greater than zero and at most {@code max} (SI). */
    public static double positive(String name, Quantity q, Dimension d, double max) {
        double v = positive(name, q, d);
        if (!(v <= max)) throw fail(name + " must be greater than zero and at most " + show(max, d) + ", got " + q);
        return v;
    }

    /** The SI value of {@code q}, of dimension {@code d}, zero or more and at most {@code max} (SI). */
    public static double nonNegative(String name, Quantity q, Dimension d, double max) {
        double v = nonNegative(name, q, d);
        if (!(v <= max)) throw fail(name + " must be from zero to " + show(max, d) + ", got " + q);
        return v;
    }

    /** A length (m) greater than zero, from {@link #MIN_LENGTH} to {@link #MAX_LENGTH}: a size, a gap, a diameter. */
    public static double length(String name, Quantity q) {
        return inRange(name, q, Dimension.LENGTH, MIN_LENGTH, MAX_LENGTH);
    }

    /** A length (m) of zero, or from {@link #MIN_LENGTH} to {@link #MAX_LENGTH}: a gap that may be closed. */
    public static double lengthOrZero(String name, Quantity q) {
        double v = si(name, q, Dimension.LENGTH);
        if (v == 0) return 0;
        if (!(v >= MIN_LENGTH && v <= MAX_LENGTH)) {
            throw fail(name + " must be zero or from " + show(MIN_LENGTH, Dimension.LENGTH) + " to " + show(MAX_LENGTH, Dimension.LENGTH)
                    + ", got " + q);
        }
        return v;
    }

    /** A whole number of turns from 1 to {@link #MAX_TURNS}. */
    public static int turns(String name, int n) {
        if (n < 1 || n > MAX_TURNS) throw fail(name + " must be a whole number from 1 to " + MAX_TURNS + ", got " + n);
        return n;
    }

    /** A signed distance or position (m) of at most {@link #MAX_LENGTH} either way. */
    public static double distance(String name, Quantity q) {
        return inRange(name, q, Dimension.LENGTH, -MAX_LENGTH, MAX_LENGTH);
    }

    /**
     * An absolute temperature in kelvin, above absolute zero and at most {@link #MAX_KELVIN}. Accepts
     * {@code degC(..)} and kelvin values ({@code K(300)}).
     */
    public static double absoluteTemperature(String name, Quantity q) {
        double k = si(name, q, Dimension.TEMPERATURE);
        if (!(k > 0 && k <= MAX_KELVIN)) {
            throw fail(name + " must be above absolute zero (−273.15 °C) and at most " + Quantity.temperatureKelvin(MAX_KELVIN)
                    + ", got " + q);
        }
        return k;
    }

    /**
     * An absolute temperature in kelvin within a model's range [loK, hiK]; {@code model} says whose
     * range it is ("the linear resistance law").
     */
    public static double absoluteTemperature(String name, Quantity q, double loK, double hiK, String model) {
        double k = absoluteTemperature(name, q);
        if (!(k >= loK && k <= hiK)) {
            throw fail(name + " must be from " + Quantity.temperatureKelvin(loK) + " to " + Quantity.temperatureKelvin(hiK)
                    + " for " + model + ", got " + q);
        }
        return k;
    }

    // ---- plain numbers ----------------------------------------------------------------------

    public static double positive(String name, double v) {
        if (!(v > 0) || Double.isInfinite(v)) throw fail(name + " must be a finite number greater than zero, got " + show(v));
        return v;
    }

    public static double nonNegative(String name, double v) {
        if (!(v >= 0) || Double.isInfinite(v)) throw fail(name + " must be a finite number, zero or more, got " + show(v));
        return v;
    }

    public static double finite(String name, double v) {
        if (!Double.isFinite(v)) throw fail(name + " must be a finite number, got " + show(v));
        return v;
    }

    /** {@code v} within [lo, hi]; the message gives the range. */
    public static double between(String name, double v, double lo, double hi) {
        if (!(v >= lo && v <= hi) || Double.isInfinite(v)) throw fail(name + " must be between " + show(lo) + " and " + show(hi) + ", got " + show(v));
        return v;
    }

    /** An SI value of dimension {@code d} (a kernel's argument) within [lo, hi]; the message shows units. */
    public static double between(String name, double v, Dimension d, double lo, double hi) {
        if (!(v >= lo && v <= hi) || Double.isInfinite(v)) throw fail(name + " must be from " + show(lo, d) + " to " + show(hi, d) + ", got " + show(v, d));
        return v;
    }

    public static int positive(String name, int n) {
        if (n <= 0) throw fail(name + " must be a whole number of at least 1, got " + n);
        return n;
    }

    /** A whole number within [lo, hi]. */
    public static int between(String name, int n, int lo, int hi) {
        if (n < lo || n > hi) throw fail(name + " must be a whole number from " + lo + " to " + hi + ", got " + n);
        return n;
    }

    /** {@code value}, which must not be null. */
    public static <T> T present(String name, T value) {
        if (value == null) throw fail(name + " is missing (null)");
        return value;
    }

    /**
     * A kernel's result, unless it is NaN or infinite: then the arguments were outside the range in
     * which the model gives a number, and the failure says so rather than passing NaN on.
     */
    public static double result(String what, double v) {
        if (!Double.isFinite(v)) {
            throw fail(what + " has no finite value here (" + show(v) + "): an argument is outside the model's range");
        }
        return v;
    }

    // ---- long computations ------------------------------------------------------------------

    /**
     * Fails with a {@link java.util.concurrent.CancellationException} when the current thread has been
     * interrupted: long library loops call this so that Ctrl-C stops them (on Java 21 and later the
     * shell only interrupts the entry's thread). {@code what} names the computation.
     */
    public static void notInterrupted(String what) {
        if (Thread.currentThread().isInterrupted()) {
            throw new java.util.concurrent.CancellationException(what + " stopped: the thread was interrupted");
        }
    }

    /**
     * Fails before a computation starts when {@code count} items of about {@code bytesEach} bytes would
     * not fit in the memory the JVM has left (with a margin); the message names the count, so
     * {@code sweep(..., Integer.MAX_VALUE, ...)} is refused by name instead of ending in an
     * OutOfMemoryError. {@code what} names the items ("sweep points").
     */
    public static void fitsInMemory(String what, long count, double bytesEach) {
        double need = count * bytesEach;
        long free = freeMemory();
        if (need > 0.7 * free) {
            System.gc(); // what looked used may be garbage: look again once before refusing
            free = freeMemory();
        }
        if (need > 0.7 * free) {
            throw fail(count + " " + what + " need about " + bytes(need) + " of memory, more than the " + bytes(free)
                    + " free; use fewer, or give the JVM more (-Xmx)");
        }
    }

    private static long freeMemory() {
        Runtime rt = Runtime.getRuntime();
        return rt.maxMemory() - (rt.totalMemory() - rt.freeMemory());
    }

    private static String bytes(double b) {
        if (b >= 1e9) return Quantity.fixed(b / 1e9, 3) + " GB";
        if (b >= 1e6) return Quantity.fixed(b / 1e6, 3) + " MB";
        return Quantity.fixed(b / 1e3, 3) + " kB";
    }

    // ---- messages ---------------------------------------------------------------------------

    /** Longest name of a parameter, output or column (characters). */
    public static final int MAX_NAME = 60;

    /** A name for a parameter, an output or a column: not blank, at most {@link #MAX_NAME} characters, on one line. */
    public static String name(String role, String name) {
        if (name == null || name.isBlank()) throw fail(role + " needs a name, got " + (name == null ? "null" : quote(name)));
        if (name.length() > MAX_NAME || name.chars().anyMatch(Character::isISOControl)) {
            throw fail(role + " must be named in at most " + MAX_NAME + " characters on one line, got " + quote(name));
        }
        return name;
    }

    /** Text a user gave, for a message: in quotes, on one line, cut to 40 characters. */
    public static String quote(String text) {
        return Quantity.quote(text);
    }

    /** Names for a message: the first eight, then how many in all. */
    public static String names(java.util.Collection<?> names) {
        if (names == null) return "[]";
        if (names.size() <= 8) return names.toString();
        StringBuilder sb = new StringBuilder("[");
        int k = 0;
        for (Object n : names) {
            if (k++ == 8) break;
            sb.append(n).append(", ");
        }
        return sb.append("… (").append(names.size()).append(" in all)]").toString();
    }

    /** A value for a message: engineering notation with its unit, never a zero for a value that is not zero. */
    public static String show(double si, Dimension d) {
        return Quantity.of(si, d).toString();
    }

    /** A pure number for a message: 4 significant digits, a power of ten outside 0.001 to 10⁶. */
    public static String show(double v) {
        if (v == Math.rint(v) && Math.abs(v) < 1e15) return Long.toString((long) v);
        return Quantity.plain(v, 4);
    }

    /**
     * The library's error for a bad argument: the text as one line, its headline (up to the first
     * ": " or "; ") shortened to {@link #HEADLINE} characters when a name or a value is very long.
     */
    public static IllegalArgumentException fail(String message) {
        return new IllegalArgumentException(oneLine(message));
    }

    /** As {@link #fail(String)}, with the failure that led to it. */
    public static IllegalArgumentException fail(String message, Throwable cause) {
        return new IllegalArgumentException(oneLine(message), cause);
    }

    /** {@code message} on one line, each part cut to {@link #HEADLINE} characters. */
    public static String oneLine(String message) {
        String m = message == null ? "" : message.replace('\n', ' ').replace('\r', ' ');
        if (m.length() <= HEADLINE) return m;
        int cut = headlineEnd(m);
        if (cut <= HEADLINE) return m.length() <= 4 * HEADLINE ? m : m.substring(0, 4 * HEADLINE - 1) + "…";
        return m.substring(0, HEADLINE - 1) + "…";
    }

    private static int headlineEnd(String m) {
        int a = m.indexOf(": "), b = m.indexOf("; ");
        if (a < 0) return b < 0 ? m.length() : b;
        return b < 0 ? a : Math.min(a, b);
    }
}
