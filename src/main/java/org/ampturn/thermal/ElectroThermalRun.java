package org.ampturn.thermal;

import java.util.List;
import java.util.function.Function;
import org.ampturn.coil.Coil;
import org.ampturn.drive.Signal;
import org.ampturn.drive.Transient;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;

/**
 * A coil heating as it works: its resistance follows the winding temperature from a
 * {@link ThermalNetwork}, so current and ampere-turns fall as it heats. Immutable result, with the
 * winding temperature over time ({@link #curve()}).
 *
 * <ul>
 * <li>{@link #cycles}: one drive cycle (any drive, clamp and duration: the caller's function from a
 *     coil to a {@link Transient}) repeated N times. Before each cycle the coil is set to the winding
 *     temperature ({@link Coil#atTemperature}); the copper loss of the run (its "coil" power signal)
 *     is integrated over 16 equal slices of the cycle and each slice heats the network exactly at its
 *     mean power. Slices much shorter than the network's time constants make the coupling error
 *     negligible.</li>
 * <li>{@link #hold}: a long hold at a mean coil voltage V (a DC hold, or a PWM hold at V·duty whose
 *     current the inductance smooths): in each of 2000 steps the loss is V²/R(T) at the winding
 *     temperature at the start of the step.</li>
 * </ul>
 */
public final class ElectroThermalRun {
    private static final int SLICES = 16;

    private final String what;
    private final int turns;
    private final double[] current; // per cycle (peak current of the run) or per step (hold current)
    private final HeatingCurve curve;

    private ElectroThermalRun(String what, int turns, double[] current, HeatingCurve curve) {
        this.what = what;
        this.turns = turns;
        this.current = current;
        this.curve = curve;
    }

    /**
     * A drive cycle repeated {@code cycles} times on a coil of {@code turns} turns, e.g.
     * {@code c -> Drive.dc(V(24)).into(c).offAt(s(1), Clamp.diode()).simulate(s(4))}.
     */
    public static ElectroThermalRun cycles(ThermalNetwork network, Coil coil, int turns, Function<Coil, Transient> cycle, int cycles) {
        Require.present("thermal network", network);
        Require.present("coil", coil);
        Require.present("drive cycle", cycle);
        Require.turns("turns", turns);
        Require.between("cycles", cycles, 1, 1_000_000);
        Require.fitsInMemory("temperature samples", (long) cycles * SLICES, 24);
        double[] s = {0, 0};
        double amb = network.ambientK();
        int n = 1 + cycles * SLICES;
        double[] t = new double[n], w = new double[n], f = network.hasFrame() ? new double[n] : null, peak = new double[cycles];
        t[0] = 0;
        w[0] = amb;
        if (f != null) f[0] = amb;
        double time = 0;
        int i = 0;
        for (int c = 0; c < cycles; c++) {
            Require.notInterrupted("electro-thermal run");
            Transient run = cycle.apply(coil.atTemperature(Quantity.temperatureKelvin(amb + s[0])));
            if (run == null) throw Require.fail("the drive cycle gave no run (null) at cycle " + (c + 1));
            peak[c] = run.peakCurrent().si();
            Signal p = run.power("coil");
            double[] ts = p.times(), ps = p.values();
            double dur = ts[ts.length - 1] - ts[0];
            if (!(dur > 0)) throw Require.fail("the drive cycle must last longer than zero, got " + run.duration());
            double h = dur / SLICES;
            ThermalNetwork.Step step = network.step(h);
            int k = 0;
            for (int j = 0; j < SLICES; j++) {
                double a = ts[0] + j * h, b = a + h, e = 0;
                // trapezoid over the samples inside [a, b]; the loss is linear between samples
                double prevT = a, prevP = p.valueAt(a);
                while (k < ts.length && ts[k] <= a) k++;
                while (k < ts.length && ts[k] < b) {
                    e += 0.5 * (prevP + ps[k]) * (ts[k] - prevT);
                    prevT = ts[k];
                    prevP = ps[k];
                    k++;
                }
                double endP = p.valueAt(Math.min(b, ts[ts.length - 1]));
                e += 0.5 * (prevP + endP) * (b - prevT);
                step.apply(s, Math.max(0, e / h));
                time += h;
                i++;
                t[i] = time;
                w[i] = amb + s[0];
                if (f != null) f[i] = amb + s[1];
            }
        }
        String label = cycles + " drive cycles";
        return new ElectroThermalRun(label, turns, peak,
                new HeatingCurve(label, t, w, f, amb, network.allowanceK(), network.insulationClass()));
    }

