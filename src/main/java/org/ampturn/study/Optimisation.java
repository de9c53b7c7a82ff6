package org.ampturn.study;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.function.Function;
import org.apache.commons.math3.optim.InitialGuess;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.SimpleBounds;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.nonlinear.scalar.ObjectiveFunction;
import org.apache.commons.math3.optim.nonlinear.scalar.noderiv.BOBYQAOptimizer;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;
import org.apache.commons.math3.exception.TooManyEvaluationsException;
import org.ampturn.units.Require;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;

/**
 * Finds the design that minimises (or maximises) one output of a function, over parameters with
 * bounds ({@link Param}), subject to limits on other outputs ({@link Limit}).
 *
 * <ul>
 * <li>Real parameters: Powell's BOBYQA (two or more; Commons Math {@code BOBYQAOptimizer}) or
 *     Brent's line search (one; {@code BrentOptimizer}) on the objective plus a quadratic penalty
 *     on the relative shortfall of each limit, with the penalty raised in three rounds. The answer
 *     is the best design actually evaluated that meets every limit, so it never lies outside one.</li>
 * <li>Whole numbers and choices: every combination when there are at most
 *     {@link #withExhaustiveLimit(int) 2000} (each with its own real search), else every
 *     combination of the choices with a compass search over the whole numbers: a coarse grid, then
 *     steps of ±s in each, halved down to 1. That search finds the optimum of a unimodal problem;
 *     raise the exhaustive limit when in doubt.</li>
 * </ul>
 * Ranking: designs that meet every limit first, by objective; then the rest by their total relative
 * shortfall; failed evaluations last.
 */
public final class Optimisation {
    private static final double[] PENALTIES = {1e2, 1e4, 1e6};

    private final String objective;
    private final boolean maximise;
    private final List<Param> params;
    private final List<Limit> limits;
    private final int threads;
    private final Progress progress;
    private final int exhaustiveLimit;
    private final int runnersUp;

    private Optimisation(String objective, boolean maximise, List<Param> params, List<Limit> limits, int threads,
                         Progress progress, int exhaustiveLimit, int runnersUp) {
        this.objective = objective;
        this.maximise = maximise;
        this.params = params;
        this.limits = limits;
        this.threads = threads;
        this.progress = progress;
        this.exhaustiveLimit = exhaustiveLimit;
        this.runnersUp = runnersUp;
    }

    /** Find the smallest value of the output {@code objective}. */
    public static Optimisation minimise(String objective) {
        Axis.checkName(objective);
        return new Optimisation(objective, false, List.of(), List.of(), Runner.CORES, null, 2000, 5);
    }

    /** Find the largest value of the output {@code objective}. */
    public static Optimisation maximise(String objective) {
        Axis.checkName(objective);
        return new Optimisation(objective, true, List.of(), List.of(), Runner.CORES, null, 2000, 5);
    }

    /** A copy with more parameters to vary. */
    public Optimisation over(Param... more) {
        Require.present("more", more);
        List<Param> ps = new ArrayList<>(params);
        for (Param p : more) {
            Require.present("parameter", p);
            for (Param q : ps) if (q.name.equals(p.name)) throw Require.fail("parameter " + p.name + " is given twice");
            ps.add(p);
        }
        return new Optimisation(objective, maximise, List.copyOf(ps), limits, threads, progress, exhaustiveLimit, runnersUp);
    }

    /** A copy with more limits, as text: {@code subjectTo("L >= 1 mH", "B <= 0.3 T")}. */
    public Optimisation subjectTo(String... more) {
        Require.present("more", more);
        Limit[] ls = new Limit[more.length];
        for (int i = 0; i < more.length; i++) ls[i] = Limit.parse(more[i]);
        return subjectTo(ls);
    }

    /** A copy with more limits. */
    public Optimisation subjectTo(Limit... more) {
        Require.present("more", more);
        List<Limit> ls = new ArrayList<>(limits);
        for (Limit l : more) ls.add(Require.present("limit", l));
        return new Optimisation(objective, maximise, params, List.copyOf(ls), threads, progress, exhaustiveLimit, runnersUp);
    }

