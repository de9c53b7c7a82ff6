package org.ampturn.drive;

import static org.ampturn.drive.Solver.*;

import java.util.List;
import org.apache.commons.math3.analysis.solvers.BrentSolver;

/**
 * Exact solution of a linear coil with an RC snubber. In each mode the coil current i and the
 * capacitor voltage v obey a linear system {@code d(i, v)/dt = A·(i, v) + b}; the monomials
 * {@code m = (1, i, v, i², i·v, v²)} then obey a linear system too, {@code dm/dt = K·m}, and so do
 * their integrals. One matrix exponential {@code e^(K·s)} of the 12-state system (monomials and
 * their integrals) gives the state, the charge and every resistor's energy {@code s} seconds into a
 * segment exactly, however stiff the piece (a 1 H coil with a 10 nF snubber rings at kHz for
 * seconds). The exponential is taken by scaling and squaring of the Taylor series (Moler and
 * Van Loan, Nineteen Dubious Ways to Compute the Exponential of a Matrix, SIAM Review 45 (2003),
 * method 3); the integrals by the augmented matrix of Van Loan, Computing Integrals Involving the
 * Matrix Exponential, IEEE Trans. Automatic Control 23 (1978).
 *
 * <p>Events (current levels) and the local maxima of the switch voltage are bracketed on a sweep
 * finer than a quarter of the ringing period and located with Brent's method on the exact
 * solution, so the peak switch voltage is the true maximum, not a sample.
 */
final class SnubberStepper implements Solver.Stepper {
    private static final int M = 6, N = 12;
    private static final int ONE = 0, I = 1, V = 2, II = 3, IV = 4, VV = 5;

    private final Solver sv;
    private final double l;
    private final double[] tmp;
    private final double[][] k = new double[N][N];
    // current mode: i' = a0 + a1·i + a2·v, v' = c0 + c1·i + c2·v; powers as quadratic forms over m
    private double a0, a1, a2, c0, c1, c2;
    private final double[] fSup = new double[M], fCoil = new double[M], fDrv = new double[M], fCl = new double[M];
    private double w1, w2; // switch voltage = w1·i + w2·v
    private final BrentSolver brent = new BrentSolver(1e-15, 1e-13);

    SnubberStepper(Solver sv) {
        this.sv = sv;
        this.l = sv.load.inductance();
        this.tmp = new double[sv.dim];
        this.sigma = Math.sqrt(sv.cap / l);
    }

    /** Scale of the capacitor state: u = σ·v. */
    private final double sigma;

    private void coefficients() {
        java.util.Arrays.fill(fSup, 0);
        java.util.Arrays.fill(fCoil, 0);
        java.util.Arrays.fill(fDrv, 0);
        java.util.Arrays.fill(fCl, 0);
        double rs = sv.rs, rc = sv.rc, rcl = sv.rcl, ron = sv.ron, cap = sv.cap, vs = sv.vs;
        fSup[I] = vs;
        fCoil[II] = rc;
        if (sv.elec == Elec.ON) {
            // switch node = n1·i + n2·v (zero for an ideal switch); snubber current p1·i + p2·v
            double n1 = 0, n2 = 0;
            if (ron > 0) {
                double g = 1 / ron + 1 / rcl;
                n1 = 1 / g;
                n2 = 1 / (rcl * g);
            }
            double p1 = n1 / rcl, p2 = (n2 - 1) / rcl;
            a0 = vs / l; a1 = -(rs + rc + n1) / l; a2 = -n2 / l;
            c0 = 0; c1 = p1 / cap; c2 = p2 / cap;
            fDrv[II] = rs + (ron > 0 ? n1 * n1 / ron : 0);
            if (ron > 0) {
                fDrv[IV] = 2 * n1 * n2 / ron;
                fDrv[VV] = n2 * n2 / ron;
            }
            fCl[II] = rcl * p1 * p1;
            fCl[IV] = 2 * rcl * p1 * p2;
            fCl[VV] = rcl * p2 * p2;
            w1 = n1; w2 = n2;
        } else {
            a0 = vs / l; a1 = -(rs + rc + rcl) / l; a2 = -1 / l;
            c0 = 0; c1 = 1 / cap; c2 = 0;
            fDrv[II] = rs;
            fCl[II] = rcl;
            w1 = rcl; w2 = 1;
        }
        // balance the system: u = σ·v with σ = √(C/L) puts both states in amperes, so the exponential's
        // entries are of one scale (with v in volts a 1 pF snubber on 10 H gives entries 13 orders apart)
        double sg = sigma;
        c0 *= sg; c1 *= sg; a2 /= sg; w2 /= sg;
        for (double[] f : new double[][] {fSup, fCoil, fDrv, fCl}) {
            f[IV] /= sg;
            f[VV] /= sg * sg;
        }
        for (double[] row : k) java.util.Arrays.fill(row, 0);
        k[I][ONE] = a0; k[I][I] = a1; k[I][V] = a2;
        k[V][ONE] = c0; k[V][I] = c1; k[V][V] = c2;
        k[II][I] = 2 * a0; k[II][II] = 2 * a1; k[II][IV] = 2 * a2;
        k[IV][V] = a0; k[IV][IV] = a1; k[IV][VV] = a2; k[IV][I] += c0; k[IV][II] = c1; k[IV][IV] += c2;
        k[VV][V] = 2 * c0; k[VV][IV] = 2 * c1; k[VV][VV] = 2 * c2;
        for (int j = 0; j < M; j++) k[M + j][j] = 1;
    }

