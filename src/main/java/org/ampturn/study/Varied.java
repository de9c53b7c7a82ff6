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
 * normal with the band at ±kσ gives (a/k)². A truncated normal ({@link #truncatedNormal(double)}) is
 * the normal with the band at ±kσ, cut at the band: no draw falls outside it (parts screened at
 * the band). Its variance is σ²·(1 − 2k·φ(k)/(2Φ(k) − 1)), φ and Φ the standard normal density and
 * distribution (Johnson, Kotz and Balakrishnan, Continuous Univariate Distributions, vol. 1, 2nd ed.,
 * 1994, §13.10, from memory); draws by rejection of the normal draws outside the band.
 */
public final class Varied {
    enum Shape { UNIFORM, NORMAL, TRUNCATED_NORMAL }

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

    /** The same band, spread normally with the band at ±3σ and cut at the band. */
    public Varied truncatedNormal() {
        return truncatedNormal(3);
    }

    /**
     * The same band, spread normally with the band at ±{@code sigmas}·σ and cut at the band: every
     * draw lies inside the band (a part screened at its tolerance).
     */
    public Varied truncatedNormal(double sigmas) {
        Require.between("band in standard deviations (sigmas)", sigmas, 0.1, 10);
        return new Varied(name, nominal, plainNumber, half, Shape.TRUNCATED_NORMAL, sigmas, band);
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

    /** Standard deviation of the input, SI: a/√3 for uniform, a/k for normal, less for the truncated normal (see the class). */
    public double standardDeviation() {
        if (shape == Shape.UNIFORM) return half / Math.sqrt(3);
        if (shape == Shape.NORMAL) return half / sigmas;
        double k = sigmas;
        double phi = Math.exp(-0.5 * k * k) / Math.sqrt(2 * Math.PI);
        double inside = org.apache.commons.math3.special.Erf.erf(k / Math.sqrt(2)); // 2Φ(k) − 1
        return half / sigmas * Math.sqrt(1 - 2 * k * phi / inside);
    }

    double sample(RandomGenerator r) {
        if (half == 0) return nominal.si();
        if (shape == Shape.UNIFORM) return nominal.si() + half * (2 * r.nextDouble() - 1);
        double z = r.nextGaussian();
        // rejection: at k ≥ 0.1 at least 8 % of the draws are kept, so the loop ends
        if (shape == Shape.TRUNCATED_NORMAL) while (!(Math.abs(z) <= sigmas)) z = r.nextGaussian();
        return nominal.si() + half / sigmas * z;
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
        String shapeText = shape == Shape.UNIFORM ? "uniform"
                : (shape == Shape.NORMAL ? "normal" : "normal cut at the band") + ", band = ±" + Column.number(sigmas, 3) + "σ";
        return String.format(Locale.ROOT, "%s = %s %s (%s)", name, plainNumber ? Column.number(nominal.si(), Quantity.displayDigits()) : nominal, band, shapeText);
    }
}
