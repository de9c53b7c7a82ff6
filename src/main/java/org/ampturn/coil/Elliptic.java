package org.ampturn.coil;

import org.ampturn.units.Dimension;
import org.ampturn.units.Require;

/**
 * Complete elliptic integrals K(k) and E(k) by the arithmetic-geometric mean, and the two
 * combinations the coil formulas need, computed so that no difference of nearly equal terms occurs.
 *
 * <p>Method: Gauss' AGM with the sequence c<sub>n</sub> (Abramowitz and Stegun, Handbook of
 * Mathematical Functions, 1964, §17.6): a<sub>0</sub> = 1, b<sub>0</sub> = k′, c<sub>0</sub> = k;
 * K = π/(2a<sub>N</sub>), E = K·(1 − Σ<sub>n≥0</sub> 2<sup>n−1</sup>c<sub>n</sub>²). The sum from
 * n = 1 on gives (1 − k²/2)K − E and K − E without cancellation (the c<sub>0</sub> term is taken
 * out analytically). Converges quadratically: 4 to 6 square roots for 0 ≤ k ≤ 0.99999. Valid for
 * 0 ≤ k &lt; 1 (K diverges at k = 1).
 */
final class Elliptic {
    private Elliptic() {}

    /** K(k) from the complementary modulus k′ = √(1 − k²), 0 &lt; k′ ≤ 1. */
    static double k(double kc) {
        check("complementary modulus k′", kc);
        double a = 1, b = kc;
        for (int n = 0; a - b > 1e-15 * a; n++) {
            if (n > MAX_ITERATIONS) throw notConverged("K(k)", kc);
            double an = 0.5 * (a + b);
            b = Math.sqrt(a * b);
            a = an;
        }
        return Math.PI / (a + b);
    }

    /** E(k) from k and k′. */
    static double e(double k, double kc) {
        double[] ke = new double[2];
        kAndE(k, kc, ke);
        return ke[1];
    }

    /** Writes K(k) and E(k) into out[0], out[1]. */
    static void kAndE(double k, double kc, double[] out) {
        double kk = kOf(kc);
        double tail = tail(k, kc);
        out[0] = kk;
        out[1] = kk * (1 - 0.5 * k * k - tail);
    }

    /**
     * Σ<sub>n≥1</sub> 2<sup>n−1</sup>c<sub>n</sub>² of the AGM started at (1, k′), with the exact
     * recurrence c<sub>n+1</sub> = c<sub>n</sub>²/(2(a<sub>n</sub> + b<sub>n</sub>)), which never subtracts.
     */
    private static double tail(double k, double kc) {
        double a = 1, b = kc;
        double c = 0.5 * k * k / (1 + kc); // c1
        a = 0.5 * (1 + kc);
        b = Math.sqrt(kc);
        double tail = c * c;
        double w = 1;
        for (int n = 0; ; n++) {
            if (n > MAX_ITERATIONS) throw notConverged("E(k)", k);
            c = c * c / (2 * (a + b));
            double an = 0.5 * (a + b);
            b = Math.sqrt(a * b);
            a = an;
            w *= 2;
            double t = w * c * c;
            tail += t;
            if (t <= 1e-17 * tail) return tail;
        }
    }

    private static double kOf(double kc) {
        return k(kc);
    }

