package org.ampturn.coil;

/**
 * Natural logarithm for arguments x ≥ 1, for the kernels that a sweep calls millions of times.
 * x = 2^e·m with m in [1, 2); m = c_j·(1 + t) with c_j = 1 + j/256 from a 256-entry table and
 * 0 ≤ t &lt; 1/256, so ln x = e·ln 2 + ln c_j + ln(1 + t), the last by its Taylor series to t⁶
 * (truncation below t⁷/7 &lt; 2·10⁻¹⁸). All three terms are non-negative for x ≥ 1, so nothing
 * cancels; the tests hold it to 10⁻¹⁵ of {@link Math#log} (measured 6·10⁻¹⁶). Faster than Math.log here.
 */
final class LogKernel {
    private LogKernel() {}

    private static final double LN2 = 0.6931471805599453;
    private static final double[] LN_C = new double[256];
    private static final double[] INV_C = new double[256];

    static {
        for (int j = 0; j < 256; j++) {
            double c = 1 + j / 256.0;
            LN_C[j] = Math.log(c);
            INV_C[j] = 1 / c;
        }
    }

    /** ln x for finite x ≥ 1. */
    static double log(double x) {
        long bits = Double.doubleToRawLongBits(x);
        int e = (int) (bits >>> 52) - 1023;
        long mant = bits & 0xFFFFFFFFFFFFFL;
        int j = (int) (mant >>> 44);
        double m = Double.longBitsToDouble(mant | 0x3FF0000000000000L);
        double t = (m - (1 + j * 0x1p-8)) * INV_C[j]; // m - c_j is exact (Sterbenz), c_j exact in binary
        double p = t * (1 + t * (-0.5 + t * (1.0 / 3 + t * (-0.25 + t * (0.2 - t * (1.0 / 6))))));
        return e * LN2 + (LN_C[j] + p);
    }
}
