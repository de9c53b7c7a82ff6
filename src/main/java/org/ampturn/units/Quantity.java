package org.ampturn.units;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * A physical quantity: an SI {@code double} and a {@link Dimension}. Immutable.
 *
 * <p>Arithmetic checks dimensions at run time and fails with a message naming both sides.
 * {@link #toString()} shows engineering notation with SI prefixes and {@link #displayDigits()}
 * significant digits ({@code 4.700 mH}); {@link #parse(String)} reads that text back.
 *
 * <p>Temperatures: a quantity made from degrees Celsius is an <em>absolute</em> temperature (kelvin
 * inside) and prints in °C. Subtracting two temperatures gives a difference in kelvin; adding a
 * difference to a temperature gives a temperature.
 */
public final class Quantity implements Comparable<Quantity> {
    private static volatile int displayDigits = 4;

    private final double si;
    private final Dimension dimension;
    private final boolean absolute;

    private Quantity(double si, Dimension dimension, boolean absolute) {
        if (dimension == null) throw new IllegalArgumentException("a quantity needs a dimension");
        this.si = si;
        this.dimension = dimension;
        this.absolute = absolute && dimension.equals(Dimension.TEMPERATURE);
    }

    /** A quantity from its SI value. */
    public static Quantity of(double si, Dimension dimension) {
        return new Quantity(si, dimension, false);
    }

    /** A quantity from a value in a unit: {@code Quantity.of(4.7, "mH")}. */
    public static Quantity of(double value, String unit) {
        Unit u = Unit.parse(unit);
        return new Quantity(u.toSi(value), u.dimension(), u.isOffset());
    }

    /** A pure number. */
    public static Quantity number(double value) {
        return new Quantity(value, Dimension.NONE, false);
    }

    /** An absolute temperature from kelvin (prints in °C). */
    public static Quantity temperatureKelvin(double kelvin) {
        return new Quantity(kelvin, Dimension.TEMPERATURE, true);
    }

    /** An absolute temperature from degrees Celsius. */
    public static Quantity celsius(double degC) {
        return new Quantity(degC + Units.ZERO_CELSIUS, Dimension.TEMPERATURE, true);
    }

    private static final Pattern NUMBER = Pattern.compile(
            "^\\s*([+-]?(?:(?:\\d+\\.?\\d*|\\.\\d+)(?:[eE][+-]?\\d+)?|NaN|Infinity|inf|∞))");

    /**
     * Reads what engineers type: {@code 4.7 mH}, {@code 4.7mH}, {@code 1.2 kohm}, {@code 1.2 kΩ},
     * {@code 25 mm}, {@code 0.35 T}, {@code 40 degC}, {@code 100 kHz}, {@code 2.5 A/mm^2}.
     */
    public static Quantity parse(String text) {
        if (text == null) throw new IllegalArgumentException("cannot read a quantity from null");
        Matcher m = NUMBER.matcher(text);
        if (!m.find()) {
            int at = firstNonSpace(text);
            throw new IllegalArgumentException("cannot read \"" + text + "\" as a quantity: a number is expected at position "
                    + (at + 1) + "; write for example 4.7 mH, 25 mm, 1.2 kΩ, 40 degC");
        }
        String num = m.group(1);
        double v;
        String bare = num.replaceFirst("^[+-]", "");
        double sign = num.startsWith("-") ? -1 : 1;
        if (bare.equals("NaN")) v = Double.NaN;
        else if (bare.equals("Infinity") || bare.equals("inf") || bare.equals("∞")) v = sign * Double.POSITIVE_INFINITY;
        else v = Double.parseDouble(num);
        String rest = text.substring(m.end());
        Unit u;
        try {
            u = Unit.parse(rest.strip());
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException("cannot read \"" + text + "\" as a quantity: "
                    + e.getMessage().replaceFirst("^cannot read unit \"[^\"]*\": ", "in the unit \"" + rest.strip() + "\", "), e);
        }
        return new Quantity(u.toSi(v), u.dimension(), u.isOffset());
    }

    private static int firstNonSpace(String s) {
        int i = 0;
        while (i < s.length() && Character.isWhitespace(s.charAt(i))) i++;
        return i;
    }

    /** Significant digits used by {@link #toString()}; 4 unless changed. */
    public static int displayDigits() {
        return displayDigits;
    }

    /** Sets the significant digits used by {@link #toString()} (1 to 15). */
    public static void setDisplayDigits(int digits) {
        if (digits < 1 || digits > 15) {
            throw new IllegalArgumentException("digits must be between 1 and 15, got " + digits);
        }
        displayDigits = digits;
    }

    /** The SI value. */
    public double si() {
        return si;
    }

    public Dimension dimension() {
        return dimension;
    }

    /** True for an absolute temperature (made from °C), false for a temperature difference. */
    public boolean isAbsoluteTemperature() {
        return absolute;
    }

    /** The value in a unit: {@code q.in("uH")}. Fails when the unit's dimension differs. */
    public double in(String unit) {
        Unit u = Unit.parse(unit);
        if (!u.dimension().equals(dimension)) {
            throw new IllegalArgumentException("cannot express " + this + " (" + dimension.name() + ") in " + unit
                    + " (" + u.dimension().name() + ")");
        }
        return u.fromSi(si);
    }

    /** Fails unless this quantity has the given dimension; returns the SI value. */
    public double si(Dimension expected) {
        if (!dimension.equals(expected)) {
            throw new IllegalArgumentException("expected a " + expected.name() + ", got " + this + " (" + dimension.name() + ")");
        }
        return si;
    }

    public boolean is(Dimension d) {
        return dimension.equals(d);
    }

    public Quantity plus(Quantity o) {
        requireSame(o, "add", "to");
        if (absolute && o.absolute) {
            throw new IllegalArgumentException("cannot add two temperatures (" + this + " and " + o
                    + "); subtract them to get a difference, or add a difference in K");
        }
        return new Quantity(si + o.si, dimension, absolute || o.absolute);
    }

    public Quantity minus(Quantity o) {
        requireSame(o, "subtract", "from");
        return new Quantity(si - o.si, dimension, absolute && !o.absolute);
    }

    public Quantity times(Quantity o) {
        return new Quantity(si * o.si, dimension.times(o.dimension), false);
    }

    public Quantity times(double k) {
        return new Quantity(si * k, dimension, false);
    }

    public Quantity div(Quantity o) {
        return new Quantity(si / o.si, dimension.div(o.dimension), false);
    }

    public Quantity div(double k) {
        return new Quantity(si / k, dimension, false);
    }

    public Quantity pow(int n) {
        return new Quantity(Math.pow(si, n), dimension.pow(n), false);
    }

    public Quantity sqrt() {
        return new Quantity(Math.sqrt(si), dimension.root(2), false);
    }

    public Quantity negate() {
        return new Quantity(-si, dimension, false);
    }

    public Quantity abs() {
        return new Quantity(Math.abs(si), dimension, absolute);
    }

    public Quantity min(Quantity o) {
        requireSame(o, "compare", "with");
        return si <= o.si ? this : o;
    }

    public Quantity max(Quantity o) {
        requireSame(o, "compare", "with");
        return si >= o.si ? this : o;
    }

    /** True when both have the same dimension and differ by at most {@code relTol} of the larger magnitude. */
    public boolean isCloseTo(Quantity o, double relTol) {
        if (!dimension.equals(o.dimension)) return false;
        if (si == o.si) return true;
        return Math.abs(si - o.si) <= relTol * Math.max(Math.abs(si), Math.abs(o.si));
    }

    @Override
    public int compareTo(Quantity o) {
        requireSame(o, "compare", "with");
        return Double.compare(si, o.si);
    }

    private void requireSame(Quantity o, String verb, String prep) {
        if (o == null) throw new IllegalArgumentException("cannot " + verb + " nothing (null) " + prep + " " + this);
        if (!dimension.equals(o.dimension)) {
            throw new IllegalArgumentException("cannot " + verb + " " + o + " " + prep + " " + this
                    + " (" + o.dimension.name() + " and " + dimension.name() + ")");
        }
    }

    /** Engineering notation with {@link #displayDigits()} significant digits. */
    @Override
    public String toString() {
        return format(displayDigits);
    }

    /** Engineering notation with the given number of significant digits. */
    public String format(int digits) {
        if (digits < 1 || digits > 17) throw new IllegalArgumentException("digits must be between 1 and 17, got " + digits);
        if (absolute) {
            return plain(si - Units.ZERO_CELSIUS, digits) + " °C";
        }
        List<Unit> units = Units.displayUnits(dimension);
        if (units.isEmpty()) {
            String n = plain(si, digits);
            return dimension.isNone() ? n : n + " " + dimension.baseSymbols();
        }
        if (!Double.isFinite(si)) {
            Unit base = baseOf(units);
            return special(si) + " " + base.symbol();
        }
        if (si == 0) {
            return fixed(0, digits) + " " + baseOf(units).symbol();
        }
        // the largest unit in which the value is at least 1 (after rounding), else the smallest
        double a = Math.abs(si);
        Unit chosen = units.get(units.size() - 1);
        for (Unit u : units) {
            double m = round(a / u.factor(), digits);
            if (m >= 1) {
                chosen = u;
                break;
            }
        }
        return fixed(si / chosen.factor(), digits) + " " + chosen.symbol();
    }

    private static Unit baseOf(List<Unit> units) {
        for (Unit u : units) if (u.factor() == 1) return u;
        return units.get(units.size() - 1);
    }

    private static String special(double v) {
        if (Double.isNaN(v)) return "NaN";
        return v > 0 ? "∞" : "-∞";
    }

    private static double round(double v, int digits) {
        return new BigDecimal(v).round(new MathContext(digits)).doubleValue();
    }

    /** A number with the given significant digits, in plain decimals (no exponent). */
    static String fixed(double v, int digits) {
        if (!Double.isFinite(v)) return special(v);
        if (v == 0) return digits <= 1 ? "0" : "0." + "0".repeat(digits - 1);
        BigDecimal b = new BigDecimal(v).round(new MathContext(digits));
        int intDigits = b.precision() - b.scale();
        int decimals = Math.max(0, digits - intDigits);
        return b.setScale(decimals, java.math.RoundingMode.HALF_EVEN).toPlainString();
    }

    /** A pure number: plain decimals between 0.001 and 1e6, else mantissa and exponent. */
    static String plain(double v, int digits) {
        if (!Double.isFinite(v)) return special(v);
        double a = Math.abs(round(v, digits));
        if (v == 0 || (a >= 1e-3 && a < 1e6)) return fixed(v, digits);
        String s = String.format(Locale.ROOT, "%." + (digits - 1) + "e", v);
        // 1.234e-06 -> 1.234e-6
        return s.replaceFirst("e([+-])0*(\\d)", "e$1$2").replace("e+", "e");
    }

    /** Exact equality: same SI bits, dimension and temperature kind. */
    @Override
    public boolean equals(Object o) {
        if (!(o instanceof Quantity)) return false;
        Quantity q = (Quantity) o;
        return Double.compare(si, q.si) == 0 && dimension.equals(q.dimension) && absolute == q.absolute;
    }

    @Override
    public int hashCode() {
        return Double.hashCode(si) * 31 + dimension.hashCode() + (absolute ? 1 : 0);
    }
}
