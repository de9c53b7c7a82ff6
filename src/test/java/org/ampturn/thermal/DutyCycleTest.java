package org.ampturn.thermal;

import static org.junit.jupiter.api.Assertions.*;

import org.ampturn.units.Quantity;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

/** Intermittent duty of a one-body network against the closed-form geometric series. */
class DutyCycleTest {
    private static Quantity q(String s) { return Quantity.parse(s); }

    private static final double TA = 298.15;

    /**
     * θ_n = P·R·(1 − a)·(1 − (ab)^n)/(1 − ab), a = e^(−ton/τ), b = e^(−toff/τ); the cyclic steady peak is
     * P·R·(1 − a)/(1 − ab), the trough b times it (lumped capacitance under periodic heating, the standard
     * geometric-series result for intermittent duty, common practice).
     */
    @ParameterizedTest(name = "P {0} W, on {1} s in {2} s")
    @CsvSource({"3, 60, 240", "8, 10, 400", "1, 900, 1000", "5, 1000, 1000"})
    void cyclicSteadyStateIsTheGeometricSeries(double p, double on, double period) {
        double r = 20, tau = 1000;
        ThermalNetwork n = ThermalNetwork.oneBody(q("50 J/K"), q("20 K/W"));
        DutyCycle d = n.duty(Quantity.of(p, "W"), Quantity.of(on, "s"), Quantity.of(period, "s"));
        double a = Math.exp(-on / tau), b = Math.exp(-(period - on) / tau);
        double peak = p * r * (1 - a) / (1 - a * b);
        assertEquals(TA + peak, d.peak().si(), 1e-9 * peak + 1e-12);
        assertEquals(TA + b * peak, d.trough().si(), 1e-9 * peak + 1e-12);
        assertEquals(TA + p * r * (1 - a), d.singlePulse().si(), 1e-9);
        for (int k : new int[] {1, 2, 7, 30}) {
            double series = p * r * (1 - a) * (1 - Math.pow(a * b, k)) / (1 - a * b);
            assertEquals(TA + series, d.peakAfter(k).si(), 1e-9 * peak, "cycle " + k);
        }
        // cycles to within 1 %: (ab)^n ≤ 0.01
        long expected = (long) Math.ceil(Math.log(0.01) / Math.log(a * b) - 1e-9);
        assertEquals(Math.max(1, expected), d.cyclesToSteady());
        // mean over a cycle: the steady rise at the mean loss, P·duty·R
        assertEquals(TA + p * on / period * r, d.mean().si(), 1e-9);
    }

    @Test
    void meanAgreesWithAveragingTheCurve() {
        ThermalNetwork n = ThermalNetwork.oneBody(q("50 J/K"), q("20 K/W"));
        DutyCycle d = n.duty(q("6 W"), q("100 s"), q("300 s"));
        // average the closed-form θ(t) over one cycle of the cyclic steady state, by Simpson's rule
        double tau = 1000, r = 20, p = 6;
        double x0 = d.trough().si() - TA;
        int m = 3000;
        double sum = 0;
        for (int i = 0; i <= m; i++) {
            double t = 300.0 * i / m;
            double th = t <= 100 ? p * r + (x0 - p * r) * Math.exp(-t / tau)
                    : (p * r + (x0 - p * r) * Math.exp(-100 / tau)) * Math.exp(-(t - 100) / tau);
            double wgt = (i == 0 || i == m) ? 1 : (i % 2 == 1 ? 4 : 2);
            sum += wgt * th;
        }
        double mean = sum / (3 * m);
        assertEquals(mean, d.mean().si() - TA, 1e-3);
    }

    @Test
    void dutyPercentIsOnTimeOverPeriod() {
        ThermalNetwork n = ThermalNetwork.oneBody(q("50 J/K"), q("20 K/W"));
        DutyCycle d = n.dutyPercent(q("3 W"), q("15 s"), 25);
        assertEquals(60, d.period().si(), 1e-12);
        assertEquals(0.25, d.duty(), 1e-15);
        assertTrue(d.toString().startsWith("duty 25.00 % (15.00 s on in 60.00 s) at 3.000 W"), d.toString());
    }

    @Test
    void overTheClassInDutyIsWarned() {
        ThermalNetwork n = ThermalNetwork.oneBody(q("50 J/K"), q("20 K/W"));
        DutyCycle d = n.duty(q("10 W"), q("500 s"), q("600 s"));
        assertFalse(d.withinClass());
        assertTrue(d.margin().si() < 0);
        assertTrue(d.warnings().get(0).contains("exceeds thermal class 130 (B)"));
        DutyCycle ok = n.duty(q("10 W"), q("10 s"), q("600 s"));
        assertTrue(ok.withinClass());
        assertEquals(120 - 25 - (ok.peak().si() - TA), ok.margin().si(), 1e-9);
    }
}