    /** e^(K·s) by scaling and squaring of the Taylor series. */
    static double[][] expm(double[][] a, double s) {
        int n = a.length;
        double norm = 0;
        for (double[] row : a) {
            double r = 0;
            for (double x : row) r += Math.abs(x);
            norm = Math.max(norm, r);
        }
        norm *= s;
        int sq = norm > 0.25 ? Math.getExponent(norm) + 3 : 0;
        double h = Math.scalb(s, -sq);
        double[][] res = identity(n), term = identity(n);
        for (int j = 1; j <= 18; j++) {
            term = mul(term, a);
            double f = h / j;
            for (double[] row : term) for (int c = 0; c < n; c++) row[c] *= f;
            for (int r = 0; r < n; r++) for (int c = 0; c < n; c++) res[r][c] += term[r][c];
        }
        for (int j = 0; j < sq; j++) res = mul(res, res);
        return res;
    }

    private static double[][] identity(int n) {
        double[][] e = new double[n][n];
        for (int j = 0; j < n; j++) e[j][j] = 1;
        return e;
    }

    private static double[][] mul(double[][] x, double[][] y) {
        int n = x.length;
        double[][] z = new double[n][n];
        for (int r = 0; r < n; r++) {
            double[] zr = z[r], xr = x[r];
            for (int q = 0; q < n; q++) {
                double v = xr[q];
                if (v == 0) continue;
                double[] yq = y[q];
                for (int c = 0; c < n; c++) zr[c] += v * yq[c];
            }
        }
        return z;
    }

    private static double[] apply(double[][] e, double[] p) {
        double[] out = new double[p.length];
        for (int r = 0; r < p.length; r++) {
            double acc = 0;
            for (int c = 0; c < p.length; c++) acc += e[r][c] * p[c];
            out[r] = acc;
        }
        return out;
    }

    private double[] at(double[] p0, double s) {
        return s == 0 ? p0.clone() : apply(expm(k, s), p0);
    }

    /** Writes the solver state of monomial vector p (integrals from the segment start) onto y0's copy. */
    private void toState(double[] p, double[] y0, double[] out) {
        System.arraycopy(y0, 0, out, 0, out.length);
        out[LAM] = l * p[I];
        out[VC] = p[V] / sigma;
        out[ESUP] += dot(fSup, p);
        out[ECOIL] += dot(fCoil, p);
        out[EDRV] += dot(fDrv, p);
        out[ECL] += dot(fCl, p);
        out[Q] += p[M + I];
    }

    private static double dot(double[] f, double[] p) {
        double acc = 0;
        for (int j = 0; j < M; j++) acc += f[j] * p[M + j];
        return acc;
    }

    /** Rate of change of the switch voltage: positive before a maximum, negative after. */
    private double slope(double[] p) {
        return w1 * (a0 + a1 * p[I] + a2 * p[V]) + w2 * (c0 + c1 * p[I] + c2 * p[V]);
    }

    /** The first root of f, which rises through zero in [lo, hi] (the bracket's end if the exact values do not bracket it). */
    private double root(org.apache.commons.math3.analysis.UnivariateFunction f, double lo, double hi) {
        double flo = f.value(lo), fhi = f.value(hi);
        if (fhi == 0 || !(flo < 0) || !(fhi > 0)) return flo >= 0 ? lo : hi;
        return brent.solve(200, f, lo, hi);
    }

    private double vsw(double[] p) {
        return w1 * p[I] + w2 * p[V];
    }

    private static double crossingValue(Ev ev, double[] p) {
        return ev.direction * (p[I] - ev.level);
    }

