package org.ampturn.coil;

import org.ampturn.units.Dimension;
import org.ampturn.wire.Winding;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;

/**
 * A coil made of a winding and a magnetic circuit, everything a designer asks of it in one place:
 * inductance (small-signal, and at a current for a B-H core), resistance cold and hot, time
 * constant, ampere-turns, flux density, stored energy, copper loss and the saturation check.
 *
 * <p>Magnetics: λ(i) = N·Φ(N·i) through the {@link MagneticCircuit} (Hopkinson's law, nonlinear when
 * a material is). Stored energy W = ∫i dλ = λ·i − ∫λ di (co-energy form; ½·L·i² when linear).
 * Resistance: from a {@link Winding} its own R(T) = ρ(T)·ℓ/A (the conductor's IEC 60028 values for
 * copper); given directly, copper R(T) = R20·(1 + α20·(T − 20 °C)) with α20 = 0.00393 /K (IEC
 * 60028:1925, annealed copper); valid from about −50 to 200 °C for magnet wire.
 * Copper loss P = i²·R(T).
 */
public final class WoundCoil implements Coil {
    private final int turns;
    private final double r20;
    private final Winding winding; // null when turns and resistance were given directly
    private final MagneticCircuit circuit;
    private final double kelvin;

    private WoundCoil(int turns, double r20, Winding winding, MagneticCircuit circuit, double kelvin) {
        this.turns = turns;
        this.r20 = r20;
        this.winding = winding;
        this.circuit = circuit;
        this.kelvin = kelvin;
    }

    /**
     * A {@link Winding} (wire, turns, bobbin) on {@code circuit}: the turns link the whole circuit,
     * and the resistance at a temperature is the winding's own (its conductor's resistivity, IEC 60028
     * for copper).
     */
    public static WoundCoil of(Winding winding, MagneticCircuit circuit) {
        if (winding == null) throw Require.fail("winding is missing (null)");
        if (circuit == null) throw Require.fail("magnetic circuit is missing (null)");
        return new WoundCoil(winding.turns(), winding.resistanceAt(org.ampturn.material.Conductor.T20), winding, circuit, org.ampturn.material.Conductor.T20);
    }

    /** The winding, when the coil was made from one. */
    public java.util.Optional<Winding> winding() {
        return java.util.Optional.ofNullable(winding);
    }

    /** {@code turns} turns of copper of {@code resistance20} (at 20 °C) on {@code circuit}. */
    public static WoundCoil of(int turns, Quantity resistance20, MagneticCircuit circuit) {
        Require.turns("turns", turns);
        double r = Require.positive("resistance at 20 °C", resistance20, Dimension.RESISTANCE);
        if (circuit == null) throw Require.fail("magnetic circuit is missing (null)");
        return new WoundCoil(turns, r, null, circuit, org.ampturn.material.Conductor.T20);
    }

    public int turns() { return turns; }
    public MagneticCircuit circuit() { return circuit; }

    @Override public Quantity inductance() { return Quantity.of(turns * (double) turns / circuit.reluctanceSI(), Dimension.INDUCTANCE); }

    /** Secant inductance λ(i)/i at {@code current}; the small-signal value at zero. */
    public Quantity inductance(Quantity current) {
        double i = Require.si("current", current, Dimension.CURRENT);
        if (i == 0 || isLinear()) return inductance();
        return Quantity.of(fluxLinkageAt(i) / i, Dimension.INDUCTANCE);
    }

    /** Incremental inductance dλ/di at {@code current}. */
    public Quantity incrementalInductance(Quantity current) {
        return Quantity.of(incrementalInductanceAt(Require.si("current", current, Dimension.CURRENT)), Dimension.INDUCTANCE);
    }

    @Override public Quantity resistance() { return Quantity.of(resistanceAt(kelvin), Dimension.RESISTANCE); }

    /** Resistance at a temperature (hot resistance). */
    public Quantity resistance(Quantity temperature) {
        return Quantity.of(resistanceAt(kelvin(temperature)), Dimension.RESISTANCE);
    }

    /** Resistance at 20 °C (cold). */
    public Quantity coldResistance() { return Quantity.of(r20, Dimension.RESISTANCE); }

    @Override public Quantity temperature() { return Quantity.temperatureKelvin(kelvin); }

    /** L/R at the coil's temperature (small-signal L). */
    public Quantity timeConstant() {
        double r = resistanceAt(kelvin);
        if (!(r > 0)) throw new IllegalStateException("the time constant L/R is infinite: the coil has no resistance");
        return Quantity.of(Require.result("time constant L/R", inductance().si() / r), Dimension.TIME);
    }

    /** N·i. */
    public Quantity ampereTurns(Quantity current) {
        return Quantity.of(turns * Require.si("current", current, Dimension.CURRENT), Dimension.CURRENT);
    }

    /** Highest flux density in a core piece at {@code current}. */
    public Quantity fluxDensity(Quantity current) {
        return circuit.peakFluxDensity(turns, current);
    }

    /** Flux density in every part at {@code current}. */
    public FluxReport fluxDensities(Quantity current) {
        return circuit.fluxDensities(turns, current);
    }

    /** Magnetic energy stored at {@code current}, W = ∫i dλ. */
    public Quantity storedEnergy(Quantity current) {
        return Quantity.of(storedEnergyAt(Require.si("current", current, Dimension.CURRENT)), Dimension.ENERGY);
    }

