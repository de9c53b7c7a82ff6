/**
 * Steady heating of coils: temperature rise from dissipated power and surface area by a named
 * empirical rule ({@link org.ampturn.thermal.Cooling}), hot resistance solved self-consistently with
 * the temperature ({@link org.ampturn.thermal.Heating}), insulation thermal classes of IEC 60085
 * ({@link org.ampturn.thermal.InsulationClass}) and the warnings that go with a hot coil.
 *
 * <p>Conventions: SI inside (W, m², K); Quantity on the surface; immutable values. Temperatures
 * given to the surface are absolute ({@code degC(40)}); rises and allowances are differences in K.
 * The rules are estimates for a coil in still air: measure a prototype (resistance method) before
 * relying on them, and follow local codes and licensed practice for anything that can burn or shock.
 * See lib-docs/thermal.md.
 */
package org.ampturn.thermal;
