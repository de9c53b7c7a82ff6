package org.ampturn.study;

import static org.junit.jupiter.api.Assertions.*;

import org.ampturn.coil.Coil;
import org.ampturn.drive.Clamp;
import org.ampturn.units.Quantity;
import org.junit.jupiter.api.Test;

/** The worst-case corners against their closed forms (Ohm's law, copper's linear resistance law, the RL step). */
class WorstCaseTest {
    private static Quantity q(String s) { return Quantity.parse(s); }

    private static final double ALPHA = 0.00393; // IEC 60028 annealed copper at 20 °C (Coil.lumped)

    @Test
    void cornersMatchTheirClosedForms() {
        // invented coil: 40 mH, 60 Ω at 20 °C, 3000 turns; 24 V ±10 %; ±7 % resistance; −20 °C to 110 °C
        Coil coil = Coil.lumped(q("40 mH"), q("60 ohm"));
        WorstCase.Result r = WorstCase.of(coil, 3000, q("24 V"), 10).withResistanceTolerance(7)
                .withTemperatures(q("-20 degC"), q("110 degC")).withPickUp(q("800 A")).withMaxPower(q("12 W"))
                .withFlyback(Clamp.resistor(q("100 ohm"), q("0 V")), q("100 V")).withDropOut(q("150 A"), q("2.4 V")).check();
        double rHot = 60 * (1 + ALPHA * 90) * 1.07, rCold = 60 * (1 + ALPHA * -40) * 0.93;
        double ni = 3000 * 21.6 / rHot;
        assertEquals(ni, r.corner("pick-up").value().si(), 1e-9 * ni);
        assertEquals(ni / 800 - 1, r.corner("pick-up").margin(), 1e-12);
        double p = 26.4 * 26.4 / rCold;
        assertEquals(p, r.corner("dissipation").value().si(), 1e-9 * p);
        // resistor clamp: the switch sees V + R_clamp·i at turn-off, i = (V/R)(1 − e^(−8)) after 8 τ (RL step)
        double v = 26.4 + 100 * 26.4 / rCold * (1 - Math.exp(-8));
        assertEquals(v, r.corner("flyback").value().si(), 1e-6 * v);
        double off = 3000 * 2.4 / rCold;
        assertEquals(off, r.corner("drop-out").value().si(), 1e-9 * off);
        assertEquals(1 - off / 150, r.corner("drop-out").margin(), 1e-12);
        // the deciding corner is the one with least margin
        double least = Double.POSITIVE_INFINITY;
        for (WorstCase.Corner c : r.corners()) least = Math.min(least, c.margin());
        assertEquals(least, r.deciding().margin());
        assertTrue(r.table().text().lines().filter(l -> l.endsWith("◀ deciding")).count() == 1, r.table().text());
        assertTrue(r.table().text().lines().anyMatch(l -> l.startsWith("  " + r.deciding().name()) && l.endsWith("◀ deciding")), r.table().text());
    }

    @Test
    void aFailingCornerIsShownAndDecides() {
        Coil coil = Coil.lumped(q("40 mH"), q("60 ohm"));
        WorstCase.Result r = WorstCase.of(coil, 3000, q("24 V"), 10).withResistanceTolerance(7).withTemperatures(q("-20 degC"), q("110 degC"))
                .withPickUp(q("1000 A")).withMaxPower(q("20 W")).check();
        assertFalse(r.allPass());
        assertEquals("pick-up", r.deciding().name());
        assertTrue(r.toString().contains("1 FAIL; deciding: pick-up"), r.toString());
        assertTrue(r.table().text().contains("FAIL"), r.table().text());
    }

    @Test
    void badInputIsRefusedByName() {
        Coil coil = Coil.lumped(q("40 mH"), q("60 ohm"));
        var e = assertThrows(IllegalArgumentException.class, () -> WorstCase.of(coil, 3000, q("24 V"), 150));
        assertTrue(e.getMessage().contains("150 %"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> WorstCase.of(coil, 3000, q("24 V"), 10).check());
        assertTrue(e.getMessage().contains("no check given"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class,
                () -> WorstCase.of(coil, 3000, q("24 V"), 10).withTemperatures(q("110 degC"), q("20 degC")));
        assertTrue(e.getMessage().contains("110.0 °C"), e.getMessage());
    }
}
