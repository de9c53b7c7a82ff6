package org.ampturn.study;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;

/**
 * Several named results of one evaluation, in order: {@code Outputs.of("L", l, "R", r)}. Each value
 * is a {@link Quantity}, a number, or any other object (shown by its description). A study turns
 * each name into a column.
 */
public final class Outputs {
    private final LinkedHashMap<String, Object> values;

    private Outputs(LinkedHashMap<String, Object> values) {
        this.values = values;
    }

    /** Names and values in turn: {@code Outputs.of("L", mH(2), "R", ohm(4.5), "turns", 400)}. */
    public static Outputs of(Object... namesAndValues) {
        Require.present("namesAndValues", namesAndValues);
        if (namesAndValues.length == 0 || namesAndValues.length % 2 != 0) {
            throw Require.fail("Outputs.of takes names and values in pairs, e.g. Outputs.of(\"L\", l, \"R\", r); got "
                    + namesAndValues.length + " arguments");
        }
        LinkedHashMap<String, Object> m = new LinkedHashMap<>();
        for (int i = 0; i < namesAndValues.length; i += 2) {
            Object name = namesAndValues[i];
            if (!(name instanceof String) || ((String) name).isBlank()) {
                throw Require.fail("argument " + (i + 1) + " of Outputs.of must be a name (text), got " + name);
            }
            put(m, (String) name, namesAndValues[i + 1]);
        }
        return new Outputs(m);
    }

    /** The entries of a map, in its iteration order. */
    public static Outputs of(Map<String, ?> map) {
        if (map == null || map.isEmpty()) throw Require.fail("the map of outputs is empty");
        LinkedHashMap<String, Object> m = new LinkedHashMap<>();
        map.forEach((k, v) -> put(m, k, v));
        return new Outputs(m);
    }

    private static void put(LinkedHashMap<String, Object> m, String name, Object v) {
        if (v == null) throw Require.fail("output " + name + " is missing (null)");
        if (m.put(name, v) != null) throw Require.fail("output " + name + " is given twice");
    }

    /** A copy with one more output. */
    public Outputs with(String name, Object value) {
        LinkedHashMap<String, Object> m = new LinkedHashMap<>(values);
        put(m, name, value);
        return new Outputs(m);
    }

    /** The names in order. */
    public List<String> names() {
        return Collections.unmodifiableList(new ArrayList<>(values.keySet()));
    }

    /** The value of an output as given (a Quantity, a Number or another object). */
    public Object value(String name) {
        Object v = values.get(name);
        if (v == null) throw Require.fail("no output named " + Require.quote(name) + "; the outputs are " + Require.names(values.keySet()));
        return v;
    }

    /** The output as a quantity; numbers become pure numbers. */
    public Quantity quantity(String name) {
        Object v = value(name);
        if (v instanceof Quantity) return (Quantity) v;
        if (v instanceof Number) return Quantity.number(((Number) v).doubleValue());
        throw Require.fail("output " + name + " is not a quantity: " + v);
    }

    Map<String, Object> map() {
        return values;
    }

    /**
     * The named values of whatever a study function returned: Outputs, a Map, or a single value,
     * which is named {@code defaultName}.
     */
    static Map<String, Object> from(Object result, String defaultName) {
        if (result == null) throw new IllegalStateException("the function returned nothing (null)");
        Map<String, Object> m;
        if (result instanceof Outputs) {
            m = ((Outputs) result).values;
        } else if (result instanceof Map) {
            m = new LinkedHashMap<>();
            for (Map.Entry<?, ?> e : ((Map<?, ?>) result).entrySet()) {
                if (e.getValue() == null) throw new IllegalStateException("output " + e.getKey() + " is missing (null)");
                m.put(String.valueOf(e.getKey()), e.getValue());
            }
        } else {
            m = Map.of(defaultName, result);
        }
        // a NaN or an infinity is the row's error, not a value in the table
        m.forEach((name, v) -> {
            if (!isFinite(v)) throw new IllegalStateException("output " + Require.quote(name) + " is " + v + ", not a finite number");
        });
        return m;
    }

    /** True when a function's result is one value rather than several named ones. */
    static boolean isSingle(Object result) {
        return result != null && !(result instanceof Outputs) && !(result instanceof Map);
    }

    /** A single result checked as {@link #from} checks it (a NaN or an infinity is the row's error). */
    static Object single(Object result, String name) {
        if (!isFinite(result)) throw new IllegalStateException("output " + Require.quote(name) + " is " + result + ", not a finite number");
        return result;
    }

    private static boolean isFinite(Object v) {
        if (v instanceof Quantity) return Double.isFinite(((Quantity) v).si());
        if (v instanceof Double || v instanceof Float) return Double.isFinite(((Number) v).doubleValue());
        return true;
    }

    @Override
    public String toString() {
        StringBuilder sb = new StringBuilder();
        values.forEach((k, v) -> sb.append(sb.length() == 0 ? "" : ", ").append(k).append(" = ").append(v));
        return sb.toString();
    }
}
