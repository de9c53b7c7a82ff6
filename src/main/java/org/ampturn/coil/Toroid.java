package org.ampturn.coil;

import org.ampturn.material.MagneticMaterial;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;

/**
 * A toroidal coil, N turns wound evenly round a ring core of rectangular or circular cross-section.
 * The field inside is H(r) = N·i/(2πr) (Ampère's law; exact for an evenly wound toroid, leakage of
 * the winding's pitch neglected), so:
 * <ul>
 * <li>rectangular section, inner and outer diameters ID, OD and height h:
 *     L = μ0·μr·N²·h/(2π)·ln(OD/ID) (Grover, Inductance Calculations, 1946, ch. 17; exact);</li>
 * <li>circular section of radius a at mean radius R: L = μ0·μr·N²·(R − √(R² − a²)) (Grover 1946, ch. 17; exact), a &lt; R.</li>
 * </ul>
 * The inner radius carries the highest H, so it saturates first; with a B-H material the flux
 * linkage is N·∫B(H(r))·w(r)dr over the section (Gauss-Legendre quadrature, 48 points).
 */
public final class Toroid {
    private final int turns;
    private final boolean circular;
    private final double r1, r2, h; // rectangular: inner radius, outer radius, height; circular: R, a, unused
    private final MagneticMaterial material;

    private Toroid(int turns, boolean circular, double r1, double r2, double h, MagneticMaterial material) {
        this.turns = turns;
        this.circular = circular;
        this.r1 = r1;
        this.r2 = r2;
        this.h = h;
        this.material = material;
    }

    /** Rectangular section with a linear core of relative permeability μr (1 for air). */
    public static Toroid rectangular(int turns, Quantity innerDiameter, Quantity outerDiameter, Quantity height, double relativePermeability) {
        Require.positive("relative permeability", relativePermeability);
        return rectangular(turns, innerDiameter, outerDiameter, height, MagneticMaterial.linear("core of μr " + Quantity.number(relativePermeability), relativePermeability, Quantity.of(UNSATURABLE, Dimension.FLUX_DENSITY)));
    }

    /** Rectangular section on a core of {@code material}. */
    public static Toroid rectangular(int turns, Quantity innerDiameter, Quantity outerDiameter, Quantity height, MagneticMaterial material) {
        Require.turns("turns", turns);
        double id = Require.length("inner diameter", innerDiameter);
        double od = Require.length("outer diameter", outerDiameter);
        double hh = Require.length("height", height);
        if (!(id < od)) {
            throw Require.fail("inner diameter (" + innerDiameter + ") must be less than the outer diameter (" + outerDiameter
                    + "); valid range: 0 < inner < " + outerDiameter);
        }
        if (material == null) throw Require.fail("material is missing (null)");
        return new Toroid(turns, false, id / 2, od / 2, hh, material);
    }

    /** Circular section of diameter {@code sectionDiameter} centred on {@code meanDiameter}, linear core μr. */
    public static Toroid circular(int turns, Quantity meanDiameter, Quantity sectionDiameter, double relativePermeability) {
        Require.positive("relative permeability", relativePermeability);
        return circular(turns, meanDiameter, sectionDiameter, MagneticMaterial.linear("core of μr " + Quantity.number(relativePermeability), relativePermeability, Quantity.of(UNSATURABLE, Dimension.FLUX_DENSITY)));
    }

    /** Circular section on a core of {@code material}. */
    public static Toroid circular(int turns, Quantity meanDiameter, Quantity sectionDiameter, MagneticMaterial material) {
        Require.turns("turns", turns);
        double d = Require.length("mean diameter", meanDiameter);
        double s = Require.length("section diameter", sectionDiameter);
        if (!(s < d)) {
            throw Require.fail("section diameter (" + sectionDiameter + ") must be less than the mean diameter (" + meanDiameter
                    + "); valid range: 0 < section < " + meanDiameter);
        }
        if (material == null) throw Require.fail("material is missing (null)");
        return new Toroid(turns, true, d / 2, s / 2, 0, material);
    }

    /** Stand-in saturation flux density for a core given only by μr: never reached. */
    private static final double UNSATURABLE = 1e300;

    public int turns() { return turns; }
    public MagneticMaterial material() { return material; }
    private double innerRadius() { return circular ? r1 - r2 : r1; }
    private double outerRadius() { return circular ? r1 + r2 : r2; }

    /** Small-signal inductance (initial permeability of the material). */
    public Quantity inductance() {
        double mu = MagneticMaterial.MU0 * material.relativePermeability();
        double n2 = (double) turns * turns;
        double l = circular ? mu * n2 * (r1 - Math.sqrt(r1 * r1 - r2 * r2)) : mu * n2 * h / (2 * Math.PI) * Math.log(r2 / r1);
        return Quantity.of(l, Dimension.INDUCTANCE);
    }

