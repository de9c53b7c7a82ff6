package org.ampturn.drive;

import org.ampturn.coil.Coil;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;

/**
 * A supply and a low-side switch that drive a coil: a DC step, PWM at a frequency and duty, or
 * peak-and-hold (full voltage until the current reaches a pull-in level, then a regulated hold
 * current). The supply is an ideal voltage source behind a source resistance; the switch is a
 * resistance when closed and an open circuit when open (its capacitance is left out). Immutable;
 * {@code with…} methods return copies. See lib-docs/drives.md.
 *
 * <pre>{@code
 * var run = Drive.dc(V(12)).into(coil).offAt(ms(20), Clamp.diode()).simulate(ms(40));
 * }</pre>
 */
public final class Drive {
    /** How the switch is operated. */
    public enum Scheme { DC, PWM, PEAK_AND_HOLD, SINE, FULL_WAVE, HALF_WAVE }

    /** How peak-and-hold regulates the hold current. */
    public enum Regulation { HYSTERETIC, PWM }

    /** Highest supply voltage accepted (V). */
    public static final double MAX_VOLTS = 1e6;
    /** Highest current level accepted (A). */
    public static final double MAX_AMPS = 1e6;
    /** Highest switching frequency accepted (Hz). */
    public static final double MAX_HZ = 1e9;
    /** Highest source or switch resistance accepted (Ω). */
    public static final double MAX_OHMS = 1e9;
    /** Narrowest hysteresis band, as a fraction of the hold current. */
    public static final double MIN_BAND = 1e-4;

    private static Quantity positive(Quantity supply) {
        Require.positive("supply voltage", supply, Dimension.VOLTAGE);
        return supply;
    }

    final Scheme scheme;
    final double volts;
    final double sourceOhms;
    final double switchOhms;
    final double frequency;   // PWM frequency, or hold PWM frequency
    final double duty;
    final double peakAmps;
    final double holdAmps;
    final double band;        // hysteresis band, peak to peak
    final Regulation regulation;
    final double peakSeconds; // shortest peak phase; NaN: the hold begins when the current reaches peakAmps
    final double phaseDegrees; // sine supply: phase of the voltage at switch-on, v(0) = √2·V·sin(phase)

    private Drive(Scheme scheme, double volts, double sourceOhms, double switchOhms, double frequency, double duty,
                  double peakAmps, double holdAmps, double band, Regulation regulation, double peakSeconds, double phaseDegrees) {
        this.scheme = scheme;
        this.volts = volts;
        this.sourceOhms = sourceOhms;
        this.switchOhms = switchOhms;
        this.frequency = frequency;
        this.duty = duty;
        this.peakAmps = peakAmps;
        this.holdAmps = holdAmps;
        this.band = band;
        this.regulation = regulation;
        this.peakSeconds = peakSeconds;
        this.phaseDegrees = phaseDegrees;
    }

    /** A DC supply switched on at t = 0. */
    public static Drive dc(Quantity supply) {
        double v = Require.inRange("supply voltage", positive(supply), Dimension.VOLTAGE, 1e-6, MAX_VOLTS);
        return new Drive(Scheme.DC, v, 0, 0, 0, 1, 0, 0, 0, Regulation.HYSTERETIC, Double.NaN, 0);
    }

    /** PWM: the switch is on for {@code duty / frequency} at the start of every period, from t = 0. */
    public static Drive pwm(Quantity supply, Quantity frequency, double duty) {
        double v = Require.inRange("supply voltage", positive(supply), Dimension.VOLTAGE, 1e-6, MAX_VOLTS);
        double f = Require.inRange("PWM frequency", frequency, Dimension.FREQUENCY, 1e-3, MAX_HZ);
        Require.between("PWM duty", duty, 1e-4, 1);
        return new Drive(Scheme.PWM, v, 0, 0, f, duty, 0, 0, 0, Regulation.HYSTERETIC, Double.NaN, 0);
    }

    /**
     * Peak-and-hold: full supply until the current reaches {@code pullIn}, then the hold current,
     * regulated by a hysteretic comparator with a band of 20 % of the hold current (peak to peak)
     * unless {@link #withHysteresis} or {@link #withHoldPwm} says otherwise.
     */
    public static Drive peakAndHold(Quantity supply, Quantity pullIn, Quantity hold) {
        double v = Require.inRange("supply voltage", positive(supply), Dimension.VOLTAGE, 1e-6, MAX_VOLTS);
        double ip = Require.inRange("pull-in current", pullIn, Dimension.CURRENT, 1e-9, MAX_AMPS);
        double ih = Require.inRange("hold current", hold, Dimension.CURRENT, 1e-9, MAX_AMPS);
        if (!(ih < ip)) throw Require.fail("hold current (" + hold + ") must be below the pull-in current (" + pullIn + ")");
        return new Drive(Scheme.PEAK_AND_HOLD, v, 0, 0, 0, 1, ip, ih, 0.2 * ih, Regulation.HYSTERETIC, Double.NaN, 0);
    }

