package org.ampturn.study;

import org.ampturn.units.Require;
import java.util.Arrays;

/** Small statistics on SI columns that skip NaN (failed runs). */
final class Stats {
    private Stats() {}

    static double[] finite(double[] v) {
        double[] out = new double[v.length];
        int n = 0;
        for (double x : v) if (!Double.isNaN(x)) out[n++] = x;
        return Arrays.copyOf(out, n);
    }

    static double mean(double[] v) {
        double[] f = finite(v);
        if (f.length == 0) return Double.NaN;
        double s = 0;
        for (double x : f) s += x;
        return s / f.length;
    }

    /** Sample standard deviation (divisor n − 1). */
    static double standardDeviation(double[] v) {
        double[] f = finite(v);
        if (f.length < 2) return Double.NaN;
        double m = mean(f);
        double s = 0;
        for (double x : f) s += (x - m) * (x - m);
        return Math.sqrt(s / (f.length - 1));
    }

    /**
     * The p-th percentile (0 to 100) by linear interpolation between order statistics at position
     * (n − 1)·p/100 (Hyndman and Fan, "Sample quantiles in statistical packages", The American
     * Statistician 50(4), 1996, definition 7).
     */
    static double percentile(double[] v, double p) {
        if (!(p >= 0 && p <= 100)) throw Require.fail("percentile must be between 0 and 100, got " + p);
        double[] f = finite(v);
        if (f.length == 0) return Double.NaN;
        Arrays.sort(f);
        double pos = (f.length - 1) * p / 100;
        int i = (int) Math.floor(pos);
        if (i >= f.length - 1) return f[f.length - 1];
        double frac = pos - i;
        // ±∞ stand for missing results counted as the worst case: between two of them, or past a finite one, no ∞ − ∞
        if (frac == 0 || f[i] == f[i + 1]) return f[i];
        if (Double.isInfinite(f[i + 1])) return f[i + 1];
        if (Double.isInfinite(f[i])) return f[i];
        return f[i] + frac * (f[i + 1] - f[i]);
    }
}
