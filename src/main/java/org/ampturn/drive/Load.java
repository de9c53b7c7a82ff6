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

    /** A coil that does not move. Its field energy ∫ i dλ comes from 5-point Gauss-Legendre panels. */
    static final class CoilLoad extends Load {
        private final Coil coil;
        private final double r;
        private final double l;
        private final boolean linear;
        // the field energy is taken incrementally from the last point asked for
        private double lastLambda;
        private double lastEnergy;

        CoilLoad(Coil coil) {
            this.coil = coil;
            this.r = coil.resistanceAt(coil.temperature().si());
            this.l = coil.inductance().si();
            this.linear = coil.isLinear();
        }

        @Override double currentAt(double lambda, double x) {
            try {
                return coil.currentAt(lambda);
            } catch (IllegalArgumentException outsideTheModel) {
                return Double.NaN; // see current(): the solver rejects the step or reports where
            }
        }

        @Override
        double fieldEnergyAt(double lambda, double x) {
            if (linear) return 0.5 * lambda * lambda / l;
            double from = Math.abs(lambda - lastLambda) <= Math.abs(lambda) ? lastLambda : 0;
            double base = from == lastLambda ? lastEnergy : 0;
            double w = base + integrate(from, lambda);
            lastLambda = lambda;
            lastEnergy = w;
            return w;
        }

        private static final double[] GX = {0, -0.5384693101056831, 0.5384693101056831, -0.9061798459386640, 0.9061798459386640};
        private static final double[] GW = {0.5688888888888889, 0.4786286704993665, 0.4786286704993665, 0.2369268850561891, 0.2369268850561891};

        private double integrate(double a, double b) {
            if (a == b) return 0;
            // one 5-point panel is exact to degree 9: enough between neighbouring samples; more for a long stretch
            int panels = Math.abs(b - a) <= 0.05 * Math.max(Math.abs(a), Math.abs(b)) ? 1 : 8;
            double h = (b - a) / panels;
            double sum = 0;
            for (int p = 0; p < panels; p++) {
                double mid = a + (p + 0.5) * h;
                for (int k = 0; k < 5; k++) sum += GW[k] * coil.currentAt(mid + 0.5 * h * GX[k]);
            }
            return sum * 0.5 * h;
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
