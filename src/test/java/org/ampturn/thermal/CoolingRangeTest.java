package org.ampturn.thermal;

import static org.junit.jupiter.api.Assertions.*;

import org.junit.jupiter.api.Test;

/** The heating rules say so exactly outside the ranges they state. */
class CoolingRangeTest {
    private static final double CM2 = 1e-4;

    @Test
    void handbookRuleRangeIs0005To015WattsPerSquareCentimetre() {
        // McLyman's rule, 0.005 to 0.15 W/cm² (Cooling.handbookRule, from memory); area 1 cm², power = W/cm²
        Cooling c = Cooling.handbookRule();
        assertNotNull(c.rangeNote(0.00499, CM2));
        assertNull(c.rangeNote(0.00501, CM2));
        assertNull(c.rangeNote(0.1499, CM2));
        String above = c.rangeNote(0.1501, CM2);
        assertNotNull(above);
        assertTrue(above.contains("0.150 W/cm²") && above.contains("outside its range"), above);
    }

    @Test
    void ferriteRuleRangeIsThatOfRisesFrom5To100K() {
        // assumed range: the loss densities at which the rule gives 5 K and 100 K
        Cooling c = Cooling.ferriteCatalogueRule();
        double lo = Math.pow(5, 1 / 0.833) * 1e-3, hi = Math.pow(100, 1 / 0.833) * 1e-3; // W per cm²
        assertNotNull(c.rangeNote(lo * 0.99, CM2));
        assertNull(c.rangeNote(lo * 1.01, CM2));
        assertNull(c.rangeNote(hi * 0.99, CM2));
        assertNotNull(c.rangeNote(hi * 1.01, CM2));
        assertEquals(5, c.riseAt(lo, CM2), 1e-9);
        assertEquals(100, c.riseAt(hi, CM2), 1e-9);
    }
}
