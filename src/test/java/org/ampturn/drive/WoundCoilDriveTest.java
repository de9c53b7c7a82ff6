package org.ampturn.drive;

import static org.ampturn.Ampturn.*;
import static org.junit.jupiter.api.Assertions.*;

import org.ampturn.coil.AirGap;
import org.ampturn.coil.Coil;
import org.ampturn.coil.Core;
import org.ampturn.coil.MagneticCircuit;
import org.ampturn.coil.WoundCoil;
import org.ampturn.material.Materials;
import org.ampturn.units.Quantity;
import org.junit.jupiter.api.Test;

/** A wound coil on a B-H table core from the magnetics library, driven into saturation. */
class WoundCoilDriveTest {
    // an invented gapped silicon-steel core: 80 mm path, 1 cm², 0.2 mm gap
    private final MagneticCircuit core = MagneticCircuit.series(Core.of(mm(80), cm2(1), Materials.SILICON_STEEL), AirGap.of(mm(0.2), cm2(1)));

    @Test
    void noResistanceGivesVoltTimesTimeAndTheCoreCurve() {
        WoundCoil wound = WoundCoil.of(200, ohm(1), core);
        Coil coil = withoutResistance(wound);
        Transient run = Drive.dc(V(5)).into(coil).simulate(ms(10));
        double[] t = run.current().times(), i = run.current().values(), lam = run.fluxLinkage().values();
        for (int k = 0; k < t.length; k += 100) {
            assertEquals(5 * t[k], lam[k], 1e-9 * Math.max(5 * t[k], 1e-4)); // Faraday's law, λ = ∫v dt
            assertEquals(coil.currentAt(5 * t[k]), i[k], 1e-7 * Math.max(i[k], 1e-3));
        }
        // 50 mWb over 200 turns and 1 cm²: B = 2.5 T, deep in saturation, so the current runs far past the small-signal ramp
        assertTrue(run.current().last().si() > 5 * 0.05 / coil.inductance().si(), run.current().toString());
        assertTrue(run.energy().relativeBalanceError() < 1e-6, run.energy().toString());
    }

    @Test
    void saturatingTurnOffBalances() {
        WoundCoil coil = WoundCoil.of(200, ohm(2), core);
        Transient run = Drive.dc(V(24)).into(coil).offAt(ms(10), Clamp.zener(V(36))).simulate(ms(20));
        assertTrue(run.energy().relativeBalanceError() < 1e-6, run.energy().toString());
        assertEquals(12, run.current().at(ms(10)).si(), 1e-3);
        assertTrue(run.decayTime().si() > 0);
    }

    /** The wound coil's magnetics with the winding resistance taken out (a wound coil needs R > 0). */
    private static Coil withoutResistance(WoundCoil w) {
        return new Coil() {
            public Quantity inductance() { return w.inductance(); }
            public Quantity resistance() { return ohm(0); }
            public Quantity temperature() { return w.temperature(); }
            public double fluxLinkageAt(double a) { return w.fluxLinkageAt(a); }
            public double currentAt(double l) { return w.currentAt(l); }
            public double incrementalInductanceAt(double a) { return w.incrementalInductanceAt(a); }
            public double resistanceAt(double k) { return 0; }
            public String describe() { return w.describe() + " without resistance"; }
            public boolean isLinear() { return w.isLinear(); }
            public Coil atTemperature(Quantity t) { return this; }
        };
    }
}
