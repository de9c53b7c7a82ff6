package org.ampturn.coil;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Random;
import org.junit.jupiter.api.Test;

/** The fast logarithm against the JDK's Math.log (reference library), for x ≥ 1 as the kernels use it. */
class LogKernelTest {
    @Test
    void matchesMathLog() {
        Random r = new Random(42);
        double worst = 0;
        for (int i = 0; i < 2_000_000; i++) {
            double x = i % 2 == 0 ? 1 + r.nextDouble() * 1e-3 : Math.exp(r.nextDouble() * 40);
            double ref = Math.log(x);
            if (ref == 0) continue;
            worst = Math.max(worst, Math.abs(LogKernel.log(x) - ref) / ref);
        }
        assertEquals(0, worst, 1e-15);
        assertEquals(0, LogKernel.log(1), 0);
        assertEquals(Math.log(2), LogKernel.log(2), 1e-16);
        assertEquals(Math.log(1 + Math.PI), LogKernel.log(1 + Math.PI), 1e-16);
    }
}
