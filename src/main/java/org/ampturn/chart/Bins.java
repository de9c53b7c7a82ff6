package org.ampturn.chart;

import org.ampturn.units.Quantity;

/**
 * Equal-width bins over the finite values. The count of bins is the square root of the number of
 * values, kept between 6 and 60 (the square-root choice, common practice). The axis span also
 * takes in the limits, so a limit far from the data is still drawn.
 */
record Bins(double binLo, double width, int[] counts, int values, int failed, int outside, boolean limited,
            double axisLo, double axisHi) {

    static Bins of(double[] v, double lower, double upper) {
        double lo = Double.POSITIVE_INFINITY, hi = Double.NEGATIVE_INFINITY;
        int n = 0, failed = 0, outside = 0;
        for (double d : v) {
            if (!Double.isFinite(d)) { failed++; continue; }
            n++;
            lo = Math.min(lo, d);
            hi = Math.max(hi, d);
            if ((!Double.isNaN(lower) && d < lower) || (!Double.isNaN(upper) && d > upper)) outside++;
        }
        if (n == 0) throw new IllegalArgumentException("no finite values to bin: all " + v.length + " runs failed (NaN)");
        double bLo = lo, bHi = hi;
        if (bHi == bLo) {
            double pad = bLo == 0 ? 1 : Math.abs(bLo) * 0.01;
            bLo -= pad;
            bHi += pad;
        }
        int k = Math.max(6, Math.min(60, (int) Math.ceil(Math.sqrt(n))));
        double w = (bHi - bLo) / k;
        int[] c = new int[k];
        for (double d : v) {
            if (!Double.isFinite(d)) continue;
            int i = (int) ((d - bLo) / w);
            c[Math.max(0, Math.min(k - 1, i))]++;
        }
        double aLo = bLo, aHi = bHi;
        if (!Double.isNaN(lower)) { aLo = Math.min(aLo, lower); aHi = Math.max(aHi, lower); }
        if (!Double.isNaN(upper)) { aLo = Math.min(aLo, upper); aHi = Math.max(aHi, upper); }
        return new Bins(bLo, w, c, n, failed, outside, !Double.isNaN(lower) || !Double.isNaN(upper), aLo, aHi);
    }

    double maxAbs() { return Math.max(Math.abs(axisLo), Math.abs(axisHi)); }

    String summary() {
        StringBuilder sb = new StringBuilder();
        sb.append(values).append(values == 1 ? " run" : " runs");
        if (limited) {
            sb.append(", ").append(outside).append(" outside the limits (")
              .append(Quantity.number(100.0 * outside / values).format(3)).append(" %)");
        }
        if (failed > 0) sb.append(", ").append(failed).append(" failed (not binned)");
        return sb.toString();
    }
}
