package org.ampturn.actuator;

import static org.ampturn.Ampturn.*;
import static org.ampturn.actuator.RemanenceTest.MU0;
import static org.ampturn.actuator.RemanenceTest.RELAY;
import static org.ampturn.actuator.RemanenceTest.reluctance;
import static org.junit.jupiter.api.Assertions.*;

import org.ampturn.drive.Clamp;
import org.ampturn.drive.Drive;
import org.ampturn.drive.IronHysteresis;
import org.ampturn.drive.Transient;
import org.ampturn.units.Quantity;
import org.junit.jupiter.api.Test;

/**
 * Remanence carried by the transient run: the iron's play-operator hysteresis leaves the residual
 * flux after switch-off, its pull holds or releases the plunger, and its loss is in the ledger.
 */
class RemanenceTransientTest {
    static final int N = 420;
    static final double A = 28e-6, HC = 200, L_FE = 0.06, STROKE = 0.8e-3;

    static Transient offAfter10ms(Plunger p, Quantity runFor) {
        return Drive.dc(V(24)).into(p).offAt(ms(10), Clamp.zener(V(33))).simulate(runFor);
    }

    @Test
    void dropOutWithRemanenceTheReleasedFluxIsTheHysteresisModelsResidual() {
        // the play operator's falling branch at zero current is the recoil line (Krasnosel'skii and Pokrovskii, Systems with
        // Hysteresis, 1989; Parker, Advances in Permanent Magnetism, 1990, ch. 4; both from memory): with the ideal gaps,
        // φr = Hc·l/(g/(μ0A) + gp/(μ0A) + l/(μ0·μr·A)); its pull φr²/(2μ0A) (Maxwell 1873 §641) is above the spring's
        // 0.2 N + 500 N/m × 0.8 mm, so the plunger stays closed
        double phi = HC * L_FE / reluctance(0.01e-3);
        double pull = phi * phi / (2 * MU0 * A);
        assertTrue(pull > 0.2 + 500 * STROKE, "the residual pull holds: " + pull + " N");
        Transient run = offAfter10ms(RELAY, ms(20));
        assertEquals(N * phi, run.residualFluxLinkage().si(), 1e-9 * N * phi);
        assertEquals(N * phi, run.fluxLinkage().last().si(), 1e-9 * N * phi);
        assertEquals(pull, run.residualForce().si(), 1e-8 * pull);
        assertEquals(RELAY.residualForce().si(), run.residualForce().si(), 1e-8 * pull);
        assertTrue(Double.isNaN(run.dropOutTime().si()), "no drop-out: " + run.dropOutTime());
        assertEquals(STROKE, run.position().last().si(), 0, "held closed by the residual flux");
        assertEquals(0, run.current().last().si(), 0);
    }

    @Test
    void aResidualShimReleasesThePlungerAndTheFluxFallsToTheOpenGapsResidual() {
        double shim = RELAY.residualShimForRelease().si();
        assertTrue(shim > 0.01e-3, "a shim thicker than the stop's gap is needed: " + shim);
        Plunger shimmed = RELAY.withResidualGap(Quantity.of(1.2 * shim, "m"));
        Transient run = offAfter10ms(shimmed, ms(40));
        assertTrue(run.dropOutTime().si() > 0, "the shimmed plunger drops out: " + run.notes());
        assertEquals(0, run.position().last().si(), 0);
        // the flux followed the residual level down as the gap opened: at the open stop φr = Hc·l/R(stroke + shim)
        double phiOpen = HC * L_FE / reluctance(STROKE + 1.2 * shim);
        assertEquals(N * phiOpen, run.residualFluxLinkage().si(), 1e-7 * N * phiOpen);
        double pullOpen = phiOpen * phiOpen / (2 * MU0 * A);
        assertEquals(pullOpen, run.residualForce().si(), 1e-6 * pullOpen);
        assertTrue(run.energy().relativeBalanceError() < 1e-6, run.energy().toString());
        // a thinner shim than the static figure keeps it closed, and the residual pull is larger without one
        Transient held = offAfter10ms(RELAY.withResidualGap(Quantity.of(0.8 * shim, "m")), ms(40));
        assertTrue(Double.isNaN(held.dropOutTime().si()), "held: " + held.dropOutTime());
        Transient noShim = offAfter10ms(RELAY, ms(40));
        assertTrue(noShim.residualForce().si() > held.residualForce().si(), noShim.residualForce() + " vs " + held.residualForce());
    }

