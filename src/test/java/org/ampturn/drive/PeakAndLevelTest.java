package org.ampturn.drive;

import static org.ampturn.Ampturn.*;
import static org.junit.jupiter.api.Assertions.*;

import org.ampturn.coil.Coil;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.Test;

/** The peak current of a first-order circuit and the exact time to any current level. */
class PeakAndLevelTest {

    @ParameterizedTest
    @ValueSource(doubles = {1e-6, 1e-8, 1e-9})
    void aSaturatingCoilOnDcNeverExceedsVOverR(double rtol) {
        // dλ/dt = V − R·i(λ) with i rising in λ: λ approaches its steady value from below and never
        // passes it (a scalar autonomous ODE cannot overshoot its equilibrium; e.g. Strogatz, Nonlinear
        // Dynamics and Chaos, 2nd ed., §2.1, from memory), so i ≤ V/R. Before the fix this run reported
        // 4.813 A at rtol 1e-6 and 4.80010 A at rtol 1e-8.
        SaturatingCoil c = new SaturatingCoil(40e-3, 0.5, 2e-3, 5);
        Transient run = Drive.dc(V(24)).into(c).tolerance(rtol).simulate(ms(40));
        double limit = 24.0 / 5 * (1 + 1e-12);
        assertTrue(run.peakCurrent().si() <= limit, run.peakCurrent().toString());
        for (double i : run.current().values()) assertTrue(i <= limit, "sample " + i);
        assertEquals(4.8, run.current().last().si(), 1e-9);
    }

    @Test
    void timeToAnyCurrentLevelOfAnRlStep() {
        // i(t) = (V/R)(1 − e^(−t/τ)), so t = −τ·ln(1 − I/(V/R)) (Hayt, Kemmerly and Durbin, Engineering
        // Circuit Analysis, 8th ed., ch. 8): V 12 V, R 5 Ω, L 10 mH, τ 2 ms, V/R 2.4 A
        Transient exact = Drive.dc(V(12)).into(Coil.lumped(mH(10), ohm(5))).simulate(ms(20));
        Transient ode = Drive.dc(V(12)).into(Coil.lumped(mH(10), ohm(5))).numeric().simulate(ms(20));
        for (double level : new double[] {0.25, 1.0, 2.0, 2.39}) {
            double t = -2e-3 * Math.log(1 - level / 2.4);
            assertEquals(t, exact.timeTo(A(level)).si(), 1e-12 * t + 1e-15, "closed form at " + level);
            assertEquals(t, ode.timeTo(A(level)).si(), 1e-8 * t, "integrated at " + level);
        }
        // a fraction other than the three recorded ones is now exact too, not read from the samples
        assertEquals(-2e-3 * Math.log(0.5), exact.timeTo(0.5).si(), 1e-15);
        assertTrue(Double.isNaN(exact.timeTo(A(2.5)).si()), "2.5 A is above V/R");
    }

    @Test
    void timeToALevelOfASaturatingCoilIsItsFluxLinkageOverV() {
        // with R = 0, λ = V·t (Faraday's law), so the current reaches I at t = λ(I)/V exactly
        SaturatingCoil c = new SaturatingCoil(10e-3, 1.0, 0.5e-3, 0);
        Transient run = Drive.dc(V(1)).into(c).simulate(ms(20));
        for (double level : new double[] {0.25, 1, 3, 10}) {
            double t = c.fluxLinkageAt(level) / 1.0;
            assertEquals(t, run.timeTo(A(level)).si(), 1e-9 * t, "at " + level + " A");
        }
    }

    @Test
    void aLevelThatIsNotACurrentAboveZeroIsRefusedByName() {
        Transient run = Drive.dc(V(12)).into(Coil.lumped(mH(10), ohm(5))).simulate(ms(5));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> run.timeTo(A(0)));
        assertTrue(e.getMessage().contains("current level"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> run.timeTo(V(1)));
        assertTrue(e.getMessage().contains("current level"), e.getMessage());
    }
}
