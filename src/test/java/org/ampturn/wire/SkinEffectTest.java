package org.ampturn.wire;

import static org.junit.jupiter.api.Assertions.*;

import java.util.stream.Stream;
import org.ampturn.material.Conductor;
import org.ampturn.units.Quantity;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

class SkinEffectTest {
    /**
     * Skin depth of copper with ρ = 1.7e-8 Ω·m (about 300 K): a published skin-depth table
     * (launchloop.com "Skin Depth", from δ = √(2ρ/ωμ)), two figures: 60 Hz 8.5 mm, 400 Hz 3.3 mm,
     * 1 kHz 2.1 mm, 5 kHz 0.93 mm, 20 kHz 0.46 mm, 200 kHz 0.15 mm.
     */
    static Stream<Arguments> copperSkinDepthTable() {
        return Stream.of(Arguments.of(60, 8.5), Arguments.of(400, 3.3), Arguments.of(1000, 2.1), Arguments.of(5000, 0.93),
                Arguments.of(20000, 0.46), Arguments.of(200000, 0.15));
    }

    @ParameterizedTest(name = "{0} Hz: {1} mm (published skin-depth table)")
    @MethodSource("copperSkinDepthTable")
    void skinDepthMatchesThePublishedTable(double hz, double mm) {
        assertEquals(mm, SkinEffect.depthAt(1.7e-8, hz) * 1e3, mm * 0.03);
    }

    @Test
    void skinDepthOfAnnealedCopperAt20C() {
        // common handbook rule for copper at 20 °C: δ ≈ 66 mm / √(f/Hz) (from memory): 9.3 mm at 50 Hz, 0.21 mm at 100 kHz
        Wire w = Wire.awg(24);
        assertEquals(9.35e-3, w.skinDepth(Quantity.of(50, "Hz")).si(), 0.05e-3);
        assertEquals(0.209e-3, w.skinDepth(Quantity.of(100, "kHz")).si(), 0.002e-3);
        // hotter copper has a deeper skin: δ ∝ √ρ
        double hot = w.skinDepth(Quantity.of(100, "kHz"), Quantity.celsius(100)).si();
        assertEquals(Math.sqrt(1 + 0.00393 * 80), hot / w.skinDepth(Quantity.of(100, "kHz")).si(), 1e-12);
        Wire al = w.withConductor(Conductor.ALUMINIUM);
        assertTrue(al.skinDepth(Quantity.of(50, "Hz")).si() > w.skinDepth(Quantity.of(50, "Hz")).si());
    }

    /**
     * R_ac/R_dc of an isolated round wire against x = √2·a/δ, as tabulated from the ber/bei
     * solution in F. E. Terman, "Radio Engineers' Handbook" (1943), skin-effect table (from memory):
     * x = 1: 1.005, 2: 1.078, 3: 1.318, 5: 2.043, 10: 3.799, 20: 7.328.
     */
    static Stream<Arguments> termanTable() {
        return Stream.of(Arguments.of(1.0, 1.005), Arguments.of(2.0, 1.078), Arguments.of(3.0, 1.318), Arguments.of(5.0, 2.043),
                Arguments.of(10.0, 3.799), Arguments.of(20.0, 7.328));
    }

    @ParameterizedTest(name = "x = {0}: R/R0 = {1} (Terman's table)")
    @MethodSource("termanTable")
    void roundWireRatioMatchesTermansTable(double x, double ratio) {
        assertEquals(ratio, SkinEffect.roundWireFactorAt(x / Math.sqrt(2)), 0.0006);
    }

    /** R_ac/R_dc = Re[(ka/2) J0(ka)/J1(ka)], k = (1 − j)/δ, evaluated with mpmath 1.3.0 (besselj, 40 digits). */
    static Stream<Arguments> mpmathValues() {
        return Stream.of(Arguments.of(0.5, 1.0013007285557946), Arguments.of(1, 1.0204923888556225), Arguments.of(2, 1.2646429062732134),
                Arguments.of(3, 1.7681316525097367), Arguments.of(7, 3.7631693235496656), Arguments.of(13, 6.7571795412088402),
                Arguments.of(14, 7.2566710530043456), Arguments.of(25, 12.753745780730239), Arguments.of(29.9, 15.203133013138455),
                Arguments.of(30.1, 15.303112228778384), Arguments.of(40, 20.252342746369148));
    }

    @ParameterizedTest(name = "a/δ = {0}: {1} (mpmath)")
    @MethodSource("mpmathValues")
    void roundWireRatioMatchesAnIndependentBesselEvaluation(double x, double ratio) {
        assertEquals(ratio, SkinEffect.roundWireFactorAt(x), ratio * 2e-7);
    }

    @Test
    void seriesAndAsymptoticFormsAgreeWhereTheyMeet() {
        assertEquals(SkinEffect.roundWireFactorAt(30), SkinEffect.roundWireFactorAt(30.0000001), 3e-6);
        // low-frequency limit: 1 + (a/δ)^4/48 (series of the exact solution)
        double x = 0.3;
        assertEquals(1 + Math.pow(x, 4) / 48, SkinEffect.roundWireFactorAt(x), 1e-7);
        double prev = 1;
        for (double a = 0; a < 40; a += 0.25) {
            double f = SkinEffect.roundWireFactorAt(a);
            assertTrue(f >= prev - 1e-12, "R_ac/R_dc grows with frequency, at a/δ = " + a);
            prev = f;
        }
    }

    @Test
    void wireGivesItsOwnFactor() {
        Wire w = Wire.awg(10); // a = 1.294 mm; at 10 kHz δ = 0.661 mm, a/δ = 1.96
        double delta = SkinEffect.depthAt(1.0 / 58 * 1e-6, 1e4);
        assertEquals(SkinEffect.roundWireFactorAt(w.bareDiameterM() / 2 / delta), w.acResistanceFactor(Quantity.of(10, "kHz")), 1e-15);
        assertEquals(1.0, Wire.awg(40).acResistanceFactor(Quantity.of(50, "Hz")), 1e-9);
    }
}
