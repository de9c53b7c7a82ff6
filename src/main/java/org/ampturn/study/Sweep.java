package org.ampturn.study;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.function.BiFunction;
import java.util.function.DoubleUnaryOperator;
import java.util.function.Function;
import java.util.function.IntFunction;
import org.ampturn.units.Require;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;

/**
 * Evaluates a function over one or two swept parameters and collects a {@link Table}. The function
 * is any Java lambda returning a {@link Quantity}, a number, {@link Outputs} or a
 * {@code Map<String, ?>} of named results. A point where it throws is kept as a row with the error,
 * and the sweep goes on.
 *
 * <p>Points run on all cores ({@link #withThreads(int)} to change); the table is the same whatever
 * the number of threads. When the calling thread is interrupted the sweep stops and returns the
 * rows computed so far, marked incomplete.
 *
 * <p>{@link #ofDoubles} is the fast path for closed forms: a {@code double → double} function,
 * primitive columns, no object per point.
 */
public final class Sweep {
    /** Name of the output column when the function returns a single value. */
    public static final String RESULT = "result";

    private final int threads;
    private final Progress progress;

    private Sweep(int threads, Progress progress) {
        this.threads = threads;
        this.progress = progress;
    }

    /** All cores, and the installed progress listener. */
    public static Sweep defaults() {
        return new Sweep(Runner.CORES, null);
    }

    /** A copy that runs on {@code threads} threads (1 to 1024). */
    public Sweep withThreads(int threads) {
        return new Sweep(Runner.checkThreads(threads), progress);
    }

    /** A copy that reports to {@code listener} instead of the installed one. */
    public Sweep withProgress(Progress listener) {
        return new Sweep(threads, Require.present("progress listener", listener));
    }

    public int threads() {
        return threads;
    }

    /** The function at every value of one parameter. */
    public <A> Table of(Axis<A> axis, Function<? super A, ?> f) {
        Require.present("axis", axis);
        Require.present("function", f);
        List<A> as = axis.values();
        Object[][] params = new Object[as.size()][];
        for (int i = 0; i < as.size(); i++) params[i] = new Object[] {as.get(i)};
        return Runner.guarded(() -> run("sweep of " + axis.name(), List.of(axis.name()), params, p -> {
            @SuppressWarnings("unchecked") A a = (A) p[0];
            return f.apply(a);
        }));
    }

    /** The function over the grid of two parameters: every value of {@code b} for each value of {@code a}. */
    public <A, B> Table of(Axis<A> a, Axis<B> b, BiFunction<? super A, ? super B, ?> f) {
        Require.present("first axis", a);
        Require.present("second axis", b);
        Require.present("function", f);
        if (a.name().equals(b.name())) throw Require.fail("the two swept parameters have the same name, " + a.name());
        long n = (long) a.size() * b.size();
        if (n > 50_000_000L) throw Require.fail("a grid of " + a.size() + " × " + b.size() + " points is too large (over 50 million)");
        Axis.checkSize("points of the grid of " + a.name() + " × " + b.name(), n, Axis.BYTES_PER_POINT);
        Object[][] params = new Object[(int) n][];
        int k = 0;
        for (A x : a.values()) for (B y : b.values()) params[k++] = new Object[] {x, y};
        return Runner.guarded(() -> run("sweep of " + a.name() + " and " + b.name(), List.of(a.name(), b.name()), params, p -> {
            @SuppressWarnings("unchecked") A x = (A) p[0];
            @SuppressWarnings("unchecked") B y = (B) p[1];
            return f.apply(x, y);
        }));
    }

    /** The fast path: {@code count} evenly spaced pure numbers from {@code from} to {@code to}, output column "result". */
    public Table ofDoubles(String name, double from, double to, int count, DoubleUnaryOperator f) {
        return ofDoubles(name, Dimension.NONE, steps(name, from, to, count, false), RESULT, Dimension.NONE, f);
    }

    /**
     * The fast path with units: the parameter takes the SI values {@code xs} of dimension
     * {@code xDimension}; {@code f} maps an SI value to the SI value of the output. No object is
     * made per point. Where {@code f} throws, the row has NaN and the error.
     */
    public Table ofDoubles(String name, Dimension xDimension, double[] xs, String output, Dimension outputDimension, DoubleUnaryOperator f) {
        Axis.checkName(name);
        Axis.checkName(output);
        Require.present("function", f);
        if (xs == null || xs.length == 0) throw Require.fail("the list of values for " + name + " is empty");
        if (name.equals(output)) throw Require.fail("the parameter and the output have the same name, " + name);
        Axis.checkSize("points of the sweep of " + name, xs.length, Axis.BYTES_PER_DOUBLE_POINT);
        double[] x = xs.clone();
        return Runner.guarded(() -> doubles(name, xDimension, x, output, outputDimension, f));
    }

