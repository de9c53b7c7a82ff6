package org.ampturn.study;

import java.util.Objects;
import java.util.function.DoubleFunction;
import java.util.function.DoubleUnaryOperator;
import java.util.function.Function;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.exception.TooManyEvaluationsException;
import org.ampturn.units.Require;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;

/**
 * Finds the x in [lo, hi] where f(x) reaches a target, by Brent's method (R. P. Brent,
 * <i>Algorithms for Minimization without Derivatives</i>, Prentice-Hall 1973, ch. 4; the Commons
 * Math {@code BrentSolver}). It needs f − target to change sign between lo and hi; when it does not,
 * the error gives f at both ends. f need only be continuous; x is found to about 1e-13 of the
 * larger end and returned rounded to 12 significant digits, so the digits shown do not change with
 * the last bits of f (a worksheet that records the answer verifies across small library changes).
 */
public final class Solve {
    private Solve() {}

    private static final int MAX_EVALUATIONS = 500;

    /** The x in [lo, hi] where {@code f(x) = target}, all plain numbers. */
    public static double of(DoubleUnaryOperator f, double target, double lo, double hi) {
        Require.present("function", f);
        if (!Double.isFinite(target)) throw Require.fail("target must be a finite number, got " + target);
        return root(f, target, lo, hi, Solve::num, v -> num(v));
    }

    /** The x in [lo, hi] where the quantity {@code f(x)} equals {@code target}: turns for an inductance. */
    public static double of(DoubleFunction<Quantity> f, Quantity target, double lo, double hi) {
        Require.present("function", f);
        double t = checkTarget(target);
        Dimension d = target.dimension();
        DoubleUnaryOperator g = x -> valueOf(f.apply(x), d, target, num(x));
        return root(g, t, lo, hi, Solve::num, v -> Quantity.of(v, d).toString());
    }

    /** The quantity x in [lo, hi] where {@code f(x)} equals {@code target}. */
    public static Quantity of(Function<Quantity, Quantity> f, Quantity target, Quantity lo, Quantity hi) {
        Require.present("function", f);
        double t = checkTarget(target);
        if (lo == null || hi == null) throw Require.fail("the range to search is missing an end (null)");
        if (!lo.dimension().equals(hi.dimension())) {
            throw Require.fail("the ends of the range must be of one kind, got " + lo + " (" + lo.dimension().name() + ") and "
                    + hi + " (" + hi.dimension().name() + ")");
        }
        Dimension xd = lo.dimension();
        Dimension d = target.dimension();
        DoubleFunction<Quantity> xq = lo.isAbsoluteTemperature() ? Quantity::temperatureKelvin : v -> Quantity.of(v, xd);
        DoubleUnaryOperator g = x -> valueOf(f.apply(xq.apply(x)), d, target, xq.apply(x).toString());
        double x = root(g, t, lo.si(), hi.si(), v -> xq.apply(v).toString(), v -> Quantity.of(v, d).toString());
        return xq.apply(x);
    }

    private static double checkTarget(Quantity target) {
        if (target == null) throw Require.fail("the target is missing (null)");
        if (!Double.isFinite(target.si())) throw Require.fail("target must be finite, got " + target);
        return target.si();
    }

    private static double valueOf(Quantity q, Dimension d, Quantity target, String at) {
        if (q == null) throw new SolveException("f returned nothing (null) at x = " + at);
        if (!q.dimension().equals(d)) {
            throw new SolveException("f(" + at + ") is " + q + " (" + q.dimension().name() + ") but the target is " + target + " ("
                    + d.name() + ")");
        }
        return q.si();
    }

    private static double root(DoubleUnaryOperator f, double target, double lo, double hi,
                               DoubleFunction<String> showX, DoubleFunction<String> showF) {
        if (!Double.isFinite(lo) || !Double.isFinite(hi)) {
            throw Require.fail("the range to search must be finite, got " + showX.apply(lo) + " to " + showX.apply(hi));
        }
        if (lo == hi) throw Require.fail("the range to search is empty: both ends are " + showX.apply(lo));
        if (lo > hi) {
            double t = lo;
            lo = hi;
            hi = t;
        }
        double fLo = eval(f, lo, showX);
        if (fLo == target) return lo;
        double fHi = eval(f, hi, showX);
        if (fHi == target) return hi;
        if ((fLo - target) * (fHi - target) > 0) {
            String side = fLo < target ? "below" : "above";
            throw new SolveException("the target " + showF.apply(target) + " is not bracketed between x = " + showX.apply(lo) + " and "
                    + showX.apply(hi) + ": f(" + showX.apply(lo) + ") = " + showF.apply(fLo) + " and f(" + showX.apply(hi) + ") = "
                    + showF.apply(fHi) + " are both " + side + " it; widen the range or check the target");
        }
        double abs = 1e-13 * Math.max(Math.abs(lo), Math.abs(hi));
        BrentSolver solver = new BrentSolver(1e-14, abs > 0 ? abs : 1e-300);
        try {
            return round12(solver.solve(MAX_EVALUATIONS, x -> eval(f, x, showX) - target, lo, hi));
        } catch (TooManyEvaluationsException e) {
            throw new SolveException("no answer within " + MAX_EVALUATIONS + " evaluations between x = " + showX.apply(lo) + " and "
                    + showX.apply(hi) + "; is f continuous there?", e);
        } catch (org.apache.commons.math3.exception.MathIllegalArgumentException e) {
            throw Require.fail("the range from x = " + showX.apply(lo) + " to " + showX.apply(hi) + " is too narrow to search", e);
        }
    }

    /** {@code v} to 12 significant digits. */
    static double round12(double v) {
        if (v == 0 || !Double.isFinite(v)) return v;
        return new java.math.BigDecimal(v).round(new java.math.MathContext(12)).doubleValue();
    }

    private static double eval(DoubleUnaryOperator f, double x, DoubleFunction<String> showX) {
        if (Thread.currentThread().isInterrupted()) throw new SolveException("the solve was stopped (interrupted) at x = " + showX.apply(x));
        double y;
        try {
            y = f.applyAsDouble(x);
        } catch (SolveException e) {
            throw e;
        } catch (RuntimeException e) {
            throw new SolveException("f failed at x = " + showX.apply(x) + ": " + Runner.describe(e), e);
        }
        if (Double.isNaN(y)) throw new SolveException("f is not a number (NaN) at x = " + showX.apply(x));
        return y;
    }

    /** A number to 6 significant digits without trailing zeros: 100, 412.37, 1.5e-9. */
    private static String num(double v) {
        String s = Column.number(v, 6);
        int e = s.indexOf('e');
        String mant = e < 0 ? s : s.substring(0, e);
        if (mant.contains(".")) mant = mant.replaceFirst("0+$", "").replaceFirst("\\.$", "");
        return e < 0 ? mant : mant + s.substring(e);
    }
}
