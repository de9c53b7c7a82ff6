package org.ampturn.field;

import org.ampturn.drive.Armature;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;

/**
 * A lumped armature model (such as {@code Plunger}) set against a field map of the same device over
 * the stroke: the small-signal inductance both ways at each mapped position, and the factor by which
 * each permeance of the lumped circuit differs. A lumped circuit of a working gap that closes with x
 * in series with fixed reluctances has {@code N²/L = R_fixed + R_gap(x)}, linear in x; fitting a line
 * to N²/L of each model (least squares) gives the working gap's permeance factor as the ratio of the
 * slopes (lumped/field) and the fixed path's as the ratio of the values at the closed end.
 * Factors above 1 mean the field finds more permeance (fringing, leakage) than the lumped model.
 */
public final class Calibration {
    private final double[] x, lField, lLumped;
    private final double gapFactor, fixedFactor;

    private Calibration(double[] x, double[] lField, double[] lLumped, double gapFactor, double fixedFactor) {
        this.x = x;
        this.lField = lField;
        this.lLumped = lLumped;
        this.gapFactor = gapFactor;
        this.fixedFactor = fixedFactor;
    }

    /** Compare {@code lumped} with the field map (its small-signal inductance, the lowest mapped current). */
    public static Calibration of(FieldMap map, Armature lumped) {
        Require.present("field map", map);
        Require.present("lumped model", lumped);
        double[][] t = map.lambdaTable();
        double[] x = map.positions();
        double i1 = map.currents()[1];
        int n = x.length;
        double[] lf = new double[n], ll = new double[n], rf = new double[n], rl = new double[n];
        for (int k = 0; k < n; k++) {
            lf[k] = t[k][1] / i1;
            ll[k] = lumped.inductanceAt(Math.min(x[k], lumped.strokeMetres()));
            rf[k] = 1 / lf[k];
            rl[k] = 1 / ll[k];
        }
        double[] ff = fit(x, rf), fl = fit(x, rl);
        double s = x[n - 1];
        double gap = fl[1] / ff[1];
        double fixed = (fl[0] + fl[1] * s) / (ff[0] + ff[1] * s);
        return new Calibration(x, lf, ll, Require.result("gap permeance factor", gap), Require.result("fixed permeance factor", fixed));
    }

    /** Least-squares line a + b·x. */
    private static double[] fit(double[] x, double[] y) {
        int n = x.length;
        double sx = 0, sy = 0, sxx = 0, sxy = 0;
        for (int k = 0; k < n; k++) {
            sx += x[k];
            sy += y[k];
            sxx += x[k] * x[k];
            sxy += x[k] * y[k];
        }
        double b = (n * sxy - sx * sy) / (n * sxx - sx * sx);
        return new double[] {(sy - b * sx) / n, b};
    }

    /** Working-gap permeance factor: field over lumped. */
    public double gapPermeanceFactor() { return gapFactor; }
    /** Fixed-path (parasitic and residual gaps, iron) permeance factor at the closed end: field over lumped. */
    public double fixedPermeanceFactor() { return fixedFactor; }
    public double[] positions() { return x.clone(); }
    /** Small-signal inductance from the field (H) at each position. */
    public double[] fieldInductances() { return lField.clone(); }
    /** Small-signal inductance of the lumped model (H) at each position. */
    public double[] lumpedInductances() { return lLumped.clone(); }

    @Override
    public String toString() {
        int n = x.length;
        return "calibration over " + Quantity.of(x[n - 1], Dimension.LENGTH) + ": L open " + Quantity.of(lField[0], Dimension.INDUCTANCE) + " field vs "
                + Quantity.of(lLumped[0], Dimension.INDUCTANCE) + " lumped, closed " + Quantity.of(lField[n - 1], Dimension.INDUCTANCE) + " vs "
                + Quantity.of(lLumped[n - 1], Dimension.INDUCTANCE) + "; permeance factor working gap " + String.format("%.3f", gapFactor)
                + ", fixed path " + String.format("%.3f", fixedFactor);
    }
}
