package org.ampturn.wire;

import java.util.Locale;
import java.util.Objects;
import org.ampturn.material.Conductor;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;

/**
 * A round magnet wire: a solid round conductor with an enamel build. Immutable; copies with a change
 * are made by the {@code with…} methods.
 *
 * <p>Sizes: {@link #awg(double)} from the ASTM B258 definition of the American Wire Gauge,
 * d = 0.127 mm · 92^((36 − n)/39), for any gauge including half sizes and 0 to 0000 (n = 0, −1, −2,
 * −3); {@link #metric(Quantity)} by nominal bare diameter (IEC 60317 names wires this way).
 * ASTM B258 rounds the tabulated diameters (to 0.1 mil above AWG 44); the exact definition is used
 * here, which agrees with the tables to their rounding.
 *
 * <p>Defaults: annealed copper ({@link Conductor#COPPER}) and a heavy build
 * ({@link Insulation#HEAVY}).
 */
public final class Wire {
    private static final double D36 = 0.127e-3;

    private final String size;
    private final double bare;
    private final Conductor conductor;
    private final Insulation insulation;
    private final double overallOverride; // NaN when the insulation gives the overall diameter

    private Wire(String size, double bare, Conductor conductor, Insulation insulation, double overallOverride) {
        this.size = size;
        this.bare = bare;
        this.conductor = conductor;
        this.insulation = insulation;
        this.overallOverride = overallOverride;
    }

    /**
     * An AWG size (ASTM B258): d = 0.127 mm · 92^((36 − n)/39). Half sizes such as 24.5 are allowed;
     * 0, 00, 000, 0000 are n = 0, −1, −2, −3 (or use {@link #awg(String)} with "2/0", "4/0").
     *
     * @param gauge the gauge number, from −3 (0000) to 56
     */
    public static Wire awg(double gauge) {
        Require.between("AWG gauge", gauge, -3, 56);
        return new Wire(awgName(gauge), awgDiameterAt(gauge), Conductor.COPPER, Insulation.HEAVY, Double.NaN);
    }

    /**
     * An AWG size from text: "24", "24.5", "0", "00", "000", "0000", "1/0", "2/0", "3/0", "4/0".
     */
    public static Wire awg(String gauge) {
        if (gauge == null) throw Require.fail("AWG gauge is missing (null); write for example \"24\" or \"4/0\"");
        String g = gauge.strip();
        double n;
        if (g.matches("0{2,4}")) {
            n = 1 - g.length();
        } else if (g.matches("[1-4]/0")) {
            n = 1 - (g.charAt(0) - '0');
        } else {
            try {
                n = Double.parseDouble(g);
            } catch (NumberFormatException e) {
                throw Require.fail("cannot read \"" + gauge + "\" as an AWG gauge; write a number from 0000 (4/0) to 56, e.g. \"24\", \"24.5\", \"2/0\"");
            }
        }
        return awg(n);
    }

    /** Kernel: ASTM B258 bare diameter (m) of gauge n. */
    public static double awgDiameterAt(double gauge) {
        Require.between("AWG gauge", gauge, -3, 56);
        return Require.result("awg diameter", D36 * Math.pow(92, (36 - gauge) / 39));
    }

    /** The (fractional) AWG gauge of a bare diameter, the inverse of {@link #awgDiameterAt}. */
    public static double awgGaugeOf(Quantity bareDiameter) {
        double d = Require.length("bare diameter", bareDiameter);
        return 36 - 39 * Math.log(d / D36) / Math.log(92);
    }

    private static String awgName(double n) {
        if (n <= 0 && n == Math.rint(n)) return "AWG " + "0".repeat(1 - (int) n);
        if (n == Math.rint(n)) return "AWG " + (int) n;
        return "AWG " + String.format(Locale.ROOT, "%s", n);
    }

    /** A metric wire by its nominal bare diameter, e.g. {@code Wire.metric(mm(0.50))}. */
    public static Wire metric(Quantity bareDiameter) {
        double d = Require.length("bare diameter", bareDiameter);
        if (d > 0.02) throw Require.fail("bare diameter must be at most 20 mm for a round magnet wire, got " + bareDiameter);
        return new Wire(metricName(d), d, Conductor.COPPER, Insulation.HEAVY, Double.NaN);
    }

    /** "Ø0.500 mm", "Ø0.0315 mm", "Ø1.250 mm": four significant figures, at least three decimals. */
    private static String metricName(double metres) {
        java.math.BigDecimal mm = new java.math.BigDecimal(metres * 1e3).round(new java.math.MathContext(4)).stripTrailingZeros();
        if (mm.scale() < 3) mm = mm.setScale(3);
        return "Ø" + mm.toPlainString() + " mm";
    }

