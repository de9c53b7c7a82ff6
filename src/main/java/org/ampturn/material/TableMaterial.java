package org.ampturn.material;

import org.ampturn.units.Require;
import java.util.Locale;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;

/**
 * A nonlinear material from a B-H table (the first-quadrant normal or anhysteretic curve).
 *
 * <p>Between the points: monotone piecewise cubic Hermite interpolation of F. N. Fritsch and
 * R. E. Carlson, "Monotone piecewise cubic interpolation", SIAM J. Numer. Anal. 17(2), 238–246
 * (1980): secant-mean tangents limited to the circle α² + β² ≤ 9, which keeps B strictly increasing
 * in H when the data are. The tangent at H = 0 is the first secant; the tangent at the last point is
 * μ0, and beyond the last point B = B_n + μ0·(H − H_n) (the material is fully saturated: only the
 * vacuum term grows). B(−H) = −B(H).
 *
 * <p>The inverse H(B): a dense inverse table, built once, holds {@value #SUB} sub-points in each
 * table interval with their exact H, B and dH/dB; between two of them H is a cubic Hermite in B,
 * which starts Newton steps on the interval's own cubic B(H); the last step is taken from a
 * residual below {@value #RESIDUAL} T and moves H by less than {@value #STEP} of itself, so by
 * quadratic convergence H is then within rounding of the root. Where a sub-interval is nearly flat (dB/dH almost 0 at an end, as on the
 * flat stretches of the RPN 14 data) or Newton leaves the interval, the inverse falls back to a
 * safeguarded Newton iteration in the one interval that brackets B (bisection whenever a Newton
 * step leaves the bracket), which always converges. Both give the same H to rounding.
 */
final class TableMaterial implements MagneticMaterial {
    private final String name;
    private final double[] h;
    private final double[] b;
    private final double[] m; // dB/dH at the points
    private final double bsat;

    /** Sub-points of the dense inverse table per table interval. */
    static final int SUB = 8;
    /** The fast inverse stops after a Newton step below this fraction of H taken from a residual |B(H) − B| below {@link #RESIDUAL}. */
    static final double STEP = 1e-9;
    /** The residual |B(H) − B| (tesla) below which the last Newton step is taken. */
    static final double RESIDUAL = 1e-12;
    /** Below this ratio of dB/dH at a sub-point to the interval's mean slope, a sub-interval takes the safeguarded path. */
    private static final double FLAT = 1e-3;
    private final double[] ib;  // B at the sub-points, increasing
    private final double[] ih;  // H at the sub-points
    private final double[] ds;  // dH/dB at the start of each sub-interval; NaN where the sub-interval is nearly flat
    private final double[] de;  // dH/dB at the end of each sub-interval

