package org.ampturn.drive;

import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;

/**
 * The run-time side of a {@link Secondary}: the inverse inductance matrix of the two coupled windings
 * and whether a diode load conducts. Currents from flux linkages, i = Γ·λ with Γ = [[L1, M], [M, L2]]⁻¹
 * while both windings carry current; i2 = 0 with the diode off (then λ2 = (M/L1)·λ1), i1 = 0 with the
 * primary open (then λ1 = (M/L2)·λ2). Not thread-safe: one per run.
 */
final class Coupling {
    final double l1, l2, m, det;
    final double loopOhms, diodeVolts;
    final boolean diode;
    /** The secondary conducts (always for a shorted or resistor load). */
    boolean on;

    Coupling(Secondary s, double l1) {
        this.l1 = l1;
        this.l2 = s.l2();
        this.m = s.mutualWith(l1);
        this.det = l1 * l2 - m * m;
        this.loopOhms = s.loopOhms();
        this.diode = s.kind() == Secondary.Kind.DIODE;
        this.diodeVolts = s.diodeVolts();
        this.on = !diode;
        if (on && !(det > 1e-12 * l1 * l2)) {
            throw Require.fail("a shorted or resistor-loaded secondary needs a coupling below 1 (leakage above zero): L1·L2 − M² = "
                    + Quantity.of(det, Dimension.INDUCTANCE.times(Dimension.INDUCTANCE)) + " leaves the two currents undetermined");
        }
        if (diode && !(det > 1e-12 * l1 * l2)) throw Require.fail("a secondary with a diode needs a coupling below 1 (some leakage inductance)");
    }

    /** Primary current for flux linkages λ1, λ2 with the primary conducting (idle false) or open. */
    double i1(double lam1, double lam2, boolean idle) {
        if (idle) return 0;
        return on ? (l2 * lam1 - m * lam2) / det : lam1 / l1;
    }

    double i2(double lam1, double lam2, boolean idle) {
        if (!on) return 0;
        return idle ? lam2 / l2 : (l1 * lam2 - m * lam1) / det;
    }
}