    private Table doubles(String name, Dimension xDimension, double[] x, String output, Dimension outputDimension, DoubleUnaryOperator f) {
        int n = x.length;
        double[] y = new double[n];
        String[] errors = new String[n];
        Runner.Outcome o = Runner.run("sweep of " + name, n, Runner.blockSizeFor(n, 16_384), threads, progress, (block, lo, hi, c) -> {
            int i = lo;
            while (i < hi) {
                int start = i;
                int end = Math.min(hi, i + 1024);
                for (; i < end; i++) {
                    try {
                        y[i] = f.applyAsDouble(x[i]);
                        if (!Double.isFinite(y[i])) {
                            errors[i] = "the function gave " + y[i] + ", not a finite number";
                            y[i] = Double.NaN;
                        }
                    } catch (RuntimeException e) {
                        y[i] = Double.NaN;
                        errors[i] = Runner.describe(e);
                    }
                }
                if (c.tick(end - start) && i < hi) return i - lo;
            }
            return hi - lo;
        });
        String note = null;
        if (!o.complete()) {
            note = "stopped after " + o.computed() + " of " + n + " points";
            for (int i = 0; i < n; i++) {
                if (!o.isDone(i)) {
                    y[i] = Double.NaN;
                    errors[i] = "not computed: the sweep was stopped";
                }
            }
        }
        boolean anyError = false;
        for (String e : errors) if (e != null) { anyError = true; break; }
        List<Column> cols = List.of(Column.numbers(name, xDimension, false, x), Column.numbers(output, outputDimension, false, y));
        return new Table("sweep of " + name, cols, 1, n, anyError ? errors : null, null, note);
    }

    /** {@code count} steps from {@code from} to {@code to}, linear or logarithmic, exact at both ends. */
    public static double[] steps(String name, double from, double to, int count, boolean log) {
        Axis.checkName(name);
        Axis.checkEnds(name, from, to, log, String.valueOf(from), String.valueOf(to));
        Axis.checkCount(name, count, from, to, Axis.BYTES_PER_DOUBLE_POINT);
        double[] xs = new double[count];
        for (int k = 0; k < count; k++) xs[k] = Axis.step(from, to, k, count, log);
        return xs;
    }

    // ---- the general path ------------------------------------------------------------------

    private Table run(String title, List<String> names, Object[][] params, Function<Object[], Object> f) {
        return points(title, names, params, f, threads, progress, Runner.blockSizeFor(params.length, 64), null, "sweep");
    }

    /** Called at the start of each block, before its points are evaluated (e.g. to draw their random inputs). */
    @FunctionalInterface
    interface BlockStart {
        void prepare(int block, int from, int to);
    }

    /** Evaluates {@code f} at every row of {@code params} on the runner and assembles the table. */
    static Table points(String title, List<String> names, Object[][] params, Function<Object[], Object> f, int threads,
                        Progress progress, int blockSize, BlockStart start, String what) {
        return gathered(title, names, params.length, i -> params[i], params, null, null, f, threads, progress, blockSize, start, what);
    }

