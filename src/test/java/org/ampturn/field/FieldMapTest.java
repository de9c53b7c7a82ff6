package org.ampturn.field;

import static org.junit.jupiter.api.Assertions.*;

import java.util.concurrent.atomic.AtomicReference;
import org.ampturn.drive.Clamp;
import org.ampturn.drive.Drive;
import org.ampturn.drive.Transient;
import org.ampturn.units.Quantity;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/** Nonlinear solves, the force-stroke-current map, its armature in the drive, and the calibration of the lumped plunger. */
class FieldMapTest {
    static FieldMap map;

    @BeforeAll
    static void makeMap() {
        map = FieldMap.of(ValveFixture.geometry(6), "plunger", "coil", ValveFixture.mm(-2), 5, new double[] {0.5, 1, 2}, 2, MapProgress.NONE);
    }

    @Test
    void saturationLowersTheIncrementalInductanceAndNewtonConverges() {
        Geometry closed = ValveFixture.geometry(6).moved("plunger", ValveFixture.mm(-2));
        double last = Double.POSITIVE_INFINITY;
        for (double i : new double[] {0.2, 2, 6}) {
            Geometry g = closed.withCurrent("coil", Quantity.of(i, "A"));
            Solution s = g.solve();
            assertTrue(s.converged() && s.iterations() <= 20 && s.residual() < 1e-7, "Newton at " + i + " A: " + s);
            double inc = s.incrementalInductance().si();
            assertTrue(inc < last, "incremental inductance falls with current: " + inc + " at " + i + " A");
            last = inc;
            // the tangent is exact: dλ/dI by a central difference of two more solves (common practice)
            double h = 0.01 * i;
            double lp = g.withCurrent("coil", Quantity.of(i + h, "A")).mesh().solve().fluxLinkage().si();
            double lm = g.withCurrent("coil", Quantity.of(i - h, "A")).mesh().solve().fluxLinkage().si();
            assertEquals((lp - lm) / (2 * h), inc, 0.01 * inc, "incremental inductance at " + i + " A");
            // W + W' = λ·I (Legendre transform, common practice)
            assertEquals(s.fluxLinkage().si() * i, s.energy().si() + s.coEnergy().si(), 1e-3 * s.fluxLinkage().si() * i);
            if (i == 6) {
                assertTrue(s.coEnergy().si() > 1.05 * s.energy().si(), "saturated: co-energy exceeds energy");
                assertTrue(s.peaks().contains("saturated"), s.peaks());
            }
        }
    }

    @Test
    void mapHoldsTheSolvesAtItsPoints() {
        assertTrue(map.isComplete());
        Geometry at = ValveFixture.geometry(6).moved("plunger", ValveFixture.mm(-1)).withCurrent("coil", Quantity.of(1, "A"));
        Solution s = at.solve();
        assertEquals(s.fluxLinkage().si(), map.fluxLinkageAt(2, 2), 1e-12, "λ(1 A, 1 mm) as a direct solve on the same mesh");
        assertEquals(s.maxwellForce("plunger").si(), -map.forceAt(2, 2), 1e-9, "force toward closing is toward −z here");
        for (int k = 1; k < 5; k++) assertTrue(map.fluxLinkageAt(1, k) > map.fluxLinkageAt(1, k - 1), "λ rises as the plunger closes");
    }

    @Test
    void armatureReadsTheMapConsistently() {
        FieldArmature arm = map.armature(ValveFixture.lumped());
        double[] x = map.positions(), amps = map.currents();
        for (int k = 0; k < x.length; k++) {
            for (int j = 1; j < amps.length; j++) {
                assertEquals(amps[j], arm.currentAt(map.fluxLinkageAt(j, k), x[k]), 1e-9 * amps[j], "i(λ(i, x), x) = i");
                assertEquals(-amps[j], arm.currentAt(-map.fluxLinkageAt(j, k), x[k]), 1e-9 * amps[j], "odd in λ");
            }
        }
        // ∂W/∂λ = i at constant x (the energy is ∫ i dλ)
        double lam = map.fluxLinkageAt(2, 2), h = 1e-6 * lam;
        double dw = (arm.fieldEnergyAt(lam + h, x[2]) - arm.fieldEnergyAt(lam - h, x[2])) / (2 * h);
        assertEquals(arm.currentAt(lam, x[2]), dw, 1e-5);
        // force from the co-energy of the map against the Maxwell stress mapped at mid-stroke (coarse mesh, five positions)
        double fm = map.forceAt(2, 2), fa = arm.force(Quantity.of(1, "A"), Quantity.of(x[2], "m")).si();
        assertEquals(fm, fa, 0.15 * fm, "co-energy force vs Maxwell stress at 1 A, mid-stroke");
    }

    @Test
    void pullInTransientRunsOnTheFieldMap() {
        FieldArmature arm = map.armature(ValveFixture.lumped());
        Transient run = Drive.dc(Quantity.of(24, "V")).into(arm).offAt(Quantity.of(0.03, "s"), Clamp.zener(Quantity.of(30, "V"))).simulate(Quantity.of(0.06, "s"));
        Transient lumped = Drive.dc(Quantity.of(24, "V")).into(ValveFixture.lumped()).offAt(Quantity.of(0.03, "s"), Clamp.zener(Quantity.of(30, "V")))
                .simulate(Quantity.of(0.06, "s"));
        double tf = run.pullInTime().si(), tl = lumped.pullInTime().si();
        assertTrue(tf > 0 && tf < 0.03, "pull-in on the field map: " + run);
        assertEquals(tl, tf, 0.5 * tl, "pull-in within half of the lumped model's");
        assertTrue(run.energy().toString().contains("balances"), run.energy().toString());
        assertEquals(2.0, run.finalCurrent().si(), 0.01, "24 V over 12 Ω");
    }

    @Test
    void calibrationReportsPermeanceFactors() {
        Calibration c = Calibration.of(map, ValveFixture.lumped());
        // the field sees fringing and leakage that the lumped gaps leave out: more permeance open
        assertTrue(c.fieldInductances()[0] > c.lumpedInductances()[0], c.toString());
        assertTrue(c.gapPermeanceFactor() > 0.5 && c.gapPermeanceFactor() < 3, c.toString());
        assertTrue(c.toString().startsWith("calibration over 2.000 mm"), c.toString());
    }

    @Test
    void stoppingTheMapKeepsWhatIsDone() throws Exception {
        AtomicReference<FieldMap> out = new AtomicReference<>();
        Thread caller = Thread.currentThread();
        Thread t = new Thread(() -> {
            Thread me = Thread.currentThread();
            out.set(FieldMap.of(ValveFixture.geometry(6), "plunger", "coil", ValveFixture.mm(-2), 6, new double[] {0.5, 1}, 1,
                    (done, total) -> { if (done == 3) me.interrupt(); }));
        });
        t.start();
        t.join(20_000);
        FieldMap m = out.get();
        assertNotNull(m, "the map returns when stopped");
        assertFalse(m.isComplete());
        assertTrue(m.positionsDone() >= 1 && m.positionsDone() < 6, m.toString());
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> m.armature(ValveFixture.lumped()));
        assertTrue(e.getMessage().contains("stopped after"), e.getMessage());
        assertNotNull(caller);
    }
}
