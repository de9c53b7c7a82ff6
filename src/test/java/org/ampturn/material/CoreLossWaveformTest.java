package org.ampturn.material;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * Core-loss energy of a sampled flux waveform (iGSE with loop splitting). References: K.
 * Venkatachalam, C. R. Sullivan, T. Abdallah, H. Tacca, "Accurate prediction of ferrite core loss
 * with nonsinusoidal waveforms using only Steinmetz parameters", IEEE COMPEL 2002 — the iGSE gives
 * Steinmetz's value for a sine, its closed form for a triangle, and splits a waveform with a minor
 * loop into a major and a minor loop, each costed with its own swing.
 */
class CoreLossWaveformTest {
    private final CoreLoss c = CoreLoss.steinmetz(3.0, 1.4, 2.5);

    @Test
    void tenSinePeriodsCostTenTimesSteinmetzPerPeriod() {
        double f = 2_000, bPeak = 0.15;
        int periods = 10, perPeriod = 4000;
        int n = periods * perPeriod + 1;
        double[] t = new double[n];
        double[] b = new double[n];
        for (int i = 0; i < n; i++) {
            t[i] = i / (f * perPeriod);
            b[i] = -bPeak * Math.cos(2 * Math.PI * f * t[i]); // starts at its minimum
        }
        double expected = c.densitySineAt(f, bPeak) * periods / f; // the iGSE equals Steinmetz for a sine
        assertEquals(expected, c.energyDensityAt(t, b), 1e-5 * expected);
    }

    @Test
    void aTriangleWithDutyMatchesTheClosedForm() {
        double f = 50_000, db = 0.08, duty = 0.3;
        int periods = 7;
        double[] t = new double[2 * periods + 1];
        double[] b = new double[2 * periods + 1];
        for (int p = 0; p < periods; p++) {
            t[2 * p] = p / f;
            b[2 * p] = 0.2; // a DC offset: the swing decides, not the level
            t[2 * p + 1] = (p + duty) / f;
            b[2 * p + 1] = 0.2 + db;
        }
        t[2 * periods] = periods / f;
        b[2 * periods] = 0.2;
        double expected = c.densityTriangularAt(f, db, duty) * periods / f;
        assertEquals(expected, c.energyDensityAt(t, b), 1e-12 * expected);
    }

    @Test
    void aMinorLoopIsCostedWithItsOwnSwing() {
        // 0 → 0.6 → 0.5 → 1.0 → 0 T, each leg 1 ms: the minor loop 0.6 → 0.5 → 0.6 (swing 0.1 T) and
        // the major loop 0 → 1 → 0 (swing 1 T) made of the rest of the rises and the final fall,
        // costed by hand as the iGSE's loop splitting prescribes
        double[] t = {0, 1e-3, 2e-3, 3e-3, 4e-3};
        double[] b = {0, 0.6, 0.5, 1.0, 0};
        double a = 1.4, beta = 2.5;
        double s1 = 600, s2 = 100, s3 = 500, s4 = 1000; // |dB/dt| of each leg, T/s
        double major = Math.pow(1.0, beta - a) * (0.6 * Math.pow(s1, a - 1) + 0.4 * Math.pow(s3, a - 1) + 1.0 * Math.pow(s4, a - 1));
        double minor = Math.pow(0.1, beta - a) * (0.1 * Math.pow(s2, a - 1) + 0.1 * Math.pow(s3, a - 1));
        double expected = c.ki() * (major + minor);
        assertEquals(expected, c.energyDensityAt(t, b), 1e-12 * expected);
        // the same path costed leg by leg, each leg as a half loop of its own swing, would be less
        double legByLeg = c.ki() * (Math.pow(0.6, beta - a) * 0.6 * Math.pow(s1, a - 1) + Math.pow(0.1, beta - a) * 0.1 * Math.pow(s2, a - 1)
                + Math.pow(0.5, beta - a) * 0.5 * Math.pow(s3, a - 1) + Math.pow(1.0, beta - a) * Math.pow(s4, a - 1));
        assertTrue(legByLeg < 0.95 * expected, "the loop split matters here");
    }

    @Test
    void aRiseToABiasWithRippleCostsTheRiseAsAHalfLoopAndTheRippleAsMinorLoops() {
        // rise 0 → 0.3 T in 1 ms, then 5 ripple periods of 0.02 T (up 10 µs, down 10 µs)
        int cycles = 5;
        double[] t = new double[2 + 2 * cycles];
        double[] b = new double[2 + 2 * cycles];
        t[1] = 1e-3;
        b[1] = 0.3;
        for (int k = 0; k < cycles; k++) {
            t[2 + 2 * k] = t[1 + 2 * k] + 10e-6;
            b[2 + 2 * k] = 0.28;
            t[3 + 2 * k] = t[2 + 2 * k] + 10e-6;
            b[3 + 2 * k] = 0.3;
        }
        double a = 1.4, beta = 2.5, ripple = 0.02, s = ripple / 10e-6;
        double rise = Math.pow(0.3, beta - a) * 0.3 * Math.pow(0.3 / 1e-3, a - 1);
        double loops = cycles * Math.pow(ripple, beta - a) * 2 * ripple * Math.pow(s, a - 1);
        double expected = c.ki() * (rise + loops);
        assertEquals(expected, c.energyDensityAt(t, b), 1e-12 * expected);
    }

    @Test
    void aConstantFluxCostsNothingAndBadSamplesAreRefusedByName() {
        assertEquals(0, c.energyDensityAt(new double[] {0, 1, 2}, new double[] {0.4, 0.4, 0.4}));
        var e = assertThrows(IllegalArgumentException.class, () -> c.energyDensityAt(new double[] {0, 1}, new double[] {0, Double.NaN}));
        assertTrue(e.getMessage().contains("b[1]"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> c.energyDensityAt(new double[] {0, 2, 1}, new double[] {0, 0.1, 0.2}));
        assertTrue(e.getMessage().contains("must not decrease"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> c.energyDensityAt(new double[] {0, 0}, new double[] {0, 0.1}));
        assertTrue(e.getMessage().contains("no time"), e.getMessage());
    }
}
