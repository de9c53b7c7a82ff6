package org.ampturn.drive;

import java.util.List;
import org.ampturn.coil.Coil;
import org.ampturn.coil.Core;
import org.ampturn.coil.MagneticCircuit;
import org.ampturn.coil.WoundCoil;
import org.ampturn.material.CoreLoss;

/**
 * Core loss drawn by the circuit: a core-loss current i_c in parallel with the magnetising branch of
 * a {@link WoundCoil} whose core pieces have a {@link CoreLoss}. The coil's terminal current is
 * i = i_m(λ) + i_c, and i_c is the current that makes the branch's power the core's loss:
 *
 * <pre>i_c·dλ/dt = Σ_k V_k·p_k(t),   p_k = k_i·|dB_k/dt|^α·ΔB_k^(β−α)</pre>
 *
 * the instantaneous improved generalised Steinmetz equation (iGSE) of K. Venkatachalam,
 * C. R. Sullivan, T. Abdallah and H. Tacca, "Accurate prediction of ferrite core loss with
 * nonsinusoidal waveforms using only Steinmetz parameters", IEEE COMPEL 2002, for each core piece k
 * of volume V_k = l_k·A_k and flux density B_k(λ) (the circuit's own split of Φ = λ/N). With
 * dB_k/dt = g_k·dλ/dt (g_k = dB_k/dλ), i_c = sign(λ̇)·Σ_k V_k·k_i·ΔB_k^(β−α)·|g_k|^α·|λ̇|^(α−1):
 * finite and continuous through λ̇ = 0 since α > 1. In every mode of the circuit λ̇ = a − b·i, so
 * λ̇ solves λ̇ + b·i_c(λ̇) = a − b·i_m, one increasing function of λ̇ (Newton's method kept inside a
 * bracket). With the coil open (no terminal current) i_c = −i_m: the magnetising current keeps
 * flowing through the core-loss path and the flux decays through it.
 *
 * <p>ΔB is causal: the swing of the loop being traced is taken from the last two turning points of
 * the flux, max(|B(tp1) − B(tp2)|, |B − B(tp1)|), so a periodic waveform is costed with its own
 * peak-to-peak swing from its second half cycle on (for a sine the iGSE then equals Steinmetz's
 * k·f^α·B̂^β exactly). Turning points are found on accepted solver steps, at the extremum of the
 * cubic Hermite interpolant of λ between them. The loss of the first rise from rest, and of minor
 * loops, differs from the rainflow split of {@link CoreLoss#energyDensityAt} (which needs the whole
 * waveform); {@code Transient.coreLossEnergy()} gives that post-hoc figure beside it. k_i includes the
 * material's temperature factor at the coil's temperature ({@link CoreLoss#withTemperatureFactor}).
 * Not thread-safe: one per run.
 */
final class CoreLossBranch {
    private final MagneticCircuit circuit;
    private final int turns;
    private final int[] piece;         // index of each lossy core piece in the circuit's parts
    private final double[] vol, ki, alpha, beta;
    private final double[] out, outHi;
    private final int[] next = new int[1];
    private final double lamRef;
    // per lossy piece, at the last state given to coefficients(): the coefficient of |λ̇|^(α−1)
    private final double[] c;
    private double cSum;
    // turning-point memory (λ and each piece's B there)
    private double tpLast;
    private boolean hasPrev;
    private final double[] bLast, bPrev, bNow, gNow;
    private double prevT = Double.NaN, prevLam, prevRate;
    private int dir;
    /** Each piece's dB/dλ when the circuit's flux split is linear (series parts, or linear materials); null otherwise. */
    private final double[] linearG;
    private final double[] gPowAlpha;
    /** The last rate solved, to start the next solve from. */
    private double lastRate;

    private CoreLossBranch(WoundCoil coil, int[] piece, double[] vol, double[] ki, double[] alpha, double[] beta, double lamRef) {
        this.circuit = coil.circuit();
        this.turns = coil.turns();
        this.piece = piece;
        this.vol = vol;
        this.ki = ki;
        this.alpha = alpha;
        this.beta = beta;
        int m = circuit.parts().size();
        this.out = new double[m];
        this.outHi = new double[m];
        int p = piece.length;
        this.c = new double[p];
        this.bLast = new double[p];
        this.bPrev = new double[p];
        this.bNow = new double[p];
        this.gNow = new double[p];
        this.lamRef = lamRef;
        this.tpLast = 0; // the run starts from rest: λ = 0 is the first turning point
        this.linearG = linearSplit();
        this.gPowAlpha = new double[p];
        if (linearG != null) for (int k = 0; k < p; k++) gPowAlpha[k] = Math.pow(Math.abs(linearG[k]), alpha[k]);
    }

