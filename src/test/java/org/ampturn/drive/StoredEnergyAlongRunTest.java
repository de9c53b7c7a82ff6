package org.ampturn.drive;

import static org.ampturn.Ampturn.*;
import static org.junit.jupiter.api.Assertions.*;

import org.ampturn.coil.AirGap;
import org.ampturn.coil.Coil;
import org.ampturn.coil.Core;
import org.ampturn.coil.MagneticCircuit;
import org.ampturn.coil.WoundCoil;
import org.ampturn.material.Materials;
import org.junit.jupiter.api.Test;

/**
 * The stored energy the solver records, W = ∫ i dλ taken along the run (Simpson's rule between
 * neighbouring samples), against Gauss quadrature on saturating curves: 5-point Gauss-Legendre on
 * 200 panels between neighbouring samples (Abramowitz and Stegun, Handbook of Mathematical
 * Functions, 25.4.29 and table 25.4), and the closed-form co-energy of the analytic test coil,
 * W = λ·i − ∫0^i λ di' (Fitzgerald, Kingsley and Umans, Electric Machinery, ch. 3). Stated
 * tolerance: 1e-9 of the energy (of 1e-3 of the peak, where less) on the B-H table coil, whose
 * i(λ) is only C¹ at the table's points, and 1e-10 of the run's peak energy sample by sample
 * (measured: 2e-11 of the peak, against 3e-7 with the former fixed Gauss panels); 1e-10 on the
 * smooth analytic coil.
 */
class StoredEnergyAlongRunTest {
    // an invented gapped silicon-steel core (the B-H table of the catalogue): 80 mm path, 1 cm², 0.2 mm gap
    private final WoundCoil wound = WoundCoil.of(200, ohm(2), MagneticCircuit.series(
            Core.of(mm(80), cm2(1), Materials.SILICON_STEEL), AirGap.of(mm(0.2), cm2(1))));

    private static final double[] GX = {0, -0.5384693101056831, 0.5384693101056831, -0.9061798459386640, 0.9061798459386640};
    private static final double[] GW = {0.5688888888888889, 0.4786286704993665, 0.4786286704993665, 0.2369268850561891, 0.2369268850561891};

    /** ∫a^b i dλ by 5-point Gauss-Legendre on 200 panels. */
    private static double gauss(Coil c, double a, double b) {
        int panels = 200;
        double h = (b - a) / panels, sum = 0;
        for (int p = 0; p < panels; p++) {
            double mid = a + (p + 0.5) * h;
            for (int k = 0; k < 5; k++) sum += GW[k] * c.currentAt(mid + 0.5 * h * GX[k]);
        }
        return sum * 0.5 * h;
    }

    /** Up into deep saturation and back down in 2,000 steps each, as a run's samples go, then a jump to zero. */
    @Test
    void bhTableCoilUpAndDownAgreesWithGaussQuadrature() {
        Load load = Load.of(wound);
        double top = wound.fluxLinkageAt(12); // 2,400 ampere-turns: B near 1.9 T in the steel
        int steps = 2000;
        double reference = 0, prev = 0, worst = 0, peak = 0;
        // the peak: 2,000 steps of 200 panels each (a single stretch of 200 panels misses the table's breaks by 1e-8)
        for (int k = 1; k <= steps; k++) peak += gauss(wound, top * (k - 1) / steps, top * k / steps);
        for (int k = 1; k < 2 * steps; k++) {
            double lam = top * (k <= steps ? k : 2 * steps - k) / steps;
            reference += gauss(wound, prev, lam);
            prev = lam;
            double i = load.currentAt(lam, 0); // the solver evaluates the current at a sample before its energy
            assertEquals(wound.currentAt(lam), i, 0);
            // on the way down W is a difference of nearly equal sums: below 1e-3 of the peak, rounding of the peak is what is left
            worst = Math.max(worst, Math.abs(load.fieldEnergyAt(lam, 0) - reference) / Math.max(reference, 1e-3 * peak));
        }
        assertTrue(worst < 1e-9, "worst relative difference " + worst);
        assertEquals(0, load.fieldEnergyAt(0, 0), 0);
        // and back up from zero in one long stretch
        assertEquals(peak, load.fieldEnergyAt(top, 0), 1e-9 * peak);
    }

    @Test
    void analyticCoilAgreesWithTheClosedFormCoEnergyWithoutTheCurrentAskedFirst() {
        SaturatingCoil c = new SaturatingCoil(40e-3, 0.5, 2e-3, 4);
        Load load = Load.of(c);
        double top = c.fluxLinkageAt(3.0);
        for (int k = 1; k <= 2001; k++) {
            double lam = top * k / 2001;
            double i = c.currentAt(lam);
            double expected = lam * i - c.coEnergyAt(i); // W = λi − W'
            assertEquals(expected, load.fieldEnergyAt(lam, 0), 1e-10 * expected, "W at λ = " + lam);
        }
    }

    /** The recorded stored energy of a whole saturating run with a zener turn-off, sample by sample. */
    @Test
    void recordedStoredEnergyOfASaturatingRunAgreesWithGaussQuadrature() {
        Transient run = Drive.dc(V(24)).into(wound).offAt(ms(20), Clamp.zener(V(36))).tolerance(1e-8).simulate(ms(40));
        double[] lam = run.fluxLinkage().values(), w = run.storedEnergy().values();
        double[] reference = new double[lam.length];
        double sum = 0, prev = 0, peak = 0;
        for (int k = 0; k < lam.length; k++) {
            sum += gauss(wound, prev, lam[k]);
            prev = lam[k];
            reference[k] = sum;
            peak = Math.max(peak, sum);
        }
        for (int k = 0; k < lam.length; k++) assertEquals(reference[k], w[k], 1e-10 * peak, "stored energy at sample " + k);
        assertTrue(peak > 0.05, "the run stores " + peak + " J at its peak");
        assertTrue(run.energy().relativeBalanceError() < 1e-6, run.energy().toString());
    }
}
