package org.ampturn.drive;

import static org.ampturn.drive.Solver.*;

/** The output samples of one run, filled in time order (the mutable side of a {@link Transient}). */
final class Recorder {
    final double[] time, current, lambda, coilV, resV, switchV, pSup, pCoil, pDrive, pClamp,
            eSup, eDiss, eClamp, eStored;
    final double[] pMech, eMech, x, v, force, capV; // null unless the armature moves / there is a snubber
    final double[] pCore, eCore; // null unless the circuit draws core loss
    final double[] i2; // null unless there is a coupled secondary winding
    private final int coreIndex;

    Recorder(int n, boolean moves, boolean snub) {
        this(n, moves, snub, -1, false);
    }

    /** coreIndex: the state index of the core-loss energy integral, or −1 without one; secondary: record its current. */
    Recorder(int n, boolean moves, boolean snub, int coreIndex, boolean secondary) {
        this.coreIndex = coreIndex;
        i2 = secondary ? new double[n] : null;
        pCore = coreIndex >= 0 ? new double[n] : null;
        eCore = coreIndex >= 0 ? new double[n] : null;
        time = new double[n];
        current = new double[n];
        lambda = new double[n];
        coilV = new double[n];
        resV = new double[n];
        switchV = new double[n];
        pSup = new double[n];
        pCoil = new double[n];
        pDrive = new double[n];
        pClamp = new double[n];
        eSup = new double[n];
        eDiss = new double[n];
        eClamp = new double[n];
        eStored = new double[n];
        pMech = moves ? new double[n] : null;
        eMech = moves ? new double[n] : null;
        x = moves ? new double[n] : null;
        v = moves ? new double[n] : null;
        force = moves ? new double[n] : null;
        capV = snub ? new double[n] : null;
    }

    void put(int k, double t, double[] s, double[] o, double stored, double rc) {
        double i = o[O_I];
        time[k] = t;
        current[k] = i;
        lambda[k] = s[LAM];
        coilV[k] = o[O_DLAM] + i * rc;
        resV[k] = i * rc;
        switchV[k] = o[O_VSW];
        pSup[k] = o[O_PSUP];
        pCoil[k] = o[O_PCOIL];
        pDrive[k] = o[O_PDRV];
        pClamp[k] = o[O_PCL];
        eSup[k] = s[ESUP];
        eDiss[k] = s[ECOIL] + s[EDRV];
        eClamp[k] = s[ECL];
        eStored[k] = stored;
        if (x != null) {
            pMech[k] = o[O_PMECH];
            eMech[k] = s[EMECH];
            x[k] = s[X];
            v[k] = s[V];
            force[k] = o[O_F];
        }
        if (capV != null) capV[k] = s[VC];
        if (i2 != null) i2[k] = o[O_I2];
        if (eCore != null) {
            pCore[k] = o[O_PCORE];
            eCore[k] = s[coreIndex];
        }
    }
}
