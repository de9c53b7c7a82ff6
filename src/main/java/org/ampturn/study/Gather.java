package org.ampturn.study;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;

/**
 * The outputs of a study gathered straight into primitive columns while it runs: a numeric output
 * takes one double per row, and no map or quantity is kept per row. A value that does not fit its
 * column's first kind (another dimension, a label, an integer among quantities) is kept as an
 * object for its row alone, and {@link #columns} then builds that column exactly as
 * {@link Sweep#columnOf} does from every row's object. Rows are written by any thread, each row by
 * one thread; the columns are read after the run has joined its workers.
 */
final class Gather {
    private final int n;
    private final List<String> parameterNames;
    private final ConcurrentHashMap<String, Slot> slots = new ConcurrentHashMap<>();

    Gather(int n, List<String> parameterNames) {
        this.n = n;
        this.parameterNames = parameterNames;
    }

    /** One output: its values where they fit the kind it was first seen with, and the odd values as objects. */
    private static final class Slot {
        final String name;
        final Dimension dimension; // null: values are kept as objects
        final boolean absolute;
        final boolean quantity;    // Quantity values, else Double values
        final double[] values;
        final int n;
        private Object[] odd;
        private volatile long first = Long.MAX_VALUE; // row × 2^16 + position in the row where the output first appears

        Slot(String name, Object v, int n) {
            this.name = name;
            this.n = n;
            if (v instanceof Quantity) {
                dimension = ((Quantity) v).dimension();
                absolute = ((Quantity) v).isAbsoluteTemperature();
                quantity = true;
            } else if (v instanceof Double) {
                dimension = Dimension.NONE;
                absolute = false;
                quantity = false;
            } else {
                dimension = null;
                absolute = false;
                quantity = false;
            }
            values = dimension == null ? null : new double[n];
            if (values != null) Arrays.fill(values, Double.NaN);
        }

        void put(int row, Object v) {
            if (values != null) {
                if (quantity && v instanceof Quantity) {
                    Quantity q = (Quantity) v;
                    if (q.isAbsoluteTemperature() == absolute && q.dimension().equals(dimension)) {
                        values[row] = q.si();
                        return;
                    }
                } else if (!quantity && v instanceof Double) {
                    values[row] = (Double) v;
                    return;
                }
            }
            odd()[row] = v;
        }

        synchronized Object[] odd() {
            if (odd == null) odd = new Object[n];
            return odd;
        }

        synchronized void seen(long at) {
            if (at < first) first = at;
        }

        long first() {
            return first;
        }

        synchronized boolean hasOdd() {
            return odd != null;
        }

        /** The value of a row as the function returned it (a quantity is its SI value, dimension and temperature flag alone). */
        Object object(int row) {
            Object o = odd == null ? null : odd[row];
            if (o != null || values == null) return o;
            double x = values[row];
            if (Double.isNaN(x)) return null;
            if (!quantity) return x;
            return absolute ? Quantity.temperatureKelvin(x) : Quantity.of(x, dimension);
        }
    }

    /** Records the outputs of a row (the map from {@link Outputs#from}). */
    void put(int row, Map<String, Object> outputs) {
        int pos = 0;
        for (Map.Entry<String, Object> e : outputs.entrySet()) {
            String name = e.getKey();
            Slot s = slots.get(name);
            if (s == null) s = create(name, e.getValue());
            long at = ((long) row << 16) | Math.min(pos, 0xFFFF);
            if (at < s.first) s.seen(at); // an unsynchronised hint; seen() decides under the lock
            s.put(row, e.getValue());
            pos++;
        }
    }

    /** Records the one output of a row. */
    void putOne(int row, String name, Object v) {
        Slot s = slots.get(name);
        if (s == null) s = create(name, v);
        long at = (long) row << 16;
        if (at < s.first) s.seen(at);
        s.put(row, v);
    }

    private synchronized Slot create(String name, Object v) {
        Slot s = slots.get(name);
        if (s != null) return s;
        s = new Slot(name, v, n);
        slots.put(name, s);
        return s;
    }

    /** The output columns in the order the rows name them: by the first row, then the position in that row. */
    List<Column> columns(String[] errors) {
        List<Slot> ordered = new ArrayList<>(slots.values());
        ordered.sort((a, b) -> Long.compare(a.first(), b.first()));
        List<Column> cols = new ArrayList<>();
        for (Slot s : ordered) {
            String name = s.name;
            while (parameterNames.contains(name)) name = name + "'";
            if (!s.hasOdd()) {
                cols.add(Column.numbers(name, s.dimension, s.absolute, s.values));
            } else {
                Object[] vs = new Object[n];
                for (int i = 0; i < n; i++) vs[i] = s.object(i);
                cols.add(Sweep.columnOf(name, vs, errors));
            }
        }
        return cols;
    }
}
