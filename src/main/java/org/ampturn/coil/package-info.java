/**
 * Coils and magnetic circuits: single-layer solenoids ({@link org.ampturn.coil.Solenoid}), multilayer
 * air coils ({@link org.ampturn.coil.Multilayer}), mutual inductance ({@link org.ampturn.coil.Loops}),
 * toroids, magnetic circuits of cores and gaps ({@link org.ampturn.coil.MagneticCircuit}), open rod
 * cores, and the coil a drive sees ({@link org.ampturn.coil.Coil}, {@link org.ampturn.coil.WoundCoil}).
 *
 * <p>Conventions: SI inside; {@code Quantity} on the surface; static {@code ...At(double...)}
 * kernels take and return SI doubles and do not allocate. Objects are immutable, built by
 * {@code of}/{@code singleLayer}/{@code rectangular} factories and changed by {@code with...}
 * copies. Null arguments are errors; every bad argument fails at the door with a message naming
 * the parameter, its value and the valid range (through {@link org.ampturn.units.Require}: lengths
 * 1 nm to 10 km, 1 to 10 000 000 turns). The kernels refuse NaN and infinities too, and fail rather
 * than return NaN or ∞ when their arguments leave the model's range; the AGM loops have an
 * iteration cap, and filament sums a work cap and an interrupt poll.
 *
 * <p>Sources (each class names the formula it uses and its range): Maxwell, Treatise on Electricity
 * and Magnetism, 1873; Nagaoka 1909; Rosa, Bull. Bureau of Standards 2, 1906; Rosa and Grover,
 * Bull. Bureau of Standards 8, 1912; Wheeler, Proc. IRE 16, 1928 and Proc. IEEE 70, 1982; Brooks,
 * Bureau of Standards J. Research 7, 1931; Grover, Inductance Calculations, 1946; Abramowitz and
 * Stegun, Handbook of Mathematical Functions, 1964, ch. 17; Osborn, Phys. Rev. 67, 1945; McLyman,
 * Transformer and Inductor Design Handbook, 3rd ed., 2004; IEC 60205 and IEC 60028.
 * Pages: lib-docs/solenoid.md, multilayer.md, mutual.md, toroid.md, magnetic-circuit.md.
 */
package org.ampturn.coil;
