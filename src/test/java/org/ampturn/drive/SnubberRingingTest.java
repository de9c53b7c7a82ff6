package org.ampturn.drive;

import static org.ampturn.Ampturn.*;
import static org.junit.jupiter.api.Assertions.*;

import org.ampturn.coil.Coil;
import org.junit.jupiter.api.Test;

/**
 * RC snubber across the switch: after turn-off the coil, its resistance, the snubber resistor and
 * capacitor form a series RLC driven by the supply, with i(0) = I0 and vC(0) = 0 (the capacitor was
 * discharged through the closed switch). Underdamped solution, α = R/(2L), ω0 = 1/√(LC),
 * ωd = √(ω0² − α²): vC(t) = Vs + e^(−αt)·(A·cos ωd·t + B·sin ωd·t), A = −Vs, B = (I0/C + α·A)/ωd
 * (Hayt, Kemmerly and Durbin, Engineering Circuit Analysis, 8th ed., ch. 9, the underdamped series RLC).
 */
class SnubberRingingTest {
    @Test
    void ringingMatchesTheDampedSolution() {
        double l = 0.010, rc = 5, rsn = 100, c = 100e-9, vs = 12, toff = 20e-3;
        Transient run = Drive.dc(V(vs)).into(Coil.lumped(H(l), ohm(rc))).offAt(s(toff), Clamp.snubber(ohm(rsn), F(c)))
                .samples(21_001).tolerance(1e-11).simulate(ms(21)); // 1 µs grid
        double i0 = vs / rc * (1 - Math.exp(-toff * rc / l));
        double rt = rc + rsn;
        double alpha = rt / (2 * l), w0 = 1 / Math.sqrt(l * c), wd = Math.sqrt(w0 * w0 - alpha * alpha);
        double a = -vs;                         // vC(0) − Vs
        double b = (i0 / c + alpha * a) / wd;   // from C·dvC/dt(0) = I0
        double worstI = 0, worstV = 0;
        for (int k = 0; k <= 1000; k++) {
            double t = k * 1e-6;
            double e = Math.exp(-alpha * t), co = Math.cos(wd * t), si = Math.sin(wd * t);
            double vC = vs + e * (a * co + b * si);
            double dv = e * ((-alpha * a + wd * b) * co + (-alpha * b - wd * a) * si);
            double i = c * dv;
            worstI = Math.max(worstI, Math.abs(i - run.current().at(s(toff + t)).si()));
            worstV = Math.max(worstV, Math.abs(vC + i * rsn - run.switchVoltage().at(s(toff + t)).si()));
        }
        assertTrue(worstI < 1e-6 * i0, "current off by " + worstI);
        assertTrue(worstV < 1e-4, "switch voltage off by " + worstV);
        assertTrue(run.energy().relativeBalanceError() < 1e-6, run.energy().toString());
        // the first peak of the switch voltage, from the analytic waveform on a fine grid
        double peak = 0;
        for (int k = 0; k <= 200_000; k++) {
            double t = k * 1e-9;
            double e = Math.exp(-alpha * t), co = Math.cos(wd * t), si = Math.sin(wd * t);
            double vC = vs + e * (a * co + b * si);
            double i = c * e * ((-alpha * a + wd * b) * co + (-alpha * b - wd * a) * si);
            peak = Math.max(peak, vC + i * rsn);
        }
        assertEquals(peak, run.peakSwitchVoltage().si(), 1e-3 * peak);
        assertTrue(run.cautions().stream().anyMatch(x -> x.contains("60 V")));
    }
}
