package org.ampturn.drive;

import static org.ampturn.drive.Solver.*;

import java.util.List;

/**
 * Exact solution of a linear coil in a piecewise-linear circuit. In each mode
 * {@code L·di/dt = a − b·i}, so {@code i(s) = i∞ + (i0 − i∞)·e^(−s/τ)} with {@code τ = L/b} and
 * {@code i∞ = a/b} (first-order RL response: Hayt, Kemmerly and Durbin, Engineering Circuit
 * Analysis, 8th ed., ch. 8), or a ramp {@code i0 + (a/L)·s} when {@code b = 0}. The energy states are
 * the exact integrals of {@code i} and {@code i²}; event times solve {@code i(s) = level} exactly.
 */
final class ClosedFormStepper implements Solver.Stepper {
    private final Solver sv;
    private final double l;
    private final double[] tmp;
    // coefficients of the current mode
    private double a, b, s1, d2, c1, c2, i0, iInf, tau, k;

    ClosedFormStepper(Solver sv) {
        this.sv = sv;
        this.l = sv.load.inductance();
        this.tmp = new double[sv.dim];
    }

    private void coefficients() {
        switch (sv.elec) {
            case ON:
                a = sv.vs; b = sv.rs + sv.ron + sv.rc; s1 = sv.vs; d2 = sv.rs + sv.ron; c1 = 0; c2 = 0;
                break;
            case CLAMP:
                if (sv.acrossCoil) {
                    a = -sv.v0; b = sv.rc + sv.rcl; s1 = 0; d2 = 0; c1 = sv.v0; c2 = sv.rcl;
                } else {
                    a = sv.vs - sv.v0; b = sv.rs + sv.rc + sv.rcl; s1 = sv.vs; d2 = sv.rs; c1 = sv.v0; c2 = sv.rcl;
                }
                break;
            default:
                a = 0; b = 0; s1 = 0; d2 = 0; c1 = 0; c2 = 0;
        }
        if (b > 0) {
            tau = l / b;
            iInf = a / b;
        } else {
            k = a / l;
        }
    }

    /** Time from the segment start at which the current crosses {@code level} in the event's direction, or +∞. */
    private double crossing(Ev ev) {
        double lev = ev.level;
        if (b > 0) {
            double d0 = i0 - iInf, d1 = lev - iInf;
            if (d0 == 0 || d1 == 0 || Math.signum(d0) != Math.signum(d1) || Math.abs(d1) >= Math.abs(d0)) return Double.POSITIVE_INFINITY;
            int dir = iInf > i0 ? 1 : -1;
            if (dir != ev.direction) return Double.POSITIVE_INFINITY;
            return tau * Math.log(d0 / d1);
        }
        if (k == 0) return Double.POSITIVE_INFINITY;
        double s = (lev - i0) / k;
        int dir = k > 0 ? 1 : -1;
        return s > 0 && dir == ev.direction ? s : Double.POSITIVE_INFINITY;
    }

    /** State {@code s} seconds into the segment, from the segment's start state {@code y0}. */
    private void stateAt(double s, double[] y0, double[] out) {
        System.arraycopy(y0, 0, out, 0, out.length);
        if (sv.elec == Solver.Elec.IDLE) return;
        double i, ii, ii2;
        if (b > 0) {
            double x = s / tau;
            double em1 = Math.expm1(-x);            // e^(-x) − 1
            double d = i0 - iInf;
            i = iInf + d * (1 + em1);
            double u = -em1 * tau;                  // ∫ e^(-s/τ) ds
            double u2 = -em1 * (2 + em1) * tau / 2; // ∫ e^(-2s/τ) ds
            ii = iInf * s + d * u;
            ii2 = iInf * iInf * s + 2 * iInf * d * u + d * d * u2;
        } else {
            i = i0 + k * s;
            ii = i0 * s + k * s * s / 2;
            ii2 = i0 * i0 * s + i0 * k * s * s + k * k * s * s * s / 3;
        }
        out[LAM] = l * i;
        out[ESUP] += s1 * ii;
        out[ECOIL] += sv.rc * ii2;
        out[EDRV] += d2 * ii2;
        out[ECL] += c1 * ii + c2 * ii2;
        out[Q] += ii;
    }

    @Override
    public double advance(double t0, double t1, double[] y, List<Ev> evs, int[] fired) {
        coefficients();
        i0 = sv.elec == Solver.Elec.IDLE ? 0 : y[LAM] / l;
        double best = t1 - t0;
        int which = -1;
        if (sv.elec != Solver.Elec.IDLE) {
            for (int e = 0; e < evs.size(); e++) {
                Ev ev = evs.get(e);
                if (ev.kind != Ev.Kind.CURRENT) continue;
                double s = crossing(ev);
                if (s < best) {
                    best = s;
                    which = e;
                }
            }
        }
        double tStop = t0 + best;
        double[] y0 = y.clone();
        for (int kk = sv.nextSample(); kk < sv.n && sv.sampleTime(kk) <= tStop; kk++) {
            stateAt(sv.sampleTime(kk) - t0, y0, tmp);
            sv.record(kk, tmp);
        }
        stateAt(best, y0, y);
        if (which >= 0) y[LAM] = l * evs.get(which).level; // land exactly on the level
        fired[0] = which;
        return tStop;
    }
}
