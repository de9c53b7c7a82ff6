package org.ampturn.coil;

import org.ampturn.units.Require;

/**
 * A coil as a lattice of coaxial circular filaments: layers at given radii, layer i carrying
 * {@code counts[i]} turns at a common axial pitch from {@code starts[i]} on. Inductances are sums of
 * Maxwell's mutual inductance between filaments, with the self-inductance of a round-wire loop on
 * the diagonal.
 *
 * <p>Because the mutual between two filaments depends only on the two radii and the axial offset,
 * the double sum over the turns of two layers collapses to one sum over offsets with their
 * multiplicity (T − k for equal layers): a coil of L layers × T turns costs about L(L+1)/2 · T
 * evaluations of Maxwell's formula instead of (L·T)².
 */
final class Filaments {
    final double[] radii;
    final int[] counts;
    final double[] starts;
    final double pitch;
    final double wireRadius;

    /** Equal layers of {@code perLayer} turns centred on z = 0. */
    Filaments(double[] radii, int perLayer, double pitch, double wireRadius) {
        this(radii, fill(radii.length, perLayer), fillStarts(radii.length, -0.5 * (perLayer - 1) * pitch), pitch, wireRadius);
    }

    Filaments(double[] radii, int[] counts, double[] starts, double pitch, double wireRadius) {
        this.radii = radii;
        this.counts = counts;
        this.starts = starts;
        this.pitch = pitch;
        this.wireRadius = wireRadius;
    }

    private static int[] fill(int n, int v) {
        int[] a = new int[n];
        java.util.Arrays.fill(a, v);
        return a;
    }

    private static double[] fillStarts(int n, double v) {
        double[] a = new double[n];
        java.util.Arrays.fill(a, v);
        return a;
    }

    private static void checkWork(double evaluations) {
        if (evaluations > MAX_EVALUATIONS) {
            throw Require.fail("the filament sum needs about " + Require.show(evaluations) + " evaluations of Maxwell's formula, at most "
                    + Require.show(MAX_EVALUATIONS) + "; use a closed form (Wheeler, Brooks) for a coil this large");
        }
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

    /** Most evaluations of Maxwell's formula one sum may take (about 10 s). */
    static final double MAX_EVALUATIONS = 2e8;

    /** Self-inductance of the whole lattice (H). */
    double selfInductance() {
        int nl = radii.length;
        double work = 0;
        for (int c : counts) work += (double) c;
        work *= 0.5 * (nl + 1);
        checkWork(work);
        double sum = 0;
        for (int i = 0; i < nl; i++) {
            Require.notInterrupted("filament sum");
            double ri = radii[i];
            int t = counts[i];
            double s = t * loopSelf(ri, wireRadius);
            for (int k = 1; k < t; k++) s += 2.0 * (t - k) * Elliptic.maxwell(ri, ri, k * pitch);
            sum += s;
            for (int j = i + 1; j < nl; j++) {
                double rj = radii[j];
                double m;
                if (counts[j] == t && starts[j] == starts[i]) {
                    // equal, aligned layers: offsets ±k occur equally often
                    m = t * Elliptic.maxwell(ri, rj, 0);
                    for (int k = 1; k < t; k++) m += 2.0 * (t - k) * Elliptic.maxwell(ri, rj, k * pitch);
                } else {
                    m = layerPair(ri, t, starts[i], rj, counts[j], starts[j], pitch, null);
                }
                sum += 2 * m;
            }
        }
        return sum;
    }

    /** Mutual inductance (H) with another lattice displaced by {@code distance} (m) along the axis. */
    double mutual(Filaments o, double distance) {
        boolean samePitch = Math.abs(pitch - o.pitch) <= 1e-12 * Math.max(pitch, o.pitch);
        double ta = 0, tb = 0;
        for (int c : counts) ta += c;
        for (int c : o.counts) tb += c;
        checkWork(samePitch ? (ta / radii.length + tb / o.radii.length) * radii.length * o.radii.length : ta * tb);
        double sum = 0;
        for (int i = 0; i < radii.length; i++) {
            for (int j = 0; j < o.radii.length; j++) {
                Require.notInterrupted("filament sum");
                if (samePitch) {
                    sum += layerPair(radii[i], counts[i], starts[i], o.radii[j], o.counts[j], distance + o.starts[j], pitch, o);
                } else {
                    for (int ia = 0; ia < counts[i]; ia++) {
                        double za = starts[i] + ia * pitch;
                        for (int ib = 0; ib < o.counts[j]; ib++) {
                            double dz = distance + o.starts[j] + ib * o.pitch - za;
                            checkApart(radii[i], o.radii[j], dz, o);
                            sum += Elliptic.maxwell(radii[i], o.radii[j], dz);
                        }
                    }
                }
            }
        }
        return sum;
    }

    /**
     * Σ over the turns of two layers (ta turns from za, tb turns from zb, same pitch) of Maxwell's
     * mutual, grouped by the index offset m = ib − ia, which occurs (overlap of the index ranges) times.
     * With {@code other} given, turns closer than the two wires allow are refused.
     */
    private double layerPair(double ra, int ta, double za, double rb, int tb, double zb, double p, Filaments other) {
        double sum = 0;
        for (int m = -(ta - 1); m <= tb - 1; m++) {
            int count = Math.min(ta - 1, tb - 1 - m) - Math.max(0, -m) + 1;
            if (count <= 0) continue;
            double dz = zb - za + m * p;
            if (other != null) checkApart(ra, rb, dz, other);
            sum += count * Elliptic.maxwell(ra, rb, dz);
        }
        return sum;
    }

    private void checkApart(double ra, double rb, double dz, Filaments o) {
        double gap = Math.hypot(ra - rb, dz);
        if (gap < (wireRadius + o.wireRadius) * (1 - 1e-9)) {
            throw Require.fail("the coils overlap: turns lie " + Require.show(gap, org.ampturn.units.Dimension.LENGTH) + " apart, closer than the wires allow ("
                    + Require.show(wireRadius + o.wireRadius, org.ampturn.units.Dimension.LENGTH) + "); move them apart or change a diameter");
        }
    }
}