    public Optimisation withThreads(int n) {
        return new Optimisation(objective, maximise, params, limits, Runner.checkThreads(n), progress, exhaustiveLimit, runnersUp);
    }

    public Optimisation withProgress(Progress listener) {
        return new Optimisation(objective, maximise, params, limits, threads, Require.present("progress listener", listener), exhaustiveLimit, runnersUp);
    }

    /** A copy that tries every combination of whole numbers and choices when there are at most {@code n}. */
    public Optimisation withExhaustiveLimit(int n) {
        if (n < 1) throw Require.fail("the exhaustive limit must be at least 1, got " + n);
        return new Optimisation(objective, maximise, params, limits, threads, progress, n, runnersUp);
    }

    /** A copy that keeps {@code n} runners-up (5 unless changed). */
    public Optimisation withRunnersUp(int n) {
        if (n < 0) throw Require.fail("the number of runners-up must be zero or more, got " + n);
        return new Optimisation(objective, maximise, params, limits, threads, progress, exhaustiveLimit, n);
    }

    /** Runs the search; {@code f} returns the objective and the limited outputs ({@link Outputs}, a Map, or one quantity). */
    public Optimum run(Function<Point, ?> f) {
        Require.present("function", f);
        if (params.isEmpty()) throw Require.fail("nothing to optimise: give the parameters with over(Param...)");
        return Runner.guarded(() -> new Search(f).run());
    }

    @Override
    public String toString() {
        return (maximise ? "maximise " : "minimise ") + objective + " over " + params + (limits.isEmpty() ? "" : " subject to " + limits);
    }

    // ---- the search ------------------------------------------------------------------------

    private static final class Stop extends RuntimeException {
        private static final long serialVersionUID = 1L;

        Stop() {
            super(null, null, false, false);
        }
    }

    private final class Search {
        final Function<Point, ?> f;
        final List<String> names = new ArrayList<>();
        final Map<String, Integer> index = new HashMap<>();
        final int[] reals;
        final int[] discrete;
        final java.util.concurrent.atomic.AtomicLong evaluations = new java.util.concurrent.atomic.AtomicLong();
        volatile Runner.Control control;

        Search(Function<Point, ?> f) {
            this.f = f;
            List<Integer> r = new ArrayList<>(), d = new ArrayList<>();
            for (int i = 0; i < params.size(); i++) {
                names.add(params.get(i).name);
                index.put(params.get(i).name, i);
                (params.get(i).kind == Param.Kind.REAL ? r : d).add(i);
            }
            reals = r.stream().mapToInt(Integer::intValue).toArray();
            discrete = d.stream().mapToInt(Integer::intValue).toArray();
        }

