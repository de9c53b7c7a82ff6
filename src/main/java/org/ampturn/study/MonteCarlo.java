package org.ampturn.study;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apache.commons.math3.stat.regression.OLSMultipleLinearRegression;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;

/**
 * The result of a Monte Carlo tolerance run: the inputs and outputs of every run (SI), their
 * statistics, the fraction that fails each limit and the sensitivity of each output.
 */
public final class MonteCarlo {
    private final Table table;
    private final List<Varied> varied;
    private final List<Limit> limits;
    private final long seed;
    private final double[][] inputs;

    MonteCarlo(Table table, List<Varied> varied, List<Limit> limits, long seed, double[][] inputs) {
        this.table = table;
        this.varied = varied;
        this.limits = limits;
        this.seed = seed;
        this.inputs = inputs;
    }

    /** Every run as a row: the drawn parameters, then the outputs; failed runs carry their error. */
    public Table table() {
        return table;
    }

    public int runs() {
        return table.size();
    }

    public long seed() {
        return seed;
    }

    public boolean isComplete() {
        return table.isComplete();
    }

    public List<String> outputNames() {
        return table.outputNames();
    }

    public List<String> parameterNames() {
        return table.parameterNames();
    }

    public List<Limit> limits() {
        return limits;
    }

    /** The SI values of an output, one per run; NaN where a run failed or was not computed. */
    public double[] values(String output) {
        requireOutput(output);
        return table.values(output);
    }

    /** The SI values drawn for a parameter, one per run. */
    public double[] inputs(String parameter) {
        int j = parameterNames().indexOf(parameter);
        if (j < 0) throw Require.fail("no parameter named " + Require.quote(parameter) + "; the parameters are " + Require.names(parameterNames()));
        return inputs[j].clone();
    }

    public Dimension dimension(String output) {
        requireOutput(output);
        return table.dimension(output);
    }

    /** The mean over the runs that have a value of the output ({@link #missing} says how many do not). */
    public Quantity mean(String output) {
        return q(output, Stats.mean(values(output)));
    }

    /** Sample standard deviation (n − 1) over the runs that have a value of the output. */
    public Quantity standardDeviation(String output) {
        return q(output, Stats.standardDeviation(values(output)));
    }

    /**
     * The p-th percentile, p from 0 to 100 (Hyndman and Fan 1996, definition 7). A run with no value
     * of the output (it failed, or the result does not exist, such as a pull-in that never happens)
     * counts as the worst case: +∞, or −∞ when the study's limits bound the output only from below.
     */
    public Quantity percentile(String output, double p) {
        requireOutput(output);
        return q(output, Stats.percentile(Worst.filled(table, output, limits), p));
    }

    /** How many computed runs have no value of an output (each counted as the worst case). */
    public int missing(String output) {
        requireOutput(output);
        return Worst.count(table, output);
    }

    /** The smallest value; −∞ when a run without a value counts as low (see {@link #percentile}). */
    public Quantity min(String output) {
        return percentile(output, 0);
    }

    /** The largest value; +∞ when a run without a value counts as high (see {@link #percentile}). */
    public Quantity max(String output) {
        return percentile(output, 100);
    }

    /** The fraction of the computed runs that fail a limit; a run that failed to evaluate counts as failing. */
    public double fractionFailing(Limit limit) {
        Require.present("limit", limit);
        requireOutput(limit.output());
        limit.checkDimension(table.dimension(limit.output()));
        double[] v = table.values(limit.output());
        int n = 0, bad = 0;
        for (int i = 0; i < v.length; i++) {
            if (!computed(i)) continue;
            n++;
            if (!limit.isMetAt(v[i])) bad++;
        }
        return n == 0 ? Double.NaN : (double) bad / n;
    }

    /** The fraction failing a limit given as text: {@code fractionFailing("I >= 2 A")}. */
    public double fractionFailing(String limit) {
        return fractionFailing(Limit.parse(limit));
    }

    /** The fraction of the computed runs that fail any of the given limits (or failed to evaluate). */
    public double fractionFailing() {
        if (limits.isEmpty()) throw new IllegalStateException("no limits were given; add them with limit(\"I >= 2 A\") or pass one here");
        int n = 0, bad = 0;
        double[][] cols = new double[limits.size()][];
        for (int j = 0; j < limits.size(); j++) cols[j] = values(limits.get(j).output());
        for (int i = 0; i < runs(); i++) {
            if (!computed(i)) continue;
            n++;
            for (int j = 0; j < limits.size(); j++) {
                if (!limits.get(j).isMetAt(cols[j][i])) {
                    bad++;
                    break;
                }
            }
        }
        return n == 0 ? Double.NaN : (double) bad / n;
    }

