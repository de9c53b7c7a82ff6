package org.ampturn.study;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.DoublePredicate;
import java.util.function.Predicate;
import org.ampturn.units.Csv;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;

/**
 * The result of a study: named columns of SI numbers with their {@link Dimension} (or text labels,
 * for a wire size or a material), one row per point. Immutable; sorting and filtering return new
 * tables. A row whose evaluation failed keeps its parameters, has NaN in its outputs, and carries
 * the error ({@link #error(int)}).
 *
 * <p>{@link #toString()} is an aligned text table with one engineering unit per column, as the
 * console shows it; {@link #toCsv()} writes SI values with the unit in each header.
 */
public final class Table {
    private static final int SHOW_HEAD = 20;
    private static final int SHOW_TAIL = 10;

    private final String title;
    private final List<Column> columns;
    private final Map<String, Column> byName;
    private final int parameterCount;
    private final int size;
    private final String[] errors;      // null entries where the row is fine; array may be null
    private final Object[][] parameters; // the parameter objects of each row, or null
    private final String incomplete;    // null when every point was computed
    private final ParamSource source;   // rebuilds parameter objects from their SI values when parameters is null; may be null

    /** Rebuilds the object a function received for parameter k from its SI value (a Monte Carlo keeps no object per run). */
    @FunctionalInterface
    interface ParamSource {
        Object value(int k, double si);
    }

    Table(String title, List<Column> columns, int parameterCount, int size, String[] errors, Object[][] parameters, String incomplete) {
        this(title, columns, parameterCount, size, errors, parameters, incomplete, null);
    }

    Table(String title, List<Column> columns, int parameterCount, int size, String[] errors, Object[][] parameters, String incomplete,
          ParamSource source) {
        this.title = title;
        this.columns = List.copyOf(columns);
        this.parameterCount = parameterCount;
        this.size = size;
        this.errors = errors;
        this.parameters = parameters;
        this.incomplete = incomplete;
        this.source = source;
        LinkedHashMap<String, Column> m = new LinkedHashMap<>();
        for (Column c : columns) m.put(c.name, c);
        this.byName = m;
    }

    /** What the table holds, e.g. "sweep of turns". */
    public String title() {
        return title;
    }

    /** Column names in order: the parameters first, then the outputs. */
    public List<String> columnNames() {
        List<String> names = new ArrayList<>(columns.size());
        for (Column c : columns) names.add(c.name);
        return Collections.unmodifiableList(names);
    }

    /** The names of the swept parameters (the first columns). */
    public List<String> parameterNames() {
        return columnNames().subList(0, parameterCount);
    }

    /** The names of the output columns. */
    public List<String> outputNames() {
        return columnNames().subList(parameterCount, columns.size());
    }

    /** True when the column holds numbers (false for labels such as wire sizes). */
    public boolean isNumeric(String column) {
        return column(column).numeric();
    }

    /** The dimension of a numeric column. */
    public Dimension dimension(String column) {
        Column c = column(column);
        if (!c.numeric()) throw new IllegalArgumentException("column " + column + " holds labels, not quantities; read it with labels(\"" + column + "\")");
        return c.dimension;
    }

    /** The SI values of a numeric column (kelvin for temperatures); NaN where a row failed. A copy. */
    public double[] values(String column) {
        Column c = column(column);
        if (!c.numeric()) throw new IllegalArgumentException("column " + column + " holds labels, not numbers; read it with labels(\"" + column + "\")");
        return c.values.clone();
    }

    /** The text of each row in a column: labels as given, numbers as quantities ("" where missing). */
    public List<String> labels(String column) {
        Column c = column(column);
        List<String> out = new ArrayList<>(size);
        for (int i = 0; i < size; i++) out.add(c.text(i));
        return Collections.unmodifiableList(out);
    }

    /** Number of rows. */
    public int size() {
        return size;
    }

    /** The rows in order. */
    public List<Row> rows() {
        List<Row> rows = new ArrayList<>(size);
        for (int i = 0; i < size; i++) rows.add(new Row(this, i));
        return Collections.unmodifiableList(rows);
    }

    /** One row, counted from 0. */
    public Row row(int index) {
        if (index < 0 || index >= size) throw new IndexOutOfBoundsException("row " + index + " is outside the table of " + size + " rows");
        return new Row(this, index);
    }

    /** Why a row failed, or null when it did not. */
    public String error(int row) {
        if (row < 0 || row >= size) throw new IndexOutOfBoundsException("row " + row + " is outside the table of " + size + " rows");
        return errors == null ? null : errors[row];
    }

    /** How many rows failed. */
    public int failures() {
        if (errors == null) return 0;
        int n = 0;
        for (String e : errors) if (e != null) n++;
        return n;
    }

    /** Why the table is incomplete ("stopped after 345 of 1000 points"), or null when it is complete. */
    String incompleteNote() {
        return incomplete;
    }

