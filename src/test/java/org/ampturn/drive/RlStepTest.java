package org.ampturn.drive;

import static org.ampturn.Ampturn.*;
import static org.junit.jupiter.api.Assertions.*;

import org.ampturn.coil.Coil;
import org.junit.jupiter.api.Test;

/**
 * First-order RL step and decay against the closed forms i(t) = (V/R)(1 − e^(−t/τ)) and
 * i(t) = I0·e^(−t/τ), τ = L/R (Hayt, Kemmerly and Durbin, Engineering Circuit Analysis, 8th ed., ch. 8).
 */
class RlStepTest {
    private final Coil coil = Coil.lumped(mH(10), ohm(5));

    @Test
    void riseFollowsTheExponential() {
        Transient run = Drive.dc(V(12)).into(coil).offAt(ms(20), Clamp.diode()).simulate(ms(40));
        double tau = 0.010 / 5;
        for (double t : new double[] {0.5e-3, 1e-3, 2e-3, 5e-3, 15e-3}) {
            double expected = 12.0 / 5 * (1 - Math.exp(-t / tau)); // Hayt et al., ch. 8
            assertEquals(expected, run.current().at(s(t)).si(), 1e-9 * expected, "i at " + t);
        }
        assertEquals(tau, run.timeConstant().si(), 1e-15);
        assertEquals(tau, run.metrics().timeTo63().si(), 1e-12);
        assertEquals(tau * Math.log(10), run.timeTo(0.9).si(), 1e-12);
        assertEquals(tau * Math.log(100), run.timeTo(0.99).si(), 1e-12);
        assertEquals(2.4, run.finalCurrent().si(), 1e-12);
    }

    @Test
    void resistorClampDecayIsExponentialWithTheSumOfResistances() {
        // ideal diode (0 V) in series with 15 Ω: τ_off = L/(R + Rc) = 10 mH / 20 Ω (Hayt et al., ch. 8, source-free RL)
        Transient run = Drive.dc(V(12)).into(coil).offAt(ms(20), Clamp.resistor(ohm(15), V(0))).samples(3001).simulate(ms(30)); // 10 µs grid: the checks fall on samples
        double i0 = 2.4 * (1 - Math.exp(-10)); // current at turn-off, 10 time constants in
        double tauOff = 0.010 / 20;
        for (double dt : new double[] {0.1e-3, 0.5e-3, 1e-3, 3e-3}) {
            double expected = i0 * Math.exp(-dt / tauOff);
            assertEquals(expected, run.current().at(s(0.020 + dt)).si(), 1e-9 * i0, "i at off + " + dt);
        }
        // the switch sees V + R_clamp·I0 at the instant of turn-off (common practice: resistor clamp flyback)
        assertEquals(12 + 15 * i0, run.peakSwitchVoltage().si(), 1e-9);
    }

    @Test
    void odeAgreesWithClosedForm() {
        Transient exact = Drive.dc(V(12)).into(coil).offAt(ms(20), Clamp.diode()).simulate(ms(40));
        Transient ode = Drive.dc(V(12)).into(coil).offAt(ms(20), Clamp.diode()).numeric().simulate(ms(40));
        double[] a = exact.current().values(), b = ode.current().values();
        for (int k = 0; k < a.length; k++) assertEquals(a[k], b[k], 1e-7, "sample " + k);
        assertEquals(exact.decayTime().si(), ode.decayTime().si(), 1e-9);
        assertTrue(Math.abs(ode.energy().relativeBalanceError()) < 1e-6, ode.energy().toString());
    }
}
