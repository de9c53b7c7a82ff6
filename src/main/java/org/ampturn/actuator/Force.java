package org.ampturn.actuator;

import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;

/**
 * Magnetic force formulas in closed form.
 * <ul>
 * <li>Maxwell's stress across a gap: F = B²·A/(2μ0) for a uniform normal flux density B over a pole
 *     face A (Maxwell, Treatise, 1873, §641-642; e.g. Roters, Electromagnetic Devices, 1941, ch. 5).
 *     Valid for a small gap with uniform B over A and negligible fringing.</li>
 * <li>Virtual work at constant current: F = ½·i²·dL/dx for a linear magnetic system (Roters 1941,
 *     ch. 5; Woodson and Melcher, Electromechanical Dynamics, 1968, ch. 3); in general F = ∂W′/∂x at
 *     constant i, W′ the co-energy.</li>
 * </ul>
 */
public final class Force {
    private Force() {}

    static final double MU0 = 4e-7 * Math.PI;

    /** F = B²A/(2μ0): the pull on a pole face of {@code area} carrying a normal flux density {@code fluxDensity}. */
    public static Quantity ofFluxDensity(Quantity fluxDensity, Quantity area) {
        double b = Require.si("flux density", fluxDensity, Dimension.FLUX_DENSITY);
        double a = Require.positive("pole area", area, Dimension.AREA);
        return Quantity.of(maxwellAt(b, a), Dimension.FORCE);
    }

    /** F = ½·i²·dL/dx for a linear system: {@code inductanceSlope} is dL/dx in H/m. */
    public static Quantity ofInductanceSlope(Quantity current, Quantity inductanceSlope) {
        double i = Require.si("current", current, Dimension.CURRENT);
        double s = Require.si("inductance slope dL/dx", inductanceSlope, Dimension.INDUCTANCE.div(Dimension.LENGTH));
        return Quantity.of(0.5 * i * i * s, Dimension.FORCE);
    }

    /** Kernel: B²A/(2μ0) in N, B in T, A in m². */
    public static double maxwellAt(double tesla, double area) {
        Require.finite("flux density (T)", tesla);
        Require.finite("area (m²)", area);
        return Require.result("maxwell", tesla * tesla * area / (2 * MU0));
    }
}
