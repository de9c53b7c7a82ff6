package org.ampturn.drive;

import static org.ampturn.Ampturn.*;
import static org.junit.jupiter.api.Assertions.*;

import org.ampturn.coil.Coil;
import org.junit.jupiter.api.Test;

/**
 * A linear RL coil on a sine supply v = √2·V·sin(ωt + φ) switched on at t = 0. Closed form
 * (Hayt, Kemmerly and Durbin, Engineering Circuit Analysis, 8th ed., ch. 10, the sinusoidal forced
 * response by phasors, plus the natural response of ch. 8 that makes i(0) = 0):
 * i(t) = Ipk·sin(ωt + φ − θ) − Ipk·sin(φ − θ)·e^(−t/τ), Ipk = √2·V/√(R² + ω²L²), θ = atan(ωL/R), τ = L/R.
 * The steady part is the phasor solution I = V/(R + jωL); the decaying term is the DC offset.
 */
class SineSupplyTest {
    static final double L = 0.5, R = 20, V = 24, F = 50;

    private static double closedForm(double t, double phiDeg) {
        double w = 2 * Math.PI * F, ipk = Math.sqrt(2) * V / Math.hypot(R, w * L), th = Math.atan2(w * L, R);
        double phi = Math.toRadians(phiDeg);
        return ipk * Math.sin(w * t + phi - th) - ipk * Math.sin(phi - th) * Math.exp(-t * R / L);
    }

    private static Transient run(double phase, int samples, double seconds) {
        return Drive.sine(V(V), Hz(F)).withSwitchOnPhase(phase).into(Coil.lumped(H(L), ohm(R)))
                .samples(samples).tolerance(1e-10).simulate(s(seconds));
    }

    @Test
    void switchOnTransientMatchesTheClosedFormWithItsDcOffset() {
        for (double phase : new double[] {0, 90, 237.5}) {
            Transient r = run(phase, 4001, 0.2);
            double ipk = Math.sqrt(2) * V / Math.hypot(R, 2 * Math.PI * F * L), worst = 0;
            for (int k = 0; k < 4001; k++) {
                double t = k * 0.2 / 4000;
                worst = Math.max(worst, Math.abs(r.current().at(s(t)).si() - closedForm(t, phase)));
            }
            assertTrue(worst < 1e-6 * ipk, "phase " + phase + ": current off by " + worst);
            assertTrue(r.energy().relativeBalanceError() < 1e-6, r.energy().toString());
        }
    }

    @Test
    void zeroCrossingSwitchOnGivesTheInrushAPeakSwitchOnDoesNot() {
        Transient zero = run(0, 4001, 0.2), peak = run(90, 4001, 0.2);
        double w = 2 * Math.PI * F, ipk = Math.sqrt(2) * V / Math.hypot(R, w * L);
        // the first current peak: nearly twice the steady peak at a zero crossing (ωL/R = 7.9), about the steady peak at a voltage peak
        double first0 = 0, first90 = 0;
        for (int k = 0; k <= 400; k++) {
            double t = k * 0.02 / 400;
            first0 = Math.max(first0, closedForm(t, 0));
            first90 = Math.max(first90, closedForm(t, 90));
        }
        assertEquals(first0, zero.peakCurrent().si(), 2e-3 * first0);
        assertTrue(first0 > 1.6 * ipk && zero.peakCurrent().si() > 1.6 * ipk);
        assertTrue(peak.peakCurrent().si() < 1.1 * ipk);
    }

    @Test
    void lastCycleMatchesThePhasorSolution() {
        // after 1 s (τ = 25 ms, 40 time constants) the offset is gone: RMS = V/|Z|, peak = √2·V/|Z| (phasor solution)
        Transient r = run(0, 20001, 1.0);
        double z = Math.hypot(R, 2 * Math.PI * F * L);
        assertEquals(V / z, r.lastCycleRmsCurrent().si(), 1e-7 * V / z);
        assertEquals(Math.sqrt(2) * V / z, r.lastCyclePeakCurrent().si(), 1e-4 * V / z); // peak from the 50 µs samples and steps
        // the phase: i lags v by θ = atan(ωL/R); the current's zero crossing in the last cycle comes θ/ω after the voltage's
        double w = 2 * Math.PI * F, th = Math.atan2(w * L, R), tz = 0.98 + th / w;
        assertEquals(0, r.current().at(s(tz)).si(), 1e-6 * V / z);
        assertTrue(r.cautions().isEmpty(), r.cautions().toString());
    }

    @Test
    void aSaturatingCoreRunsThroughTheNumericalPath() {
        // knee far above the current: the nonlinear path must give the phasor RMS of the small-signal L
        double l = 0.5, r = 20, z = Math.hypot(r, 2 * Math.PI * F * l);
        Transient soft = Drive.sine(V(V), Hz(F)).into(new SaturatingCoil(l - 1e-3, 1e6, 1e-3, r)).tolerance(1e-10).simulate(s(1));
        assertTrue(soft.notes().stream().anyMatch(x -> x.contains("Dormand")), soft.notes().toString());
        assertEquals(V / z, soft.lastCycleRmsCurrent().si(), 1e-5 * V / z);
        // driven into saturation (knee 0.1 A against a steady peak of 0.21 A): the current peaks sharply,
        // its crest factor (peak/RMS) is well above the √2 of a sine (common practice for saturating cores)
        Transient hard = Drive.sine(V(V), Hz(F)).into(new SaturatingCoil(l, 0.1, 0.01, r)).samples(20_001).simulate(s(1));
        double crest = hard.lastCyclePeakCurrent().si() / hard.lastCycleRmsCurrent().si();
        assertTrue(crest > 1.6, "crest factor " + crest);
        assertTrue(hard.energy().relativeBalanceError() < 1e-6, hard.energy().toString());
    }

    @Test
    void mainsVoltageCarriesACaution() {
        Transient r = Drive.sine(V(230), Hz(50)).withSwitchOnPhase(90).into(Coil.lumped(H(2), ohm(400))).simulate(ms(100));
        assertTrue(r.cautions().stream().anyMatch(c -> c.contains("above 50 V RMS") && c.contains("licensed practice")), r.cautions().toString());
    }

    @Test
    void badInputIsRefusedWithTheValue() {
        String m0 = assertThrows(IllegalArgumentException.class, () -> Drive.sine(V(24), Hz(0))).getMessage();
        assertTrue(m0.contains("frequency"), m0);
        String mn = assertThrows(IllegalArgumentException.class, () -> Drive.sine(V(24), Hz(Double.NaN))).getMessage();
        assertTrue(mn.contains("NaN"), mn); // refused where the quantity is made
        Drive d = Drive.sine(V(24), Hz(50));
        String m = assertThrows(IllegalArgumentException.class, () -> d.withSwitchOnPhase(360)).getMessage();
        assertTrue(m.contains("360"), m);
        assertThrows(IllegalArgumentException.class, () -> d.withSwitchOnPhase(-1));
        assertThrows(IllegalArgumentException.class, () -> d.withSwitchOnPhase(Double.NaN));
        // switching off works into a clamp across the coil (RectifiedSineTest); a clamp across the switch is refused
        assertThrows(IllegalArgumentException.class,
                () -> d.into(Coil.lumped(H(1), ohm(10))).offAt(ms(5), Clamp.none(V(400))).simulate(ms(10)));
    }
}
