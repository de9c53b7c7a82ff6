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
        if (dimension == null) throw Require.fail("a quantity needs a dimension");
        this.si = si;
        this.dimension = dimension;
        this.absolute = absolute && dimension.equals(Dimension.TEMPERATURE);
    }

    /**
     * A quantity from its SI value. This is the kernels' wrapper and checks nothing: NaN stands for a
     * figure that does not apply (a drop-out time of a coil without an armature). What a user types
     * ({@link #of(double, String)}, {@link #parse}) and the arithmetic never give NaN or an infinity.
     */
    public static Quantity of(double si, Dimension dimension) {
        return new Quantity(si, dimension, false);
    }

    /** A quantity from a value in a unit: {@code Quantity.of(4.7, "mH")}. */
    public static Quantity of(double value, String unit) {
        Unit u = Unit.parse(unit);
        if (!Double.isFinite(value)) throw Require.fail("a value in " + unit + " must be a finite number, got " + Require.show(value));
        double si = u.toSi(value);
        if (!Double.isFinite(si)) throw Require.fail(Require.show(value) + " " + unit + " is beyond the range of a double in SI units");
        return new Quantity(si, u.dimension(), u.isOffset());
    }

    /** A pure number. */
    public static Quantity number(double value) {
        return new Quantity(value, Dimension.NONE, false);
    }

    /** An absolute temperature from kelvin (prints in °C). */
    public static Quantity temperatureKelvin(double kelvin) {
        return new Quantity(kelvin, Dimension.TEMPERATURE, true);
    }

    /** An absolute temperature from degrees Celsius; at or above absolute zero and finite. */
    public static Quantity celsius(double degC) {
        if (!(degC >= -Units.ZERO_CELSIUS) || Double.isInfinite(degC)) {
            throw Require.fail("a temperature in °C must be a finite number from -273.15 up, got " + Require.show(degC));
        }
        return new Quantity(degC + Units.ZERO_CELSIUS, Dimension.TEMPERATURE, true);
    }

    private static final Pattern NUMBER = Pattern.compile(
            "^\\s*([+-]?(?:(?:\\d+\\.?\\d*|\\.\\d+)(?:[eE][+-]?\\d+)?|NaN|Infinity|inf|∞))");

    /**
     * Reads what engineers type: {@code 4.7 mH}, {@code 4.7mH}, {@code 1.2 kohm}, {@code 1.2 kΩ},
     * {@code 25 mm}, {@code 0.35 T}, {@code 40 degC}, {@code 100 kHz}, {@code 2.5 A/mm^2}.
     * Only finite values that a {@code double} holds are accepted: NaN, infinities, numbers that
     * overflow ({@code 1e999}) and non-zero numbers that underflow to zero ({@code 1e-400}) are
     * refused with the position of the number.
     */
    public static Quantity parse(String text) {
        if (text == null) throw Require.fail("cannot read a quantity from null");
        Matcher m = NUMBER.matcher(text);
        if (!m.find()) {
            int at = firstNonSpace(text);
            throw Require.fail("cannot read " + quote(text) + " as a quantity: a number is expected at position "
                    + (at + 1) + "; write for example 4.7 mH, 25 mm, 1.2 kΩ, 40 degC");
        }
        String num = m.group(1);
        int at = m.start(1) + 1;
        String bare = num.replaceFirst("^[+-]", "");
        if (bare.equals("NaN") || bare.equals("Infinity") || bare.equals("inf") || bare.equals("∞")) {
            throw Require.fail("cannot read " + quote(text) + " as a quantity: " + bare
                    + " at position " + at + " is not a finite number");
        }
        double v = Double.parseDouble(num);
        if (Double.isInfinite(v)) {
            throw Require.fail("cannot read " + quote(text) + " as a quantity: the number at position " + at
                    + " is too large (a double holds up to about 1.8e308)");
        }
        if (!(Math.abs(v) >= Double.MIN_NORMAL) && hasNonZeroDigit(num)) {
            throw Require.fail("cannot read " + quote(text) + " as a quantity: the number at position " + at
                    + " is too small to hold (below about 2.2e-308) but is not zero");
        }
        String rest = text.substring(m.end());
        Unit u;
        try {
            u = Unit.parse(rest.strip());
        } catch (UnitParser.Failure e) {
            // the unit text is the rest stripped: its position 0 is the first non-space after the number
            int unitAt = m.end() + firstNonSpace(rest);
            throw Require.fail("cannot read " + quote(text) + " as a quantity: " + e.reason + " at position "
                    + (unitAt + e.position + 1) + "; write for example 4.7 mH, 2.5 A/mm^2, 40 degC", e);
        }
        double si = u.toSi(v);
        if (!Double.isFinite(si) || v != 0 && !(Math.abs(si) >= Double.MIN_NORMAL)) {
            throw Require.fail("cannot read " + quote(text) + " as a quantity: " + num + " " + rest.strip()
                    + " is beyond the range of a double in SI units");
        }
        return new Quantity(si, u.dimension(), u.isOffset());
    }

    private static boolean hasNonZeroDigit(String num) {
        int e = num.toLowerCase(Locale.ROOT).indexOf('e');
        String mant = e < 0 ? num : num.substring(0, e);
        for (int i = 0; i < mant.length(); i++) {
            char c = mant.charAt(i);
            if (c >= '1' && c <= '9') return true;
        }
        return false;
    }

    /** Text for a message, in quotes, cut to 40 characters. */
    static String quote(String text) {
        if (text == null) return "null";
        String t = text.length() <= 40 ? text : text.substring(0, 39) + "…";
        StringBuilder sb = new StringBuilder("\"");
        for (int i = 0; i < t.length(); i++) {
            char c = t.charAt(i);
            sb.append(Character.isISOControl(c) ? '⏎' : c);
        }
        return sb.append('"').toString();
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
            throw Require.fail("digits must be between 1 and 15, got " + digits);
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
            throw Require.fail("cannot express " + this + " (" + dimension.name() + ") in " + unit
                    + " (" + u.dimension().name() + ")");
        }
        return u.fromSi(si);
    }

    /** Fails unless this quantity has the given dimension; returns the SI value. */
    public double si(Dimension expected) {
        Require.present("expected dimension", expected);
        if (!dimension.equals(expected)) {
            throw Require.fail("expected a " + expected.name() + ", got " + this + " (" + dimension.name() + ")");
        }
        return si;
    }

    public boolean is(Dimension d) {
        return dimension.equals(d);
    }

    public Quantity plus(Quantity o) {
        requireSame(o, "add", "to");
        if (absolute && o.absolute) {
            throw Require.fail("cannot add two temperatures (" + this + " and " + o
                    + "); subtract them to get a difference, or add a difference in K");
        }
        return checked(new Quantity(si + o.si, dimension, absolute || o.absolute), o, "+", o);
    }

    public Quantity minus(Quantity o) {
        requireSame(o, "subtract", "from");
        return checked(new Quantity(si - o.si, dimension, absolute && !o.absolute), o, "−", o);
    }

    public Quantity times(Quantity o) {
        requireOperand(o, "multiply", "by");
        return checked(new Quantity(si * o.si, dimension.times(o.dimension), false), o, "×", o);
    }

    public Quantity times(double k) {
        Require.finite("factor", k);
        return checked(new Quantity(si * k, dimension, false), k, "×", Require.show(k));
    }

    public Quantity div(Quantity o) {
        requireOperand(o, "divide", "by");
        if (o.si == 0) throw Require.fail("cannot divide " + this + " by zero (" + o + ")");
        return checked(new Quantity(si / o.si, dimension.div(o.dimension), false), o, "÷", o);
    }

    public Quantity div(double k) {
        Require.finite("divisor", k);
        if (k == 0) throw Require.fail("cannot divide " + this + " by zero");
        return checked(new Quantity(si / k, dimension, false), k, "÷", Require.show(k));
    }

    public Quantity pow(int n) {
        if (si == 0 && n < 0) throw Require.fail("cannot raise zero (" + this + ") to the power " + n);
        return checked(new Quantity(Math.pow(si, n), dimension.pow(n), false), n, "^", n);
    }

    public Quantity sqrt() {
        if (si < 0) throw Require.fail("cannot take the square root of a negative quantity, " + this);
        return checked(new Quantity(Math.sqrt(si), dimension.root(2), false), 0.0, "√", "");
    }

    private void requireComparable(Quantity o) {
        if (!Double.isFinite(si) || !Double.isFinite(o.si)) {
            throw Require.fail("cannot take the smaller or larger of " + this + " and " + o + ": an operand is not a finite number");
        }
    }

    private void requireOperand(Quantity o, String verb, String prep) {
        if (o == null) throw Require.fail("cannot " + verb + " " + this + " " + prep + " nothing (null)");
    }

    /** The result, unless finite operands gave an infinite or NaN value (an overflow). */
    private Quantity checked(Quantity r, Object other, String op, Object otherText) {
        if (Double.isFinite(r.si)) return r;
        if (!Double.isFinite(si) || other instanceof Quantity && !Double.isFinite(((Quantity) other).si)) {
            throw Require.fail("cannot compute " + this + " " + op + " " + otherText + ": an operand is not a finite number");
        }
        throw Require.fail("the result of " + this + " " + op + " " + otherText + " overflows: beyond about 1.8e308 in SI units");
    }

    public Quantity negate() {
        return new Quantity(-si, dimension, false);
    }

    public Quantity abs() {
        return new Quantity(Math.abs(si), dimension, absolute);
    }

    public Quantity min(Quantity o) {
        requireSame(o, "compare", "with");
        requireComparable(o);
        return si <= o.si ? this : o;
    }

    public Quantity max(Quantity o) {
        requireSame(o, "compare", "with");
        requireComparable(o);
        return si >= o.si ? this : o;
    }

    /** True when both have the same dimension and differ by at most {@code relTol} of the larger magnitude. */
    public boolean isCloseTo(Quantity o, double relTol) {
        if (o == null || !dimension.equals(o.dimension)) return false;
        if (si == o.si) return true;
        return Math.abs(si - o.si) <= relTol * Math.max(Math.abs(si), Math.abs(o.si));
    }

    @Override
    public int compareTo(Quantity o) {
        requireSame(o, "compare", "with");
        return Double.compare(si, o.si);
    }

    private void requireSame(Quantity o, String verb, String prep) {
        if (o == null) throw Require.fail("cannot " + verb + " nothing (null) " + prep + " " + this);
        if (!dimension.equals(o.dimension)) {
            throw Require.fail("cannot " + verb + " " + o + " " + prep + " " + this
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
        if (digits < 1 || digits > 17) throw Require.fail("digits must be between 1 and 17, got " + digits);
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
        double shown = round(a / chosen.factor(), digits);
        if (shown < 1e-3 || shown >= 1e6) {
            // beyond the display units: a power of ten in the base unit, never a zero for a value that is not zero
            Unit base = baseOf(units);
            return plain(si / base.factor(), digits) + " " + base.symbol();
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
