/**
 * Materials: conductors (copper per IEC 60028, aluminium per IEC 60889), soft magnetic materials
 * (linear, or nonlinear from a B-H table with monotone Fritsch–Carlson interpolation), generic
 * material classes with typical values ({@link org.ampturn.material.Materials}) and core loss
 * (Steinmetz; iGSE of Venkatachalam et al., IEEE COMPEL 2002).
 *
 * <p>Conventions: immutable values; SI inside (A/m, T, Ω·m, W/m³, K); Quantity on the surface;
 * {@code ...At(double)} kernels for solvers. Typical values are marked "typical, from memory" unless
 * a published table is named. Null arguments are refused. See lib-docs/materials.md and
 * lib-docs/core-loss.md.
 */
package org.ampturn.material;
