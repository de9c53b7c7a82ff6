package org.ampturn.actuator;

import org.ampturn.drive.Armature;
import org.ampturn.material.MagneticMaterial;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;

/**
 * A plunger (solenoid) actuator for transient runs: a coil of N turns on a magnetic circuit made of
 * a working gap that closes as the plunger travels, a fixed parasitic gap (the sliding gap around
 * the plunger and the residual gap of a non-magnetic stop), and an iron path; a plunger of mass m
 * held open by a return spring with preload, working against a constant load force, between end
 * stops at 0 (open) and the stroke (closed).
 *
 * <p>Magnetic circuit (lumped reluctances; Roters, Electromagnetic Devices, Wiley 1941, ch. 5 and 7;
 * Hughes, Electric Motors and Drives, 4th ed., ch. 1, from memory): with flux φ = λ/N and B = φ/A,
 * <pre>N·i = φ·(g(x)/(μ0·A) + gp/(μ0·Ap)) + l_fe·H_fe(B),   g(x) = stroke + residual − x</pre>
 * so the current follows explicitly from λ and x, even with a saturating iron B-H curve. Field
 * energy {@code W = ½φ²·(Rg + Rp) + A·l_fe·∫H dB}; force at constant λ
 * {@code F = −∂W/∂x = B²·A/(2·μ0)} (Maxwell's pull on the working gap; Fitzgerald, Kingsley and
 * Umans, Electric Machinery, 6th ed., ch. 3). Valid while the gap is short against the pole's width:
 * fringing and leakage flux are left out (both raise the real inductance at large gaps), and so are
 * eddy currents, friction other than viscous damping, and rebound at the stops (impacts are
 * perfectly plastic). See lib-docs/plunger.md.
 *
 * <p>Resistance follows annealed copper, α20 = 0.00393 /K (IEC 60028:1925).
 */
public final class Plunger implements Armature {
    private static final double MU0 = MagneticMaterial.MU0;
    private static final double T20 = org.ampturn.material.Conductor.T20;

    private final int turns;
    private final double area;
    private final double stroke;
    private final double residual;
    private final double parasitic;
    private final double parasiticArea;
    private final double ironLength;
    private final MagneticMaterial iron;
    private final double mass;
    private final double stiffness;
    private final double preload;
    private final double load;
    private final double damping;
    private final double r20;
    private final double kelvin;

    private Plunger(int turns, double area, double stroke, double residual, double parasitic, double parasiticArea,
                    double ironLength, MagneticMaterial iron, double mass, double stiffness, double preload, double load,
                    double damping, double r20, double kelvin) {
        this.turns = turns;
        this.area = area;
        this.stroke = stroke;
        this.residual = residual;
        this.parasitic = parasitic;
        this.parasiticArea = parasiticArea;
        this.ironLength = ironLength;
        this.iron = iron;
        this.mass = mass;
        this.stiffness = stiffness;
        this.preload = preload;
        this.load = load;
        this.damping = damping;
        this.r20 = r20;
        this.kelvin = kelvin;
    }

    /**
     * A plunger of {@code turns} on a pole face of {@code poleArea} with the given stroke. Defaults:
     * residual gap 0.05 mm, parasitic gap 0.1 mm of the pole area, no iron reluctance, mass 10 g,
     * no spring, no load, no damping, coil resistance 10 Ω at 20 °C. Change them with the {@code with…} methods.
     */
    public static Plunger of(int turns, Quantity poleArea, Quantity stroke) {
        Require.turns("turns", turns);
        double a = Require.positive("pole area", poleArea, Dimension.AREA);
        double s = Require.length("stroke", stroke);
        return new Plunger(turns, a, s, 0.05e-3, 0.1e-3, a, 0, null, 0.010, 0, 0, 0, 0, 10, T20);
    }

    private Plunger copy(double residual, double parasitic, double parasiticArea, double ironLength, MagneticMaterial iron,
                         double mass, double stiffness, double preload, double load, double damping, double r20, double kelvin) {
        return new Plunger(turns, area, stroke, residual, parasitic, parasiticArea, ironLength, iron, mass, stiffness, preload,
                load, damping, r20, kelvin);
    }

