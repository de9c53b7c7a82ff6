package org.ampturn.drive;

import org.ampturn.coil.Coil;

/** What the solver drives: a fixed coil or a moving armature, in SI kernels. */
abstract class Load {
    abstract double currentAt(double lambda, double x);

    // currentAt gives NaN where the model refuses the flux linkage (outside its range): a trial step
    // of the integrator may go there, and the solver rejects such a step or reports where the model
    // gave no current. No lambda in this path: it runs at every derivative evaluation.

    abstract double fieldEnergyAt(double lambda, double x);

    abstract double forceAt(double lambda, double x);

    abstract double restoringForceAt(double x, double v);

    abstract double mass();

    abstract double stroke();

    abstract double resistance();

    /** Small-signal inductance at the start position. */
    abstract double inductance();

    /**
     * The smallest incremental inductance dλ/di (H) at the current {@code amps}, over the
     * positions 0 and the stroke: a flux linkage error δλ is a current error δλ/(dλ/di), so the
     * integrator's error control on λ uses it. A saturated core's dλ/di is far below its
     * small-signal inductance. Found from {@link #currentAt} by bisection; the small-signal
     * inductance where the model gives no answer.
     */
    double incrementalInductanceAt(double amps) {
        double a = Math.abs(amps);
        if (!(a > 0) || !Double.isFinite(a)) return inductance();
        double best = Double.POSITIVE_INFINITY;
        for (double x : moves() ? new double[] {0, stroke()} : new double[] {0}) {
            double hi = fluxAt(a, x), lo = fluxAt(0.99 * a, x);
            if (hi > lo) best = Math.min(best, (hi - lo) / (0.01 * a));
        }
        return Double.isFinite(best) ? best : inductance();
    }

    /** λ ≥ 0 at which {@link #currentAt} gives {@code amps} at x, by bisection; NaN if none is found. */
    private double fluxAt(double amps, double x) {
        double lo = 0, hi = Math.max(inductance() * amps, 1e-15);
        for (int k = 0; !(currentAt(hi, x) >= amps); k++) {
            if (k > 200 || !Double.isFinite(currentAt(hi, x))) return Double.NaN;
            hi *= 2;
        }
        for (int k = 0; k < 80 && hi - lo > 1e-14 * hi; k++) {
            double mid = 0.5 * (lo + hi);
            if (currentAt(mid, x) < amps) lo = mid;
            else hi = mid;
        }
        return 0.5 * (lo + hi);
    }

    abstract boolean moves();

    /** Eddy currents and shorted turns coupled to the coil. */
    EddyLadder ladder() { return EddyLadder.NONE; }

    /** Coefficient of restitution at the stops (0: plastic). */
    double restitution() { return 0; }

    /** Hysteresis of the armature's iron (none for a fixed coil). */
    IronHysteresis hysteresis() { return IronHysteresis.NONE; }

    /** λ proportional to i and no motion: closed forms apply. */
    abstract boolean linear();

    abstract String describe();

    static Load of(Coil coil) {
        return new CoilLoad(coil);
    }

    static Load of(Armature a) {
        return new ArmatureLoad(a);
    }

    /**
     * A coil that does not move. Its field energy W = ∫0^λ i dλ' is accumulated along the run, from
     * the last flux linkage asked for (from zero when that is nearer, as when the coil opens and λ
     * falls to zero): between neighbouring output samples by the 5-point Gauss-Lobatto rule, whose
     * end currents the solver has already evaluated (the last sample's, and this one's remembered
     * from {@link #currentAt}), so a sample costs three more i(λ) instead of the five of a
     * Gauss-Legendre panel; a stretch is halved where the rule and Simpson's on the same points
     * differ by more than {@value #ENERGY_TOL} of the energy, which closes in on the breaks of a B-H
     * table's curve. A long stretch (over 5 % of |λ|) is split into 8 such panels.
     *
     * <p>Why along the run and not a table of W(λ) (or of the co-energy) built once per core and
     * current range: a coil's i(λ) from a B-H table is only C¹ (its second derivative jumps at
     * every point of the table and grows without bound in deep saturation), so a table that holds
     * i to the solver's tolerance over a run's range took more evaluations of the curve to build
     * than the run itself makes (measured: a few hundred microseconds, with most cells of the
     * gapped silicon-steel coil left to the exact curve), whereas the steps between samples are
     * short and the end currents come free. Against the old fixed panels (one 5-point
     * Gauss-Legendre panel a sample, 8 for a long stretch) the result is closer to a fine Gauss
     * quadrature, not further: on a saturating run (0.061 J at its peak) 1.3e-12 J against 1.9e-8 J.
     */
    static final class CoilLoad extends Load {
        private final Coil coil;
        private final double r;
        private final double l;
        private final boolean linear;
        // the field energy is taken incrementally from the last point asked for, with the current there
        private double lastLambda;
        private double lastEnergy;
        private double lastCurrent;
        // the last i(λ) evaluated: the solver asks for W at a sample's λ right after the current there
        private double memoLambda = Double.NaN;
        private double memoCurrent;

        CoilLoad(Coil coil) {
            this.coil = coil;
            this.r = coil.resistanceAt(coil.temperature().si());
            this.l = coil.inductance().si();
            this.linear = coil.isLinear();
        }

        @Override double currentAt(double lambda, double x) {
            if (lambda == memoLambda) return memoCurrent;
            double i;
            try {
                i = coil.currentAt(lambda);
            } catch (IllegalArgumentException outsideTheModel) {
                i = Double.NaN; // see current(): the solver rejects the step or reports where
            }
            memoLambda = lambda;
            memoCurrent = i;
            return i;
        }

