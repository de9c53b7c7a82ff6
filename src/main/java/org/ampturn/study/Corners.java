package org.ampturn.study;

import org.ampturn.units.Require;
import java.util.ArrayList;
import java.util.List;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;

/**
 * The result of a corner analysis: the nominal design, every corner of the tolerance box, and each
 * parameter alone at both ends of its band. The extremes are taken over all of these rows; for an
 * output that is monotonic in each parameter they are the worst cases.
 */
public final class Corners {
    private final Table table;
    private final List<Varied> varied;
    private final List<Limit> limits;
    private final int corners;

    Corners(Table table, List<Varied> varied, List<Limit> limits, int corners) {
        this.table = table;
        this.varied = varied;
        this.limits = limits;
        this.corners = corners;
    }

    /** Every evaluated row: nominal (row 0), the 2^k corners, then each parameter low and high alone. */
    public Table table() {
        return table;
    }

    public List<String> outputNames() {
        return table.outputNames();
    }

    public Dimension dimension(String output) {
        return table.dimension(output);
    }

    /** The output of the nominal design. */
    public Quantity nominal(String output) {
        return table.row(0).get(output);
    }

    /**
     * The smallest value of an output over all rows. A design with no value of the output (it
     * failed, or the result does not exist, such as a pull-in that never happens) counts as the
     * worst case: +∞, or −∞ when the limits bound the output only from below.
     */
    public Quantity min(String output) {
        return extreme(output, false);
    }

    /** The largest value of an output over all rows, a design with no value counted as {@link #min} says. */
    public Quantity max(String output) {
        return extreme(output, true);
    }

    private Quantity extreme(String output, boolean max) {
        double[] v = Worst.filled(table, output, limits);
        double best = Double.NaN;
        for (double x : v) {
            if (Double.isNaN(x)) continue;
            if (Double.isNaN(best) || (max ? x > best : x < best)) best = x;
        }
        if (Double.isNaN(best)) throw new IllegalStateException("no design has a value of " + output);
        return Quantity.of(best, table.dimension(output));
    }

    /** How many designs have no value of an output (each counted as the worst case). */
    public int missing(String output) {
        return Worst.count(table, output);
    }

    /**
     * The row where an output is largest ({@code max}) or smallest; a design with no value of the
     * output, when that counts as the worst case on this side.
     */
    public Row worst(String output, boolean max) {
        int at = missingRow(output);
        if (at >= 0 && max != Worst.lowIsWorst(output, limits)) return table.row(at);
        return table.best(output, max);
    }

    private int missingRow(String output) {
        double[] v = table.values(output);
        for (int i = 0; i < v.length; i++) if (Double.isNaN(v[i]) && Worst.computed(table, i)) return i;
        return -1;
    }

    public List<Limit> limits() {
        return limits;
    }

    /** The rows that fail a limit (or failed to evaluate). */
    public Table failing(Limit limit) {
        Require.present("limit", limit);
        table.column(limit.output());
        limit.checkDimension(table.dimension(limit.output()));
        return table.where(r -> !r.ok() || !limit.isMetAt(r.value(limit.output())));
    }

    /** The rows that fail a limit given as text. */
    public Table failing(String limit) {
        return failing(Limit.parse(limit));
    }

    /** True when every row meets every given limit. */
    public boolean meetsLimits() {
        for (Limit l : limits) if (failing(l).size() > 0) return false;
        return table.failures() == 0;
    }

    /**
     * One-at-a-time sensitivity of an output, largest share first: swing = y(high) − y(low) with the
     * others nominal; share ∝ (swing / 2a · σ)², the first-order variance contribution (GUM, JCGM
     * 100:2008, 5.1.3) with σ of each parameter's spread.
     */
    public List<Sensitivity> sensitivity(String output) {
        double[] y = table.values(output);
        Dimension d = table.dimension(output);
        int k = varied.size();
        double[] contrib = new double[k];
        double[] swing = new double[k];
        double total = 0;
        for (int j = 0; j < k; j++) {
            double lo = y[1 + corners + 2 * j], hi = y[1 + corners + 2 * j + 1];
            swing[j] = hi - lo;
            Varied v = varied.get(j);
            double slope = v.half == 0 ? 0 : swing[j] / (2 * v.half);
            contrib[j] = Math.pow(slope * v.standardDeviation(), 2);
            if (!Double.isNaN(contrib[j])) total += contrib[j];
        }
        List<Sensitivity> out = new ArrayList<>();
        for (int j = 0; j < k; j++) {
            out.add(new Sensitivity(varied.get(j).name, output, Quantity.of(swing[j], d), total > 0 ? contrib[j] / total : Double.NaN));
        }
        out.sort((a, b) -> Double.compare(Double.isNaN(b.share()) ? -1 : b.share(), Double.isNaN(a.share()) ? -1 : a.share()));
        return out;
    }

    @Override
    public String toString() {
        StringBuilder sb = new StringBuilder();
        sb.append("corner analysis of ").append(varied.size()).append(varied.size() == 1 ? " parameter" : " parameters").append(", ")
                .append(table.size()).append(" designs");
        if (!table.isComplete()) sb.append(" (incomplete: stopped early)");
        if (table.failures() > 0) sb.append(", ").append(table.failures()).append(" failed to evaluate");
        sb.append('\n');
        for (Varied v : varied) sb.append("  ").append(v).append('\n');
        for (String o : outputNames()) {
            if (!table.isNumeric(o)) continue;
            try {
                sb.append("  ").append(o).append(": nominal ").append(nominal(o)).append(", from ").append(min(o)).append(" to ").append(max(o));
                int none = missing(o);
                if (none > 0) sb.append(" (").append(none).append(none == 1 ? " design has" : " designs have").append(" no value, counted as the worst case)");
                List<Sensitivity> s = sensitivity(o);
                if (!s.isEmpty() && !Double.isNaN(s.get(0).share())) {
                    sb.append("; most sensitive to ");
                    for (int i = 0; i < Math.min(3, s.size()); i++) {
                        if (i > 0) sb.append(", ");
                        sb.append(s.get(i).parameter()).append(String.format(java.util.Locale.ROOT, " %.0f %%", 100 * s.get(i).share()));
                    }
                }
            } catch (IllegalStateException e) {
                sb.append("  ").append(o).append(": no value");
            }
            sb.append('\n');
        }
        for (Limit l : limits) {
            int bad = failing(l).size();
            sb.append("  ").append(l).append(": ");
            if (bad == 0) sb.append("met by every design");
            else {
                Quantity w = l.isLowerBound() ? min(l.output()) : max(l.output());
                sb.append(bad).append(" of ").append(table.size()).append(" designs fail; worst ").append(w);
            }
            sb.append('\n');
        }
        return sb.toString().stripTrailing();
    }
}
