package org.ampturn.study;

import org.ampturn.units.Require;
import java.util.List;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;

/**
 * A parameter an optimisation may change: a real number or quantity between bounds, a whole number
 * between bounds (turns), or a choice from a list (wire sizes, materials).
 */
public final class Param {
    enum Kind { REAL, INTEGER, CHOICE }

    final String name;
    final Kind kind;
    final double lo;
    final double hi;
    final Dimension dimension; // null: a plain Double
    final boolean absolute;
    final List<?> options;

    private Param(String name, Kind kind, double lo, double hi, Dimension dimension, boolean absolute, List<?> options) {
        Axis.checkName(name);
        this.name = name;
        this.kind = kind;
        this.lo = lo;
        this.hi = hi;
        this.dimension = dimension;
        this.absolute = absolute;
        this.options = options;
    }

    /** A real number between {@code lo} and {@code hi}. */
    public static Param real(String name, double lo, double hi) {
        checkBounds(name, lo, hi, String.valueOf(lo), String.valueOf(hi));
        return new Param(name, Kind.REAL, lo, hi, null, false, null);
    }

    /** A quantity between {@code lo} and {@code hi}: {@code Param.real("gap", mm(0.1), mm(1))}. */
    public static Param real(String name, Quantity lo, Quantity hi) {
        if (lo == null || hi == null) throw Require.fail("the bounds of " + name + " are missing an end (null)");
        if (!lo.dimension().equals(hi.dimension())) {
            throw Require.fail("the bounds of " + name + " must be of one kind, got " + lo + " (" + lo.dimension().name()
                    + ") and " + hi + " (" + hi.dimension().name() + ")");
        }
        checkBounds(name, lo.si(), hi.si(), lo.toString(), hi.toString());
        return new Param(name, Kind.REAL, lo.si(), hi.si(), lo.dimension(), lo.isAbsoluteTemperature(), null);
    }

    /** A whole number from {@code lo} to {@code hi}, both included: {@code Param.integer("turns", 50, 2000)}. */
    public static Param integer(String name, int lo, int hi) {
        if (lo > hi) throw Require.fail("the range of " + name + " is empty: " + lo + " to " + hi + " (the first must not exceed the second)");
        return new Param(name, Kind.INTEGER, lo, hi, null, false, null);
    }

    /** One of the options of a list, tried in turn: {@code Param.choice("wire", List.of(Wire.awg(24), Wire.awg(26)))}. */
    public static Param choice(String name, List<?> options) {
        if (options == null || options.isEmpty()) throw Require.fail("the list of options for " + name + " is empty");
        for (int i = 0; i < options.size(); i++) {
            if (options.get(i) == null) throw Require.fail("option " + (i + 1) + " of " + name + " is missing (null)");
        }
        return new Param(name, Kind.CHOICE, 0, options.size() - 1, null, false, List.copyOf(options));
    }

    private static void checkBounds(String name, double lo, double hi, String loText, String hiText) {
        if (!Double.isFinite(lo) || !Double.isFinite(hi)) throw Require.fail("the bounds of " + name + " must be finite, got " + loText + " to " + hiText);
        if (!(lo < hi)) throw Require.fail("the range of " + name + " is empty: " + loText + " to " + hiText + " (the lower bound must be below the upper)");
    }

    public String name() {
        return name;
    }

    /** Number of values a whole-number or choice parameter can take. */
    long count() {
        return kind == Kind.REAL ? Long.MAX_VALUE : (long) hi - (long) lo + 1;
    }

    /** The value handed to the function for an SI value (REAL) or an index/whole number. */
    Object valueAt(double x) {
        switch (kind) {
            case REAL:
                if (dimension == null) return x;
                return absolute ? Quantity.temperatureKelvin(x) : Quantity.of(x, dimension);
            case INTEGER:
                return (int) x;
            default:
                return options.get((int) x);
        }
    }

    @Override
    public String toString() {
        switch (kind) {
            case REAL:
                return name + " from " + valueAt(lo) + " to " + valueAt(hi);
            case INTEGER:
                return name + " from " + (int) lo + " to " + (int) hi;
            default:
                return name + " one of " + options.size() + " options";
        }
    }
}
