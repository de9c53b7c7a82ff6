package org.ampturn.coil;

import org.ampturn.material.MagneticMaterial;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;

/**
 * An open rod core (no return path): its apparent permeability is limited by the demagnetising
 * field, μ<sub>app</sub> = μr/(1 + N<sub>d</sub>·(μr − 1)).
 *
 * <p>N<sub>d</sub> is taken from the exact demagnetising factor of an ellipsoid of revolution with
 * the rod's aspect ratio m = l/d (Osborn, Phys. Rev. 67, 1945, p. 351; Stoner, Phil. Mag. 36, 1945):
 * prolate (m &gt; 1) N<sub>d</sub> = [m/√(m²−1)·ln(m + √(m²−1)) − 1]/(m² − 1); m = 1 gives 1/3;
 * oblate (m &lt; 1) N<sub>d</sub> = [1 − m/√(1−m²)·arccos m]/(1 − m²).
 * <b>Approximate:</b> a cylinder is not an ellipsoid, and its magnetisation is not uniform; the
 * fluxmetric factor at the middle of a cylinder differs from the ellipsoid's by tens of percent at
 * moderate m (Chen, Brug and Goldfarb, IEEE Trans. Magn. 27, 1991, p. 3601). Treat the result as an
 * estimate to within perhaps 20-30 %, and measure where it matters.
 */
public final class RodCore {
    private final double length;
    private final double diameter;
    private final MagneticMaterial material;

    private RodCore(double length, double diameter, MagneticMaterial material) {
        this.length = length;
        this.diameter = diameter;
        this.material = material;
    }

    public static RodCore of(Quantity length, Quantity diameter, MagneticMaterial material) {
        double l = Require.length("rod length", length);
        double d = Require.length("rod diameter", diameter);
        if (material == null) throw Require.fail("material is missing (null)");
        return new RodCore(l, d, material);
    }

    public Quantity length() { return Quantity.of(length, Dimension.LENGTH); }
    public Quantity diameter() { return Quantity.of(diameter, Dimension.LENGTH); }

    /** Demagnetising factor of the equivalent ellipsoid (approximate for a rod). */
    public double demagnetisingFactor() {
        return demagnetisingFactorAt(length / diameter);
    }

    /** Apparent (effective) permeability μr/(1 + N_d(μr − 1)); approximate. */
    public double effectivePermeability() {
        double mu = material.relativePermeability();
        return mu / (1 + demagnetisingFactor() * (mu - 1));
    }

    /**
     * Approximate inductance of a single-layer coil wound on the rod (coil centred, not longer than
     * the rod): the air-cored value with the flux through the rod's section raised by μ<sub>app</sub>:
     * L ≈ L<sub>air</sub>·[1 + (μ<sub>app</sub> − 1)·(d/D)²]. Approximate (see the class note).
     */
    public Quantity inductance(Solenoid coil) {
        double dc = coil.meanDiameter().si();
        if (!(diameter < dc)) {
            throw Require.fail("rod diameter (" + diameter() + ") must be less than the coil's mean diameter " + coil.meanDiameter());
        }
        if (coil.length().si() > length * (1 + 1e-9)) {
            throw Require.fail("coil length (" + coil.length() + ") must not exceed the rod length " + length());
        }
        double ratio = diameter / dc;
        return coil.inductance().times(1 + (effectivePermeability() - 1) * ratio * ratio);
    }

    /** Demagnetising factor of an ellipsoid of revolution of axis ratio m = length/diameter (Osborn 1945). */
    public static double demagnetisingFactorAt(double m) {
        Require.between("aspect ratio", m, 1e-9, 1e9);
        if (Math.abs(m - 1) < 1e-6) return Require.result("demagnetising factor", 1.0 / 3 - 4.0 / 15 * (m - 1)); // series about the sphere
        if (m > 1) {
            double s = Math.sqrt(m * m - 1);
            return Require.result("demagnetising factor", (m / s * Math.log(m + s) - 1) / (m * m - 1));
        }
        double s = Math.sqrt(1 - m * m);
        return Require.result("demagnetising factor", (1 - m / s * Math.acos(m)) / (1 - m * m));
    }

    @Override
    public String toString() {
        return "rod core " + length() + " × " + diameter() + " diameter, μr = " + Quantity.number(material.relativePermeability())
                + ", apparent μ ≈ " + Quantity.number(effectivePermeability()) + " (approximate)";
    }
}
