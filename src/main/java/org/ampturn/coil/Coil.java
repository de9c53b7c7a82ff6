package org.ampturn.coil;

import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;

/**
 * What a drive needs to know of a coil: how flux linkage and current relate, and its resistance at
 * a temperature. Surface methods return {@link Quantity}; the {@code ...At(double)} methods are the
 * SI kernels the transient solver calls (amperes, weber-turns, kelvin, henry, ohm).
 */
public interface Coil {
    /** Small-signal inductance at zero current. */
    Quantity inductance();

    /** DC resistance at the coil's own temperature. */
    Quantity resistance();

    /** Temperature the coil is taken to be at when none is given. */
    Quantity temperature();

    /** Flux linkage λ (Wb) at current i (A). Strictly increasing in i, odd in i. */
    double fluxLinkageAt(double amps);

    /** Current (A) at flux linkage λ (Wb): the inverse of {@link #fluxLinkageAt(double)}. */
    double currentAt(double weberTurns);

    /** Incremental inductance dλ/di (H) at current i (A). */
    double incrementalInductanceAt(double amps);

    /** DC resistance (Ω) at a temperature (K). */
    double resistanceAt(double kelvin);

    /** One line describing the coil, as the console shows it. */
    String describe();

    /** True when λ is proportional to i (the transient solver may then use closed forms). */
    default boolean isLinear() {
        return true;
    }

    /** The same coil at another temperature (its resistance changes, its magnetics do not). */
    Coil atTemperature(Quantity temperature);

    /**
     * A coil known only by its inductance and resistance, both constant with current. The resistance
     * is taken at 20 °C and scales with temperature as annealed copper does, with the coefficient
     * 0.00393 per kelvin at 20 °C (IEC 60028:1925, from which alpha_20 = 1/254.45 K).
     */
    static Coil lumped(Quantity inductance, Quantity resistance) {
        double l = Require.positive("inductance", inductance, Dimension.INDUCTANCE);
        double r = Require.nonNegative("resistance", resistance, Dimension.RESISTANCE);
        return new LumpedCoil(l, r, org.ampturn.material.Conductor.T20);
    }
}