    @Test
    void theHysteresisLossIsTheCoerciveMmfTimesTheFluxTravelledAndTheLedgerBalances() {
        // the play operator dissipates Hc·|dB| per unit volume, Hc·l·|dφ| over the path (Visintin, Differential Models of
        // Hysteresis, 1994, ch. 3; from memory): the flux rises to its value at switch-off and falls to the residual
        Transient run = offAfter10ms(RELAY, ms(20));
        double c = HC * L_FE / N;
        double lamOff = run.fluxLinkage().valueAt(0.010), lamEnd = run.fluxLinkage().last().si();
        double loss = c * (lamOff + (lamOff - lamEnd));
        assertEquals(loss, run.energy().armatureHysteresis().si(), 1e-7 * loss);
        assertTrue(run.energy().relativeBalanceError() < 1e-6, run.energy().toString());
        assertTrue(run.energy().toString().contains("armature iron hysteresis"), run.energy().toString());
        assertEquals(c, RELAY.hysteresis().coerciveCurrent().si(), 1e-15);
        // with eddy currents in the solid plunger as well: both losses in the ledger, and it still balances
        Transient both = offAfter10ms(RELAY.withSolidIron(mm(6), mm(30), Quantity.of(1.5e-7, "Ω·m"), 3, Quantity.of(0.3, "mH")), ms(20));
        assertTrue(both.energy().eddy().si() > 0 && both.energy().armatureHysteresis().si() > 0, both.energy().toString());
        assertTrue(both.energy().relativeBalanceError() < 1e-6, both.energy().toString());
    }

    @Test
    void aHoldingMagnetReleasesWhereTheFallingBranchMeetsTheRecoilLinesDropOutCurrent() {
        // held, linear iron: on the rising branch i = λ/L + c, on the falling one i = λ/L − c (c = Hc·l/N), so the
        // current steps down by 2c at switch-off and then decays as a first-order circuit through the resistor clamp,
        // i(t) = (i_on − 2c)·exp(−t/τ), τ = L/(R + R_clamp) (common practice); the pull meets the load where λ/L is the
        // release current without remanence, i.e. at the recoil line's drop-out current i_release − c
        HoldingMagnet m = HoldingMagnetTest.magnet().withCoercivity(Quantity.of(150, "A/m"), mm(120));
        int turns = HoldingMagnetTest.TURNS;
        double r = HoldingMagnetTest.R, rClamp = 100, c = 150 * 0.120 / turns;
        double l = turns * (double) turns / HoldingMagnetTest.closedReluctance();
        double iOn = c + (24 / r - c) * (1 - Math.exp(-0.050 * r / l));
        double drop = HoldingMagnetTest.releaseCurrent() - c;
        assertEquals(drop, m.dropOutCurrent().si(), 1e-12);
        double expected = l / (r + rClamp) * Math.log((iOn - 2 * c) / drop);
        Transient run = Drive.dc(V(24)).into(m).offAt(ms(50), Clamp.resistor(ohm(rClamp), V(0))).simulate(ms(80));
        assertEquals(expected, m.release(run, ms(50)).start().si(), 1e-6 * expected);
        assertTrue(run.energy().relativeBalanceError() < 1e-6, run.energy().toString());
    }

    @Test
    void withoutCoercivityTheFluxReturnsToZero() {
        Plunger soft = RELAY.withCoercivity(Quantity.of(0, "A/m"));
        assertTrue(soft.hysteresis().isNone());
        Transient run = offAfter10ms(soft, ms(20));
        assertEquals(0, run.fluxLinkage().last().si(), 0);
        assertTrue(Double.isNaN(run.residualFluxLinkage().si()));
        assertEquals(0, run.energy().armatureHysteresis().si(), 0);
    }

    @Test
    void badHysteresisInputIsRefusedByName() {
        var e = assertThrows(IllegalArgumentException.class, () -> IronHysteresis.play(Quantity.of(-5, "A/m"), mm(40), 100));
        assertTrue(e.getMessage().contains("coercive field"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> IronHysteresis.ofSI(Double.NaN, 100));
        assertTrue(e.getMessage().contains("coercive MMF"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> IronHysteresis.ofSI(5, 0));
        assertTrue(e.getMessage().contains("turns"), e.getMessage());
    }
}
