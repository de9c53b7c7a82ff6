package org.ampturn.drive;

import org.ampturn.coil.Coil;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;

/**
 * A drive connected to a coil (or a moving-armature actuator), with the clamp that takes the
 * current when the switch opens, ready to {@link #simulate(Quantity)}. Immutable.
 */
public final class Circuit {
    final Drive drive;
    final Coil coil;            // exactly one of coil, armature
    final Armature armature;
    final Clamp clamp;          // may be null until the switch has to open
    final double offAt;         // NaN: the drive runs to the end
    final int samples;
    final double relTol;
    final boolean numeric;
    final boolean coreLoss;     // draw the core's loss through a core-loss branch when the coil has loss data
    final Secondary secondary;  // a coupled second winding, or null

    /** Output samples unless {@link #samples(int)} says otherwise. */
    public static final int DEFAULT_SAMPLES = 2001;
    /** Relative tolerance of the adaptive integrator unless {@link #tolerance(double)} says otherwise. */
    public static final double DEFAULT_TOLERANCE = 1e-9;

    private Circuit(Drive drive, Coil coil, Armature armature, Clamp clamp, double offAt, int samples, double relTol, boolean numeric) {
        this(drive, coil, armature, clamp, offAt, samples, relTol, numeric, true, null);
    }

    private Circuit(Drive drive, Coil coil, Armature armature, Clamp clamp, double offAt, int samples, double relTol, boolean numeric,
                    boolean coreLoss, Secondary secondary) {
        this.coreLoss = coreLoss;
        this.secondary = secondary;
        this.drive = drive;
        this.coil = coil;
        this.armature = armature;
        this.clamp = clamp;
        this.offAt = offAt;
        this.samples = samples;
        this.relTol = relTol;
        this.numeric = numeric;
    }

    static Circuit of(Drive d, Coil c) {
        return new Circuit(d, c, null, null, Double.NaN, DEFAULT_SAMPLES, DEFAULT_TOLERANCE, false);
    }

    static Circuit of(Drive d, Armature a) {
        return new Circuit(d, null, a, null, Double.NaN, DEFAULT_SAMPLES, DEFAULT_TOLERANCE, false);
    }

    /** The switch opens for good at {@code time}; {@code clamp} carries the current from then on (and in PWM off-times). */
    public Circuit offAt(Quantity time, Clamp clamp) {
        return offAt(time).clamp(clamp);
    }

    /** The switch opens for good at {@code time}, into the clamp given by {@link #clamp(Clamp)}. */
    public Circuit offAt(Quantity time) {
        double t = Require.inRange("off time", time, Dimension.TIME, 0, MAX_DURATION);
        return new Circuit(drive, coil, armature, clamp, t, samples, relTol, numeric, coreLoss, secondary);
    }

    /** The clamp that carries the current whenever the switch is open. */
    public Circuit clamp(Clamp c) {
        if (c == null) throw Require.fail("clamp is missing (null); use Clamp.none(V(..)) for none");
        return new Circuit(drive, coil, armature, c, offAt, samples, relTol, numeric, coreLoss, secondary);
    }

    /** The same circuit with the coil at a temperature (its resistance changes). */
    public Circuit at(Quantity temperature) {
        Require.absoluteTemperature("coil temperature", temperature);
        if (!temperature.isAbsoluteTemperature()) {
            throw Require.fail("coil temperature must be an absolute temperature such as degC(80), got " + temperature);
        }
        return coil != null
                ? new Circuit(drive, coil.atTemperature(temperature), null, clamp, offAt, samples, relTol, numeric, coreLoss, secondary)
                : new Circuit(drive, null, armature.atTemperature(temperature), clamp, offAt, samples, relTol, numeric, coreLoss, secondary);
    }

    /** Longest run solved (s): a day. */
    public static final double MAX_DURATION = 86_400;

    /** Number of evenly spaced output samples, from t = 0 to the end (at least 2). */
    public Circuit samples(int n) {
        Require.between("samples", n, 2, 20_000_000);
        return new Circuit(drive, coil, armature, clamp, offAt, n, relTol, numeric, coreLoss, secondary);
    }

    /** Relative tolerance of the adaptive integrator (1e-12 to 1e-3). */
    public Circuit tolerance(double rtol) {
        Require.between("tolerance", rtol, 1e-12, 1e-3);
        return new Circuit(drive, coil, armature, clamp, offAt, samples, rtol, numeric, coreLoss, secondary);
    }

    /** Integrate numerically even where closed forms apply (for cross-checks). */
    public Circuit numeric() {
        return new Circuit(drive, coil, armature, clamp, offAt, samples, relTol, true, coreLoss, secondary);
    }

    /**
     * The same circuit with the coil's core loss left out of the circuit: no core-loss branch, the
     * ledger without core loss (as for a coil without loss data). {@code Transient.coreLossEnergy()}
     * still gives the iGSE of the run's flux beside the ledger.
     */
    public Circuit withoutCoreLoss() {
        return new Circuit(drive, coil, armature, clamp, offAt, samples, relTol, numeric, false, secondary);
    }

    /**
     * The same circuit with a second winding coupled to the coil ({@link Secondary}): a shorted turn,
     * a winding into a resistor, or a clamp winding through a diode. The coil must be linear and fixed;
     * its core loss is then left out.
     */
    public Circuit withSecondary(Secondary s) {
        if (s == null) throw Require.fail("secondary winding is missing (null)");
        if (armature != null) throw Require.fail("a coupled secondary winding works with a fixed coil, not with a moving armature (use its eddy ladder)");
        return new Circuit(drive, coil, armature, clamp, offAt, samples, relTol, numeric, coreLoss, s);
    }

    public Drive drive() { return drive; }
    public Clamp clampUsed() { return clamp; }

    /** Solves the transient from t = 0 (switch closes, coil at rest) to {@code duration}. */
    public Transient simulate(Quantity duration) {
        double end = Require.inRange("duration", duration, Dimension.TIME, 0, MAX_DURATION);
        if (!(end > 0)) throw Require.fail("duration must be greater than zero, got " + duration);
        return new Solver(this, end).run();
    }

    /**
     * The time (s) at which the current first rises through {@code amps} in a run of {@code duration}
     * seconds, located by the solver's event search (NaN when not reached).
     */
    double timeToCurrent(double amps, double duration) {
        Solver s = new Solver(new Circuit(drive, coil, armature, clamp, offAt, 2, relTol, numeric, coreLoss, secondary), duration, amps);
        s.run();
        return s.probeTime;
    }

    /** One line: drive, load, clamp, off time. */
    @Override
    public String toString() {
        String s = drive + " into " + (coil != null ? coil.describe() : armature.describe());
        if (!Double.isNaN(offAt)) s += ", off at " + Quantity.of(offAt, Dimension.TIME);
        if (clamp != null) s += ", " + clamp;
        if (!coreLoss) s += ", core loss left out";
        if (secondary != null) s += ", " + secondary;
        return s;
    }
}