    /** Secant inductance λ/i at {@code current} (equals {@link #inductance()} for a linear core). */
    public Quantity inductance(Quantity current) {
        double i = Require.si("current", current, Dimension.CURRENT);
        if (i == 0 || material.isLinear()) return inductance();
        return Quantity.of(fluxLinkageAt(i) / i, Dimension.INDUCTANCE);
    }

    /** Flux linkage (Wb) at current i (A), by quadrature over the section. */
    public double fluxLinkageAt(double amps) {
        Require.finite("current (A)", amps);
        double sum = 0;
        if (circular) {
            // r = R + a·sin θ over θ in (-π/2, π/2): the width 2a·cos θ and dr = a·cos θ dθ make the integrand smooth
            for (int k = 0; k < GL_X.length; k++) {
                double th = 0.5 * Math.PI * GL_X[k], c = Math.cos(th);
                double r = r1 + r2 * Math.sin(th);
                sum += GL_W[k] * 2 * r2 * r2 * c * c * material.fluxDensityAt(turns * amps / (2 * Math.PI * r));
            }
            return Require.result("flux linkage", turns * 0.5 * Math.PI * sum);
        }
        double half = 0.5 * (r2 - r1), mid = 0.5 * (r1 + r2);
        for (int k = 0; k < GL_X.length; k++) {
            double r = mid + half * GL_X[k];
            sum += GL_W[k] * h * material.fluxDensityAt(turns * amps / (2 * Math.PI * r));
        }
        return Require.result("flux linkage", turns * half * sum);
    }

    /** The flux density at the inner edge of the core, the highest in the section. */
    public Quantity peakFluxDensity(Quantity current) {
        double i = Require.si("current", current, Dimension.CURRENT);
        return Quantity.of(material.fluxDensityAt(turns * i / (2 * Math.PI * innerRadius())), Dimension.FLUX_DENSITY);
    }

    /** The current at which the inner edge reaches the material's saturation flux density. */
    public Quantity saturationCurrent() {
        double bs = material.saturationFluxDensity().si();
        if (!(bs < UNSATURABLE)) {
            throw new IllegalStateException("this toroid's core was given only as μr = " + Quantity.number(material.relativePermeability())
                    + ", with no saturation flux density; give a MagneticMaterial for the saturation check");
        }
        double hs = material.fieldAt(bs);
        return Quantity.of(hs * 2 * Math.PI * innerRadius() / turns, Dimension.CURRENT);
    }

    /**
     * The core as a circuit part with IEC 60205 effective dimensions. Rectangular section:
     * C1 = 2π/(h·ln(r2/r1)), C2 = 2π(1/r1 − 1/r2)/(h²·ln³(r2/r1)) (IEC 60205, ring cores; from memory),
     * so l<sub>e</sub> = 2π·ln(r2/r1)/(1/r1 − 1/r2), A<sub>e</sub> = h·ln²(r2/r1)/(1/r1 − 1/r2).
     * Circular section: l<sub>e</sub> = 2πR, A<sub>e</sub> chosen to give the exact inductance.
     */
    public Core asCore() {
        double le, ae;
        if (circular) {
            le = 2 * Math.PI * r1;
            ae = (r1 - Math.sqrt(r1 * r1 - r2 * r2)) * le; // L = μ N² Ae/le with le = 2πR
        } else {
            double ln = Math.log(r2 / r1), inv = 1 / r1 - 1 / r2;
            le = 2 * Math.PI * ln / inv;
            ae = h * ln * ln / inv;
        }
        return Core.of("toroid", Quantity.of(le, Dimension.LENGTH), Quantity.of(ae, Dimension.AREA), material);
    }

    @Override
    public String toString() {
        String g = circular
                ? "circular section " + Quantity.of(2 * r2, Dimension.LENGTH) + " on " + Quantity.of(2 * r1, Dimension.LENGTH) + " mean diameter"
                : Quantity.of(2 * r1, Dimension.LENGTH) + " / " + Quantity.of(2 * r2, Dimension.LENGTH) + " × " + Quantity.of(h, Dimension.LENGTH);
        return "toroid, " + turns + " turns, " + g + ", μr = " + Quantity.number(material.relativePermeability()) + "; L = " + inductance();
    }

    // 48-point Gauss-Legendre rule on [-1, 1] from Commons Math
    private static final double[] GL_X = new double[48];
    private static final double[] GL_W = new double[48];

    static {
        var rule = new org.apache.commons.math3.analysis.integration.gauss.GaussIntegratorFactory().legendre(48);
        for (int k = 0; k < 48; k++) {
            GL_X[k] = rule.getPoint(k);
            GL_W[k] = rule.getWeight(k);
        }
    }
}
