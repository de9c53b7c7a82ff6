package org.ampturn.study;

import org.ampturn.units.Require;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.SplittableRandom;
import java.util.function.Function;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;

/**
 * Tolerance analysis of a design: parameters with tolerances ({@link Varied}), a function giving
 * the outputs, and optional limits on the outputs. {@link #corners()} evaluates the nominal design,
 * every corner of the tolerance box and each parameter alone at both ends; {@link #monteCarlo(int, long)}
 * draws random designs from a seed.
 *
 * <p>Monte Carlo runs are split into blocks of {@value #BLOCK} runs; block b draws from a
 * {@link SplittableRandom} seeded from the seed and b, so a seed gives the same runs whatever the
 * number of threads.
 */
public final class Tolerance {
    static final int BLOCK = 256;
    private static final int MAX_CORNER_PARAMS = 16;

    private final Function<Point, ?> f;
    private final List<Varied> varied;
    private final List<Limit> limits;
    private final int threads;
    private final Progress progress;

    private Tolerance(Function<Point, ?> f, List<Varied> varied, List<Limit> limits, int threads, Progress progress) {
        this.f = f;
        this.varied = varied;
        this.limits = limits;
        this.threads = threads;
        this.progress = progress;
    }

    /** A tolerance study of {@code f}, which reads the parameters by name from its {@link Point}. */
    public static Tolerance of(Function<Point, ?> f) {
        return new Tolerance(Require.present("function", f), List.of(), List.of(), Runner.CORES, null);
    }

    /** A copy with more toleranced parameters. */
    public Tolerance vary(Varied... more) {
        Require.present("more", more);
        List<Varied> vs = new ArrayList<>(varied);
        for (Varied v : more) {
            Require.present("toleranced parameter", v);
            for (Varied w : vs) if (w.name.equals(v.name)) throw Require.fail("parameter " + v.name + " is given twice");
            vs.add(v);
        }
        return new Tolerance(f, List.copyOf(vs), limits, threads, progress);
    }

    /** A copy with limits the outputs must meet, as text: {@code limit("I >= 2 A")}. */
    public Tolerance limit(String... more) {
        Require.present("more", more);
        Limit[] ls = new Limit[more.length];
        for (int i = 0; i < more.length; i++) ls[i] = Limit.parse(more[i]);
        return limit(ls);
    }

    /** A copy with limits the outputs must meet. */
    public Tolerance limit(Limit... more) {
        Require.present("more", more);
        List<Limit> ls = new ArrayList<>(limits);
        for (Limit l : more) ls.add(Require.present("limit", l));
        return new Tolerance(f, varied, List.copyOf(ls), threads, progress);
    }

    public Tolerance withThreads(int n) {
        return new Tolerance(f, varied, limits, Runner.checkThreads(n), progress);
    }

    public Tolerance withProgress(Progress listener) {
        return new Tolerance(f, varied, limits, threads, Require.present("progress listener", listener));
    }

    public List<Varied> parameters() {
        return varied;
    }

    public List<Limit> limits() {
        return limits;
    }

    private void requireParameters() {
        if (varied.isEmpty()) throw Require.fail("no parameter has a tolerance: give them with vary(Varied...)");
    }

    private List<String> names() {
        List<String> names = new ArrayList<>();
        for (Varied v : varied) names.add(v.name);
        return names;
    }

    private Function<Object[], Object> call() {
        List<String> names = List.copyOf(names());
        Map<String, Integer> index = new HashMap<>();
        for (int i = 0; i < names.size(); i++) index.put(names.get(i), i);
        return values -> f.apply(new Point(names, index, values));
    }

    /**
     * The nominal design (row 0), then every corner of the tolerance box (2^k rows, k ≤ 16), then
     * each parameter alone at its low and high end with the others nominal (2k rows).
     */
    public Corners corners() {
        requireParameters();
        return Runner.guarded(this::runCorners);
    }

