package org.ampturn.material;

import java.util.Objects;
import java.util.Optional;
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
        Require.between("relative permeability", relativePermeability, 1e-3, 1e8);
        double bsat = Require.positive("saturation flux density", saturation, Dimension.FLUX_DENSITY);
        return new LinearMaterial(name, relativePermeability, bsat);
    }

    /**
     * Incremental (differential) relative permeability (dB/dH)/μ0 at field strength H (A/m).
     * The default differentiates {@link #fluxDensityAt} numerically; tables give it exactly.
     */
    default double incrementalPermeabilityAt(double fieldAmpsPerMetre) {
        double h = fieldAmpsPerMetre;
        double step = Math.max(1e-3, Math.abs(h) * 1e-6);
        return (fluxDensityAt(h + step) - fluxDensityAt(h - step)) / (2 * step) / MU0;
    }

    /** Amplitude relative permeability B/(μ0·H) at field strength H (A/m); the initial value at H = 0. */
    default double amplitudePermeabilityAt(double fieldAmpsPerMetre) {
        Require.finite("field strength (A/m)", fieldAmpsPerMetre);
        // below 1 µA/m B/(μ0 H) is the initial permeability (and the division would underflow)
        if (Math.abs(fieldAmpsPerMetre) < 1e-6) return Require.result("amplitude permeability", relativePermeability());
        return Require.result("amplitude permeability", fluxDensityAt(fieldAmpsPerMetre) / (MU0 * fieldAmpsPerMetre));
    }

    /** B at a field strength, on the Quantity surface. */
    default Quantity fluxDensity(Quantity fieldStrength) {
        return Quantity.of(fluxDensityAt(Require.si("field strength", fieldStrength, Dimension.FIELD_STRENGTH)), Dimension.FLUX_DENSITY);
    }

    /** H at a flux density, on the Quantity surface. */
    default Quantity field(Quantity fluxDensity) {
        return Quantity.of(fieldAt(Require.si("flux density", fluxDensity, Dimension.FLUX_DENSITY)), Dimension.FIELD_STRENGTH);
    }

    /** The material's core-loss model, when one is known. */
    default Optional<CoreLoss> coreLoss() {
        return Optional.empty();
    }

    /** The same material with a core-loss model, e.g. from datasheet Steinmetz parameters. */
    default MagneticMaterial withCoreLoss(CoreLoss loss) {
        Require.present("core loss", loss);
        return new LossyMaterial(this, loss);
    }

    /**
     * A powder or distributed-gap core material whose permeability rolls off with DC bias: the
     * incremental relative permeability is μΔ(H) = 1 + (μi − 1)/(1 + (|H|/H½)^n). This is the curve
     * fit 1/(a + b·H^c) of makers' "percent permeability against DC bias" curves normalised to a = 1,
     * so H½ = (a/b)^(1/c) in the fit's units and n = c. A core of such a material carries the bias
     * in its own permeability; a gap in the magnetic circuit adds to it.
     *
     * @param initialPermeability μi, 1.5 to 10⁶
     * @param halfField H½, the DC field at which μi − 1 has halved
     * @param sharpness n, 0.5 to 5 (larger is a sharper knee)
     * @param saturation flux density taken as saturated by the saturation check
     */
    static MagneticMaterial rollOff(String name, double initialPermeability, Quantity halfField, double sharpness, Quantity saturation) {
        Require.name("material", name);
        Require.between("initial relative permeability μi", initialPermeability, 1.5, 1e6);
        double half = Require.positive("field at half permeability", halfField, Dimension.FIELD_STRENGTH, 1e8);
        Require.between("roll-off sharpness n", sharpness, 0.5, 5);
        double bsat = Require.positive("saturation flux density", saturation, Dimension.FLUX_DENSITY, 10);
        return new RollOffMaterial(name, initialPermeability, half, sharpness, bsat);
    }

    /**
     * A nonlinear material from its B-H table in SI (H in A/m, B in T), e.g. from a datasheet curve.
     * H and B must increase strictly; the origin is added when missing. Between the points a monotone
     * cubic (Fritsch–Carlson 1980) is used, beyond the last point the slope is μ0, and the curve is odd.
     *
     * @param saturation flux density (T) taken as saturated by the saturation check
     */
    static MagneticMaterial fromTable(String name, double[] fieldAmpsPerMetre, double[] tesla, double saturation) {
        Require.present("name", name);
        Require.present("H values", fieldAmpsPerMetre);
        Require.present("B values", tesla);
        Require.positive("saturation flux density (T)", saturation);
        return new TableMaterial(name, fieldAmpsPerMetre, tesla, saturation);
    }

    /** A nonlinear material from a B-H table of quantities (H in A/m or Oe, B in T or G). */
    static MagneticMaterial fromTable(String name, Quantity[] field, Quantity[] fluxDensity, Quantity saturation) {
        Require.present("H values", field);
        Require.present("B values", fluxDensity);
        double[] h = new double[field.length];
        double[] b = new double[fluxDensity.length];
        for (int i = 0; i < h.length; i++) h[i] = Require.si("H[" + i + "]", field[i], Dimension.FIELD_STRENGTH);
        for (int i = 0; i < b.length; i++) b[i] = Require.si("B[" + i + "]", fluxDensity[i], Dimension.FLUX_DENSITY);
        return fromTable(name, h, b, Require.positive("saturation flux density", saturation, Dimension.FLUX_DENSITY));
    }
}
