package org.ampturn.drive;

import static org.ampturn.Ampturn.*;
import static org.junit.jupiter.api.Assertions.*;

import java.util.List;
import java.util.stream.Collectors;
import org.ampturn.units.Quantity;
import org.junit.jupiter.api.Test;

/** Rebound at the stops against the free-bounce series under a constant force. */
class BounceTest {
    /**
     * A test armature whose pull is constant to 1e-7 over the stroke: W(λ, x) = λ²·(1 − βx)/(2L0), so
     * i = λ(1 − βx)/L0 and F = βλ²/(2L0); a constant restoring force Fr. Invented; consistent by construction.
     */
    static final class ConstantPull implements Armature {
        final double l0 = 1e-6, beta = 1e-4, fr = 1, mass = 1e-3, stroke = 1e-3, ohms = 1, e;

        ConstantPull(double e) { this.e = e; }

        @Override public double currentAt(double lam, double x) { return lam * (1 - beta * x) / l0; }
        @Override public double fieldEnergyAt(double lam, double x) { return lam * lam * (1 - beta * x) / (2 * l0); }
        @Override public double forceAt(double lam, double x) { return beta * lam * lam / (2 * l0); }
        @Override public double restoringForceAt(double x, double v) { return fr; }
        @Override public double massKg() { return mass; }
        @Override public double strokeMetres() { return stroke; }
        @Override public double resistanceOhms() { return ohms; }
        @Override public double inductanceAt(double x) { return l0 / (1 - beta * x); }
        @Override public Quantity temperature() { return degC(20); }
        @Override public Armature atTemperature(Quantity t) { return this; }
        @Override public String describe() { return "constant-pull test armature"; }
        @Override public double restitution() { return e; }
    }

    @Test
    void bouncesAtTheClosedStopFollowTheFreeBounceSeries() {
        double e = 0.6;
        ConstantPull arm = new ConstantPull(e);
        // at 100 A the pull is β·(L0·i)²/(2L0) = 1e-4·1e-4/2e-6... F = β·L0·i²/2 = 0.5 N above Fr? set V so F = 3 N
        double i = Math.sqrt(2 * 3.0 / (arm.beta * arm.l0)), v = i * arm.ohms;
        Transient run = Drive.dc(V(v)).into(arm).simulate(ms(40));
        double a = (3.0 - arm.fr) / arm.mass; // net acceleration toward the closed stop, constant
        double v0 = run.impactSpeed().si();
        // from rest at the open stop: v0² = 2·a·stroke (uniform acceleration; the current settles in microseconds)
        assertEquals(Math.sqrt(2 * a * arm.stroke), v0, 1e-4 * v0);
        // Newton's law of impact and uniform acceleration: rebound n leaves at eⁿ·v0 and lands 2·eⁿ·v0/a later
        // (e.g. Meriam and Kraige, Engineering Mechanics: Dynamics, §3/12, from memory); rebounds stop below 1e-3·v0
        List<Double> times = run.markers().stream().filter(m -> m.label().equals("bounce")).map(m -> m.time().si()).collect(Collectors.toList());
        int expected = (int) Math.floor(Math.log(1e-3) / Math.log(e)); // eⁿ > 1e-3
        if (Math.pow(e, expected) <= 1e-3) expected--;
        assertEquals(expected, run.bounceCount());
        assertEquals(expected, times.size());
        assertEquals(run.pullInTime().si(), times.get(0), 1e-12, "the first rebound is at the pull-in impact");
        for (int n = 1; n < times.size(); n++) {
            double flight = 2 * Math.pow(e, n) * v0 / a;
            assertEquals(flight, times.get(n) - times.get(n - 1), 1e-4 * flight + 1e-10, "flight " + n);
        }
        assertTrue(run.toString().contains(expected + " bounces"), run.toString());
        assertTrue(run.energy().relativeBalanceError() < 1e-6, run.energy().toString());
    }

    @Test
    void noRestitutionNoBounce() {
        Transient run = Drive.dc(V(Math.sqrt(2 * 3.0 / (1e-4 * 1e-6)))).into(new ConstantPull(0)).simulate(ms(10));
        assertEquals(0, run.bounceCount());
        assertFalse(run.toString().contains("bounce"));
        assertTrue(run.impactSpeed().si() > 0);
    }
}
