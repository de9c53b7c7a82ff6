package org.ampturn.study;

import static org.ampturn.Ampturn.*;
import static org.junit.jupiter.api.Assertions.*;

import java.util.List;
import org.ampturn.units.Dimension;
import org.junit.jupiter.api.Test;

class ToleranceTest {
    /**
     * y = 2a − 3b + 0.5c with a = 10 V ± 5 % normal (band 3σ), b = 4 V ± 0.2 V uniform,
     * c = 20 V ± 10 % normal (band 2σ). Law of propagation for a linear model (GUM, JCGM 100:2008,
     * 5.1.2): var y = Σ cᵢ² u(xᵢ)², with u = a/√3 for a uniform band ±a (GUM 4.3.7).
     */
    static final Tolerance LINEAR = tolerance(p -> Outputs.of("y", p.get("a").times(2).minus(p.get("b").times(3)).plus(p.get("c").times(0.5))))
            .vary(Varied.percent("a", V(10), 5).normal(), Varied.plusMinus("b", V(4), V(0.2)), Varied.percent("c", V(20), 10).normal(2));
    static final double UA = 0.5 / 3, UB = 0.2 / Math.sqrt(3), UC = 2.0 / 2;
    static final double VAR = 4 * UA * UA + 9 * UB * UB + 0.25 * UC * UC;

    @Test
    void monteCarloMeanAndSpreadMatchThePropagationOfTolerances() {
        int n = 40_000;
        MonteCarlo mc = LINEAR.monteCarlo(n, 7);
        double sd = Math.sqrt(VAR);
        assertEquals(Dimension.VOLTAGE, mc.dimension("y"));
        assertEquals(18.0, mc.mean("y").si(), 5 * sd / Math.sqrt(n));
        assertEquals(sd, mc.standardDeviation("y").si(), 0.02 * sd);
        assertEquals(18.0, mc.percentile("y", 50).si(), 0.02);
        List<Sensitivity> s = mc.sensitivity("y");
        assertEquals("c", s.get(0).parameter());
        assertEquals(0.25 * UC * UC / VAR, s.get(0).share(), 0.01);
        for (Sensitivity x : s) {
            if (x.parameter().equals("a")) {
                assertEquals(4 * UA * UA / VAR, x.share(), 0.01);
                assertEquals(2 * 1.0, x.swing().si(), 0.02); // dy/da · band width = 2 × 2 × 0.5 V
            }
            if (x.parameter().equals("b")) assertEquals(9 * UB * UB / VAR, x.share(), 0.01);
        }
        assertTrue(mc.toString().contains("Monte Carlo of 40000 runs, seed 7"), mc.toString());
    }

    @Test
    void fractionFailingAndPercentilesOfAUniformInput() {
        // z = x with x uniform on 9..11: P(z < 9.5) = 0.25, the 10th percentile is 9.2 (exact for the distribution)
        MonteCarlo mc = tolerance(p -> Outputs.of("z", p.get("x"))).vary(Varied.plusMinus("x", 10, 1)).limit("z >= 9.5")
                .monteCarlo(20_000, 3);
        assertEquals(0.25, mc.fractionFailing(), 0.012);
        assertEquals(0.25, mc.fractionFailing("z >= 9.5"), 0.012);
        assertEquals(9.2, mc.percentile("z", 10).si(), 0.02);
        assertTrue(mc.min("z").si() >= 9 && mc.max("z").si() <= 11);
        double[] x = mc.inputs("x"), z = mc.values("z");
        assertArrayEquals(x, z);
    }

    @Test
    void theSameRunsForASeedOnOneTwoOrFourThreads() {
        double[] one = LINEAR.withThreads(1).monteCarlo(3_000, 42).values("y");
        double[] two = LINEAR.withThreads(2).monteCarlo(3_000, 42).values("y");
        double[] four = LINEAR.withThreads(4).monteCarlo(3_000, 42).values("y");
        assertArrayEquals(one, two);
        assertArrayEquals(one, four);
        double[] other = LINEAR.withThreads(2).monteCarlo(3_000, 43).values("y");
        assertNotEquals(one[0], other[0]);
    }

    @Test
    void cornersGiveTheWorstCasesOfAProduct() {
        // y = a·b, a = 10 ± 10 %, b = 2 ± 5 %, both uniform: extremes 9 × 1.9 = 17.1 and 11 × 2.1 = 23.1
        Corners c = tolerance(p -> Outputs.of("y", p.get("a").times(p.get("b")))).vary(Varied.percent("a", 10, 10), Varied.percent("b", 2, 5))
                .limit("y >= 18").corners();
        assertEquals(9, c.table().size());
        assertEquals(20.0, c.nominal("y").si(), 1e-12);
        assertEquals(17.1, c.min("y").si(), 1e-12);
        assertEquals(23.1, c.max("y").si(), 1e-12);
        assertEquals(1, c.failing("y >= 18").size());
        assertFalse(c.meetsLimits());
        // one at a time: swing 4 for a, 2 for b; variance shares (2/√3)² : (10 × 0.1/√3)² = 0.8 : 0.2
        List<Sensitivity> s = c.sensitivity("y");
        assertEquals("a", s.get(0).parameter());
        assertEquals(4.0, s.get(0).swing().si(), 1e-12);
        assertEquals(0.8, s.get(0).share(), 1e-12);
        assertEquals(0.2, s.get(1).share(), 1e-12);
        assertTrue(c.toString().contains("1 of 9 designs fail"), c.toString());
    }

    @Test
    void failingRunsAreCountedAndBadInputIsRefused() {
        MonteCarlo mc = tolerance(p -> {
            if (p.si("x") > 10.5) throw new IllegalStateException("core saturates");
            return Outputs.of("z", p.get("x"));
        }).vary(Varied.plusMinus("x", 10, 1)).limit("z >= 0").monteCarlo(10_000, 1);
        assertEquals(0.25, mc.fractionFailing(), 0.02);
        assertTrue(mc.toString().contains("failed to evaluate"), mc.toString());

        var e = assertThrows(IllegalArgumentException.class, () -> LINEAR.monteCarlo(1, 1));
        assertTrue(e.getMessage().contains("runs (1) must be at least 2"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> tolerance(p -> 1).monteCarlo(10, 1));
        assertTrue(e.getMessage().contains("no parameter has a tolerance"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> Varied.plusMinus("R", ohm(5), mA(1)));
        assertTrue(e.getMessage().contains("resistance"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> Varied.percent("R", ohm(5), -1));
        assertTrue(e.getMessage().contains("percent of R"), e.getMessage());
    }
}
