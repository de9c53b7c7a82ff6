package org.ampturn.drive;

import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;

/**
 * What carries the coil current when the switch opens. Each clamp is modelled by a constant voltage
 * plus a series resistance while it conducts ({@code v = V0 + R·i}, {@code i > 0}), or by a linear
 * RC branch (the snubber). Where it sits decides what the switch sees:
 *
 * <ul>
 * <li>across the coil (freewheel): {@link #diode()}, {@link #zener(Quantity)}, {@link #resistor(Quantity)};
 * and, for a coil on a sine supply, {@link #bidirectional(Quantity)};
 *     the coil sees {@code −(V0 + R·i)}, the switch {@code Vs + V0 + R·i};
 * <li>across the switch: {@link #tvs(Quantity)} and {@link #none(Quantity)} (the switch itself avalanches);
 *     the switch sees {@code V0 + R·i} and the supply keeps feeding the coil during the decay;
 * <li>{@link #snubber(Quantity, Quantity)}: a resistor and capacitor in series across the switch.
 * </ul>
 *
 * <p>Diodes are ideal apart from their constant forward drop: no reverse recovery, no junction
 * capacitance, no forward-recovery overshoot. The default drop of 0.7 V is a typical silicon value
 * (common practice, from memory). See lib-docs/clamps.md.
 */
public final class Clamp {
    /** Where a clamp sits. */
    public enum Placement { ACROSS_COIL, ACROSS_SWITCH, SNUBBER }

    /** The kind of clamp. */
    public enum Kind { NONE, DIODE, ZENER, RESISTOR, TVS, SNUBBER, BIDIRECTIONAL }

    /** Typical silicon diode forward drop (common practice, from memory). */
    static final double DEFAULT_DROP = 0.7;

    private final Kind kind;
    private final double v0;
    private final double r;
    private final double c;
    private final double diodeDrop;

    private Clamp(Kind kind, double v0, double r, double c, double diodeDrop) {
        this.kind = kind;
        this.v0 = v0;
        this.r = r;
        this.c = c;
        this.diodeDrop = diodeDrop;
    }

    /** No clamp: the switch avalanches at its rated breakdown voltage and absorbs the coil's energy. */
    public static Clamp none(Quantity avalancheVoltage) {
        double v = Require.positive("switch avalanche voltage", avalancheVoltage, Dimension.VOLTAGE, Drive.MAX_VOLTS);
        return new Clamp(Kind.NONE, v, 0, 0, 0);
    }

    /** A freewheel diode across the coil with a 0.7 V forward drop. */
    public static Clamp diode() {
        return new Clamp(Kind.DIODE, DEFAULT_DROP, 0, 0, DEFAULT_DROP);
    }

    /** A freewheel diode across the coil with the given forward drop (0 V for an ideal diode). */
    public static Clamp diode(Quantity forwardDrop) {
        double vf = Require.nonNegative("diode forward drop", forwardDrop, Dimension.VOLTAGE, Drive.MAX_VOLTS);
        return new Clamp(Kind.DIODE, vf, 0, 0, vf);
    }

    /** A diode in series with a zener across the coil: the coil sees −(Vz + 0.7 V). */
    public static Clamp zener(Quantity zenerVoltage) {
        return zener(zenerVoltage, Quantity.of(DEFAULT_DROP, Dimension.VOLTAGE));
    }

    /** A diode in series with a zener across the coil: the coil sees −(Vz + Vf). */
    public static Clamp zener(Quantity zenerVoltage, Quantity forwardDrop) {
        double vz = Require.positive("zener voltage", zenerVoltage, Dimension.VOLTAGE, Drive.MAX_VOLTS);
        double vf = Require.nonNegative("diode forward drop", forwardDrop, Dimension.VOLTAGE, Drive.MAX_VOLTS);
        return new Clamp(Kind.ZENER, vz + vf, 0, 0, vf);
    }

    /** A resistor with a blocking diode (0.7 V) across the coil: the coil sees −(0.7 V + R·i). */
    public static Clamp resistor(Quantity resistance) {
        return resistor(resistance, Quantity.of(DEFAULT_DROP, Dimension.VOLTAGE));
    }

    /** A resistor with a blocking diode of the given drop across the coil. */
    public static Clamp resistor(Quantity resistance, Quantity forwardDrop) {
        double rr = Require.positive("clamp resistance", resistance, Dimension.RESISTANCE, Drive.MAX_OHMS);
        double vf = Require.nonNegative("diode forward drop", forwardDrop, Dimension.VOLTAGE, Drive.MAX_VOLTS);
        return new Clamp(Kind.RESISTOR, vf, rr, 0, vf);
    }