    /** False when the run was stopped before every point was computed. */
    public boolean isComplete() {
        return incomplete == null;
    }

    /** The rows sorted by a column, smallest first; rows without a value go last. Labels sort as text. */
    public Table sortedBy(String column) {
        return sorted(column, false);
    }

    /** The rows sorted by a column, largest first; rows without a value go last. */
    public Table sortedByDescending(String column) {
        return sorted(column, true);
    }

    private Table sorted(String column, boolean descending) {
        Column c = column(column);
        Integer[] idx = new Integer[size];
        for (int i = 0; i < size; i++) idx[i] = i;
        Comparator<Integer> cmp;
        if (c.numeric()) {
            cmp = (a, b) -> {
                double x = c.values[a], y = c.values[b];
                boolean nx = Double.isNaN(x), ny = Double.isNaN(y);
                if (nx || ny) return nx == ny ? 0 : nx ? 1 : -1;
                return descending ? Double.compare(y, x) : Double.compare(x, y);
            };
        } else {
            cmp = (a, b) -> descending ? c.labels[b].compareTo(c.labels[a]) : c.labels[a].compareTo(c.labels[b]);
        }
        Arrays.sort(idx, cmp);
        int[] order = new int[size];
        for (int i = 0; i < size; i++) order[i] = idx[i];
        return permuted(order, title + ", sorted by " + column + (descending ? " (largest first)" : ""));
    }

    /** The rows that pass a test. */
    public Table where(Predicate<Row> test) {
        Require.present("test", test);
        int[] keep = new int[size];
        int n = 0;
        for (int i = 0; i < size; i++) if (test.test(new Row(this, i))) keep[n++] = i;
        return permuted(Arrays.copyOf(keep, n), title + ", filtered");
    }

    /** The rows whose SI value in a numeric column passes a test: {@code where("L", l -> l > 1e-3)}. */
    public Table where(String column, DoublePredicate test) {
        Require.present("test", test);
        double[] v = column(column).numeric() ? column(column).values : values(column);
        int[] keep = new int[size];
        int n = 0;
        for (int i = 0; i < size; i++) if (!Double.isNaN(v[i]) && test.test(v[i])) keep[n++] = i;
        return permuted(Arrays.copyOf(keep, n), title + ", where " + column + " passes");
    }

    /** The rows without an error. */
    public Table withoutFailures() {
        return where(Row::ok);
    }

    /** The row with the largest ({@code max}) or smallest value in a numeric column, skipping failed rows. */
    public Row best(String column, boolean max) {
        double[] v = values(column);
        int best = -1;
        for (int i = 0; i < size; i++) {
            if (Double.isNaN(v[i])) continue;
            if (best < 0 || (max ? v[i] > v[best] : v[i] < v[best])) best = i;
        }
        if (best < 0) {
            throw new IllegalStateException("no row of the table has a value of " + column + " (" + size + " rows, " + failures() + " failed)");
        }
        return new Row(this, best);
    }

    /** The row with the smallest value in a column. */
    public Row min(String column) {
        return best(column, false);
    }

    /** The row with the largest value in a column. */
    public Row max(String column) {
        return best(column, true);
    }

    Table permuted(int[] order, String newTitle) {
        List<Column> cs = new ArrayList<>(columns.size());
        for (Column c : columns) cs.add(c.permuted(order));
        String[] es = null;
        if (errors != null) {
            es = new String[order.length];
            for (int i = 0; i < order.length; i++) es[i] = errors[order[i]];
        }
        Object[][] ps = null;
        if (parameters != null) {
            ps = new Object[order.length][];
            for (int i = 0; i < order.length; i++) ps[i] = parameters[order[i]];
        }
        return new Table(newTitle, cs, parameterCount, order.length, es, ps, incomplete, source);
    }

    Column column(String name) {
        if (name == null) throw new IllegalArgumentException("a column name is missing (null)");
        Column c = byName.get(name);
        if (c == null) throw new IllegalArgumentException("no column named " + Require.quote(name) + "; the columns are " + Require.names(byName.keySet()));
        return c;
    }

    Object parameter(int row, String name) {
        int k = parameterNames().indexOf(name);
        if (k < 0) throw new IllegalArgumentException("no parameter named " + Require.quote(name) + "; the parameters are " + Require.names(parameterNames()));
        if (parameters == null) {
            Column c = columns.get(k);
            if (source != null && c.numeric()) return Double.isNaN(c.values[row]) ? null : source.value(k, c.values[row]);
            return c.numeric() ? (Object) c.values[row] : c.labels[row];
        }
        return parameters[row] == null ? null : parameters[row][k];
    }

