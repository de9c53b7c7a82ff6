package org.ampturn.actuator;

import static org.ampturn.Ampturn.*;
import static org.junit.jupiter.api.Assertions.*;

import org.ampturn.material.MagneticMaterial;
import org.ampturn.material.Materials;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** Plunger-to-frame leakage: the coaxial-cylinder permeance across the coil, a third of it shunting the working gap. */
class FrameLeakageTest {
    static final double MU0 = 4e-7 * Math.PI;
    static final int N = 400;
    static final double AREA = 1e-4, STROKE = 4e-3, RESIDUAL = 0.05e-3;

    /**
     * Coaxial cylinders over a coil of length l with the MMF rising linearly along it: the radial
     * permeance 2π·μ0·l/ln(r2/r1) counts one third for the stored energy (Roters, Electromagnetic
     * Devices, 1941, ch. 7, from memory), derived here by hand: ½∫0^l (F·z/l)²·dP/l dz = ½F²·P/3.
     */
    static double leakage() {
        return 2 * Math.PI * MU0 * 0.03 / Math.log(11.0 / 6.0) / 3;
    }

    /** No iron and no parasitic gap: L(x) = N²·(μ0A/g + P_leak) with g = stroke + residual − x, the leakage adding as the formula says. */
    @Test
    void leakageAddsToTheGapPermeance() {
        Plunger bare = Plunger.of(N, cm2(1), m(STROKE)).withParasiticGap(mm(0), cm2(1));
        Plunger leaky = bare.withFrameLeakage(mm(30), mm(6), mm(11));
        assertEquals(leakage(), leaky.frameLeakagePermeance().si(), 1e-15);
        for (double x : new double[] {0, 1e-3, 3.9e-3}) {
            double g = STROKE + RESIDUAL - x;
            double expected = N * (double) N * (MU0 * AREA / g + leakage());
            assertEquals(expected, leaky.inductanceAt(x), 1e-12 * expected);
            assertEquals(N * (double) N * leakage(), leaky.inductanceAt(x) - bare.inductanceAt(x), 1e-9 * expected);
        }
        // open, the leakage is a sizeable part of the inductance; closed, a small one
        double openShare = leakage() / (MU0 * AREA / (STROKE + RESIDUAL) + leakage());
        assertEquals(openShare, 1 - bare.inductanceAt(0) / leaky.inductanceAt(0), 1e-9);
        assertTrue(openShare > 0.2, "open share " + openShare);
        double closedShare = leakage() / (MU0 * AREA / RESIDUAL + leakage());
        assertEquals(closedShare, 1 - bare.inductanceAt(STROKE) / leaky.inductanceAt(STROKE), 1e-9);
        assertTrue(closedShare < 0.1 * openShare, "closed share " + closedShare);
        // with all the MMF across the gap the leakage leaves the pull at a given current alone: ½(N·i)²·μ0A/g²
        double g = STROKE + RESIDUAL - 1e-3, f = 0.5 * Math.pow(N * 0.5, 2) * MU0 * AREA / (g * g);
        assertEquals(f, leaky.force(A(0.5), mm(1)).si(), 1e-9 * f);
    }

    /**
     * With a parasitic gap in series the leakage takes flux through it, which lowers the gap's MMF:
     * F_g = N·i/(1 + Rp·(P_g + P_leak)), F = ½F_g²·μ0A/g² (series-parallel reluctances, by hand).
     */
    @Test
    void withAParasiticGapTheLeakageLowersThePullAtAGivenCurrent() {
        double rp = 0.3e-3 / (MU0 * 1.5e-4);
        Plunger p = Plunger.of(N, cm2(1), m(STROKE)).withParasiticGap(mm(0.3), cm2(1.5)).withFrameLeakage(mm(30), mm(6), mm(11));
        double x = 0.5e-3, g = STROKE + RESIDUAL - x, pg = MU0 * AREA / g;
        double fg = N * 0.8 / (1 + rp * (pg + leakage()));
        double f = 0.5 * fg * fg * MU0 * AREA / (g * g);
        assertEquals(f, p.force(A(0.8), mm(0.5)).si(), 1e-9 * f);
        assertEquals(f, p.forceByCoenergy(A(0.8), mm(0.5)).si(), 1e-7 * f);
        assertEquals(N * (double) N / (1 / (pg + leakage()) + rp), p.inductanceAt(x), 1e-9 * p.inductanceAt(x));
    }

    /** The energy method: −∂W/∂x at constant λ and +∂W′/∂x at constant i agree with the leakage in (Fitzgerald, Kingsley and Umans, ch. 3). */
    @ParameterizedTest(name = "position {0} mm")
    @ValueSource(doubles = {0, 1, 2.5, 3.9})
    void forceByFluxAndByCoEnergyAgree(double xMm) {
        MagneticMaterial linear = MagneticMaterial.linear("steel", 1000, T(1.8));
        for (MagneticMaterial iron : new MagneticMaterial[] {linear, Materials.SILICON_STEEL}) {
            Plunger p = Plunger.of(N, cm2(1), m(STROKE)).withParasiticGap(mm(0.3), cm2(1.5)).withIron(mm(60), iron)
                    .withFringing(mm(3)).withFrameLeakage(mm(30), mm(6), mm(11));
            // a B-H table is interpolated with a continuous slope only (Fritsch-Carlson): near saturation that limits the
            // co-energy's difference quotient: near saturation differences up to 4e-5 are seen with or without the leakage
            double tol = iron.isLinear() ? 1e-7 : 1e-4;
            for (double i : new double[] {0.3, 2.0}) {
                double byFlux = p.force(A(i), mm(xMm)).si(), byCoenergy = p.forceByCoenergy(A(i), mm(xMm)).si();
                assertEquals(byFlux, byCoenergy, tol * Math.abs(byFlux), iron.name() + " at " + i + " A");
            }
        }
    }

    @Test
    void aFrameInsideThePlungerIsAClearError() {
        var e = assertThrows(IllegalArgumentException.class,
                () -> Plunger.of(N, cm2(1), m(STROKE)).withFrameLeakage(mm(30), mm(6), mm(5)));
        assertTrue(e.getMessage().contains("frame inner radius") && e.getMessage().contains("5"), e.getMessage());
    }
}