    /** Gap left when closed (a non-magnetic stop or plating), in series with the working gap. */
    public Plunger withResidualGap(Quantity gap) {
        double g = Require.lengthOrZero("residual gap", gap);
        return copy(g, parasitic, parasiticArea, ironLength, iron, mass, stiffness, preload, load, damping, r20, kelvin);
    }

    /** Fixed parasitic gap (the radial sliding gap) of the given length and area. */
    public Plunger withParasiticGap(Quantity gap, Quantity gapArea) {
        double g = Require.lengthOrZero("parasitic gap", gap);
        double a = Require.positive("parasitic gap area", gapArea, Dimension.AREA);
        return copy(residual, g, a, ironLength, iron, mass, stiffness, preload, load, damping, r20, kelvin);
    }

    /** Iron path of the given mean length and material, with the pole's cross-section. */
    public Plunger withIron(Quantity pathLength, MagneticMaterial material) {
        double l = Require.length("iron path length", pathLength);
        if (material == null) throw Require.fail("iron material is missing (null)");
        return copy(residual, parasitic, parasiticArea, l, material, mass, stiffness, preload, load, damping, r20, kelvin);
    }

    public Plunger withMass(Quantity m) {
        double v = Require.positive("moving mass", m, Dimension.MASS);
        return copy(residual, parasitic, parasiticArea, ironLength, iron, v, stiffness, preload, load, damping, r20, kelvin);
    }

    /** Return spring: force {@code preload + stiffness·x} toward open. */
    public Plunger withSpring(Quantity stiffness, Quantity preload) {
        double k = Require.nonNegative("spring stiffness", stiffness, Dimension.STIFFNESS);
        double f0 = Require.nonNegative("spring preload", preload, Dimension.FORCE);
        return copy(residual, parasitic, parasiticArea, ironLength, iron, mass, k, f0, load, damping, r20, kelvin);
    }

    /** Constant load force against closing (a valve's pressure force, a latch). */
    public Plunger withLoad(Quantity force) {
        double f = Require.nonNegative("load force", force, Dimension.FORCE);
        return copy(residual, parasitic, parasiticArea, ironLength, iron, mass, stiffness, preload, f, damping, r20, kelvin);
    }

    /** Viscous damping coefficient in N·s/m (air or oil in the plunger tube). */
    public Plunger withDamping(double newtonSecondsPerMetre) {
        double c = Require.nonNegative("damping (N·s/m)", newtonSecondsPerMetre);
        return copy(residual, parasitic, parasiticArea, ironLength, iron, mass, stiffness, preload, load, c, r20, kelvin);
    }

    /** Coil resistance at 20 °C. */
    public Plunger withResistance(Quantity r) {
        double v = Require.positive("coil resistance", r, Dimension.RESISTANCE);
        return copy(residual, parasitic, parasiticArea, ironLength, iron, mass, stiffness, preload, load, damping, v, kelvin);
    }

    @Override
    public Plunger atTemperature(Quantity temperature) {
        double k = org.ampturn.material.Conductor.kelvin("temperature", temperature);
        return copy(residual, parasitic, parasiticArea, ironLength, iron, mass, stiffness, preload, load, damping, r20, k);
    }

    // ---------------------------------------------------------------- kernels

    private double gapReluctance(double x) {
        double g = Math.max(stroke + residual - x, 0);
        return g / (MU0 * area) + parasitic / (MU0 * parasiticArea);
    }

    private double ironField(double b) {
        return iron == null ? 0 : iron.fieldAt(b);
    }

    @Override
    public double currentAt(double weberTurns, double metres) {
        Require.finite("flux linkage (Wb)", weberTurns);
        Require.finite("position (m)", metres);
        double phi = weberTurns / turns;
        return Require.result("current", (phi * gapReluctance(metres) + ironLength * ironField(phi / area)) / turns);
    }

    private static final double[] GX = {0, -0.5384693101056831, 0.5384693101056831, -0.9061798459386640, 0.9061798459386640};
    private static final double[] GW = {0.5688888888888889, 0.4786286704993665, 0.4786286704993665, 0.2369268850561891, 0.2369268850561891};

