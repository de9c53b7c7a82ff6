package org.ampturn.drive;

import static org.ampturn.Ampturn.*;
import static org.junit.jupiter.api.Assertions.*;

import org.ampturn.coil.Coil;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Peak-and-hold with a peak time: the current is limited to the pull-in level until the peak time,
 * then held. Expected values from the first-order RL response, piece by piece (Hayt, Kemmerly and
 * Durbin, Engineering Circuit Analysis, 8th ed., ch. 8): charging toward I∞ = V/R,
 * i(t) = I∞ − (I∞ − i0)·e^(−t/τ); freewheeling through an ideal diode, i(t) = i0·e^(−t/τ).
 */
class PeakTimeTest {
    private static final double V = 24, R = 5, L = 0.010, TAU = L / R, INF = V / R;
    private static final double IP = 3, IH = 1, BAND = 0.2, PEAK_TIME = 0.008;
    private final Coil coil = Coil.lumped(mH(10), ohm(5));

    private Transient run(Drive d, boolean numeric) {
        Circuit c = d.into(coil).offAt(ms(30), Clamp.diode(V(0))).samples(40_001);
        return (numeric ? c.numeric() : c).simulate(ms(40));
    }

    @ParameterizedTest
    @ValueSource(booleans = {false, true})
    void theCurrentIsLimitedAtThePullInLevelUntilThePeakTimeThenHeld(boolean numeric) {
        Transient run = run(Drive.peakAndHold(V(V), A(IP), A(IH)).withHysteresis(A(BAND)).withPeakTime(ms(8)), numeric);
        double reach = TAU * Math.log(INF / (INF - IP));
        assertEquals(reach, run.metrics().pullInCurrentTime().si(), 1e-9);

        // one limiting cycle: off from IP to IP − band, on from IP − band back to IP
        double off = TAU * Math.log(IP / (IP - BAND));
        double on = TAU * Math.log((INF - (IP - BAND)) / (INF - IP));
        int expectedTurnOns = (int) Math.floor((PEAK_TIME - reach - off) / (off + on)) + 1;

        double[] t = run.current().times(), i = run.current().values();
        int turnOns = 0;
        for (int k = 1; k + 1 < t.length; k++) {
            assertTrue(i[k] <= IP + 1e-6, "the pull-in level limits the current: i = " + i[k] + " at " + t[k]);
            if (t[k] > reach + off / 2 && t[k] < PEAK_TIME) {
                assertTrue(i[k] >= IP - BAND - 1e-6, "i = " + i[k] + " at " + t[k]);
                if (i[k] < i[k - 1] && i[k] <= i[k + 1]) turnOns++;
            }
            if (t[k] > 0.012 && t[k] < 0.030) {
                assertTrue(i[k] > IH - BAND / 2 - 1e-6 && i[k] < IH + BAND / 2 + 1e-6, "held: i = " + i[k] + " at " + t[k]);
            }
        }
        assertEquals(expectedTurnOns, turnOns, "limiting cycles in the peak phase");
        Marker hold = run.markers().stream().filter(m -> m.label().equals("hold begins")).findFirst().orElseThrow();
        assertEquals(PEAK_TIME, hold.time().si(), 1e-12);
        assertEquals(IH, run.cycleMean().si(), 0.02);
        assertTrue(run.energy().relativeBalanceError() < 1e-6, run.energy().toString());
    }

    @ParameterizedTest
    @ValueSource(booleans = {false, true})
    void aPeakTimeTooShortToReachThePullInLevelStillEndsThePeak(boolean numeric) {
        Transient run = run(Drive.peakAndHold(V(V), A(IP), A(IH)).withPeakTime(ms(1)), numeric);
        double at = INF * (1 - Math.exp(-0.001 / TAU));
        Marker hold = run.markers().stream().filter(m -> m.label().equals("hold begins")).findFirst().orElseThrow();
        assertEquals(0.001, hold.time().si(), 1e-12);
        assertEquals(at, hold.value().si(), 1e-6 * at);
        assertTrue(Double.isNaN(run.metrics().pullInCurrentTime().si()), run.metrics().toString());
        assertTrue(run.notes().stream().anyMatch(n -> n.contains("not the pull-in level")), run.notes().toString());
        assertTrue(run.current().peak().si() < IP, "the current never got to the pull-in level");
    }

    @Test
    void aPullInLevelAboveTheSteadyCurrentIsAllowedWithAPeakTime() {
        // without a peak time the hold would never begin, which is refused (BadInputTest)
        Transient run = run(Drive.peakAndHold(V(V), A(6), A(IH)).withPeakTime(ms(8)), false);
        assertEquals(INF * (1 - Math.exp(-PEAK_TIME / TAU)), run.current().peak().si(), 1e-6);
        assertEquals(IH, run.cycleMean().si(), 0.02);
    }

    @ParameterizedTest
    @ValueSource(booleans = {false, true})
    void withPwmRegulationNeitherLevelIsExceeded(boolean numeric) {
        Transient run = run(Drive.peakAndHold(V(V), A(IP), A(IH)).withHoldPwm(kHz(10)).withPeakTime(ms(8)), numeric);
        double[] t = run.current().times(), i = run.current().values();
        double reach = TAU * Math.log(INF / (INF - IP));
        double lowest = Double.POSITIVE_INFINITY;
        for (int k = 0; k < t.length; k++) {
            assertTrue(i[k] <= IP + 1e-6, "i = " + i[k] + " at " + t[k]);
            if (t[k] > 0.015 && t[k] < 0.030) assertTrue(i[k] <= IH + 1e-6, "held: i = " + i[k] + " at " + t[k]);
            if (t[k] > reach + 1e-4 && t[k] < PEAK_TIME) lowest = Math.min(lowest, i[k]);
        }
        // off for at most one period of 100 µs from IP: IP·e^(−T/τ) is the lowest the current goes
        assertTrue(lowest >= IP * Math.exp(-1e-4 / TAU) - 1e-6 && lowest < IP, "lowest in the peak phase " + lowest);
        assertTrue(run.energy().relativeBalanceError() < 1e-6, run.energy().toString());
    }

    @Test
    void thePeakTimeIsNamedAndChecked() {
        assertEquals("peak-and-hold drive 24.00 V, pull-in 3.000 A, hold 1.000 A ± 100.0 mA hysteretic, peak time 8.000 ms",
                Drive.peakAndHold(V(24), A(3), A(1)).withPeakTime(ms(8)).toString());
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> Drive.peakAndHold(V(24), A(3), A(1)).withPeakTime(ms(-1)));
        assertTrue(e.getMessage().contains("peak time"), e.getMessage());
        assertThrows(IllegalStateException.class, () -> Drive.dc(V(12)).withPeakTime(ms(5)));
    }
}
