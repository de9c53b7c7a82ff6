package org.ampturn.fuzz;

import java.util.Random;

/** Random text for the quantity parser: mostly near-valid quantities, with hostile numbers, units and nesting. */
final class ParserText {
    private ParserText() {}

    private static final String[] NUMBERS = {"4.7", "1", "0", "-3", "+2.5", ".5", "5.", "1e3", "1E-3", "1e999", "1e-400", "-1e-400",
        "1e308", "2e308", "1e-308", "4e-324", "1e-323", "NaN", "Infinity", "-inf", "∞", "0e-999", "00001", "1.2.3", "1e", "e5", "-",
        "123456789012345678901234567890", "0.000000000000000000000000001", "9".repeat(400), "1e+0309", "-0", "1_000"};
    private static final String[] UNITS = {"mH", "H", "uH", "µH", "nH", "m", "mm", "km", "kΩ", "ohm", "kohm", "A", "mA", "V", "kV", "s",
        "ms", "Hz", "kHz", "GHz", "T", "mT", "degC", "°C", "K", "W", "J", "N", "kg", "g", "F", "pF", "Wb", "A/m", "Oe", "G", "inch", "mil",
        "Pa", "%", "1", "m²", "m³", "s⁻¹", "Ω", "S", "C", "foo", "", "mmm", "Gm", "pm"};
    private static final String[] OPS = {"/", "*", "·", ".", " ", "⋅", "//", "**", "^", "^2", "^-1", "^999", "^99999", "^+3", "²", "⁻²", "⁹⁹⁹",
        "⁻", "(", ")", "-", "+"};

    static String random(Random r) {
        switch (r.nextInt(10)) {
            case 0: return noise(r);
            case 1: return NUMBERS[r.nextInt(NUMBERS.length)] + " " + nested(r);
            default: {
                String n = r.nextInt(4) == 0 ? NUMBERS[r.nextInt(NUMBERS.length)] : number(r);
                return n + (r.nextBoolean() ? " " : "") + unitText(r);
            }
        }
    }

    static String unitText(Random r) {
        if (r.nextInt(12) == 0) return nested(r);
        if (r.nextInt(15) == 0) return noise(r);
        StringBuilder sb = new StringBuilder(UNITS[r.nextInt(UNITS.length)]);
        int terms = r.nextInt(4);
        for (int i = 0; i < terms; i++) {
            sb.append(OPS[r.nextInt(OPS.length)]);
            if (r.nextInt(3) > 0) sb.append(UNITS[r.nextInt(UNITS.length)]);
        }
        return sb.toString();
    }

    private static String number(Random r) {
        double v = Math.exp((r.nextDouble() - 0.5) * 60) * (r.nextInt(5) == 0 ? -1 : 1);
        switch (r.nextInt(3)) {
            case 0: return Double.toString(v);
            case 1: return String.format(java.util.Locale.ROOT, "%.3g", v);
            default: return Integer.toString(r.nextInt(100_000));
        }
    }

    private static String nested(Random r) {
        int depth = r.nextInt(4) == 0 ? 500 + r.nextInt(3000) : r.nextInt(40);
        String u = UNITS[r.nextInt(UNITS.length)];
        String open = r.nextBoolean() ? "(" : "((";
        return open.repeat(depth) + u + (r.nextInt(4) == 0 ? "" : ")".repeat(depth * open.length()));
    }

    private static String noise(Random r) {
        int n = r.nextInt(r.nextInt(10) == 0 ? 5000 : 30);
        StringBuilder sb = new StringBuilder(n);
        String alphabet = "0123456789.eE+-*/^()· mkMGunpµμΩAVHsTCKW°%⁰¹²³⁴⁵⁶⁷⁸⁹⁻\t\n\u0000\uFFFD😀";
        for (int i = 0; i < n; i++) {
            if (r.nextInt(20) == 0) sb.append((char) r.nextInt(0x3000));
            else sb.append(alphabet.charAt(r.nextInt(alphabet.length())));
        }
        return sb.toString();
    }
}