        Optimum run() {
            long combos = 1;
            for (int k : discrete) combos = Math.min(Long.MAX_VALUE / 4, combos * params.get(k).count());
            List<Candidate> all = new ArrayList<>();
            boolean complete;
            String method;
            if (combos <= exhaustiveLimit) {
                int n = (int) combos;
                Candidate[] found = new Candidate[n];
                Runner.Outcome o = Runner.run((maximise ? "maximising " : "minimising ") + objective, n, 1, threads, progress, (b, lo, hi, c) -> {
                    control = c;
                    for (int i = lo; i < hi; i++) {
                        try {
                            found[i] = searchReals(discreteValues(i));
                        } catch (Stop s) {
                            return i - lo;
                        }
                        if (c.tick(1)) return i + 1 - lo;
                    }
                    return hi - lo;
                });
                for (Candidate c : found) if (c != null) all.add(c);
                complete = o.complete();
                method = discrete.length == 0 ? "continuous search" : "every one of " + n + " combinations";
            } else {
                long choiceCombos = 1;
                List<Integer> choiceIdx = new ArrayList<>(), intIdx = new ArrayList<>();
                for (int k : discrete) (params.get(k).kind == Param.Kind.CHOICE ? choiceIdx : intIdx).add(k);
                for (int k : choiceIdx) choiceCombos *= params.get(k).count();
                if (choiceCombos > exhaustiveLimit) {
                    throw Require.fail("the choices give " + choiceCombos + " combinations, more than the exhaustive limit of "
                            + exhaustiveLimit + "; shorten the lists or raise it with withExhaustiveLimit(n)");
                }
                int n = (int) choiceCombos;
                @SuppressWarnings("unchecked") List<Candidate>[] found = new List[n];
                Runner.Outcome o = Runner.run((maximise ? "maximising " : "minimising ") + objective, n, 1, threads, progress, (b, lo, hi, c) -> {
                    control = c;
                    for (int i = lo; i < hi; i++) {
                        List<Candidate> got = new ArrayList<>();
                        found[i] = got;
                        try {
                            compass(i, choiceIdx, intIdx, got);
                        } catch (Stop s) {
                            return i - lo;
                        }
                        if (c.tick(1)) return i + 1 - lo;
                    }
                    return hi - lo;
                });
                for (List<Candidate> l : found) if (l != null) all.addAll(l);
                complete = o.complete();
                method = "compass search over " + intIdx.size() + (intIdx.size() == 1 ? " whole number" : " whole numbers")
                        + (n > 1 ? " for each of " + n + " combinations of choices" : "");
            }
            all.sort(ranking());
            if (all.isEmpty()) throw new IllegalStateException("the optimisation was stopped before any design was evaluated");
            if (all.get(0).error != null) {
                throw new IllegalStateException("every evaluation failed (" + evaluations.get() + " tried); the first error: " + all.get(0).error);
            }
            int keep = Math.min(all.size(), 1 + runnersUp);
            return new Optimum(Optimisation.this.toString(), objective, maximise, limits, all.get(0), List.copyOf(all.subList(1, keep)),
                    List.copyOf(all), names, evaluations.get(), method, complete);
        }

        /** The values of the discrete parameters for combination number {@code i} (the first varies slowest). */
        Object[] discreteValues(long i) {
            Object[] v = new Object[params.size()];
            for (int j = discrete.length - 1; j >= 0; j--) {
                Param p = params.get(discrete[j]);
                long c = p.count();
                v[discrete[j]] = p.valueAt(p.lo + (i % c));
                i /= c;
            }
            return v;
        }

        void compass(int choiceCombo, List<Integer> choiceIdx, List<Integer> intIdx, List<Candidate> out) {
            Object[] base = new Object[params.size()];
            long r = choiceCombo;
            for (int j = choiceIdx.size() - 1; j >= 0; j--) {
                Param p = params.get(choiceIdx.get(j));
                base[choiceIdx.get(j)] = p.valueAt(r % p.count());
                r /= p.count();
            }
            int k = intIdx.size();
            int perDim = Math.max(2, (int) Math.floor(Math.pow(729, 1.0 / k)));
            Map<List<Integer>, Candidate> seen = new LinkedHashMap<>();
            Function<int[], Candidate> at = x -> seen.computeIfAbsent(toList(x), key -> {
                Object[] v = base.clone();
                for (int j = 0; j < k; j++) v[intIdx.get(j)] = x[j];
                return searchReals(v);
            });
            int[] g = new int[k];
            int[] lo = new int[k], hi = new int[k], step = new int[k];
            long grid = 1;
            for (int j = 0; j < k; j++) {
                Param p = params.get(intIdx.get(j));
                lo[j] = (int) p.lo;
                hi[j] = (int) p.hi;
                g[j] = (int) Math.min(perDim, p.count());
                step[j] = Math.max(1, (int) ((p.count() - 1) / Math.max(1, g[j] - 1) / 2));
                grid *= g[j];
            }
            Comparator<Candidate> rank = ranking();
            Candidate best = null;
            int[] bestX = null;
            for (long gi = 0; gi < grid; gi++) {
                int[] x = new int[k];
                long rem = gi;
                for (int j = k - 1; j >= 0; j--) {
                    int m = (int) (rem % g[j]);
                    rem /= g[j];
                    x[j] = g[j] == 1 ? lo[j] : (int) Math.round(lo[j] + (double) (hi[j] - lo[j]) * m / (g[j] - 1));
                }
                Candidate c = at.apply(x);
                if (best == null || rank.compare(c, best) < 0) {
                    best = c;
                    bestX = x;
                }
            }
            while (true) {
                int[] moveTo = null;
                for (int j = 0; j < k; j++) {
                    for (int sgn = -1; sgn <= 1; sgn += 2) {
                        int[] x = bestX.clone();
                        x[j] = Math.max(lo[j], Math.min(hi[j], x[j] + sgn * step[j]));
                        if (x[j] == bestX[j]) continue;
                        Candidate c = at.apply(x);
                        if (rank.compare(c, best) < 0) {
                            best = c;
                            moveTo = x;
                        }
                    }
                }
                if (moveTo != null) {
                    bestX = moveTo;
                    continue;
                }
                boolean allOne = true;
                for (int j = 0; j < k; j++) {
                    if (step[j] > 1) allOne = false;
                    step[j] = Math.max(1, step[j] / 2);
                }
                if (allOne) break;
            }
            out.addAll(seen.values());
        }

