package org.ampturn.coil;

import org.ampturn.material.MagneticMaterial;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;

/**
 * Test material with the Fröhlich-Kennelly B-H relation B = μ0·H + Js·H/(Hk + |H|) (Fröhlich 1881;
 * Kennelly 1891), which has a closed-form inverse. Initial μr = 1 + Js/(μ0·Hk). Parameters are
 * invented for tests only.
 */
final class FrohlichMaterial implements MagneticMaterial {
    final double js;
    final double hk;
    final double bsat;

    FrohlichMaterial(double js, double hk, double bsat) {
        this.js = js;
        this.hk = hk;
        this.bsat = bsat;
    }

    @Override public String name() { return "test steel"; }
    @Override public double relativePermeability() { return 1 + js / (MU0 * hk); }
    @Override public Quantity saturationFluxDensity() { return Quantity.of(bsat, Dimension.FLUX_DENSITY); }
    @Override public boolean isLinear() { return false; }

    @Override
    public double fluxDensityAt(double h) {
        return MU0 * h + js * h / (hk + Math.abs(h));
    }

    @Override
    public double fieldAt(double b) {
        double s = Math.signum(b), bb = Math.abs(b);
        double p = MU0 * hk + js - bb;
        return s * (-p + Math.sqrt(p * p + 4 * MU0 * bb * hk)) / (2 * MU0);
    }
}