    /** An aligned text table with one engineering unit per column; long tables show their first and last rows. */
    @Override
    public String toString() {
        int digits = Quantity.displayDigits();
        int n = columns.size();
        boolean anyError = failures() > 0;
        List<String[]> lines = new ArrayList<>();
        String[] head = new String[n + (anyError ? 1 : 0)];
        Column.Shown[] shown = new Column.Shown[n];
        for (int j = 0; j < n; j++) {
            Column c = columns.get(j);
            if (c.numeric()) {
                shown[j] = c.shown();
                head[j] = shown[j].symbol.isEmpty() ? c.name : c.name + " (" + shown[j].symbol + ")";
            } else {
                head[j] = c.name;
            }
        }
        if (anyError) head[n] = "error";
        List<Integer> rowsShown = new ArrayList<>();
        boolean cut = size > SHOW_HEAD + SHOW_TAIL + 5;
        for (int i = 0; i < size; i++) {
            if (!cut || i < SHOW_HEAD || i >= size - SHOW_TAIL) rowsShown.add(i);
        }
        for (int i : rowsShown) {
            String[] cells = new String[head.length];
            for (int j = 0; j < n; j++) {
                Column c = columns.get(j);
                cells[j] = c.numeric() ? shown[j].format(c.values[i], digits) : c.labels[i];
                if (cells[j] == null || cells[j].isEmpty()) cells[j] = c.numeric() ? "—" : "";
            }
            if (anyError) cells[n] = errors[i] == null ? "" : "! " + errors[i];
            lines.add(cells);
        }
        int[] width = new int[head.length];
        for (int j = 0; j < head.length; j++) {
            width[j] = head[j].length();
            for (String[] l : lines) width[j] = Math.max(width[j], l[j].length());
        }
        StringBuilder sb = new StringBuilder();
        sb.append(title).append(": ").append(size).append(size == 1 ? " row" : " rows");
        if (anyError) sb.append(", ").append(failures()).append(" failed");
        if (incomplete != null) sb.append(" (incomplete: ").append(incomplete).append(')');
        sb.append('\n');
        appendLine(sb, head, width, n);
        for (int k = 0; k < lines.size(); k++) {
            if (cut && k == SHOW_HEAD) sb.append("  … ").append(size - SHOW_HEAD - SHOW_TAIL).append(" more rows …\n");
            appendLine(sb, lines.get(k), width, n);
        }
        return sb.toString().stripTrailing();
    }

    private void appendLine(StringBuilder sb, String[] cells, int[] width, int n) {
        int start = sb.length();
        sb.append(' ');
        for (int j = 0; j < cells.length; j++) {
            boolean right = j < n && columns.get(j).numeric();
            String c = cells[j];
            String pad = " ".repeat(width[j] - c.length());
            sb.append(' ');
            if (j == cells.length - 1 && !right) sb.append(c);
            else sb.append(right ? pad + c : c + pad);
            if (j < cells.length - 1) sb.append(' ');
        }
        int end = sb.length();
        while (end > start && sb.charAt(end - 1) == ' ') end--;
        sb.setLength(end);
        sb.append('\n');
    }

    /**
     * The table as CSV ({@link Csv}): a header with each numeric column's SI unit in ASCII, e.g.
     * {@code L (H)}, {@code R (ohm)}, temperatures in kelvin; SI values that read back exactly;
     * empty cells where a row has no value; an {@code error} column when some row failed.
     */
    public String toCsv() {
        StringBuilder sb = new StringBuilder();
        boolean anyError = failures() > 0;
        for (int j = 0; j < columns.size(); j++) {
            Column c = columns.get(j);
            if (j > 0) sb.append(',');
            sb.append(c.numeric() ? Csv.header(c.name, c.dimension) : Csv.cell(c.name));
        }
        if (anyError) sb.append(",error");
        sb.append('\n');
        for (int i = 0; i < size; i++) {
            for (int j = 0; j < columns.size(); j++) {
                Column c = columns.get(j);
                if (j > 0) sb.append(',');
                sb.append(c.numeric() ? Csv.number(c.values[i]) : Csv.cell(c.labels[i]));
            }
            if (anyError) sb.append(',').append(Csv.cell(errors[i]));
            sb.append('\n');
        }
        return sb.toString();
    }

    /**
     * Writes {@link #toCsv()} to a file atomically (temporary file, then a rename) with the user's
     * normal file permissions; UTF-8, with a byte-order mark only when a label holds non-ASCII text.
     * Returns the absolute path.
     */
    public Path saveCsv(String path) {
        if (path == null || path.isBlank()) throw new IllegalArgumentException("the CSV file name is missing (\"" + path + "\")");
        return saveCsv(Path.of(path));
    }

    /** Writes {@link #toCsv()} to a file; see {@link #saveCsv(String)}. */
    public Path saveCsv(Path path) {
        if (path == null) throw new IllegalArgumentException("the CSV file is missing (null)");
        return Csv.save(path, toCsv());
    }
}
