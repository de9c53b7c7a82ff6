package org.ampturn.coil;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.stream.Stream;
import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.junit.jupiter.params.provider.ValueSource;

class EllipticTest {
    /** Abramowitz and Stegun, Handbook of Mathematical Functions (1964), Table 17.1, parameter m = k² (from memory). */
    static Stream<Arguments> table171() {
        return Stream.of(
                Arguments.of(0.0, 1.5707963267948966, 1.5707963267948966, "A&S 17.1, m = 0 (π/2)"),
                Arguments.of(0.5, 1.8540746773013719, 1.3506438810476755, "A&S 17.1, m = 0.5"),
                Arguments.of(0.9, 2.5780921133481733, 1.1047747327040733, "A&S 17.1, m = 0.9"),
                Arguments.of(0.99, 3.6956373629898747, 1.0159935450252240, "A&S 17.1, m = 0.99"));
    }

    @ParameterizedTest(name = "{3}")
    @MethodSource("table171")
    void agmMatchesPublishedTable(double m, double kRef, double eRef, String source) {
        double k = Math.sqrt(m), kc = Math.sqrt(1 - m);
        double[] ke = new double[2];
        Elliptic.kAndE(k, kc, ke);
        assertEquals(kRef, ke[0], 1e-9 * kRef, source + ": K");
        assertEquals(eRef, ke[1], 1e-9 * eRef, source + ": E");
        assertEquals(kRef, Elliptic.k(kc), 1e-9 * kRef, source + ": K alone");
    }

    /** Reference: the defining integrals by Gauss-Legendre quadrature of Commons Math (general-purpose library). */
    @ParameterizedTest(name = "k² = {0}")
    @ValueSource(doubles = {1e-6, 0.01, 0.3, 0.7, 0.95, 0.999})
    void agmMatchesQuadratureOfTheDefinition(double m) {
        var quad = new IterativeLegendreGaussIntegrator(16, 1e-14, 1e-14);
        double kq = quad.integrate(100000, t -> 1 / Math.sqrt(1 - m * Math.sin(t) * Math.sin(t)), 0, Math.PI / 2);
        double eq = quad.integrate(100000, t -> Math.sqrt(1 - m * Math.sin(t) * Math.sin(t)), 0, Math.PI / 2);
        double[] ke = new double[2];
        Elliptic.kAndE(Math.sqrt(m), Math.sqrt(1 - m), ke);
        assertEquals(kq, ke[0], 1e-12 * kq);
        assertEquals(eq, ke[1], 1e-12 * eq);
    }
}
