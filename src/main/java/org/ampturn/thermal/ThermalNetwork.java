package org.ampturn.thermal;

import org.ampturn.material.Conductor;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;
import org.ampturn.wire.Winding;

/**
 * The heating of a coil over time: a lumped thermal network with heat capacities. Immutable; copies
 * with a change by {@code with…}.
 *
 * <ul>
 * <li>One body: the winding, heat capacity C, thermal resistance R to ambient:
 *     C·dθ/dt = P − θ/R, θ the rise over ambient; θ(t) = P·R + (θ0 − P·R)·e^(−t/τ), τ = R·C
 *     (Newton's law of cooling; Incropera and DeWitt, Fundamentals of Heat and Mass Transfer,
 *     lumped capacitance method).</li>
 * <li>Two bodies: winding (C_w) coupled through R_wf to a frame or housing (C_f), which sheds the
 *     heat through R_fa to ambient: C_w·dθ_w/dt = P − (θ_w − θ_f)/R_wf,
 *     C_f·dθ_f/dt = (θ_w − θ_f)/R_wf − θ_f/R_fa. The steady rise is P·(R_wf + R_fa).</li>
 * </ul>
 * With a constant power over a step h the solution is exact: θ(h) = θ_ss + e^(A·h)·(θ0 − θ_ss),
 * with the 2 × 2 matrix exponential by Sylvester's formula (the eigenvalues of A are real, negative
 * and distinct for positive C and R). So a duty cycle of any length is stepped piece by piece with
 * no integration error.
 *
 * <p>The model is linear: the resistances and capacities do not change with temperature, and the
 * loss P is given per piece. A voltage-driven coil whose loss falls as it heats is followed by
 * {@link ElectroThermalRun}. Lumped bodies have one temperature each: the winding's is its mean
 * temperature; its hot spot is taken as that plus an allowance (10 K unless given, as in
 * {@link Heating}). Values from geometry ({@link #of(Winding)}) are typical estimates: measure a
 * prototype's heating curve (resistance method) to fit R and C before relying on them.
 */
public final class ThermalNetwork {
    /** Specific heat of copper near room temperature, 385 J/(kg·K) (typical, from memory: CRC Handbook order of value). */
    public static final Quantity COPPER_SPECIFIC_HEAT = Quantity.of(385, Dimension.SPECIFIC_HEAT);
    /** Specific heat of aluminium, 897 J/(kg·K) (typical, from memory: CRC Handbook order of value). */
    public static final Quantity ALUMINIUM_SPECIFIC_HEAT = Quantity.of(897, Dimension.SPECIFIC_HEAT);
    /** Specific heat of low-carbon steel, 460 J/(kg·K) (typical, from memory). */
    public static final Quantity STEEL_SPECIFIC_HEAT = Quantity.of(460, Dimension.SPECIFIC_HEAT);
    /** Still-air surface coefficient (convection and radiation) used by {@link #of(Winding)}: 12 W/(m²·K), typical (common practice: 10 to 15). */
    public static final Quantity STILL_AIR = Quantity.of(12, Dimension.HEAT_TRANSFER_COEFFICIENT);
    /** Largest heat capacity accepted (J/K): a tonne of copper is 3.9e5 J/K. */
    static final double MAX_CAPACITY = 1e9;
    /** Largest thermal resistance accepted (K/W). */
    static final double MAX_RESISTANCE = 1e6;

    private final double cw, rwa;          // one body: winding capacity, winding to ambient
    private final double cf, rwf, rfa;     // two bodies: frame capacity, winding to frame, frame to ambient; cf = NaN for one body
    private final double ambient;
    private final double allowance;
    private final InsulationClass insulation;

    private ThermalNetwork(double cw, double rwa, double cf, double rwf, double rfa, double ambient, double allowance, InsulationClass insulation) {
        this.cw = cw;
        this.rwa = rwa;
        this.cf = cf;
        this.rwf = rwf;
        this.rfa = rfa;
        this.ambient = ambient;
        this.allowance = allowance;
        this.insulation = insulation;
    }

    private static double capacity(String name, Quantity c) {
        return Require.positive(name, c, Dimension.HEAT_CAPACITY, MAX_CAPACITY);
    }

    private static double resistance(String name, Quantity r) {
        return Require.positive(name, r, Dimension.THERMAL_RESISTANCE, MAX_RESISTANCE);
    }

