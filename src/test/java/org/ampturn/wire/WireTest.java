package org.ampturn.wire;

import static org.junit.jupiter.api.Assertions.*;

import java.util.stream.Stream;
import org.ampturn.material.Conductor;
import org.ampturn.units.Quantity;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

class WireTest {
    private static final Quantity T20 = Quantity.celsius(20);
    private static final double INCH = 0.0254;

    /**
     * Nominal bare diameters (inches) and resistance at 20 °C (Ω per 1000 ft) of a published copper
     * magnet wire data table that follows NEMA MW 1000 / ASTM B258 ("Copper Magnet Wire Data",
     * sizes 6 to 36). The table rounds diameters to 0.1 mil, so the check allows 0.05 mil.
     */
    static Stream<Arguments> magnetWireTable() {
        return Stream.of(
                Arguments.of(6, 0.1620, 0.3952),
                Arguments.of(10, 0.1019, 0.9988),
                Arguments.of(14, 0.0641, 2.524),
                Arguments.of(18, 0.0403, 6.386),
                Arguments.of(20, 0.0320, 10.13),
                Arguments.of(24, 0.0201, 25.67),
                Arguments.of(30, 0.0100, 103.7),
                Arguments.of(36, 0.0050, 414.8));
    }

    @ParameterizedTest(name = "AWG {0}: {1} in, {2} Ω/kft (copper magnet wire data table)")
    @MethodSource("magnetWireTable")
    void awgDiameterAndResistanceMatchTheMagnetWireTable(int gauge, double inches, double ohmsPerKft) {
        Wire w = Wire.awg(gauge);
        assertEquals(inches * INCH, w.bareDiameter().si(), 0.5e-4 * INCH + 1e-12, "bare diameter of AWG " + gauge);
        // the table's resistance is computed from its rounded nominal diameter with IEC 60028 copper
        Wire nominal = Wire.metric(Quantity.of(inches, "inch"));
        double perKft = nominal.resistancePerLength(T20).si() * 304.8;
        assertEquals(ohmsPerKft, perKft, ohmsPerKft * 1.5e-3, "resistance of AWG " + gauge);
    }

    /** Annealed copper wire table, AWG 0000 to 9 (diameter in mils, Ω per 1000 ft at 20 °C), as published
     *  in a public wire table "ANNEALED COPPER (AWG)" derived from NBS Handbook 100. */
    static Stream<Arguments> annealedCopperTable() {
        return Stream.of(
                Arguments.of("0000", 460.0, 0.04901),
                Arguments.of("000", 409.6, 0.06180),
                Arguments.of("2/0", 364.8, 0.07793),
                Arguments.of("0", 324.9, 0.09827),
                Arguments.of("4", 204.3, 0.2485),
                Arguments.of("8", 128.5, 0.6282));
    }

    @ParameterizedTest(name = "AWG {0}: {1} mil, {2} Ω/kft (annealed copper wire table)")
    @MethodSource("annealedCopperTable")
    void largeGaugesMatchTheAnnealedCopperTable(String gauge, double mils, double ohmsPerKft) {
        Wire w = Wire.awg(gauge);
        assertEquals(mils, w.bareDiameter().si() / (1e-3 * INCH), 0.051, "diameter of AWG " + gauge);
        assertEquals(ohmsPerKft, w.resistancePerLength(T20).si() * 304.8, ohmsPerKft * 1e-3, "resistance of AWG " + gauge);
    }

    @Test
    void astmB258DefinitionFixesGauges0000And36() {
        // ASTM B258: AWG 0000 is 0.4600 in and AWG 36 is 0.0050 in by definition, 39 steps apart
        assertEquals(0.4600 * INCH, Wire.awg(-3).bareDiameterM(), 1e-12);
        assertEquals(0.0050 * INCH, Wire.awg(36).bareDiameterM(), 1e-13);
        assertEquals(Wire.awg("4/0"), Wire.awg("0000"));
        assertEquals(-1, Wire.awgGaugeOf(Wire.awg("00").bareDiameter()), 1e-12);
        // the figures: AWG 24 = 0.5106 mm, AWG 10 = 2.588 mm (ASTM B258 to 4 figures)
        assertEquals(0.5106e-3, Wire.awg(24).bareDiameterM(), 0.00005e-3);
        assertEquals(2.588e-3, Wire.awg(10).bareDiameterM(), 0.0005e-3);
    }

    @Test
    void halfSizesLieBetweenTheirNeighbours() {
        double d24 = Wire.awg(24).bareDiameterM(), d25 = Wire.awg(25).bareDiameterM();
        double half = Wire.awg("24.5").bareDiameterM();
        assertEquals(Math.sqrt(d24 * d25), half, 1e-15, "half size is the geometric mean (ASTM B258 ratio 92^(1/39) per gauge)");
        // common practice: six gauges halve the diameter nearly, three gauges halve the area nearly
        assertEquals(2.0, Wire.awg(18).area().si() / Wire.awg(21).area().si(), 0.01);
    }

