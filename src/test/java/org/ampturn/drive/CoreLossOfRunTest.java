package org.ampturn.drive;

import static org.ampturn.Ampturn.*;
import static org.junit.jupiter.api.Assertions.*;

import org.ampturn.coil.Coil;
import org.ampturn.coil.Core;
import org.ampturn.coil.WoundCoil;
import org.ampturn.material.CoreLoss;
import org.ampturn.material.Materials;
import org.junit.jupiter.api.Test;

/**
 * Core loss from a run's flux. A ferrite core driven by PWM (1 V, 1 kHz, duty 0.5) with a 2 V clamp
 * across the coil and a negligible resistance: the flux rises for t1 = 0.5 ms and falls for
 * t2 = t1·1 V/2 V = 0.25 ms back to zero, then rests: a triangle of swing ΔB = V·t1/(N·A) each
 * period. The iGSE of a piecewise-linear loop (Venkatachalam, Sullivan, Abdallah and Tacca, "Accurate
 * prediction of ferrite core loss with nonsinusoidal waveforms using only Steinmetz parameters",
 * IEEE COMPEL 2002, eq. for piecewise-linear waveforms): E = k_i·ΔB^β·(t1^(1−α) + t2^(1−α)) per period
 * per volume; a resting flux costs nothing.
 */
class CoreLossOfRunTest {
    @Test
    void triangleFluxOfAPwmRunMatchesTheIgseClosedForm() {
        int n = 100;
        double len = 0.05, area = 50e-6, vs = 1, t1 = 0.5e-3, t2 = 0.25e-3;
        Core core = Core.of(m(len), q("50 mm^2"), Materials.MNZN_FERRITE);
        WoundCoil coil = WoundCoil.of(n, ohm(1e-6), core);
        // the core loss left out of the circuit: the flux is the lossless triangle, the iGSE is taken afterwards
        Transient run = Drive.pwm(V(vs), kHz(1), 0.5).into(coil).clamp(Clamp.zener(V(2), V(0))).withoutCoreLoss()
                .samples(10_001).simulate(ms(10)); // 1 µs grid: the corners fall on samples
        CoreLoss cl = Materials.MNZN_FERRITE.coreLoss().orElseThrow();
        double db = vs * t1 / (n * area);
        double a = cl.alpha(), b = cl.beta();
        double perPeriod = cl.ki() * Math.pow(db, b) * (Math.pow(t1, 1 - a) + Math.pow(t2, 1 - a)) * len * area;
        assertEquals(10 * perPeriod, run.coreLossEnergy().si(), 1e-5 * 10 * perPeriod);
        assertTrue(run.notes().stream().anyMatch(x -> x.contains("core loss") && x.contains("not in it")), run.notes().toString());
        assertTrue(run.energy().relativeBalanceError() < 1e-6, run.energy().toString());
    }

    @Test
    void aCoilWithoutLossDataReportsNone() {
        assertTrue(Double.isNaN(Drive.dc(V(12)).into(Coil.lumped(mH(10), ohm(5))).simulate(ms(10)).coreLossEnergy().si()));
        Core core = Core.of(m(0.05), q("50 mm^2"), Materials.NIZN_FERRITE);
        assertTrue(Double.isNaN(Drive.dc(V(1)).into(WoundCoil.of(100, ohm(1), core)).simulate(ms(1)).coreLossEnergy().si()));
    }
}
