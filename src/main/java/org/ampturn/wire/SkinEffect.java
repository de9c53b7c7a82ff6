package org.ampturn.wire;

import org.ampturn.units.Require;
import org.ampturn.material.MagneticMaterial;

/**
 * Skin effect in a round conductor: skin depth and the exact AC/DC resistance ratio of an isolated
 * straight round wire. SI kernels; {@link Wire} gives the Quantity surface.
 *
 * <p>Skin depth (any good conductor, ρ in Ω·m, f in Hz): δ = √(ρ / (π f μ0 μr)), with μr = 1 for
 * copper and aluminium.
 *
 * <p>Round wire, exact solution of the diffusion equation (the classical Bessel-function solution,
 * e.g. S. Ramo, J. R. Whinnery, T. Van Duzer, "Fields and Waves in Communication Electronics",
 * 3rd ed., 1994, §5.6): with k = (1 − j)/δ and wire radius a,
 * R_ac/R_dc = Re[ (k a / 2) · J0(k a) / J1(k a) ].
 * The Bessel functions of complex argument are summed from their power series for a/δ ≤ 30 (the
 * cancellation there costs about 5 of the 16 digits); above that the asymptotic form
 * R_ac/R_dc = a/(2δ) + 1/4 + 3δ/(32 a) is used, whose error is about −0.062 (δ/a)³, below 3e-6. Valid for a wire far from other
 * conductors (no proximity effect: see {@link Dowell} for layered windings).
 */
public final class SkinEffect {
    private SkinEffect() {}

    private static final double SERIES_LIMIT = 30;

    /** Kernel: skin depth (m) for resistivity ρ (Ω·m) and frequency f (Hz), μr = 1. */
    public static double depthAt(double resistivity, double frequency) {
        Require.finite("resistivity", resistivity);
        Require.finite("frequency (Hz)", frequency);
        return Require.result("depth", Math.sqrt(resistivity / (Math.PI * frequency * MagneticMaterial.MU0)));
    }

    /** Kernel: R_ac/R_dc of an isolated round wire for the ratio of radius to skin depth a/δ. */
    public static double roundWireFactorAt(double radiusOverDepth) {
        Require.finite("radius over depth", radiusOverDepth);
        double x = radiusOverDepth;
        if (!(x >= 0)) throw Require.fail("radius/skin depth must be zero or more, got " + x);
        if (x > SERIES_LIMIT) return Require.result("round wire factor", asymptoticFactorAt(x));
        if (x == 0) return Require.result("round wire factor", 1);
        // z = k a = (1 - j) x ; J0(z) and J1(z) by their power series in (z/2)^2
        double zr = x, zi = -x;
        double wr = (zr * zr - zi * zi) / 4, wi = (2 * zr * zi) / 4; // w = (z/2)^2 = -j x²/2
        // J0 = Σ (-w)^m / (m!)^2 ; J1 = (z/2) Σ (-w)^m / (m! (m+1)!)
        double t0r = 1, t0i = 0, s0r = 1, s0i = 0;
        double t1r = 1, t1i = 0, s1r = 1, s1i = 0;
        for (int m = 1; m < 400; m++) {
            // t0 *= -w / m^2
            double a = -(t0r * wr - t0i * wi) / ((double) m * m);
            double b = -(t0r * wi + t0i * wr) / ((double) m * m);
            t0r = a; t0i = b;
            s0r += t0r; s0i += t0i;
            double c = -(t1r * wr - t1i * wi) / ((double) m * (m + 1));
            double d = -(t1r * wi + t1i * wr) / ((double) m * (m + 1));
            t1r = c; t1i = d;
            s1r += t1r; s1i += t1i;
            if (Math.abs(t0r) + Math.abs(t0i) < 1e-17 * (Math.abs(s0r) + Math.abs(s0i))
                    && Math.abs(t1r) + Math.abs(t1i) < 1e-17 * (Math.abs(s1r) + Math.abs(s1i))) break;
        }
        // (z/2) J0/J1 = (z/2) s0 / ((z/2) s1) = s0/s1; the ratio R_ac/R_dc = Re[(z/2) J0/J1] = Re[(z/2)·s0/((z/2)·s1)]·... :
        // (k a/2)·J0/J1 with J1 = (z/2)·s1 gives s0/s1.
        double den = s1r * s1r + s1i * s1i;
        return Require.result("round wire factor", (s0r * s1r + s0i * s1i) / den);
    }

    /** Kernel: the large-a/δ expansion a/(2δ) + 1/4 + 3δ/(32 a) of the round-wire factor. */
    public static double asymptoticFactorAt(double radiusOverDepth) {
        Require.finite("radius over depth", radiusOverDepth);
        double x = radiusOverDepth;
        return Require.result("asymptotic factor", x / 2 + 0.25 + 3 / (32 * x));
    }
}