        private List<Integer> toList(int[] x) {
            List<Integer> l = new ArrayList<>(x.length);
            for (int v : x) l.add(v);
            return l;
        }

        /** The best design with the discrete values fixed, searching the real parameters. */
        Candidate searchReals(Object[] fixed) {
            int m = reals.length;
            if (m == 0) return evaluate(fixed);
            Candidate[] best = new Candidate[1];
            Comparator<Candidate> rank = ranking();
            double[] lo = new double[m], span = new double[m];
            for (int j = 0; j < m; j++) {
                Param p = params.get(reals[j]);
                lo[j] = p.lo;
                span[j] = p.hi - p.lo;
            }
            double[] mu = new double[1];
            double[] scale = {Double.NaN};
            java.util.function.ToDoubleFunction<double[]> merit = u -> {
                Object[] v = fixed.clone();
                for (int j = 0; j < m; j++) {
                    double uj = Math.max(0, Math.min(1, u[j]));
                    v[reals[j]] = params.get(reals[j]).valueAt(lo[j] + uj * span[j]);
                }
                Candidate c = evaluate(v);
                synchronized (best) {
                    if (best[0] == null || rank.compare(c, best[0]) < 0) best[0] = c;
                }
                return meritOf(c, mu[0], scale);
            };
            // a coarse look first, so that the local searches start near the best region
            mu[0] = PENALTIES[0];
            double[] start = new double[m];
            Arrays.fill(start, 0.5);
            int perDim = m == 1 ? 21 : m == 2 ? 7 : m == 3 ? 4 : 1;
            if (perDim > 1) {
                double bestMerit = Double.POSITIVE_INFINITY;
                int total = (int) Math.pow(perDim, m);
                for (int gi = 0; gi < total; gi++) {
                    double[] u = new double[m];
                    int rem = gi;
                    for (int j = 0; j < m; j++) {
                        u[j] = (rem % perDim + 0.5) / perDim;
                        rem /= perDim;
                    }
                    double v = merit.applyAsDouble(u);
                    if (v < bestMerit) {
                        bestMerit = v;
                        start = u;
                    }
                }
            }
            for (double penalty : PENALTIES) {
                mu[0] = penalty;
                try {
                    if (m == 1) {
                        double w = 1.0 / 21;
                        double a = Math.max(0, start[0] - w), b = Math.min(1, start[0] + w);
                        double[] s = start;
                        var r = new BrentOptimizer(1e-10, 1e-14).optimize(new MaxEval(400),
                                new UnivariateObjectiveFunction(x -> merit.applyAsDouble(new double[] {x})), GoalType.MINIMIZE,
                                new SearchInterval(a, b, Math.max(a, Math.min(b, s[0]))));
                        start = new double[] {r.getPoint()};
                    } else {
                        double[] zeros = new double[m], ones = new double[m];
                        Arrays.fill(ones, 1);
                        double[] s0 = start.clone();
                        for (int j = 0; j < m; j++) s0[j] = Math.max(1e-3, Math.min(1 - 1e-3, s0[j]));
                        var r = new BOBYQAOptimizer(2 * m + 1, 0.2, 1e-9).optimize(new MaxEval(3000),
                                new ObjectiveFunction(merit::applyAsDouble), GoalType.MINIMIZE, new InitialGuess(s0), new SimpleBounds(zeros, ones));
                        start = r.getPoint();
                    }
                } catch (TooManyEvaluationsException e) {
                    // keep the best design seen so far
                }
            }
            return best[0];
        }

