package org.ampturn.coil;

/**
 * A coil as a lattice of coaxial circular filaments: {@code layers} radii, each carrying
 * {@code perLayer} turns at a fixed axial pitch, centred on z = 0. Inductances are sums of Maxwell's
 * mutual inductance between filaments, with the self-inductance of a round-wire loop on the diagonal.
 *
 * <p>Because the mutual between two filaments depends only on the two radii and the axial offset,
 * the double sum over turns of a layer pair collapses to one sum over offsets k with multiplicity
 * (T − k): a coil of L layers × T turns costs L(L+1)/2 · T evaluations of Maxwell's formula instead
 * of (L·T)².
 */
final class Filaments {
    final double[] radii;
    final int perLayer;
    final double pitch;
    final double wireRadius;

    Filaments(double[] radii, int perLayer, double pitch, double wireRadius) {
        this.radii = radii;
        this.perLayer = perLayer;
        this.pitch = pitch;
        this.wireRadius = wireRadius;
    }

    static Filaments of(AirCoil c) {
        if (c instanceof Solenoid) return ((Solenoid) c).filaments();
        return ((Multilayer) c).filaments();
    }

    /**
     * Self-inductance (H) of a loop of round wire, uniform current (DC): L = μ0·a·(ln(8a/ρ) − 7/4)
     * (Kirchhoff; Rosa and Grover, Bull. Bureau of Standards 8, 1912, formula (1); Grover 1946, ch. 16).
     * Valid for ρ ≪ a; the neglected terms are of order (ρ/a)².
     */
    static double loopSelf(double a, double rho) {
        return Elliptic.MU0 * a * (Math.log(8 * a / rho) - 1.75);
    }

    /** Self-inductance of the whole lattice (H). */
    double selfInductance() {
        int nl = radii.length, t = perLayer;
        double sum = 0;
        for (int i = 0; i < nl; i++) {
            double ri = radii[i];
            double s = t * loopSelf(ri, wireRadius);
            for (int k = 1; k < t; k++) s += 2.0 * (t - k) * Elliptic.maxwell(ri, ri, k * pitch);
            sum += s;
            for (int j = i + 1; j < nl; j++) {
                double rj = radii[j];
                double m = t * Elliptic.maxwell(ri, rj, 0);
                for (int k = 1; k < t; k++) m += 2.0 * (t - k) * Elliptic.maxwell(ri, rj, k * pitch);
                sum += 2 * m;
            }
        }
        return sum;
    }

    /** Mutual inductance (H) with another lattice whose centre lies {@code distance} (m) further along the axis. */
    double mutual(Filaments o, double distance) {
        int ta = perLayer, tb = o.perLayer;
        double za0 = -0.5 * (ta - 1) * pitch;
        double zb0 = distance - 0.5 * (tb - 1) * o.pitch;
        double sum = 0;
        boolean samePitch = Math.abs(pitch - o.pitch) <= 1e-12 * Math.max(pitch, o.pitch);
        for (double ra : radii) {
            for (double rb : o.radii) {
                if (samePitch) {
                    // offset of turn ib of b from turn ia of a: zb0 - za0 + (ib - ia) * pitch; m = ib - ia
                    for (int m = -(ta - 1); m <= tb - 1; m++) {
                        int count = Math.min(ta - 1, tb - 1 - m) - Math.max(0, -m) + 1;
                        if (count <= 0) continue;
                        double dz = zb0 - za0 + m * pitch;
                        checkApart(ra, rb, dz, o);
                        sum += count * Elliptic.maxwell(ra, rb, dz);
                    }
                } else {
                    for (int ia = 0; ia < ta; ia++) {
                        double za = za0 + ia * pitch;
                        for (int ib = 0; ib < tb; ib++) {
                            double dz = zb0 + ib * o.pitch - za;
                            checkApart(ra, rb, dz, o);
                            sum += Elliptic.maxwell(ra, rb, dz);
                        }
                    }
                }
            }
        }
        return sum;
    }

    private void checkApart(double ra, double rb, double dz, Filaments o) {
        double gap = Math.hypot(ra - rb, dz);
        if (gap < (wireRadius + o.wireRadius) * (1 - 1e-9)) {
            throw new IllegalArgumentException("the coils overlap: a turn of one lies " + gap * 1e3 + " mm from a turn of the other, closer than the wires allow ("
                    + (wireRadius + o.wireRadius) * 1e3 + " mm); move them further apart along the axis or change a diameter");
        }
    }
}
