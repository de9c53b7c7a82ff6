package org.ampturn.actuator;

import static org.ampturn.Ampturn.*;
import static org.junit.jupiter.api.Assertions.*;

import org.ampturn.coil.Core;
import org.ampturn.coil.MagneticCircuit;
import org.ampturn.drive.Clamp;
import org.ampturn.drive.Drive;
import org.ampturn.drive.Transient;
import org.ampturn.material.MagneticMaterial;
import org.junit.jupiter.api.Test;

class HoldingMagnetTest {
    static final double MU0 = 4e-7 * Math.PI;
    static final double AREA = 150e-6, RESIDUAL = 0.05e-3, LOAD = 30, R = 40;
    static final int TURNS = 200;

    static final MagneticCircuit PATH = Core.of("yoke and armature", mm(120), mm2(150), MagneticMaterial.linear("iron", 1500, T(1.6)));

    static HoldingMagnet magnet() {
        return HoldingMagnet.of(Electromagnet.of(TURNS, PATH, mm2(150), 2), ohm(R), mm(2))
                .withResidualGap(mm(0.05)).withLoad(N(LOAD)).withMass(g(80));
    }

    /** Closed circuit reluctance (by hand): iron path plus the two residual gaps. */
    static double closedReluctance() {
        return PATH.reluctanceSI() + 2 * RESIDUAL / (MU0 * AREA);
    }

    /** Current at which the pull of the held armature, 2·φ²/(2μ0A) with φ = N·i/R_m, equals the load (Maxwell's stress, by hand). */
    static double releaseCurrent() {
        return Math.sqrt(2 * MU0 * AREA * LOAD / 2) * closedReluctance() / TURNS;
    }

    static double moves(Transient run) {
        return run.markers().stream().filter(m -> m.label().equals("armature moves")).findFirst().orElseThrow().time().si();
    }

    /**
     * Resistor clamp (no diode drop): with the armature held the circuit is linear, the current
     * decays as i0·exp(−t/τ), τ = L/(R + R_clamp), and the armature is released where the pull
     * falls to the load: t = τ·ln(i0/i_release) (common practice).
     */
    @Test
    void releaseWithResistorClampMatchesTheExponentialDecay() {
        HoldingMagnet m = magnet();
        double rClamp = 100;
        Transient run = Drive.dc(V(24)).into(m).offAt(ms(50), Clamp.resistor(ohm(rClamp), V(0))).simulate(ms(80));
        double l = TURNS * (double) TURNS / closedReluctance();
        assertEquals(l, m.inductanceHeld().si(), 1e-12 * l);
        double i0 = 24 / R * (1 - Math.exp(-0.050 * R / l));
        double tau = l / (R + rClamp);
        double expected = tau * Math.log(i0 / releaseCurrent());
        HoldingMagnet.Release rel = m.release(run, ms(50));
        assertEquals(expected, rel.start().si(), 1e-6 * expected);
        assertEquals(0.050 + expected, moves(run), 1e-6 * expected);
        assertEquals(releaseCurrent(), m.holdingCurrent().si(), 1e-12 * releaseCurrent());
        // then it travels its stroke, later, and the energy ledger still balances
        assertTrue(rel.travelled().si() > rel.start().si(), rel.toString());
        double supplied = run.energy().supplied().si();
        assertEquals(0, run.energy().balanceErrorJoules(), 1e-6 * supplied);
    }

    /**
     * Zener clamp (Vc = 33 V + 0.7 V): L·di/dt = −(R·i + Vc), so i(t) = (i0 + Vc/R)·exp(−t·R/L) − Vc/R
     * while held (first-order circuit, by hand); the release comes where i(t) = i_release. Far sooner
     * than with a diode alone (common practice: a higher clamp voltage releases faster).
     */
    @Test
    void releaseWithZenerClampMatchesTheLinearCircuit() {
        HoldingMagnet m = magnet();
        Transient run = Drive.dc(V(24)).into(m).offAt(ms(50), Clamp.zener(V(33))).simulate(ms(80));
        double l = TURNS * (double) TURNS / closedReluctance();
        double i0 = 24 / R * (1 - Math.exp(-0.050 * R / l));
        double vc = 33.7;
        double expected = l / R * Math.log((i0 + vc / R) / (releaseCurrent() + vc / R));
        assertEquals(expected, m.release(run, ms(50)).start().si(), 1e-6 * expected);

        // a diode alone (0.7 V) by the same formula, and later
        Transient slow = Drive.dc(V(24)).into(m).offAt(ms(50), Clamp.diode()).simulate(ms(80));
        double diode = l / R * Math.log((i0 + 0.7 / R) / (releaseCurrent() + 0.7 / R));
        assertEquals(diode, m.release(slow, ms(50)).start().si(), 1e-6 * diode);
        assertTrue(diode > 1.5 * expected, diode + " vs " + expected);
    }

