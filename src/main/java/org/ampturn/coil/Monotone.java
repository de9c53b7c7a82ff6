package org.ampturn.coil;

import java.util.function.DoubleUnaryOperator;

/**
 * Solves g(x) = y for an increasing, odd function g (a B-H relation, a magnetic circuit's flux
 * against MMF): bracket from a linear first guess by doubling, then the Illinois variant of
 * regula falsi (Dowell and Jarratt, BIT 11, 1971), which keeps a bracket and converges superlinearly.
 */
final class Monotone {
    private Monotone() {}

    static double solve(DoubleUnaryOperator g, double y, double guess) {
        if (y == 0) return 0;
        if (y < 0) return -solve(x -> -g.applyAsDouble(-x), -y, Math.abs(guess));
        double lo = 0, glo = -y;
        double hi = guess > 0 && Double.isFinite(guess) ? guess : 1;
        double ghi = g.applyAsDouble(hi) - y;
        int n = 0;
        while (ghi < 0) {
            lo = hi;
            glo = ghi;
            hi *= 2;
            ghi = g.applyAsDouble(hi) - y;
            if (++n > 2000) throw new ArithmeticException("no solution below " + hi + " for target " + y);
        }
        int side = 0;
        for (int i = 0; i < 200; i++) {
            double x = (glo * hi - ghi * lo) / (glo - ghi);
            if (!(x > lo && x < hi)) x = 0.5 * (lo + hi);
            double gx = g.applyAsDouble(x) - y;
            if (gx == 0 || (hi - lo) <= 1e-14 * hi) return x;
            if (gx < 0) {
                lo = x;
                glo = gx;
                if (side == -1) ghi *= 0.5;
                side = -1;
            } else {
                hi = x;
                ghi = gx;
                if (side == 1) glo *= 0.5;
                side = 1;
            }
            if (Math.abs(gx) <= 1e-13 * y) return x;
        }
        return 0.5 * (lo + hi);
    }
}
