package org.ampturn.study;

import org.ampturn.units.Require;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;

/**
 * A bound on an output: "L ≥ 1 mH", "B ≤ 0.3 T", "rise ≤ 40 K". Written as text
 * ({@code Limit.parse("L >= 1 mH")}, also with ≥ ≤ &gt; &lt;) or built with {@link #atLeast} and
 * {@link #atMost}. The margin is how far the value is inside the bound (negative when outside).
 */
public final class Limit {
    private static final Pattern TEXT = Pattern.compile("^\\s*([^<>=≥≤\\s]+)\\s*(>=|<=|≥|≤|>|<)\\s*(.+?)\\s*$");

    private final String output;
    private final boolean atLeast;
    private final Quantity bound;

    private Limit(String output, boolean atLeast, Quantity bound) {
        Axis.checkName(output);
        if (bound == null) throw Require.fail("the bound on " + output + " is missing (null)");
        if (!Double.isFinite(bound.si())) throw Require.fail("the bound on " + output + " must be finite, got " + bound);
        this.output = output;
        this.atLeast = atLeast;
        this.bound = bound;
    }

    /** {@code output ≥ bound}. */
    public static Limit atLeast(String output, Quantity bound) {
        return new Limit(output, true, bound);
    }

    /** {@code output ≤ bound}. */
    public static Limit atMost(String output, Quantity bound) {
        return new Limit(output, false, bound);
    }

    /** {@code output ≥ bound} for a pure number. */
    public static Limit atLeast(String output, double bound) {
        return new Limit(output, true, Quantity.number(bound));
    }

    /** {@code output ≤ bound} for a pure number. */
    public static Limit atMost(String output, double bound) {
        return new Limit(output, false, Quantity.number(bound));
    }

    /** Reads {@code "NAME >= QUANTITY"} or {@code "NAME <= QUANTITY"} (≥ and ≤ too): {@code "B <= 0.3 T"}, {@code "turns >= 100"}. */
    public static Limit parse(String text) {
        if (text == null) throw Require.fail("a limit is missing (null)");
        Matcher m = TEXT.matcher(text);
        if (!m.matches()) {
            throw Require.fail("cannot read the limit \"" + text + "\": write an output name, >= or <=, and a value, e.g. \"L >= 1 mH\" or \"B <= 0.3 T\"");
        }
        String op = m.group(2);
        Quantity q;
        try {
            q = Quantity.parse(m.group(3));
        } catch (IllegalArgumentException e) {
            throw Require.fail("cannot read the limit \"" + text + "\": " + e.getMessage(), e);
        }
        return new Limit(m.group(1), op.startsWith(">") || op.equals("≥"), q);
    }

    /** The output this limit bounds. */
    public String output() {
        return output;
    }

    public boolean isLowerBound() {
        return atLeast;
    }

    public Quantity bound() {
        return bound;
    }

    /** SI margin of an SI value: value − bound for ≥, bound − value for ≤; NaN stays NaN. */
    public double marginAt(double si) {
        return atLeast ? si - bound.si() : bound.si() - si;
    }

    /** The margin relative to the size of the bound (or absolute when the bound is zero). */
    public double relativeMarginAt(double si) {
        double m = marginAt(si);
        double b = Math.abs(bound.si());
        if (!(b > 0)) return m;
        double r = m / b;
        return Double.isInfinite(r) ? Math.copySign(Double.MAX_VALUE, r) : r; // a bound of 1e-300 ranks, it does not overflow
    }

    /** True when the SI value meets the limit (NaN does not). */
    public boolean isMetAt(double si) {
        return marginAt(si) >= 0;
    }

    /** The margin of a value, as a quantity. */
    public Quantity margin(Quantity value) {
        check(value);
        return Quantity.of(marginAt(value.si()), bound.dimension());
    }

    /** True when the value meets the limit. */
    public boolean isMet(Quantity value) {
        check(value);
        return isMetAt(value.si());
    }

    void check(Quantity value) {
        if (value == null) throw Require.fail("no value of " + output + " (null) to check against " + this);
        checkDimension(value.dimension());
        if (!Double.isFinite(value.si())) throw Require.fail("the value of " + output + " to check against " + this + " must be finite, got " + value);
    }

    void checkDimension(Dimension d) {
        if (!d.equals(bound.dimension())) {
            throw Require.fail("output " + output + " is a " + d.name() + " but the limit " + this + " is a " + bound.dimension().name());
        }
    }

    @Override
    public String toString() {
        return output + (atLeast ? " ≥ " : " ≤ ") + bound;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Limit && ((Limit) o).output.equals(output) && ((Limit) o).atLeast == atLeast && ((Limit) o).bound.equals(bound);
    }

    @Override
    public int hashCode() {
        return output.hashCode() * 31 + bound.hashCode() + (atLeast ? 1 : 0);
    }
}
