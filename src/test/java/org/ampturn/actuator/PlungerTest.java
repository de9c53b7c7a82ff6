package org.ampturn.actuator;

import static org.ampturn.Ampturn.*;
import static org.junit.jupiter.api.Assertions.*;

import org.ampturn.drive.Clamp;
import org.ampturn.drive.Drive;
import org.ampturn.drive.Marker;
import org.ampturn.drive.Transient;
import org.ampturn.material.MagneticMaterial;
import org.ampturn.units.Quantity;
import org.junit.jupiter.api.Test;

/** The plunger actuator coupled to the drive: magnetic circuit, force, motion, pull-in and drop-out. */
class PlungerTest {
    static final double MU0 = 4e-7 * Math.PI;

    /** An invented 12 V plunger for tests: 300 turns, 1 cm² pole, 2 mm stroke, 5 g, 2 N preload + 500 N/m. */
    static Plunger demo() {
        return Plunger.of(300, cm2(1), mm(2)).withParasiticGap(mm(0.5), cm2(1)).withMass(g(5))
                .withSpring(Quantity.of(500, "N/m"), N(2)).withResistance(ohm(5));
    }

    @Test
    void forceIsMaxwellsPullAndAgreesWithBothEnergyDerivatives() {
        Plunger p = demo();
        double i = 1.5, x = 0.5e-3;
        double g = 2e-3 + 0.05e-3 - x + 0.5e-3;                 // working + residual + parasitic gap (same area)
        double b = MU0 * 300 * i / g;                            // Ampère's law on the series gaps
        double maxwell = b * b * 1e-4 / (2 * MU0);               // F = B²A/(2μ0) (Roters, Electromagnetic Devices, ch. 5)
        assertEquals(maxwell, p.force(A(i), m(x)).si(), 1e-9 * maxwell);
        // F = ½·i²·dL/dx at constant current (co-energy; Fitzgerald, Kingsley and Umans, Electric Machinery, ch. 3)
        double h = 1e-7;
        double dLdx = (p.inductanceAt(x + h) - p.inductanceAt(x - h)) / (2 * h);
        assertEquals(maxwell, 0.5 * i * i * dLdx, 1e-6 * maxwell);
        // F = −∂W/∂x at constant flux linkage (same source)
        double lam = p.inductanceAt(x) * i;
        double dWdx = (p.fieldEnergyAt(lam, x + h) - p.fieldEnergyAt(lam, x - h)) / (2 * h);
        assertEquals(maxwell, -dWdx, 1e-6 * maxwell);
    }

    @Test
    void aBlockedPlungerIsAnRlCoil() {
        Plunger p = demo().withLoad(N(1000)); // never moves
        Transient run = Drive.dc(V(12)).into(p).simulate(ms(10));
        double l = p.inductanceAt(0), r = 5;
        for (double t : new double[] {0.2e-3, 1e-3, 3e-3, 8e-3}) {
            double expected = 12 / r * (1 - Math.exp(-t * r / l)); // Hayt, Kemmerly and Durbin, ch. 8
            assertEquals(expected, run.current().at(s(t)).si(), 1e-7, "i at " + t);
        }
        assertEquals(0, run.position().peak().si(), 0);
        assertTrue(Double.isNaN(run.pullInTime().si()));
        assertTrue(run.notes().stream().anyMatch(n -> n.contains("did not reach")));
    }

    @Test
    void pullInShowsTheCurrentDipAndTheLedgerBalances() {
        Transient run = Drive.dc(V(12)).into(demo()).offAt(ms(15), Clamp.zener(V(24))).simulate(ms(40));
        double pullIn = run.pullInTime().si();
        assertTrue(pullIn > 1e-3 && pullIn < 10e-3, run.toString());
        double moves = run.markers().stream().filter(m -> m.label().equals("armature moves")).findFirst().orElseThrow().time().si();
        // the back-EMF of the moving plunger makes the current fall while the switch is still on (common practice: the pull-in dip)
        double[] t = run.current().times(), i = run.current().values();
        double rise = 0, dip = Double.MAX_VALUE;
        for (int k = 0; k < t.length; k++) {
            if (t[k] > moves && t[k] <= pullIn) {
                rise = Math.max(rise, i[k]);
                if (rise > 0) dip = Math.min(dip, i[k]);
            }
        }
        assertTrue(dip < 0.7 * rise, "no dip: max " + rise + ", min after " + dip);
        assertTrue(run.current().at(s(pullIn + 0.5e-3)).si() > dip, "current rises again once closed");
        assertTrue(run.dropOutTime().si() > 0, run.toString());
        assertTrue(run.energy().mechanical().si() > 0, run.energy().toString());
        assertTrue(run.energy().relativeBalanceError() < 1e-6, run.energy().toString());
    }

