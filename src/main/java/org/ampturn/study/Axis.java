package org.ampturn.study;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;

/**
 * One swept parameter: a name and the values it takes, in order. Values are numbers (whole numbers
 * stay {@code Integer}), quantities, or any objects (wire sizes, materials), shown in a table by
 * their description.
 *
 * <p>Linear steps: x_k = from + k (to − from)/(count − 1); logarithmic steps: x_k = from (to/from)^(k/(count − 1)).
 */
public final class Axis<T> {
    private final String name;
    private final List<T> values;

    private Axis(String name, List<T> values) {
        this.name = name;
        this.values = values;
    }

    /**
     * {@code count} evenly spaced numbers from {@code from} to {@code to}. When both ends are whole
     * numbers ({@code Integer}, {@code Long}) the values are rounded to whole numbers of that type:
     * {@code Axis.linear("turns", 100, 1000, 10)} gives 100, 200, … 1000. Ends of two different
     * types give {@code Double} values.
     */
    public static <N extends Number> Axis<N> linear(String name, N from, N to, int count) {
        return numbers(name, from, to, count, false);
    }

    /** {@code count} numbers evenly spaced on a log scale from {@code from} to {@code to} (both > 0). */
    public static <N extends Number> Axis<N> log(String name, N from, N to, int count) {
        return numbers(name, from, to, count, true);
    }

    /** {@code count} evenly spaced quantities from {@code from} to {@code to}, of one dimension. */
    public static Axis<Quantity> linear(String name, Quantity from, Quantity to, int count) {
        return quantities(name, from, to, count, false);
    }

    /** {@code count} quantities evenly spaced on a log scale from {@code from} to {@code to} (both > 0). */
    public static Axis<Quantity> log(String name, Quantity from, Quantity to, int count) {
        return quantities(name, from, to, count, true);
    }

    /** The values of a list, in order: {@code Axis.of("wire", List.of(Wire.awg(24), Wire.awg(26)))}. */
    public static <T> Axis<T> of(String name, List<T> values) {
        checkName(name);
        if (values == null || values.isEmpty()) throw Require.fail("the list of values for " + name + " is empty");
        List<T> copy = new ArrayList<>(values.size());
        for (int i = 0; i < values.size(); i++) {
            T v = values.get(i);
            if (v == null) throw Require.fail("value " + (i + 1) + " of " + name + " is missing (null)");
            copy.add(v);
        }
        checkSameDimension(name, copy);
        checkSize("points of the sweep of " + name, copy.size(), BYTES_PER_POINT);
        return new Axis<>(name, Collections.unmodifiableList(copy));
    }

    /** The values given: {@code Axis.of("gap", mm(0.1), mm(0.2), mm(0.5))}. */
    @SafeVarargs
    public static <T> Axis<T> of(String name, T... values) {
        Require.present("values", values);
        return of(name, values == null ? List.of() : java.util.Arrays.asList(values));
    }

    public String name() {
        return name;
    }

    public List<T> values() {
        return values;
    }

    public int size() {
        return values.size();
    }

    @Override
    public String toString() {
        if (values.size() == 1) return name + ": " + values.get(0);
        return name + ": " + values.size() + " values from " + values.get(0) + " to " + values.get(values.size() - 1);
    }

    static void checkName(String name) {
        Require.name("a swept parameter", name);
    }

    /** Most points a sweep or a Monte Carlo run takes. */
    public static final int MAX_POINTS = 100_000_000;
    /** Memory a point of a general study takes with its parameters and results (bytes, measured roughly). */
    static final int BYTES_PER_POINT = 400;
    /** Memory a Monte Carlo run takes besides its drawn parameters (bytes): a few numeric outputs and the error slot. */
    static final int BYTES_PER_RUN = 36;
    /** Memory a point of the fast double path takes (bytes): parameter, result, error slot. */
    static final int BYTES_PER_DOUBLE_POINT = 32;

    static void checkCount(String name, int count, double from, double to) {
        checkCount(name, count, from, to, BYTES_PER_POINT);
    }

    /** The count of points is from 1 to {@link #MAX_POINTS} and its tables fit in the memory left. */
    static void checkCount(String name, int count, double from, double to, int bytesEach) {
        if (count < 1) throw Require.fail("count of " + name + " (" + count + ") must be at least 1");
        checkSize("points of the sweep of " + name, count, bytesEach);
        if (count == 1 && from != to) {
            throw Require.fail("count 1 cannot span " + name + " from " + from + " to " + to
                    + "; give a count of 2 or more, or the same value at both ends");
        }
    }

