package org.ampturn.actuator;

import static org.ampturn.Ampturn.*;
import static org.junit.jupiter.api.Assertions.*;

import org.ampturn.drive.Clamp;
import org.ampturn.drive.Drive;
import org.ampturn.drive.EddyLadder;
import org.ampturn.drive.Transient;
import org.ampturn.material.MagneticMaterial;
import org.ampturn.units.Quantity;
import org.junit.jupiter.api.Test;

/** Shorted turns, copper slugs and solid-iron eddy currents in the plunger's transient. */
class EddyCurrentTest {
    static final int N = 400;
    /** Held open by a preload far above the pull: a fixed gap, so the magnetising inductance is constant. */
    static final Plunger HELD = Plunger.of(N, cm2(1), mm(1)).withResistance(ohm(10)).withSpring(Quantity.of(0, "N/m"), N(1000));

    @Test
    void aShortedTurnGivesTheTwoTimeConstantsOfTwoCoupledRlCircuits() {
        double lm = HELD.inductanceAt(0), l0 = 2e-3, rs = 1e-3, r1 = 10, v = 12;
        Transient run = Drive.dc(V(v)).into(HELD.withShortedTurn(ohm(rs), H(l0))).simulate(ms(20));
        // Two magnetically coupled coils (Hayt, Kemmerly and Durbin, Engineering Circuit Analysis, 8th ed., ch. 13):
        // L1·di1/dt + M·di2/dt + R1·i1 = V, M·di1/dt + L2·di2/dt + R2·i2 = 0, with the coil L1 = L0 + Lm, a one-turn
        // secondary L2 = Lm/N², M = Lm/N, R2 = rs. The natural frequencies solve
        // (L1·L2 − M²)·s² + (R1·L2 + R2·L1)·s + R1·R2 = 0: two real time constants.
        double L1 = l0 + lm, L2 = lm / ((double) N * N), M = lm / N, R2 = rs;
        double a = L1 * L2 - M * M, b = r1 * L2 + R2 * L1, c = r1 * R2;
        double disc = Math.sqrt(b * b - 4 * a * c);
        double s1 = (-b + disc) / (2 * a), s2 = (-b - disc) / (2 * a);
        assertTrue(-1 / s1 > 20 * (-1 / s2), "two well separated time constants: " + (-1 / s1) + " s and " + (-1 / s2) + " s");
        // x = [i1, i2]: dx/dt = A·x + f, A = −L⁻¹R; i(t) = x∞ + Σ c_k·u_k·e^(s_k t), x(0) = 0, x∞ = [V/R1, 0]
        double det = L1 * L2 - M * M;
        double a11 = -L2 * r1 / det, a12 = M * R2 / det, a21 = M * r1 / det;
        double[] u1 = {a12, s1 - a11}, u2 = {a12, s2 - a11};
        double x0 = -v / r1, y0 = 0; // c1·u1 + c2·u2 = x(0) − x∞
        double dd = u1[0] * u2[1] - u2[0] * u1[1];
        double c1 = (x0 * u2[1] - u2[0] * y0) / dd, c2 = (u1[0] * y0 - x0 * u1[1]) / dd;
        double[] t = run.current().times(), i = run.current().values();
        double worst = 0;
        for (int k = 0; k < t.length; k++) {
            double expected = v / r1 + c1 * u1[0] * Math.exp(s1 * t[k]) + c2 * u2[0] * Math.exp(s2 * t[k]);
            worst = Math.max(worst, Math.abs(i[k] - expected));
        }
        assertTrue(worst < 1e-6 * v / r1, "worst difference " + worst + " A");
        assertEquals(0, run.position().last().si(), 0, "the plunger stays open");
        // the secondary's loss ∫R2·i2² dt in closed form, i2 = c1·u1[1]·e^(s1 t) + c2·u2[1]·e^(s2 t), to the end of the run
        double q1 = c1 * u1[1], q2 = c2 * u2[1], T = 0.020;
        double eddy = R2 * (q1 * q1 * Math.expm1(2 * s1 * T) / (2 * s1) + 2 * q1 * q2 * Math.expm1((s1 + s2) * T) / (s1 + s2)
                + q2 * q2 * Math.expm1(2 * s2 * T) / (2 * s2));
        assertEquals(eddy, run.energy().eddy().si(), 1e-6 * eddy);
        assertTrue(run.energy().relativeBalanceError() < 1e-6, run.energy().toString());
        assertTrue(run.energy().toString().contains("eddy currents"), run.energy().toString());
    }

