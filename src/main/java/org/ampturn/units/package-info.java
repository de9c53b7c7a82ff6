/**
 * Quantities and units: {@link org.ampturn.units.Quantity} (an SI {@code double} and a
 * {@link org.ampturn.units.Dimension}), unit symbols and parsing ({@link org.ampturn.units.Unit},
 * {@link org.ampturn.units.Units}), and the argument checks every package uses
 * ({@link org.ampturn.units.Require}).
 *
 * <p>Conventions: SI inside, engineering notation with SI prefixes outside; {@code toString()} reads
 * back with {@code Quantity.parse}. Values are immutable; {@code equals} is exact and
 * {@code isCloseTo} compares to a tolerance. Nulls are refused with the argument's name. What a user
 * types or computes is finite: the parser refuses NaN, infinities, overflowing and underflowing
 * numbers, exponents beyond ±24 per base unit and brackets nested more than 16 deep, naming the
 * position of the fault; arithmetic that would give NaN or ∞ says so. Only
 * {@code Quantity.of(double, Dimension)}, the kernels' wrapper, carries NaN, for a figure that does
 * not apply.
 *
 * <p>Checks: {@code Require} holds the ranges the models share (lengths 1 nm to 10 km, turns 1 to
 * 10 000 000, absolute temperatures up to 10 000 K), the message format (one line, a headline of at
 * most about 120 characters, numbers in engineering notation, user text quoted and cut), the
 * interrupt poll of long loops and the memory check of large studies. A new kind of check goes there,
 * not into a private copy.
 *
 * <p>Sources: unit factors are the exact definitions of NIST SP 811 (2008) Appendix B and the SI
 * Brochure (BIPM, 9th edition, 2019). See lib-docs/units.md.
 */
package org.ampturn.units;
