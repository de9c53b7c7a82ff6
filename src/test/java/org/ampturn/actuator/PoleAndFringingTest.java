package org.ampturn.actuator;

import static org.ampturn.Ampturn.*;
import static org.junit.jupiter.api.Assertions.*;

import org.ampturn.material.MagneticMaterial;
import org.ampturn.material.Materials;
import org.ampturn.units.Quantity;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.junit.jupiter.api.Test;
import java.util.stream.Stream;

/** Roters' fringing permeances, pole shapes, and the force by flux against the force by co-energy. */
class PoleAndFringingTest {
    static final double MU0 = 4e-7 * Math.PI;

    @Test
    void rotersShapesAgainstTheirDerivations() {
        // half cylinder: mean path 1.22·g, mean area 0.322·g·l (Roters, Electromagnetic Devices, 1941, ch. 5, from memory),
        // which Roters rounds to 0.26·μ0·l
        double l = 0.01;
        assertEquals(0.26 * MU0 * l, Permeance.halfCylinder(m(l)).si(), 0.02 * 0.26 * MU0 * l);
        // half annulus along semicircular paths, r from g/2 to g/2 + t: ∫ μ0·l·dr/(π·r) = (μ0·l/π)·ln(1 + 2t/g), checked by
        // quadrature of that integral; Roters' mean-length form 2μ0·l·t/(π(g + t)) is within 10 % for t ≤ g
        for (double[] gt : new double[][] {{1e-3, 0.5e-3}, {1e-3, 1e-3}, {0.2e-3, 3e-3}}) {
            double g = gt[0], t = gt[1];
            int n = 20000;
            double sum = 0, a = g / 2, b = g / 2 + t, h = (b - a) / n;
            for (int k = 0; k < n; k++) sum += MU0 * l / (Math.PI * (a + (k + 0.5) * h)) * h;
            assertEquals(sum, Permeance.halfAnnulus(m(l), m(g), m(t)).si(), 1e-7 * sum);
            if (t <= g) assertEquals(2 * MU0 * l * t / (Math.PI * (g + t)), sum, 0.10 * sum);
        }
        // coaxial cylinders: the radial reluctance ∫ dr/(μ0·2π·r·l) = ln(r2/r1)/(2π·μ0·l) (Roters ch. 7)
        assertEquals(2 * Math.PI * MU0 * 0.02 / Math.log(2), Permeance.coaxial(m(0.02), mm(5), mm(10)).si(), 1e-15);
        assertEquals(MU0 * 1e-4 / 1e-3, Permeance.parallelFaces(cm2(1), mm(1)).si(), 1e-18);
    }

    static Plunger base(MagneticMaterial iron) {
        return Plunger.of(400, cm2(1), mm(2)).withParasiticGap(mm(0.3), cm2(1.5)).withIron(mm(60), iron);
    }

    static Stream<Object[]> shapes() {
        MagneticMaterial linear = MagneticMaterial.linear("steel", 1000, T(1.8));
        MagneticMaterial table = Materials.SILICON_STEEL;
        return Stream.of(
                new Object[] {"flat, fringing, linear", base(linear).withFringing(mm(4))},
                new Object[] {"conical 30°, linear", base(linear).withConicalPole(30)},
                new Object[] {"conical 45°, fringing, B-H table", base(table).withConicalPole(45).withFringing(mm(3))},
                new Object[] {"stepped, fringing, B-H table", base(table).withSteppedPole(0.6, mm(0.5)).withFringing(mm(3))},
                new Object[] {"flat, B-H table", base(table)});
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("shapes")
    void forceByFluxAndByCoEnergyAgree(String name, Plunger p) {
        // the energy method: −∂W/∂x at constant λ equals +∂W′/∂x at constant i (Fitzgerald, Kingsley and Umans,
        // Electric Machinery, 6th ed., ch. 3), also with saturating iron; the B-H table is interpolated with a continuous
        // slope only (Fritsch-Carlson), which limits the difference quotient to about 1e-5 there (as for Electromagnet)
        double tol = name.contains("B-H") ? 1e-5 : 1e-7;
        for (double x : new double[] {0.2e-3, 1e-3, 1.8e-3}) {
            for (double i : new double[] {0.2, 1.5}) {
                double byFlux = p.force(A(i), m(x)).si(), byCoenergy = p.forceByCoenergy(A(i), m(x)).si();
                assertEquals(byFlux, byCoenergy, tol * byFlux, name + " at " + x + " m, " + i + " A");
            }
        }
    }

    @Test
    void fringingRaisesTheInductanceAtLargeGapsByRotersPermeances() {
        Plunger ideal = Plunger.of(400, cm2(1), mm(2));
        Plunger fringe = ideal.withFringing(mm(4));
        double g = 2.05e-3, p = 2 * Math.sqrt(Math.PI * 1e-4);
        double perm = MU0 * 1e-4 / g + MU0 * 0.322 / 1.22 * p + MU0 * p / Math.PI * Math.log1p(2 * 4e-3 / g);
        double rp = 0.1e-3 / (MU0 * 1e-4);
        assertEquals(400.0 * 400 / (1 / perm + rp), fringe.inductanceAt(0), 1e-9 * fringe.inductanceAt(0));
        assertTrue(fringe.inductanceAt(0) > 1.3 * ideal.inductanceAt(0));
        // nearly closed the gap's own permeance dominates: fringing changes little
        assertEquals(ideal.inductanceAt(2e-3), fringe.inductanceAt(2e-3), 0.05 * ideal.inductanceAt(2e-3));
        assertEquals(perm, fringe.gapPermeance(mm(0)).si(), 1e-12 * perm);
    }

    @Test
    void aConicalPoleHasTheFlatterForceStroke() {
        MagneticMaterial iron = MagneticMaterial.linear("steel", 1000, T(1.8));
        Plunger flat = base(iron), cone = base(iron).withConicalPole(30);
        double flatRatio = flat.force(A(1), mm(0)).si() / flat.force(A(1), mm(1.9)).si();
        double coneRatio = cone.force(A(1), mm(0)).si() / cone.force(A(1), mm(1.9)).si();
        assertTrue(coneRatio > 2 * flatRatio, "open/closed force: flat " + flatRatio + ", cone " + coneRatio);
        assertTrue(cone.force(A(1), mm(0)).si() > flat.force(A(1), mm(0)).si(), "the cone pulls harder at the open end");
        assertTrue(cone.toString().contains("conical pole 30"), cone.toString());
    }

    @Test
    void badPoleShapesAreRefusedByName() {
        Plunger p = Plunger.of(400, cm2(1), mm(2));
        for (double a : new double[] {0, 90, -5, 120, Double.NaN}) {
            IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> p.withConicalPole(a));
            assertTrue(e.getMessage().startsWith("cone angle must be between 0° and 90°"), e.getMessage());
        }
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> p.withConicalPole(95));
        assertTrue(e.getMessage().contains("95"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> p.withSteppedPole(1.2, mm(0.5)));
        assertTrue(e.getMessage().contains("inner share"), e.getMessage());
    }
}