    private Corners runCorners() {
        int k = varied.size();
        if (k > MAX_CORNER_PARAMS) {
            throw Require.fail(k + " toleranced parameters give 2^" + k + " corners, more than 2^" + MAX_CORNER_PARAMS
                    + "; use monteCarlo(runs, seed) instead");
        }
        int corners = 1 << k;
        Object[][] params = new Object[1 + corners + 2 * k][];
        params[0] = nominalRow();
        for (int c = 0; c < corners; c++) {
            Object[] row = new Object[k];
            for (int j = 0; j < k; j++) {
                Varied v = varied.get(j);
                boolean high = (c >> (k - 1 - j) & 1) == 1;
                row[j] = v.valueAt(v.nominal.si() + (high ? v.half : -v.half));
            }
            params[1 + c] = row;
        }
        for (int j = 0; j < k; j++) {
            for (int s = 0; s < 2; s++) {
                Object[] row = nominalRow();
                Varied v = varied.get(j);
                row[j] = v.valueAt(v.nominal.si() + (s == 1 ? v.half : -v.half));
                params[1 + corners + 2 * j + s] = row;
            }
        }
        Table t = Sweep.points("corners of " + k + (k == 1 ? " parameter" : " parameters"), names(), params, call(), threads, progress,
                Math.max(1, Math.min(64, params.length / 64)), null, "corner analysis");
        return new Corners(t, varied, limits, corners);
    }

    private Object[] nominalRow() {
        Object[] row = new Object[varied.size()];
        for (int j = 0; j < varied.size(); j++) row[j] = varied.get(j).valueAt(varied.get(j).nominal.si());
        return row;
    }

    /** {@code runs} random designs drawn from {@code seed}; the same runs for a seed on any number of threads. */
    public MonteCarlo monteCarlo(int runs, long seed) {
        requireParameters();
        if (runs < 2) throw Require.fail("runs (" + runs + ") must be at least 2");
        Axis.checkSize("Monte Carlo runs", runs, Axis.BYTES_PER_RUN + 8 * varied.size());
        return Runner.guarded(() -> runMonteCarlo(runs, seed));
    }

    private MonteCarlo runMonteCarlo(int runs, long seed) {
        int k = varied.size();
        double[][] inputs = new double[k][runs];
        for (double[] col : inputs) java.util.Arrays.fill(col, Double.NaN);
        List<Column> paramColumns = new ArrayList<>(k);
        for (int j = 0; j < k; j++) paramColumns.add(parameterColumn(varied.get(j), inputs[j]));
        Table t = Sweep.gathered("Monte Carlo of " + runs + " runs", names(), runs, i -> {
            Object[] row = new Object[k];
            for (int j = 0; j < k; j++) row[j] = varied.get(j).valueAt(inputs[j][i]);
            return row;
        }, null, paramColumns, (j, si) -> varied.get(j).valueAt(si), call(), threads, progress, BLOCK, (block, lo, hi) -> {
            SplittableRandom r = new SplittableRandom(Runner.seedFor(seed, block));
            for (int i = lo; i < hi; i++) for (int j = 0; j < k; j++) inputs[j][i] = varied.get(j).sample(r);
        }, "Monte Carlo run");
        return new MonteCarlo(t, varied, limits, seed, inputs);
    }

    /**
     * {@code runs} random designs drawn from {@code seed}, keeping no run: exact mean, σ, min, max
     * and fractions failing, and percentiles within a stated error ({@link StreamedMonteCarlo}).
     * Memory does not grow with the runs, so very long studies fit a small heap.
     */
    public StreamedMonteCarlo monteCarloStreamed(int runs, long seed) {
        requireParameters();
        if (runs < 2) throw Require.fail("runs (" + runs + ") must be at least 2");
        if (runs > Axis.MAX_POINTS) throw Require.fail(runs + " Monte Carlo runs are more than the " + Axis.MAX_POINTS + " a study takes; use fewer");
        return Runner.guarded(() -> runStreamed(runs, seed));
    }

