package org.ampturn.drive;

import java.util.Locale;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;

/**
 * A second winding magnetically coupled to the driven coil, with its load: shorted, a resistor, or
 * a diode into a voltage (a bifilar or transformer-coupled clamp winding that returns the coil's
 * energy to the supply, or a diode into a zener). Immutable; {@code with…} methods return copies.
 *
 * <p>Two coupled linear inductors (Hayt, Kemmerly and Durbin, Engineering Circuit Analysis, 8th ed.,
 * ch. 13): λ1 = L1·i1 + M·i2, λ2 = M·i1 + L2·i2, M = k·√(L1·L2), 0 ≤ k ≤ 1, both currents into the
 * dotted ends. The secondary loop: dλ2/dt = −(R2 + R_load)·i2 − V_load, with V_load = 0 for a shorted
 * or resistor load and Vd + Vf while a diode load conducts. The diode conducts a current i2 ≥ 0 into
 * the dotted end: it starts when the open secondary's voltage (M/L1)·dλ1/dt falls below −(Vd + Vf),
 * as it does when the primary's current is cut (the flyback polarity of a clamp winding), and stops
 * when i2 falls to zero. The secondary's losses (R2 + R_load)·i2² + (Vd + Vf)·i2 enter the energy
 * ledger as {@code secondary} (with a diode into the supply, the energy returned to it). The primary
 * coil must be linear (its small-signal inductance is L1).
 */
public final class Secondary {
    /** What closes the secondary winding. */
    public enum Kind { SHORTED, RESISTOR, DIODE }

    private final Kind kind;
    private final double l2, r2, coupling, mutual; // coupling NaN when given by the mutual inductance, and vice versa
    private final double rLoad, vd, vf;

    private Secondary(Kind kind, double l2, double r2, double coupling, double mutual, double rLoad, double vd, double vf) {
        this.kind = kind;
        this.l2 = l2;
        this.r2 = r2;
        this.coupling = coupling;
        this.mutual = mutual;
        this.rLoad = rLoad;
        this.vd = vd;
        this.vf = vf;
    }

    /**
     * A shorted secondary winding of self-inductance {@code inductance} and resistance
     * {@code resistance}, coupled to the coil with coefficient k (0 to 1).
     */
    public static Secondary of(Quantity inductance, Quantity resistance, double coupling) {
        double l = Require.inRange("secondary inductance", inductance, Dimension.INDUCTANCE, 1e-15, 1e6);
        double r = Require.inRange("secondary resistance", resistance, Dimension.RESISTANCE, 0, Drive.MAX_OHMS);
        if (!(coupling >= 0 && coupling <= 1)) {
            throw Require.fail("coupling coefficient k (" + coupling + ") must be from 0 to 1: |M| cannot exceed √(L1·L2)");
        }
        return new Secondary(Kind.SHORTED, l, r, coupling, Double.NaN, 0, 0, 0);
    }

    /** A shorted secondary given by the mutual inductance M to the coil (e.g. from {@code Loops.mutualInductance}); k = M/√(L1·L2) must come out at most 1. */
    public static Secondary ofMutual(Quantity inductance, Quantity resistance, Quantity mutualInductance) {
        double l = Require.inRange("secondary inductance", inductance, Dimension.INDUCTANCE, 1e-15, 1e6);
        double r = Require.inRange("secondary resistance", resistance, Dimension.RESISTANCE, 0, Drive.MAX_OHMS);
        double m = Require.inRange("mutual inductance", mutualInductance, Dimension.INDUCTANCE, 0, 1e6);
        return new Secondary(Kind.SHORTED, l, r, Double.NaN, m, 0, 0, 0);
    }

    /** The secondary closed on a resistor. */
    public Secondary withResistor(Quantity load) {
        double rl = Require.inRange("secondary load resistance", load, Dimension.RESISTANCE, 0, Drive.MAX_OHMS);
        return new Secondary(Kind.RESISTOR, l2, r2, coupling, mutual, rl, 0, 0);
    }

    /** The secondary closed through a diode (0.7 V drop) into a voltage, e.g. the supply for a bifilar clamp winding. */
    public Secondary withDiodeInto(Quantity voltage) {
        return withDiodeInto(voltage, Quantity.of(Clamp.DEFAULT_DROP, Dimension.VOLTAGE));
    }

    /** The secondary closed through a diode of the given forward drop into a voltage. */
    public Secondary withDiodeInto(Quantity voltage, Quantity forwardDrop) {
        double v = Require.inRange("voltage the secondary's diode feeds", voltage, Dimension.VOLTAGE, 0, Drive.MAX_VOLTS);
        double f = Require.nonNegative("diode forward drop", forwardDrop, Dimension.VOLTAGE, Drive.MAX_VOLTS);
        return new Secondary(Kind.DIODE, l2, r2, coupling, mutual, 0, v, f);
    }

    /** The secondary shorted (its own resistance only). */
    public Secondary shorted() {
        return new Secondary(Kind.SHORTED, l2, r2, coupling, mutual, 0, 0, 0);
    }

    public Kind kind() { return kind; }
    public Quantity inductance() { return Quantity.of(l2, Dimension.INDUCTANCE); }
    public Quantity resistance() { return Quantity.of(r2, Dimension.RESISTANCE); }

    double l2() { return l2; }
    /** Winding plus load resistance (Ω). */
    double loopOhms() { return r2 + rLoad; }
    /** Voltage of a conducting diode load, Vd + Vf (V); 0 for other loads. */
    double diodeVolts() { return vd + vf; }

    /** M (H) against a primary of inductance l1 (H); fails when k would leave [0, 1]. */
    double mutualWith(double l1) {
        if (Double.isNaN(mutual)) return coupling * Math.sqrt(l1 * l2);
        double k = mutual / Math.sqrt(l1 * l2);
        if (!(k <= 1)) {
            throw Require.fail(String.format(Locale.ROOT, "coupling coefficient k = M/√(L1·L2) = %.4g must be from 0 to 1: M = %s against L1 = %s and L2 = %s",
                    k, Quantity.of(mutual, Dimension.INDUCTANCE), Quantity.of(l1, Dimension.INDUCTANCE), inductance()));
        }
        return mutual;
    }

    /** One line: the winding, its coupling and its load. */
    @Override
    public String toString() {
        String s = "secondary " + inductance() + ", " + resistance()
                + (Double.isNaN(mutual) ? String.format(Locale.ROOT, ", k = %.4g", coupling) : ", M = " + Quantity.of(mutual, Dimension.INDUCTANCE));
        switch (kind) {
            case RESISTOR: return s + ", into " + Quantity.of(rLoad, Dimension.RESISTANCE);
            case DIODE: return s + ", diode (" + Quantity.of(vf, Dimension.VOLTAGE) + ") into " + Quantity.of(vd, Dimension.VOLTAGE);
            default: return s + ", shorted";
        }
    }
}