    @Test
    void insulationAddsToTheDiameterByBuild() {
        Wire bare = Wire.awg(24).withInsulation(Insulation.NONE);
        Wire single = bare.withInsulation(Insulation.SINGLE);
        Wire heavy = bare.withInsulation(Insulation.HEAVY);
        Wire triple = bare.withInsulation(Insulation.TRIPLE);
        assertEquals(bare.bareDiameterM(), bare.overallDiameterM());
        // nominal overall diameters of AWG 24 quoted from NEMA MW 1000 in a published table: 0.0213 / 0.0223 / 0.0232 in
        assertEquals(0.0213 * INCH, single.overallDiameterM(), 0.0001 * INCH);
        assertEquals(0.0223 * INCH, heavy.overallDiameterM(), 0.0001 * INCH);
        assertEquals(0.0232 * INCH, triple.overallDiameterM(), 0.0001 * INCH);
        // AWG 22 and 26 from the same table
        assertEquals(0.0276 * INCH, Wire.awg(22).overallDiameterM(), 0.0001 * INCH);
        assertEquals(0.0179 * INCH, Wire.awg(26).overallDiameterM(), 0.0001 * INCH);
        // the build grows with size and is ordered single < heavy < triple everywhere
        for (double g = -3; g <= 44; g += 0.5) {
            Wire w = Wire.awg(g);
            double s = w.withInsulation(Insulation.SINGLE).overallDiameterM(), h = w.overallDiameterM(),
                    t = w.withInsulation(Insulation.TRIPLE).overallDiameterM();
            assertTrue(w.bareDiameterM() < s && s < h && h < t, "builds ordered at AWG " + g);
        }
        Wire given = bare.withOverallDiameter(Quantity.of(0.56, "mm"));
        assertEquals(0.56e-3, given.overallDiameterM(), 1e-15);
    }

    @Test
    void aluminiumWireHasItsOwnResistivityAndDensity() {
        Wire al = Wire.awg(10).withConductor(Conductor.ALUMINIUM);
        Wire cu = Wire.awg(10);
        // IEC 60889: 0.028264 µΩ·m vs IEC 60028: 1/58 µΩ·m
        assertEquals(0.028264 / (1.0 / 58), al.resistancePerLength(T20).si() / cu.resistancePerLength(T20).si(), 1e-9);
        assertEquals(2703.0 / 8890, al.massPerLength().si() / cu.massPerLength().si(), 1e-9);
        // mass per length of AWG 10 copper: 31.43 lb per 1000 ft in the copper magnet wire table
        assertEquals(31.43 * 0.45359237 / 304.8, cu.massPerLength().si(), 31.43 * 0.45359237 / 304.8 * 2e-3);
    }

    @Test
    void resistanceFollowsCopperCoefficient() {
        Wire w = Wire.awg(24);
        double r20 = w.resistancePerLength(T20).si();
        double r100 = w.resistancePerLength(Quantity.celsius(100)).si();
        assertEquals(1 + 0.00393 * 80, r100 / r20, 1e-12); // IEC 60028 α20
    }

    @Test
    void toStringIsOneReadableLine() {
        String s = Wire.awg(24).toString();
        assertEquals("AWG 24 copper wire, 510.6 µm bare, 566.5 µm over heavy build, 84.22 mΩ/m at 20 °C", s);
        assertEquals("AWG 00 copper wire", Wire.awg("2/0").toString().substring(0, 18));
        assertTrue(Wire.metric(Quantity.of(0.5, "mm")).toString().startsWith("Ø0.500 mm copper wire"));
        assertEquals("Ø0.0315 mm", Wire.metric(Quantity.of(0.0315, "mm")).size());
        assertEquals("Ø1.250 mm", Wire.metric(Quantity.of(1.25, "mm")).size());
        assertEquals("Ø12.000 mm", Wire.metric(Quantity.of(12, "mm")).size());
    }

    @Test
    void badSizesAreRefusedWithTheValueAndRange() {
        var e = assertThrows(IllegalArgumentException.class, () -> Wire.awg(60));
        assertTrue(e.getMessage().contains("AWG gauge") && e.getMessage().contains("60") && e.getMessage().contains("56"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> Wire.awg(Double.NaN));
        assertTrue(e.getMessage().contains("NaN"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> Wire.awg("5/0"));
        assertTrue(e.getMessage().contains("5/0"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> Wire.metric(Quantity.of(-0.5, "mm")));
        assertTrue(e.getMessage().contains("bare diameter") && e.getMessage().contains("from 1.000 nm to 10.00 km, got -500.0 µm"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> Wire.metric(Quantity.of(0.5, "A")));
        assertTrue(e.getMessage().contains("length"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> Wire.awg(24).withOverallDiameter(Quantity.of(0.4, "mm")));
        assertTrue(e.getMessage().contains("at least the bare diameter"), e.getMessage());
    }
}
