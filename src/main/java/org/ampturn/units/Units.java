package org.ampturn.units;

import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The table of unit symbols and of how each dimension is displayed.
 *
 * <p>Factors to SI are exact definitions from NIST SP 811 (2008), Appendix B, and the SI Brochure
 * (BIPM, 9th edition, 2019): inch = 0.0254 m, mil = 0.001 inch, gauss = 1e-4 T,
 * oersted = 1000/(4π) A/m, °C = K − 273.15.
 */
public final class Units {
    private Units() {}

    /** Kelvin at 0 °C (SI Brochure, 9th ed., 2.3.1). */
    public static final double ZERO_CELSIUS = 273.15;

    private record Sym(double factor, Dimension dim, boolean prefixable) {}

    private static final Map<String, Sym> SYMBOLS = new HashMap<>();
    private static final Map<String, Double> PREFIXES = new LinkedHashMap<>();
    private static final Map<Dimension, String> NAMES = new HashMap<>();
    private static final Map<Dimension, List<Unit>> DISPLAY = new HashMap<>();

    private static void sym(String s, double f, Dimension d, boolean prefixable) {
        SYMBOLS.put(s, new Sym(f, d, prefixable));
    }

    static {
        PREFIXES.put("f", 1e-15);
        PREFIXES.put("p", 1e-12);
        PREFIXES.put("n", 1e-9);
        PREFIXES.put("u", 1e-6);
        PREFIXES.put("µ", 1e-6); // U+00B5 micro sign
        PREFIXES.put("μ", 1e-6); // U+03BC Greek mu
        PREFIXES.put("m", 1e-3);
        PREFIXES.put("c", 1e-2);
        PREFIXES.put("k", 1e3);
        PREFIXES.put("M", 1e6);
        PREFIXES.put("G", 1e9);
        PREFIXES.put("T", 1e12);

        sym("m", 1, Dimension.LENGTH, true);
        sym("g", 1e-3, Dimension.MASS, true);
        sym("s", 1, Dimension.TIME, true);
        sym("A", 1, Dimension.CURRENT, true);
        sym("K", 1, Dimension.TEMPERATURE, true);
        sym("Hz", 1, Dimension.FREQUENCY, true);
        sym("N", 1, Dimension.FORCE, true);
        sym("Pa", 1, Dimension.PRESSURE, true);
        sym("J", 1, Dimension.ENERGY, true);
        sym("W", 1, Dimension.POWER, true);
        sym("C", 1, Dimension.CHARGE, true);
        sym("V", 1, Dimension.VOLTAGE, true);
        sym("Ω", 1, Dimension.RESISTANCE, true);
        sym("ohm", 1, Dimension.RESISTANCE, true);
        sym("Ohm", 1, Dimension.RESISTANCE, true);
        sym("S", 1, Dimension.CONDUCTANCE, true);
        sym("F", 1, Dimension.CAPACITANCE, true);
        sym("H", 1, Dimension.INDUCTANCE, true);
        sym("Wb", 1, Dimension.FLUX, true);
        sym("T", 1, Dimension.FLUX_DENSITY, true);
        sym("G", 1e-4, Dimension.FLUX_DENSITY, true);          // gauss, NIST SP 811 B.8
        sym("gauss", 1e-4, Dimension.FLUX_DENSITY, false);
        sym("Oe", 1000 / (4 * Math.PI), Dimension.FIELD_STRENGTH, true); // oersted, NIST SP 811 B.8
        sym("in", 0.0254, Dimension.LENGTH, false);            // inch, NIST SP 811 B.8 (exact)
        sym("inch", 0.0254, Dimension.LENGTH, false);
        sym("mil", 2.54e-5, Dimension.LENGTH, false);          // 0.001 inch, NIST SP 811 B.8 (exact)
        sym("min", 60, Dimension.TIME, false);
        sym("h", 3600, Dimension.TIME, false);
        sym("%", 0.01, Dimension.NONE, false);
        sym("ppm", 1e-6, Dimension.NONE, false);
        sym("turns", 1, Dimension.NONE, false);

        name(Dimension.NONE, "pure number");
        name(Dimension.LENGTH, "length");
        name(Dimension.MASS, "mass");
        name(Dimension.TIME, "time");
        name(Dimension.CURRENT, "current");
        name(Dimension.TEMPERATURE, "temperature");
        name(Dimension.AREA, "area");
        name(Dimension.VOLUME, "volume");
        name(Dimension.FREQUENCY, "frequency");
        name(Dimension.VELOCITY, "speed");
        name(Dimension.ACCELERATION, "acceleration");
        name(Dimension.FORCE, "force");
        name(Dimension.PRESSURE, "pressure");
        name(Dimension.ENERGY, "energy");
        name(Dimension.POWER, "power");
        name(Dimension.CHARGE, "charge");
        name(Dimension.VOLTAGE, "voltage");
        name(Dimension.RESISTANCE, "resistance");
        name(Dimension.CONDUCTANCE, "conductance");
        name(Dimension.CAPACITANCE, "capacitance");
        name(Dimension.INDUCTANCE, "inductance");
        name(Dimension.FLUX, "magnetic flux");
        name(Dimension.FLUX_DENSITY, "flux density");
        name(Dimension.FIELD_STRENGTH, "field strength");
        name(Dimension.CURRENT_DENSITY, "current density");
        name(Dimension.RESISTIVITY, "resistivity");
        name(Dimension.RESISTANCE_PER_LENGTH, "resistance per length");
        name(Dimension.PERMEABILITY, "permeability");
        name(Dimension.RELUCTANCE, "reluctance");
        name(Dimension.DENSITY, "density");
        name(Dimension.MASS_PER_LENGTH, "mass per length");
        name(Dimension.STIFFNESS, "stiffness");
        name(Dimension.POWER_DENSITY, "power density");
        name(Dimension.THERMAL_RESISTANCE, "thermal resistance");
        name(Dimension.HEAT_TRANSFER_COEFFICIENT, "heat transfer coefficient");
        name(Dimension.PER_KELVIN, "temperature coefficient");
        name(Dimension.SPECIFIC_HEAT, "specific heat");
        name(Dimension.HEAT_CAPACITY, "heat capacity");

        display(Dimension.LENGTH, "km", "m", "mm", "µm", "nm");
        display(Dimension.MASS, "kg", "g", "mg", "µg");
        display(Dimension.TIME, "s", "ms", "µs", "ns", "ps");
        display(Dimension.CURRENT, "kA", "A", "mA", "µA", "nA", "pA");
        display(Dimension.TEMPERATURE, "K"); // a temperature difference reads in K (0.66 K, not 657.1 mK); absolute ones print in °C
        display(Dimension.AREA, "m²", "cm²", "mm²", "µm²");
        display(Dimension.VOLUME, "m³", "cm³", "mm³");
        display(Dimension.FREQUENCY, "GHz", "MHz", "kHz", "Hz", "mHz");
        display(Dimension.VELOCITY, "m/s", "mm/s");
        display(Dimension.ACCELERATION, "m/s²");
        display(Dimension.FORCE, "kN", "N", "mN", "µN");
        display(Dimension.PRESSURE, "GPa", "MPa", "kPa", "Pa");
        display(Dimension.ENERGY, "MJ", "kJ", "J", "mJ", "µJ", "nJ", "pJ");
        display(Dimension.POWER, "MW", "kW", "W", "mW", "µW", "nW");
        display(Dimension.CHARGE, "C", "mC", "µC", "nC", "pC");
        display(Dimension.VOLTAGE, "MV", "kV", "V", "mV", "µV", "nV");
        display(Dimension.RESISTANCE, "GΩ", "MΩ", "kΩ", "Ω", "mΩ", "µΩ");
        display(Dimension.CONDUCTANCE, "kS", "S", "mS", "µS", "nS");
        display(Dimension.CAPACITANCE, "F", "mF", "µF", "nF", "pF", "fF");
        display(Dimension.INDUCTANCE, "H", "mH", "µH", "nH", "pH");
        display(Dimension.FLUX, "Wb", "mWb", "µWb", "nWb");
        display(Dimension.FLUX_DENSITY, "T", "mT", "µT", "nT");
        display(Dimension.FIELD_STRENGTH, "MA/m", "kA/m", "A/m");
        display(Dimension.CURRENT_DENSITY, "A/mm²");
        display(Dimension.RESISTIVITY, "Ω·m", "mΩ·m", "µΩ·m", "nΩ·m", "pΩ·m");
        display(Dimension.RESISTANCE_PER_LENGTH, "kΩ/m", "Ω/m", "mΩ/m", "µΩ/m");
        display(Dimension.PERMEABILITY, "H/m", "mH/m", "µH/m", "nH/m");
        display(Dimension.RELUCTANCE, "GA/Wb", "MA/Wb", "kA/Wb", "A/Wb");
        display(Dimension.DENSITY, "kg/m³");
        display(Dimension.MASS_PER_LENGTH, "kg/m", "g/m");
        display(Dimension.STIFFNESS, "kN/m", "N/m");
        display(Dimension.POWER_DENSITY, "MW/m³", "kW/m³", "W/m³");
        display(Dimension.THERMAL_RESISTANCE, "K/W");
        display(Dimension.HEAT_TRANSFER_COEFFICIENT, "W/(m²·K)");
        display(Dimension.PER_KELVIN, "1/K");
        display(Dimension.SPECIFIC_HEAT, "J/(kg·K)");
        display(Dimension.HEAT_CAPACITY, "kJ/K", "J/K");
    }