    /** {@code count} items of a study are at most {@link #MAX_POINTS} and fit in the memory left. */
    static void checkSize(String what, long count, int bytesEach) {
        if (count > MAX_POINTS) {
            throw Require.fail(count + " " + what + " are more than the " + MAX_POINTS + " a study takes; use fewer");
        }
        Require.fitsInMemory(what, count, bytesEach);
    }

    /** The k-th of {@code count} steps; exact at both ends. */
    static double step(double from, double to, int k, int count, boolean log) {
        if (count == 1 || k == 0) return from;
        if (k == count - 1) return to;
        double t = (double) k / (count - 1);
        return log ? from * Math.pow(to / from, t) : from + (to - from) * t;
    }

    static void checkEnds(String name, double from, double to, boolean log, String fromText, String toText) {
        if (!Double.isFinite(from)) throw Require.fail("start of " + name + " must be a finite number, got " + fromText);
        if (!Double.isFinite(to)) throw Require.fail("end of " + name + " must be a finite number, got " + toText);
        if (log && !(from > 0 && to > 0)) {
            throw Require.fail("log steps of " + name + " need both ends greater than zero, got " + fromText + " to " + toText);
        }
    }

    @SuppressWarnings("unchecked")
    private static <N extends Number> Axis<N> numbers(String name, N from, N to, int count, boolean log) {
        checkName(name);
        if (from == null || to == null) throw Require.fail("the range of " + name + " is missing an end (null)");
        double a = from.doubleValue();
        double b = to.doubleValue();
        checkEnds(name, a, b, log, String.valueOf(from), String.valueOf(to));
        checkCount(name, count, a, b);
        Class<?> kind = from.getClass() == to.getClass() ? from.getClass() : Double.class;
        boolean whole = kind == Integer.class || kind == Long.class || kind == Short.class || kind == Byte.class;
        List<Number> vs = new ArrayList<>(count);
        if (whole) {
            long span = Math.abs(to.longValue() - from.longValue()) + 1;
            if (count > span) {
                throw Require.fail("count of " + name + " (" + count + ") is more than the " + span
                        + " whole numbers from " + from + " to " + to);
            }
            long last = Long.MIN_VALUE;
            for (int k = 0; k < count; k++) {
                long v = Math.round(step(a, b, k, count, log));
                if (k > 0 && v == last) {
                    throw Require.fail(count + " log steps of " + name + " from " + from + " to " + to
                            + " repeat whole numbers (" + v + " twice); give a smaller count");
                }
                vs.add(kind == Integer.class ? (Number) (int) v : kind == Long.class ? (Number) v
                        : kind == Short.class ? (Number) (short) v : (Number) (byte) v);
                last = v;
            }
        } else if (kind == Float.class) {
            for (int k = 0; k < count; k++) vs.add((float) step(a, b, k, count, log));
        } else {
            for (int k = 0; k < count; k++) vs.add(step(a, b, k, count, log));
        }
        return (Axis<N>) new Axis<>(name, Collections.unmodifiableList(vs));
    }

    private static Axis<Quantity> quantities(String name, Quantity from, Quantity to, int count, boolean log) {
        checkName(name);
        if (from == null || to == null) throw Require.fail("the range of " + name + " is missing an end (null)");
        if (!from.dimension().equals(to.dimension())) {
            throw Require.fail("the ends of " + name + " must be of one kind, got " + from + " (" + from.dimension().name()
                    + ") and " + to + " (" + to.dimension().name() + ")");
        }
        checkEnds(name, from.si(), to.si(), log, from.toString(), to.toString());
        checkCount(name, count, from.si(), to.si());
        List<Quantity> vs = new ArrayList<>(count);
        Dimension d = from.dimension();
        boolean absolute = from.isAbsoluteTemperature();
        for (int k = 0; k < count; k++) {
            double v = step(from.si(), to.si(), k, count, log);
            vs.add(absolute ? Quantity.temperatureKelvin(v) : Quantity.of(v, d));
        }
        return new Axis<>(name, Collections.unmodifiableList(vs));
    }

    private static void checkSameDimension(String name, List<?> values) {
        Dimension d = null;
        for (Object v : values) {
            if (!(v instanceof Quantity)) return;
            Dimension e = ((Quantity) v).dimension();
            if (d == null) d = e;
            else if (!d.equals(e)) {
                throw Require.fail("the values of " + name + " must be of one kind, got " + values.get(0) + " ("
                        + d.name() + ") and " + v + " (" + e.name() + ")");
            }
        }
    }
}