    /** A long hold at a mean coil voltage for a time, from ambient; the loss V²/R(T) follows the winding temperature. */
    public static ElectroThermalRun hold(ThermalNetwork network, Coil coil, int turns, Quantity meanVoltage, Quantity duration) {
        Require.present("thermal network", network);
        Require.present("coil", coil);
        Require.turns("turns", turns);
        double v = Require.nonNegative("mean coil voltage", meanVoltage, Dimension.VOLTAGE, 1e6);
        double d = Require.positive("duration", duration, Dimension.TIME, 1e9);
        int steps = 2000;
        double h = d / steps, amb = network.ambientK();
        ThermalNetwork.Step step = network.step(h);
        double[] s = {0, 0}, t = new double[steps + 1], w = new double[steps + 1], f = network.hasFrame() ? new double[steps + 1] : null;
        double[] cur = new double[steps + 1];
        w[0] = amb;
        if (f != null) f[0] = amb;
        for (int j = 0; j <= steps; j++) {
            double r = coil.resistanceAt(amb + s[0]);
            if (!(r > 0)) throw Require.fail("the coil's resistance is zero at " + Quantity.temperatureKelvin(amb + s[0]) + ": a hold needs a resistance");
            cur[j] = v / r;
            if (j == steps) break;
            step.apply(s, v * v / r);
            t[j + 1] = (j + 1) * h;
            w[j + 1] = amb + s[0];
            if (f != null) f[j + 1] = amb + s[1];
        }
        String label = "hold at " + meanVoltage + " for " + duration;
        return new ElectroThermalRun(label, turns, cur, new HeatingCurve(label, t, w, f, amb, network.allowanceK(), network.insulationClass()));
    }

    /** Winding temperature over time, with the class limit. */
    public HeatingCurve curve() { return curve; }

    /** Current at the start, cold (the first cycle's peak current, or the hold current at ambient). */
    public Quantity currentCold() { return Quantity.of(current[0], Dimension.CURRENT); }

    /** Current at the end, hot. */
    public Quantity currentHot() { return Quantity.of(current[current.length - 1], Dimension.CURRENT); }

    /** Ampere-turns at the start and at the end. */
    public Quantity ampereTurnsCold() { return Quantity.of(turns * current[0], Dimension.CURRENT); }

    public Quantity ampereTurnsHot() { return Quantity.of(turns * current[current.length - 1], Dimension.CURRENT); }

    /** How much the current (and the ampere-turns, and roughly the force as their square) fell, as a fraction. */
    public double currentDrop() { return 1 - current[current.length - 1] / current[0]; }

    /** Current per cycle (peak of each run) or per step of a hold (A). */
    public double[] currentsA() { return current.clone(); }

    public Quantity finalTemperature() { return curve.end(); }

    public List<String> warnings() { return curve.warnings(); }

    /** e.g. "1000 drive cycles: winding 25.00 °C → 71.30 °C; current 400.0 mA → 343.5 mA (−14.1 %), 1200 At → 1031 At". */
    @Override
    public String toString() {
        return what + ": winding " + curve.ambient() + " → " + curve.end() + (curve.peakK() > curve.end().si() + 1e-9 ? " (peak " + curve.peak() + ")" : "")
                + "; current " + currentCold() + " → " + currentHot() + " (" + String.format(java.util.Locale.ROOT, "%+.1f %%", -100 * currentDrop())
                + "), " + WireChoices.at(ampereTurnsCold().si()) + " → " + WireChoices.at(ampereTurnsHot().si())
                + (curve.withinClass() ? ", within " : ", OVER ") + curve.insulationClass()
                + (warnings().isEmpty() ? "" : " — " + warnings().size() + " warning(s), see warnings()");
    }
}
