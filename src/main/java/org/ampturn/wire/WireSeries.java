package org.ampturn.wire;

import java.util.ArrayList;
import java.util.List;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;

/**
 * A series of standard magnet-wire sizes in one or more insulation grades: the candidates a wire
 * choice runs through. Immutable.
 *
 * <ul>
 * <li>{@link #metric()}: the nominal conductor diameters of IEC 60317 / IEC 60182, the R20 series of
 *     preferred numbers from 0.020 mm to 5.000 mm (IEC 60182 adds R40 intermediate sizes, not listed
 *     here; give any size with {@link #of}); grades 1, 2, 3 at their maximum overall diameters
 *     ({@link Insulation#IEC_GRADE_1_MAX} …, from memory, see there).</li>
 * <li>{@link #awg()}: AWG 10 to 44 (ASTM B258) in single, heavy and triple build (NEMA MW 1000,
 *     typical nominal overall diameters, see {@link Insulation}).</li>
 * </ul>
 * Resistance tolerance of a size ({@link #resistanceTolerance(Wire)}): the conductor diameter
 * tolerance of IEC 60317-0-1 is about ±0.002 mm below 0.1 mm, ±0.003 mm to 0.3 mm and ±1 % above
 * (typical, from memory); resistance goes as 1/d², so its tolerance is about twice the relative
 * diameter tolerance.
 */
public final class WireSeries {
    /** IEC 60182 R20 nominal diameters (mm), 0.020 to 5.000 (preferred numbers rounded as the standard lists them; from memory). */
    private static final double[] R20 = {0.020, 0.022, 0.025, 0.028, 0.032, 0.036, 0.040, 0.045, 0.050, 0.056, 0.063, 0.071, 0.080, 0.090,
            0.100, 0.112, 0.125, 0.140, 0.160, 0.180, 0.200, 0.224, 0.250, 0.280, 0.315, 0.355, 0.400, 0.450, 0.500, 0.560, 0.630,
            0.710, 0.800, 0.900, 1.000, 1.120, 1.250, 1.400, 1.600, 1.800, 2.000, 2.240, 2.500, 2.800, 3.150, 3.550, 4.000, 4.500, 5.000};

    private final String name;
    private final List<Wire> wires;

    private WireSeries(String name, List<Wire> wires) {
        this.name = name;
        this.wires = List.copyOf(wires);
    }

    /** IEC 60317 metric sizes, R20 series 0.020 to 5.000 mm, in grades 1, 2 and 3 (maximum overall diameters). */
    public static WireSeries metric() {
        return metric(1, 2, 3);
    }

    /** IEC 60317 metric sizes (R20) in the given grades (1, 2, 3). */
    public static WireSeries metric(int... grades) {
        Require.present("grades", grades);
        if (grades.length == 0) throw Require.fail("grades must name at least one of 1, 2, 3");
        List<Wire> list = new ArrayList<>();
        for (double d : R20) {
            for (int g : grades) list.add(Wire.metric(Quantity.of(d * 1e-3, Dimension.LENGTH)).withInsulation(iecGrade(g)));
        }
        return new WireSeries("IEC 60317 R20 grades " + java.util.Arrays.toString(grades), list);
    }

    /** AWG 10 to 44 in single, heavy and triple build. */
    public static WireSeries awg() {
        return awg(10, 44);
    }

    /** AWG sizes from {@code thickest} to {@code thinnest} (whole gauges) in single, heavy and triple build. */
    public static WireSeries awg(int thickest, int thinnest) {
        Require.between("thickest gauge", thickest, -3, 56);
        Require.between("thinnest gauge", thinnest, thickest, 56);
        List<Wire> list = new ArrayList<>();
        for (int n = thickest; n <= thinnest; n++) {
            for (Insulation ins : new Insulation[] {Insulation.SINGLE, Insulation.HEAVY, Insulation.TRIPLE}) list.add(Wire.awg(n).withInsulation(ins));
        }
        return new WireSeries("AWG " + thickest + "-" + thinnest + " single/heavy/triple", list);
    }

    /** A series of the wires given (any sizes and builds). */
    public static WireSeries of(String name, List<Wire> wires) {
        Require.name("series", name);
        Require.present("wires", wires);
        if (wires.isEmpty()) throw Require.fail("a wire series needs at least one wire");
        for (Wire w : wires) Require.present("wire", w);
        return new WireSeries(name, wires);
    }

    /** IEC 60317 grade 1, 2 or 3 at its maximum overall diameter. */
    public static Insulation iecGrade(int grade) {
        switch (grade) {
            case 1: return Insulation.IEC_GRADE_1_MAX;
            case 2: return Insulation.IEC_GRADE_2_MAX;
            case 3: return Insulation.IEC_GRADE_3_MAX;
            default: throw Require.fail("IEC 60317 grade (" + grade + ") must be 1, 2 or 3");
        }
    }

    /** This series and another together. */
    public WireSeries and(WireSeries other) {
        Require.present("other series", other);
        List<Wire> all = new ArrayList<>(wires);
        all.addAll(other.wires);
        return new WireSeries(name + " + " + other.name, all);
    }

    public String name() { return name; }

    public List<Wire> wires() { return wires; }

    public int size() { return wires.size(); }

    /**
     * Resistance tolerance (a fraction, ± about nominal) of a wire's size, from the conductor diameter
     * tolerance (IEC 60317-0-1 order of values, typical, from memory): 2·Δd/d with Δd = 2 µm below
     * 0.1 mm, 3 µm to 0.3 mm, 1 % of d above.
     */
    public static double resistanceTolerance(Wire wire) {
        Require.present("wire", wire);
        double d = wire.bareDiameterM();
        double dd = d < 0.1e-3 ? 2e-6 : d <= 0.3e-3 ? 3e-6 : 0.01 * d;
        return 2 * dd / d;
    }

    @Override
    public String toString() { return "wire series " + name + ", " + wires.size() + " wires"; }
}
