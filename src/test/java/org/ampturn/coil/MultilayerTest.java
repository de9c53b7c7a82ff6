package org.ampturn.coil;

import static org.ampturn.Ampturn.*;
import static org.junit.jupiter.api.Assertions.*;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class MultilayerTest {
    /**
     * Brooks' coil (Brooks 1931; Grover 1946, ch. 16): L = 1.6994e-6·a·N² H (from memory) against the
     * filament sum of a 50 × 50 winding of the same proportions. Agreement to 0.1 % also confirms the
     * constant recalled from memory.
     */
    @Test
    void brooksFormulaAgreesWithFilamentSum() {
        Multilayer b = Multilayer.brooks(2500, mm(20));
        assertTrue(b.isBrooks());
        double exact = b.inductance().si();
        assertEquals(exact, b.brooksFormula().si(), 1e-3 * exact);
        assertEquals(1.6994e-6 * 0.03 * 2500 * 2500, b.brooksFormula().si(), 1e-9);
    }

    /**
     * Wheeler 1928 multilayer (Proc. IRE 16, p. 1398) is stated as about 1 % when 6a, 9b and 10c are
     * of the same order. Measured here: -0.7 % to -1.7 % on three such coils; checked at 2 %.
     */
    @ParameterizedTest(name = "build {0} mm")
    @ValueSource(doubles = {6, 10, 14})
    void wheelerMultilayerInItsRange(double buildMm) {
        // mean radius 15 mm (6a = 90), length 10 mm (9b = 90), build 6..14 mm (10c = 60..140)
        double id = 30 - buildMm, od = 30 + buildMm;
        Multilayer c = Multilayer.of(25, (int) Math.round(buildMm * 2.5), mm(id), mm(od), mm(10));
        double exact = c.inductance().si();
        assertEquals(exact, c.wheeler1928().si(), 0.02 * exact);
    }

    /** One layer of a multilayer coil is a single-layer solenoid: filament sums agree exactly (same lattice). */
    @Test
    void oneLayerIsASolenoid() {
        Multilayer m = Multilayer.of(60, 1, mm(19.5), mm(20.5), mm(30)).withWire(mm(0.45));
        Solenoid s = Solenoid.singleLayer(60, mm(30), mm(20)).withWire(mm(0.45));
        assertEquals(s.filamentSum().si(), m.inductance().si(), 1e-12 * m.inductance().si());
        // and Rosa's corrected sheet agrees with both (Rosa 1906)
        assertEquals(s.inductance().si(), m.inductance().si(), 3e-4 * m.inductance().si());
    }

    /** Thin build tends to the current sheet (Nagaoka) at the mean diameter: two layers of fine wire, 200 turns each. */
    @Test
    void thinBuildTendsToCurrentSheet() {
        Multilayer m = Multilayer.of(400, 2, mm(39.8), mm(40.2), mm(40)).withWire(mm(0.1));
        double sheet = Solenoid.inductanceAt(800, 0.04, 0.04);
        assertEquals(sheet, m.inductance().si(), 0.01 * sheet);
    }

    @Test
    void compareShowsAllMethods() {
        Comparison c = Multilayer.brooks(400, mm(10)).compare();
        assertTrue(c.row("Brooks").relativeError() < 5e-3, c.toString());
        assertTrue(c.toString().contains("Wheeler 1928 multilayer"));
        Comparison d = Multilayer.of(20, 5, mm(10), mm(20), mm(30)).compare();
        assertThrows(IllegalArgumentException.class, () -> d.row("Brooks"));
    }

    /**
     * A layer-wound Winding that fills its bobbin exactly lays its turns on the same lattice as
     * Multilayer.of: the two filament sums must agree to rounding. A partly filled last layer and an
     * orthocyclic winding (nested layers) are taken as the winding lays them.
     */
    @Test
    void fromAWinding() {
        var wire = org.ampturn.wire.Wire.awg(26);
        double d = wire.overallDiameter().si();
        int perLayer = 40, layers = 6;
        var bobbin = org.ampturn.wire.Bobbin.of(m(perLayer * d * (1 + 1e-12)), mm(20), m(layers * d * 1.01));
        var w = org.ampturn.wire.Winding.of(wire, perLayer * layers, bobbin, org.ampturn.wire.Packing.LAYERED);
        assertEquals(perLayer, w.turnsPerLayer());
        assertEquals(layers, w.layers());
        Multilayer fromWinding = Multilayer.of(w);
        Multilayer lattice = Multilayer.of(perLayer, layers, mm(20), m(0.02 + 2 * layers * d), m(perLayer * d)).withWire(wire.bareDiameter());
        assertEquals(lattice.inductance().si(), fromWinding.inductance().si(), 1e-9 * lattice.inductance().si());
        assertEquals(240, fromWinding.turns());
        // a partly filled last layer is allowed
        Multilayer partial = Multilayer.of(w.withTurns(perLayer * layers - 15));
        assertTrue(partial.inductance().si() < fromWinding.inductance().si());
        assertEquals(225, partial.turns());
        var ortho = org.ampturn.wire.Winding.of(wire, perLayer * layers - 15, org.ampturn.wire.Bobbin.of(m(perLayer * d + d), mm(20), m(layers * d * 1.01)),
                org.ampturn.wire.Packing.ORTHOCYCLIC);
        assertTrue(Multilayer.of(ortho).inductance().si() > 0);
        assertThrows(IllegalStateException.class, () -> fromWinding.withWire(mm(0.1)));
    }

    @Test
    void badInput() {
        var e = assertThrows(IllegalArgumentException.class, () -> Multilayer.of(10, 2, mm(20), mm(20), mm(10)));
        assertTrue(e.getMessage().contains("inner diameter") && e.getMessage().contains("outer diameter"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> Multilayer.of(10, 0, mm(10), mm(20), mm(10)));
        assertTrue(e.getMessage().contains("layers"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> Multilayer.brooks(300, mm(10)));
        assertTrue(e.getMessage().contains("300") && e.getMessage().contains("perfect square"), e.getMessage());
        assertThrows(IllegalStateException.class, () -> Multilayer.of(20, 5, mm(10), mm(20), mm(30)).brooksFormula());
        e = assertThrows(IllegalArgumentException.class, () -> Multilayer.of(10, 10, mm(10), mm(20), mm(10)).withWire(mm(0.8)));
        assertTrue(e.getMessage().contains("800.0 µm"), e.getMessage());
    }
}
