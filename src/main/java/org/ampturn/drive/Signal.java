package org.ampturn.drive;

import java.util.Arrays;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;

/**
 * A sampled quantity over time: a name, a dimension, and SI samples {@code values[k]} at
 * {@code times[k]} (seconds, non-decreasing). Immutable; the accessors return copies.
 *
 * <p>{@link #at(Quantity)} interpolates linearly between samples. {@link #mean()} and {@link #rms()}
 * are time averages by the trapezoidal rule over the sampled span, so they are only as good as the
 * sampling (a PWM wave sampled twice a period has no meaningful mean; use the Transient's metrics,
 * which the solver computes from the exact switching instants).
 */
public final class Signal {
    private final String name;
    private final Dimension dimension;
    private final double[] times;
    private final double[] values;

    private Signal(String name, Dimension dimension, double[] times, double[] values) {
        this.name = name;
        this.dimension = dimension;
        this.times = times;
        this.values = values;
    }

    /** A signal from SI samples; the arrays are copied. Times must be finite and non-decreasing. */
    public static Signal of(String name, Dimension dimension, double[] times, double[] values) {
        if (name == null || name.isBlank()) throw Require.fail("a signal needs a name");
        if (dimension == null) throw Require.fail("signal " + name + " needs a dimension");
        Require.present("times of signal " + name, times);
        Require.present("values of signal " + name, values);
        if (times.length != values.length) {
            throw Require.fail("signal " + name + ": " + times.length + " times but " + values.length + " values");
        }
        if (times.length == 0) throw Require.fail("signal " + name + " has no samples");
        for (int k = 0; k < times.length; k++) {
            if (!Double.isFinite(times[k]) || (k > 0 && times[k] < times[k - 1])) {
                throw Require.fail("signal " + name + ": time " + k + " (" + times[k] + " s) is not finite and non-decreasing");
            }
            if (!Double.isFinite(values[k])) throw Require.fail("signal " + name + ": value " + k + " (" + values[k] + ") is not finite");
        }
        return new Signal(name, dimension, times.clone(), values.clone());
    }

    /** Package use: wraps arrays the caller will not touch again. */
    static Signal wrap(String name, Dimension dimension, double[] times, double[] values) {
        return new Signal(name, dimension, times, values);
    }

    public String name() { return name; }
    public Dimension dimension() { return dimension; }
    public double[] times() { return times.clone(); }
    public double[] values() { return values.clone(); }
    public int size() { return times.length; }

    /** Package use: the arrays themselves, for writers that only read them. */
    double[] timesShared() { return times; }
    double[] valuesShared() { return values; }

    /** Start of the sampled span. */
    public Quantity start() { return Quantity.of(times[0], Dimension.TIME); }

    /** End of the sampled span. */
    public Quantity end() { return Quantity.of(times[times.length - 1], Dimension.TIME); }

    private Quantity q(double v) {
        return Quantity.of(v, dimension);
    }

    /** SI kernel of {@link #at(Quantity)}. */
    public double valueAt(double time) {
        Require.finite("time (s)", time);
        double seconds = time + 0.0; // -0.0 is 0.0 here: the binary search tells them apart
        if (!(seconds >= times[0] && seconds <= times[times.length - 1])) {
            throw Require.fail("time (" + Quantity.of(seconds, Dimension.TIME) + ") must be within the signal "
                    + name + ", from " + start() + " to " + end());
        }
        int k = Arrays.binarySearch(times, seconds);
        if (k >= 0) {
            // on a duplicated time (a jump) take the value after the jump
            while (k + 1 < times.length && times[k + 1] == seconds) k++;
            return Require.result("value", values[k]);
        }
        int hi = -k - 1;
        int lo = hi - 1;
        double f = (seconds - times[lo]) / (times[hi] - times[lo]);
        return Require.result("value", values[lo] + f * (values[hi] - values[lo]));
    }

    /** The value at a time, interpolated linearly between samples. */
    public Quantity at(Quantity time) {
        return q(valueAt(Require.si("time", time, Dimension.TIME)));
    }

    /** The largest sample. */
    public Quantity peak() {
        double m = Double.NEGATIVE_INFINITY;
        for (double v : values) m = Math.max(m, v);
        return q(m);
    }

    /** Time of the largest sample (the first, if several are equal). */
    public Quantity peakTime() {
        int best = 0;
        for (int k = 1; k < values.length; k++) if (values[k] > values[best]) best = k;
        return Quantity.of(times[best], Dimension.TIME);
    }

    /** The smallest sample. */
    public Quantity min() {
        double m = Double.POSITIVE_INFINITY;
        for (double v : values) m = Math.min(m, v);
        return q(m);
    }

    /** The last sample. */
    public Quantity last() { return q(values[values.length - 1]); }

    /** Time average over the whole span (trapezoidal rule). */
    public Quantity mean() {
        return q(meanBetween(times[0], times[times.length - 1], false));
    }

    /** Time average between two times (trapezoidal rule on the samples, interpolated at the ends). */
    public Quantity mean(Quantity from, Quantity to) {
        double a = Require.si("from", from, Dimension.TIME);
        double b = Require.si("to", to, Dimension.TIME);
        if (!(b > a)) throw Require.fail("to (" + to + ") must be after from (" + from + ")");
        valueAt(a);
        valueAt(b);
        return q(meanBetween(a, b, false));
    }

    /** Root mean square over the whole span (trapezoidal rule on the squared samples). */
    public Quantity rms() {
        return q(Require.result("rms", Math.sqrt(meanBetween(times[0], times[times.length - 1], true))));
    }

    private double meanBetween(double a, double b, boolean squared) {
        if (times.length == 1 || b == a) {
            double v = valueAt(a);
            return squared ? v * v : v;
        }
        double sum = 0;
        double tPrev = a;
        double vPrev = valueAt(a);
        if (squared) vPrev *= vPrev;
        for (int k = 0; k < times.length; k++) {
            if (times[k] <= a) continue;
            double t = Math.min(times[k], b);
            double v = t == times[k] ? values[k] : valueAt(t);
            if (squared) v *= v;
            sum += 0.5 * (v + vPrev) * (t - tPrev);
            tPrev = t;
            vPrev = v;
            if (times[k] >= b) break;
        }
        return sum / (b - a);
    }

    /** The signal as CSV: {@code time (s)} and this signal with its SI unit, one row per sample. */
    public String toCsv() {
        return SignalCsv.text(java.util.List.of(this));
    }

    /** Writes {@link #toCsv()} to a file atomically with the user's normal permissions; returns the absolute path. */
    public java.nio.file.Path saveCsv(String path) {
        return SignalCsv.save(path, java.util.List.of(this));
    }

    /** One line: name, size and peak. */
    @Override
    public String toString() {
        return name + ": " + size() + " samples from " + start() + " to " + end() + ", peak " + peak() + ", last " + last();
    }
}
