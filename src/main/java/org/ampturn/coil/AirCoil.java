package org.ampturn.coil;

import org.ampturn.units.Quantity;

/**
 * An air-cored coil whose turns are coaxial circles: a {@link Solenoid} or a {@link Multilayer}
 * winding. {@link Loops#mutualInductance(AirCoil, AirCoil, Quantity)} couples two of them.
 */
public sealed interface AirCoil permits Solenoid, Multilayer {
    /** Best estimate of the self-inductance. */
    Quantity inductance();

    /** Number of turns. */
    int turns();
}
