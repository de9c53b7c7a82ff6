package org.ampturn.material;

import java.util.Objects;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;

/**
 * A conductor material for windings: resistivity at 20 °C, its temperature coefficient at 20 °C and
 * its density. Immutable.
 *
 * <p>Resistivity follows the linear law of IEC 60028 (and IEC 60889 for aluminium):
 * ρ(T) = ρ20 · (1 + α20 · (T − 20 °C)). The linear law is the one the standards tabulate; it is
 * good to a few tenths of a percent from about −50 °C to 200 °C for copper (common practice).
 */
public final class Conductor {
    /** 20 °C in kelvin, the reference temperature of IEC 60028 and IEC 60889. */
    public static final double T20 = 293.15;

    /**
     * Annealed copper, IEC 60028:1925 (International Annealed Copper Standard): ρ20 = 1/58 Ω·mm²/m
     * = 0.017241 µΩ·m, α20 = 0.00393 /K, density 8890 kg/m³. The standard defines the "constant
     * mass" temperature coefficient at 20 °C as 0.00393 /K (= 1/254.45 K to three figures); that is
     * the coefficient used here, because it is the one that goes with resistance measured on a wire of
     * fixed length and mass, which is what a coil is.
     */
    public static final Conductor COPPER = new Conductor("copper", 1.0 / 58 * 1e-6, 0.00393, 8890);

    /**
     * Hard-drawn aluminium for electrical purposes, IEC 60889:1987 (61 % IACS): ρ20 = 0.028264 µΩ·m,
     * α20 = 0.00403 /K, density 2703 kg/m³. Magnet wire of annealed (EC-grade) aluminium is close to
     * this (common practice); use {@link #of} with a supplier's figures where they differ.
     */
    public static final Conductor ALUMINIUM = new Conductor("aluminium", 0.028264e-6, 0.00403, 2703);

    private final String name;
    private final double rho20;
    private final double alpha20;
    private final double density;

    private Conductor(String name, double rho20, double alpha20, double density) {
        this.name = name;
        this.rho20 = rho20;
        this.alpha20 = alpha20;
        this.density = density;
    }

    /**
     * A conductor from datasheet numbers, e.g.
     * {@code Conductor.of("brass", q("0.07 uohm*m"), q("0.0015 1/K"), q("8500 kg/m^3"))}.
     *
     * @param resistivity20 resistivity at 20 °C (Ω·m)
     * @param alpha20 temperature coefficient of resistance at 20 °C (1/K); zero or more
     * @param density mass density (kg/m³)
     */
    public static Conductor of(String name, Quantity resistivity20, Quantity alpha20, Quantity density) {
        Require.present("name", name);
        double r = Require.positive("resistivity at 20 °C", resistivity20, Dimension.RESISTIVITY);
        double a = Require.nonNegative("temperature coefficient at 20 °C", alpha20, Dimension.PER_KELVIN);
        double d = Require.positive("density", density, Dimension.DENSITY);
        return new Conductor(name, r, a, d);
    }

    public String name() { return name; }

    /** Resistivity at 20 °C. */
    public Quantity resistivity20() { return Quantity.of(rho20, Dimension.RESISTIVITY); }

    /** Resistivity at a temperature (IEC 60028 linear law). */
    public Quantity resistivity(Quantity temperature) {
        return Quantity.of(resistivityAt(kelvin(temperature)), Dimension.RESISTIVITY);
    }

    /** Temperature coefficient of resistance at 20 °C. */
    public Quantity alpha20() { return Quantity.of(alpha20, Dimension.PER_KELVIN); }

    public Quantity density() { return Quantity.of(density, Dimension.DENSITY); }

    /** Kernel: resistivity (Ω·m) at a temperature (K). */
    public double resistivityAt(double kelvin) {
        Require.between("temperature", kelvin, Dimension.TEMPERATURE, 1e-3, Require.MAX_KELVIN);
        return Require.result("resistivity", rho20 * (1 + alpha20 * (kelvin - T20)));
    }

    /** Kernel: R(T)/R(20 °C) = 1 + α20·(T − 20 °C) for a temperature in kelvin. */
    public double resistanceRatioAt(double kelvin) {
        Require.between("temperature", kelvin, Dimension.TEMPERATURE, 1e-3, Require.MAX_KELVIN);
        return Require.result("resistance ratio", 1 + alpha20 * (kelvin - T20));
    }

    /**
     * Kernel: the temperature (K) at which the resistance is {@code ratio} times its 20 °C value,
     * the "resistance method" of temperature measurement (IEC 60034-1 uses the same linear law).
     */
    public double temperatureAtResistanceRatio(double ratio) {
        Require.between("resistance ratio", ratio, 0, 1e6);
        return Require.result("temperature at resistance ratio", T20 + (ratio - 1) / alpha20);
    }

    /** Kernel: resistivity at 20 °C (Ω·m). */
    public double rho20() { return rho20; }

    /** Kernel: α20 (1/K). */
    public double alpha20PerKelvin() { return alpha20; }

    /** Kernel: density (kg/m³). */
    public double densityKgPerM3() { return density; }

    /** Lowest temperature (K) at which the linear law is used: −100 °C. */
    public static final double LAW_MIN_K = 173.15;
    /** Highest temperature (K) at which the linear law is used: 400 °C. */
    public static final double LAW_MAX_K = 673.15;

    /**
     * A temperature in kelvin at which the linear law is used, checked: from −100 °C to 400 °C. Beyond
     * these the law is off by more than a few percent (from memory; near −234.5 °C it gives copper no
     * resistance at all), so a temperature outside them is refused rather than answered wrongly.
     */
    public static double kelvin(String name, Quantity t) {
        return Require.absoluteTemperature(name, t, LAW_MIN_K, LAW_MAX_K, "the linear resistance law");
    }

    static double kelvin(Quantity t) {
        return kelvin("temperature", t);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Conductor c && c.name.equals(name) && c.rho20 == rho20 && c.alpha20 == alpha20 && c.density == density;
    }

    @Override
    public int hashCode() { return Objects.hash(name, rho20, alpha20, density); }

    @Override
    public String toString() {
        return name + ": ρ20 = " + resistivity20() + ", α20 = " + Quantity.number(alpha20) + " /K, " + density();
    }
}
