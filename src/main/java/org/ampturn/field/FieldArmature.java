package org.ampturn.field;

import org.ampturn.drive.Armature;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;
import org.apache.commons.math3.analysis.interpolation.SplineInterpolator;
import org.apache.commons.math3.analysis.polynomials.PolynomialSplineFunction;

/**
 * A {@link FieldMap} as an {@link Armature}: the drive integrates flux linkage, and this class reads
 * current, energy and force from the map. At a position x each current level's λ comes from a
 * natural cubic spline in x of i/λ (a reluctance, nearly linear in the gap, so the spline follows
 * the steep rise of λ near closing without ringing); i(λ) is the monotone cubic through the (λ, i) points
 * (Fritsch and Carlson, SIAM J. Numer. Anal. 17, 1980), odd in λ, continued beyond the top current
 * with the last segment's slope. The energy {@code W(λ, x) = ∫₀^λ i dλ} is integrated exactly on the
 * cubic pieces and the force is {@code −∂W/∂x} at constant λ (a central difference of 10⁻⁵ of the
 * stroke), so force and energy agree as the drive's energy ledger expects. The mechanical side
 * (spring, load, damping, mass, coil resistance and temperature) is that of another armature,
 * typically the lumped {@code Plunger} of the same device.
 */
public final class FieldArmature implements Armature {
    private final FieldMap map;
    private final Armature mechanics;
    private final double stroke;
    private final double[] amps;
    private final PolynomialSplineFunction[] lambdaOfX; // per current level: i/λ as a function of x

    private FieldArmature(FieldMap map, Armature mechanics, PolynomialSplineFunction[] splines) {
        this.map = map;
        this.mechanics = mechanics;
        this.stroke = map.strokeAt();
        this.amps = map.currents();
        this.lambdaOfX = splines;
    }

    static FieldArmature of(FieldMap map, Armature mechanics) {
        Require.present("field map", map);
        Require.present("mechanics (an armature such as a Plunger)", mechanics);
        double[][] table = map.lambdaTable();
        double s = map.strokeAt();
        if (!(Math.abs(mechanics.strokeMetres() - s) <= 1e-3 * s)) {
            throw Require.fail("the mechanics' stroke " + Require.show(mechanics.strokeMetres(), Dimension.LENGTH) + " differs from the field map's " + map.stroke());
        }
        double[] x = map.positions();
        double[] amps = map.currents();
        PolynomialSplineFunction[] sp = new PolynomialSplineFunction[amps.length];
        for (int j = 0; j < amps.length; j++) {
            double[] l = new double[x.length];
            for (int k = 0; k < x.length; k++) {
                l[k] = j == 0 ? 0 : amps[j] / table[k][j];
                if (j > 0 && !(table[k][j] > table[k][j - 1])) {
                    throw Require.fail("field map: flux linkage does not rise with current at position " + Require.show(x[k], Dimension.LENGTH) + " between "
                            + Require.show(amps[j - 1], Dimension.CURRENT) + " and " + Require.show(amps[j], Dimension.CURRENT));
                }
            }
            sp[j] = new SplineInterpolator().interpolate(x, l);
        }
        return new FieldArmature(map, mechanics, sp);
    }

    private double clamp(double metres) {
        return Math.max(0, Math.min(stroke, metres));
    }

    /** λ at each current level at position x (strictly rising). */
    private double[] levels(double x) {
        double[] l = new double[amps.length];
        for (int j = 1; j < amps.length; j++) {
            l[j] = amps[j] / lambdaOfX[j].value(x);
            if (!(l[j] > l[j - 1])) l[j] = l[j - 1] + 1e-12 * Math.max(1e-12, Math.abs(l[j - 1]));
        }
        return l;
    }

    /** Fritsch–Carlson slopes di/dλ at the points. */
    private double[] slopes(double[] l) {
        int n = l.length;
        double[] d = new double[n - 1], m = new double[n];
        for (int j = 0; j < n - 1; j++) d[j] = (amps[j + 1] - amps[j]) / (l[j + 1] - l[j]);
        m[0] = d[0];
        m[n - 1] = d[n - 2];
        for (int j = 1; j < n - 1; j++) m[j] = d[j - 1] * d[j] <= 0 ? 0 : (d[j - 1] + d[j]) / 2;
        for (int j = 0; j < n - 1; j++) {
            double a = m[j] / d[j], b = m[j + 1] / d[j];
            double r = a * a + b * b;
            if (r > 9) {
                double t = 3 / Math.sqrt(r);
                m[j] = t * a * d[j];
                m[j + 1] = t * b * d[j];
            }
        }
        return m;
    }

