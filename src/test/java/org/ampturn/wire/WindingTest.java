package org.ampturn.wire;

import static org.junit.jupiter.api.Assertions.*;

import org.ampturn.material.Conductor;
import org.ampturn.units.Quantity;
import org.junit.jupiter.api.Test;

class WindingTest {
    private static Quantity mm(double x) { return Quantity.of(x, "mm"); }

    @Test
    void squareAndHexagonalPackingReachTheirLatticeFill() {
        // geometry of circles (common practice): a square lattice fills π/4, a hexagonal one π/(2√3)
        Wire bare1mm = Wire.metric(mm(1)).withInsulation(Insulation.NONE);
        Bobbin big = Bobbin.of(mm(100), mm(20), mm(50));
        Winding square = Winding.full(bare1mm, big, Packing.LAYERED);
        assertEquals(5000, square.turns());
        assertEquals(Math.PI / 4, square.fillFactor(), 1e-12);
        Winding hex = Winding.full(bare1mm, big, Packing.ORTHOCYCLIC);
        assertEquals(Math.PI / (2 * Math.sqrt(3)), hex.fillFactor(), 0.02);
        assertTrue(hex.fillFactor() > square.fillFactor());
        // orthocyclic layers alternate 100 and 99 turns
        int[] layers = hex.turnsInLayers();
        assertEquals(100, layers[0]);
        assertEquals(99, layers[1]);
    }

    @Test
    void singleLayerMeanTurnAndResistance() {
        Wire w = Wire.awg(24);
        double d = w.overallDiameterM();
        Bobbin b = Bobbin.of(mm(20), mm(10), mm(5));
        Winding one = Winding.of(w, 30, b);
        assertEquals(1, one.layers());
        // a turn of a single layer on a round tube has its centre at d/2 above the tube: length π(D + d)
        assertEquals(Math.PI * (10e-3 + d), one.meanTurnLength().si(), 1e-15);
        assertEquals(30 * Math.PI * (10e-3 + d), one.wireLength().si(), 1e-13);
        // R = ρ ℓ / A with IEC 60028 copper
        double r = 1.0 / 58 * 1e-6 * one.wireLength().si() / w.areaM2();
        assertEquals(r, one.resistance().si(), r * 1e-12);
        assertEquals(r * (1 + 0.00393 * 110), one.resistance(Quantity.celsius(130)).si(), r * 1e-12);
        assertEquals(8890 * w.areaM2() * one.wireLength().si(), one.copperMass().si(), 1e-12);
    }

    @Test
    void layersAreCountedAndTheLastOneMayBePartFull() {
        Wire w = Wire.awg(24); // 0.5665 mm over heavy build: 35 turns in 20 mm
        Bobbin b = Bobbin.of(mm(20), mm(10), mm(5));
        Winding wd = Winding.of(w, 200, b);
        assertEquals(35, wd.turnsPerLayer());
        assertEquals(6, wd.layers());
        assertArrayEquals(new int[] {35, 35, 35, 35, 35, 25}, wd.turnsInLayers());
        assertEquals(6 * w.overallDiameterM(), wd.buildDepth().si(), 1e-15);
        double d = w.overallDiameterM(), len = 0;
        for (int k = 1; k <= 6; k++) len += (k < 6 ? 35 : 25) * Math.PI * (10e-3 + (2 * k - 1) * d);
        assertEquals(len, wd.wireLength().si(), 1e-12);
        assertEquals(10e-3 + 12 * d, wd.outerDiameter().si(), 1e-15);
    }

    @Test
    void rectangularTubeTurnFollowsTheSidesAndCorners() {
        Wire w = Wire.awg(30);
        double d = w.overallDiameterM();
        Bobbin b = Bobbin.rectangular(mm(15), mm(8), mm(6), mm(4));
        Winding one = Winding.of(w, 10, b);
        assertEquals(2 * (8e-3 + 6e-3) + 2 * Math.PI * d / 2, one.meanTurnLength().si(), 1e-15);
    }

