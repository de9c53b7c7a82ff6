package org.ampturn.chart;

import java.util.ArrayList;
import java.util.List;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;

/**
 * Demo data shaped like the drive's transient (signals() and markers()): an invented 12 V coil,
 * R = 24 Ω, L = 100 mH, switched on at t = 0 and off at 20 ms into a 200 Ω clamp resistor.
 * Current from the RL step i = V/R·(1 − e^(−t/τ)), τ = L/R, and its exponential decay
 * (any circuit-analysis text, e.g. Hayt and Kemmerly, Engineering Circuit Analysis, first-order
 * RL circuits). The figures only need the shapes; the physics is the drive's business.
 */
public final class RlRun {
    public static final double V = 12, R = 24, L = 0.1, RC = 200, T_OFF = 0.020, T_END = 0.040;

    public interface Signal {
        String name();
        Dimension dimension();
        double[] times();
        double[] values();
    }

    public record Marker(String label, Quantity time, Quantity value, String signal) {}

    /** Hidden implementation: reached only through the public interface. */
    private record Sig(String name, Dimension dimension, double[] times, double[] values) implements Signal {}

    private final List<Signal> signals = new ArrayList<>();
    private final List<Marker> markers = new ArrayList<>();
    private final String text;

    public RlRun(int points) {
        this(points, 1.0);
    }

    /** {@code scale} multiplies the supply voltage (for overlays of several runs). */
    public RlRun(int points, double scale) {
        double v = V * scale;
        double[] t = new double[points], i = new double[points], vc = new double[points], vr = new double[points],
                vs = new double[points], es = new double[points], ed = new double[points], eu = new double[points];
        double tau = L / R, i0 = v / R * (1 - Math.exp(-T_OFF / tau)), tau2 = L / (R + RC);
        for (int k = 0; k < points; k++) {
            t[k] = T_END * k / (points - 1);
            boolean on = t[k] < T_OFF;
            i[k] = on ? v / R * (1 - Math.exp(-t[k] / tau)) : i0 * Math.exp(-(t[k] - T_OFF) / tau2);
            vr[k] = i[k] * R;
            vs[k] = on ? 0 : v + i[k] * RC;
            vc[k] = on ? v - vr[k] : -i[k] * RC - 0 * v;
            es[k] = 0.5 * L * i[k] * i[k];
            if (k > 0) {
                double dt = t[k] - t[k - 1], im = 0.5 * (i[k] + i[k - 1]);
                ed[k] = ed[k - 1] + im * im * (R + (on ? 0 : RC)) * dt;
                eu[k] = eu[k - 1] + (on ? v * im * dt : 0);
            }
        }
        add("current", Dimension.CURRENT, t, i);
        add("coil voltage", Dimension.VOLTAGE, t, vc);
        add("resistor voltage", Dimension.VOLTAGE, t, vr);
        add("switch voltage", Dimension.VOLTAGE, t, vs);
        add("stored energy", Dimension.ENERGY, t, es);
        add("dissipated energy", Dimension.ENERGY, t, ed);
        add("supplied energy", Dimension.ENERGY, t, eu);
        markers.add(new Marker("τ", Quantity.of(tau, Dimension.TIME), null, "current"));
        markers.add(new Marker("peak switch voltage", Quantity.of(T_OFF, Dimension.TIME),
                Quantity.of(v + i0 * RC, Dimension.VOLTAGE), "switch voltage"));
        text = "12 V into 24 Ω, 100 mH, clamp 200 Ω, " + points + " points";
    }

    private void add(String n, Dimension d, double[] t, double[] v) {
        signals.add(new Sig(n, d, t, v));
    }

    public List<Signal> signals() { return signals; }

    public List<Marker> markers() { return markers; }

    @Override public String toString() { return text; }
}