    @Override
    public double advance(double t0, double t1, double[] y, List<Ev> evs, int[] fired) {
        coefficients();
        double[] p0 = new double[N];
        p0[ONE] = 1;
        p0[I] = y[LAM] / l;
        p0[V] = y[VC] * sigma;
        p0[II] = p0[I] * p0[I];
        p0[IV] = p0[I] * p0[V];
        p0[VV] = p0[V] * p0[V];
        double span = t1 - t0;
        // sweep spacing: a quarter of the ringing period while the ringing lasts, the fast time constants near the start
        double tr = a1 + c2, det = a1 * c2 - a2 * c1, disc = tr * tr / 4 - det;
        double grid = sv.dt;
        double hOsc = Double.POSITIVE_INFINITY, ringEnd = 0, fast;
        if (disc < 0) {
            double wd = Math.sqrt(-disc), sigma = -tr / 2;
            hOsc = Math.PI / (4 * wd);
            ringEnd = sigma > 0 ? 40 / sigma : span;
            fast = Math.hypot(sigma, wd);
        } else {
            fast = Math.abs(tr / 2) + Math.sqrt(disc);
        }
        double sFast = fast > 0 ? 0.25 / fast : grid;
        double hRing = Math.min(grid, hOsc);
        double[][] eRing = null, eGrid = null;
        double best = span;
        int which = -1;
        double sPrev = 0;
        double[] pPrev = p0.clone();
        boolean peakFound = false;
        while (sPrev < best) {
            double h = sPrev < ringEnd ? hRing : grid;
            double sNext;
            double[] pNext;
            if (sFast < h && sPrev < h) {
                sNext = Math.min(best, Math.min(h, Math.max(2 * sPrev, sFast)));
                pNext = at(p0, sNext);
            } else {
                sNext = Math.min(best, sPrev + h);
                if (sNext == sPrev + h && h == hRing && sPrev < ringEnd) {
                    if (eRing == null) eRing = expm(k, hRing);
                    pNext = apply(eRing, pPrev);
                } else if (sNext == sPrev + h && h == grid) {
                    if (eGrid == null) eGrid = expm(k, grid);
                    pNext = apply(eGrid, pPrev);
                } else {
                    pNext = at(p0, sNext);
                }
            }
            // the earliest event in (sPrev, sNext]
            double sEv = Double.POSITIVE_INFINITY;
            for (int e = 0; e < evs.size(); e++) {
                Ev ev = evs.get(e);
                if (ev.kind != Ev.Kind.CURRENT) continue;
                double g0 = crossingValue(ev, pPrev), g1 = crossingValue(ev, pNext);
                if (!(g0 < 0 && g1 >= 0)) continue;
                double lo = sPrev, hi = sNext;
                double root = root(s -> crossingValue(ev, at(p0, s)), lo, hi);
                if (root < sEv) {
                    sEv = root;
                    which = e;
                }
            }
            double sEnd = sNext;
            if (sEv <= sNext) {
                best = sEv;
                sEnd = sEv;
                pNext = at(p0, sEv);
            }
            // a maximum of the switch voltage in (sPrev, sEnd]
            double d0 = slope(pPrev), d1 = slope(pNext);
            // the maxima of a decaying ringing fall one after another: the first of a segment is located
            // exactly, a later one only if a bracket's end already comes near the peak so far
            if (d0 > 0 && d1 <= 0 && (!peakFound || Math.max(vsw(pPrev), vsw(pNext)) > sv.peakSw - 1e-3 * Math.abs(sv.peakSw))) {
                peakFound = true;
                double root = root(s -> -slope(at(p0, s)), sPrev, sEnd);
                double[] pr = at(p0, root);
                toState(pr, y, tmp);
                sv.observe(t0 + root, tmp);
            }
            sPrev = sEnd;
            pPrev = pNext;
        }
        if (which < 0) best = span;
        double tStop = t0 + best;
        // the output samples in the segment
        double[] y0 = y.clone();
        int kk = sv.nextSample();
        if (kk < sv.n && sv.sampleTime(kk) <= tStop) { // a sample at the stop holds the state before the switching there
            double s = sv.sampleTime(kk) - t0;
            double[] p = at(p0, s);
            double[][] step = null;
            while (true) {
                toState(p, y0, tmp);
                sv.record(kk, tmp);
                kk++;
                if (kk >= sv.n || sv.sampleTime(kk) > tStop) break;
                double sk = sv.sampleTime(kk) - t0;
                if (kk == sv.n - 1) {
                    p = at(p0, sk);
                } else {
                    if (step == null) step = expm(k, grid);
                    p = apply(step, p);
                }
            }
        }
        toState(at(p0, best), y0, y);
        if (which >= 0) y[LAM] = l * evs.get(which).level; // land exactly on the level
        fired[0] = which;
        return tStop;
    }
}
