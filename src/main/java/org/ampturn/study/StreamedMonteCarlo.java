package org.ampturn.study;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;

/**
 * A Monte Carlo run that keeps no run: for each numeric output, the count, mean, standard
 * deviation, minimum and maximum of its values, exact (Welford's one-pass update, B. P. Welford,
 * "Note on a method for calculating corrected sums of squares and products", Technometrics 4(3),
 * 419–420, 1962; blocks combined in block order by the pairwise formula of T. F. Chan, G. H. Golub
 * and R. J. LeVeque, "Updating formulae and a pairwise algorithm for computing sample variances",
 * Stanford CS report STAN-CS-79-773, 1979, so the figures do not depend on the number of threads);
 * the fraction failing each limit, exact; and percentiles from a histogram of fixed relative-width
 * bins ({@value #BIN_BITS} bits of the mantissa: 1,024 bins per power of two).
 *
 * <p>Percentile error: a bin holds values within a factor 1 + 2^−10 of each other, and a
 * percentile reads the middle of the bin of each order statistic it needs, so it is within
 * {@value #RELATIVE_ERROR} (2^−11) of the magnitude of those order statistics of the exact
 * percentile of {@link MonteCarlo#percentile} (the same definition 7 of Hyndman and Fan 1996); the
 * 0 and 100 percentiles are the exact minimum and maximum. The bins are those of a relative-error
 * quantile sketch (C. Masson, J. E. Rim and H. K. Lee, "DDSketch: a fast and fully-mergeable
 * quantile sketch with relative-error guarantees", PVLDB 12(12), 2019), taken straight from the
 * IEEE 754 bits.
 *
 * <p>A run with no value of an output counts as the worst case, as in {@link MonteCarlo}: the
 * mean and σ skip it, min, max and percentiles count it as +∞ (−∞ when the limits bound the output
 * only from below), and it fails the limits on that output. The runs are those of
 * {@code monteCarlo(runs, seed)}; a study takes at most 100 million. An output keeps the dimension of its first value; a
 * later value of another kind counts as missing.
 */
public final class StreamedMonteCarlo {
    static final int BIN_BITS = 10;
    /** The stated bound on the relative error of a percentile. */
    public static final double RELATIVE_ERROR = 0x1p-11;

    private final int runs;
    private final long seed;
    private final List<Varied> varied;
    private final List<Limit> limits;
    private final long computed;
    private final long failed;
    private final String incomplete;
    private final LinkedHashMap<String, Acc> outputs;
    private final Map<String, Histogram> histograms;
    private final long[] limitFails;
    private final long anyFails;

    StreamedMonteCarlo(int runs, long seed, List<Varied> varied, List<Limit> limits, Part total, Map<String, Histogram> histograms,
                       String incomplete) {
        this.runs = runs;
        this.seed = seed;
        this.varied = varied;
        this.limits = limits;
        this.computed = total.computed;
        this.failed = total.failed;
        this.outputs = total.outputs;
        this.histograms = histograms;
        this.limitFails = total.limitFails;
        this.anyFails = total.anyFails;
        this.incomplete = incomplete;
    }

    /** The runs asked for. */
    public int runs() {
        return runs;
    }

    /** The runs computed (all of them unless the study was stopped). */
    public long computed() {
        return computed;
    }

    public long seed() {
        return seed;
    }

    public boolean isComplete() {
        return incomplete == null;
    }

    /** The numeric outputs in the order the runs name them. */
    public List<String> outputNames() {
        return Collections.unmodifiableList(new ArrayList<>(outputs.keySet()));
    }

    public Dimension dimension(String output) {
        return acc(output).dimension;
    }

    /** The mean over the runs that have a value of the output. */
    public Quantity mean(String output) {
        Acc a = acc(output);
        return q(a, a.n == 0 ? Double.NaN : a.mean);
    }

