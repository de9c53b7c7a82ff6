package org.ampturn.coil;

import java.util.List;
import org.ampturn.material.MagneticMaterial;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;

/**
 * A piece of core in a magnetic circuit: a magnetic path length, a cross-section area and a
 * material, with the flux density taken as uniform over the piece. Reluctance l/(μ0·μr·A) for a
 * linear material (Hopkinson 1886); for a B-H material the piece needs MMF H(Φ/A)·l.
 */
public final class Core implements MagneticCircuit {
    private final String name;
    private final double length;
    private final double area;
    private final MagneticMaterial material;

    private Core(String name, double length, double area, MagneticMaterial material) {
        this.name = name;
        this.length = length;
        this.area = area;
        this.material = material;
    }

    /** A core piece of magnetic path length {@code pathLength}, cross-section {@code area}, of {@code material}. */
    public static Core of(String name, Quantity pathLength, Quantity area, MagneticMaterial material) {
        double l = Require.length("path length", pathLength);
        double a = Require.positive("area", area, Dimension.AREA);
        if (material == null) throw Require.fail("material is missing (null); give a MagneticMaterial");
        return new Core(name == null || name.isBlank() ? material.name() : name, l, a, material);
    }

    /** A core piece named after its material. */
    public static Core of(Quantity pathLength, Quantity area, MagneticMaterial material) {
        return of(null, pathLength, area, material);
    }

    /**
     * This core with an air gap of {@code gapLength} cut into its path: the iron path becomes
     * l − l<sub>g</sub>, in series with a gap of the same area (no fringing). The gap must be
     * shorter than the core's path.
     */
    public MagneticCircuit withGap(Quantity gapLength) {
        double g = checkGap(gapLength);
        return MagneticCircuit.series(new Core(name, length - g, area, material), AirGap.of(gapLength, area()));
    }

    /**
     * As {@link #withGap(Quantity)}, with McLyman's fringing factor at the gap for a winding window
     * of height {@code windowHeight} (see {@link AirGap#withFringing(Quantity)}).
     */
    public MagneticCircuit withGap(Quantity gapLength, Quantity windowHeight) {
        double g = checkGap(gapLength);
        return MagneticCircuit.series(new Core(name, length - g, area, material), AirGap.of(gapLength, area()).withFringing(windowHeight));
    }

    private double checkGap(Quantity gapLength) {
        double g = Require.length("gap length", gapLength);
        if (!(g < length)) {
            throw Require.fail("gap length (" + gapLength + ") must be shorter than the core's path length " + pathLength()
                    + "; valid range: 0 < gap < " + pathLength());
        }
        return g;
    }

    public Quantity pathLength() { return Quantity.of(length, Dimension.LENGTH); }
    public Quantity area() { return Quantity.of(area, Dimension.AREA); }
    public MagneticMaterial material() { return material; }

    @Override public String name() { return name; }
    @Override public double reluctanceSI() { return length / (MU0 * material.relativePermeability() * area); }
    @Override public boolean isLinear() { return material.isLinear(); }
    @Override public double c1() { return length / area; }
    @Override public double c2() { return length / (area * area); }
    @Override public double fluxAt(double ampereTurns) {
        Require.finite("mmf (A)", ampereTurns);
        return Require.result("flux", material.fluxDensityAt(ampereTurns / length) * area);
    }
    @Override public double mmfAt(double weber) {
        Require.finite("flux (Wb)", weber);
        return Require.result("mmf", material.fieldAt(weber / area) * length);
    }
    @Override public List<MagneticCircuit> parts() { return List.of(this); }

    @Override
    public void fluxDensities(double weber, double[] out, int[] next) {
        out[next[0]++] = weber / area;
    }

    /** Saturation flux density of the material (T). */
    double saturationSI() {
        return material.saturationFluxDensity().si();
    }

    @Override
    public String toString() {
        return "core " + name + ": path " + pathLength() + ", area " + area() + ", μr = " + Quantity.number(material.relativePermeability())
                + "; R = " + reluctance() + ", AL = " + alValue();
    }
}
