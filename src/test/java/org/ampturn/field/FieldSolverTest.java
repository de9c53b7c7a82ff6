package org.ampturn.field;

import static org.junit.jupiter.api.Assertions.*;

import org.ampturn.coil.Solenoid;
import org.ampturn.material.MagneticMaterial;
import org.ampturn.units.Quantity;
import org.junit.jupiter.api.Test;

/**
 * The axisymmetric solver against closed forms and the library's own exact air-coil inductance.
 * Coarse meshes keep the class fast; bench/field runs the fine ones.
 */
class FieldSolverTest {
    static final double MU0 = MagneticMaterial.MU0;

    static Quantity amps(double a) { return Quantity.of(a, "A"); }

    /**
     * A thin current sheet of mean radius a, length l. Its thickness t = min(a, l)/5000 lowers L by
     * about 0.7·t/l (measured here: −1.4 % at t/l = 0.02, −8.6 % at 0.2), under 0.02 %.
     */
    static Geometry sheet(double a, double l, int turns, int cells) {
        double t = Math.min(a, l) / 5000;
        return Geometry.of().withCellsAcross(cells).withWinding("coil", Shape.rectAt(a - t / 2, 0, a + t / 2, l), turns, amps(1));
    }

    @Test
    void singleLayerSolenoidMatchesNagaoka() {
        // exact current-sheet inductance L = K·μ0·N²·π·a²/l: Solenoid.inductanceAt (Nagaoka's K by the
        // AGM); published table: K(2a/l = 1) = 0.6884 (Nagaoka 1909; Grover, Inductance Calculations, table 36; from memory)
        assertEquals(0.6884, Solenoid.nagaokaAt(1.0), 1e-4);
        for (double[] al : new double[][] {{0.01, 0.02}, {0.01, 0.005}}) {
            double a = al[0], l = al[1];
            Solution s = sheet(a, l, 100, 12).mesh().refined().solve();
            double exact = Solenoid.inductanceAt(100, l, 2 * a);
            assertEquals(exact, s.inductance().si(), 0.005 * exact, "L of a = " + a + ", l = " + l + " on " + s.mesh());
            // linear: energy ½LI², incremental = secant
            assertEquals(0.5 * s.inductance().si(), s.energy().si(), 1e-9 * s.energy().si());
            assertEquals(s.inductance().si(), s.incrementalInductance().si(), 1e-9 * s.inductance().si());
            assertEquals(s.energy().si(), s.coEnergy().si(), 1e-9 * s.energy().si());
        }
    }

    @Test
    void longSolenoidCentreField() {
        double a = 0.01, l = 0.2;
        Solution s = Geometry.of().withWinding("coil", Shape.rectAt(a, -l / 2, a + 1e-5, l / 2), 1000, amps(1)).solve();
        double ideal = MU0 * 1000 / l; // infinite solenoid, μ0·N·I/l (common practice)
        double finite = MU0 * 1000 / Math.sqrt(l * l + 4 * a * a); // on-axis centre field of a finite sheet (Biot-Savart, common practice)
        Quantity zero = Quantity.of(0, "m");
        double bc = s.axialFluxDensity(zero, zero).si();
        assertEquals(ideal, bc, 0.01 * ideal);
        assertEquals(finite, bc, 0.002 * finite);
        assertEquals(finite, s.fluxDensity(Quantity.of(a / 2, "m"), zero).si(), 0.005 * finite);
    }

    /** A flat-faced pot magnet: cup of ideal iron, coil in the window, a disc armature across both pole faces at gap g. */
    static Geometry pot(double g, int cells) {
        double a = 5e-3, r2 = 9e-3, r3 = Math.sqrt(r2 * r2 + a * a), h = 10e-3; // both pole faces of area π·a²
        MagneticMaterial iron = MagneticMaterial.linear("ideal iron", 1e6, Quantity.of(2, "T"));
        return Geometry.of().withCellsAcross(cells)
                .with("pot", Shape.polygonAt(0, -3e-3, r3, -3e-3, r3, h, r2, h, r2, 0, a, 0, a, h, 0, h), iron)
                .withWinding("coil", Shape.rectAt(a + 0.5e-3, 0.5e-3, r2 - 0.5e-3, h - 0.5e-3), 100, amps(1))
                .with("armature", Shape.rectAt(0, h + g, r3, h + g + 3e-3), iron);
    }

    @Test
    void flatGapForceBothWays() {
        double g = 0.05e-3, area = Math.PI * 25e-6;
        AxialForce f = pot(g, 12).force("armature");
        // two equal gaps in series, each across NI/2: F = 2 · μ0(NI/2)²A/(2g²) (Roters, Electromagnetic
        // Devices, 1941, ch. 5, from memory; the μ0(NI)²A/(2g²) per gap); the pull is toward −z
        double ref = -2 * MU0 * 50 * 50 * area / (2 * g * g);
        assertEquals(ref, f.virtualWork().si(), 0.03 * Math.abs(ref), f.toString());
        assertEquals(ref, f.maxwell().si(), 0.03 * Math.abs(ref), f.toString());
        assertTrue(Math.abs(f.difference()) < 0.01, f.toString());
    }

    @Test
    void gappedPotInductanceAboveTheGapReluctanceAndRisingWithTheGap() {
        double area = Math.PI * 25e-6;
        double last = 1;
        for (double g : new double[] {0.05e-3, 0.2e-3, 1e-3}) {
            Solution s = pot(g, 10).solve();
            double lGap = 100 * 100 / (2 * g / (MU0 * area)); // N²/R_gap, two gaps in series (common practice)
            double fringing = s.inductance().si() / lGap;
            assertTrue(fringing > last, "fringing factor " + fringing + " at g " + g);
            last = fringing;
            if (g == 0.05e-3) assertEquals(1.1, fringing, 0.06, "fringing factor at a gap of 1 % of the post radius");
        }
    }

    @Test
    void energyConvergesAtSecondOrder() {
        Mesh m = Geometry.of().withCellsAcross(5).withWinding("coil", Shape.rectAt(0.01, 0, 0.015, 0.01), 100, amps(1)).mesh();
        double w0 = m.solve().energy().si(), w1 = m.refined().solve().energy().si(), w2 = m.refined().refined().solve().energy().si();
        // energy error of first-order elements falls as h² (Strang and Fix, An Analysis of the FEM, 1973, from memory)
        double order = Math.log((w1 - w0) / (w2 - w1)) / Math.log(2);
        assertEquals(2, order, 0.3, "observed order from " + w0 + ", " + w1 + ", " + w2);
        assertTrue(w0 < w1 && w1 < w2, "energy rises toward the exact value from below (the stiffness is too stiff)");
        assertEquals(4 * m.triangles(), m.refined().triangles());
    }

    @Test
    void meshPassesThroughEveryCornerWithSeveralCellsAcrossEachGap() {
        Mesh m = pot(0.05e-3, 10).mesh();
        for (double zc : new double[] {10e-3, 10.05e-3}) assertTrue(java.util.Arrays.binarySearch(m.z, zc) >= 0, "grid line at " + zc);
        int j0 = java.util.Arrays.binarySearch(m.z, 10e-3), j1 = java.util.Arrays.binarySearch(m.z, 10.05e-3);
        assertTrue(j1 - j0 >= Mesh.MIN_CELLS, "cells across the gap: " + (j1 - j0));
        assertTrue(m.minAngleDegrees() > 0 && m.minAngleDegrees() <= 45);
        assertTrue(m.toString().startsWith("mesh "), m.toString());
    }
}
