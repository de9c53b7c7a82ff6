/**
 * Electromagnetic actuators: the holding force of an electromagnet two ways ({@link
 * org.ampturn.actuator.Electromagnet}, {@link org.ampturn.actuator.Force}), and the plunger
 * ({@link org.ampturn.actuator.Plunger}) that a drive integrates as a {@link org.ampturn.drive.Armature}:
 * lumped reluctances of the working gap (flat, conical or stepped pole; Roters' fringing
 * permeances, {@link org.ampturn.actuator.Permeance}), a parasitic gap and an iron path; eddy
 * currents, shorted turns and copper slugs as a {@link org.ampturn.drive.EddyLadder}; stops with
 * restitution; remanence by the recoil-line model (static); pick-up and drop-out voltage; force-stroke curves ({@link org.ampturn.actuator.ForceStroke}).
 * AC magnets: the shaded pole's two-flux phasor steady state ({@link org.ampturn.actuator.ShadedPole}) and
 * the AC solenoid ({@link org.ampturn.actuator.AcSolenoid}), whose current, power and power factor open
 * and closed come from the periodic steady state of a sine-drive run of the saturating iron.
 *
 * <p>Conventions: SI doubles in the kernels ({@code ...At} methods: weber-turns, metres, amperes,
 * newtons, joules), {@code Quantity} on the surface; immutable values, {@code of…} factories and
 * {@code with…} copies; no nulls accepted (a missing argument is refused by name) or returned; a
 * figure that does not exist is NaN. Arguments are checked through {@code units/Require} so that NaN
 * fails. Sources: H. C. Roters, Electromagnetic Devices, Wiley 1941 (reluctances, probable flux
 * paths; formulas from memory, checked in the tests against their derivations); Fitzgerald,
 * Kingsley and Umans, Electric Machinery, 6th ed., ch. 3, and Woodson and Melcher,
 * Electromechanical Dynamics, 1968, ch. 3 (force by energy and co-energy); Maxwell, Treatise, 1873,
 * §641; IEC 60028 / IEC 60889 (conductor resistivity and temperature coefficient); Lammeraner and
 * Štafl, Eddy Currents, 1966 (rod eddy loss, from memory); IEEE Std 1459-2010 (power factor P/S of a
 * non-sinusoidal current). Pages: lib-docs/force.md, plunger.md, ac-magnets.md.
 */
package org.ampturn.actuator;