    /** After release the pull has nearly gone: the armature's travel approaches free motion under the load, √(2·s·m/F) (Newton, by hand). */
    @Test
    void travelAfterAFastReleaseApproachesFreeMotion() {
        HoldingMagnet m = magnet();
        Transient run = Drive.dc(V(24)).into(m).offAt(ms(50), Clamp.zener(V(400))).simulate(ms(80));
        HoldingMagnet.Release rel = m.release(run, ms(50));
        double free = Math.sqrt(2 * 2e-3 * 0.080 / LOAD);
        double travel = rel.travelled().si() - rel.start().si();
        assertTrue(travel > free && travel < 1.2 * free, travel + " vs " + free);
    }

    @Test
    void aMagnetThatNeverHeldTheLoadIsAClearError() {
        HoldingMagnet m = magnet().withLoad(N(5000));
        Transient run = Drive.dc(V(24)).into(m).offAt(ms(50), Clamp.diode()).simulate(ms(60));
        var e = assertThrows(IllegalArgumentException.class, () -> m.release(run, ms(50)));
        assertTrue(e.getMessage().contains("never held"), e.getMessage());
    }

    /**
     * Recoil line (e.g. Parker, Advances in Permanent Magnetism, 1990, ch. 4, from memory): the iron is an MMF Hc·l
     * behind the closed circuit's reluctance, φr = Hc·l/R_closed; the pull 2·φr²/(2μ0A) (Maxwell's stress). A magnet
     * whose residual pull holds the load has no release time; a thicker residual gap (a shim) cures it.
     */
    @Test
    void remanenceThatHoldsTheLoadHasNoReleaseTime() {
        HoldingMagnet m = magnet().withCoercivity(org.ampturn.units.Quantity.of(150, "A/m"), mm(120));
        double phi = 150 * 0.120 / closedReluctance(), pull = phi * phi / (MU0 * AREA);
        assertEquals(phi, m.residualFlux().si(), 1e-12 * phi);
        assertEquals(pull, m.residualForce().si(), 1e-9 * pull);
        assertEquals(releaseCurrent() - 150 * 0.120 / TURNS, m.dropOutCurrent().si(), 1e-12);
        HoldingMagnet sticky = m.withLoad(N(0.5 * pull));
        assertFalse(sticky.releasesAtZeroCurrent());
        assertTrue(sticky.dropOutCurrent().si() < 0);
        Transient run = Drive.dc(V(24)).into(sticky).offAt(ms(50), Clamp.zener(V(33))).simulate(ms(60));
        var e = assertThrows(IllegalArgumentException.class, () -> sticky.release(run, ms(50)));
        assertTrue(e.getMessage().contains("residual flux holds the load"), e.getMessage());
        // a 0.2 mm shim in each gap lowers the residual pull below the load
        HoldingMagnet shimmed = sticky.withResidualGap(mm(0.2));
        assertTrue(shimmed.releasesAtZeroCurrent(), shimmed.residualForce().toString());
        Transient run2 = Drive.dc(V(24)).into(shimmed).offAt(ms(50), Clamp.zener(V(33))).simulate(ms(60));
        assertTrue(shimmed.release(run2, ms(50)).start().si() > 0);
    }

    @Test
    void badInputNamesTheValue() {
        Electromagnet em = Electromagnet.of(TURNS, PATH, mm2(150), 2);
        assertThrows(IllegalArgumentException.class, () -> HoldingMagnet.of(null, ohm(1), mm(1)));
        var e = assertThrows(IllegalArgumentException.class, () -> HoldingMagnet.of(em, ohm(-1), mm(1)));
        assertTrue(e.getMessage().contains("coil resistance"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> magnet().withLoad(N(-1)));
        assertTrue(e.getMessage().contains("load"), e.getMessage());
    }
}