        /** i at λ for the energy: the remembered value, else the coil's (which throws outside its model). */
        private double exactCurrent(double lambda) {
            if (lambda == memoLambda && memoCurrent == memoCurrent) return memoCurrent;
            return coil.currentAt(lambda);
        }

        @Override
        double fieldEnergyAt(double lambda, double x) {
            if (linear) return 0.5 * lambda * lambda / l;
            if (lambda == lastLambda) return lastEnergy;
            double i = exactCurrent(lambda);
            boolean near = Math.abs(lambda - lastLambda) <= SHORT * Math.max(Math.abs(lambda), Math.abs(lastLambda));
            // a long stretch starts from the last point when that is nearer than zero, on 8 panels
            double from = near || Math.abs(lambda - lastLambda) <= Math.abs(lambda) ? lastLambda : 0;
            double w = from == lastLambda ? lastEnergy : 0, fa = from == lastLambda ? lastCurrent : 0;
            int panels = near ? 1 : 8;
            double tol = ENERGY_TOL * (Math.abs(w) + Math.abs(lambda - from) * (Math.abs(fa) + Math.abs(i))) / panels;
            for (int p = 1; p <= panels; p++) {
                double b = p == panels ? lambda : from + (lambda - from) * p / panels;
                double fb = p == panels ? i : coil.currentAt(b);
                w += lobatto(p == 1 ? from : from + (lambda - from) * (p - 1) / panels, b, fa, fb, tol, DEPTH);
                fa = fb;
            }
            lastLambda = lambda;
            lastEnergy = w;
            lastCurrent = i;
            return w;
        }

        /** Longest step, as a fraction of |λ|, taken by the 5-point Gauss-Lobatto rule. */
        static final double SHORT = 0.05;
        /** Inner nodes ±√(3/7) of the 5-point Gauss-Lobatto rule on [−1, 1]; weights 1/10 at the ends, 49/90 there, 32/45 at 0. */
        private static final double LOBATTO = 0.6546536707079771;

        /** Error allowed per step, relative to the energy so far plus the step's own (see {@link #lobatto}). */
        static final double ENERGY_TOL = 1e-9;
        /** Halvings allowed per step. */
        static final int DEPTH = 10;

        /**
         * ∫a^b i dλ by the 5-point Gauss-Lobatto rule (exact to degree 7; the end currents fa, fb are
         * given), halving the stretch while it differs from Simpson's rule on its ends and middle by
         * more than {@code tol}: where i(λ) breaks (the points of a B-H table) the halves close in on
         * the break, elsewhere one rule is enough (adaptive Lobatto quadrature as in W. Gander and
         * W. Gautschi, "Adaptive quadrature, revisited", BIT 40(1), 84-101, 2000).
         */
        private double lobatto(double a, double b, double fa, double fb, double tol, int depth) {
            double mid = 0.5 * (a + b), half = 0.5 * (b - a);
            double fm = coil.currentAt(mid);
            double l = half * ((fa + fb) / 10 + (coil.currentAt(mid - LOBATTO * half) + coil.currentAt(mid + LOBATTO * half)) * 49 / 90
                    + fm * 32 / 45);
            double simpson = half / 3 * (fa + 4 * fm + fb);
            if (depth == 0 || Math.abs(l - simpson) <= tol) return l;
            return lobatto(a, mid, fa, fm, tol / 2, depth - 1) + lobatto(mid, b, fm, fb, tol / 2, depth - 1);
        }

        @Override double forceAt(double lambda, double x) { return 0; }
        @Override double restoringForceAt(double x, double v) { return 0; }
        @Override double mass() { return 1; }
        @Override double stroke() { return 0; }
        @Override double resistance() { return r; }
        @Override double inductance() { return l; }
        @Override double incrementalInductanceAt(double amps) {
            if (linear) return l;
            try {
                double li = coil.incrementalInductanceAt(amps);
                return li > 0 && Double.isFinite(li) ? Math.min(li, l) : super.incrementalInductanceAt(amps);
            } catch (IllegalArgumentException outsideTheModel) {
                return super.incrementalInductanceAt(amps);
            }
        }
        @Override boolean moves() { return false; }
        @Override boolean linear() { return linear; }
        @Override String describe() { return coil.describe(); }
    }

    static final class ArmatureLoad extends Load {
        private final Armature a;
        private final double r;
        private final double stroke;
        private final double mass;

        ArmatureLoad(Armature a) {
            this.a = a;
            this.r = a.resistanceOhms();
            this.stroke = a.strokeMetres();
            this.mass = a.massKg();
        }

        @Override double currentAt(double lambda, double x) {
            try {
                return a.currentAt(lambda, x);
            } catch (IllegalArgumentException outsideTheModel) {
                return Double.NaN;
            }
        }
        @Override double fieldEnergyAt(double lambda, double x) { return a.fieldEnergyAt(lambda, x); }
        @Override double forceAt(double lambda, double x) { return a.forceAt(lambda, x); }
        @Override double restoringForceAt(double x, double v) { return a.restoringForceAt(x, v); }
        @Override double mass() { return mass; }
        @Override double stroke() { return stroke; }
        @Override double resistance() { return r; }
        @Override double inductance() { return a.inductanceAt(0); }
        @Override boolean moves() { return true; }
        @Override EddyLadder ladder() { return a.eddyLadder() == null ? EddyLadder.NONE : a.eddyLadder(); }
        @Override IronHysteresis hysteresis() { return a.hysteresis() == null ? IronHysteresis.NONE : a.hysteresis(); }
        @Override double restitution() {
            double e = a.restitution();
            return e >= 0 && e <= 1 ? e : 0;
        }
        @Override boolean linear() { return false; }
        @Override String describe() { return a.describe(); }
    }
}