        double meritOf(Candidate c, double mu, double[] scale) {
            if (c.error != null) return 1e12;
            double s = scale[0];
            if (Double.isNaN(s)) {
                s = Math.abs(c.objective) > 0 ? Math.abs(c.objective) : 1;
                scale[0] = s;
            }
            double pen = 0;
            for (int i = 0; i < limits.size(); i++) {
                double r = limits.get(i).relativeMarginAt(
                        limits.get(i).bound().si() + (limits.get(i).isLowerBound() ? c.margins[i] : -c.margins[i]));
                if (r < 0) pen += r * r;
            }
            return (maximise ? -c.objective : c.objective) / s + mu * pen;
        }

        Candidate evaluate(Object[] values) {
            Runner.Control c = control;
            if (c != null && c.stopped()) throw new Stop();
            evaluations.incrementAndGet();
            Point p = new Point(names, index, values);
            double[] margins = new double[limits.size()];
            Arrays.fill(margins, Double.NaN);
            try {
                Map<String, Object> out = new LinkedHashMap<>(Outputs.from(f.apply(p), objective));
                double obj = numberOf(out, objective, null);
                double violation = 0;
                for (int i = 0; i < limits.size(); i++) {
                    Limit l = limits.get(i);
                    double v = numberOf(out, l.output(), l.bound().dimension());
                    margins[i] = l.marginAt(v);
                    double r = l.relativeMarginAt(v);
                    if (Double.isNaN(r)) throw new IllegalStateException("output " + l.output() + " is not a number (NaN)");
                    if (r < 0) violation -= r;
                }
                if (Double.isNaN(obj)) throw new IllegalStateException("the objective " + objective + " is not a number (NaN)");
                return new Candidate(p, out, null, obj, margins, violation, limits);
            } catch (RuntimeException e) {
                return new Candidate(p, null, Runner.describe(e), Double.NaN, margins, Double.POSITIVE_INFINITY, limits);
            }
        }

        private double numberOf(Map<String, Object> out, String name, Dimension expected) {
            Object v = out.get(name);
            if (v == null) throw Require.fail("the function gives no output named " + Require.quote(name) + "; it gives " + Require.names(out.keySet()));
            if (v instanceof Quantity) {
                Quantity q = (Quantity) v;
                if (expected != null && !expected.equals(q.dimension())) {
                    throw Require.fail("output " + name + " is " + q + " (" + q.dimension().name() + ") but its limit is a " + expected.name());
                }
                return q.si();
            }
            if (v instanceof Number) {
                if (expected != null && !expected.isNone()) {
                    throw Require.fail("output " + name + " is the number " + v + " but its limit is a " + expected.name());
                }
                return ((Number) v).doubleValue();
            }
            throw Require.fail("output " + name + " must be a quantity or a number, got " + v);
        }
    }

    Comparator<Candidate> ranking() {
        return (a, b) -> {
            boolean ea = a.error != null, eb = b.error != null;
            if (ea || eb) return ea == eb ? 0 : ea ? 1 : -1;
            boolean fa = a.violation == 0, fb = b.violation == 0;
            if (fa != fb) return fa ? -1 : 1;
            if (!fa) return Double.compare(a.violation, b.violation);
            return maximise ? Double.compare(b.objective, a.objective) : Double.compare(a.objective, b.objective);
        };
    }
}
