/**
 * Drives and transients: a supply and switch (DC step, PWM, peak-and-hold) drive a coil or a
 * moving-armature actuator; a clamp takes the current when the switch opens; {@link
 * org.ampturn.drive.Circuit#simulate} returns a {@link org.ampturn.drive.Transient} with signals,
 * metrics, an energy ledger, markers and cautions.
 *
 * <p>Conventions: SI doubles inside (weber-turns, amperes, volts, seconds, joules), {@code Quantity}
 * on the surface; no nulls accepted or returned (a figure that does not apply is NaN); immutable
 * values with {@code with…} copies. The state is the coil's flux linkage (plus snubber capacitor
 * voltage, armature position and speed) and the running energy integrals; linear pieces are solved
 * in closed form (first-order RL response, Hayt, Kemmerly and Durbin, Engineering Circuit Analysis,
 * 8th ed., ch. 8), the rest with Commons Math's Dormand-Prince 8(5,3) integrator (Hairer, Nørsett and
 * Wanner, Solving ODEs I, II.5). Loops poll the thread's interrupt flag and stop with a
 * {@link java.util.concurrent.CancellationException}. Levels are checked against the drive's range
 * (voltages to 1 MV, currents 1 nA to 1 MA, frequencies to 1 GHz, a hysteresis band of at least
 * 1/10 000 of the hold current), a run's samples against the memory left and its switching segments
 * against a cap of 20 000 000. A coil wound on a core with loss data draws its core loss through a
 * core-loss branch (instantaneous iGSE, Venkatachalam et al., IEEE COMPEL 2002) that the ledger
 * counts; a coupled secondary winding follows the two-coupled-inductor equations (Hayt et al. ch. 13).
 * Equations and assumptions: lib-docs/drives.md, clamps.md, transients.md, core-loss.md.
 */
package org.ampturn.drive;
