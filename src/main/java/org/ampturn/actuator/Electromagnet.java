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
 * The attraction (closing the gap) is reported positive. Fringing and leakage are not modelled;
 * valid for gaps small against the pole's width. At larger gaps the value is no bound either way: at
 * a given flux it overstates the pull, at a given current a fringing permeance that grows with the
 * gap raises dL/dx and with it the pull.
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
        Require.turns("turns", turns);
        if (ironPath == null) throw Require.fail("iron path is missing (null)");
        double a = Require.positive("pole area", poleArea, Dimension.AREA);
        Require.between("gaps", gaps, 1, 16);
        return new Electromagnet(turns, ironPath, a, gaps);
    }

    public int turns() { return turns; }
    public int gaps() { return gaps; }
    public Quantity poleArea() { return Quantity.of(area, Dimension.AREA); }

    /** The iron path without the gaps. */
    public MagneticCircuit ironPath() { return iron; }

    double areaSI() { return area; }

    /** The whole magnetic circuit with the armature at gap x. */
    public MagneticCircuit circuitAt(Quantity gap) {
        return circuitAt(Require.length("gap", gap));
    }

    /** Small-signal inductance at gap x. */
    public Quantity inductance(Quantity gap) {
        return Quantity.of(turns * (double) turns / reluctanceAt(Require.length("gap", gap)), Dimension.INDUCTANCE);
    }

    /** Gap flux density at gap x and current i. */
    public Quantity gapFluxDensity(Quantity gap, Quantity current) {
        double x = Require.length("gap", gap);
        double i = Require.si("current", current, Dimension.CURRENT);
        return Quantity.of(fluxAt(x, i) / area, Dimension.FLUX_DENSITY);
    }

    /** Holding force from the gap flux density, n·B²A/(2μ0). */
    public Quantity force(Quantity gap, Quantity current) {
        return Quantity.of(forceAt(Require.length("gap", gap), Require.si("current", current, Dimension.CURRENT)), Dimension.FORCE);
    }

    /** Holding force from the co-energy's derivative with gap at constant current. */
    public Quantity forceByCoenergy(Quantity gap, Quantity current) {
        return Quantity.of(forceByCoenergyAt(Require.length("gap", gap), Require.si("current", current, Dimension.CURRENT)),
                Dimension.FORCE);
    }

    // ---- kernels (SI) -------------------------------------------------------------------------

    /** n·B²A/(2μ0) in N at gap x (m) and current i (A). */
    public double forceAt(double gap, double amps) {
        Require.finite("gap (m)", gap);
        Require.finite("current (A)", amps);
        double b = fluxAt(gap, amps) / area;
        return Require.result("force", gaps * Force.maxwellAt(b, area));
    }

    /**
     * −∂W′/∂x in N. Linear: ½·i²·N²·(n/(μ0A))/R². Otherwise ∂W′/∂x = ∫0^i ∂λ/∂x di′, with ∂λ/∂x by a
     * fourth-order central difference (step 10⁻³·x) inside the integral, so that the quadrature
     * works on the difference itself and no two nearly equal co-energies are subtracted; composite
     * 8-point Gauss-Legendre on 48 panels in i.
     */
    public double forceByCoenergyAt(double gap, double amps) {
        Require.finite("gap (m)", gap);
        Require.finite("current (A)", amps);
        if (iron.isLinear()) {
            double h = 1e-3 * gap;
            double d = (-coenergyAt(gap + 2 * h, amps) + 8 * coenergyAt(gap + h, amps) - 8 * coenergyAt(gap - h, amps)
                    + coenergyAt(gap - 2 * h, amps)) / (12 * h);
            return Require.result("force by coenergy", -d);
        }
        if (amps == 0) return Require.result("force by coenergy", 0);
        double h = 1e-3 * gap;
        MagneticCircuit p2 = circuitAt(gap + 2 * h), p1 = circuitAt(gap + h), m1 = circuitAt(gap - h), m2 = circuitAt(gap - 2 * h);
        // composite 8-point Gauss-Legendre on 48 equal panels: a B-H table's kinks cost little accuracy
        int panels = 48;
        double w = amps / panels, d = 0;
        for (int p = 0; p < panels; p++) {
            for (int k = 0; k < X8.length; k++) {
                double f = turns * (w * (p + 0.5 * (1 + X8[k])));
                d += W8[k] * (-p2.fluxAt(f) + 8 * p1.fluxAt(f) - 8 * m1.fluxAt(f) + m2.fluxAt(f));
            }
        }
        d *= 0.5 * w * turns / (12 * h);
        return Require.result("force by coenergy", -d);
    }

    /**
     * Co-energy W′ = ∫0^i λ di′ (J); ½Li² when linear, else Commons Math's iterative Gauss-Legendre
     * quadrature (relative accuracy 1e-11).
     */
    public double coenergyAt(double gap, double amps) {
        Require.between("gap", gap, Dimension.LENGTH, Require.MIN_LENGTH, Require.MAX_LENGTH);
        Require.finite("current (A)", amps);
        if (iron.isLinear()) return Require.result("coenergy", 0.5 * turns * (double) turns / reluctanceAt(gap) * amps * amps);
        if (amps == 0) return 0;
        var quad = new org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator(16, 1e-11, 1e-300);
        MagneticCircuit whole = circuitAt(gap);
        try {
            return Require.result("coenergy", quad.integrate(MAX_EVALUATIONS, i -> turns * whole.fluxAt(turns * i), 0, amps));
        } catch (org.apache.commons.math3.exception.MathIllegalStateException e) {
            throw Require.fail("the coenergy at " + Quantity.of(amps, Dimension.CURRENT) + " did not converge in " + MAX_EVALUATIONS
                    + " evaluations: " + e.getMessage(), e);
        }
    }

    /** Most evaluations of the B-H curve one coenergy integral may take. */
    static final int MAX_EVALUATIONS = 1_000_000;

    private double reluctanceAt(double gap) {
        return iron.reluctanceSI() + gaps * gap / (MagneticCircuit.MU0 * area);
    }

    private double fluxAt(double gap, double amps) {
        if (iron.isLinear()) return turns * amps / reluctanceAt(gap);
        return circuitAt(gap).fluxAt(turns * amps);
    }

    private MagneticCircuit circuitAt(double gap) {
        MagneticCircuit[] parts = new MagneticCircuit[gaps + 1];
        parts[0] = iron;
        Quantity g = Quantity.of(gap, Dimension.LENGTH), a = poleArea();
        for (int k = 1; k <= gaps; k++) parts[k] = AirGap.of(g, a);
        return MagneticCircuit.series(parts);
    }

    private static final double[] X8 = new double[8];
    private static final double[] W8 = new double[8];

    static {
        var rule = new org.apache.commons.math3.analysis.integration.gauss.GaussIntegratorFactory().legendre(8);
        for (int k = 0; k < 8; k++) {
            X8[k] = rule.getPoint(k);
            W8[k] = rule.getWeight(k);
        }
    }

    @Override
    public String toString() {
        return "electromagnet, " + turns + " turns, " + gaps + " gap" + (gaps == 1 ? "" : "s") + " of " + poleArea() + " each, iron path "
                + iron.name();
    }
}
