package org.ampturn.study;

import org.ampturn.units.Require;
import org.ampturn.units.Quantity;

/** One row of a {@link Table}: the parameters of a point and what was computed there. */
public final class Row {
    private final Table table;
    private final int index;

    Row(Table table, int index) {
        this.table = table;
        this.index = index;
    }

    /** Position in its table, from 0. */
    public int index() {
        return index;
    }

    /** The value in a numeric column as a quantity (NaN when the row failed). */
    public Quantity get(String column) {
        Column c = table.column(column);
        if (!c.numeric()) throw Require.fail("column " + column + " holds labels; use label(\"" + column + "\") or param(\"" + column + "\")");
        return c.quantity(index);
    }

    /** The SI value in a numeric column (NaN when the row failed). */
    public double value(String column) {
        Column c = table.column(column);
        if (!c.numeric()) throw Require.fail("column " + column + " holds labels; use label(\"" + column + "\")");
        return c.values[index];
    }

    /** The text in a column: a label, or a number shown as a quantity. */
    public String label(String column) {
        return table.column(column).text(index);
    }

    /** The parameter value as it was given to the function (an Integer, a Quantity, a wire, ...). */
    @SuppressWarnings("unchecked")
    public <T> T param(String name) {
        return (T) table.parameter(index, name);
    }

    /** Why this row failed, or null. */
    public String error() {
        return table.error(index);
    }

    /** True when the row was computed without error. */
    public boolean ok() {
        return table.error(index) == null;
    }

    @Override
    public String toString() {
        StringBuilder sb = new StringBuilder();
        for (String name : table.columnNames()) {
            if (sb.length() > 0) sb.append(", ");
            String t = label(name);
            sb.append(name).append(" = ").append(t.isEmpty() ? "—" : t);
        }
        if (!ok()) sb.append("  ! ").append(error());
        return sb.toString();
    }
}
