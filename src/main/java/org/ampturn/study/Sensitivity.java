package org.ampturn.study;

import java.util.Locale;
import org.ampturn.units.Quantity;

/**
 * How much one toleranced parameter moves one output.
 *
 * @param parameter the parameter
 * @param output    the output
 * @param swing     change of the output as the parameter goes from the low to the high end of its band
 * @param share     the parameter's share of the output's variance, 0 to 1, to first order
 *                  (Σ over parameters = 1); from one-at-a-time swings for corners, from a linear
 *                  fit of the samples for Monte Carlo
 */
public record Sensitivity(String parameter, String output, Quantity swing, double share) {
    @Override
    public String toString() {
        return String.format(Locale.ROOT, "%s: %.1f %% of the variance of %s (swing %s)", parameter, 100 * share, output, swing);
    }
}