    TableMaterial(String name, double[] hIn, double[] bIn, double bsat) {
        int n = hIn.length;
        if (n != bIn.length) {
            throw Require.fail("the B-H table needs as many B values as H values, got " + n + " H and " + bIn.length + " B");
        }
        boolean hasOrigin = n > 0 && hIn[0] == 0;
        int off = hasOrigin ? 0 : 1;
        double[] hh = new double[n + off];
        double[] bb = new double[n + off];
        for (int i = 0; i < n; i++) {
            if (!Double.isFinite(hIn[i]) || !Double.isFinite(bIn[i])) {
                throw Require.fail("B-H table point " + i + " must be finite, got H = " + hIn[i] + " A/m, B = " + bIn[i] + " T");
            }
            hh[i + off] = hIn[i];
            bb[i + off] = bIn[i];
        }
        if (hasOrigin && bIn[0] != 0) {
            throw Require.fail("B-H table: B at H = 0 must be 0 (an anhysteretic curve through the origin), got " + bIn[0] + " T");
        }
        if (hh.length < 2) throw Require.fail("the B-H table needs at least one point with H > 0, got " + n + " points");
        for (int i = 1; i < hh.length; i++) {
            if (!(hh[i] > hh[i - 1])) {
                throw Require.fail("B-H table: H must increase strictly from 0; H[" + (i - off) + "] = " + hh[i]
                        + " A/m after " + hh[i - 1] + " A/m");
            }
            if (!(bb[i] > bb[i - 1])) {
                throw Require.fail("B-H table: B must increase strictly with H; B[" + (i - off) + "] = " + bb[i]
                        + " T after " + bb[i - 1] + " T");
            }
        }
        this.name = name;
        this.h = hh;
        this.b = bb;
        this.bsat = bsat;
        this.m = tangents(hh, bb);
        int cells = (hh.length - 1) * SUB;
        ib = new double[cells + 1];
        ih = new double[cells + 1];
        ds = new double[cells];
        de = new double[cells];
        for (int i = 0; i < hh.length - 1; i++) {
            double mean = (bb[i + 1] - bb[i]) / (hh[i + 1] - hh[i]);
            for (int k = 0; k < SUB; k++) {
                int j = i * SUB + k;
                double x0 = k == 0 ? hh[i] : hh[i] + (hh[i + 1] - hh[i]) * k / SUB;
                double x1 = k == SUB - 1 ? hh[i + 1] : hh[i] + (hh[i + 1] - hh[i]) * (k + 1) / SUB;
                ih[j] = x0;
                ib[j] = k == 0 ? bb[i] : hermite(i, x0);
                double s0 = slope(i, x0), s1 = slope(i, x1);
                boolean flat = !(s0 > FLAT * mean && s1 > FLAT * mean);
                ds[j] = flat ? Double.NaN : 1 / s0;
                de[j] = 1 / s1;
            }
        }
        ih[cells] = hh[hh.length - 1];
        ib[cells] = bb[bb.length - 1];
        for (int j = 0; j < cells; j++) if (!((j + 1 < cells ? ib[j + 1] : ib[cells]) > ib[j])) ds[j] = Double.NaN;
        // a first point at a vanishing H gives an initial slope no material has (and ∞ in a double)
        Require.between("initial relative permeability of the B-H table", m[0] / MU0, 1e-3, 1e8);
    }

    private static double[] tangents(double[] x, double[] y) {
        int n = x.length;
        double[] d = new double[n - 1];
        for (int i = 0; i < n - 1; i++) d[i] = (y[i + 1] - y[i]) / (x[i + 1] - x[i]);
        double[] t = new double[n];
        t[0] = d[0];
        for (int i = 1; i < n - 1; i++) t[i] = (d[i - 1] + d[i]) / 2;
        t[n - 1] = Math.min(MU0, 3 * d[n - 2]);
        // Fritsch–Carlson limiter, interval by interval
        for (int i = 0; i < n - 1; i++) {
            double a = t[i] / d[i], c = t[i + 1] / d[i];
            double s = a * a + c * c;
            if (s > 9) {
                double tau = 3 / Math.sqrt(s);
                t[i] = tau * a * d[i];
                t[i + 1] = tau * c * d[i];
            }
        }
        return t;
    }

    @Override public String name() { return name; }

    @Override public double relativePermeability() { return m[0] / MU0; }

    @Override public Quantity saturationFluxDensity() { return Quantity.of(bsat, Dimension.FLUX_DENSITY); }

    @Override public boolean isLinear() { return false; }

    @Override
    public double fluxDensityAt(double hIn) {
        Require.finite("field strength (A/m)", hIn);
        double x = Math.abs(hIn);
        double r;
        int n = h.length;
        if (x >= h[n - 1]) {
            r = b[n - 1] + MU0 * (x - h[n - 1]);
        } else {
            int i = interval(h, x);
            r = hermite(i, x);
        }
        return Require.result("flux density", hIn < 0 ? -r : r);
    }

    @Override
    public double incrementalPermeabilityAt(double hIn) {
        Require.finite("field strength (A/m)", hIn);
        double x = Math.abs(hIn);
        int n = h.length;
        if (x >= h[n - 1]) return Require.result("incremental permeability", 1);
        int i = interval(h, x);
        return Require.result("incremental permeability", slope(i, x) / MU0);
    }

    @Override
    public double fieldAt(double bIn) {
        Require.finite("flux density (T)", bIn);
        double y = Math.abs(bIn);
        int n = h.length;
        double r;
        if (y >= b[n - 1]) {
            r = h[n - 1] + (y - b[n - 1]) / MU0;
        } else {
            r = fastInverse(y);
        }
        return Require.result("field", bIn < 0 ? -r : r);
    }