    /**
     * One body: the winding with its heat capacity and its thermal resistance to ambient, in 25 °C
     * air, class 130 (B).
     */
    public static ThermalNetwork oneBody(Quantity windingCapacity, Quantity windingToAmbient) {
        return new ThermalNetwork(capacity("winding heat capacity", windingCapacity), resistance("winding-to-ambient resistance", windingToAmbient),
                Double.NaN, Double.NaN, Double.NaN, 298.15, 10, InsulationClass.B);
    }

    /**
     * Two bodies: the winding (capacity), its resistance to the frame, the frame (capacity) and the
     * frame's resistance to ambient, in the order the heat flows; 25 °C air, class 130 (B).
     */
    public static ThermalNetwork twoBody(Quantity windingCapacity, Quantity windingToFrame, Quantity frameCapacity, Quantity frameToAmbient) {
        double c1 = capacity("winding heat capacity", windingCapacity);
        double r1 = resistance("winding-to-frame resistance", windingToFrame);
        double c2 = capacity("frame heat capacity", frameCapacity);
        double r2 = resistance("frame-to-ambient resistance", frameToAmbient);
        return new ThermalNetwork(c1, r1 + r2, c2, r1, r2, 298.15, 10, InsulationClass.B);
    }

    /**
     * One body from a winding's geometry: capacity = copper mass × 385 J/(kg·K) (enamel and bobbin
     * left out, so the estimate heats a little fast), resistance to ambient = 1/(h·A) with the
     * winding's outside surface A and still air h = 12 W/(m²·K) (typical).
     */
    public static ThermalNetwork of(Winding winding) {
        Require.present("winding", winding);
        double c = winding.copperMass().si() * COPPER_SPECIFIC_HEAT.si();
        double r = 1 / (STILL_AIR.si() * winding.surfaceArea().si());
        return oneBody(Quantity.of(c, Dimension.HEAT_CAPACITY), Quantity.of(r, Dimension.THERMAL_RESISTANCE));
    }

    /** Heat capacity m·c of a body of a mass and a specific heat. */
    public static Quantity capacityOf(Quantity mass, Quantity specificHeat) {
        double m = Require.positive("mass", mass, Dimension.MASS);
        double c = Require.positive("specific heat", specificHeat, Dimension.SPECIFIC_HEAT);
        return Quantity.of(Require.result("heat capacity", m * c), Dimension.HEAT_CAPACITY);
    }

    /** Thermal resistance 1/(h·A) of a surface shedding heat with coefficient h. */
    public static Quantity surfaceResistance(Quantity h, Quantity area) {
        double hh = Require.positive("heat transfer coefficient", h, Dimension.HEAT_TRANSFER_COEFFICIENT);
        double a = Require.positive("surface area", area, Dimension.AREA);
        return Quantity.of(Require.result("surface resistance", 1 / (hh * a)), Dimension.THERMAL_RESISTANCE);
    }

    /**
     * This winding coupled to a frame: the winding keeps its capacity, its resistance to ambient is
     * replaced by the path winding → frame → ambient.
     */
    public ThermalNetwork withFrame(Quantity windingToFrame, Quantity frameCapacity, Quantity frameToAmbient) {
        double r1 = resistance("winding-to-frame resistance", windingToFrame);
        double c2 = capacity("frame heat capacity", frameCapacity);
        double r2 = resistance("frame-to-ambient resistance", frameToAmbient);
        return new ThermalNetwork(cw, r1 + r2, c2, r1, r2, ambient, allowance, insulation);
    }

    /** Ambient temperature; refused at or above the insulation class limit (the coil could never run). */
    public ThermalNetwork withAmbient(Quantity temperature) {
        double t = Require.absoluteTemperature("ambient temperature", temperature, 173.15, 573.15, "the thermal network");
        checkAmbient(t, insulation, allowance);
        return new ThermalNetwork(cw, rwa, cf, rwf, rfa, t, allowance, insulation);
    }

    public ThermalNetwork withInsulationClass(InsulationClass c) {
        Require.present("insulation class", c);
        checkAmbient(ambient, c, allowance);
        return new ThermalNetwork(cw, rwa, cf, rwf, rfa, ambient, allowance, c);
    }

    /** Hot spot above the mean winding temperature (a difference in K). */
    public ThermalNetwork withHotSpotAllowance(Quantity kelvin) {
        double k = Require.nonNegative("hot-spot allowance", kelvin, Dimension.TEMPERATURE, 200);
        checkAmbient(ambient, insulation, k);
        return new ThermalNetwork(cw, rwa, cf, rwf, rfa, ambient, k, insulation);
    }

