package org.ampturn.actuator;

import static org.ampturn.Ampturn.*;
import static org.junit.jupiter.api.Assertions.*;

import org.ampturn.material.MagneticMaterial;
import org.ampturn.units.Quantity;
import org.junit.jupiter.api.Test;

/** Remanence by the recoil-line model: residual flux and pull, drop-out current and voltage, the residual shim. */
class RemanenceTest {
    static final double MU0 = 4e-7 * Math.PI;
    static final Quantity HC = Quantity.of(200, "A/m");
    static final Plunger RELAY = Plunger.of(420, mm2(28), mm(0.8)).withResistance(ohm(9.5))
            .withSpring(Quantity.of(500, "N/m"), N(0.2)).withResidualGap(mm(0.01)).withParasiticGap(mm(0.01), mm2(28))
            .withIron(mm(60), MagneticMaterial.linear("soft iron", 2000, T(1.6))).withCoercivity(HC);

    // recoil line (e.g. Parker, Advances in Permanent Magnetism, 1990, ch. 4, from memory): the iron is an MMF Hc·l behind
    // its reluctance l/(μ0·μr·A); with the ideal gaps in series, φr = Hc·l/(g/(μ0A) + gp/(μ0A) + l/(μ0·μr·A)) and the
    // pull is Maxwell's φ²/(2μ0A) (Maxwell 1873 §641)
    static double reluctance(double g) {
        double a = 28e-6;
        return g / (MU0 * a) + 0.01e-3 / (MU0 * a) + 0.06 / (MU0 * 2000 * a);
    }

    @Test
    void residualFluxAndPullFollowTheRecoilLine() {
        double phi = 200 * 0.06 / reluctance(0.01e-3);
        assertEquals(phi, RELAY.residualFlux().si(), 1e-12 * phi);
        double f = phi * phi / (2 * MU0 * 28e-6);
        assertEquals(f, RELAY.residualForce().si(), 1e-9 * f);
        double need = 0.2 + 500 * 0.8e-3;
        assertEquals(f < need, RELAY.releasesAtZeroCurrent());
    }

    @Test
    void dropOutCurrentAndTheShimThatEnsuresRelease() {
        double a = 28e-6, need = 0.2 + 500 * 0.8e-3, phiHold = Math.sqrt(2 * MU0 * a * need);
        double ido = (phiHold * reluctance(0.01e-3) - 200 * 0.06) / 420;
        assertEquals(ido, RELAY.dropOutCurrent().si(), 1e-9 * Math.abs(ido));
        assertEquals(ido * 9.5 * (1 + 0.00393 * 40), RELAY.dropOutVoltage(degC(60)).si(), 1e-9 * Math.abs(ido) * 12);
        // the shim g at which φr(g) = φhold: g = μ0·A·(Hc·l/φhold − gp/(μ0A) − l/(μ0μrA))
        double shim = MU0 * a * (200 * 0.06 / phiHold - 0.01e-3 / (MU0 * a) - 0.06 / (MU0 * 2000 * a));
        assertTrue(shim > 0.01e-3, "this relay sticks without a thicker shim: " + shim);
        assertFalse(RELAY.releasesAtZeroCurrent());
        assertTrue(ido < 0, "it needs a reverse current to release: " + ido);
        {
            assertEquals(shim, RELAY.residualShimForRelease().si(), 1e-9 * shim);
            assertFalse(RELAY.withResidualGap(m(shim * 0.9)).releasesAtZeroCurrent());
            assertTrue(RELAY.withResidualGap(m(shim * 1.1)).releasesAtZeroCurrent());
        }
        // without coercivity the drop-out current is the plain static one
        Plunger plain = Plunger.of(420, mm2(28), mm(0.8)).withResistance(ohm(9.5)).withSpring(Quantity.of(500, "N/m"), N(0.2))
                .withResidualGap(mm(0.01)).withParasiticGap(mm(0.01), mm2(28)).withIron(mm(60), MagneticMaterial.linear("soft iron", 2000, T(1.6)));
        assertEquals(phiHold * reluctance(0.01e-3) / 420, plain.withCoercivity(Quantity.of(0, "A/m")).dropOutCurrent().si(), 1e-9);
    }

    @Test
    void remanenceNeedsTheIronPath() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> Plunger.of(420, mm2(28), mm(0.8)).withCoercivity(Quantity.of(100, "A/m")));
        assertTrue(e.getMessage().contains("withIron"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> RELAY.withCoercivity(Quantity.of(-1, "A/m")));
        assertTrue(e.getMessage().contains("coercive field"), e.getMessage());
    }
}
