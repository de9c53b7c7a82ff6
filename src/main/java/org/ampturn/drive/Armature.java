package org.ampturn.drive;

import org.ampturn.units.Quantity;

/**
 * A coil whose magnetic circuit changes as an armature moves: what a drive needs of a plunger
 * actuator. Position {@code x} (m) runs from 0 (open, largest gap) to {@link #strokeMetres()}
 * (closed); end stops sit at both ends. Kernels in SI: weber-turns, metres, newtons, joules.
 *
 * <p>The force follows from the field energy by the energy method, {@code F = −∂W(λ, x)/∂x} at
 * constant flux linkage (Fitzgerald, Kingsley and Umans, Electric Machinery, 6th ed., ch. 3), so an
 * implementation's {@link #forceAt} and {@link #fieldEnergyAt} must agree; the drive's energy ledger
 * checks that they do.
 */
public interface Armature {
    /** Coil current (A) at flux linkage λ (Wb) and position x (m). */
    double currentAt(double weberTurns, double metres);

    /** Magnetic field energy W(λ, x) = ∫ i dλ at constant x (J). */
    double fieldEnergyAt(double weberTurns, double metres);

    /** Magnetic force on the armature toward closing (N): −∂W/∂x at constant λ. */
    double forceAt(double weberTurns, double metres);

    /** Mechanical force toward opening (N): spring with preload, load, damping, at position x and speed v. */
    double restoringForceAt(double metres, double metresPerSecond);

    /** Moving mass (kg). */
    double massKg();

    /** Travel from open to closed (m). */
    double strokeMetres();

    /** Coil resistance (Ω) at the armature's temperature. */
    double resistanceOhms();

    /** Small-signal inductance (H) at position x. */
    double inductanceAt(double metres);

    /** Temperature the coil is taken to be at. */
    Quantity temperature();

    /** The same actuator with its coil at another temperature. */
    Armature atTemperature(Quantity temperature);

    /** One line describing the actuator. */
    String describe();

    /**
     * Eddy currents and shorted turns coupled to the coil (a copper slug, solid iron), as a ladder
     * the drive integrates; {@link EddyLadder#NONE} unless the actuator models them. The current
     * and force methods above then describe the magnetising branch at the ladder's end.
     */
    default EddyLadder eddyLadder() { return EddyLadder.NONE; }

    /**
     * Coefficient of restitution at the stops, from 0 (the armature stops dead, the default) to 1
     * (it rebounds at its impact speed): rebound speed = e × impact speed (Newton's law of impact).
     */
    default double restitution() { return 0; }

    /**
     * Hysteresis of the iron ({@link IronHysteresis}): the run then carries the remanence, so after
     * switch-off the flux falls to the iron's residual rather than to zero, and the residual pull
     * takes part in drop-out and release. {@link IronHysteresis#NONE} (the default) unless the
     * actuator models it; {@link #currentAt} is then the curve without hysteresis.
     */
    default IronHysteresis hysteresis() { return IronHysteresis.NONE; }
}