    /** dB_k/dλ of each piece if B_k/λ is the same at flux linkages over twelve decades up to 1e3·lamRef (a linear split); else null. */
    private double[] linearSplit() {
        double[] g = new double[piece.length], b = new double[piece.length];
        try {
            for (int j = 0; j <= 12; j++) {
                double lam = lamRef * Math.pow(10, 3 - j);
                densities(lam, b);
                for (int k = 0; k < piece.length; k++) {
                    double gk = b[k] / lam;
                    if (!Double.isFinite(gk)) return null;
                    if (j == 0) g[k] = gk;
                    else if (!(Math.abs(gk - g[k]) <= 1e-12 * Math.abs(g[k]))) return null;
                }
            }
        } catch (RuntimeException outsideTheModel) {
            return null;
        }
        return g;
    }

    /** The branch of a coil wound on a core with loss data, at the coil's temperature; null for any other coil. */
    static CoreLossBranch of(Coil coil, double lamRef) {
        if (!(coil instanceof WoundCoil)) return null;
        WoundCoil w = (WoundCoil) coil;
        List<MagneticCircuit> parts = w.circuit().parts();
        int count = 0;
        for (MagneticCircuit p : parts) if (p instanceof Core && ((Core) p).material().coreLoss().isPresent()) count++;
        if (count == 0) return null;
        int[] piece = new int[count];
        double[] vol = new double[count], ki = new double[count], alpha = new double[count], beta = new double[count];
        double kelvin = coil.temperature().si();
        int j = 0;
        for (int k = 0; k < parts.size(); k++) {
            if (!(parts.get(k) instanceof Core)) continue;
            Core core = (Core) parts.get(k);
            if (core.material().coreLoss().isEmpty()) continue;
            CoreLoss cl = core.material().coreLoss().get();
            piece[j] = k;
            vol[j] = core.pathLength().si() * core.area().si();
            ki[j] = cl.ki() * cl.temperatureFactorAt(kelvin);
            alpha[j] = cl.alpha();
            beta[j] = cl.beta();
            j++;
        }
        return new CoreLossBranch(w, piece, vol, ki, alpha, beta, Math.max(lamRef, 1e-300));
    }

    /** Each lossy piece's B at flux linkage λ into {@code b}. */
    private void densities(double lambda, double[] b) {
        next[0] = 0;
        circuit.fluxDensities(lambda / turns, out, next);
        for (int k = 0; k < piece.length; k++) b[k] = out[piece[k]];
    }

    /** Sets the coefficients of |λ̇|^(α−1) for the state λ (B_k, dB_k/dλ by a central difference, the causal swing). */
    void coefficients(double lambda) {
        if (linearG != null) {
            cSum = 0;
            for (int k = 0; k < piece.length; k++) {
                double b = linearG[k] * lambda;
                double swing = Math.abs(b - bLast[k]);
                if (hasPrev) swing = Math.max(swing, Math.abs(bLast[k] - bPrev[k]));
                double ck = swing == 0 ? 0 : vol[k] * ki[k] * Math.pow(swing, beta[k] - alpha[k]) * gPowAlpha[k];
                c[k] = Double.isFinite(ck) ? ck : 0;
                cSum += c[k];
            }
            return;
        }
        double h = 1e-6 * Math.abs(lambda) + 1e-9 * lamRef;
        next[0] = 0;
        circuit.fluxDensities((lambda + h) / turns, outHi, next);
        next[0] = 0;
        circuit.fluxDensities((lambda - h) / turns, out, next);
        cSum = 0;
        for (int k = 0; k < piece.length; k++) {
            double hi = outHi[piece[k]], lo = out[piece[k]];
            double b = 0.5 * (hi + lo);
            double g = (hi - lo) / (2 * h);
            bNow[k] = b;
            gNow[k] = g;
            double swing = Math.abs(b - bLast[k]);
            if (hasPrev) swing = Math.max(swing, Math.abs(bLast[k] - bPrev[k]));
            double ck = swing == 0 ? 0 : vol[k] * ki[k] * Math.pow(swing, beta[k] - alpha[k]) * Math.pow(Math.abs(g), alpha[k]);
            c[k] = Double.isFinite(ck) ? ck : 0;
            cSum += c[k];
        }
    }

    /** The core-loss current (A) at the rate λ̇ (V), with the coefficients of the last {@link #coefficients} call. */
    double current(double rate) {
        if (rate == 0 || cSum == 0) return 0;
        double a = Math.abs(rate), s = 0;
        for (int k = 0; k < c.length; k++) if (c[k] != 0) s += c[k] * Math.pow(a, alpha[k] - 1);
        return Math.copySign(s, rate);
    }

    private double slope(double rate) {
        double a = Math.abs(rate), s = 0;
        for (int k = 0; k < c.length; k++) if (c[k] != 0) s += c[k] * (alpha[k] - 1) * Math.pow(a, alpha[k] - 2);
        return s;
    }

