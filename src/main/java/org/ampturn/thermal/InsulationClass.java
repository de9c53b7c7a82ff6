package org.ampturn.thermal;

import org.ampturn.units.Require;
import org.ampturn.units.Quantity;

/**
 * Thermal classes of electrical insulation systems, IEC 60085:2007 (Table 1): the class number is
 * the highest temperature in °C the insulation is rated for in continuous use, the letter is the
 * former designation. Values as listed in IEC 60085 (checked against the widely reproduced table,
 * from memory).
 */
public enum InsulationClass {
    Y(90, "Y"),
    A(105, "A"),
    E(120, "E"),
    B(130, "B"),
    F(155, "F"),
    H(180, "H"),
    N(200, "N"),
    R(220, "R"),
    CLASS_250(250, "");

    private final int celsius;
    private final String letter;

    InsulationClass(int celsius, String letter) {
        this.celsius = celsius;
        this.letter = letter;
    }

    /** The class by its temperature: 90, 105, 120, 130, 155, 180, 200, 220 or 250. */
    public static InsulationClass of(int celsius) {
        for (InsulationClass c : values()) if (c.celsius == celsius) return c;
        throw Require.fail("thermal class " + celsius + " is not one of IEC 60085's: 90, 105, 120, 130, 155, 180, 200, 220, 250");
    }

    /** The class by its letter (Y, A, E, B, F, H, N, R) or its number as text ("155"). */
    public static InsulationClass of(String name) {
        if (name == null) throw Require.fail("thermal class is missing (null); write a letter such as \"F\" or a number such as \"155\"");
        String s = name.strip().toUpperCase(java.util.Locale.ROOT);
        for (InsulationClass c : values()) if (!c.letter.isEmpty() && c.letter.equals(s)) return c;
        try {
            return of(Integer.parseInt(s));
        } catch (NumberFormatException e) {
            throw Require.fail("cannot read \"" + name + "\" as a thermal class; write Y, A, E, B, F, H, N, R or 90 … 250");
        }
    }

    /** Rated temperature in °C. */
    public int celsius() { return celsius; }

    /** Rated temperature. */
    public Quantity limit() { return Quantity.celsius(celsius); }

    /** The letter, or "" for class 250. */
    public String letter() { return letter; }

    /** e.g. "class 155 (F)". */
    @Override
    public String toString() {
        return "class " + celsius + (letter.isEmpty() ? "" : " (" + letter + ")");
    }
}
