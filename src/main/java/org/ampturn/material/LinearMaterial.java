package org.ampturn.material;

import org.ampturn.units.Require;
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
    @Override public double fluxDensityAt(double h) {
        Require.finite("field strength (A/m)", h);
        return Require.result("flux density", MU0 * mur * h);
    }
    @Override public double fieldAt(double b) {
        Require.finite("flux density (T)", b);
        return Require.result("field", b / (MU0 * mur));
    }
    @Override public double incrementalPermeabilityAt(double h) {
        Require.finite("field strength (A/m)", h);
        return Require.result("incremental permeability", mur);
    }

    @Override
    public String toString() {
        String sat = Double.isInfinite(bsat) ? "does not saturate" : "saturates at " + saturationFluxDensity();
        return name + ": linear, μr = " + Quantity.number(mur) + ", " + sat;
    }
}
