package org.ampturn.drive;

import static org.ampturn.Ampturn.*;
import static org.junit.jupiter.api.Assertions.*;

import org.ampturn.coil.Coil;
import org.junit.jupiter.api.Test;

/** A coil driven into saturation: the state is flux linkage, the current comes from the core's curve. */
class SaturatingCoreTest {
    private final SaturatingCoil core = new SaturatingCoil(10e-3, 1.0, 0.5e-3, 0);

    @Test
    void fluxLinkageIsVoltTimesTimeWithNoResistance() {
        // Faraday's law, v = dλ/dt (e.g. Hayt and Buck, Engineering Electromagnetics, ch. 9, from memory): λ = V·t for R = 0
        Transient run = Drive.dc(V(1)).into(core).simulate(ms(20));
        double[] t = run.fluxLinkage().times(), lam = run.fluxLinkage().values(), i = run.current().values();
        for (int k = 0; k < t.length; k += 50) {
            assertEquals(1.0 * t[k], lam[k], 1e-9 * Math.max(t[k], 1e-3), "λ at " + t[k]);
            assertEquals(core.currentAt(t[k]), i[k], 1e-8 * Math.max(i[k], 1), "i at " + t[k]);
        }
        // the sharp rise: at 20 ms the saturated core carries far more than a linear coil of the same L0 would
        double linear = 0.020 / core.inductance().si();
        assertTrue(run.current().last().si() > 10 * linear, run.current().toString());
        // with R = 0 every joule supplied is stored: W = λ·i − co-energy, co-energy in closed form
        double iEnd = run.current().last().si();
        double w = 0.020 * iEnd - core.coEnergyAt(iEnd);
        assertEquals(w, run.energy().stored().si(), 1e-9 * w);
        assertEquals(w, run.energy().supplied().si(), 1e-8 * w);
        assertTrue(run.energy().relativeBalanceError() < 1e-8, run.energy().toString());
    }

    @Test
    void saturatingCoilWithZenerTurnOffBalancesAndDecaysFasterThanTheLinearBound() {
        SaturatingCoil c = new SaturatingCoil(40e-3, 0.5, 2e-3, 4);
        Transient run = Drive.dc(V(12)).into(c).offAt(ms(20), Clamp.zener(V(24))).tolerance(1e-8).simulate(ms(40));
        assertTrue(run.energy().relativeBalanceError() < 1e-6, run.energy().toString());
        assertEquals(3.0, run.finalCurrent().si(), 1e-12);
        assertEquals(3.0, run.current().at(ms(20)).si(), 1e-3);
        // the decay cannot be slower than that of a linear coil with the small-signal inductance (L0 ≥ dλ/di everywhere)
        double l0 = c.inductance().si();
        double bound = l0 / 4 * Math.log(1 + 4 * 3.0 / 24.7); // Hayt et al. ch. 8 with L = L0
        assertTrue(run.decayTime().si() < bound, run.decayTime() + " vs " + bound);
        assertTrue(run.decayTime().si() > 0);
    }

    @Test
    void storedEnergyQuadratureMatchesTheCoEnergy() {
        Load load = Load.of(new SaturatingCoil(10e-3, 1.0, 0.5e-3, 1));
        SaturatingCoil c = new SaturatingCoil(10e-3, 1.0, 0.5e-3, 1);
        for (double lam : new double[] {1e-4, 3e-3, 0.01, 0.02, 0.015, 0.005, 0}) {
            double i = c.currentAt(lam);
            double expected = lam * i - c.coEnergyAt(i); // W = λi − W' (Legendre transform; Fitzgerald et al., Electric Machinery, ch. 3)
            assertEquals(expected, load.fieldEnergyAt(lam, 0), 1e-10 * Math.max(expected, 1e-9), "W at λ = " + lam);
        }
    }

    @Test
    void linearCoilOdeAndClosedFormAgreeOnANonTrivialDrive() {
        Coil lin = Coil.lumped(mH(20), ohm(3));
        Circuit c = Drive.peakAndHold(V(24), A(3), A(1)).withSourceResistance(ohm(0.5)).withSwitchResistance(mohm(80))
                .into(lin).offAt(ms(25), Clamp.zener(V(30)));
        Transient exact = c.simulate(ms(30));
        Transient ode = c.numeric().simulate(ms(30));
        double[] a = exact.current().values(), b = ode.current().values();
        double worst = 0;
        for (int k = 0; k < a.length; k++) worst = Math.max(worst, Math.abs(a[k] - b[k]));
        assertTrue(worst < 1e-6, "worst difference " + worst);
        assertEquals(exact.energy().clamp().si(), ode.energy().clamp().si(), 1e-8);
    }
}