    /**
     * λ̇ that solves λ̇ + r·i_c(λ̇) = e (a mode with λ̇ = a − r·i and e = a − r·i_m), to 1e-12 of e: the circuit
     * takes its voltage from the current this gives, so the ledger holds exactly whatever the solve's error.
     */
    double rate(double e, double r) {
        if (e == 0 || !(r > 0) || cSum == 0) return e;
        double lo = Math.min(0, e), hi = Math.max(0, e);
        double x = lastRate > lo && lastRate < hi ? lastRate : e;
        for (int it = 0; it < 100; it++) {
            double ic, di;
            if (c.length == 1) { // one piece: i_c and its slope from one power
                double a = Math.abs(x), pw = Math.pow(a, alpha[0] - 1);
                ic = Math.copySign(c[0] * pw, x);
                di = a > 0 ? c[0] * (alpha[0] - 1) * pw / a : Double.POSITIVE_INFINITY;
            } else {
                ic = current(x);
                di = slope(x);
            }
            double f = x + r * ic - e;
            if (f == 0) return lastRate = x;
            if (f > 0) hi = x;
            else lo = x;
            double d = 1 + r * di;
            double xn = x - f / d;
            if (!(xn > lo && xn < hi)) xn = 0.5 * (lo + hi);
            if (Math.abs(xn - x) <= 1e-12 * Math.abs(e) || hi - lo <= 1e-12 * Math.abs(e)) return lastRate = xn;
            x = xn;
        }
        return lastRate = x;
    }

    /** λ̇ with the coil open: i_c(λ̇) = −i_m (0 when the core has no loss coefficient at this state). */
    double idleRate(double im) {
        if (im == 0 || cSum == 0 || !Double.isFinite(im)) return 0;
        double target = Math.abs(im);
        double hi = 1;
        for (int k = 0; k < 4000 && current(hi) < target; k++) hi *= 2;
        for (int k = 0; k < 4000 && current(hi / 2) >= target; k++) hi /= 2;
        double lo = hi / 2, x = hi;
        for (int it = 0; it < 200; it++) {
            double f = current(x) - target;
            if (f == 0) break;
            if (f > 0) hi = x;
            else lo = x;
            double d = slope(x);
            double xn = d > 0 ? x - f / d : 0.5 * (lo + hi);
            if (!(xn > lo && xn < hi)) xn = 0.5 * (lo + hi);
            if (Math.abs(xn - x) <= 1e-15 * x) {
                x = xn;
                break;
            }
            x = xn;
        }
        return -Math.copySign(x, im);
    }

    /**
     * An accepted state at time t (s), in time order: notes a turning point of λ when λ̇ has changed
     * sign since the last one, at the extremum of the cubic Hermite interpolant of λ between them.
     */
    void accept(double t, double lambda, double rate) {
        int d = rate > 0 ? 1 : rate < 0 ? -1 : 0;
        if (!Double.isNaN(prevT) && d != 0 && dir != 0 && d != dir) turn(hermiteExtreme(prevT, prevLam, prevRate, t, lambda, rate, dir));
        if (d != 0) dir = d;
        prevT = t;
        prevLam = lambda;
        prevRate = rate;
    }

    private void turn(double lambda) {
        System.arraycopy(bLast, 0, bPrev, 0, bLast.length);
        hasPrev = true;
        tpLast = lambda;
        densities(lambda, bLast);
    }

    /** The extremum (a maximum for dir > 0, a minimum otherwise) of the cubic Hermite interpolant on [t0, t1]. */
    static double hermiteExtreme(double t0, double l0, double r0, double t1, double l1, double r1, int dir) {
        double h = t1 - t0;
        double best = dir > 0 ? Math.max(l0, l1) : Math.min(l0, l1);
        if (!(h > 0)) return best;
        double dq = (l1 - l0) / h;
        double lo = 0, hi = 1;
        double flo = r0;
        for (int k = 0; k < 60; k++) {
            double u = 0.5 * (lo + hi);
            double fu = r0 * (1 - 4 * u + 3 * u * u) + r1 * (3 * u * u - 2 * u) + dq * (6 * u - 6 * u * u);
            if ((fu > 0) == (flo > 0)) {
                lo = u;
                flo = fu;
            } else {
                hi = u;
            }
        }
        double u = 0.5 * (lo + hi), u2 = u * u, u3 = u2 * u;
        double p = (2 * u3 - 3 * u2 + 1) * l0 + (u3 - 2 * u2 + u) * h * r0 + (-2 * u3 + 3 * u2) * l1 + (u3 - u2) * h * r1;
        return dir > 0 ? Math.max(best, p) : Math.min(best, p);
    }

    /** One line for the run's notes. */
    String describe(double kelvin) {
        return "core loss drawn by the circuit: a core-loss current in parallel with the magnetising branch, from the instantaneous iGSE "
                + "with the swing of the last two turning points (causal), core at " + String.format(java.util.Locale.ROOT, "%.1f °C", kelvin - 273.15);
    }
}
