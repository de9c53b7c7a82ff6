package org.ampturn.thermal;

import java.util.List;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;

/**
 * Intermittent duty on a {@link ThermalNetwork}: a loss P on for t_on of every period T, off for the
 * rest (duty = t_on/T, the trade's duty-cycle percentage). Immutable; everything is worked out when it
 * is made, from ambient.
 *
 * <p>One body, with a = e^(−t_on/τ) and b = e^(−t_off/τ): the rise at the end of the n-th on-time is
 * the geometric series θ_n = P·R·(1 − a)·(1 + ab + … + (ab)^(n−1)) = P·R·(1 − a)(1 − (ab)^n)/(1 − ab),
 * so the cyclic steady state has the peak P·R·(1 − a)/(1 − ab) and the trough b times that, and the
 * peak comes within a fraction ε of it after n = ⌈ln ε / ln(ab)⌉ cycles (ε = 1 % here). Two bodies:
 * the cyclic steady state is the fixed point x = M·x + c of the exact one-cycle map
 * (M = e^(A·t_off)·e^(A·t_on)), and cycles are counted by stepping. In both the mean winding
 * temperature over a cycle in the cyclic steady state is the steady temperature at the mean loss
 * P·duty (the network is linear and the rise repeats, so the mean of dθ/dt over a cycle is zero).
 */
public final class DutyCycle {
    /** The cycles count stops here (a very slow network at a very short period). */
    static final int MAX_CYCLES = 10_000_000;
    /** "Reached" means the peak is within this fraction of the cyclic steady peak rise. */
    static final double WITHIN = 0.01;

    private final ThermalNetwork net;
    private final double p, on, period;
    private final double single, peak, trough, mean;
    private final long cycles;

    DutyCycle(ThermalNetwork net, double p, double on, double period) {
        this.net = net;
        this.p = p;
        this.on = on;
        this.period = period;
        double off = period - on;
        ThermalNetwork.Step sOn = net.step(on), sOff = net.step(off);
        double[] s = {0, 0};
        sOn.apply(s, p);
        this.single = s[0];
        // cyclic steady state: the state at the start of an on-time, x = M x + c
        double[] x = fixedPoint(sOn, sOff);
        double[] y = x.clone();
        double best = y[0];
        ThermalNetwork.Step sub = net.step(on / 64);
        for (int k = 0; k < 64; k++) {
            sub.apply(y, p);
            best = Math.max(best, y[0]);
        }
        this.peak = best;
        this.trough = x[0];
        this.mean = p * on / period * net.rwaKW();
        this.cycles = countCycles(sOn, sOff, best);
    }

    private double[] fixedPoint(ThermalNetwork.Step sOn, ThermalNetwork.Step sOff) {
        // the cycle map is affine: F(x) = M x + c. c = F(0); the columns of M are F(e_i) − c.
        double[] c = cycle(sOn, sOff, 0, 0);
        if (!net.hasFrame()) {
            double[] one = cycle(sOn, sOff, 1, 0);
            double m = one[0] - c[0];
            return new double[] {c[0] / (1 - m), 0};
        }
        double[] f1 = cycle(sOn, sOff, 1, 0), f2 = cycle(sOn, sOff, 0, 1);
        double m11 = f1[0] - c[0], m21 = f1[1] - c[1], m12 = f2[0] - c[0], m22 = f2[1] - c[1];
        double a = 1 - m11, b = -m12, cc = -m21, d = 1 - m22, det = a * d - b * cc;
        return new double[] {(d * c[0] - b * c[1]) / det, (a * c[1] - cc * c[0]) / det};
    }

    private double[] cycle(ThermalNetwork.Step sOn, ThermalNetwork.Step sOff, double w, double f) {
        double[] s = {w, f};
        sOn.apply(s, p);
        sOff.apply(s, 0);
        return s;
    }

    private long countCycles(ThermalNetwork.Step sOn, ThermalNetwork.Step sOff, double target) {
        if (!(target > 0)) return 0;
        double[] s = {0, 0};
        for (long n = 1; n <= MAX_CYCLES; n++) {
            if ((n & 0xFFFF) == 0) Require.notInterrupted("duty cycle");
            sOn.apply(s, p);
            if (s[0] >= (1 - WITHIN) * target) return n;
            sOff.apply(s, 0);
        }
        return -1;
    }

