package org.ampturn.study;

import org.ampturn.units.Require;
import java.util.Locale;
import java.util.random.RandomGenerator;
import org.ampturn.units.Quantity;

/**
 * A parameter with a tolerance: a nominal value and a half-width (± % or ± absolute), spread
 * uniformly over the band or normally. For a normal spread the band is ±3σ unless
 * {@link #normal(double)} says otherwise (common practice for component tolerances).
 *
 * <p>Variance of the input (GUM, JCGM 100:2008, 4.3.7 and 4.3.4): uniform over ±a gives a²/3,
 * normal with the band at ±kσ gives (a/k)².
 */
public final class Varied {
    enum Shape { UNIFORM, NORMAL }

    final String name;
    final Quantity nominal;
    final boolean plainNumber;
    final double half;     // SI half-width
    final Shape shape;
    final double sigmas;   // band = ±sigmas·σ for NORMAL
    private final String band;

    private Varied(String name, Quantity nominal, boolean plainNumber, double half, Shape shape, double sigmas, String band) {
        if (!Double.isFinite(nominal.si() - half) || !Double.isFinite(nominal.si() + half)) {
            throw Require.fail("the band of " + name + " (" + band + " about " + nominal + ") reaches beyond the range of a double");
        }
        this.name = name;
        this.nominal = nominal;
        this.plainNumber = plainNumber;
        this.half = half;
        this.shape = shape;
        this.sigmas = sigmas;
        this.band = band;
    }

    /** {@code nominal ± percent %}, uniform: {@code Varied.percent("V", V(12), 10)}. */
    public static Varied percent(String name, Quantity nominal, double percent) {
        double n = checkNominal(name, nominal);
        checkHalf(name, percent, "percent");
        return new Varied(name, nominal, false, Math.abs(n) * percent / 100, Shape.UNIFORM, 3, "±" + Column.number(percent, 3) + " %");
    }

    /** {@code nominal ± percent %} of a plain number, uniform. */
    public static Varied percent(String name, double nominal, double percent) {
        checkFinite(name, nominal);
        checkHalf(name, percent, "percent");
        return new Varied(name, Quantity.number(nominal), true, Math.abs(nominal) * percent / 100, Shape.UNIFORM, 3, "±" + Column.number(percent, 3) + " %");
    }

    /** {@code nominal ± delta}, uniform: {@code Varied.plusMinus("gap", mm(0.30), mm(0.05))}. */
    public static Varied plusMinus(String name, Quantity nominal, Quantity delta) {
        checkNominal(name, nominal);
        if (delta == null) throw Require.fail("the tolerance of " + name + " is missing (null)");
        boolean diff = nominal.isAbsoluteTemperature() && delta.dimension().equals(nominal.dimension());
        if (!delta.dimension().equals(nominal.dimension()) && !diff) {
            throw Require.fail("the tolerance of " + name + " must be a " + nominal.dimension().name() + " like its nominal "
                    + nominal + ", got " + delta + " (" + delta.dimension().name() + ")");
        }
        checkHalf(name, delta.si(), "tolerance");
        return new Varied(name, nominal, false, delta.si(), Shape.UNIFORM, 3, "±" + delta);
    }

    /** {@code nominal ± delta} of a plain number, uniform. */
    public static Varied plusMinus(String name, double nominal, double delta) {
        checkFinite(name, nominal);
        checkHalf(name, delta, "tolerance");
        return new Varied(name, Quantity.number(nominal), true, delta, Shape.UNIFORM, 3, "±" + Column.number(delta, 4));
    }

    /** The same band, spread normally with the band at ±3σ. */
    public Varied normal() {
        return normal(3);
    }

    /** The same band, spread normally with the band at ±{@code sigmas}·σ (e.g. 2 for a 95 % band). */
    public Varied normal(double sigmas) {
        Require.between("band in standard deviations (sigmas)", sigmas, 0.1, 10);
        return new Varied(name, nominal, plainNumber, half, Shape.NORMAL, sigmas, band);
    }

    /** The same band, spread uniformly. */
    public Varied uniform() {
        return new Varied(name, nominal, plainNumber, half, Shape.UNIFORM, sigmas, band);
    }

    public String name() {
        return name;
    }

    public Quantity nominal() {
        return nominal;
    }

    /** The lower end of the band (a corner). */
    public Quantity low() {
        return at(nominal.si() - half);
    }

    /** The upper end of the band (a corner). */
    public Quantity high() {
        return at(nominal.si() + half);
    }

    /** Standard deviation of the input, SI: a/√3 for uniform, a/k for normal. */
    public double standardDeviation() {
        return shape == Shape.UNIFORM ? half / Math.sqrt(3) : half / sigmas;
    }

    double sample(RandomGenerator r) {
        if (half == 0) return nominal.si();
        if (shape == Shape.UNIFORM) return nominal.si() + half * (2 * r.nextDouble() - 1);
        return nominal.si() + half / sigmas * r.nextGaussian();
    }

    Quantity at(double si) {
        if (nominal.isAbsoluteTemperature()) return Quantity.temperatureKelvin(si);
        return Quantity.of(si, nominal.dimension());
    }

    /** What the function receives: a Double for a plain number, else a Quantity. */
    Object valueAt(double si) {
        return plainNumber ? (Object) si : at(si);
    }

    private static double checkNominal(String name, Quantity nominal) {
        Axis.checkName(name);
        if (nominal == null) throw Require.fail("the nominal value of " + name + " is missing (null)");
        if (!Double.isFinite(nominal.si())) throw Require.fail("the nominal value of " + name + " must be finite, got " + nominal);
        return nominal.si();
    }

    private static void checkFinite(String name, double v) {
        Axis.checkName(name);
        Require.finite("the nominal value of " + name, v);
    }

    private static void checkHalf(String name, double v, String what) {
        Require.nonNegative("the " + what + " of " + name, v);
    }

    @Override
    public String toString() {
        String shapeText = shape == Shape.UNIFORM ? "uniform" : "normal, band = ±" + Column.number(sigmas, 3) + "σ";
        return String.format(Locale.ROOT, "%s = %s %s (%s)", name, plainNumber ? Column.number(nominal.si(), Quantity.displayDigits()) : nominal, band, shapeText);
    }
}
