package org.ampturn.wire;

import static org.junit.jupiter.api.Assertions.*;

import org.ampturn.units.Quantity;
import org.junit.jupiter.api.Test;

class DowellTest {
    private static double v1(double d) { return (Math.sinh(2 * d) + Math.sin(2 * d)) / (Math.cosh(2 * d) - Math.cos(2 * d)); }
    private static double v2(double d) { return (Math.sinh(d) - Math.sin(d)) / (Math.cosh(d) + Math.cos(d)); }

    @Test
    void pointsOfDowellsCurves() {
        // Dowell 1966, eq. for F_R; evaluated by hand at Δ = 1: ς1 = 4.5362/4.1783 = 1.0857, ς2 = 0.33372/2.0834 = 0.16018
        assertEquals(1.0857, Dowell.factorAt(1, 1), 1e-4);
        assertEquals(1.0857 + 16 * 0.16018, Dowell.factorAt(1, 5), 1e-3);
        assertEquals(v1(2) * 2 + 2 * 2.0 / 3 * 99 * v2(2), Dowell.factorAt(2, 10), 1e-12);
        // layer m = 1 of any winding sees only its own field: F = Δ ς1
        assertEquals(Dowell.factorAt(1.5, 1), Dowell.layerFactorAt(1.5, 1), 1e-15);
    }

    @Test
    void meanOfTheLayerFactorsIsThePortionFactor() {
        for (int p = 1; p <= 12; p++) {
            double sum = 0;
            for (int m = 1; m <= p; m++) sum += Dowell.layerFactorAt(0.8, m);
            assertEquals(sum / p, Dowell.factorAt(0.8, p), 1e-12, p + " layers");
        }
    }

    @Test
    void lowAndHighFrequencyLimits() {
        // low Δ: F_R ≈ 1 + (5p² − 1)Δ⁴/45 (the published low-frequency expansion of Dowell's formula,
        // e.g. W. G. Hurley, W. H. Wölfle, "Transformers and Inductors for Power Electronics", 2013; from memory)
        for (int p : new int[] {1, 3, 8}) {
            double d = 0.2;
            assertEquals(1 + (5.0 * p * p - 1) * Math.pow(d, 4) / 45, Dowell.factorAt(d, p), 2e-5 * p * p, p + " layers");
        }
        // the series branch joins the closed form
        assertEquals(Dowell.factorAt(0.000999, 4), Dowell.factorAt(0.001001, 4), 1e-9);
        // high Δ: ς1, ς2 → 1 so F_R → Δ(2p² + 1)/3
        assertEquals(30 * (2 * 25 + 1) / 3.0, Dowell.factorAt(30, 5), 1e-6);
        assertEquals(1.0, Dowell.factorAt(0, 4));
    }

    @Test
    void roundWireIsFoldedIntoAFoil() {
        // Δ = (π/4)^(3/4) (d/δ) √(d/s); a close-wound layer (s = d) gives 0.83429 d/δ
        assertEquals(0.83429, Dowell.deltaOfRoundWire(1, 1, 1), 1e-5);
        assertEquals(0.83429 * Math.sqrt(0.5), Dowell.deltaOfRoundWire(1, 2, 1), 1e-5);
    }

    @Test
    void windingUsesItsLayersAndPitch() {
        Bobbin b = Bobbin.of(Quantity.of(20, "mm"), Quantity.of(10, "mm"), Quantity.of(5, "mm"));
        Winding w = Winding.of(Wire.awg(24), 200, b);
        double delta = SkinEffect.depthAt(1.0 / 58 * 1e-6, 1e5);
        double dd = Dowell.deltaOfRoundWire(Wire.awg(24).bareDiameterM(), 20e-3 / 35, delta);
        assertEquals(Dowell.factorAt(dd, 6), w.acResistanceFactor(Quantity.of(100, "kHz")), 1e-12);
        assertTrue(w.acResistanceFactor(Quantity.of(100, "kHz")) > Wire.awg(24).acResistanceFactor(Quantity.of(100, "kHz")),
                "proximity makes a 6-layer winding worse than the isolated wire");
        assertEquals(w.acResistanceFactor(Quantity.of(100, "kHz")),
                Dowell.factor(Wire.awg(24), Quantity.of(20.0 / 35, "mm"), 6, Quantity.of(100, "kHz")), 1e-12);
        assertThrows(IllegalArgumentException.class, () -> Dowell.factor(Wire.awg(24), Quantity.of(0.3, "mm"), 6, Quantity.of(100, "kHz")));
        // hot copper: larger R_dc but a deeper skin, so a smaller factor
        Quantity f100k = Quantity.of(100, "kHz");
        double hot = w.acResistance(f100k, Quantity.celsius(100)).si(), cold = w.acResistance(f100k, Quantity.celsius(20)).si();
        assertEquals(w.resistance().si() * w.acResistanceFactor(f100k), cold, cold * 1e-12);
        assertTrue(hot / w.resistance(Quantity.celsius(100)).si() < w.acResistanceFactor(f100k));
        var e = assertThrows(IllegalArgumentException.class, () -> Dowell.factorAt(1, 0));
        assertTrue(e.getMessage().contains("layers"), e.getMessage());
    }
}
