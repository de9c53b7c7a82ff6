package org.ampturn.material;

import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;

/** B = μ0·μr·H with a saturation flux density for the saturation check. */
final class LinearMaterial implements MagneticMaterial {
    private final String name;
    private final double mur;
    private final double bsat;

    LinearMaterial(String name, double mur, double bsat) {
        this.name = name;
        this.mur = mur;
        this.bsat = bsat;
    }

    @Override public String name() { return name; }
    @Override public double relativePermeability() { return mur; }
    @Override public Quantity saturationFluxDensity() { return Quantity.of(bsat, Dimension.FLUX_DENSITY); }
    @Override public double fluxDensityAt(double h) { return MU0 * mur * h; }
    @Override public double fieldAt(double b) { return b / (MU0 * mur); }
    @Override public double incrementalPermeabilityAt(double h) { return mur; }

    @Override
    public String toString() {
        String sat = Double.isInfinite(bsat) ? "does not saturate" : "saturates at " + saturationFluxDensity();
        return name + ": linear, μr = " + Quantity.number(mur) + ", " + sat;
    }
}
