package org.ampturn.thermal;

import static org.junit.jupiter.api.Assertions.*;

import org.ampturn.coil.Coil;
import org.ampturn.drive.Clamp;
import org.ampturn.drive.Drive;
import org.ampturn.drive.Transient;
import org.ampturn.units.Quantity;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;
import org.junit.jupiter.api.Test;

/** Resistance following the winding temperature, against an independent ODE and the drive's own energy ledger. */
class ElectroThermalRunTest {
    private static Quantity q(String s) { return Quantity.parse(s); }

    private static final double ALPHA = 0.00393, TA = 298.15; // IEC 60028 copper (Coil.lumped)

    @Test
    void holdMatchesTheCoupledOde() {
        // C dθ/dt = V²/(R20·(1 + α(Ta + θ − 293.15))) − θ/R, integrated by Commons Math (independent of the network's exact steps)
        double c = 60, rth = 25, r20 = 40, v = 24;
        ThermalNetwork n = ThermalNetwork.oneBody(q("60 J/K"), q("25 K/W")).withInsulationClass(InsulationClass.F);
        ElectroThermalRun run = ElectroThermalRun.hold(n, Coil.lumped(q("50 mH"), q("40 ohm")), 2000, q("24 V"), q("6000 s"));
        FirstOrderDifferentialEquations eq = new FirstOrderDifferentialEquations() {
            public int getDimension() { return 1; }
            public void computeDerivatives(double t, double[] y, double[] dy) {
                dy[0] = (v * v / (r20 * (1 + ALPHA * (TA + y[0] - 293.15))) - y[0] / rth) / c;
            }
        };
        double[] y = {0};
        new DormandPrince853Integrator(1e-6, 100, 1e-12, 1e-12).integrate(eq, 0, new double[] {0}, 6000, y);
        assertEquals(TA + y[0], run.finalTemperature().si(), 0.02);
        double rHot = r20 * (1 + ALPHA * (run.finalTemperature().si() - 293.15));
        assertEquals(v / rHot, run.currentHot().si(), 1e-3 * v / rHot);
        assertEquals(v / (r20 * (1 + ALPHA * 5)), run.currentCold().si(), 1e-12);
        assertEquals(1 - run.currentHot().si() / run.currentCold().si(), run.currentDrop(), 1e-12);
        assertEquals(2000 * run.currentHot().si(), run.ampereTurnsHot().si(), 1e-9);
        assertTrue(run.toString().contains("→") && run.toString().contains("%"), run.toString());
    }

    @Test
    void eachCycleHeatsByTheDrivesCopperEnergy() {
        // a very large capacity and resistance: the winding rise after one cycle is E/C, E the run's resistive energy (its ledger)
        ThermalNetwork n = ThermalNetwork.oneBody(q("1e6 J/K"), q("1e5 K/W"));
        Coil coil = Coil.lumped(q("200 mH"), q("20 ohm"));
        java.util.function.Function<Coil, Transient> cycle = c -> Drive.dc(q("24 V")).into(c).offAt(q("50 ms"), Clamp.diode()).simulate(q("100 ms"));
        ElectroThermalRun run = ElectroThermalRun.cycles(n, coil, 1000, cycle, 1);
        double e = cycle.apply(coil.atTemperature(q("25 degC"))).energy().resistive().si();
        assertEquals(e / 1e6, run.finalTemperature().si() - TA, 2e-3 * e / 1e6);
    }

    @Test
    void repeatedCyclesLowerTheCurrentAsTheCoilHeats() {
        ThermalNetwork n = ThermalNetwork.oneBody(q("5 J/K"), q("20 K/W")).withInsulationClass(InsulationClass.H);
        Coil coil = Coil.lumped(q("5 mH"), q("20 ohm"));
        ElectroThermalRun run = ElectroThermalRun.cycles(n, coil, 800,
                c -> Drive.dc(q("12 V")).into(c).offAt(q("0.5 s"), Clamp.diode()).samples(201).simulate(q("1 s")), 300);
        // the last cycle starts at the temperature the curve reached after 299 cycles; its peak current is V/R there
        double[] t = run.curve().timesS(), w = run.curve().windingK();
        double startLast = w[299 * 16];
        assertEquals(299.0, t[299 * 16], 1e-9);
        double r = 20 * (1 + ALPHA * (startLast - 293.15));
        assertEquals(12 / r, run.currentHot().si(), 1e-4 * 12 / r);
        assertTrue(run.currentDrop() > 0.05, run.toString());
        assertTrue(run.currentsA()[0] > run.currentsA()[299]);
    }
}