    private StreamedMonteCarlo runStreamed(int runs, long seed) {
        int k = varied.size();
        int block = BLOCK;
        int blocks = (int) ((runs + (long) block - 1) / block);
        StreamedMonteCarlo.Part[] parts = new StreamedMonteCarlo.Part[blocks];
        Map<String, StreamedMonteCarlo.Histogram> histograms = new HashMap<>();
        Function<Object[], Object> fn = call();
        Runner.Outcome o = Runner.run("Monte Carlo of " + runs + " runs", runs, block, threads, progress, (b, lo, hi, c) -> {
            SplittableRandom r = new SplittableRandom(Runner.seedFor(seed, b));
            double[] drawn = new double[(hi - lo) * k];
            for (int q = 0; q < drawn.length; q++) drawn[q] = varied.get(q % k).sample(r);
            StreamedMonteCarlo.Part part = new StreamedMonteCarlo.Part(limits);
            int done = hi - lo;
            for (int i = lo; i < hi; i++) {
                Object[] row = new Object[k];
                for (int j = 0; j < k; j++) row[j] = varied.get(j).valueAt(drawn[(i - lo) * k + j]);
                Object out;
                try {
                    Object result = fn.apply(row);
                    out = Outputs.isSingle(result) ? Outputs.single(result, Sweep.RESULT) : Outputs.from(result, Sweep.RESULT);
                } catch (RuntimeException e) {
                    out = null;
                }
                if (out == null) part.fail();
                else if (out instanceof Map) {
                    @SuppressWarnings("unchecked") Map<String, Object> m = (Map<String, Object>) out;
                    part.add(m);
                } else part.addOne(Sweep.RESULT, out);
                if (c.tick(1) && i + 1 < hi) {
                    done = i + 1 - lo;
                    break;
                }
            }
            synchronized (histograms) {
                for (Map.Entry<String, StreamedMonteCarlo.Acc> e : part.outputs.entrySet()) {
                    StreamedMonteCarlo.Acc a = e.getValue();
                    histograms.computeIfAbsent(kindKey(e.getKey(), a), x -> new StreamedMonteCarlo.Histogram()).add(a.pending, a.pendingCount);
                    a.pending = null;
                }
            }
            parts[b] = part;
            return done;
        });
        StreamedMonteCarlo.Part total = new StreamedMonteCarlo.Part(limits);
        for (StreamedMonteCarlo.Part p : parts) if (p != null) total.merge(p);
        Map<String, StreamedMonteCarlo.Histogram> chosen = new HashMap<>();
        for (Map.Entry<String, StreamedMonteCarlo.Acc> e : total.outputs.entrySet()) {
            StreamedMonteCarlo.Histogram h = histograms.get(kindKey(e.getKey(), e.getValue()));
            chosen.put(e.getKey(), h);
        }
        String note = o.complete() ? null : "stopped after " + o.computed() + " of " + runs + " runs";
        return new StreamedMonteCarlo(runs, seed, varied, limits, total, chosen, note);
    }

    private static String kindKey(String output, StreamedMonteCarlo.Acc a) {
        return output + '\u0000' + a.dimension + '\u0000' + a.absolute;
    }

    /** The column of a drawn parameter over its SI values, of the kind the function receives. */
    static Column parameterColumn(Varied v, double[] values) {
        Object probe = v.valueAt(v.nominal.si());
        if (probe instanceof Quantity) {
            Quantity q = (Quantity) probe;
            return Column.numbers(v.name, q.dimension(), q.isAbsoluteTemperature(), values);
        }
        return Column.numbers(v.name, Dimension.NONE, false, values);
    }

    @Override
    public String toString() {
        return "tolerance study of " + varied + (limits.isEmpty() ? "" : " with limits " + limits);
    }
}
