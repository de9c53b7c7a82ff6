package org.ampturn.drive;

import static org.ampturn.Ampturn.*;
import static org.junit.jupiter.api.Assertions.*;

import org.ampturn.coil.Coil;
import org.junit.jupiter.api.Test;

/**
 * Rectified sine supplies and a sine supply switched off into a clamp, on a linear RL coil.
 *
 * <p>Periodic steady state by Fourier series: the full-wave rectified sine of peak Vm is
 * Vm·(2/π)·[1 − 2·Σ_{k≥1} cos(2kωt)/(4k² − 1)], the half-wave one Vm·[1/π + ½·sin ωt
 * − (2/π)·Σ_{k≥1} cos(2kωt)/(4k² − 1)] (E. Kreyszig, Advanced Engineering Mathematics, 10th ed.,
 * ch. 11, the rectified-sine series; from memory), and each harmonic drives the coil through its own
 * impedance R + j·n·ω·L (Hayt, Kemmerly and Durbin, Engineering Circuit Analysis, 8th ed., ch. 18,
 * Fourier circuit analysis). With an ideal freewheel diode across the coil the half-wave coil voltage
 * is exactly the half-wave rectified sine while the current stays above zero (it does: it only decays
 * as e^(−Rt/L) in the negative half cycles).
 */
class RectifiedSineTest {
    static final double L = 0.5, R = 20, V = 24, F = 50, W = 2 * Math.PI * F, VM = Math.sqrt(2) * V;

    /** Steady current of a cosine harmonic a·cos(nωt) (n ≥ 1) or a·sin(nωt) through R + jnωL. */
    private static double harmonic(double a, int n, double t, boolean sine) {
        double z = Math.hypot(R, n * W * L), th = Math.atan2(n * W * L, R);
        return a / z * (sine ? Math.sin(n * W * t - th) : Math.cos(n * W * t - th));
    }

    static double fullWaveSteady(double t) {
        double i = VM * 2 / Math.PI / R;
        for (int k = 1; k <= 4000; k++) i += harmonic(-VM * 4 / Math.PI / (4.0 * k * k - 1), 2 * k, t, false);
        return i;
    }

    static double halfWaveSteady(double t) {
        double i = VM / Math.PI / R + harmonic(VM / 2, 1, t, true);
        for (int k = 1; k <= 4000; k++) i += harmonic(-VM * 2 / Math.PI / (4.0 * k * k - 1), 2 * k, t, false);
        return i;
    }

    @Test
    void fullWaveSteadyStateMatchesTheFourierSeries() {
        // τ = 25 ms; after 1 s (40 τ) the start is forgotten
        Transient run = Drive.rectifiedSine(V(V), Hz(F)).into(Coil.lumped(H(L), ohm(R))).samples(20_001).tolerance(1e-10).simulate(s(1));
        double worst = 0, scale = VM * 2 / Math.PI / R;
        for (int k = 0; k <= 200; k++) {
            double t = 0.98 + k * 0.02 / 200;
            worst = Math.max(worst, Math.abs(run.current().at(s(t)).si() - fullWaveSteady(t)));
        }
        assertTrue(worst < 1e-5 * scale, "off by " + worst + " A");
        assertTrue(run.energy().relativeBalanceError() < 1e-6, run.energy().toString());
        assertTrue(run.circuit().contains("full-wave"), run.circuit());
    }

    @Test
    void halfWaveWithItsFreewheelDiodeMatchesTheFourierSeries() {
        Transient run = Drive.halfWaveSine(V(V), Hz(F)).into(Coil.lumped(H(L), ohm(R))).clamp(Clamp.diode(V(0)))
                .samples(20_001).tolerance(1e-10).simulate(s(1));
        double worst = 0, scale = VM / Math.PI / R;
        for (int k = 0; k <= 200; k++) {
            double t = 0.98 + k * 0.02 / 200;
            worst = Math.max(worst, Math.abs(run.current().at(s(t)).si() - halfWaveSteady(t)));
        }
        assertTrue(worst < 1e-5 * scale, "off by " + worst + " A");
        // mean current: the DC term Vm/(π·R) (the coil's mean voltage is zero)
        assertEquals(VM / Math.PI / R, run.current().mean(s(0.98), s(1)).si(), 1e-4 * scale);
        assertTrue(run.energy().relativeBalanceError() < 1e-6, run.energy().toString());
    }