    /**
     * The DC current at which the incremental inductance dλ/di has fallen to {@code fraction} of its
     * small-signal value: the current a choke may carry before its ripple inductance has rolled off
     * that far (with DC bias in the core material, saturation, or both). Found by bracketing and
     * Brent's method (Commons Math) to 10⁻⁹ relative.
     *
     * @param fraction of the small-signal inductance, between 0.01 and 0.99 (0.8 for "80 % of L")
     */
    public Quantity currentAtInductanceFraction(double fraction) {
        Require.between("inductance fraction", fraction, 0.01, 0.99);
        if (isLinear()) throw Require.fail("the core of " + circuit.name() + " is linear: its inductance does not fall with current");
        double l0 = incrementalInductanceAt(0);
        double target = fraction * l0;
        // the current that drives 1 mT through the effective area, then doubling until L has fallen
        double lo = 0;
        double hi = 1e-3 * circuit.effectiveArea().si() * circuit.reluctanceSI() / turns;
        int doublings = 0;
        while (incrementalInductanceAt(hi) > target) {
            lo = hi;
            hi *= 2;
            Require.notInterrupted("the roll-off current search");
            if (++doublings > 200) throw Require.fail("the inductance of " + describe() + " does not fall to " + fraction + " of " + inductance() + " at any current");
        }
        var brent = new org.apache.commons.math3.analysis.solvers.BrentSolver(1e-9, 1e-12 * hi);
        double i = brent.solve(10_000, x -> incrementalInductanceAt(x) - target, lo, hi);
        return Quantity.of(Require.result("roll-off current", i), Dimension.CURRENT);
    }

    /** Copper loss i²R at the coil's temperature. */
    public Quantity copperLoss(Quantity current) {
        double i = Require.si("current", current, Dimension.CURRENT);
        return Quantity.of(Require.result("copper loss I²R", i * i * resistanceAt(kelvin)), Dimension.POWER);
    }

    /** The saturation check of the core for this coil's turns. */
    public Saturation saturation() {
        return circuit.saturation(turns);
    }

    /** The same coil with another number of turns (same resistance: give it anew with {@link #of}). */
    public WoundCoil withTurns(int n, Quantity resistance20) {
        return of(n, resistance20, circuit);
    }

    // ---- Coil kernels -------------------------------------------------------------------------

    @Override
    public double fluxLinkageAt(double amps) {
        Require.finite("current (A)", amps);
        return Require.result("flux linkage", turns * circuit.fluxAt(turns * amps));
    }

    @Override
    public double currentAt(double weberTurns) {
        Require.finite("flux linkage (Wb)", weberTurns);
        return Require.result("current", circuit.mmfAt(weberTurns / turns) / turns);
    }

    @Override
    public double incrementalInductanceAt(double amps) {
        Require.finite("current (A)", amps);
        if (isLinear()) return Require.result("incremental inductance", turns * (double) turns / circuit.reluctanceSI());
        // step: relative to the current, floored at the current that drives 0.1 T through the effective area
        double floor = 0.1 * circuit.effectiveArea().si() * circuit.reluctanceSI() / turns;
        double h = 1e-5 * Math.max(Math.abs(amps), floor);
        return Require.result("incremental inductance", (fluxLinkageAt(amps + h) - fluxLinkageAt(amps - h)) / (2 * h));
    }

    @Override
    public double resistanceAt(double k) {
        Require.finite("temperature (K)", k);
        if (winding != null) return Require.result("resistance", winding.resistanceAt(k));
        return Require.result("resistance", r20 * org.ampturn.material.Conductor.COPPER.resistanceRatioAt(k));
    }

    /** Stored energy (J) at current i (A): λi − ∫0^i λ di', the integral by Commons Math's iterative Gauss-Legendre quadrature (relative accuracy 1e-11). */
    public double storedEnergyAt(double amps) {
        Require.finite("current (A)", amps);
        if (isLinear()) return Require.result("stored energy", 0.5 * inductance().si() * amps * amps);
        if (amps == 0) return Require.result("stored energy", 0);
        var quad = new org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator(16, 1e-11, 1e-300);
        double coenergy;
        try {
            coenergy = quad.integrate(1_000_000, this::fluxLinkageAt, 0, amps);
        } catch (org.apache.commons.math3.exception.MathIllegalStateException e) {
            throw Require.fail("the stored energy at " + Quantity.of(amps, Dimension.CURRENT)
                    + " did not converge in 1000000 evaluations: " + e.getMessage(), e);
        }
        return Require.result("stored energy", fluxLinkageAt(amps) * amps - coenergy);
    }

    @Override
    public boolean isLinear() {
        return circuit.isLinear();
    }

    @Override
    public Coil atTemperature(Quantity temperature) {
        return new WoundCoil(turns, r20, winding, circuit, kelvin(temperature));
    }

    private static double kelvin(Quantity t) {
        return org.ampturn.material.Conductor.kelvin("temperature", t);
    }

    @Override
    public String describe() {
        String s = "wound coil, " + turns + " turns on " + circuit.name() + ": " + inductance() + (isLinear() ? "" : " (small-signal)") + ", "
                + resistance();
        if (kelvin != org.ampturn.material.Conductor.T20) s += " at " + temperature();
        return s;
    }

    @Override
    public String toString() {
        return describe();
    }
}