    /** Highest mains-type frequency accepted for a sine supply (Hz). */
    public static final double MAX_SINE_HZ = 1e6;

    /** RMS voltage above which a sine supply's results carry a mains caution (common practice, from memory: the usual low-voltage limit). */
    public static final double MAINS_CAUTION_RMS = 50;

    /**
     * A sine supply {@code v(t) = √2·V·sin(2π·f·t + φ)} switched on at t = 0 at a zero crossing
     * (φ = 0°, the worst DC offset for a mostly inductive coil) unless {@link #withSwitchOnPhase}
     * says otherwise. The switch stays closed; the run shows the transient to the periodic steady
     * state and reports the RMS and peak current of its last cycle.
     */
    public static Drive sine(Quantity rmsVoltage, Quantity frequency) {
        return ac(Scheme.SINE, rmsVoltage, frequency);
    }

    private static Drive ac(Scheme scheme, Quantity rmsVoltage, Quantity frequency) {
        double v = Require.inRange("RMS supply voltage", positive(rmsVoltage), Dimension.VOLTAGE, 1e-6, MAX_VOLTS);
        double f = Require.inRange("supply frequency", frequency, Dimension.FREQUENCY, 1e-3, MAX_SINE_HZ);
        return new Drive(scheme, v, 0, 0, f, 1, 0, 0, 0, Regulation.HYSTERETIC, Double.NaN, 0);
    }

    /**
     * A full-wave rectified sine: a bridge of ideal diodes between a sine supply of RMS voltage V and
     * the coil, which sees {@code v(t) = √2·V·|sin(2π·f·t + φ)|} (the current never reverses). The
     * diodes' drops and the supply's own impedance are left out; add them as a source resistance.
     */
    public static Drive rectifiedSine(Quantity rmsVoltage, Quantity frequency) {
        return ac(Scheme.FULL_WAVE, rmsVoltage, frequency);
    }

    /**
     * A half-wave rectified sine: one ideal diode in series with the coil conducts while
     * {@code √2·V·sin(2π·f·t + φ)} is positive; in the negative half cycles the coil's current goes
     * on through its freewheel path, the clamp across the coil ({@code .clamp(Clamp.diode())}), which
     * is required. The series diode is taken to commutate at the supply's zero crossings.
     */
    public static Drive halfWaveSine(Quantity rmsVoltage, Quantity frequency) {
        return ac(Scheme.HALF_WAVE, rmsVoltage, frequency);
    }

    /** True for a sine supply, rectified or not. */
    boolean isAc() {
        return scheme == Scheme.SINE || scheme == Scheme.FULL_WAVE || scheme == Scheme.HALF_WAVE;
    }

    /** A sine supply switched on at the given phase of its voltage, in degrees: 0 a rising zero crossing, 90 the positive peak. */
    public Drive withSwitchOnPhase(double degrees) {
        if (!isAc()) {
            throw new IllegalStateException("withSwitchOnPhase applies to a sine or rectified-sine drive only; this is a "
                    + (scheme == Scheme.PEAK_AND_HOLD ? "peak-and-hold" : scheme.name()) + " drive");
        }
        if (!(degrees >= 0 && degrees < 360)) {
            throw Require.fail("switch-on phase must be from 0° up to (not including) 360°, got " + degrees + "°");
        }
        return new Drive(scheme, volts, sourceOhms, switchOhms, frequency, duty, peakAmps, holdAmps, band, regulation, peakSeconds, degrees);
    }

    /** The switch-on phase of a sine supply (degrees). */
    public double switchOnPhase() { return phaseDegrees; }

    /** Supply voltage at time t (s): constant for DC schemes, the sine for a sine supply. */
    double voltsAt(double t) {
        if (!isAc()) return volts;
        double v = Math.sqrt(2) * volts * Math.sin(2 * Math.PI * frequency * t + Math.toRadians(phaseDegrees));
        return scheme == Scheme.FULL_WAVE ? Math.abs(v) : v;
    }

    /** Half-wave supply: the supply's phase at time t, in whole half cycles from its first rising zero crossing (even: conducting). */
    long halfCycleAt(double t) {
        return (long) Math.floor(2 * (frequency * t + phaseDegrees / 360) + 1e-9);
    }

    /** The same drive with a source (supply and wiring) resistance. */
    public Drive withSourceResistance(Quantity r) {
        double rs = Require.inRange("source resistance", r, Dimension.RESISTANCE, 0, MAX_OHMS);
        return new Drive(scheme, volts, rs, switchOhms, frequency, duty, peakAmps, holdAmps, band, regulation, peakSeconds, phaseDegrees);
    }

    /** The same drive with a switch of the given on-resistance. */
    public Drive withSwitchResistance(Quantity r) {
        double ron = Require.inRange("switch on-resistance", r, Dimension.RESISTANCE, 0, MAX_OHMS);
        return new Drive(scheme, volts, sourceOhms, ron, frequency, duty, peakAmps, holdAmps, band, regulation, peakSeconds, phaseDegrees);
    }