    /** Sample standard deviation (n − 1) over the runs that have a value of the output. */
    public Quantity standardDeviation(String output) {
        Acc a = acc(output);
        return q(a, a.n < 2 ? Double.NaN : Math.sqrt(a.m2 / (a.n - 1)));
    }

    /** How many computed runs have no value of an output (each counted as the worst case). */
    public long missing(String output) {
        return computed - acc(output).n;
    }

    /** The smallest value, exact; −∞ when a run without a value counts as low. */
    public Quantity min(String output) {
        return percentile(output, 0);
    }

    /** The largest value, exact; +∞ when a run without a value counts as high. */
    public Quantity max(String output) {
        return percentile(output, 100);
    }

    /**
     * The p-th percentile (0 to 100), definition 7 of Hyndman and Fan 1996 as in
     * {@link MonteCarlo#percentile}, within {@link #RELATIVE_ERROR} of the magnitude of the order
     * statistics it reads; exact at 0 and 100.
     */
    public Quantity percentile(String output, double p) {
        if (!(p >= 0 && p <= 100)) throw Require.fail("percentile must be between 0 and 100, got " + p);
        Acc a = acc(output);
        long miss = computed - a.n;
        long total = computed;
        if (total == 0) return q(a, Double.NaN);
        boolean low = Worst.lowIsWorst(output, limits);
        double pos = (total - 1) * p / 100;
        long i = (long) Math.floor(pos);
        if (i >= total - 1) return q(a, rank(a, output, total - 1, miss, low));
        double frac = pos - i;
        double x0 = rank(a, output, i, miss, low);
        if (frac == 0) return q(a, x0);
        double x1 = rank(a, output, i + 1, miss, low);
        if (x0 == x1) return q(a, x0);
        if (Double.isInfinite(x1)) return q(a, x1);
        if (Double.isInfinite(x0)) return q(a, x0);
        return q(a, x0 + frac * (x1 - x0));
    }

    /** The value of order statistic r (from 0) among all computed runs, the missing ones at the worst end. */
    private double rank(Acc a, String output, long r, long miss, boolean low) {
        long present = a.n;
        if (low) {
            if (r < miss) return Double.NEGATIVE_INFINITY;
            r -= miss;
        } else if (r >= present) {
            return Double.POSITIVE_INFINITY;
        }
        if (r == 0) return a.min;
        if (r == present - 1) return a.max;
        double v = histograms.get(output).valueAt(r);
        return Math.max(a.min, Math.min(a.max, v));
    }

    /** The fraction of the computed runs that fail a limit; a run without a value of its output fails it. */
    public double fractionFailing(Limit limit) {
        Require.present("limit", limit);
        int j = limits.indexOf(limit);
        if (j < 0) throw Require.fail("the limit " + limit + " was not given to the study; the limits are " + limits);
        Acc a = acc(limit.output());
        limit.checkDimension(a.dimension);
        return computed == 0 ? Double.NaN : (double) limitFails[j] / computed;
    }

    /** The fraction failing a limit given as text; the limit must be one of the study's. */
    public double fractionFailing(String limit) {
        return fractionFailing(Limit.parse(limit));
    }

    /** The fraction of the computed runs that fail any of the limits (or failed to evaluate). */
    public double fractionFailing() {
        if (limits.isEmpty()) throw new IllegalStateException("no limits were given; add them with limit(\"I >= 2 A\")");
        return computed == 0 ? Double.NaN : (double) anyFails / computed;
    }

    private Acc acc(String output) {
        Acc a = output == null ? null : outputs.get(output);
        if (a == null) throw Require.fail("no numeric output named " + Require.quote(output) + "; the outputs are " + Require.names(outputs.keySet()));
        return a;
    }

    private static Quantity q(Acc a, double si) {
        return a.absolute && Double.isFinite(si) ? Quantity.temperatureKelvin(si) : Quantity.of(si, a.dimension);
    }

