package org.ampturn.drive;

import static org.ampturn.Ampturn.*;
import static org.junit.jupiter.api.Assertions.*;

import org.ampturn.coil.Coil;
import org.ampturn.units.Dimension;
import org.junit.jupiter.api.Test;

class SignalTest {
    @Test
    void statisticsOfASampledSine() {
        int n = 1001;
        double[] t = new double[n], v = new double[n];
        for (int k = 0; k < n; k++) {
            t[k] = k * 1e-5;                       // 10 ms = one period of 100 Hz
            v[k] = 2 + 3 * Math.sin(2 * Math.PI * 100 * t[k]);
        }
        Signal s = Signal.of("volts", Dimension.VOLTAGE, t, v);
        // rms of a + b·sin over whole periods = √(a² + b²/2) (Hayt et al., Engineering Circuit Analysis, ch. 11)
        assertEquals(Math.sqrt(4 + 4.5), s.rms().si(), 1e-12);
        assertEquals(2, s.mean().si(), 1e-12);
        assertEquals(5, s.peak().si(), 1e-12);
        assertEquals(-1, s.min().si(), 1e-12);
        assertEquals(2 + 3 * Math.sin(2 * Math.PI * 100 * 2.5e-3), s.at(ms(2.5)).si(), 1e-12);
        assertEquals(2, s.mean(ms(0), ms(10)).si(), 1e-12);
        assertEquals(n, s.size());
        assertTrue(s.toString().startsWith("volts: 1001 samples"), s.toString());
        assertThrows(IllegalArgumentException.class, () -> s.at(ms(11)));
        assertThrows(IllegalArgumentException.class, () -> s.at(V(1)));
        double[] copy = s.values();
        copy[0] = 99;
        assertEquals(2, s.values()[0], 1e-12, "values() must be a copy");
    }

    @Test
    void linearInterpolationAndMeanOfARamp() {
        Signal s = Signal.of("amps", Dimension.CURRENT, new double[] {0, 1, 2}, new double[] {0, 2, 4});
        assertEquals(3, s.at(s(1.5)).si(), 1e-15);
        assertEquals(2, s.mean().si(), 1e-15);
        assertEquals(3, s.mean(s(1), s(2)).si(), 1e-15);
        assertThrows(IllegalArgumentException.class, () -> Signal.of("x", Dimension.NONE, new double[] {0, 2, 1}, new double[3]));
    }

    @Test
    void transientExposesEverySignalAndMarker() {
        Transient run = Drive.dc(V(12)).into(Coil.lumped(mH(10), ohm(5))).offAt(ms(20), Clamp.diode()).simulate(ms(40));
        assertTrue(run.signals().size() >= 13);
        for (Signal s : run.signals()) assertEquals(2001, s.size(), s.name());
        assertTrue(run.markers().stream().anyMatch(m -> m.label().equals("τ")));
        assertTrue(run.markers().stream().anyMatch(m -> m.label().equals("peak switch voltage") && Math.abs(m.value().si() - 12.7) < 1e-9));
        assertTrue(run.markers().stream().anyMatch(m -> m.label().equals("switch off")));
        assertTrue(run.cautions().isEmpty(), run.cautions().toString());
        assertThrows(IllegalStateException.class, run::position);
        assertThrows(IllegalArgumentException.class, () -> run.power("heat"));
        assertEquals(run.power("coil").at(ms(10)).si(), Math.pow(run.current().at(ms(10)).si(), 2) * 5, 1e-9);
        // coil voltage = resistor voltage + L·di/dt: at the start all 12 V are across the inductance
        assertEquals(12, run.coilVoltage().at(ms(0)).si(), 1e-12);
        assertEquals(0, run.resistorVoltage().at(ms(0)).si(), 1e-12);
        assertTrue(run.toString().contains("τ 2.000 ms"), run.toString());
    }

    @Test
    void hotCoilHasMoreResistance() {
        // copper, α20 = 0.00393 /K (IEC 60028): R(80 °C) = 5 Ω·(1 + 0.00393·60)
        Transient run = Drive.dc(V(12)).into(Coil.lumped(mH(10), ohm(5))).at(degC(80)).simulate(ms(40));
        assertEquals(12 / (5 * (1 + 0.00393 * 60)), run.finalCurrent().si(), 1e-12);
    }
}
