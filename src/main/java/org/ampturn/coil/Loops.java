package org.ampturn.coil;

import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;

/**
 * Mutual and self-inductance of coaxial circular loops and of coaxial air coils.
 *
 * <p>Coaxial filaments: Maxwell's formula M = μ0√(r1 r2)·[(2/k − k)K(k) − (2/k)E(k)],
 * k² = 4r1r2/((r1 + r2)² + z²) (Maxwell, Treatise on Electricity and Magnetism, 1873, §701; Grover,
 * Inductance Calculations, 1946, ch. 13), exact for filaments; computed by the AGM without
 * cancellation at any distance. Coaxial coils: the sum of Maxwell's formula over every pair of turns
 * (each coil as coaxial circles, helix neglected). Coupling coefficient k = M/√(L1·L2).
 */
public final class Loops {
    private Loops() {}

    /** Mutual inductance of two coaxial circular filaments of these radii whose planes are {@code axialDistance} apart. */
    public static Quantity mutualInductance(Quantity radius1, Quantity radius2, Quantity axialDistance) {
        double a = Require.length("radius 1", radius1);
        double b = Require.length("radius 2", radius2);
        double z = Require.distance("axial distance", axialDistance);
        if (a == b && z == 0) {
            throw Require.fail("radius1 = radius2 and axial distance 0: the loops coincide and M is infinite; use selfInductance for one loop");
        }
        return Quantity.of(mutualAt(a, b, z), Dimension.INDUCTANCE);
    }

    /** Kernel: Maxwell's mutual inductance (H) of coaxial filaments, radii and distance in m. */
    public static double mutualAt(double radius1, double radius2, double axialDistance) {
        return Require.result("mutual inductance", Elliptic.maxwell(radius1, radius2, axialDistance));
    }

    /**
     * Self-inductance of a single circular loop of round wire at low frequency:
     * L = μ0·a·(ln(8a/ρ) − 7/4) (Rosa and Grover 1912; Grover 1946, ch. 16), valid for ρ ≪ a.
     */
    public static Quantity selfInductance(Quantity loopRadius, Quantity wireRadius) {
        double a = Require.length("loop radius", loopRadius);
        double r = Require.length("wire radius", wireRadius);
        if (!(r < a)) throw Require.fail("wire radius (" + wireRadius + ") must be less than the loop radius " + loopRadius);
        return Quantity.of(Filaments.loopSelf(a, r), Dimension.INDUCTANCE);
    }

    /** Mutual inductance of two coaxial air coils whose centres are {@code axialDistance} apart. */
    public static Quantity mutualInductance(AirCoil a, AirCoil b, Quantity axialDistance) {
        double z = Require.distance("axial distance", axialDistance);
        if (a == null || b == null) throw Require.fail("both coils are needed, got " + a + " and " + b);
        return Quantity.of(Filaments.of(a).mutual(Filaments.of(b), z), Dimension.INDUCTANCE);
    }

    /** Coupling coefficient k = M/√(L1·L2) of two coaxial air coils, centres {@code axialDistance} apart. */
    public static double coupling(AirCoil a, AirCoil b, Quantity axialDistance) {
        double m = mutualInductance(a, b, axialDistance).si();
        return m / Math.sqrt(a.inductance().si() * b.inductance().si());
    }
}
