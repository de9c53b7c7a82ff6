/**
 * Axisymmetric magnetostatic field solutions for bodies of revolution (plungers and stops, pot
 * cores, rod and drum cores, air coils) in the r-z half plane: a {@link org.ampturn.field.Geometry}
 * of named {@link org.ampturn.field.Region}s, a graded {@link org.ampturn.field.Mesh}, a
 * {@link org.ampturn.field.Solution} with flux linkage, inductance, energy, co-energy and flux
 * density, the {@link org.ampturn.field.AxialForce} on a part two ways, and force-stroke-current
 * maps that a drive integrates.
 *
 * <p>Conventions: SI doubles inside (metres, amperes, webers, teslas, joules, newtons),
 * {@code Quantity} on the surface; no nulls; immutable values with {@code with…} copies. The
 * formulation is the azimuthal vector potential A_φ on first-order triangles (Silvester and Ferrari,
 * Finite Elements for Electrical Engineers, 3rd ed., 1996; Jin, The Finite Element Method in
 * Electromagnetics; both from memory), the open boundary a truncated domain (its error stated in
 * lib-docs/field.md), nonlinear iron by Newton-Raphson with a bounded number of steps, the sparse
 * Cholesky factor from EJML. Long loops poll the thread's interrupt flag. See lib-docs/field.md.
 */
package org.ampturn.field;
