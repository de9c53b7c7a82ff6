package org.ampturn.drive;

import static org.ampturn.drive.Solver.LAD;
import static org.ampturn.drive.Solver.LAM;
import static org.ampturn.drive.Solver.V;
import static org.ampturn.drive.Solver.X;

import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;

/**
 * The solver's part of {@link IronHysteresis} with the coil open: where the flux goes when no current
 * flows, and what is left at the end of a run.
 */
final class Remanence {
    private Remanence() {}

    /**
     * dλ/dt with the coil open (no eddy ladder): on the falling branch the current is zero where the
     * curve without hysteresis gives the coercive current, {@code i(λ, x) = c}. While the armature's
     * motion raises i at fixed λ (the gap opens) the flux follows that level down,
     * {@code dλ/dt = −(∂i/∂x)·v / (∂i/∂λ)}; otherwise the applied field is inside the play band and
     * the flux stays. The slopes by central differences (10⁻⁶ of the stroke and of λ). "On the
     * level" means within 0.1 % of c: following keeps i at the level it started from, and a
     * tighter test would let the integrator's own error switch the flux between following and
     * staying from one stage to the next (a right-hand side that jumps, and tiny steps).
     */
    static double idleFluxRate(Solver sv, double[] s) {
        double v = s[V];
        if (sv.mech != Solver.Mech.FREE || v == 0) return 0;
        double lam = s[LAM], x = s[X];
        Load load = sv.load;
        double i0 = load.currentAt(lam, x);
        if (!(i0 >= sv.hc * (1 - 1e-3))) return 0;
        double stroke = load.stroke(), hx = 1e-6 * stroke;
        double x1 = Math.max(0, x - hx), x2 = Math.min(stroke, x + hx);
        double pushX = (load.currentAt(lam, x2) - load.currentAt(lam, x1)) / (x2 - x1) * v;
        if (!(pushX > 0)) return 0;
        double hl = 1e-6 * Math.abs(lam) + Double.MIN_NORMAL;
        double didl = (load.currentAt(lam + hl, x) - load.currentAt(lam - hl, x)) / (2 * hl);
        return didl > 0 ? -pushX / didl : 0;
    }

    /** After a final switch-off with the coil open: the flux linkage and pull left, and a note of them. */
    static void atEnd(Solver sv) {
        if (!sv.finalOff || sv.elec != Solver.Elec.IDLE) return;
        double[] y = sv.y;
        sv.residualLambda = sv.loops > 0 ? y[LAD] : y[LAM];
        sv.residualPull = sv.moves ? sv.magnetForce(y) : 0;
        sv.notes.add("remanence (play-operator hysteresis, coercive current " + Quantity.of(sv.hc, Dimension.CURRENT) + "): at the end "
                + "of the run the iron keeps a flux linkage of " + Quantity.of(sv.residualLambda, Dimension.FLUX) + " with the coil open, "
                + "a magnetic force of " + Quantity.of(sv.residualPull, Dimension.FORCE) + " on the armature");
    }
}