    /**
     * Nagaoka's coefficient from k = D/√(D² + l²) and k′ = l/√(D² + l²):
     * K_N = 4/(3π k′)·[(k′²/k²)(K − E) + E − k] (Nagaoka 1909; Grover, Inductance Calculations, 1946,
     * ch. 14). One AGM gives K and the sum for K − E.
     */
    static double nagaoka(double k, double kc) {
        if (!(k > 0 && k <= 1 && kc > 0 && kc <= 1)) {
            throw Require.fail("Nagaoka's coefficient needs moduli k and k′ in (0, 1], got k = " + Require.show(k)
                    + ", k′ = " + Require.show(kc) + " (a length or diameter out of range)");
        }
        double k2 = k * k;
        double c = 0.5 * k2 / (1 + kc); // c1 = (1 - k')/2 without cancellation
        double a = 0.5 * (1 + kc);
        double b = Math.sqrt(kc);
        double tail = c * c; // sum over n >= 1 of 2^(n-1) c_n^2
        double w = 2;
        int iterations = 0;
        // c_{n+1} = (a_n - b_n)/2: its rounding error is far below the terms that matter, and once
        // c <= 1e-9 a the next term is below 1e-18 of the sum and (a + b)/2 is the limit to 1e-18.
        while (true) {
            c = 0.5 * (a - b);
            tail += w * c * c;
            if (c <= 1e-9 * a) break;
            if (++iterations > MAX_ITERATIONS) throw notConverged("Nagaoka's coefficient", k);
            double an = 0.5 * (a + b);
            b = Math.sqrt(a * b);
            a = an;
            w *= 2;
        }
        double kk = Math.PI / (a + b);
        double kMinusE = kk * (0.5 * k2 + tail);
        double e = kk - kMinusE;
        double first = kc * kc * kk * (0.5 + tail / k2); // (k'^2/k^2)(K - E)
        double eMinusK = (e - 1) + kc * kc / (1 + k);   // E - k, the (1 - k) part without cancellation
        return 4 / (3 * Math.PI * kc) * (first + eMinusK);
    }

    /**
     * Mutual inductance (H) of two coaxial circular filaments of radii r1, r2 (m) whose planes are z (m)
     * apart. Maxwell's formula M = μ0√(r1 r2)·[(2/k − k)K − (2/k)E], k² = 4r1r2/((r1 + r2)² + z²)
     * (Maxwell, Treatise on Electricity and Magnetism, 1873, §701; Grover, Inductance Calculations,
     * 1946, ch. 13), evaluated with the AGM started at a0 = √((r1 + r2)² + z²), b0 = √((r1 − r2)² + z²):
     * with d<sub>n</sub> = a<sub>n</sub> − b<sub>n</sub>, M = μ0·π·Σ2<sup>n</sup>d<sub>n</sub>²/(8a<sub>∞</sub>),
     * which has no cancellation at any distance. Valid for any r1, r2 &gt; 0 and z, except the
     * coincident circle (r1 = r2, z = 0), where M diverges.
     */
    static double maxwell(double r1, double r2, double z) {
        if (!(r1 > 0 && r2 > 0 && r1 <= Require.MAX_LENGTH && r2 <= Require.MAX_LENGTH && Math.abs(z) <= Require.MAX_LENGTH)) {
            throw Require.fail("Maxwell's formula needs radii from 0 to " + Require.show(Require.MAX_LENGTH, Dimension.LENGTH)
                    + " and a distance within it, got " + Require.show(r1) + " m, " + Require.show(r2) + " m, " + Require.show(z) + " m");
        }
        double s = r1 + r2, d = r1 - r2, z2 = z * z;
        double a = Math.sqrt(s * s + z2);
        double b = Math.sqrt(d * d + z2);
        double c = 4 * r1 * r2 / (a + b); // d0 = a0 - b0 without cancellation
        double cs = c * c;
        double w = 1;
        for (int n = 0; ; n++) {
            if (n > MAX_ITERATIONS) throw notConverged("Maxwell's mutual inductance", r1);
            double an = 0.5 * (a + b);
            b = Math.sqrt(a * b);
            a = an;
            c = c * c / (4 * (a + b)); // d_{n+1} = d_n^2 / (4 (a_{n+1} + b_{n+1}))
            w *= 2;
            double t = w * c * c;
            cs += t;
            if (t <= 1e-17 * cs) break;
        }
        return MU0 * Math.PI * cs / (8 * a);
    }

    static final double MU0 = 4e-7 * Math.PI;

    /** The AGM converges quadratically: 6 steps suffice for k ≤ 0.99999 and 60 for any k a double holds. */
    static final int MAX_ITERATIONS = 60;

    private static void check(String what, double v) {
        if (!(v > 0 && v <= 1)) throw Require.fail(what + " must be in (0, 1], got " + Require.show(v));
    }

    private static IllegalArgumentException notConverged(String what, double at) {
        return Require.fail(what + " did not converge in " + MAX_ITERATIONS + " steps at " + Require.show(at)
                + ": an argument is out of range");
    }
}