    @Test
    void halfWaveSwitchedOnInANegativeHalfWaits() {
        Transient run = Drive.halfWaveSine(V(V), Hz(F)).withSwitchOnPhase(270).into(Coil.lumped(H(L), ohm(R))).clamp(Clamp.diode())
                .simulate(ms(20));
        assertEquals(0, run.current().at(ms(4.9)).si(), 1e-12); // the diode conducts from the zero crossing at 5 ms on
        assertTrue(run.current().at(ms(8)).si() > 0);
    }

    @Test
    void aSineSwitchedOffDecaysThroughTheClampInEitherDirection() {
        // switched off at t0 with current i0 into a bidirectional clamp Vc across the coil: L·di/dt = −sign(i0)·Vc − R·i, so
        // |i| = (|i0| + Vc/R)·e^(−t/τ) − Vc/R until zero, reached after τ·ln(1 + R·|i0|/Vc) (Hayt et al. ch. 8)
        double vc = 30.7;
        for (double off : new double[] {0.2051, 0.2152}) { // current positive, then negative (it lags the voltage by about 82°)
            Transient run = Drive.sine(V(V), Hz(F)).withSwitchOnPhase(90).into(Coil.lumped(H(L), ohm(R)))
                    .offAt(s(off), Clamp.bidirectional(V(30.7))).tolerance(1e-10).samples(4001).simulate(ms(240));
            double i0 = sineClosedForm(off, 90), tau = L / R;
            double expect = tau * Math.log(1 + R * Math.abs(i0) / vc);
            assertEquals(expect, run.decayTime().si(), 1e-7 * tau, "off at " + off + " s, i0 = " + i0);
            double t = off + 0.3 * expect;
            double iT = Math.copySign((Math.abs(i0) + vc / R) * Math.exp(-(t - off) / tau) - vc / R, i0);
            assertEquals(iT, run.current().at(s(t)).si(), 1e-3 * Math.abs(i0)); // sampled, linear between 60 µs samples
            assertTrue(run.energy().relativeBalanceError() < 1e-6, run.energy().toString());
            assertEquals(0, run.current().at(ms(239)).si(), 1e-12);
        }
    }

    /** Hayt et al. ch. 10 and 8: the phasor forced response plus the natural response that starts at zero. */
    private static double sineClosedForm(double t, double phiDeg) {
        double ipk = VM / Math.hypot(R, W * L), th = Math.atan2(W * L, R), phi = Math.toRadians(phiDeg);
        return ipk * Math.sin(W * t + phi - th) - ipk * Math.sin(phi - th) * Math.exp(-t * R / L);
    }

    @Test
    void badInputIsRefusedWithTheValue() {
        String m0 = assertThrows(IllegalArgumentException.class, () -> Drive.rectifiedSine(V(24), Hz(0))).getMessage();
        assertTrue(m0.contains("frequency") && m0.contains("0.000 Hz"), m0);
        String mn = assertThrows(IllegalArgumentException.class, () -> Drive.halfWaveSine(V(24), Hz(Double.NaN))).getMessage();
        assertTrue(mn.contains("NaN"), mn);
        String mh = assertThrows(IllegalArgumentException.class,
                () -> Drive.halfWaveSine(V(24), Hz(50)).into(Coil.lumped(H(1), ohm(10))).simulate(ms(10))).getMessage();
        assertTrue(mh.contains("freewheel"), mh);
        String mt = assertThrows(IllegalArgumentException.class,
                () -> Drive.sine(V(24), Hz(50)).into(Coil.lumped(H(1), ohm(10))).offAt(ms(5), Clamp.tvs(V(60))).simulate(ms(10))).getMessage();
        assertTrue(mt.contains("across the coil"), mt);
        // a one-way clamp across a coil on a sine supply would short the supply in the negative half cycles (common practice)
        String mo = assertThrows(IllegalArgumentException.class,
                () -> Drive.sine(V(24), Hz(50)).into(Coil.lumped(H(1), ohm(10))).offAt(ms(5), Clamp.zener(V(30))).simulate(ms(10))).getMessage();
        assertTrue(mo.contains("one-way") && mo.contains("Clamp.bidirectional"), mo);
    }
}
