package org.ampturn.study;

import static org.ampturn.Ampturn.*;
import static org.junit.jupiter.api.Assertions.*;

import java.util.Arrays;
import java.util.List;
import java.util.SplittableRandom;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.junit.jupiter.api.Test;

/** The streamed Monte Carlo against the one that keeps every run; the columnar gathering of outputs. */
class StreamedMonteCarloTest {
    static final double[] PERCENTILES = {0, 0.1, 1, 5, 25, 50, 75, 95, 99, 99.9, 100};

    /** Same seed, same runs: exact statistics equal to rounding, percentiles within the stated bound, missing results as the worst case. */
    static void assertAgrees(Tolerance t, int runs, long seed) {
        MonteCarlo full = t.monteCarlo(runs, seed);
        StreamedMonteCarlo s = t.monteCarloStreamed(runs, seed);
        assertEquals(runs, s.computed());
        for (String o : full.outputNames()) {
            assertEquals(full.missing(o), s.missing(o), o);
            assertEquals(full.mean(o).si(), s.mean(o).si(), 1e-12 * Math.abs(full.mean(o).si()), o);
            assertEquals(full.standardDeviation(o).si(), s.standardDeviation(o).si(), 1e-10 * full.standardDeviation(o).si(), o);
            assertEquals(full.min(o).si(), s.min(o).si(), o + " min is exact");
            assertEquals(full.max(o).si(), s.max(o).si(), o + " max is exact");
            double[] v = full.values(o);
            double scale = Arrays.stream(v).filter(Double::isFinite).map(Math::abs).max().orElse(1);
            for (double p : PERCENTILES) {
                double exact = full.percentile(o, p).si(), est = s.percentile(o, p).si();
                if (Double.isInfinite(exact)) assertEquals(exact, est, o + " " + p);
                else assertEquals(exact, est, StreamedMonteCarlo.RELATIVE_ERROR * scale, o + " at " + p + " %");
            }
        }
        for (Limit l : t.limits()) assertEquals(full.fractionFailing(l), s.fractionFailing(l), 0, l.toString());
        if (!t.limits().isEmpty()) assertEquals(full.fractionFailing(), s.fractionFailing(), 0);
    }

    @Test
    void agreesWithTheFullRunIncludingMissingResults() {
        assertAgrees(MissingResultTest.STEP.limit("pull <= 1.1 ms"), 24_000, 5);
        assertAgrees(MissingResultTest.STEP.limit("force >= 11.5 N"), 10_000, 6);
    }

    @Test
    void uniformInputGivesTheKnownMomentsAndTheSameFiguresOnAnyNumberOfThreads() {
        // y = x with x uniform on 9..11: mean 10, σ = 2/√12 (the uniform distribution's variance (b − a)²/12), median 10
        Tolerance t = tolerance(p -> Outputs.of("y", p.get("x"), "y2", Quantity.of(p.si("x") * p.si("x"), Dimension.AREA)))
                .vary(Varied.plusMinus("x", m(10), m(1)));
        StreamedMonteCarlo one = t.withThreads(1).monteCarloStreamed(200_000, 11);
        StreamedMonteCarlo two = t.withThreads(2).monteCarloStreamed(200_000, 11);
        assertEquals(10, one.mean("y").si(), 0.01);
        assertEquals(2 / Math.sqrt(12), one.standardDeviation("y").si(), 0.005);
        assertEquals(10, one.percentile("y", 50).si(), 0.02);
        assertEquals(9, one.min("y").si(), 1e-3);
        for (String o : List.of("y", "y2")) {
            assertEquals(one.mean(o).si(), two.mean(o).si(), 0, "blocks combine in order whatever the threads");
            assertEquals(one.standardDeviation(o).si(), two.standardDeviation(o).si(), 0);
            assertEquals(one.percentile(o, 99).si(), two.percentile(o, 99).si(), 0);
        }
        assertAgrees(t, 30_000, 12);
        assertTrue(one.toString().contains("streamed"), one.toString());
    }

    @Test
    void histogramReadsEachOrderStatisticWithinTheStatedRelativeError() {
        SplittableRandom r = new SplittableRandom(3);
        int n = 50_000;
        double[] xs = new double[n];
        for (int i = 0; i < n; i++) xs[i] = (r.nextBoolean() ? -1 : 1) * Math.pow(10, r.nextDouble(-9, 9));
        xs[7] = 0;
        StreamedMonteCarlo.Histogram h = new StreamedMonteCarlo.Histogram();
        h.add(xs, n);
        double[] sorted = xs.clone();
        Arrays.sort(sorted);
        for (int k = 0; k < n; k += 7) {
            assertEquals(sorted[k], h.valueAt(k), StreamedMonteCarlo.RELATIVE_ERROR * Math.abs(sorted[k]), "order statistic " + k);
        }
    }

    @Test
    void gatheredColumnsKeepTheRulesOfMixedOutputs() {
        // an output that changes dimension is an error of its row; labels stay labels; an Integer among numbers stays a number
        Table t = sweep("turns", 1, 6, 6, n -> Outputs.of("x", n == 4 ? ms(n) : N(n), "name", n % 2 == 0 ? "even" : "odd",
                "k", n == 5 ? (Object) Integer.valueOf(5) : Double.valueOf(n)));
        assertEquals(List.of("turns", "x", "name", "k"), t.columnNames());
        assertEquals(Dimension.FORCE, t.dimension("x"));
        assertTrue(Double.isNaN(t.values("x")[3]));
        assertTrue(t.error(3).contains("was a"), t.error(3));
        assertEquals(List.of("odd", "even", "odd", "even", "odd", "even"), t.labels("name"));
        assertArrayEquals(new double[] {1, 2, 3, 4, 5, 6}, t.values("k"));
        // a Monte Carlo row gives its parameters back as the quantities the function received
        MonteCarlo mc = tolerance(p -> p.get("L")).vary(Varied.percent("L", mH(10), 20)).monteCarlo(1000, 4);
        Quantity l = mc.table().row(17).param("L");
        assertEquals(Dimension.INDUCTANCE, l.dimension());
        assertEquals(mc.inputs("L")[17], l.si());
        assertEquals(mc.values("result")[17], l.si());
    }
}
