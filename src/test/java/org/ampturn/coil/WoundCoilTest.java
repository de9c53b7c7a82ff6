package org.ampturn.coil;

import static org.ampturn.Ampturn.*;
import static org.junit.jupiter.api.Assertions.*;

import org.ampturn.material.MagneticMaterial;
import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.junit.jupiter.api.Test;

class WoundCoilTest {
    static final double MU0 = 4e-7 * Math.PI;

    @Test
    void linearCoilInOnePlace() {
        MagneticCircuit c = Core.of("core", mm(100), mm2(100), MagneticMaterial.linear("ferrite", 2000, mT(350))).withGap(mm(0.5));
        WoundCoil coil = WoundCoil.of(200, ohm(2.5), c);
        double l = 200.0 * 200 / c.reluctanceSI();
        assertEquals(l, coil.inductance().si(), 1e-15);
        assertEquals(l, coil.inductance(A(1)).si(), 1e-15);
        assertEquals(l / 2.5, coil.timeConstant().si(), 1e-15);
        assertEquals(0.5 * l * 4, coil.storedEnergy(A(2)).si(), 1e-12);          // ½ L i² (common practice)
        assertEquals(4 * 2.5, coil.copperLoss(A(2)).si(), 1e-12);                  // i² R
        assertEquals(300, coil.ampereTurns(A(1.5)).si(), 1e-12);
        // hot resistance: R20 (1 + 0.00393 (T - 20 °C)), IEC 60028 annealed copper
        assertEquals(2.5 * (1 + 0.00393 * 80), coil.resistance(degC(100)).si(), 1e-12);
        assertEquals(2.5 * (1 + 0.00393 * 80), coil.atTemperature(degC(100)).resistance().si(), 1e-12);
        assertEquals(2.5, coil.coldResistance().si(), 0);
        assertEquals(1.3, coil.fluxLinkageAt(1.3) / l, 1e-12);
        assertEquals(1.3, coil.currentAt(coil.fluxLinkageAt(1.3)), 1e-12);
        assertTrue(coil.isLinear());
        assertEquals(200 * 1.0 / c.reluctanceSI() / 100e-6, coil.fluxDensity(A(1)).si(), 1e-9);
        assertTrue(coil.toString().startsWith("wound coil, 200 turns on core + gap 500.0 µm"), coil.toString());
    }

    /**
     * Nonlinear core: stored energy W = Volume·∫0^B H dB for a closed core (common practice; field
     * energy density ∫H dB), the integral by Commons Math quadrature of the Fröhlich-Kennelly inverse.
     */
    @Test
    void nonlinearEnergyAndInductance() {
        FrohlichMaterial steel = new FrohlichMaterial(1.6, 200, 1.5);
        double l = 0.1, a = 1e-4;
        WoundCoil coil = WoundCoil.of(400, ohm(3), Core.of("steel", m(l), MagneticCircuitTest.m2(a), steel));
        double i = 1.2;
        double b = steel.fluxDensityAt(400 * i / l);
        var quad = new IterativeLegendreGaussIntegrator(32, 1e-12, 1e-15);
        double w = l * a * quad.integrate(100000, steel::fieldAt, 0, b);
        assertEquals(w, coil.storedEnergy(A(i)).si(), 1e-6 * w);
        assertFalse(coil.isLinear());
        // secant below small-signal for a saturating curve; incremental lower still
        assertTrue(coil.inductance(A(i)).si() < coil.inductance().si());
        assertTrue(coil.incrementalInductance(A(i)).si() < coil.inductance(A(i)).si());
        // incremental: dλ/di = N² A/l · dB/dH, dB/dH analytic for Fröhlich-Kennelly: μ0 + Js·Hk/(Hk + H)²
        double h = 400 * i / l;
        double dbdh = MU0 + 1.6 * 200 / ((200 + h) * (200 + h));
        assertEquals(400.0 * 400 * a / l * dbdh, coil.incrementalInductanceAt(i), 1e-6 * coil.incrementalInductanceAt(i));
        assertEquals(i, coil.currentAt(coil.fluxLinkageAt(i)), 1e-10);
        assertEquals("steel", coil.saturation().first().name());
    }

    /** From a Winding of the wire package: turns and resistance (cold and hot) are the winding's own. */
    @Test
    void fromAWinding() {
        var w = org.ampturn.wire.Winding.of(org.ampturn.wire.Wire.awg(28), 300, org.ampturn.wire.Bobbin.of(mm(20), mm(10), mm(5)));
        MagneticCircuit c = Core.of("steel", mm(80), mm2(80), org.ampturn.material.Materials.LOW_CARBON_STEEL).withGap(mm(0.3));
        WoundCoil coil = WoundCoil.of(w, c);
        assertEquals(300, coil.turns());
        assertEquals(w.resistance().si(), coil.coldResistance().si(), 1e-12);
        assertEquals(w.resistance(degC(120)).si(), coil.resistance(degC(120)).si(), 1e-12);
        assertTrue(coil.winding().isPresent());
        assertFalse(coil.isLinear());
        // B-H table material: λ(i) inverts through the circuit
        assertEquals(0.7, coil.currentAt(coil.fluxLinkageAt(0.7)), 1e-9);
        assertEquals("steel", coil.saturation().first().name());
    }

    @Test
    void badInput() {
        MagneticCircuit c = AirGap.of(mm(1), mm2(10));
        var e = assertThrows(IllegalArgumentException.class, () -> WoundCoil.of(0, ohm(1), c));
        assertTrue(e.getMessage().contains("turns"));
        e = assertThrows(IllegalArgumentException.class, () -> WoundCoil.of(10, ohm(-1), c));
        assertTrue(e.getMessage().contains("resistance"));
        e = assertThrows(IllegalArgumentException.class, () -> WoundCoil.of(10, ohm(1), null));
        assertTrue(e.getMessage().contains("magnetic circuit"));
    }
}
