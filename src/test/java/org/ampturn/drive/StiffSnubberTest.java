package org.ampturn.drive;

import static org.ampturn.Ampturn.*;
import static org.junit.jupiter.api.Assertions.*;

import org.ampturn.coil.Coil;
import org.junit.jupiter.api.Test;

/**
 * A stiff snubber: a 1 H coil with a 100 Ω / 10 nF snubber, switched off for 3 s. The ringing
 * (1.6 kHz) lasts about 0.1 s of a 3 s run, which the explicit integrator could not finish within
 * its evaluation budget. After turn-off the coil, its resistance and the snubber form a series RLC
 * driven by the supply with i(0) = I0, vC(0) = 0: vC(t) = Vs + e^(−αt)·(A·cos ωd·t + B·sin ωd·t),
 * A = −Vs, B = (I0/C + α·A)/ωd, α = R/(2L), ωd = √(1/(LC) − α²) (Hayt, Kemmerly and Durbin,
 * Engineering Circuit Analysis, 8th ed., ch. 9, the underdamped series RLC).
 */
class StiffSnubberTest {
    static final double L = 1, RC = 10, RSN = 100, C = 10e-9, VS = 12, TOFF = 0.5, TEND = 3.5;

    @Test
    void finishesAndMatchesTheSeriesRlcSolution() {
        Transient run = Drive.dc(V(VS)).into(Coil.lumped(H(L), ohm(RC))).offAt(s(TOFF), Clamp.snubber(ohm(RSN), F(C)))
                .samples(350_001).simulate(s(TEND)); // 10 µs grid
        assertTrue(run.notes().stream().anyMatch(x -> x.contains("closed form")), run.notes().toString());
        double i0 = VS / RC * (1 - Math.exp(-TOFF * RC / L));
        double rt = RC + RSN;
        double alpha = rt / (2 * L), w0 = 1 / Math.sqrt(L * C), wd = Math.sqrt(w0 * w0 - alpha * alpha);
        double a = -VS, b = (i0 / C + alpha * a) / wd;
        double worstI = 0, worstV = 0;
        for (int k = 1; k < 300_000; k++) { // from the first sample after the off instant (a sample on it holds the state before)
            double t = k * 1e-5;
            double e = Math.exp(-alpha * t), co = Math.cos(wd * t), si = Math.sin(wd * t);
            double vC = VS + e * (a * co + b * si);
            double i = C * e * ((-alpha * a + wd * b) * co + (-alpha * b - wd * a) * si);
            worstI = Math.max(worstI, Math.abs(i - run.current().at(s(TOFF + t)).si()));
            worstV = Math.max(worstV, Math.abs(vC + i * RSN - run.switchVoltage().at(s(TOFF + t)).si()));
        }
        assertTrue(worstI < 1e-9 * i0, "current off by " + worstI);
        double vPeak = i0 * Math.sqrt(L / C); // scale of the ringing
        assertTrue(worstV < 1e-9 * vPeak, "switch voltage off by " + worstV);
        assertTrue(run.energy().relativeBalanceError() < 1e-9, run.energy().toString());

        // the first maximum of vSW = vC + R·i: d/dt(vC + R·i) = i/C + R·di/dt = 0, solved by bisection on the closed form
        double lo = 0, hi = Math.PI / (2 * wd);
        for (int it = 0; it < 200; it++) {
            double mid = (lo + hi) / 2;
            if (slope(mid, alpha, wd, a, b, i0) > 0) lo = mid; else hi = mid;
        }
        double tp = lo, e = Math.exp(-alpha * tp), co = Math.cos(wd * tp), si = Math.sin(wd * tp);
        double peak = VS + e * (a * co + b * si) + RSN * C * e * ((-alpha * a + wd * b) * co + (-alpha * b - wd * a) * si);
        assertEquals(peak, run.peakSwitchVoltage().si(), 1e-9 * peak);
    }

    /** d vSW/dt of the closed form: i/C + R·di/dt. */
    private static double slope(double t, double alpha, double wd, double a, double b, double i0) {
        double e = Math.exp(-alpha * t), co = Math.cos(wd * t), si = Math.sin(wd * t);
        double p = -alpha * a + wd * b, q = -alpha * b - wd * a;
        double i = C * e * (p * co + q * si);
        double di = C * e * ((-alpha * p + wd * q) * co + (-alpha * q - wd * p) * si);
        return i / C + RSN * di;
    }

    @Test
    void peakIsLocatedBetweenCoarseSamples() {
        // 201 samples over 3.5 s: the samples miss the 0.16 ms ringing entirely; the event still finds its peak
        Transient coarse = Drive.dc(V(VS)).into(Coil.lumped(H(L), ohm(RC))).offAt(s(TOFF), Clamp.snubber(ohm(RSN), F(C)))
                .samples(201).simulate(s(TEND));
        Transient fine = Drive.dc(V(VS)).into(Coil.lumped(H(L), ohm(RC))).offAt(s(TOFF), Clamp.snubber(ohm(RSN), F(C)))
.samples(3_501).simulate(s(TEND));
        assertEquals(fine.peakSwitchVoltage().si(), coarse.peakSwitchVoltage().si(), 1e-9 * fine.peakSwitchVoltage().si());
        assertTrue(coarse.energy().relativeBalanceError() < 1e-9, coarse.energy().toString());
    }

    @Test
    void switchResistanceAndPwmAgreeWithTheIntegrator() {
        // a cross-check of the closed-form pieces with the switch closed (the snubber then discharges through
        // Ron, coupled to the coil) against the Dormand-Prince integration of the same equations
        Circuit c = Drive.pwm(V(12), kHz(2), 0.6).withSwitchResistance(ohm(2)).withSourceResistance(ohm(0.5))
                .into(Coil.lumped(mH(10), ohm(5))).clamp(Clamp.snubber(ohm(100), nF(100))).samples(4001);
        Transient exact = c.simulate(ms(4)), num = c.numeric().tolerance(1e-11).simulate(ms(4));
        assertTrue(exact.notes().stream().anyMatch(x -> x.contains("matrix exponential")), exact.notes().toString());
        double worstI = 0, worstV = 0;
        for (int k = 0; k < 4000; k++) {
            double t = k * 1e-6;
            worstI = Math.max(worstI, Math.abs(exact.current().at(s(t)).si() - num.current().at(s(t)).si()));
            worstV = Math.max(worstV, Math.abs(exact.switchVoltage().at(s(t)).si() - num.switchVoltage().at(s(t)).si()));
        }
        assertTrue(worstI < 1e-6, "current differs by " + worstI);
        assertTrue(worstV < 1e-3, "switch voltage differs by " + worstV);
        assertEquals(num.energy().clamp().si(), exact.energy().clamp().si(), 1e-6 * num.energy().clamp().si());
        assertEquals(num.energy().driveLoss().si(), exact.energy().driveLoss().si(), 1e-6 * num.energy().driveLoss().si());
        assertTrue(exact.energy().relativeBalanceError() < 1e-9, exact.energy().toString());
        assertTrue(exact.peakSwitchVoltage().si() >= num.peakSwitchVoltage().si() - 1e-6, exact.peakSwitchVoltage() + " " + num.peakSwitchVoltage());
    }
}