    /**
     * Sensitivity of an output, largest share first, from a least-squares linear fit of the output
     * on the inputs over the runs (standardised regression coefficients): share ∝ (β σ_x)², swing =
     * β·(high − low). Exact for a linear model; a first-order picture otherwise.
     */
    public List<Sensitivity> sensitivity(String output) {
        double[] y = values(output);
        int k = varied.size();
        int n = 0;
        for (int i = 0; i < y.length; i++) if (!Double.isNaN(y[i])) n++;
        double[] ys = new double[n];
        double[][] xs = new double[n][k];
        int r = 0;
        double[] mean = new double[k], scale = new double[k];
        for (int j = 0; j < k; j++) {
            mean[j] = Stats.mean(inputs[j]);
            double sd = Stats.standardDeviation(inputs[j]);
            scale[j] = sd > 0 ? sd : 1;
        }
        for (int i = 0; i < y.length; i++) {
            if (Double.isNaN(y[i])) continue;
            ys[r] = y[i];
            for (int j = 0; j < k; j++) xs[r][j] = (inputs[j][i] - mean[j]) / scale[j];
            r++;
        }
        double[] beta = new double[k];
        boolean fitted = false;
        if (n > k + 1) {
            try {
                OLSMultipleLinearRegression ols = new OLSMultipleLinearRegression();
                ols.newSampleData(ys, xs);
                double[] b = ols.estimateRegressionParameters();
                for (int j = 0; j < k; j++) beta[j] = b[j + 1];
                fitted = true;
            } catch (IllegalArgumentException e) { // includes a singular matrix
                fitted = false;
            }
        }
        double total = 0;
        double[] contrib = new double[k];
        for (int j = 0; j < k; j++) {
            contrib[j] = fitted && Stats.standardDeviation(inputs[j]) > 0 ? beta[j] * beta[j] : 0;
            total += contrib[j];
        }
        Dimension d = table.dimension(output);
        List<Sensitivity> out = new ArrayList<>();
        for (int j = 0; j < k; j++) {
            double slope = fitted && Stats.standardDeviation(inputs[j]) > 0 ? beta[j] / scale[j] : 0;
            out.add(new Sensitivity(varied.get(j).name, output, Quantity.of(slope * 2 * varied.get(j).half, d),
                    total > 0 ? contrib[j] / total : Double.NaN));
        }
        out.sort((a, b) -> Double.compare(Double.isNaN(b.share()) ? -1 : b.share(), Double.isNaN(a.share()) ? -1 : a.share()));
        return out;
    }

    private boolean computed(int i) {
        String e = table.error(i);
        return e == null || !e.startsWith("not computed");
    }

    private Quantity q(String output, double si) {
        Dimension d = table.dimension(output);
        return Quantity.of(si, d);
    }

    private void requireOutput(String output) {
        if (!outputNames().contains(output)) {
            throw Require.fail("no output named " + Require.quote(output) + "; the outputs are " + Require.names(outputNames()));
        }
        if (!table.isNumeric(output)) throw Require.fail("output " + output + " holds labels, not numbers");
    }

    @Override
    public String toString() {
        StringBuilder sb = new StringBuilder();
        sb.append("Monte Carlo of ").append(runs()).append(" runs, seed ").append(seed);
        if (!isComplete()) sb.append(" (incomplete: ").append(table.incompleteNote().replace("points", "runs")).append(')');
        int errors = 0;
        for (int i = 0; i < runs(); i++) if (table.error(i) != null && computed(i)) errors++;
        if (errors > 0) sb.append(", ").append(errors).append(" failed to evaluate");
        sb.append('\n');
        for (Varied v : varied) sb.append("  ").append(v).append('\n');
        for (String o : outputNames()) {
            if (!table.isNumeric(o)) continue;
            int none = missing(o);
            sb.append("  ").append(o).append(": ");
            if (none > 0) {
                sb.append(none).append(none == 1 ? " run has" : " runs have").append(" no value, counted as ")
                        .append(Quantity.of(Worst.missing(o, limits), table.dimension(o))).append("; ");
            }
            sb.append("mean ").append(mean(o)).append(", σ ").append(standardDeviation(o))
                    .append("; 0.1 % ").append(percentile(o, 0.1)).append(", 50 % ").append(percentile(o, 50))
                    .append(", 99.9 % ").append(percentile(o, 99.9));
            List<Sensitivity> s = sensitivity(o);
            if (!s.isEmpty() && !Double.isNaN(s.get(0).share())) {
                sb.append("; most sensitive to ");
                for (int i = 0; i < Math.min(3, s.size()); i++) {
                    if (i > 0) sb.append(", ");
                    sb.append(s.get(i).parameter()).append(String.format(Locale.ROOT, " %.0f %%", 100 * s.get(i).share()));
                }
            }
            sb.append('\n');
        }
        for (Limit l : limits) {
            sb.append("  ").append(l).append(": ").append(String.format(Locale.ROOT, "%.3g %% of runs fail", 100 * fractionFailing(l))).append('\n');
        }
        return sb.toString().stripTrailing();
    }
}
