package org.ampturn.coil;

import static org.ampturn.Ampturn.*;
import static org.junit.jupiter.api.Assertions.*;

import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class LoopsTest {
    private static final double MU0 = 4e-7 * Math.PI;

    /**
     * Neumann's double integral for coaxial circles reduces to
     * M = (μ0 a b / 2)·∫0^2π cos φ / √(a² + b² + z² − 2ab cos φ) dφ (Grover 1946, ch. 13, eq. before
     * Maxwell's form); evaluated here by Commons Math Gauss-Legendre quadrature as an independent reference.
     */
    static double neumann(double a, double b, double z) {
        var quad = new IterativeLegendreGaussIntegrator(16, 1e-13, 1e-15);
        double i = quad.integrate(1_000_000, p -> Math.cos(p) / Math.sqrt(a * a + b * b + z * z - 2 * a * b * Math.cos(p)), 0, 2 * Math.PI);
        return MU0 * a * b / 2 * i;
    }

    @ParameterizedTest(name = "a = {0}, b = {1}, z = {2}")
    @CsvSource({"0.1, 0.1, 0.1", "0.05, 0.02, 0.0", "0.01, 0.0101, 0.0002", "0.2, 0.05, 0.5", "0.03, 0.03, 0.003"})
    void maxwellMatchesNeumannQuadrature(double a, double b, double z) {
        double ref = neumann(a, b, z);
        assertEquals(ref, Loops.mutualAt(a, b, z), 1e-9 * ref);
    }

    /** Far apart the loops act as dipoles: M → μ0 π a² b² / (2 z³) (common practice, dipole limit). No cancellation far out. */
    @Test
    void farFieldDipoleLimit() {
        double a = 0.01, b = 0.02, z = 100;
        double dipole = MU0 * Math.PI * a * a * b * b / (2 * z * z * z);
        assertEquals(dipole, Loops.mutualAt(a, b, z), 1e-6 * dipole);
    }

    /** Close loops: M → μ0 a (ln(8a/d) − 2), d the distance between the wires (Grover 1946, ch. 13, close circles; Maxwell). */
    @Test
    void closeLoopsLimit() {
        double a = 0.1, z = 1e-5;
        double close = MU0 * a * (Math.log(8 * a / z) - 2);
        assertEquals(close, Loops.mutualAt(a, a, z), 1e-6 * close);
    }

    @Test
    void quantitySurface() {
        assertEquals(Loops.mutualAt(0.1, 0.1, 0.1), Loops.mutualInductance(cm(10), cm(10), cm(10)).si(), 0);
        assertEquals("49.41 nH", Loops.mutualInductance(cm(10), cm(10), cm(10)).toString());
        var e = assertThrows(IllegalArgumentException.class, () -> Loops.mutualInductance(cm(1), cm(1), cm(0)));
        assertTrue(e.getMessage().contains("coincide"));
        e = assertThrows(IllegalArgumentException.class, () -> Loops.mutualInductance(cm(-1), cm(1), cm(1)));
        assertTrue(e.getMessage().contains("radius 1"), e.getMessage());
    }

    /** Round-wire loop L = μ0 a (ln(8a/ρ) − 7/4) (Rosa and Grover 1912); 10 cm loop of 1 mm radius wire: 0.5333 μH (computed from that formula). */
    @Test
    void loopSelfInductance() {
        double expect = MU0 * 0.1 * (Math.log(800) - 1.75);
        assertEquals(expect, Loops.selfInductance(cm(10), mm(1)).si(), 1e-15);
        assertThrows(IllegalArgumentException.class, () -> Loops.selfInductance(mm(1), mm(2)));
    }

    /** A coil's mutual with itself at zero distance equals its own filament sum less the diagonal: consistency of the two sums. */
    @Test
    void coaxialCoilsMutualIsSymmetricAndBoundedByTheSelves() {
        Solenoid p = Solenoid.singleLayer(12, mm(6), mm(30)).withWire(mm(0.4));
        Solenoid q = Solenoid.singleLayer(7, mm(2.8), mm(50)).withWire(mm(0.3));
        double m1 = Loops.mutualInductance(p, q, mm(12)).si();
        double m2 = Loops.mutualInductance(q, p, mm(-12)).si();
        assertEquals(m1, m2, 1e-12 * m1);
        double k = Loops.coupling(p, q, mm(12));
        assertTrue(k > 0 && k < 1, "k = " + k);
        // direct turn-by-turn sum as the reference (different pitch path: no lattice shortcut)
        double direct = 0;
        for (int i = 0; i < 12; i++) {
            for (int j = 0; j < 7; j++) {
                double zi = -0.5 * 11 * 0.5e-3 + i * 0.5e-3, zj = 0.012 - 0.5 * 6 * 0.4e-3 + j * 0.4e-3;
                direct += neumann(0.015, 0.025, zj - zi);
            }
        }
        assertEquals(direct, m1, 1e-8 * direct);
    }

    /**
     * Identity of the filament sums (Grover 1946, ch. 1: L of two coils in series aiding is
     * L1 + L2 + 2M): a 60-turn solenoid equals its two 30-turn halves plus twice their mutual.
     */
    @Test
    void halvesOfACoilAddUpWithTheirMutual() {
        Solenoid whole = Solenoid.singleLayer(60, mm(30), mm(20)).withWire(mm(0.4));
        Solenoid half = Solenoid.singleLayer(30, mm(15), mm(20)).withWire(mm(0.4));
        double m = Loops.mutualInductance(half, half, mm(15)).si();
        double sum = 2 * half.filamentSum().si() + 2 * m;
        assertEquals(whole.filamentSum().si(), sum, 1e-12 * sum);
        double k = Loops.coupling(half, half, mm(15));
        assertTrue(k > 0.1 && k < 0.5, "k = " + k);
        var e = assertThrows(IllegalArgumentException.class, () -> Loops.mutualInductance(half, half, mm(5)));
        assertTrue(e.getMessage().contains("overlap"), e.getMessage());
    }
}
