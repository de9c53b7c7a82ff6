package org.ampturn.study;

import java.util.List;

/**
 * How a tolerance study counts a run whose output has no value (the valve never pulls in, the
 * function failed): as the worst case. The worst side of an output is low when the study's limits
 * bound it only from below ({@code "F >= 2 N"}), else high; so a missing time is "never", +∞, and a
 * missing force under a lower limit is −∞. Corners, percentiles, min, max and the summaries all
 * read the output through {@link #filled}.
 */
final class Worst {
    private Worst() {}

    /** True when only lower bounds constrain the output: the low side is the worst. */
    static boolean lowIsWorst(String output, List<Limit> limits) {
        boolean lower = false, upper = false;
        for (Limit l : limits) {
            if (!l.output().equals(output)) continue;
            if (l.isLowerBound()) lower = true;
            else upper = true;
        }
        return lower && !upper;
    }

    /** The value that stands for a missing one: −∞ or +∞. */
    static double missing(String output, List<Limit> limits) {
        return lowIsWorst(output, limits) ? Double.NEGATIVE_INFINITY : Double.POSITIVE_INFINITY;
    }

    /** The values with each missing one (NaN) of a computed row replaced by the worst case; rows not computed stay NaN. */
    static double[] filled(Table t, String output, List<Limit> limits) {
        double[] v = t.values(output);
        double w = missing(output, limits);
        for (int i = 0; i < v.length; i++) if (Double.isNaN(v[i]) && computed(t, i)) v[i] = w;
        return v;
    }

    /** How many computed rows have no value of the output. */
    static int count(Table t, String output) {
        double[] v = t.values(output);
        int n = 0;
        for (int i = 0; i < v.length; i++) if (Double.isNaN(v[i]) && computed(t, i)) n++;
        return n;
    }

    /** False for a row that a stopped study never reached. */
    static boolean computed(Table t, int i) {
        String e = t.error(i);
        return e == null || !e.startsWith("not computed");
    }
}
