package org.ampturn.material;

import java.util.Locale;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;

/**
 * A core material whose permeability rolls off with DC bias, as powder and distributed-gap cores
 * do: the incremental relative permeability at field strength H is
 * μΔ(H) = 1 + (μi − 1) / (1 + (|H| / H½)^n), with H½ the field at which μi − 1 has halved and n the
 * sharpness of the roll-off. This is the curve-fit form 1/(a + b·H^c) in which powder-core makers
 * publish "percent of initial permeability against DC bias", normalised to a = 1 (so b = H½^−n and
 * c = n), with the permeability of free space kept as its floor (common practice). B(H) is its
 * integral, μ0 ∫ μΔ dH, tabulated once on 60 points per decade from 10⁻⁴ H½ to 10⁴ H½ (Simpson's rule
 * on each step) and interpolated as any B-H table; beyond the last point the slope is μ0.
 */
final class RollOffMaterial implements MagneticMaterial {
    private static final int PER_DECADE = 60;
    private static final int DECADES = 8;

    private final String name;
    private final double mui;
    private final double half;
    private final double n;
    private final TableMaterial table;

    RollOffMaterial(String name, double mui, double half, double n, double bsat) {
        this.name = name;
        this.mui = mui;
        this.half = half;
        this.n = n;
        int points = PER_DECADE * DECADES + 1;
        double[] h = new double[points];
        double[] b = new double[points];
        double lo = half * 1e-4;
        h[0] = lo;
        b[0] = MU0 * lo * mui; // below 10⁻⁴ H½ the permeability is μi to 10⁻⁴ⁿ
        for (int k = 1; k < points; k++) {
            h[k] = lo * Math.pow(10, (double) k / PER_DECADE);
            double mid = 0.5 * (h[k - 1] + h[k]);
            b[k] = b[k - 1] + MU0 * (h[k] - h[k - 1]) / 6 * (incremental(h[k - 1]) + 4 * incremental(mid) + incremental(h[k]));
        }
        this.table = new TableMaterial(name, h, b, bsat);
    }

    private double incremental(double h) {
        return 1 + (mui - 1) / (1 + Math.pow(Math.abs(h) / half, n));
    }

    /** The field strength (A/m) at which the incremental permeability has fallen to {@code fraction} of μi. */
    double fieldAtFraction(double fraction) {
        // 1 + (μi − 1)/(1 + x^n) = f μi  ⇒  x^n = (μi − 1)/(f μi − 1) − 1
        double target = fraction * mui;
        if (!(target > 1)) return Double.POSITIVE_INFINITY;
        return half * Math.pow((mui - 1) / (target - 1) - 1, 1 / n);
    }

    @Override public String name() { return name; }
    @Override public double relativePermeability() { return mui; }
    @Override public Quantity saturationFluxDensity() { return table.saturationFluxDensity(); }
    @Override public boolean isLinear() { return false; }

    @Override
    public double fluxDensityAt(double h) {
        Require.finite("field strength (A/m)", h);
        return Require.result("flux density", table.fluxDensityAt(h));
    }

    @Override
    public double fieldAt(double b) {
        Require.finite("flux density (T)", b);
        return Require.result("field strength", table.fieldAt(b));
    }

    /** The roll-off formula itself (the table's slope agrees with it to about 10⁻⁴). */
    @Override
    public double incrementalPermeabilityAt(double h) {
        Require.finite("field strength (A/m)", h);
        return incremental(h);
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "%s: μi = %s rolling off with DC bias, half at %s (sharpness %s), saturates at %s", name,
                Quantity.of(mui, Dimension.NONE), Quantity.of(half, Dimension.FIELD_STRENGTH), Quantity.of(n, Dimension.NONE),
                table.saturationFluxDensity());
    }
}
