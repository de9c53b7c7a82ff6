package org.ampturn.thermal;

import static org.junit.jupiter.api.Assertions.*;

import org.ampturn.units.Quantity;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;
import org.junit.jupiter.api.Test;

/** The thermal network with heat capacity against closed forms and an independent ODE solution. */
class ThermalNetworkTest {
    private static Quantity q(String s) { return Quantity.parse(s); }

    private static final double TA = 298.15;

    @Test
    void oneBodyFollowsTheClosedFormExponential() {
        // lumped capacitance (Newton cooling): θ(t) = P·R·(1 − e^(−t/RC)); C = 50 J/K, R = 20 K/W, τ = 1000 s
        ThermalNetwork n = ThermalNetwork.oneBody(q("50 J/K"), q("20 K/W"));
        HeatingCurve c = n.heat(q("2 W"), q("3000 s"));
        double[] ts = c.timesS(), w = c.windingK();
        assertEquals(501, ts.length);
        for (int i = 0; i < ts.length; i++) {
            double expected = TA + 2 * 20 * (1 - Math.exp(-ts[i] / 1000));
            assertEquals(expected, w[i], 1e-9, "t = " + ts[i]);
        }
        assertEquals(TA + 40 * (1 - Math.exp(-0.6)), c.temperatureAt(q("600 s")).si(), 1e-9);
        assertEquals(1000, n.timeConstants()[0].si(), 1e-9);
        assertEquals(TA + 40, n.steadyTemperature(q("2 W")).si(), 1e-9);
        // from a warm start: θ(t) = θss + (θ0 − θss)·e^(−t/τ)
        HeatingCurve warm = n.heat(q("2 W"), q("500 s"), q("55 degC"));
        assertEquals(TA + 40 + (30 - 40) * Math.exp(-0.5), warm.end().si(), 1e-9);
    }

    /** The two-body equations, integrated independently by Commons Math's Dormand-Prince 8(5,3). */
    private static double[] ode(double cw, double rwf, double cf, double rfa, double p, double t, double[] start) {
        FirstOrderDifferentialEquations eq = new FirstOrderDifferentialEquations() {
            public int getDimension() { return 2; }
            public void computeDerivatives(double time, double[] y, double[] dy) {
                double flow = (y[0] - y[1]) / rwf;
                dy[0] = (p - flow) / cw;
                dy[1] = (flow - y[1] / rfa) / cf;
            }
        };
        double[] y = start.clone();
        new DormandPrince853Integrator(1e-9, 100, 1e-12, 1e-12).integrate(eq, 0, start.clone(), t, y);
        return y;
    }

    @Test
    void twoBodyMatchesAnIndependentOdeSolution() {
        // winding 40 J/K, 3 K/W to a 400 J/K frame, 12 K/W frame to ambient (invented values)
        ThermalNetwork n = ThermalNetwork.twoBody(q("40 J/K"), q("3 K/W"), q("400 J/K"), q("12 K/W"));
        HeatingCurve c = n.heat(q("5 W"), q("100000 s"));
        double[] ts = c.timesS(), w = c.windingK(), f = c.frameK();
        for (int i = 50; i < ts.length; i += 50) {
            double[] y = ode(40, 3, 400, 12, 5, ts[i], new double[] {0, 0});
            assertEquals(y[0], w[i] - TA, 1e-6, "winding at t = " + ts[i]);
            assertEquals(y[1], f[i] - TA, 1e-6, "frame at t = " + ts[i]);
        }
        // steady state: θw = P(Rwf + Rfa) = 75 K, reached after many slow time constants
        assertEquals(TA + 75, c.end().si(), 1e-3);
        // time constants are −1/λ of the system matrix: check λ satisfy det(A − λI) = 0
        for (Quantity tau : n.timeConstants()) {
            double l = -1 / tau.si();
            double a = -1 / (40 * 3.0), b = 1 / (40 * 3.0), cc = 1 / (400 * 3.0), d = -(1 / 3.0 + 1 / 12.0) / 400;
            assertEquals(0, (a - l) * (d - l) - b * cc, 1e-12);
        }
    }

    @Test
    void twoBodyPulsedSequenceMatchesTheOde() {
        ThermalNetwork n = ThermalNetwork.twoBody(q("40 J/K"), q("3 K/W"), q("400 J/K"), q("12 K/W"));
        DutyCycle d = n.duty(q("20 W"), q("30 s"), q("120 s"));
        double[] y = {0, 0};
        for (int k = 1; k <= 5; k++) {
            y = ode(40, 3, 400, 12, 20, 30, y);
            assertEquals(y[0] + TA, d.peakAfter(k).si(), 1e-6, "end of on-time " + k);
            y = ode(40, 3, 400, 12, 0, 90, y);
        }
        // cyclic steady state: run the ODE a long time and compare the peak
        for (int k = 0; k < 1000; k++) {
            y = ode(40, 3, 400, 12, 20, 30, y);
            y = ode(40, 3, 400, 12, 0, 90, y);
        }
        y = ode(40, 3, 400, 12, 20, 30, y);
        assertEquals(y[0] + TA, d.peak().si(), 1e-5);
        assertEquals(TA + 20 * 0.25 * 15, d.mean().si(), 1e-9, "mean = steady state at the mean loss (linear network)");
    }