    @Test
    void turnsThatDoNotFitAreReportedWithTheShortfall() {
        Wire w = Wire.awg(24);
        Bobbin b = Bobbin.of(mm(20), mm(10), mm(5));
        int cap = b.capacity(w);
        assertEquals(35 * 8, cap); // 8 layers of 0.5665 mm in 5 mm
        assertEquals(cap, Winding.of(w, cap, b).turns());
        var e = assertThrows(IllegalArgumentException.class, () -> Winding.of(w, 400, b));
        String m = e.getMessage();
        assertTrue(m.contains("400 turns of AWG 24") && m.contains("12 layers") && m.contains("6.798 mm deep")
                && m.contains("1.798 mm too shallow") && m.contains("at most 280 turns") && m.contains("120 fewer"), m);
        assertThrows(IllegalArgumentException.class, () -> Winding.of(w, cap + 1, b));
        e = assertThrows(IllegalArgumentException.class, () -> Winding.of(Wire.awg(10), 5, Bobbin.of(mm(2), mm(10), mm(5))));
        assertTrue(e.getMessage().contains("wider than the winding width"), e.getMessage());
    }

    @Test
    void badInputNamesTheParameter() {
        Bobbin b = Bobbin.of(mm(20), mm(10), mm(5));
        var e = assertThrows(IllegalArgumentException.class, () -> Winding.of(Wire.awg(24), 0, b));
        assertTrue(e.getMessage().contains("turns") && e.getMessage().contains("0"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> Winding.of(Wire.awg(24), -3, b));
        assertTrue(e.getMessage().contains("-3"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> Bobbin.of(mm(0), mm(10), mm(5)));
        assertTrue(e.getMessage().contains("winding width"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> Bobbin.of(mm(20), org.ampturn.units.Quantity.of(Double.NaN, org.ampturn.units.Dimension.LENGTH), mm(5)));
        assertTrue(e.getMessage().contains("inner diameter"), e.getMessage());
    }

    @Test
    void copiesChangeOneThing() {
        Bobbin b = Bobbin.of(mm(20), mm(10), mm(5));
        Winding wd = Winding.of(Wire.awg(24), 200, b);
        assertEquals(100, wd.withTurns(100).turns());
        Winding al = wd.withWire(Wire.awg(24).withConductor(Conductor.ALUMINIUM));
        assertEquals(0.028264 / (1.0 / 58), al.resistance().si() / wd.resistance().si(), 1e-9);
        assertTrue(wd.withPacking(Packing.ORTHOCYCLIC).wireLength().si() < wd.wireLength().si());
        assertTrue(wd.toString().startsWith("winding: 200 turns AWG 24 copper, 6 layers of up to 35 (layer-wound)"), wd.toString());
    }

    @Test
    void capacityIsExactForBothPackings() {
        Bobbin b = Bobbin.of(mm(20), mm(10), mm(5));
        for (Packing p : Packing.values()) {
            for (double g = 18; g <= 36; g += 0.5) {
                Wire w = Wire.awg(g);
                int cap = b.capacity(w, p);
                assertEquals(cap, Winding.full(w, b, p).turns());
                assertThrows(IllegalArgumentException.class, () -> Winding.of(w, cap + 1, b, p), "AWG " + g + " " + p);
                assertTrue(Winding.of(w, cap, b, p).spareDepth().si() >= -1e-12);
            }
        }
    }

    @Test
    void absurdTurnCountsFailAtOnce() {
        Bobbin b = Bobbin.of(mm(20), mm(10), mm(5));
        var e = assertThrows(IllegalArgumentException.class, () -> Winding.of(Wire.awg(24), Integer.MAX_VALUE, b));
        assertTrue(e.getMessage().contains("turns") && e.getMessage().contains("from 1 to 10000000, got 2147483647"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> Winding.of(Wire.awg(24), 9_000_000, b));
        assertTrue(e.getMessage().contains("do not fit") && e.getMessage().contains("257143 layers"), e.getMessage());
    }

    @Test
    void turnCentresForFilamentSums() {
        Wire w = Wire.awg(24);
        double d = w.overallDiameterM();
        Winding wd = Winding.of(w, 70, Bobbin.of(mm(20), mm(10), mm(5))); // two full layers of 35
        double[][] rz = wd.turnCentres();
        assertEquals(70, rz[0].length);
        double sumR = 0;
        for (double r : rz[0]) sumR += r;
        assertEquals(wd.meanDiameter().si() / 2, sumR / 70, 1e-15);
        assertEquals(-10e-3 + d / 2, rz[1][0], 1e-15);
        assertEquals(rz[1][0] + 34 * d, rz[1][34], 1e-15);
        assertEquals(35 * d, wd.windingLength().si(), 1e-15);
        // the mean turn length is π × the mean diameter when all layers are full
        assertEquals(Math.PI * wd.meanDiameter().si(), wd.meanTurnLength().si(), 1e-15);
    }
}
