package org.ampturn.actuator;

import static org.ampturn.Ampturn.*;
import static org.junit.jupiter.api.Assertions.*;

import org.ampturn.coil.Core;
import org.ampturn.drive.Clamp;
import org.ampturn.drive.Drive;
import org.ampturn.drive.Transient;
import org.ampturn.material.Conductor;
import org.ampturn.material.MagneticMaterial;
import org.ampturn.material.Materials;
import org.ampturn.units.Quantity;
import org.ampturn.wire.Bobbin;
import org.ampturn.wire.Winding;
import org.ampturn.wire.Wire;
import org.junit.jupiter.api.Test;

/** Pick-up and drop-out voltage at a coil temperature; the plunger built from a winding and an iron path. */
class PickUpDropOutTest {
    static final double MU0 = 4e-7 * Math.PI;
    /** Ideal flat gap, no iron: pole 28 mm², stroke 0.8 mm, residual 0.05 mm, parasitic 0.1 mm over the pole area. */
    static final Plunger VALVE = Plunger.of(420, mm2(28), mm(0.8)).withResistance(ohm(9.5)).withMass(g(4))
            .withSpring(Quantity.of(2000, "N/m"), N(1)).withLoad(N(1));

    @Test
    void dropOutVoltageIsWhereMaxwellsPullMeetsTheSpringAtTheClosedStop() {
        // closed: F = B²A/(2μ0) (Maxwell 1873 §641) with B = N·I/(A·(g/(μ0A) + gp/(μ0A))), g = residual: the release current
        // I = √(2μ0·A·F)·(g + gp)/(μ0·N·... ) written out below; V = I·R(T), R(T) = R20·(1 + α20·(T − 20 °C)),
        // α20 = 0.00393 /K (IEC 60028)
        double a = 28e-6, fNeed = 1 + 2000 * 0.8e-3 + 1, reluct = (0.05e-3 + 0.1e-3) / (MU0 * a);
        double phi = Math.sqrt(2 * MU0 * a * fNeed), current = phi * reluct / 420;
        for (double celsius : new double[] {20, 100}) {
            double r = 9.5 * (1 + 0.00393 * (celsius - 20));
            assertEquals(current * r, VALVE.dropOutVoltage(degC(celsius)).si(), 1e-9 * current * r, "at " + celsius + " °C");
        }
    }

    @Test
    void pickUpVoltageClosesWithinTheTimeAndNoLessDoes() {
        Quantity within = ms(3);
        double vpu = VALVE.pickUpVoltage(within, degC(20)).si();
        Transient at = Drive.dc(V(vpu)).into(VALVE).simulate(within);
        Transient below = Drive.dc(V(vpu * 0.999)).into(VALVE).simulate(within);
        assertTrue(at.pullInTime().si() <= 3e-3, at.pullInTime().toString());
        assertTrue(Double.isNaN(below.pullInTime().si()) || below.pullInTime().si() > 3e-3, below.pullInTime().toString());
        // never below the static pull-in voltage at the open gap: the same Maxwell pull with g = stroke + residual
        double a = 28e-6, fNeed = 1 + 1, reluct = (0.85e-3 + 0.1e-3) / (MU0 * a);
        double staticV = Math.sqrt(2 * MU0 * a * fNeed) * reluct / 420 * 9.5;
        assertTrue(vpu > staticV, vpu + " V vs static " + staticV + " V");
        // a hot coil needs more supply
        assertTrue(VALVE.pickUpVoltage(within, degC(100)).si() > vpu * 1.2);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> VALVE.pickUpVoltage(s(60), degC(20)));
        assertTrue(e.getMessage().contains("time to close"), e.getMessage());
    }

    @Test
    void aPlungerBuiltFromAWindingTakesItsTurnsAndResistance() {
        Winding copper = Winding.of(Wire.awg(28), 420, Bobbin.of(mm(12), mm(8), mm(6)));
        Plunger p = Plunger.of(copper, mm2(28), mm(0.8));
        assertEquals(copper.resistance().si(), p.resistanceOhms(), 1e-12);
        assertEquals(VALVE.withResistance(copper.resistance()).inductanceAt(0), p.inductanceAt(0), 1e-15);
        // the conductor's own temperature coefficient: aluminium α20 = 0.00403 /K (IEC 60889)
        Winding alu = Winding.of(Wire.awg(28).withConductor(Conductor.ALUMINIUM), 420, Bobbin.of(mm(12), mm(8), mm(6)));
        Plunger pa = Plunger.of(alu, mm2(28), mm(0.8));
        assertEquals(1 + 0.00403 * 80, pa.atTemperature(degC(100)).resistanceOhms() / pa.resistanceOhms(), 1e-9);
    }

    @Test
    void anIronPathAddsItsReluctanceAndItsEnergy() {
        MagneticMaterial linear = MagneticMaterial.linear("steel", 1000, T(1.8));
        Plunger p = VALVE.withIronPath(Core.of("frame", mm(50), mm2(28), linear));
        double rFrame = 0.05 / (MU0 * 1000 * 28e-6), rGaps = (0.85e-3 + 0.1e-3) / (MU0 * 28e-6);
        assertEquals(420.0 * 420 / (rGaps + rFrame), p.inductanceAt(0), 1e-9 * p.inductanceAt(0)); // N²/ΣR (Roters ch. 5)
        // a saturating frame: the run still closes its energy ledger
        Plunger sat = VALVE.withIronPath(Core.of("frame", mm(50), mm2(28), Materials.SILICON_STEEL));
        Transient run = Drive.dc(V(24)).into(sat).offAt(ms(5), Clamp.zener(V(33))).simulate(ms(10));
        assertTrue(run.energy().relativeBalanceError() < 1e-6, run.energy().toString());
        assertFalse(Double.isNaN(run.pullInTime().si()));
    }
}
