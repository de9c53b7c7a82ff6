package org.ampturn.coil;

import static org.ampturn.Ampturn.A;
import static org.ampturn.Ampturn.T;
import static org.ampturn.Ampturn.mm;
import static org.ampturn.Ampturn.mm2;
import static org.ampturn.Ampturn.ohm;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.ampturn.material.MagneticMaterial;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.junit.jupiter.api.Test;

/**
 * DC-bias roll-off of a powder core. Reference: the roll-off form itself, μΔ(H) = 1 + (μi − 1)/(1 +
 * (H/H½)^n) (the normalised curve fit 1/(a + b·H^c) of makers' DC-bias curves), and the closed core:
 * an ungapped ring of length l and N turns carries H = N·i/l everywhere, so its incremental
 * inductance at a DC current is L0·μΔ(H)/μi exactly (common practice).
 */
class BiasRollOffTest {
    private static final double MUI = 60, HALF = 4000, N = 1.8;
    private final MagneticMaterial powder = MagneticMaterial.rollOff("test powder", MUI, Quantity.of(HALF, Dimension.FIELD_STRENGTH), N, T(1.2));

    private static double formula(double h) {
        return 1 + (MUI - 1) / (1 + Math.pow(h / HALF, N));
    }

    @Test
    void theTabulatedCurveHasTheFormulasSlopeAndHalvesAtHHalf() {
        assertEquals(1 + (MUI - 1) / 2, powder.incrementalPermeabilityAt(HALF), 1e-12);
        for (double h : new double[] {40, 400, 2000, 4000, 9000, 40_000, 400_000}) {
            double step = h * 1e-4;
            double slope = (powder.fluxDensityAt(h + step) - powder.fluxDensityAt(h - step)) / (2 * step) / MagneticMaterial.MU0;
            assertEquals(formula(h), slope, 1e-3 * formula(h), "slope of B(H) at H = " + h + " A/m");
        }
        assertEquals(MUI, powder.relativePermeability());
        assertEquals(powder.fluxDensityAt(12_345), -powder.fluxDensityAt(-12_345), 1e-15, "odd");
        assertEquals(12_345, powder.fieldAt(powder.fluxDensityAt(12_345)), 1e-6);
    }

    @Test
    void aRingOfItCarriesTheBiasedInductanceAndNamesTheCurrentAt80Percent() {
        int turns = 50;
        double length = 0.1;
        WoundCoil ring = WoundCoil.of(turns, ohm(0.05), Core.of("ring", mm(100), mm2(60), powder));
        double l0 = ring.inductance().si();
        assertEquals(MagneticMaterial.MU0 * MUI * turns * turns * 60e-6 / length, l0, 1e-3 * l0);
        for (double amps : new double[] {1, 5, 8, 20}) {
            double h = turns * amps / length;
            double expected = l0 * formula(h) / MUI;
            assertEquals(expected, ring.incrementalInductance(A(amps)).si(), 2e-3 * expected, "L at " + amps + " A");
        }
        // 80 %: 1 + 59/(1 + x^n) = 48 ⇒ x^n = 59/47 − 1
        double h80 = HALF * Math.pow(59.0 / 47 - 1, 1 / N);
        double i80 = h80 * length / turns;
        assertEquals(i80, ring.currentAtInductanceFraction(0.8).si(), 2e-3 * i80);
    }

    @Test
    void badValuesAreRefusedByName() {
        var e = assertThrows(IllegalArgumentException.class,
                () -> MagneticMaterial.rollOff("p", 60, Quantity.of(-1, Dimension.FIELD_STRENGTH), 1.8, T(1)));
        assertTrue(e.getMessage().contains("field at half permeability"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class,
                () -> MagneticMaterial.rollOff("p", 60, Quantity.of(100, Dimension.FIELD_STRENGTH), 9, T(1)));
        assertTrue(e.getMessage().contains("sharpness"), e.getMessage());
        WoundCoil linear = WoundCoil.of(10, ohm(1), Core.of("ferrite", mm(50), mm2(20), MagneticMaterial.linear("f", 2000, T(0.3))));
        e = assertThrows(IllegalArgumentException.class, () -> linear.currentAtInductanceFraction(0.8));
        assertTrue(e.getMessage().contains("linear"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> linear.currentAtInductanceFraction(1.5));
        assertTrue(e.getMessage().contains("inductance fraction"), e.getMessage());
    }
}