    @Override
    public String toString() {
        StringBuilder sb = new StringBuilder();
        sb.append("Monte Carlo of ").append(runs).append(" runs, seed ").append(seed).append(", streamed (percentiles within ")
                .append(String.format(Locale.ROOT, "%.2g", 100 * RELATIVE_ERROR)).append(" %)");
        if (incomplete != null) sb.append(" (incomplete: ").append(incomplete).append(')');
        if (failed > 0) sb.append(", ").append(failed).append(" failed to evaluate");
        sb.append('\n');
        for (Varied v : varied) sb.append("  ").append(v).append('\n');
        for (String o : outputs.keySet()) {
            long none = missing(o);
            sb.append("  ").append(o).append(": ");
            if (none > 0) {
                sb.append(none).append(none == 1 ? " run has" : " runs have").append(" no value, counted as ")
                        .append(Quantity.of(Worst.missing(o, limits), dimension(o))).append("; ");
            }
            sb.append("mean ").append(mean(o)).append(", σ ").append(standardDeviation(o))
                    .append("; min ").append(min(o)).append(", 0.1 % ").append(percentile(o, 0.1)).append(", 50 % ")
                    .append(percentile(o, 50)).append(", 99.9 % ").append(percentile(o, 99.9)).append(", max ").append(max(o)).append('\n');
        }
        for (int j = 0; j < limits.size(); j++) {
            Limit l = limits.get(j);
            if (!outputs.containsKey(l.output())) continue;
            sb.append("  ").append(l).append(": ").append(String.format(Locale.ROOT, "%.3g %% of runs fail", 100.0 * limitFails[j] / computed)).append('\n');
        }
        return sb.toString().stripTrailing();
    }

    // ---- accumulation ------------------------------------------------------------------------

    /** Count, mean, sum of squared deviations (Welford), min and max of one output. */
    static final class Acc {
        final Dimension dimension;
        final boolean absolute;
        long n;
        double mean, m2;
        double min = Double.POSITIVE_INFINITY, max = Double.NEGATIVE_INFINITY;
        double[] pending = new double[Tolerance.BLOCK]; // values not yet put into the histogram
        int pendingCount;

        Acc(Dimension dimension, boolean absolute) {
            this.dimension = dimension;
            this.absolute = absolute;
        }

        void add(double x) {
            n++;
            double d = x - mean;
            mean += d / n;
            m2 += d * (x - mean);
            if (x < min) min = x;
            if (x > max) max = x;
            if (pendingCount == pending.length) pending = java.util.Arrays.copyOf(pending, 2 * pending.length);
            pending[pendingCount++] = x;
        }

        /** Chan, Golub and LeVeque's pairwise combination: this followed by {@code b}. */
        void merge(Acc b) {
            if (b.n == 0) return;
            if (n == 0) {
                n = b.n;
                mean = b.mean;
                m2 = b.m2;
            } else {
                long total = n + b.n;
                double d = b.mean - mean;
                mean += d * b.n / total;
                m2 += b.m2 + d * d * ((double) n * b.n / total);
                n = total;
            }
            min = Math.min(min, b.min);
            max = Math.max(max, b.max);
        }

        boolean accepts(Quantity q) {
            return q.dimension().equals(dimension) && q.isAbsoluteTemperature() == absolute;
        }
    }

    /** What one block of runs gives. */
    static final class Part {
        long computed, failed, anyFails;
        final long[] limitFails;
        final LinkedHashMap<String, Acc> outputs = new LinkedHashMap<>();
        private final List<Limit> limits;
        private final double[] limitValues;

        Part(List<Limit> limits) {
            this.limits = limits;
            this.limitFails = new long[limits.size()];
            this.limitValues = new double[limits.size()];
        }

        /** A run that gave its outputs. */
        void add(Map<String, Object> m) {
            computed++;
            java.util.Arrays.fill(limitValues, Double.NaN);
            for (Map.Entry<String, Object> e : m.entrySet()) value(e.getKey(), e.getValue());
            countLimits();
        }

        /** A run that gave one output. */
        void addOne(String name, Object v) {
            computed++;
            java.util.Arrays.fill(limitValues, Double.NaN);
            value(name, v);
            countLimits();
        }