    private static double hermite(double la, double lb, double ia, double ib, double ma, double mb, double lam) {
        double h = lb - la, t = (lam - la) / h;
        double t2 = t * t, t3 = t2 * t;
        return (2 * t3 - 3 * t2 + 1) * ia + (t3 - 2 * t2 + t) * h * ma + (-2 * t3 + 3 * t2) * ib + (t3 - t2) * h * mb;
    }

    /** Current (A) and energy (J) at |λ| and position x. */
    private double[] currentAndEnergy(double lam, double x) {
        double[] l = levels(x);
        double[] m = slopes(l);
        int n = l.length;
        double w = 0;
        for (int j = 0; j < n - 1; j++) {
            if (lam <= l[j + 1]) {
                double i = hermite(l[j], l[j + 1], amps[j], amps[j + 1], m[j], m[j + 1], lam);
                double mid = hermite(l[j], l[j + 1], amps[j], amps[j + 1], m[j], m[j + 1], 0.5 * (l[j] + lam));
                w += (lam - l[j]) / 6 * (amps[j] + 4 * mid + i); // Simpson: exact on a cubic
                return new double[] {i, w};
            }
            double mid = hermite(l[j], l[j + 1], amps[j], amps[j + 1], m[j], m[j + 1], 0.5 * (l[j] + l[j + 1]));
            w += (l[j + 1] - l[j]) / 6 * (amps[j] + 4 * mid + amps[j + 1]);
        }
        double slope = (amps[n - 1] - amps[n - 2]) / (l[n - 1] - l[n - 2]);
        double dl = lam - l[n - 1];
        return new double[] {amps[n - 1] + slope * dl, w + amps[n - 1] * dl + 0.5 * slope * dl * dl};
    }

    @Override
    public double currentAt(double weberTurns, double metres) {
        Require.finite("flux linkage (Wb)", weberTurns);
        Require.finite("position (m)", metres);
        double i = currentAndEnergy(Math.abs(weberTurns), clamp(metres))[0];
        return Require.result("current", Math.copySign(i, weberTurns));
    }

    @Override
    public double fieldEnergyAt(double weberTurns, double metres) {
        Require.finite("flux linkage (Wb)", weberTurns);
        Require.finite("position (m)", metres);
        return Require.result("field energy", currentAndEnergy(Math.abs(weberTurns), clamp(metres))[1]);
    }

    @Override
    public double forceAt(double weberTurns, double metres) {
        Require.finite("flux linkage (Wb)", weberTurns);
        Require.finite("position (m)", metres);
        double x = clamp(metres), h = 1e-5 * stroke, lam = Math.abs(weberTurns);
        double lo = Math.max(0, x - h), hi = Math.min(stroke, x + h);
        double f = -(currentAndEnergy(lam, hi)[1] - currentAndEnergy(lam, lo)[1]) / (hi - lo);
        return Require.result("force", f);
    }

    @Override public double restoringForceAt(double metres, double metresPerSecond) { return mechanics.restoringForceAt(metres, metresPerSecond); }
    @Override public double massKg() { return mechanics.massKg(); }
    @Override public double strokeMetres() { return stroke; }
    @Override public double resistanceOhms() { return mechanics.resistanceOhms(); }
    @Override public Quantity temperature() { return mechanics.temperature(); }

    @Override
    public double inductanceAt(double metres) {
        Require.finite("position (m)", metres);
        return Require.result("inductance", 1 / lambdaOfX[1].value(clamp(metres)));
    }

    @Override
    public FieldArmature atTemperature(Quantity temperature) {
        return new FieldArmature(map, mechanics.atTemperature(temperature), lambdaOfX);
    }

    /** Force toward closing at a current and position (N), from the map's co-energy. */
    public Quantity force(Quantity current, Quantity position) {
        double i = Require.nonNegative("current", current, Dimension.CURRENT);
        double x = Require.inRange("position", position, Dimension.LENGTH, 0, stroke);
        // λ at this current by bisection on i(λ)
        double lo = 0, hi = 1e-6;
        while (currentAt(hi, x) < i && hi < 1e6) hi *= 2;
        for (int it = 0; it < 200 && hi - lo > 1e-15 * hi; it++) {
            double mid = 0.5 * (lo + hi);
            if (currentAt(mid, x) < i) lo = mid; else hi = mid;
        }
        return Quantity.of(forceAt(0.5 * (lo + hi), x), Dimension.FORCE);
    }

    public FieldMap map() { return map; }

    @Override
    public String describe() {
        return "field-map armature of " + map.part() + ", stroke " + map.stroke() + ", L " + Quantity.of(inductanceAt(0), Dimension.INDUCTANCE) + " open to "
                + Quantity.of(inductanceAt(stroke), Dimension.INDUCTANCE) + ", " + Quantity.of(resistanceOhms(), Dimension.RESISTANCE) + ", mass "
                + Quantity.of(massKg(), Dimension.MASS);
    }

    @Override
    public String toString() { return describe(); }
}
