/**
 * Studies over the magnetics library: sweeps of one or two parameters ({@link Sweep}, {@link Axis},
 * {@link Table}), solving for a target ({@link Solve}), optimisation with bounds and constraints
 * ({@link Optimisation}, {@link Optimum}) and tolerance analysis by corners and Monte Carlo
 * ({@link Tolerance}, {@link Corners}, {@link MonteCarlo}).
 *
 * <p>Conventions: values cross the surface as {@link org.ampturn.units.Quantity}; tables and
 * results store plain SI {@code double} columns (NaN where a row failed). Nothing here accepts
 * {@code null} unless a method says so. Runs use a fixed split into blocks of points and as many
 * threads as the machine has cores (or {@code withThreads(n)}); results never depend on the number
 * of threads. Long runs report to a {@link Progress} listener and stop early, keeping what they have
 * computed, when the calling thread is interrupted (its workers are interrupted too, so a long point
 * ends at once). A study's size is checked before it starts: at most 100 000 000 points, and its
 * table must fit in the memory left; the message names the count.
 *
 * <p>Numerical methods come from Apache Commons Math 3.6.1: Brent's root finder
 * ({@code BrentSolver}; R. P. Brent, <i>Algorithms for Minimization without Derivatives</i>, 1973,
 * ch. 4), Powell's BOBYQA (M. J. D. Powell, "The BOBYQA algorithm for bound constrained
 * optimization without derivatives", Cambridge report NA2009/06) and Brent's line minimiser.
 */
package org.ampturn.study;
