package org.ampturn.material;

import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;

/**
 * A soft magnetic material as the magnetic circuit sees it: its B-H relation (anhysteretic,
 * single-valued, odd in H) and its saturation flux density. Surface accessors return
 * {@link Quantity}; the {@code ...At(double)} kernels work in SI (A/m, T).
 */
public interface MagneticMaterial {
    /** Vacuum permeability μ0 in H/m (CODATA 2018: 1.25663706212e-6, taken here as 4π·1e-7). */
    double MU0 = 4e-7 * Math.PI;

    String name();

    /** Initial (small-signal) relative permeability. */
    double relativePermeability();

    /** Flux density at which the material is taken as saturated (for the saturation check). */
    Quantity saturationFluxDensity();

    /** B (T) at field strength H (A/m). */
    double fluxDensityAt(double fieldAmpsPerMetre);

    /** H (A/m) at flux density B (T): the inverse of {@link #fluxDensityAt(double)}. */
    double fieldAt(double tesla);

    /** True when B = μ0·μr·H everywhere (no saturation in the B-H relation itself). */
    default boolean isLinear() {
        return true;
    }

    /**
     * A linear material: B = μ0·μr·H, flagged as saturated above {@code saturation}.
     * The B-H relation itself stays linear; use a B-H table for a curve that bends.
     */
    static MagneticMaterial linear(String name, double relativePermeability, Quantity saturation) {
        Require.positive("relative permeability", relativePermeability);
        double bsat = Require.positive("saturation flux density", saturation, Dimension.FLUX_DENSITY);
        return new LinearMaterial(name, relativePermeability, bsat);
    }
}
