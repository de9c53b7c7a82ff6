package org.ampturn.thermal;

import java.util.Arrays;
import java.util.List;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;

/**
 * Winding (and frame) temperature over time from a {@link ThermalNetwork}, with the insulation class
 * limit it is judged against. Immutable; the arrays are copied in and out.
 */
public final class HeatingCurve {
    private final double[] t, tw, tf;
    private final double ambient, allowance;
    private final InsulationClass insulation;
    private final String label;

    HeatingCurve(String label, double[] t, double[] tw, double[] tf, double ambient, double allowance, InsulationClass insulation) {
        this.label = label;
        this.t = t.clone();
        this.tw = tw.clone();
        this.tf = tf == null ? null : tf.clone();
        this.ambient = ambient;
        this.allowance = allowance;
        this.insulation = insulation;
    }

    /**
     * Samples a loss profile: pieces of constant power (W) and duration (s), the whole repeated
     * {@code cycles} times, from the start state {θw, θf} (rises in K), about {@code points} samples in all.
     */
    static HeatingCurve sample(ThermalNetwork net, double[] powers, double[] durations, int cycles, double[] start, int points) {
        int pieces = powers.length;
        int per = Math.max(1, points / Math.max(1, pieces * cycles));
        ThermalNetwork.Step[] steps = new ThermalNetwork.Step[pieces];
        for (int k = 0; k < pieces; k++) steps[k] = net.step(durations[k] / per);
        int n = 1 + cycles * pieces * per;
        double[] t = new double[n], w = new double[n], f = net.hasFrame() ? new double[n] : null;
        double[] s = start.clone();
        double time = 0;
        int i = 0;
        t[0] = 0;
        w[0] = net.ambientK() + s[0];
        if (f != null) f[0] = net.ambientK() + s[1];
        for (int c = 0; c < cycles; c++) {
            if ((c & 1023) == 0) Require.notInterrupted("heating curve");
            for (int k = 0; k < pieces; k++) {
                double h = durations[k] / per;
                for (int j = 0; j < per; j++) {
                    steps[k].apply(s, powers[k]);
                    time += h;
                    i++;
                    t[i] = time;
                    w[i] = net.ambientK() + s[0];
                    if (f != null) f[i] = net.ambientK() + s[1];
                }
            }
        }
        String label = pieces == 1 ? "constant " + Quantity.of(powers[0], Dimension.POWER)
                : Quantity.of(powers[0], Dimension.POWER) + " for " + Quantity.of(durations[0], Dimension.TIME) + " in every "
                        + Quantity.of(durations[0] + durations[1], Dimension.TIME) + ", " + cycles + " cycles";
        return new HeatingCurve(label, t, w, f, net.ambientK(), net.allowanceK(), net.insulationClass());
    }

    /** What the curve is of, e.g. "constant 2.000 W". */
    public String label() { return label; }

    public Quantity duration() { return Quantity.of(t[t.length - 1], Dimension.TIME); }

    /** Winding temperature at the end. */
    public Quantity end() { return Quantity.temperatureKelvin(tw[tw.length - 1]); }

    /** Highest winding temperature. */
    public Quantity peak() { return Quantity.temperatureKelvin(peakK()); }

    /** Winding temperature at a time (linear between samples). */
    public Quantity temperatureAt(Quantity time) {
        double x = Require.inRange("time", time, Dimension.TIME, 0, t[t.length - 1]);
        int i = Arrays.binarySearch(t, x);
        if (i >= 0) return Quantity.temperatureKelvin(tw[i]);
        int hi = -i - 1, lo = hi - 1;
        double u = (x - t[lo]) / (t[hi] - t[lo]);
        return Quantity.temperatureKelvin(tw[lo] + u * (tw[hi] - tw[lo]));
    }

    public InsulationClass insulationClass() { return insulation; }

    public Quantity ambient() { return Quantity.temperatureKelvin(ambient); }

    /** Hot-spot allowance above the winding's mean temperature. */
    public Quantity hotSpotAllowance() { return HotCoil.kelvin(allowance); }

    /** True when the peak hot spot (peak + allowance) stays within the class. */
    public boolean withinClass() { return peakK() + allowance <= insulation.limit().si(); }

    /** Class limit less the peak hot spot, in K (negative when over). */
    public Quantity margin() { return HotCoil.kelvin(insulation.limit().si() - allowance - peakK()); }

    /** Over or near the class, hot surface; empty when none apply. */
    public List<String> warnings() { return HotCoil.warnings("heating curve", peakK(), allowance, insulation); }

    public boolean hasFrame() { return tf != null; }

    // ---- kernels: copies of the samples, SI ----
    public double[] timesS() { return t.clone(); }
    public double[] windingK() { return tw.clone(); }
    /** Frame temperatures (K); empty for a one-body network. */
    public double[] frameK() { return tf == null ? new double[0] : tf.clone(); }
    public double classLimitK() { return insulation.limit().si(); }

    double peakK() {
        double m = tw[0];
        for (double v : tw) m = Math.max(m, v);
        return m;
    }

    /** e.g. "heating curve, constant 2.000 W, 600.0 s: 25.00 °C → 84.21 °C, hot spot 94.21 °C, 35.79 K below class 130 (B)". */
    @Override
    public String toString() {
        double m = insulation.limit().si() - allowance - peakK();
        return "heating curve, " + label + ", " + duration() + ": " + Quantity.temperatureKelvin(tw[0]) + " → " + end()
                + (peakK() > tw[tw.length - 1] + 1e-9 ? " (peak " + peak() + ")" : "") + ", hot spot "
                + Quantity.temperatureKelvin(peakK() + allowance) + ", " + HotCoil.kelvin(Math.abs(m)) + (m >= 0 ? " below " : " OVER ")
                + insulation + (warnings().isEmpty() ? "" : " — " + warnings().size() + " warning(s), see warnings()");
    }
}