    /** H at 0 ≤ y < B_n: a Hermite start from the dense inverse table, then Newton on the interval's cubic. */
    private double fastInverse(double y) {
        int j = interval(ib, y);
        double d0 = ds[j], d1 = de[j];
        if (d0 != d0) return guardedInverse(y); // nearly flat: the safeguarded path
        int i = j / SUB;
        double b0 = ib[j], db = ib[j + 1] - b0;
        double h0 = ih[j], dh = ih[j + 1] - h0;
        double t = (y - b0) / db;
        double t2 = t * t, t3 = t2 * t;
        double x = (2 * t3 - 3 * t2 + 1) * h0 + (t3 - 2 * t2 + t) * db * d0 + (-2 * t3 + 3 * t2) * (h0 + dh) + (t3 - t2) * db * d1;
        // Newton on the interval's cubic in its own variable u = (H − H_i)/ΔH: no division but the step
        double hi0 = h[i], dx = h[i + 1] - hi0;
        double bi = b[i], bj = b[i + 1], mi = m[i] * dx, mj = m[i + 1] * dx;
        double u = (x - hi0) / dx;
        for (int it = 0; it < 4; it++) {
            double u2 = u * u, u3 = u2 * u;
            double f = (2 * u3 - 3 * u2 + 1) * bi + (u3 - 2 * u2 + u) * mi + (-2 * u3 + 3 * u2) * bj + (u3 - u2) * mj - y;
            if (f == 0) return hi0 + u * dx;
            double dbdu = (6 * u2 - 6 * u) * (bi - bj) + (3 * u2 - 4 * u + 1) * mi + (3 * u2 - 2 * u) * mj;
            double du = f / dbdu;
            double nu = u - du;
            if (!(nu >= 0 && nu <= 1)) break;
            // quadratic convergence: after a step this small the error is far below rounding
            if (Math.abs(du) <= STEP * nu && Math.abs(f) <= RESIDUAL) return hi0 + nu * dx;
            u = nu;
        }
        return guardedInverse(y);
    }

    /** H at 0 ≤ y < B_n by the safeguarded Newton iteration in the interval that brackets y. */
    double guardedInverse(double y) {
        double r;
        {
            int i = interval(b, y);
            double lo = h[i], hi = h[i + 1];
            // start from the linear interpolate
            double x = lo + (y - b[i]) / (b[i + 1] - b[i]) * (hi - lo);
            for (int it = 0; it < 100; it++) {
                double f = hermite(i, x) - y;
                if (f == 0) break;
                if (f > 0) hi = x; else lo = x;
                double s = slope(i, x);
                double nx = s > 0 ? x - f / s : Double.NaN;
                if (!(nx > lo && nx < hi)) nx = 0.5 * (lo + hi);
                if (Math.abs(nx - x) <= 1e-15 * Math.max(1, Math.abs(x)) || hi - lo <= 1e-15 * hi) { x = nx; break; }
                x = nx;
            }
            r = x;
        }
        return r;
    }

    /** Index i with a[i] <= v < a[i+1]; v is within [a[0], a[n-1]). */
    private static int interval(double[] a, double v) {
        int lo = 0, hi = a.length - 1;
        while (hi - lo > 1) {
            int mid = (lo + hi) >>> 1;
            if (a[mid] <= v) lo = mid; else hi = mid;
        }
        return lo;
    }

    private double hermite(int i, double x) {
        double dx = h[i + 1] - h[i];
        double t = (x - h[i]) / dx;
        double t2 = t * t, t3 = t2 * t;
        return (2 * t3 - 3 * t2 + 1) * b[i] + (t3 - 2 * t2 + t) * dx * m[i] + (-2 * t3 + 3 * t2) * b[i + 1] + (t3 - t2) * dx * m[i + 1];
    }

    private double slope(int i, double x) {
        double dx = h[i + 1] - h[i];
        double t = (x - h[i]) / dx;
        double t2 = t * t;
        return ((6 * t2 - 6 * t) * b[i] + (6 * t2 - 6 * t) * -b[i + 1]) / dx + (3 * t2 - 4 * t + 1) * m[i] + (3 * t2 - 2 * t) * m[i + 1];
    }

    /** The table points (H in A/m, B in T), the origin included. */
    double[][] points() { return new double[][] {h.clone(), b.clone()}; }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "%s: B-H table of %d points up to %s at %s, initial μr = %s, saturates at %s", name, h.length,
                Quantity.of(b[b.length - 1], Dimension.FLUX_DENSITY), Quantity.of(h[h.length - 1], Dimension.FIELD_STRENGTH),
                Quantity.number(relativePermeability()), saturationFluxDensity());
    }
}