    @Test
    void solidIronShellsDissipateTheRodsLowFrequencyLoss() {
        // E = (r/2)·dB/dt inside a rod of radius a under a uniform dB/dt, so its loss is (dB/dt)²·π·l·a⁴/(8ρ)
        // (Lammeraner and Štafl, Eddy Currents, 1966, ch. 3; from memory). Each shell k, a loop referred to the
        // coil (N² r_k) across N·dψ_k/dt with ψ_k = B·π·a_k², must dissipate its share, so the sum is the rod's loss.
        double a = 4e-3, l = 30e-3, rho = 1.5e-7, dBdt = 100;
        MagneticMaterial iron = MagneticMaterial.linear("steel", 800, T(1.8));
        for (int m = 1; m <= 6; m++) {
            EddyLadder ladder = HELD.withIron(mm(40), iron).withSolidIron(mm(8), mm(30), Quantity.of(rho, "Ω·m"), m, mH(1)).eddyLadder();
            assertEquals(m, ladder.sections());
            double shares = 0;
            for (int k = 0; k < m; k++) shares += ladder.areaShare(k);
            assertEquals(1, shares, 1e-12);
            double loss = 0;
            for (int k = 0; k < m; k++) {
                double ak = a * (m - k) / m;
                double emf = N * Math.PI * ak * ak * dBdt;
                loss += emf * emf / ladder.shuntOhms(k);
            }
            // under a uniform dB/dt loop k sees N·π·a_k²·dB/dt and the shells' losses add up to the rod's
            double rod = dBdt * dBdt * Math.PI * l * Math.pow(a, 4) / (8 * rho);
            assertEquals(rod, loss, 1e-9 * rod, "m = " + m);
        }
        assertEquals((double) N * N * 8 * Math.PI * rho / l,
                HELD.withSolidIron(mm(8), mm(30), Quantity.of(rho, "Ω·m"), 1, mH(1)).eddyLadder().shuntOhms(0), 1e-6);
    }

    static Plunger valve() {
        return Plunger.of(420, mm2(28), mm(0.8)).withResistance(ohm(9.5)).withMass(g(4))
                .withSpring(Quantity.of(2000, "N/m"), N(1)).withLoad(N(1)).withIron(mm(40), MagneticMaterial.linear("steel", 800, T(1.8)));
    }

    @Test
    void eddyCurrentsDelayPullInAndDropOutAndTheLedgerBalances() {
        Plunger plain = valve();
        Plunger solid = plain.withSolidIron(mm(6), mm(30), Quantity.of(1.5e-7, "Ω·m"), 4, Quantity.of(0.3, "mH")).withRestitution(0.3);
        var circuit = Drive.dc(V(24));
        Transient a = circuit.into(plain).offAt(ms(10), Clamp.zener(V(33))).simulate(ms(20));
        Transient b = circuit.into(solid).offAt(ms(10), Clamp.zener(V(33))).simulate(ms(20));
        assertTrue(b.pullInTime().si() > a.pullInTime().si() * 1.05, a.pullInTime() + " → " + b.pullInTime());
        assertTrue(b.dropOutTime().si() > a.dropOutTime().si() * 1.05, a.dropOutTime() + " → " + b.dropOutTime());
        assertTrue(b.energy().eddy().si() > 0);
        assertTrue(b.energy().relativeBalanceError() < 1e-6, b.energy().toString());
        // the low-frequency eddy loss goes as 1/ρ: iron ten times as resistive delays pull-in about a tenth as much
        Plunger resistive = plain.withSolidIron(mm(6), mm(30), Quantity.of(1.5e-6, "Ω·m"), 4, Quantity.of(0.3, "mH")).withRestitution(0.3);
        Transient c = circuit.into(resistive).offAt(ms(10), Clamp.zener(V(33))).simulate(ms(20));
        double delay = b.pullInTime().si() - a.pullInTime().si(), less = c.pullInTime().si() - a.pullInTime().si();
        assertTrue(less > 0 && less < 0.2 * delay, delay + " s vs " + less + " s");
        assertTrue(c.energy().relativeBalanceError() < 1e-6, c.energy().toString());
    }

    @Test
    void aCopperSlugSlowsReleaseLikeATimeDelayRelay() {
        Plunger plain = valve();
        Plunger slug = plain.withCopperSlug(mm(9), mm(1), mm(8), mm(1.5), Quantity.of(0.3, "mH"));
        Transient a = Drive.dc(V(24)).into(plain).offAt(ms(10), Clamp.diode()).simulate(ms(40));
        Transient b = Drive.dc(V(24)).into(slug).offAt(ms(10), Clamp.diode()).simulate(ms(40));
        assertTrue(b.dropOutTime().si() > a.dropOutTime().si(), a.dropOutTime() + " → " + b.dropOutTime());
        assertTrue(b.energy().relativeBalanceError() < 1e-6, b.energy().toString());
        // the slug's resistance follows copper's temperature (IEC 60028, α20 = 0.00393 /K)
        double r20 = slug.eddyLadder().shuntOhms(0), r100 = slug.atTemperature(degC(100)).eddyLadder().shuntOhms(0);
        assertEquals(1 + 0.00393 * 80, r100 / r20, 1e-3);
    }

    @Test
    void badEddyAndStopInputIsRefusedByName() {
        Plunger p = valve();
        for (double e : new double[] {1.5, -0.1, Double.NaN}) {
            IllegalArgumentException x = assertThrows(IllegalArgumentException.class, () -> p.withRestitution(e));
            assertTrue(x.getMessage().contains("coefficient of restitution"), x.getMessage());
        }
        IllegalArgumentException x = assertThrows(IllegalArgumentException.class,
                () -> p.withCopperSlug(mm(9), mm(2), mm(8), mm(1.5), Quantity.of(0.3, "mH")));
        assertTrue(x.getMessage().contains("slug thickness (2.000 mm)") && x.getMessage().contains("1.500 mm"), x.getMessage());
        x = assertThrows(IllegalArgumentException.class, () -> HELD.withSolidIron(mm(6), mm(30), Quantity.of(1.5e-7, "Ω·m"), 17, mH(1)));
        assertTrue(x.getMessage().contains("sections"), x.getMessage());
    }
}