    private static void checkAmbient(double t, InsulationClass c, double allowance) {
        if (!(t + allowance < c.limit().si())) {
            throw Require.fail("ambient temperature " + Quantity.temperatureKelvin(t) + " is at or above the limit of thermal " + c
                    + " less the hot-spot allowance (" + Quantity.of(allowance, Dimension.TEMPERATURE) + "): " + Quantity.temperatureKelvin(c.limit().si() - allowance)
                    + "; the coil cannot run at all there: choose a higher class or a cooler place");
        }
    }

    public boolean hasFrame() { return !Double.isNaN(cf); }

    public Quantity windingCapacity() { return Quantity.of(cw, Dimension.HEAT_CAPACITY); }

    /** Total resistance from the winding to ambient (through the frame when there is one). */
    public Quantity resistanceToAmbient() { return Quantity.of(rwa, Dimension.THERMAL_RESISTANCE); }

    public Quantity ambient() { return Quantity.temperatureKelvin(ambient); }

    public InsulationClass insulationClass() { return insulation; }

    public Quantity hotSpotAllowance() { return Quantity.of(allowance, Dimension.TEMPERATURE); }

    /** Time constants, slowest first: one for one body (R·C), two for two bodies (−1/λ of A). */
    public Quantity[] timeConstants() {
        if (!hasFrame()) return new Quantity[] {Quantity.of(rwa * cw, Dimension.TIME)};
        double[] l = eigen();
        return new Quantity[] {Quantity.of(-1 / l[1], Dimension.TIME), Quantity.of(-1 / l[0], Dimension.TIME)};
    }

    /** Steady winding temperature at a constant loss. */
    public Quantity steadyTemperature(Quantity power) {
        double p = Require.nonNegative("power", power, Dimension.POWER, 1e9);
        return Quantity.temperatureKelvin(ambient + p * rwa);
    }

    /** The winding heating from ambient at a constant loss for a time, sampled at 501 points. */
    public HeatingCurve heat(Quantity power, Quantity duration) {
        return heat(power, duration, Quantity.temperatureKelvin(ambient));
    }

    /**
     * The winding heating at a constant loss for a time from a start temperature (the frame, when
     * there is one, starting at ambient plus the same share of the rise as in the steady state).
     */
    public HeatingCurve heat(Quantity power, Quantity duration, Quantity startTemperature) {
        double p = Require.nonNegative("power", power, Dimension.POWER, 1e9);
        double t = Require.positive("duration", duration, Dimension.TIME, 1e9);
        double[] s = startState(startTemperature);
        return HeatingCurve.sample(this, new double[] {p}, new double[] {t}, 1, s, 500);
    }

    /** Intermittent duty: the loss on for {@code onTime} of every {@code period}, off for the rest. */
    public DutyCycle duty(Quantity power, Quantity onTime, Quantity period) {
        double p = Require.nonNegative("power", power, Dimension.POWER, 1e9);
        double on = Require.positive("on-time", onTime, Dimension.TIME, 1e9);
        double per = Require.positive("period", period, Dimension.TIME, 1e9);
        if (!(on <= per)) {
            throw Require.fail("on-time " + onTime + " is longer than the period " + period + " (duty " + Require.show(100 * on / per)
                    + " %): the duty must be from 0 to 100 %");
        }
        return new DutyCycle(this, p, on, per);
    }

    /** Intermittent duty by the trade's duty-cycle percentage (on-time / period × 100). */
    public DutyCycle dutyPercent(Quantity power, Quantity onTime, double dutyPercent) {
        if (!(dutyPercent > 0 && dutyPercent <= 100)) {
            throw Require.fail("duty (" + Require.show(dutyPercent) + " %) must be above 0 % and at most 100 %");
        }
        double on = Require.positive("on-time", onTime, Dimension.TIME, 1e9);
        return duty(power, onTime, Quantity.of(on * 100 / dutyPercent, Dimension.TIME));
    }

    /**
     * The longest time the loss may stay on, from a start temperature, before the winding's hot spot
     * (mean + allowance) reaches the insulation class; infinite (∞ s) when the steady state stays below it.
     */
    public Quantity longestOnTime(Quantity power, Quantity startTemperature) {
        double p = Require.nonNegative("power", power, Dimension.POWER, 1e9);
        double[] s = startState(startTemperature);
        return Quantity.of(longestOnTimeAt(p, s), Dimension.TIME);
    }