    @Override
    public double fieldEnergyAt(double weberTurns, double metres) {
        Require.finite("flux linkage (Wb)", weberTurns);
        Require.finite("position (m)", metres);
        double phi = weberTurns / turns;
        double w = 0.5 * phi * phi * gapReluctance(metres);
        if (iron != null) {
            double b = phi / area;
            double ironEnergyDensity;
            if (iron.isLinear()) {
                ironEnergyDensity = b * b / (2 * MU0 * iron.relativePermeability());
            } else {
                int panels = 8;
                double h = b / panels, sum = 0;
                for (int p = 0; p < panels; p++) {
                    double mid = (p + 0.5) * h;
                    for (int k = 0; k < 5; k++) sum += GW[k] * iron.fieldAt(mid + 0.5 * h * GX[k]);
                }
                ironEnergyDensity = sum * 0.5 * h;
            }
            w += area * ironLength * ironEnergyDensity;
        }
        return Require.result("field energy", w);
    }

    @Override
    public double forceAt(double weberTurns, double metres) {
        Require.finite("flux linkage (Wb)", weberTurns);
        Require.finite("position (m)", metres);
        if (stroke + residual - metres <= 0) return Require.result("force", 0);
        double b = weberTurns / turns / area;
        return Require.result("force", b * b * area / (2 * MU0));
    }

    @Override
    public double restoringForceAt(double metres, double metresPerSecond) {
        Require.finite("position (m)", metres);
        Require.finite("speed (m/s)", metresPerSecond);
        return Require.result("restoring force", preload + stiffness * metres + load + damping * metresPerSecond);
    }

    @Override public double massKg() { return mass; }
    @Override public double strokeMetres() { return stroke; }

    @Override
    public double resistanceOhms() {
        return r20 * org.ampturn.material.Conductor.COPPER.resistanceRatioAt(kelvin);
    }

    @Override
    public double inductanceAt(double metres) {
        Require.finite("position (m)", metres);
        double rel = gapReluctance(metres);
        if (iron != null) rel += ironLength / (MU0 * iron.relativePermeability() * area);
        return Require.result("inductance", (double) turns * turns / rel);
    }

    /** Small-signal inductance open (x = 0). */
    public Quantity inductanceOpen() { return Quantity.of(inductanceAt(0), Dimension.INDUCTANCE); }

    /** Small-signal inductance closed (x = stroke). */
    public Quantity inductanceClosed() { return Quantity.of(inductanceAt(stroke), Dimension.INDUCTANCE); }

    /** Magnetic force at a current and position (N): solves the magnetic circuit for λ. */
    public Quantity force(Quantity current, Quantity position) {
        double i = Require.si("current", current, Dimension.CURRENT);
        double x = Require.between("position (m)", Require.distance("position", position), 0, stroke);
        return Quantity.of(forceAt(fluxLinkageAt(i, x), x), Dimension.FORCE);
    }

    /** λ at current i and position x: inverse of {@link #currentAt} by bisection (the current rises with λ). */
    double fluxLinkageAt(double amps, double x) {
        double lo = 0, hi = Math.max(inductanceAt(x) * Math.abs(amps), 1e-12);
        for (int k = 0; currentAt(hi, x) < Math.abs(amps); k++) {
            if (k > 2000 || !Double.isFinite(hi)) {
                throw Require.fail("no flux linkage gives a current of " + Quantity.of(amps, Dimension.CURRENT) + " at position "
                        + Quantity.of(x, Dimension.LENGTH) + ": the current is outside the model's range");
            }
            hi *= 2;
        }
        for (int k = 0; k < 200 && hi - lo > 1e-15 * hi; k++) {
            double mid = 0.5 * (lo + hi);
            if (currentAt(mid, x) < Math.abs(amps)) lo = mid;
            else hi = mid;
        }
        return Math.copySign(0.5 * (lo + hi), amps);
    }

    @Override
    public Quantity temperature() { return Quantity.temperatureKelvin(kelvin); }

    @Override
    public String describe() {
        return "plunger " + turns + " turns, pole " + Quantity.of(area, Dimension.AREA) + ", stroke " + Quantity.of(stroke, Dimension.LENGTH)
                + ", L " + inductanceOpen() + " open to " + inductanceClosed() + " closed, " + Quantity.of(resistanceOhms(), Dimension.RESISTANCE)
                + ", mass " + Quantity.of(mass, Dimension.MASS) + ", spring " + Quantity.of(preload, Dimension.FORCE) + " + "
                + Quantity.of(stiffness, Dimension.STIFFNESS) + (load > 0 ? ", load " + Quantity.of(load, Dimension.FORCE) : "");
    }

    @Override
    public String toString() { return describe(); }
}
