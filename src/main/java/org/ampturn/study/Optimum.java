package org.ampturn.study;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.ampturn.units.Quantity;

/**
 * The result of an {@link Optimisation}: the winning design, its margins to each limit, and the
 * runners-up. When no design meets every limit, the winner is the one closest to meeting them
 * (smallest total relative shortfall) and {@link #isFeasible()} is false.
 */
public final class Optimum {
    private final String problem;
    private final String objective;
    private final boolean maximise;
    private final List<Limit> limits;
    private final Candidate winner;
    private final List<Candidate> runnersUp;
    private final List<Candidate> all;
    private final List<String> parameterNames;
    private final long evaluations;
    private final String method;
    private final boolean complete;

    Optimum(String problem, String objective, boolean maximise, List<Limit> limits, Candidate winner, List<Candidate> runnersUp,
            List<Candidate> all, List<String> parameterNames, long evaluations, String method, boolean complete) {
        this.problem = problem;
        this.objective = objective;
        this.maximise = maximise;
        this.limits = limits;
        this.winner = winner;
        this.runnersUp = runnersUp;
        this.all = all;
        this.parameterNames = parameterNames;
        this.evaluations = evaluations;
        this.method = method;
        this.complete = complete;
    }

    /** The best design found. */
    public Candidate winner() {
        return winner;
    }

    /** The next best designs, best first (distinct combinations of whole numbers and choices). */
    public List<Candidate> runnersUp() {
        return runnersUp;
    }

    /** True when the winner meets every limit. */
    public boolean isFeasible() {
        return winner.isFeasible();
    }

    /** The winner's margin to each limit: positive inside, negative outside. */
    public Map<Limit, Quantity> margins() {
        return winner.margins();
    }

    /** The winner's value of the objective. */
    public Quantity value() {
        return winner.get(objective);
    }

    /** A parameter or output of the winner. */
    public Quantity get(String name) {
        return winner.get(name);
    }

    public List<Limit> limits() {
        return limits;
    }

    /** How many designs were evaluated. */
    public long evaluations() {
        return evaluations;
    }

    /** False when the run was stopped before the search ended. */
    public boolean isComplete() {
        return complete;
    }

    /** The limit the closest design comes nearest to meeting among those it fails, or null when it meets them all. */
    public Limit closestToBeingMet() {
        Limit best = null;
        double bestShort = Double.POSITIVE_INFINITY;
        for (Limit l : winner.failedLimits()) {
            int i = limits.indexOf(l);
            double v = l.bound().si() + (l.isLowerBound() ? winner.margins[i] : -winner.margins[i]);
            double s = -l.relativeMarginAt(v);
            if (s < bestShort) {
                bestShort = s;
                best = l;
            }
        }
        return best;
    }

    /** Every evaluated combination, best first, as a table: the parameters, then the outputs. */
    public Table candidates() {
        Object[][] params = new Object[all.size()][];
        Object[] results = new Object[all.size()];
        for (int i = 0; i < all.size(); i++) {
            Candidate c = all.get(i);
            params[i] = c.point.values();
            if (c.error != null) {
                results[i] = c.error;
            } else {
                Map<String, Object> m = new LinkedHashMap<>(c.outputs);
                m.put("feasible", c.isFeasible() ? "yes" : "no: " + c.failedLimits());
                results[i] = m;
            }
        }
        return Sweep.assemble("candidates of " + problem, parameterNames, params, results, complete ? null : "stopped early");
    }

    @Override
    public String toString() {
        StringBuilder sb = new StringBuilder();
        sb.append(maximise ? "maximise " : "minimise ").append(objective);
        if (!limits.isEmpty()) sb.append(" subject to ").append(String.join(", ", limits.stream().map(Limit::toString).toArray(String[]::new)));
        sb.append(": ").append(method);
        if (!complete) sb.append(" (stopped early: the best so far)");
        sb.append('\n');
        if (winner.isFeasible()) {
            sb.append("  best: ").append(winner).append('\n');
            if (!limits.isEmpty()) sb.append("  margins: ").append(winner.describeMargins()).append('\n');
        } else {
            sb.append("  no design meets every limit. Closest: ").append(winner).append('\n');
            sb.append("  ").append(winner.describeMargins()).append('\n');
            Limit near = closestToBeingMet();
            if (near != null) sb.append("  the failed limit closest to being met: ").append(near).append('\n');
        }
        if (!runnersUp.isEmpty()) {
            sb.append("  runners-up:\n");
            int k = 2;
            for (Candidate c : runnersUp) {
                sb.append("    ").append(k++).append(". ").append(c);
                if (!c.isFeasible() && c.error == null) sb.append("  (fails ").append(new ArrayList<>(c.failedLimits())).append(')');
                sb.append('\n');
            }
        }
        return sb.toString().stripTrailing();
    }
}