    private static void name(Dimension d, String n) {
        NAMES.put(d, n);
    }

    private static void display(Dimension d, String... units) {
        Unit[] list = new Unit[units.length];
        for (int i = 0; i < units.length; i++) {
            Unit u = new UnitParser(units[i]).parse();
            if (!u.dimension().equals(d)) throw new AssertionError(units[i] + " is not " + d.baseSymbols());
            list[i] = u;
        }
        DISPLAY.put(d, List.of(list));
    }

    static String dimensionName(Dimension d) {
        return NAMES.get(d);
    }

    /** The units a dimension is shown in, largest first; empty when it has none of its own. */
    public static List<Unit> displayUnits(Dimension d) {
        return DISPLAY.getOrDefault(d, List.of());
    }

    /**
     * The display unit for values of dimension {@code d} up to {@code maxAbs} (SI): the largest unit
     * in which {@code maxAbs} is at least about 1 (0.9995, so a value that rounds to 1 reads 1.000 A
     * rather than 1000 mA), else the smallest; the SI unit itself for zero, NaN or infinity. Null when
     * the dimension has no display units of its own. A column of a table and a chart axis use it.
     */
    public static Unit unitFor(Dimension d, double maxAbs) {
        List<Unit> units = displayUnits(d);
        if (units.isEmpty()) return null;
        if (!(maxAbs > 0) || !Double.isFinite(maxAbs)) {
            for (Unit u : units) if (u.factor() == 1) return u;
            return units.get(units.size() - 1);
        }
        for (Unit u : units) if (maxAbs / u.factor() >= 0.9995) return u;
        return units.get(units.size() - 1);
    }