        private void value(String name, Object v) {
            double x;
            Acc a = outputs.get(name);
            if (v instanceof Quantity) {
                Quantity q = (Quantity) v;
                if (a == null) outputs.put(name, a = new Acc(q.dimension(), q.isAbsoluteTemperature()));
                if (!a.accepts(q)) return;
                x = q.si();
            } else if (v instanceof Number) {
                if (a == null) outputs.put(name, a = new Acc(Dimension.NONE, false));
                if (!a.dimension.isNone() || a.absolute) return;
                x = ((Number) v).doubleValue();
            } else {
                return;
            }
            a.add(x);
            for (int j = 0; j < limits.size(); j++) if (limits.get(j).output().equals(name)) limitValues[j] = x;
        }

        /** A run that failed to evaluate: it has no value of any output. */
        void fail() {
            computed++;
            failed++;
            java.util.Arrays.fill(limitValues, Double.NaN);
            countLimits();
        }

        private void countLimits() {
            boolean any = false;
            for (int j = 0; j < limits.size(); j++) {
                if (!limits.get(j).isMetAt(limitValues[j])) {
                    limitFails[j]++;
                    any = true;
                }
            }
            if (any) anyFails++;
        }

        /** Adds a later block: counts add, statistics combine pairwise; an output keeps the kind of its first block. */
        void merge(Part b) {
            computed += b.computed;
            failed += b.failed;
            anyFails += b.anyFails;
            for (int j = 0; j < limitFails.length; j++) limitFails[j] += b.limitFails[j];
            for (Map.Entry<String, Acc> e : b.outputs.entrySet()) {
                Acc mine = outputs.get(e.getKey());
                Acc theirs = e.getValue();
                if (mine == null) {
                    mine = new Acc(theirs.dimension, theirs.absolute);
                    mine.pending = null;
                    outputs.put(e.getKey(), mine);
                }
                if (mine.dimension.equals(theirs.dimension) && mine.absolute == theirs.absolute) mine.merge(theirs);
            }
        }
    }

    /**
     * Counts of values in bins of relative width 2^−10: the bin of x is its IEEE 754 bit pattern,
     * made to order like the numbers (sign bit flipped for x ≥ 0, all bits flipped for x < 0), without
     * its last 42 bits. Bins are kept in pages of 1,024 (one power of two), made when first used.
     */
    static final class Histogram {
        private static final int SHIFT = 52 - BIN_BITS;
        private final long[][] pages = new long[1 << (64 - SHIFT - BIN_BITS)][];

        static long key(double x) {
            long bits = Double.doubleToRawLongBits(x + 0.0); // −0 counts as 0
            return bits < 0 ? ~bits : bits | Long.MIN_VALUE;
        }

        static double value(long key) {
            return Double.longBitsToDouble(key < 0 ? key & Long.MAX_VALUE : ~key);
        }

        void add(double[] xs, int count) {
            for (int i = 0; i < count; i++) {
                long bin = key(xs[i]) >>> SHIFT;
                int page = (int) (bin >>> BIN_BITS);
                long[] p = pages[page];
                if (p == null) pages[page] = p = new long[1 << BIN_BITS];
                p[(int) (bin & ((1 << BIN_BITS) - 1))]++;
            }
        }

        /** The middle of the bin that holds order statistic r (from 0). */
        double valueAt(long r) {
            long seen = 0;
            for (int page = 0; page < pages.length; page++) {
                long[] p = pages[page];
                if (p == null) continue;
                for (int k = 0; k < p.length; k++) {
                    seen += p[k];
                    if (seen > r) {
                        long bin = ((long) page << BIN_BITS) | k;
                        double a = value(bin << SHIFT), b = value(((bin + 1) << SHIFT) - 1);
                        return 0.5 * a + 0.5 * b;
                    }
                }
            }
            throw new IllegalStateException("order statistic " + r + " is beyond the " + seen + " values counted");
        }
    }
}
