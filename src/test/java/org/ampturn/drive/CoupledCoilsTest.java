package org.ampturn.drive;

import static org.ampturn.Ampturn.*;
import static org.junit.jupiter.api.Assertions.*;

import org.ampturn.coil.Coil;
import org.junit.jupiter.api.Test;

/**
 * Two magnetically coupled coils in a transient. A DC step V on a primary (L1, R1) coupled by
 * M = k·√(L1·L2) to a secondary (L2) closed on a resistance R2:
 * [L1 M; M L2]·d/dt[i1; i2] = [V − R1·i1; −R2·i2], i(0) = 0. The natural frequencies solve
 * (L1·L2 − M²)·s² + (L1·R2 + L2·R1)·s + R1·R2 = 0, two real negative roots: the current is the sum of
 * its final value and two exponentials (Hayt, Kemmerly and Durbin, Engineering Circuit Analysis, 8th
 * ed., ch. 13 for the coupled-coil equations and ch. 9 for the overdamped two-time-constant response).
 */
class CoupledCoilsTest {
    static final double L1 = 0.01, R1 = 5, L2 = 0.04, R2W = 2, RL = 18, K = 0.8, V = 12;

    /** i1(t) and i2(t) of the closed form, by the eigenvectors of the 2 × 2 system. */
    static double[] closedForm(double t) {
        double m = K * Math.sqrt(L1 * L2), r2 = R2W + RL, det = L1 * L2 - m * m;
        // A = −L⁻¹·R
        double a11 = -L2 * R1 / det, a12 = m * r2 / det, a21 = m * R1 / det, a22 = -L1 * r2 / det;
        double tr = a11 + a22, dt = a11 * a22 - a12 * a21, disc = Math.sqrt(tr * tr / 4 - dt);
        double s1 = tr / 2 + disc, s2 = tr / 2 - disc;
        // eigenvectors (a12, s − a11); coefficients from x(0) = 0: c1·v1 + c2·v2 = −x∞, x∞ = (V/R1, 0)
        double v1x = a12, v1y = s1 - a11, v2x = a12, v2y = s2 - a11;
        double xi = -V / R1, yi = 0, d = v1x * v2y - v2x * v1y;
        double c1 = (xi * v2y - v2x * yi) / d, c2 = (v1x * yi - xi * v1y) / d;
        double e1 = Math.exp(s1 * t), e2 = Math.exp(s2 * t);
        return new double[] {V / R1 + c1 * v1x * e1 + c2 * v2x * e2, c1 * v1y * e1 + c2 * v2y * e2};
    }

    @Test
    void twoCoupledRlCircuitsFollowTheTwoTimeConstantSolution() {
        Secondary sec = Secondary.of(H(L2), ohm(R2W), K).withResistor(ohm(RL));
        Transient run = Drive.dc(V(V)).into(Coil.lumped(H(L1), ohm(R1))).withSecondary(sec).tolerance(1e-11).simulate(ms(20));
        double worst1 = 0, worst2 = 0;
        for (int k = 0; k <= 400; k++) {
            double t = k * 0.02 / 400;
            double[] ref = closedForm(t);
            worst1 = Math.max(worst1, Math.abs(run.current().at(s(t)).si() - ref[0]));
            worst2 = Math.max(worst2, Math.abs(run.secondaryCurrent().at(s(t)).si() - ref[1]));
        }
        assertTrue(worst1 < 1e-8 * V / R1 && worst2 < 1e-8 * V / R1, "off by " + worst1 + " and " + worst2 + " A");
        // the secondary first opposes the rise: i2 < 0 (both currents into the dotted ends)
        assertTrue(run.secondaryCurrent().min().si() < -0.1);
        assertTrue(run.energy().secondary().si() > 0);
        assertTrue(run.energy().relativeBalanceError() < 1e-6, run.energy().toString());
    }

    @Test
    void theLedgerBalancesWithTheSecondaryLossThroughPwmAndTurnOff() {
        Secondary sec = Secondary.of(mH(5), ohm(0.5), 0.6); // shorted
        Transient run = Drive.pwm(V(24), kHz(2), 0.5).into(Coil.lumped(mH(10), ohm(5))).offAt(ms(10), Clamp.zener(V(30)))
                .withSecondary(sec).simulate(ms(20));
        assertTrue(run.energy().secondary().si() > 0);
        assertTrue(run.energy().relativeBalanceError() < 1e-6, run.energy().toString());
    }

    @Test
    void aBifilarClampWindingReturnsTheEnergyToTheSupply() {
        // 1:1 bifilar winding (k = 0.98) through a diode (0.7 V) into the 12 V supply; the switch avalanches at 100 V for the
        // leakage. With the primary open the switch sees Vs + (M/L2)·(Vs + Vf + R2·i2): the reflected clamp voltage
        double l = 0.01, k = 0.98;
        Secondary sec = Secondary.of(H(l), ohm(0.5), k).withDiodeInto(V(12));
        Transient run = Drive.dc(V(12)).into(Coil.lumped(H(l), ohm(5))).offAt(ms(10), Clamp.none(V(100))).withSecondary(sec)
                .samples(4001).simulate(ms(20));
        double t = 0.0104;
        double i2 = run.secondaryCurrent().at(s(t)).si();
        assertTrue(i2 > 1.5, "the secondary carries the current: " + i2);
        assertEquals(0, run.current().at(s(t)).si(), 1e-12);
        assertEquals(12 + k * (12.7 + 0.5 * i2), run.switchVoltage().at(s(t)).si(), 1e-3);
        assertEquals(100, run.peakSwitchVoltage().si(), 1e-9); // the leakage's spike, into the switch's avalanche
        double stored = 0.5 * l * Math.pow(12 / 5.0, 2);
        assertTrue(run.energy().secondary().si() > 0.8 * stored, run.energy().toString());
        assertTrue(run.metrics().clampEnergy().si() < 0.1 * stored, run.energy().toString());
        assertTrue(run.energy().relativeBalanceError() < 1e-6, run.energy().toString());
        assertEquals(0, run.secondaryCurrent().at(ms(19.9)).si(), 1e-12);
    }

    @Test
    void badCouplingIsRefusedWithTheValue() {
        for (double k : new double[] {1.2, -0.1, Double.NaN}) {
            String m = assertThrows(IllegalArgumentException.class, () -> Secondary.of(mH(1), ohm(1), k)).getMessage();
            assertTrue(m.contains("coupling coefficient") && m.contains(String.valueOf(k)), m);
        }
        Secondary tooMuch = Secondary.ofMutual(mH(10), ohm(1), mH(20)); // k = 20/√(10·10) = 2
        String m = assertThrows(IllegalArgumentException.class,
                () -> Drive.dc(V(12)).into(Coil.lumped(mH(10), ohm(5))).withSecondary(tooMuch).simulate(ms(1))).getMessage();
        assertTrue(m.contains("k = M/√(L1·L2) = 2.000") && m.contains("from 0 to 1"), m);
        String m1 = assertThrows(IllegalArgumentException.class,
                () -> Drive.dc(V(12)).into(Coil.lumped(mH(10), ohm(5))).withSecondary(Secondary.of(mH(10), ohm(1), 1)).simulate(ms(1))).getMessage();
        assertTrue(m1.contains("below 1"), m1);
    }
}