    /** A symbol with an optional SI prefix, or null. An exact symbol wins over prefix + symbol. */
    static Unit simple(String s) {
        Sym exact = SYMBOLS.get(s);
        if (exact != null) return new Unit(s, exact.factor, 0, exact.dim);
        for (Map.Entry<String, Double> p : PREFIXES.entrySet()) {
            String pre = p.getKey();
            if (s.length() > pre.length() && s.startsWith(pre)) {
                Sym base = SYMBOLS.get(s.substring(pre.length()));
                if (base != null && base.prefixable) {
                    return new Unit(s, p.getValue() * base.factor, 0, base.dim);
                }
            }
        }
        return null;
    }

    /** The degree Celsius, the one unit with an offset; it stands alone in a unit expression. */
    static Unit offsetUnit(String s) {
        switch (s) {
            case "degC": case "°C": case "℃": case "celsius":
                return new Unit("°C", 1, ZERO_CELSIUS, Dimension.TEMPERATURE);
            default:
                return null;
        }
    }

    static String superscript(int n) {
        String digits = Integer.toString(n);
        StringBuilder sb = new StringBuilder();
        for (char c : digits.toCharArray()) {
            if (c == '-') sb.append('⁻');
            else sb.append("⁰¹²³⁴⁵⁶⁷⁸⁹".charAt(c - '0'));
        }
        return sb.toString();
    }

    static int superscriptDigit(char c) {
        return "⁰¹²³⁴⁵⁶⁷⁸⁹".indexOf(c);
    }
}
