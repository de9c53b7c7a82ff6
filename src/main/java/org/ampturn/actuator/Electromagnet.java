package org.ampturn.actuator;

import org.ampturn.coil.AirGap;
import org.ampturn.coil.MagneticCircuit;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;

/**
 * A holding electromagnet: a coil of N turns on an iron path (core and armature, any
 * {@link MagneticCircuit}) closed through {@code gaps} equal air gaps of pole area A in series (2 for
 * a U or pot magnet with a flat armature, 1 for a plunger face). The gap length x is the variable.
 *
 * <p>Force is given two ways, which agree wherever the lumped model holds:
 * <ul>
 * <li>{@link #force}: Maxwell's stress F = n·B²·A/(2μ0) with B = Φ/A the gap flux density from the
 *     circuit solution (Maxwell 1873 §641; Roters, Electromagnetic Devices, 1941, ch. 5);</li>
 * <li>{@link #forceByCoenergy}: virtual work F = −∂W′/∂x at constant current, W′(i, x) = ∫0^i λ di′
 *     (Woodson and Melcher, Electromechanical Dynamics, 1968, ch. 3), by a central difference in x;
 *     for a linear circuit W′ = ½·L(x)·i², F = −½·i²·dL/dx.</li>
 * </ul>
 * The attraction (closing the gap) is reported positive. Fringing and leakage are not modelled, so
 * the force is an upper estimate for larger gaps; valid for gaps small against the pole's width.
 */
public final class Electromagnet {
    private final int turns;
    private final MagneticCircuit iron;
    private final double area;
    private final int gaps;

    private Electromagnet(int turns, MagneticCircuit iron, double area, int gaps) {
        this.turns = turns;
        this.iron = iron;
        this.area = area;
        this.gaps = gaps;
    }

    /** An electromagnet of {@code turns} on {@code ironPath}, closing through {@code gaps} gaps of {@code poleArea} each. */
    public static Electromagnet of(int turns, MagneticCircuit ironPath, Quantity poleArea, int gaps) {
        Require.positive("turns", turns);
        if (ironPath == null) throw new IllegalArgumentException("iron path is missing (null)");
        double a = Require.positive("pole area", poleArea, Dimension.AREA);
        Require.positive("gaps", gaps);
        return new Electromagnet(turns, ironPath, a, gaps);
    }

    public int turns() { return turns; }
    public int gaps() { return gaps; }
    public Quantity poleArea() { return Quantity.of(area, Dimension.AREA); }

    /** The whole magnetic circuit with the armature at gap x. */
    public MagneticCircuit circuitAt(Quantity gap) {
        Require.positive("gap", gap, Dimension.LENGTH);
        MagneticCircuit[] parts = new MagneticCircuit[gaps + 1];
        parts[0] = iron;
        for (int k = 1; k <= gaps; k++) parts[k] = AirGap.of(gap, poleArea());
        return MagneticCircuit.series(parts);
    }

    /** Small-signal inductance at gap x. */
    public Quantity inductance(Quantity gap) {
        return Quantity.of(turns * (double) turns / reluctanceAt(Require.positive("gap", gap, Dimension.LENGTH)), Dimension.INDUCTANCE);
    }

    /** Gap flux density at gap x and current i. */
    public Quantity gapFluxDensity(Quantity gap, Quantity current) {
        double x = Require.positive("gap", gap, Dimension.LENGTH);
        double i = Require.si("current", current, Dimension.CURRENT);
        return Quantity.of(fluxAt(x, i) / area, Dimension.FLUX_DENSITY);
    }

    /** Holding force from the gap flux density, n·B²A/(2μ0). */
    public Quantity force(Quantity gap, Quantity current) {
        return Quantity.of(forceAt(Require.positive("gap", gap, Dimension.LENGTH), Require.si("current", current, Dimension.CURRENT)), Dimension.FORCE);
    }

    /** Holding force from the co-energy's derivative with gap at constant current. */
    public Quantity forceByCoenergy(Quantity gap, Quantity current) {
        return Quantity.of(forceByCoenergyAt(Require.positive("gap", gap, Dimension.LENGTH), Require.si("current", current, Dimension.CURRENT)),
                Dimension.FORCE);
    }

    // ---- kernels (SI) -------------------------------------------------------------------------

    /** n·B²A/(2μ0) in N at gap x (m) and current i (A). */
    public double forceAt(double gap, double amps) {
        double b = fluxAt(gap, amps) / area;
        return gaps * Force.maxwellAt(b, area);
    }

    /** −∂W′/∂x in N, by a fourth-order central difference with step 1e-3·x. */
    public double forceByCoenergyAt(double gap, double amps) {
        double h = 1e-3 * gap;
        double d = (-coenergyAt(gap + 2 * h, amps) + 8 * coenergyAt(gap + h, amps) - 8 * coenergyAt(gap - h, amps) + coenergyAt(gap - 2 * h, amps))
                / (12 * h);
        return -d;
    }

    /**
     * Co-energy W′ = ∫0^i λ di′ (J); ½Li² when linear, else Commons Math's iterative Gauss-Legendre
     * quadrature (relative accuracy 1e-13, enough for the difference quotient in x).
     */
    public double coenergyAt(double gap, double amps) {
        if (iron.isLinear()) return 0.5 * turns * (double) turns / reluctanceAt(gap) * amps * amps;
        if (amps == 0) return 0;
        var quad = new org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator(16, 1e-13, 1e-300);
        return quad.integrate(Integer.MAX_VALUE, i -> turns * fluxAt(gap, i), 0, amps);
    }

    private double reluctanceAt(double gap) {
        return iron.reluctanceSI() + gaps * gap / (MagneticCircuit.MU0 * area);
    }

    private double fluxAt(double gap, double amps) {
        double f = turns * amps;
        double rg = gaps * gap / (MagneticCircuit.MU0 * area);
        if (iron.isLinear()) return f / (iron.reluctanceSI() + rg);
        // series: iron MMF(Φ) + Φ·Rgap = N i
        return solve(phi -> iron.mmfAt(phi) + phi * rg, f, f / (iron.reluctanceSI() + rg));
    }

    private static double solve(java.util.function.DoubleUnaryOperator g, double y, double guess) {
        if (y == 0) return 0;
        double sign = Math.signum(y);
        double target = Math.abs(y);
        double lo = 0, hi = Math.abs(guess);
        while (g.applyAsDouble(hi) < target) {
            lo = hi;
            hi *= 2;
        }
        for (int k = 0; k < 200 && hi - lo > 1e-15 * hi; k++) {
            double mid = 0.5 * (lo + hi);
            if (g.applyAsDouble(mid) < target) lo = mid;
            else hi = mid;
        }
        return sign * 0.5 * (lo + hi);
    }

    @Override
    public String toString() {
        return "electromagnet, " + turns + " turns, " + gaps + " gap" + (gaps == 1 ? "" : "s") + " of " + poleArea() + " each, iron path "
                + iron.name();
    }
}
