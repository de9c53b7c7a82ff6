package org.ampturn.study;

/**
 * Test fixture: the low-frequency inductance of a circular coil of rectangular winding section
 * (mean radius a, axial length b, radial depth c, N turns), by the method of subdivision: the
 * section is cut into n × n cells, each taken as a filament of N/n² turns; pairs of cells couple by
 * Maxwell's mutual inductance of two coaxial circles,
 * M = μ0 √(r1 r2) [(2/k − k) K(k) − (2/k) E(k)], k² = 4 r1 r2 / ((r1 + r2)² + z²)
 * (F. W. Grover, <i>Inductance Calculations</i>, 1946, ch. 13), and each cell with itself by the
 * ring formula L = μ0 r (ln(8r/R) − 2) with R the geometric mean distance of the cell, for a
 * rectangle p × q about 0.2235 (p + q) (Grover 1946, ch. 3; Rosa and Grover 1912; from memory).
 * Complete elliptic integrals by the arithmetic-geometric mean (Abramowitz and Stegun 17.6).
 */
final class ThickCoil {
    private ThickCoil() {}

    static final double MU0 = 4e-7 * Math.PI;

    static double inductance(double a, double b, double c, double turns, int n) {
        if (!(c < 2 * a)) throw new IllegalArgumentException("the winding depth " + c + " m exceeds the mean diameter " + 2 * a + " m");
        double p = c / n, q = b / n;
        int cells = n * n;
        double[] r = new double[cells], z = new double[cells];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                r[i * n + j] = a - c / 2 + (i + 0.5) * p;
                z[i * n + j] = (j + 0.5) * q;
            }
        }
        double gmd = 0.2235 * (p + q);
        double sum = 0;
        for (int s = 0; s < cells; s++) {
            sum += MU0 * r[s] * (Math.log(8 * r[s] / gmd) - 2);
            for (int t = s + 1; t < cells; t++) sum += 2 * mutual(r[s], r[t], z[s] - z[t]);
        }
        double perCell = turns / cells;
        return perCell * perCell * sum;
    }

    static double mutual(double r1, double r2, double dz) {
        double k2 = 4 * r1 * r2 / ((r1 + r2) * (r1 + r2) + dz * dz);
        double k = Math.sqrt(k2);
        double a = 1, g = Math.sqrt(1 - k2), c = k, sum = 0.5 * c * c, pow = 0.5;
        while (Math.abs(c) > 1e-16) {
            double an = (a + g) / 2, gn = Math.sqrt(a * g);
            c = (a - g) / 2;
            a = an;
            g = gn;
            pow *= 2;
            sum += pow * c * c;
        }
        double bigK = Math.PI / (2 * a);
        double bigE = bigK * (1 - sum);
        return MU0 * Math.sqrt(r1 * r2) * ((2 / k - k) * bigK - 2 / k * bigE);
    }
}