    /** The same size in another conductor, e.g. {@code .withConductor(Conductor.ALUMINIUM)}. */
    public Wire withConductor(Conductor c) {
        Require.present("conductor", c);
        return new Wire(size, bare, c, insulation, overallOverride);
    }

    /** The same conductor with another insulation build. */
    public Wire withInsulation(Insulation ins) {
        Require.present("insulation", ins);
        return new Wire(size, bare, conductor, ins, Double.NaN);
    }

    /** The same wire with an overall diameter from a datasheet (must exceed the bare diameter). */
    public Wire withOverallDiameter(Quantity overall) {
        double o = Require.length("overall diameter", overall);
        if (!(o >= bare)) {
            throw Require.fail("overall diameter must be at least the bare diameter " + bareDiameter() + ", got " + overall);
        }
        return new Wire(size, bare, conductor, Insulation.ofIncrease(Quantity.of(o - bare, Dimension.LENGTH)), o);
    }

    /** The size label, e.g. "AWG 24" or "Ø0.500 mm". */
    public String size() { return size; }

    public Conductor conductor() { return conductor; }

    public Insulation insulation() { return insulation; }

    /** Diameter of the conductor. */
    public Quantity bareDiameter() { return Quantity.of(bare, Dimension.LENGTH); }

    /** Diameter over the insulation: the pitch of close-wound turns. */
    public Quantity overallDiameter() { return Quantity.of(overallDiameterM(), Dimension.LENGTH); }

    /** Cross-section of the conductor, π d²/4. */
    public Quantity area() { return Quantity.of(areaM2(), Dimension.AREA); }

    /** DC resistance per length at a temperature. */
    public Quantity resistancePerLength(Quantity temperature) {
        return Quantity.of(resistancePerLengthAt(kelvin(temperature)), Dimension.RESISTANCE_PER_LENGTH);
    }

    /** Mass of conductor per length (the enamel, a few percent, is left out). */
    public Quantity massPerLength() {
        return Quantity.of(conductor.densityKgPerM3() * areaM2(), Dimension.MASS_PER_LENGTH);
    }

    /** Skin depth in this conductor at a frequency and temperature; see {@link SkinEffect}. */
    public Quantity skinDepth(Quantity frequency, Quantity temperature) {
        double f = Require.positive("frequency", frequency, Dimension.FREQUENCY);
        return Quantity.of(SkinEffect.depthAt(conductor.resistivityAt(kelvin(temperature)), f), Dimension.LENGTH);
    }

    /** Skin depth at a frequency, at 20 °C. */
    public Quantity skinDepth(Quantity frequency) {
        return skinDepth(frequency, Quantity.celsius(20));
    }

    /** AC/DC resistance ratio of this wire alone (no proximity effect) at 20 °C; see {@link SkinEffect}. */
    public double acResistanceFactor(Quantity frequency) {
        double f = Require.positive("frequency", frequency, Dimension.FREQUENCY);
        double delta = SkinEffect.depthAt(conductor.rho20(), f);
        return SkinEffect.roundWireFactorAt(bare / 2 / delta);
    }

    // ---- kernels (SI) ----

    /** Kernel: bare diameter (m). */
    public double bareDiameterM() { return bare; }

    /** Kernel: overall diameter (m). */
    public double overallDiameterM() {
        return Double.isNaN(overallOverride) ? bare + insulation.increaseAt(bare) : overallOverride;
    }

    /** Kernel: conductor area (m²). */
    public double areaM2() { return Math.PI / 4 * bare * bare; }

    /** Kernel: resistance per length (Ω/m) at a temperature (K). */
    public double resistancePerLengthAt(double kelvin) {
        Require.finite("temperature (K)", kelvin);
        return Require.result("resistance per length", conductor.resistivityAt(kelvin) / areaM2());
    }

    static double kelvin(Quantity t) {
        return Conductor.kelvin("temperature", t);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Wire w && w.size.equals(size) && w.bare == bare && w.conductor.equals(conductor)
                && w.insulation.equals(insulation) && Double.compare(w.overallDiameterM(), overallDiameterM()) == 0;
    }

    @Override
    public int hashCode() { return Objects.hash(size, bare, conductor, insulation); }

    /** e.g. "AWG 24 copper wire, 510.5 µm bare, 566.4 µm over heavy build, 84.22 mΩ/m at 20 °C". */
    @Override
    public String toString() {
        return size + " " + conductor.name() + " wire, " + bareDiameter() + " bare, " + overallDiameter() + " over "
                + insulation.name() + ", " + resistancePerLength(Quantity.celsius(20)) + " at 20 °C";
    }
}