    /** The rise at the end of the n-th on-time from ambient (kernel, K). */
    double riseAfterAt(int n) {
        ThermalNetwork.Step sOn = net.step(on), sOff = net.step(period - on);
        double[] s = {0, 0};
        for (int k = 1; k <= n; k++) {
            sOn.apply(s, p);
            if (k < n) sOff.apply(s, 0);
        }
        return s[0];
    }

    /** Winding temperature at the end of the n-th on-time, starting from ambient. */
    public Quantity peakAfter(int n) {
        Require.between("cycles", n, 1, MAX_CYCLES);
        return Quantity.temperatureKelvin(net.ambientK() + riseAfterAt(n));
    }

    public Quantity power() { return Quantity.of(p, Dimension.POWER); }
    public Quantity onTime() { return Quantity.of(on, Dimension.TIME); }
    public Quantity period() { return Quantity.of(period, Dimension.TIME); }
    /** Duty as a fraction (0.25 for 25 %). */
    public double duty() { return on / period; }

    /** Winding temperature at the end of the first on-time from ambient. */
    public Quantity singlePulse() { return Quantity.temperatureKelvin(net.ambientK() + single); }

    /** Peak winding temperature in the cyclic steady state. */
    public Quantity peak() { return Quantity.temperatureKelvin(net.ambientK() + peak); }

    /** Lowest winding temperature in the cyclic steady state (at the start of an on-time). */
    public Quantity trough() { return Quantity.temperatureKelvin(net.ambientK() + trough); }

    /** Mean winding temperature over a cycle in the cyclic steady state. */
    public Quantity mean() { return Quantity.temperatureKelvin(net.ambientK() + mean); }

    /** Steady temperature if the loss stayed on (100 % duty), for comparison. */
    public Quantity continuous() { return Quantity.temperatureKelvin(net.ambientK() + p * net.rwaKW()); }

    /** Cycles from ambient until the peak is within 1 % of the cyclic steady peak rise; −1 if more than ten million. */
    public long cyclesToSteady() { return cycles; }

    /** Longest single on-time from a start temperature before the hot spot reaches the class. */
    public Quantity longestOnTime(Quantity startTemperature) { return net.longestOnTime(power(), startTemperature); }

    public boolean withinClass() { return net.ambientK() + peak + net.allowanceK() <= net.insulationClass().limit().si(); }

    /** Class limit less the peak hot spot (K; negative when over). */
    public Quantity margin() { return HotCoil.kelvin(net.limitRiseK() - peak); }

    public List<String> warnings() {
        return HotCoil.warnings("duty cycle peak", net.ambientK() + peak, net.allowanceK(), net.insulationClass());
    }

    /** The winding temperature over the first {@code cycles} cycles from ambient, for a chart. */
    public HeatingCurve curve(int cycles) {
        Require.between("cycles", cycles, 1, 100_000);
        double[] pw = {p, 0}, d = {on, period - on};
        return HeatingCurve.sample(net, pw, d, cycles, new double[] {0, 0}, Math.max(2000, 8 * cycles));
    }

    /** e.g. "duty 20.00 % (2.000 s in 10.00 s) at 12.00 W: single pulse …, cyclic peak …, mean …". */
    @Override
    public String toString() {
        return "duty " + Quantity.number(100 * duty()) + " % (" + onTime() + " on in " + period() + ") at " + power() + ": single pulse "
                + singlePulse() + ", cyclic peak " + peak() + ", trough " + trough() + ", mean " + mean() + ", "
                + (cycles < 0 ? "more than " + MAX_CYCLES : Long.toString(cycles)) + " cycles to within 1 %; hot spot "
                + Quantity.temperatureKelvin(net.ambientK() + peak + net.allowanceK()) + ", " + HotCoil.kelvin(Math.abs(net.limitRiseK() - peak))
                + (withinClass() ? " below " : " OVER ") + net.insulationClass()
                + (warnings().isEmpty() ? "" : " — " + warnings().size() + " warning(s), see warnings()");
    }
}