    /** Peak-and-hold with hysteretic hold regulation: on below hold − band/2, off above hold + band/2. */
    public Drive withHysteresis(Quantity band) {
        requireScheme(Scheme.PEAK_AND_HOLD, "withHysteresis");
        double b = Require.positive("hysteresis band", band, Dimension.CURRENT);
        if (!(b >= MIN_BAND * holdAmps)) {
            throw Require.fail("hysteresis band (" + band + ") must be at least " + Quantity.of(MIN_BAND * holdAmps, Dimension.CURRENT)
                    + " (1/10000 of the hold current): narrower, the switching would never end");
        }
        if (!(b < 2 * holdAmps)) {
            throw Require.fail("hysteresis band (" + band + ") must be below twice the hold current ("
                    + Quantity.of(2 * holdAmps, Dimension.CURRENT) + ")");
        }
        return new Drive(scheme, volts, sourceOhms, switchOhms, frequency, duty, peakAmps, holdAmps, b, Regulation.HYSTERETIC, peakSeconds, phaseDegrees);
    }

    /**
     * Peak-and-hold with fixed-frequency hold regulation (peak current mode): the switch closes at the
     * start of each period and opens when the current reaches the hold level.
     */
    public Drive withHoldPwm(Quantity frequency) {
        requireScheme(Scheme.PEAK_AND_HOLD, "withHoldPwm");
        double f = Require.inRange("hold PWM frequency", frequency, Dimension.FREQUENCY, 1e-3, MAX_HZ);
        return new Drive(scheme, volts, sourceOhms, switchOhms, f, duty, peakAmps, holdAmps, band, Regulation.PWM, peakSeconds, phaseDegrees);
    }

    /**
     * Peak-and-hold with a peak time, as drivers for valves and injectors have: the supply stays on
     * for {@code peakTime} from t = 0 with the current limited to the pull-in level, then the hold
     * begins, whether or not the current got there. The limit works like the hold's regulation:
     * hysteretic (off at the pull-in current, on again one band below it) or, with
     * {@link #withHoldPwm}, on at each period start below the pull-in current and off at it.
     * Without a peak time the hold begins the moment the current reaches the pull-in level.
     */
    public Drive withPeakTime(Quantity peakTime) {
        requireScheme(Scheme.PEAK_AND_HOLD, "withPeakTime");
        double tp = Require.inRange("peak time", peakTime, Dimension.TIME, 1e-12, Circuit.MAX_DURATION);
        return new Drive(scheme, volts, sourceOhms, switchOhms, frequency, duty, peakAmps, holdAmps, band, regulation, tp, phaseDegrees);
    }

    private void requireScheme(Scheme s, String what) {
        if (scheme != s) throw new IllegalStateException(what + " applies to a peak-and-hold drive, not to a " + this);
    }

    public Scheme scheme() { return scheme; }
    public Quantity supply() { return Quantity.of(volts, Dimension.VOLTAGE); }
    public Quantity sourceResistance() { return Quantity.of(sourceOhms, Dimension.RESISTANCE); }
    public Quantity switchResistance() { return Quantity.of(switchOhms, Dimension.RESISTANCE); }

    /** This drive connected to a coil; the switch closes at t = 0. */
    public Circuit into(Coil coil) {
        if (coil == null) throw Require.fail("coil is missing (null)");
        return Circuit.of(this, coil);
    }

    /** This drive connected to a moving-armature actuator; the switch closes at t = 0. */
    public Circuit into(Armature actuator) {
        if (actuator == null) throw Require.fail("actuator is missing (null)");
        return Circuit.of(this, actuator);
    }

    private static String a(double x) { return Quantity.of(x, Dimension.CURRENT).toString(); }

    /** One line: scheme, supply and settings. */
    @Override
    public String toString() {
        String s;
        switch (scheme) {
            case DC: s = "DC drive " + supply(); break;
            case SINE: case FULL_WAVE: case HALF_WAVE:
                s = (scheme == Scheme.SINE ? "sine drive " : scheme == Scheme.FULL_WAVE ? "full-wave rectified sine drive " : "half-wave rectified sine drive ")
                        + supply() + " RMS, " + Quantity.of(frequency, Dimension.FREQUENCY)
                        + String.format(java.util.Locale.ROOT, ", switched on at %.4g°", phaseDegrees); break;
            case PWM: s = "PWM drive " + supply() + ", " + Quantity.of(frequency, Dimension.FREQUENCY)
                    + String.format(java.util.Locale.ROOT, ", duty %.3g", duty); break;
            default:
                s = "peak-and-hold drive " + supply() + ", pull-in " + a(peakAmps) + ", hold " + a(holdAmps)
                        + (regulation == Regulation.PWM ? " by PWM at " + Quantity.of(frequency, Dimension.FREQUENCY)
                        : " ± " + a(band / 2) + " hysteretic")
                        + (Double.isNaN(peakSeconds) ? "" : ", peak time " + Quantity.of(peakSeconds, Dimension.TIME));
        }
        if (sourceOhms > 0) s += ", source " + sourceResistance();
        if (switchOhms > 0) s += ", switch " + switchResistance();
        return s;
    }
}