    // ---- kernels (rises over ambient in K, seconds, watts) ----

    double ambientK() { return ambient; }
    double allowanceK() { return allowance; }
    double limitRiseK() { return insulation.limit().si() - allowance - ambient; }
    double rwaKW() { return rwa; }

    double[] startState(Quantity startTemperature) {
        double t0 = Require.absoluteTemperature("start temperature", startTemperature, 173.15, 773.15, "the thermal network");
        double r = t0 - ambient;
        return new double[] {r, hasFrame() ? r * rfa / rwa : 0};
    }

    /** Eigenvalues of A (two bodies), λ0 < λ1 < 0. */
    private double[] eigen() {
        double a = -1 / (cw * rwf), b = 1 / (cw * rwf), c = 1 / (cf * rwf), d = -(1 / rwf + 1 / rfa) / cf;
        double tr = a + d, det = a * d - b * c;
        double disc = Math.sqrt((a - d) * (a - d) + 4 * b * c);
        return new double[] {(tr - disc) / 2, (tr + disc) / 2};
    }

    /** A propagator for steps of length h: the state after h at constant power p, in place. */
    Step step(double h) { return new Step(h); }

    /** The exact step over a fixed h (matrix exponential precomputed). */
    final class Step {
        private final double e11, e12, e21, e22;

        Step(double h) {
            if (!hasFrame()) {
                e11 = Math.exp(-h / (rwa * cw));
                e12 = e21 = e22 = 0;
                return;
            }
            double a = -1 / (cw * rwf), b = 1 / (cw * rwf), c = 1 / (cf * rwf), d = -(1 / rwf + 1 / rfa) / cf;
            double[] l = eigen();
            double x1 = Math.exp(l[0] * h), x2 = Math.exp(l[1] * h), dl = l[0] - l[1];
            double s0 = (l[0] * x2 - l[1] * x1) / dl, s1 = (x1 - x2) / dl; // e^{Ah} = s0·I + s1·A (Sylvester)
            e11 = s0 + s1 * a;
            e12 = s1 * b;
            e21 = s1 * c;
            e22 = s0 + s1 * d;
        }

        /** Advances state {θw, θf} at constant power p (W). */
        void apply(double[] s, double p) {
            double w = p * rwa, f = hasFrame() ? p * rfa : 0;
            double u = s[0] - w, v = s[1] - f;
            s[0] = w + e11 * u + e12 * v;
            s[1] = f + e21 * u + e22 * v;
        }
    }

    double longestOnTimeAt(double p, double[] s0) {
        double limit = limitRiseK();
        if (s0[0] >= limit) return 0;
        if (p * rwa <= limit) return Double.POSITIVE_INFINITY;
        if (!hasFrame()) return rwa * cw * Math.log((p * rwa - s0[0]) / (p * rwa - limit));
        // bracket by doubling from the fast time constant, then bisect: θw(t) crosses the limit once on its way up
        double tau = -1 / eigen()[0], hi = tau / 16;
        double[] s = s0.clone();
        for (int k = 0; k < 200; k++) {
            s = s0.clone();
            step(hi).apply(s, p);
            if (s[0] >= limit) break;
            hi *= 2;
        }
        double lo = 0;
        for (int k = 0; k < 200 && hi - lo > 1e-12 * hi; k++) {
            double mid = 0.5 * (lo + hi);
            s = s0.clone();
            step(mid).apply(s, p);
            if (s[0] >= limit) hi = mid; else lo = mid;
        }
        return 0.5 * (lo + hi);
    }

    @Override
    public String toString() {
        String body = hasFrame()
                ? "two-body network: winding " + windingCapacity() + ", " + Quantity.of(rwf, Dimension.THERMAL_RESISTANCE) + " to frame "
                        + Quantity.of(cf, Dimension.HEAT_CAPACITY) + ", " + Quantity.of(rfa, Dimension.THERMAL_RESISTANCE) + " to ambient"
                : "one-body network: winding " + windingCapacity() + ", " + resistanceToAmbient() + " to ambient";
        Quantity[] tc = timeConstants();
        return body + ", τ " + tc[0] + (tc.length > 1 ? " and " + tc[1] : "") + ", ambient " + ambient() + ", " + insulation;
    }
}
