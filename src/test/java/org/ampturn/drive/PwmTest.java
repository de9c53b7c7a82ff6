package org.ampturn.drive;

import static org.ampturn.Ampturn.*;
import static org.junit.jupiter.api.Assertions.*;

import org.ampturn.coil.Coil;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * PWM into an RL coil with a freewheel diode. Periodic steady state of the first-order response
 * (Hayt, Kemmerly and Durbin, ch. 8, applied period by period; the same result is in power
 * electronics texts for a chopper with an RL load, e.g. Mohan, Undeland and Robbins, from memory):
 * with an ideal diode, Imax = (V/R)·(1 − e^(−DT/τ))/(1 − e^(−T/τ)), Imin = Imax·e^(−(1−D)T/τ), and the
 * mean current is D·V/R because the inductor's mean voltage is zero in steady state.
 */
class PwmTest {
    private final Coil coil = Coil.lumped(mH(10), ohm(5));

    @ParameterizedTest
    @ValueSource(booleans = {false, true})
    void steadyStateRippleAndMean(boolean numeric) {
        double v = 12, r = 5, tau = 0.010 / 5, f = 1000, d = 0.3, period = 1 / f;
        Circuit c = Drive.pwm(V(v), Hz(f), d).into(coil).clamp(Clamp.diode(V(0)));
        Transient run = (numeric ? c.numeric() : c).simulate(ms(100));
        double iMax = v / r * (1 - Math.exp(-d * period / tau)) / (1 - Math.exp(-period / tau));
        double iMin = iMax * Math.exp(-(1 - d) * period / tau);
        assertEquals(iMax - iMin, run.ripple().si(), 1e-7 * iMax);
        assertEquals(d * v / r, run.cycleMean().si(), 1e-7);
        assertTrue(run.energy().relativeBalanceError() < 1e-6, run.energy().toString());
    }

    @ParameterizedTest
    @ValueSource(booleans = {false, true})
    void meanWithDiodeDrop(boolean numeric) {
        // mean coil voltage zero: D·V − (1 − D)·Vf = R·Imean (steady state, common practice)
        Circuit c = Drive.pwm(V(24), kHz(20), 0.4).into(coil).clamp(Clamp.diode(V(0.7)));
        Transient run = (numeric ? c.numeric() : c).simulate(ms(40));
        assertEquals((0.4 * 24 - 0.6 * 0.7) / 5, run.cycleMean().si(), 1e-6);
        assertTrue(run.notes().stream().anyMatch(n -> n.contains("coarse")), run.notes().toString());
    }

    @ParameterizedTest
    @ValueSource(booleans = {false, true})
    void peakAndHoldHysteretic(boolean numeric) {
        double v = 24, r = 5, l = 0.010, ip = 3, ih = 1, band = 0.2;
        Circuit c = Drive.peakAndHold(V(v), A(ip), A(ih)).withHysteresis(A(band)).into(coil).offAt(ms(30), Clamp.diode())
                .samples(30_001);
        Transient run = (numeric ? c.numeric() : c).simulate(ms(40));
        // time to reach the pull-in current: τ·ln(1/(1 − Ip/I∞)) (Hayt et al. ch. 8)
        double tp = l / r * Math.log(1 / (1 - ip * r / v));
        assertEquals(tp, run.metrics().pullInCurrentTime().si(), 1e-9);
        assertEquals(band, run.ripple().si(), 1e-6);
        assertEquals(ih, run.cycleMean().si(), 0.02);
        // once regulated, the current stays in the band until the switch opens
        double[] t = run.current().times(), i = run.current().values();
        for (int k = 0; k < t.length; k++) {
            if (t[k] > 0.010 && t[k] < 0.030) {
                assertTrue(i[k] > ih - band / 2 - 1e-6 && i[k] < ih + band / 2 + 1e-6, "i = " + i[k] + " at " + t[k]);
            }
        }
        assertTrue(run.energy().relativeBalanceError() < 1e-6, run.energy().toString());
    }

    @ParameterizedTest
    @ValueSource(booleans = {false, true})
    void peakAndHoldWithPwmRegulationNeverExceedsTheHoldLevel(boolean numeric) {
        Circuit c = Drive.peakAndHold(V(24), A(3), A(1)).withHoldPwm(kHz(10)).into(coil).offAt(ms(30), Clamp.diode())
                .samples(30_001);
        Transient run = (numeric ? c.numeric() : c).simulate(ms(40));
        double[] t = run.current().times(), i = run.current().values();
        for (int k = 0; k < t.length; k++) if (t[k] > 0.015 && t[k] < 0.030) assertTrue(i[k] <= 1 + 1e-6, "i = " + i[k]);
        assertTrue(run.ripple().si() > 0 && run.ripple().si() < 0.2, run.ripple().toString());
        assertTrue(run.cycleMean().si() < 1 && run.cycleMean().si() > 0.85, run.cycleMean().toString());
        assertTrue(run.energy().relativeBalanceError() < 1e-6, run.energy().toString());
    }
}