    @Test
    void geometryGivesCopperCapacityAndStillAirResistance() {
        var w = org.ampturn.wire.Winding.full(org.ampturn.wire.Wire.awg(30),
                org.ampturn.wire.Bobbin.of(q("25 mm"), q("12 mm"), q("8 mm")), org.ampturn.wire.Packing.LAYERED);
        ThermalNetwork n = ThermalNetwork.of(w);
        // C = m·385 J/(kg·K) (copper, typical); R = 1/(12 W/(m²·K) · A)
        assertEquals(w.copperMass().si() * 385, n.windingCapacity().si(), 1e-9);
        assertEquals(1 / (12 * w.surfaceArea().si()), n.resistanceToAmbient().si(), 1e-9);
        ThermalNetwork two = n.withFrame(q("2 K/W"), ThermalNetwork.capacityOf(q("0.2 kg"), ThermalNetwork.STEEL_SPECIFIC_HEAT),
                ThermalNetwork.surfaceResistance(q("12 W/(m^2*K)"), q("60 cm^2")));
        assertTrue(two.hasFrame());
        assertEquals(2 + 1 / (12 * 60e-4), two.resistanceToAmbient().si(), 1e-9);
    }

    @Test
    void longestOnTimeOneBodyClosedForm() {
        // t = τ·ln((θss − θ0)/(θss − θlim)); class 130 (B), allowance 10 K → winding limit 120 °C
        ThermalNetwork n = ThermalNetwork.oneBody(q("50 J/K"), q("20 K/W"));
        double tss = 10 * 20; // 10 W: 200 K steady rise
        double t0 = 40 - 25, lim = 120 - 25;
        double expected = 1000 * Math.log((tss - t0) / (tss - lim));
        assertEquals(expected, n.longestOnTime(q("10 W"), q("40 degC")).si(), 1e-9);
        assertEquals(Double.POSITIVE_INFINITY, n.longestOnTime(q("1 W"), q("40 degC")).si());
        assertEquals(0, n.longestOnTime(q("10 W"), q("125 degC")).si());
    }

    @Test
    void longestOnTimeTwoBodyHitsTheLimit() {
        ThermalNetwork n = ThermalNetwork.twoBody(q("40 J/K"), q("3 K/W"), q("400 J/K"), q("12 K/W"));
        double t = n.longestOnTime(q("20 W"), q("25 degC")).si();
        double[] y = ode(40, 3, 400, 12, 20, t, new double[] {0, 0});
        assertEquals(120 - 25, y[0], 1e-6, "the winding is at the class limit less the allowance then");
    }

    @Test
    void badInputIsRefusedByName() {
        var e = assertThrows(IllegalArgumentException.class, () -> ThermalNetwork.oneBody(q("-5 J/K"), q("20 K/W")));
        assertTrue(e.getMessage().contains("winding heat capacity") && e.getMessage().contains("-5"), e.getMessage());
        ThermalNetwork n = ThermalNetwork.oneBody(q("50 J/K"), q("20 K/W"));
        e = assertThrows(IllegalArgumentException.class, () -> n.dutyPercent(q("2 W"), q("1 s"), 120));
        assertTrue(e.getMessage().contains("120 %"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> n.duty(q("2 W"), q("12 s"), q("10 s")));
        assertTrue(e.getMessage().contains("120 %") && e.getMessage().contains("12.00 s"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> n.withAmbient(q("160 degC")));
        assertTrue(e.getMessage().contains("160.0 °C") && e.getMessage().contains("class 130 (B)"), e.getMessage());
        var hot = n.withInsulationClass(InsulationClass.H).withAmbient(q("150 degC"));
        e = assertThrows(IllegalArgumentException.class, () -> hot.withInsulationClass(InsulationClass.B));
        assertTrue(e.getMessage().contains("150.0 °C"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> ThermalNetwork.twoBody(q("40 J/K"), q("NaN K/W"), q("400 J/K"), q("12 K/W")));
    }

    @Test
    void hotResultsCarryTheCautionAndTheClassWarning() {
        ThermalNetwork n = ThermalNetwork.oneBody(q("50 J/K"), q("20 K/W"));
        HeatingCurve c = n.heat(q("10 W"), q("3000 s"));
        assertFalse(c.withinClass());
        assertTrue(c.warnings().stream().anyMatch(s -> s.contains("exceeds thermal class 130 (B)")), c.warnings().toString());
        assertTrue(c.warnings().stream().anyMatch(s -> s.startsWith("caution") && s.contains("licensed practice")));
        assertTrue(c.toString().contains("OVER class 130 (B)"), c.toString());
    }

    @Test
    void marginsReadInKelvinAndTemperaturesInCelsius() {
        // a 0.66 K margin reads "0.6600 K", not "660.0 mK" (temperature differences in K, absolute ones in °C)
        assertEquals("0.6600 K", HotCoil.kelvin(0.66).toString());
        assertEquals("0.6600 K", Quantity.parse(HotCoil.kelvin(0.66).toString()).toString());
        ThermalNetwork n = ThermalNetwork.oneBody(q("50 J/K"), q("20 K/W"));
        // 4.7 W: steady 119.0 °C, the class B winding limit is 120 °C: margin 1 K less a little
        HeatingCurve c = n.heat(q("4.7 W"), q("100000 s"));
        assertEquals(120 - 25 - 94, c.margin().si(), 1e-6);
        assertTrue(c.toString().contains("1.000 K below class 130 (B)"), c.toString());
    }
}
