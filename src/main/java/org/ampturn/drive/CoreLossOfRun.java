package org.ampturn.drive;

import java.util.List;
import org.ampturn.coil.Coil;
import org.ampturn.coil.Core;
import org.ampturn.coil.MagneticCircuit;
import org.ampturn.coil.WoundCoil;
import org.ampturn.material.CoreLoss;

/**
 * Core loss of a run: for a {@link WoundCoil} whose core pieces have a {@link CoreLoss}, the flux
 * Φ(t) = λ(t)/N of the run's output samples gives each piece its flux density B(t) = Φ/A (the
 * circuit's own split, {@link MagneticCircuit#fluxDensities}), and the iGSE energy of that waveform
 * ({@link CoreLoss#energyDensityAt}, minor loops included) times the piece's volume l·A is its loss.
 * The coil model itself has no core-loss resistance, so this is a post-process of the flux, reported
 * beside the energy ledger, not in it.
 */
final class CoreLossOfRun {
    private CoreLossOfRun() {}

    /** Core-loss energy (J) of the run, or NaN when the coil is not wound on a core with loss data. */
    static double energy(Coil coil, double[] time, double[] lambda) {
        if (!(coil instanceof WoundCoil)) return Double.NaN;
        WoundCoil w = (WoundCoil) coil;
        MagneticCircuit circuit = w.circuit();
        List<MagneticCircuit> parts = circuit.parts();
        boolean any = false;
        for (MagneticCircuit p : parts) any |= p instanceof Core && ((Core) p).material().coreLoss().isPresent();
        if (!any) return Double.NaN;
        int n = time.length, m = parts.size();
        double[][] b = new double[m][n];
        double[] out = new double[m];
        int[] next = new int[1];
        for (int j = 0; j < n; j++) {
            next[0] = 0;
            circuit.fluxDensities(lambda[j] / w.turns(), out, next);
            for (int k = 0; k < m; k++) b[k][j] = out[k];
        }
        double energy = 0;
        for (int k = 0; k < m; k++) {
            if (!(parts.get(k) instanceof Core)) continue;
            Core core = (Core) parts.get(k);
            if (core.material().coreLoss().isEmpty()) continue;
            double volume = core.pathLength().si() * core.area().si();
            energy += core.material().coreLoss().get().energyDensityAt(time, b[k]) * volume;
        }
        return energy;
    }
}
