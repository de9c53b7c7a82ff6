package org.ampturn.units;

import java.util.Arrays;

/**
 * The physical dimension of a quantity: integer exponents of the SI base units metre, kilogram,
 * second, ampere and kelvin. Immutable; equal dimensions are {@code equals}.
 */
public final class Dimension {
    private static final String[] BASE = {"m", "kg", "s", "A", "K"};

    /** Largest exponent of a base unit a dimension may have (either sign); no quantity of the trade comes near it. */
    public static final int MAX_EXPONENT = 24;

    private final int[] exp;

    private Dimension(int... exp) {
        for (int e : exp) {
            if (e > MAX_EXPONENT || e < -MAX_EXPONENT) {
                throw Require.fail("a unit exponent of " + e + " is out of range: each base unit's exponent must be from "
                        + -MAX_EXPONENT + " to " + MAX_EXPONENT);
            }
        }
        this.exp = exp;
    }

    /** A dimension from exponents of m, kg, s, A, K. */
    public static Dimension of(int m, int kg, int s, int a, int k) {
        return new Dimension(m, kg, s, a, k);
    }

    public static final Dimension NONE = of(0, 0, 0, 0, 0);
    public static final Dimension LENGTH = of(1, 0, 0, 0, 0);
    public static final Dimension MASS = of(0, 1, 0, 0, 0);
    public static final Dimension TIME = of(0, 0, 1, 0, 0);
    public static final Dimension CURRENT = of(0, 0, 0, 1, 0);
    public static final Dimension TEMPERATURE = of(0, 0, 0, 0, 1);
    public static final Dimension AREA = of(2, 0, 0, 0, 0);
    public static final Dimension VOLUME = of(3, 0, 0, 0, 0);
    public static final Dimension FREQUENCY = of(0, 0, -1, 0, 0);
    public static final Dimension VELOCITY = of(1, 0, -1, 0, 0);
    public static final Dimension ACCELERATION = of(1, 0, -2, 0, 0);
    public static final Dimension FORCE = of(1, 1, -2, 0, 0);
    public static final Dimension PRESSURE = of(-1, 1, -2, 0, 0);
    public static final Dimension ENERGY = of(2, 1, -2, 0, 0);
    public static final Dimension POWER = of(2, 1, -3, 0, 0);
    public static final Dimension CHARGE = of(0, 0, 1, 1, 0);
    public static final Dimension VOLTAGE = of(2, 1, -3, -1, 0);
    public static final Dimension RESISTANCE = of(2, 1, -3, -2, 0);
    public static final Dimension CONDUCTANCE = of(-2, -1, 3, 2, 0);
    public static final Dimension CAPACITANCE = of(-2, -1, 4, 2, 0);
    public static final Dimension INDUCTANCE = of(2, 1, -2, -2, 0);
    public static final Dimension FLUX = of(2, 1, -2, -1, 0);
    public static final Dimension FLUX_DENSITY = of(0, 1, -2, -1, 0);
    public static final Dimension FIELD_STRENGTH = of(-1, 0, 0, 1, 0);
    public static final Dimension CURRENT_DENSITY = of(-2, 0, 0, 1, 0);
    public static final Dimension RESISTIVITY = of(3, 1, -3, -2, 0);
    public static final Dimension RESISTANCE_PER_LENGTH = of(1, 1, -3, -2, 0);
    public static final Dimension PERMEABILITY = of(1, 1, -2, -2, 0);
    public static final Dimension RELUCTANCE = of(-2, -1, 2, 2, 0);
    public static final Dimension DENSITY = of(-3, 1, 0, 0, 0);
    public static final Dimension MASS_PER_LENGTH = of(-1, 1, 0, 0, 0);
    public static final Dimension STIFFNESS = of(0, 1, -2, 0, 0);
    public static final Dimension POWER_DENSITY = of(-1, 1, -3, 0, 0);
    public static final Dimension ENERGY_DENSITY = PRESSURE;
    public static final Dimension THERMAL_RESISTANCE = of(-2, -1, 3, 0, 1);
    public static final Dimension HEAT_TRANSFER_COEFFICIENT = of(0, 1, -3, 0, -1);
    public static final Dimension PER_KELVIN = of(0, 0, 0, 0, -1);
    public static final Dimension SPECIFIC_HEAT = of(2, 0, -2, 0, -1);
    public static final Dimension HEAT_CAPACITY = of(2, 1, -2, 0, -1);

    public int exponent(int baseIndex) {
        Require.between("base unit index (0 m, 1 kg, 2 s, 3 A, 4 K)", baseIndex, 0, 4);
        return exp[baseIndex];
    }

    public boolean isNone() {
        return equals(NONE);
    }

    public Dimension times(Dimension o) {
        Require.present("dimension", o);
        int[] r = new int[5];
        for (int i = 0; i < 5; i++) r[i] = exp[i] + o.exp[i];
        return new Dimension(r);
    }

    public Dimension div(Dimension o) {
        Require.present("dimension", o);
        int[] r = new int[5];
        for (int i = 0; i < 5; i++) r[i] = exp[i] - o.exp[i];
        return new Dimension(r);
    }

    public Dimension pow(int n) {
        int[] r = new int[5];
        for (int i = 0; i < 5; i++) {
            long e = (long) exp[i] * n;
            if (Math.abs(e) > MAX_EXPONENT) {
                throw Require.fail("cannot raise " + baseSymbols() + " to the power " + n + ": exponents must stay within ±"
                        + MAX_EXPONENT);
            }
            r[i] = (int) e;
        }
        return new Dimension(r);
    }

    /** The n-th root; fails when an exponent is not divisible by n. */
    public Dimension root(int n) {
        int[] r = new int[5];
        if (n < 1) throw Require.fail("cannot take root " + n + " of " + baseSymbols() + ": the root must be 1 or more");
        for (int i = 0; i < 5; i++) {
            if (exp[i] % n != 0) {
                throw Require.fail("cannot take root " + n + " of " + baseSymbols()
                        + ": the exponents are not divisible by " + n);
            }
            r[i] = exp[i] / n;
        }
        return new Dimension(r);
    }

    /** A word for the dimension where the trade has one ("length", "inductance"), else the base units. */
    public String name() {
        String n = Units.dimensionName(this);
        return n != null ? n : baseSymbols();
    }

    /** The dimension in SI base units, e.g. {@code kg·m²/(s³·A²)}; "1" for a pure number. */
    public String baseSymbols() {
        StringBuilder num = new StringBuilder();
        StringBuilder den = new StringBuilder();
        int nDen = 0;
        int[] order = {1, 0, 2, 3, 4};
        for (int i : order) {
            int e = exp[i];
            if (e == 0) continue;
            StringBuilder sb = e > 0 ? num : den;
            if (e < 0) nDen++;
            if (sb.length() > 0) sb.append('·');
            sb.append(BASE[i]);
            int a = Math.abs(e);
            if (a != 1) sb.append(Units.superscript(a));
        }
        if (num.length() == 0 && den.length() == 0) return "1";
        String n = num.length() == 0 ? "1" : num.toString();
        if (den.length() == 0) return n;
        return n + "/" + (nDen > 1 ? "(" + den + ")" : den.toString());
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Dimension && Arrays.equals(exp, ((Dimension) o).exp);
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(exp);
    }

    @Override
    public String toString() {
        return name();
    }
}
