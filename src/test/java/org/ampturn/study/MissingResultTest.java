package org.ampturn.study;

import static org.ampturn.Ampturn.*;
import static org.junit.jupiter.api.Assertions.*;

import org.ampturn.actuator.Plunger;
import org.ampturn.drive.Clamp;
import org.ampturn.drive.Drive;
import org.ampturn.units.Quantity;
import org.junit.jupiter.api.Test;

/** A run whose result does not exist counts as the worst case in every statistic; the truncated normal draw. */
class MissingResultTest {
    /** "pull-in" is 1 ms + (12 V − V)·0.1 ms/V, and does not exist (NaN) below 11 V: invented, exact. */
    static final Tolerance STEP = tolerance(p -> {
        double v = p.get("V").si();
        return Outputs.of("pull", ms(v < 11 ? Double.NaN : 1 + (12 - v) * 0.1), "force", N(v < 11 ? Double.NaN : v));
    }).vary(Varied.percent("V", V(12), 10));

    @Test
    void cornersCountAMissingResultAsTheWorstCase() {
        Corners c = STEP.limit("force >= 10 N").corners();
        // rows: nominal 12 V, corners 10.8 V and 13.2 V, then low and high alone: two rows without a value
        assertEquals(2, c.missing("pull"));
        assertEquals(Double.POSITIVE_INFINITY, c.max("pull").si(), "a pull-in that never happens is the longest");
        assertEquals(1 + (12 - 13.2) * 0.1, c.min("pull").si() * 1e3, 1e-9);
        // force is bounded from below, so its missing value is the lowest
        assertEquals(Double.NEGATIVE_INFINITY, c.min("force").si());
        assertEquals(13.2, c.max("force").si(), 1e-12);
        assertTrue(Double.isNaN(c.worst("pull", true).value("pull")), "the worst row is the one with no value");
        String s = c.toString();
        assertTrue(s.contains("to ∞ s (2 designs have no value, counted as the worst case)"), s);
        assertTrue(s.contains("force ≥ 10.00 N: 2 of 5 designs fail; worst -∞ N"), s);
        assertFalse(c.meetsLimits());
    }

    @Test
    void monteCarloPercentilesAndExtremesCountAMissingResultAsTheWorstCase() {
        // V uniform on 10.8..13.2 V: P(V < 11 V) = 0.2/2.4 = 1/12 of the runs have no pull-in
        MonteCarlo mc = STEP.limit("pull <= 1.1 ms").monteCarlo(24_000, 5);
        int none = mc.missing("pull");
        assertEquals(1 / 12.0, none / 24_000.0, 0.006);
        assertEquals(Double.POSITIVE_INFINITY, mc.max("pull").si());
        assertEquals(Double.POSITIVE_INFINITY, mc.percentile("pull", 95).si(), "more than 5 % never pull in");
        // 50th percentile of all runs, the missing ones at the top: V at the 50 % point is 12 V → 1.0 ms
        assertEquals(1.0e-3, mc.percentile("pull", 50).si(), 0.02e-3);
        assertTrue(mc.percentile("pull", 80).si() < 1.2e-3);
        // the limit counts them as failing too, as it did
        assertTrue(mc.fractionFailing() >= none / 24_000.0);
        String s = mc.toString();
        assertTrue(s.contains(none + " runs have no value, counted as ∞ s"), s);
        assertTrue(s.contains("99.9 % ∞ s"), s);
    }

    @Test
    void aValveThatDoesNotPullInAtLowSupplyIsTheWorstCorner() {
        // at 2 V the valve's steady force (at the open gap) is below spring and load, so it never pulls in
        Plunger valve = Plunger.of(420, mm2(28), mm(0.8)).withResistance(ohm(9.5)).withMass(g(4))
                .withSpring(Quantity.of(2000, "N/m"), N(1)).withLoad(N(1));
        Corners c = tolerance(p -> Outputs.of("pull-in", Drive.dc(p.get("supply")).into(valve).simulate(ms(10)).pullInTime()))
                .vary(Varied.plusMinus("supply", V(8), V(6))).limit("pull-in <= 5 ms").corners();
        assertEquals(Double.POSITIVE_INFINITY, c.max("pull-in").si());
        assertTrue(c.min("pull-in").si() > 0 && c.min("pull-in").si() < 5e-3);
        assertFalse(c.meetsLimits());
    }

    @Test
    void truncatedNormalDrawsStayInTheBandWithTheTruncatedSpread() {
        // a normal with the band at ±1σ, cut at the band: variance σ²(1 − 2·φ(1)/(2Φ(1) − 1)) with φ(1) = 0.2419707 and
        // Φ(1) = 0.8413447 (standard normal table, e.g. Abramowitz and Stegun, Handbook of Mathematical Functions,
        // table 26.1)
        Varied x = Varied.plusMinus("x", 10, 1).truncatedNormal(1);
        double expected = 1.0 * Math.sqrt(1 - 2 * 0.2419707 / (2 * 0.8413447 - 1));
        assertEquals(expected, x.standardDeviation(), 1e-6);
        MonteCarlo mc = tolerance(p -> Outputs.of("y", p.get("x"))).vary(x).monteCarlo(40_000, 9);
        double[] in = mc.inputs("x");
        for (double v : in) assertTrue(v >= 9 && v <= 11, "draw " + v + " outside the band");
        assertEquals(expected, mc.standardDeviation("y").si(), 0.01 * expected);
        assertEquals(10, mc.mean("y").si(), 0.01);
        // the plain normal at ±1σ does leave the band (about 32 % of the draws)
        double[] plain = tolerance(p -> Outputs.of("y", p.get("x"))).vary(Varied.plusMinus("x", 10, 1).normal(1)).monteCarlo(4_000, 9).inputs("x");
        int outside = 0;
        for (double v : plain) if (v < 9 || v > 11) outside++;
        assertEquals(0.3173, outside / 4000.0, 0.03);
        assertTrue(x.toString().contains("normal cut at the band, band = ±1.00σ"), x.toString());
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> Varied.plusMinus("x", 10, 1).truncatedNormal(0));
        assertTrue(e.getMessage().contains("sigmas"), e.getMessage());
    }
}
