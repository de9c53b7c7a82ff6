package org.ampturn.coil;

import static org.ampturn.Ampturn.*;
import static org.junit.jupiter.api.Assertions.*;

import org.ampturn.material.MagneticMaterial;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class RodCoreTest {
    /**
     * Demagnetising factors of prolate spheroids (Osborn, Phys. Rev. 67, 1945; Stoner 1945 tables),
     * from memory: m = 1 sphere 1/3 exactly; m = 2: 0.1736; m = 5: 0.0558; m = 10: 0.0203.
     */
    @ParameterizedTest(name = "m = {0}: {1} ({2})")
    @CsvSource({"1, 0.33333, sphere exact", "2, 0.1736, Osborn 1945", "5, 0.0558, Osborn 1945", "10, 0.0203, Osborn 1945"})
    void osbornFactors(double m, double n, String source) {
        assertEquals(n, RodCore.demagnetisingFactorAt(m), 1e-4, source);
    }

    /** Limits: a flat disc tends to N = 1, a long needle to (ln 2m − 1)/m² (Osborn 1945 asymptote). */
    @Test
    void limits() {
        assertEquals(1, RodCore.demagnetisingFactorAt(1e-6), 1e-5);
        double m = 1000;
        assertEquals((Math.log(2 * m) - 1) / (m * m), RodCore.demagnetisingFactorAt(m), 1e-3 * RodCore.demagnetisingFactorAt(m));
        // continuity through the sphere
        assertEquals(RodCore.demagnetisingFactorAt(1 - 1e-5), RodCore.demagnetisingFactorAt(1 + 1e-5), 1e-5);
    }

    /** μapp = μr/(1 + N(μr − 1)): for high μr it approaches 1/N (common practice). */
    @Test
    void apparentPermeability() {
        RodCore rod = RodCore.of(mm(100), mm(10), MagneticMaterial.linear("ferrite", 1e6, mT(300)));
        assertEquals(1 / RodCore.demagnetisingFactorAt(10), rod.effectivePermeability(), 1e-3 * rod.effectivePermeability());
        Solenoid coil = Solenoid.singleLayer(100, mm(40), mm(12));
        assertTrue(rod.inductance(coil).si() > 10 * coil.inductance().si());
        assertTrue(rod.toString().contains("approximate"));
        assertThrows(IllegalArgumentException.class, () -> rod.inductance(Solenoid.singleLayer(100, mm(40), mm(8))));
        assertThrows(IllegalArgumentException.class, () -> RodCore.of(mm(0), mm(10), MagneticMaterial.linear("f", 100, mT(300))));
    }
}
