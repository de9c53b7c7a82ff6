package org.ampturn.study;

import java.util.Arrays;
import java.util.List;
import java.util.Map;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;

/**
 * The parameter values at one point of an optimisation or a tolerance run, by name:
 * {@code p.get("gap")} as a quantity, {@code p.integer("turns")}, {@code p.choice("wire")}.
 */
public final class Point {
    private final List<String> names;
    private final Map<String, Integer> index;
    private final Object[] values;

    Point(List<String> names, Map<String, Integer> index, Object[] values) {
        this.names = names;
        this.index = index;
        this.values = values;
    }

    /** The value as given: an Integer, a Double, a Quantity, or a chosen object. */
    public Object value(String name) {
        Integer k = index.get(name);
        if (k == null) throw Require.fail("no parameter named " + Require.quote(name) + "; the parameters are " + Require.names(names));
        return values[k];
    }

    /** The value as a quantity (a number becomes a pure number). */
    public Quantity get(String name) {
        Object v = value(name);
        if (v instanceof Quantity) return (Quantity) v;
        if (v instanceof Number) return Quantity.number(((Number) v).doubleValue());
        throw Require.fail("parameter " + name + " is " + v + ", not a quantity; read it with choice(\"" + name + "\")");
    }

    /** The SI value of a numeric parameter. */
    public double si(String name) {
        return get(name).si();
    }

    /** A whole-number parameter (turns, layers). */
    public int integer(String name) {
        Object v = value(name);
        if (v instanceof Integer) return (Integer) v;
        if (v instanceof Number) {
            double d = ((Number) v).doubleValue();
            if (d == Math.rint(d) && Math.abs(d) < Integer.MAX_VALUE) return (int) d;
        }
        throw Require.fail("parameter " + name + " is " + v + ", not a whole number");
    }

    /** A parameter chosen from a list (a wire, a material), as its own type. */
    @SuppressWarnings("unchecked")
    public <T> T choice(String name) {
        return (T) value(name);
    }

    /** The parameter names in order. */
    public List<String> names() {
        return names;
    }

    Object[] values() {
        return values;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Point && names.equals(((Point) o).names) && Arrays.equals(values, ((Point) o).values);
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(values);
    }

    @Override
    public String toString() {
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < values.length; i++) {
            if (i > 0) sb.append(", ");
            Object v = values[i];
            sb.append(names.get(i)).append(" = ").append(v instanceof Double ? Column.number((Double) v, Quantity.displayDigits()) : v);
        }
        return sb.toString();
    }
}