    @Test
    void dropOutWithAFastClampIsSpringMotion() {
        // with the coil's energy gone in microseconds the plunger returns under spring and preload alone:
        // x(t) = −F0/k + (s + F0/k)·cos(ωt), ω = √(k/m), so it reaches 0 after acos((F0/k)/(s + F0/k))/ω
        // (undamped free vibration, Meriam and Kraige, Engineering Mechanics: Dynamics, ch. 8, from memory)
        Transient run = Drive.dc(V(12)).into(demo()).offAt(ms(15), Clamp.zener(V(10_000))).samples(40_001).simulate(ms(25));
        double release = marker(run, "release").time().si();
        double back = marker(run, "drop-out").time().si();
        double k = 500, m = 0.005, f0 = 2, s = 2e-3;
        double expected = Math.acos((f0 / k) / (s + f0 / k)) / Math.sqrt(k / m);
        assertEquals(expected, back - release, 5e-3 * expected);
        assertTrue(run.cautions().stream().anyMatch(c -> c.contains("60 V")));
        assertTrue(run.energy().relativeBalanceError() < 1e-6, run.energy().toString());
    }

    @Test
    void saturatingIronBalancesToo() {
        // an invented soft iron, B = μ0·H + Bs·H/(Hk + |H|): initial μr = 1 + Bs/(μ0·Hk), air-like slope when saturated;
        // H(B) is the positive root of μ0·H² + (μ0·Hk + Bs − B)·H − B·Hk = 0
        MagneticMaterial soft = new MagneticMaterial() {
            final double bs = 1.6, mur = 2000, hk = bs / (MU0 * (mur - 1));
            public String name() { return "test iron"; }
            public double relativePermeability() { return mur; }
            public Quantity saturationFluxDensity() { return T(bs); }
            public double fluxDensityAt(double h) { return MU0 * h + bs * h / (hk + Math.abs(h)); }
            public double fieldAt(double b) {
                double x = Math.abs(b), p = MU0 * hk + bs - x;
                double disc = Math.sqrt(p * p + 4 * MU0 * x * hk);
                double h = p >= 0 ? 2 * x * hk / (p + disc) : (disc - p) / (2 * MU0);
                return Math.copySign(h, b);
            }
            public boolean isLinear() { return false; }
        };
        Plunger p = demo().withIron(mm(60), soft).withParasiticGap(mm(0.05), cm2(1));
        Transient run = Drive.dc(V(12)).into(p).offAt(ms(10), Clamp.zener(V(24))).simulate(ms(25));
        assertTrue(run.energy().relativeBalanceError() < 1e-6, run.energy().toString());
        assertTrue(run.pullInTime().si() > 0);
    }

    @Test
    void tableSteelFromTheMaterialLibraryBalances() {
        Plunger p = demo().withIron(mm(60), org.ampturn.material.Materials.LOW_CARBON_STEEL).withParasiticGap(mm(0.05), cm2(1));
        Transient run = Drive.dc(V(12)).into(p).offAt(ms(10), Clamp.zener(V(24))).simulate(ms(25));
        assertTrue(run.energy().relativeBalanceError() < 1e-6, run.energy().toString());
        assertTrue(run.pullInTime().si() > 0 && run.dropOutTime().si() > 0, run.toString());
    }

    @Test
    void hotCoilPullsInLater() {
        Transient cold = Drive.dc(V(12)).into(demo()).simulate(ms(15));
        Transient hot = Drive.dc(V(12)).into(demo()).at(degC(120)).simulate(ms(15));
        assertTrue(hot.pullInTime().si() > cold.pullInTime().si(), cold.pullInTime() + " vs " + hot.pullInTime());
        // copper α20 = 0.00393 /K (IEC 60028)
        assertEquals(12 / (5 * (1 + 0.00393 * 100)), hot.finalCurrent().si(), 1e-12);
    }

    private static Marker marker(Transient run, String label) {
        return run.markers().stream().filter(m -> m.label().equals(label)).reduce((a, b) -> b).orElseThrow(() -> new AssertionError("no " + label + " in " + run.markers()));
    }
}