    /**
     * Evaluates {@code f} at rows 0 to n − 1 and gathers the outputs into primitive columns
     * ({@link Gather}). The parameters of row i come from {@code rowParams} when the row is run;
     * the table keeps {@code keptParams} when given (its parameter columns are then built from
     * them), else {@code paramColumns}, whose objects {@code source} rebuilds from the SI values.
     */
    static Table gathered(String title, List<String> names, int n, IntFunction<Object[]> rowParams, Object[][] keptParams,
                          List<Column> paramColumns, Table.ParamSource source, Function<Object[], Object> f, int threads,
                          Progress progress, int blockSize, BlockStart start, String what) {
        String[] errors = new String[n];
        Gather gather = new Gather(n, names);
        Runner.Outcome o = Runner.run(title, n, blockSize, threads, progress, (block, lo, hi, c) -> {
            if (start != null) start.prepare(block, lo, hi);
            for (int i = lo; i < hi; i++) {
                try {
                    Object r = f.apply(rowParams.apply(i));
                    if (Outputs.isSingle(r)) gather.putOne(i, RESULT, Outputs.single(r, RESULT));
                    else gather.put(i, Outputs.from(r, RESULT));
                } catch (RuntimeException e) {
                    errors[i] = Runner.describe(e);
                }
                if (c.tick(1) && i + 1 < hi) return i + 1 - lo;
            }
            return hi - lo;
        });
        String note = null;
        if (!o.complete()) {
            note = "stopped after " + o.computed() + " of " + n + " points";
            for (int i = 0; i < n; i++) if (!o.isDone(i)) errors[i] = "not computed: the " + what + " was stopped";
        }
        List<Column> cols = new ArrayList<>();
        if (keptParams != null) {
            for (int k = 0; k < names.size(); k++) {
                Object[] vs = new Object[n];
                for (int i = 0; i < n; i++) vs[i] = keptParams[i] == null ? null : keptParams[i][k];
                cols.add(columnOf(names.get(k), vs, null));
            }
        } else {
            cols.addAll(paramColumns);
        }
        cols.addAll(gather.columns(errors));
        boolean anyError = false;
        for (String e : errors) if (e != null) { anyError = true; break; }
        return new Table(title, cols, names.size(), n, anyError ? errors : null, keptParams, note, source);
    }

    /** Builds the columns: the parameters, then the union of output names in the order first seen. */
    static Table assemble(String title, List<String> names, Object[][] params, Object[] results, String note) {
        int n = params.length;
        String[] errors = new String[n];
        boolean anyError = false;
        List<Column> cols = new ArrayList<>();
        for (int k = 0; k < names.size(); k++) {
            Object[] vs = new Object[n];
            for (int i = 0; i < n; i++) vs[i] = params[i] == null ? null : params[i][k];
            cols.add(columnOf(names.get(k), vs, null));
        }
        LinkedHashMap<String, Object[]> outs = new LinkedHashMap<>();
        for (int i = 0; i < n; i++) {
            if (!(results[i] instanceof Map)) continue;
            @SuppressWarnings("unchecked") Map<String, Object> m = (Map<String, Object>) results[i];
            for (Map.Entry<String, Object> e : m.entrySet()) {
                String name = e.getKey();
                while (names.contains(name)) name = name + "'";
                outs.computeIfAbsent(name, x -> new Object[n])[i] = e.getValue();
            }
        }
        for (int i = 0; i < n; i++) {
            if (results[i] instanceof String) {
                errors[i] = (String) results[i];
                anyError = true;
            }
        }
        for (Map.Entry<String, Object[]> e : outs.entrySet()) cols.add(columnOf(e.getKey(), e.getValue(), errors));
        for (String e : errors) if (e != null) { anyError = true; break; }
        return new Table(title, cols, names.size(), n, anyError ? errors : null, params, note, null);
    }

    /**
     * A numeric column when every present value is a quantity of one dimension or a number, else a
     * column of labels. A value of another kind than the first is an error of its row.
     */
    static Column columnOf(String name, Object[] vs, String[] errors) {
        Object first = null;
        for (Object v : vs) if (v != null) { first = v; break; }
        int n = vs.length;
        if (first instanceof Quantity || first instanceof Number) {
            Dimension d = first instanceof Quantity ? ((Quantity) first).dimension() : Dimension.NONE;
            boolean absolute = first instanceof Quantity && ((Quantity) first).isAbsoluteTemperature();
            double[] values = new double[n];
            boolean consistent = true;
            for (int i = 0; i < n; i++) {
                Object v = vs[i];
                double x = Double.NaN;
                if (v instanceof Quantity && ((Quantity) v).dimension().equals(d)) x = ((Quantity) v).si();
                else if (v instanceof Number && d.isNone()) x = ((Number) v).doubleValue();
                else if (v != null) {
                    if (errors == null) { consistent = false; break; }
                    String was = d.isNone() ? "a pure number" : "a " + d.name();
                    String got = v instanceof Quantity ? v + " (" + ((Quantity) v).dimension().name() + ")" : String.valueOf(v);
                    if (errors[i] == null) errors[i] = "output " + name + " was " + was + " in earlier rows, got " + got;
                }
                values[i] = x;
            }
            if (consistent) return Column.numbers(name, d, absolute, values);
        }
        String[] labels = new String[n];
        for (int i = 0; i < n; i++) labels[i] = vs[i] == null ? "" : String.valueOf(vs[i]);
        return Column.labels(name, labels);
    }

    @Override
    public String toString() {
        return "sweep on " + threads + (threads == 1 ? " thread" : " threads");
    }
}
