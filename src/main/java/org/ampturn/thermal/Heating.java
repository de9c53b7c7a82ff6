package org.ampturn.thermal;

import java.util.Objects;
import org.ampturn.material.Conductor;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;
import org.ampturn.wire.Winding;

/**
 * The steady heating of a coil in still air: copper loss (plus any fixed loss, e.g. core loss) shed
 * from its surface by a {@link Cooling} rule, with the resistance taken at the temperature it reaches.
 * Immutable; copies with a change by {@code with…}; solved by {@link #atVoltage}, {@link #atCurrent}.
 *
 * <p>Model: the winding is taken to be at its surface temperature T = T_a + ΔT(P), and
 * P = V²/R(T) (voltage drive) or I²·R(T) (current drive), R(T) = R20·(1 + α20·(T − 20 °C)) (IEC 60028
 * for copper). T is found by fixed-point iteration T ← T_a + ΔT(P(T)); when that does not settle
 * (a current drive whose loss grows faster than the surface sheds it can make the iteration leave),
 * bisection on the bracket [T_a, T_a + 5000 K] finishes it, so the solve always ends. The hot spot is
 * estimated as T + a hot-spot allowance (10 K unless given: the order of the allowances in the
 * temperature-rise tables of IEC 60076-11 for dry-type windings, from memory) and compared with the
 * insulation class (IEC 60085).
 */
public final class Heating {
    private final double r20;
    private final Conductor conductor;
    private final double area;
    private final double ambient;
    private final Cooling cooling;
    private final double extraWatts;
    private final double allowance;
    private final InsulationClass insulation;

    private Heating(double r20, Conductor conductor, double area, double ambient, Cooling cooling, double extraWatts, double allowance,
            InsulationClass insulation) {
        this.r20 = r20;
        this.conductor = conductor;
        this.area = area;
        this.ambient = ambient;
        this.cooling = cooling;
        this.extraWatts = extraWatts;
        this.allowance = allowance;
        this.insulation = insulation;
    }

    /** A winding in 25 °C still air, its own outside surface shedding the heat, class 130 (B) insulation. */
    public static Heating of(Winding winding) {
        Require.present("winding", winding);
        return new Heating(winding.resistanceAt(Conductor.T20), winding.conductor(), winding.surfaceArea().si(), 298.15,
                Cooling.handbookRule(), 0, 10, InsulationClass.B);
    }

    /** A coil known by its resistance at 20 °C, its conductor and its cooling surface area. */
    public static Heating of(Quantity resistance20, Conductor conductor, Quantity surfaceArea) {
        Require.present("conductor", conductor);
        double r = Require.positive("resistance at 20 °C", resistance20, Dimension.RESISTANCE);
        double a = Require.positive("surface area", surfaceArea, Dimension.AREA);
        return new Heating(r, conductor, a, 298.15, Cooling.handbookRule(), 0, 10, InsulationClass.B);
    }

    public Heating withAmbient(Quantity temperature) {
        double t = Require.absoluteTemperature("ambient temperature", temperature, 173.15, 573.15, "the cooling rules");
        return new Heating(r20, conductor, area, t, cooling, extraWatts, allowance, insulation);
    }

    public Heating withSurface(Quantity surfaceArea) {
        double a = Require.positive("surface area", surfaceArea, Dimension.AREA);
        return new Heating(r20, conductor, a, ambient, cooling, extraWatts, allowance, insulation);
    }

    public Heating withCooling(Cooling c) {
        Require.present("cooling", c);
        return new Heating(r20, conductor, area, ambient, c, extraWatts, allowance, insulation);
    }

    /** A loss that does not depend on temperature, shed by the same surface (e.g. core loss). */
    public Heating withExtraLoss(Quantity power) {
        double p = Require.nonNegative("extra loss", power, Dimension.POWER);
        return new Heating(r20, conductor, area, ambient, cooling, p, allowance, insulation);
    }

    /** Hot spot above the mean winding temperature. */
    public Heating withHotSpotAllowance(Quantity kelvin) {
        double k = Require.nonNegative("hot-spot allowance", kelvin, Dimension.TEMPERATURE);
        return new Heating(r20, conductor, area, ambient, cooling, extraWatts, k, insulation);
    }

    public Heating withInsulationClass(InsulationClass c) {
        Require.present("insulation class", c);
        return new Heating(r20, conductor, area, ambient, cooling, extraWatts, allowance, c);
    }

    /** Steady state with a constant voltage across the winding. */
    public HeatState atVoltage(Quantity voltage) {
        double v = Require.nonNegative("voltage", voltage, Dimension.VOLTAGE);
        return solve(true, v);
    }

    /** Steady state with a constant current through the winding. */
    public HeatState atCurrent(Quantity current) {
        double i = Require.nonNegative("current", current, Dimension.CURRENT);
        return solve(false, i);
    }

    /** Kernel: copper loss (W) at winding temperature T (K). */
    private double copperLoss(boolean voltageDrive, double drive, double kelvin) {
        double r = r20 * conductor.resistanceRatioAt(kelvin);
        if (!(r > 0)) throw new IllegalStateException("the resistance would be zero or negative at " + Quantity.temperatureKelvin(kelvin));
        return voltageDrive ? drive * drive / r : drive * drive * r;
    }

    private double next(boolean vd, double drive, double t) {
        return ambient + cooling.riseAt(copperLoss(vd, drive, t) + extraWatts, area);
    }

    private HeatState solve(boolean vd, double drive) {
        double t = ambient;
        int it = 0;
        boolean done = false;
        for (; it < 200; it++) {
            double n = next(vd, drive, t);
            if (!Double.isFinite(n) || n > ambient + 5000) break;
            if (Math.abs(n - t) < 1e-9) { t = n; done = true; break; }
            t = n;
        }
        String method = "fixed point";
        if (!done) {
            double lo = ambient, hi = ambient + 5000;
            if (next(vd, drive, hi) - hi > 0) {
                throw new IllegalStateException("no steady temperature below " + Quantity.temperatureKelvin(hi)
                        + ": the loss grows faster than the surface " + Quantity.of(area, Dimension.AREA) + " can shed it");
            }
            for (int k = 0; k < 200 && hi - lo > 1e-9; k++) {
                double mid = 0.5 * (lo + hi);
                if (next(vd, drive, mid) - mid > 0) lo = mid; else hi = mid;
                it++;
            }
            t = 0.5 * (lo + hi);
            method = "bisection";
        }
        double r = r20 * conductor.resistanceRatioAt(t);
        double current = vd ? drive / r : drive;
        double pcu = current * current * r;
        return new HeatState(this, t, r, current, pcu, extraWatts, allowance, insulation, it, method);
    }

    double ambientK() { return ambient; }
    double areaM2() { return area; }
    Cooling cooling() { return cooling; }

    @Override
    public String toString() {
        return "heating: R20 " + Quantity.of(r20, Dimension.RESISTANCE) + " " + conductor.name() + ", surface " + Quantity.of(area, Dimension.AREA)
                + ", ambient " + Quantity.temperatureKelvin(ambient) + ", " + insulation + ", " + cooling.describe();
    }
}