    /**
     * A clamp across the coil that conducts both ways at ±Vc (back-to-back zeners, a bidirectional
     * TVS or a varistor, with zero dynamic resistance): the clamp of a coil on a sine supply, which
     * may be switched off at a negative current. A one-way clamp there would conduct in every
     * negative half cycle and short the supply (common practice).
     */
    public static Clamp bidirectional(Quantity clampVoltage) {
        return bidirectional(clampVoltage, Quantity.of(0, Dimension.RESISTANCE));
    }

    /** A bidirectional clamp across the coil: the coil sees ∓(Vc + Rd·|i|) while it conducts. */
    public static Clamp bidirectional(Quantity clampVoltage, Quantity dynamicResistance) {
        double v = Require.positive("bidirectional clamp voltage", clampVoltage, Dimension.VOLTAGE, Drive.MAX_VOLTS);
        double rd = Require.nonNegative("bidirectional clamp dynamic resistance", dynamicResistance, Dimension.RESISTANCE, Drive.MAX_OHMS);
        return new Clamp(Kind.BIDIRECTIONAL, v, rd, 0, 0);
    }

    /** A unidirectional TVS diode across the switch, with zero dynamic resistance. */
    public static Clamp tvs(Quantity clampVoltage) {
        return tvs(clampVoltage, Quantity.of(0, Dimension.RESISTANCE));
    }

    /** A TVS diode across the switch: it holds the switch at {@code Vc + Rd·i} while it conducts. */
    public static Clamp tvs(Quantity clampVoltage, Quantity dynamicResistance) {
        double v = Require.positive("TVS clamp voltage", clampVoltage, Dimension.VOLTAGE, Drive.MAX_VOLTS);
        double rd = Require.nonNegative("TVS dynamic resistance", dynamicResistance, Dimension.RESISTANCE, Drive.MAX_OHMS);
        return new Clamp(Kind.TVS, v, rd, 0, 0);
    }

    /** A series resistor and capacitor across the switch. */
    public static Clamp snubber(Quantity resistance, Quantity capacitance) {
        double rr = Require.positive("snubber resistance", resistance, Dimension.RESISTANCE, Drive.MAX_OHMS);
        double cc = Require.positive("snubber capacitance", capacitance, Dimension.CAPACITANCE, 1e3);
        return new Clamp(Kind.SNUBBER, 0, rr, cc, 0);
    }

    public Kind kind() { return kind; }

    public Placement placement() {
        switch (kind) {
            case NONE: case TVS: return Placement.ACROSS_SWITCH;
            case SNUBBER: return Placement.SNUBBER;
            default: return Placement.ACROSS_COIL;
        }
    }

    /** Constant part of the conducting voltage V0 (V). */
    double offsetVolts() { return v0; }

    /** Series resistance R (Ω) of the conducting clamp or of the snubber. */
    double seriesOhms() { return r; }

    /** Snubber capacitance (F), 0 for other clamps. */
    double capacitanceFarads() { return c; }

    /** Voltage across the conducting clamp at current i (A). */
    double voltageAt(double amps) { return v0 + r * amps; }

    private static String v(double x) { return Quantity.of(x, Dimension.VOLTAGE).toString(); }
    private static String ohms(double x) { return Quantity.of(x, Dimension.RESISTANCE).toString(); }

    /** One line: kind and values. */
    @Override
    public String toString() {
        switch (kind) {
            case NONE: return "no clamp: switch avalanches at " + v(v0);
            case DIODE: return "freewheel diode, " + v(v0) + " drop";
            case ZENER: return "diode + zener across the coil, " + v(v0 - diodeDrop) + " + " + v(diodeDrop);
            case RESISTOR: return "resistor " + ohms(r) + " with blocking diode (" + v(diodeDrop) + ") across the coil";
            case TVS: return "TVS across the switch, " + v(v0) + (r > 0 ? " + " + ohms(r) + " dynamic" : "");
            case BIDIRECTIONAL: return "bidirectional clamp across the coil, ±" + v(v0) + (r > 0 ? " + " + ohms(r) + " dynamic" : "");
            default: return "RC snubber across the switch, " + ohms(r) + " + " + Quantity.of(c, Dimension.CAPACITANCE);
        }
    }
}
