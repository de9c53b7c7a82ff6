/**
 * Round magnet wire and windings: AWG (ASTM B258) and metric sizes, enamel builds, copper and
 * aluminium conductors, windings on bobbins (layers, fill, mean length of turn, resistance, mass),
 * skin effect in a round wire (exact Bessel solution) and Dowell's method for layered windings.
 *
 * <p>Conventions: immutable values; factories {@code of…}/{@code awg}/{@code metric}, copies
 * {@code with…}, accessors without {@code get}. The surface takes and returns
 * {@link org.ampturn.units.Quantity}; methods ending in {@code At(double)} or {@code M()} are SI
 * kernels (metres, ohms, kelvin, hertz). Null arguments are refused. Bad values fail at the door with
 * a message naming the parameter, the value and the valid range; resistance at a temperature is
 * refused outside −100 °C to 400 °C, where the linear law of IEC 60028 no longer holds.
 *
 * <p>Sources: ASTM B258 (AWG), NEMA MW 1000 and IEC 60317 (insulation builds, typical nominal
 * values), IEC 60028 and IEC 60889 (resistivity), Ramo–Whinnery–Van Duzer (skin effect in a round
 * wire), P. L. Dowell, Proc. IEE 113(8), 1966 (layered windings). See lib-docs/wire.md.
 */
package org.ampturn.wire;
