package org.ampturn.drive;

import static org.ampturn.Ampturn.*;
import static org.junit.jupiter.api.Assertions.*;

import org.ampturn.coil.Coil;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Turn-off into a constant-voltage clamp: L·di/dt = −(Vz + R·i) gives the decay time to zero
 * t = (L/R)·ln(1 + R·I0/Vz) (first-order response with a constant source, Hayt, Kemmerly and Durbin,
 * Engineering Circuit Analysis, 8th ed., ch. 8; the formula as stated in relay-driver practice).
 */
class ClampDecayTest {
    private final Coil coil = Coil.lumped(mH(50), ohm(10));
    private final double l = 0.050, r = 10;

    private Circuit base(boolean numeric) {
        Circuit c = Drive.dc(V(24)).into(coil).samples(4001);
        return numeric ? c.numeric() : c;
    }

    @ParameterizedTest
    @ValueSource(booleans = {false, true})
    void zenerDecayTime(boolean numeric) {
        Transient run = base(numeric).offAt(ms(30), Clamp.zener(V(33), V(0))).simulate(ms(40));
        double i0 = 2.4 * (1 - Math.exp(-30e-3 * r / l));
        double expected = l / r * Math.log(1 + r * i0 / 33); // Hayt et al. ch. 8
        assertEquals(expected, run.decayTime().si(), numeric ? 1e-9 : 1e-13);
        assertEquals(24 + 33, run.peakSwitchVoltage().si(), 1e-6); // switch sees Vs + Vz (common practice)
        assertTrue(run.energy().relativeBalanceError() < 1e-6, run.energy().toString());
        // the zener takes the stored energy less what the winding burns in the decay
        assertEquals(0.5 * l * i0 * i0, run.energy().clamp().si() + (run.energy().resistive().si() - resistiveUntilOff(run)), 1e-6);
    }

    private static double resistiveUntilOff(Transient run) {
        // resistive energy at the off instant from the dissipated-energy signal (sample at 30 ms)
        return run.dissipatedEnergy().at(ms(30)).si();
    }

    @ParameterizedTest
    @ValueSource(booleans = {false, true})
    void diodeDropDecayTime(boolean numeric) {
        Transient run = base(numeric).offAt(ms(30), Clamp.diode(V(0.8))).simulate(ms(60));
        double i0 = 2.4 * (1 - Math.exp(-30e-3 * r / l));
        assertEquals(l / r * Math.log(1 + r * i0 / 0.8), run.decayTime().si(), numeric ? 1e-9 : 1e-13); // Hayt et al. ch. 8
    }

    @ParameterizedTest
    @ValueSource(booleans = {false, true})
    void tvsAcrossTheSwitchDecaysAgainstClampMinusSupply(boolean numeric) {
        // with the clamp across the switch the coil sees −(Vc − Vs): t = (L/R)·ln(1 + R·I0/(Vc − Vs)) (Hayt et al. ch. 8)
        Transient run = base(numeric).offAt(ms(30), Clamp.tvs(V(40))).simulate(ms(40));
        double i0 = 2.4 * (1 - Math.exp(-30e-3 * r / l));
        assertEquals(l / r * Math.log(1 + r * i0 / (40 - 24)), run.decayTime().si(), numeric ? 1e-9 : 1e-13);
        assertEquals(40, run.peakSwitchVoltage().si(), 1e-9);
        assertTrue(run.energy().relativeBalanceError() < 1e-6, run.energy().toString());
    }

    @ParameterizedTest
    @ValueSource(booleans = {false, true})
    void avalancheWithoutClampWarnsAboutTheSwitch(boolean numeric) {
        Transient run = base(numeric).offAt(ms(30), Clamp.none(V(100))).simulate(ms(40));
        double i0 = 2.4 * (1 - Math.exp(-30e-3 * r / l));
        assertEquals(l / r * Math.log(1 + r * i0 / (100 - 24)), run.decayTime().si(), numeric ? 1e-9 : 1e-13);
        assertTrue(run.cautions().stream().anyMatch(c -> c.contains("avalanche")), run.cautions().toString());
        assertTrue(run.cautions().stream().anyMatch(c -> c.contains("60 V")), run.cautions().toString());
        assertTrue(run.cautions().stream().anyMatch(c -> c.contains("local codes and licensed practice")));
        assertTrue(run.toString().contains("CAUTION"));
    }
}
