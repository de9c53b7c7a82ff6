package org.ampturn.thermal;

import static org.junit.jupiter.api.Assertions.*;

import java.util.List;
import org.ampturn.units.Quantity;
import org.ampturn.wire.Bobbin;
import org.ampturn.wire.Wire;
import org.ampturn.wire.WireSeries;
import org.junit.jupiter.api.Test;

/** Wire choice against a worked example solved by hand in closed form. */
class WireChoiceTest {
    private static Quantity q(String s) { return Quantity.parse(s); }

    private static final double RHO20 = 1 / 58.0 * 1e-6, ALPHA = 0.00393; // IEC 60028 annealed copper

    /** The hand solution for one wire: {turns, R20, hot °C, ampere-turns hot, power cold}. */
    private static double[] byHand(double bare, double overall) {
        double w = 40e-3, di = 20e-3, depth = 15e-3, v = 24, tol = 0.05, h = 12, ta = 40, tc = 20;
        int perLayer = (int) Math.floor(w / overall + 1e-9), layers = (int) Math.floor(depth / overall + 1e-9);
        int n = perLayer * layers;
        double build = layers * overall;
        double mlt = Math.PI * (di + build);                          // turn at half the build on a round tube
        double r20 = RHO20 * n * mlt / (Math.PI / 4 * bare * bare);
        double area = Math.PI * (di + 2 * build) * w + 2 * Math.PI * (di + build) * build; // outer face + two ends
        // steady rise θ with constant h at V = 26.4 V and R = R20·0.95·(k0 + αθ), k0 = 1 + α(40 − 20):
        // θ·(k0 + αθ) = V²/(0.95·R20·h·A), the positive root of the quadratic
        double k0 = 1 + ALPHA * (ta - 20), vmax = v * 1.1, vmin = v * 0.9;
        double theta = (-k0 + Math.sqrt(k0 * k0 + 4 * ALPHA * vmax * vmax / (r20 * (1 - tol) * h * area))) / (2 * ALPHA);
        double hot = ta + theta;
        double ni = n * vmin / (r20 * (1 + tol) * (1 + ALPHA * (hot - 20)));
        double p = vmax * vmax / (r20 * (1 - tol) * (1 + ALPHA * (tc - 20)));
        return new double[] {n, r20, hot, ni, p};
    }

    private static Wire wire(double bareMm, double overallMm) {
        return Wire.metric(Quantity.of(bareMm, "mm")).withOverallDiameter(Quantity.of(overallMm, "mm"));
    }

    @Test
    void workedExampleGivesTheSameSizeAndTurns() {
        // Invented example: bobbin 40 mm wide, Ø20 mm tube, 15 mm deep; 24 V ±10 %; ≥ 450 At hot; rise ≤ 50 K;
        // 40 °C hottest, 20 °C coldest; ±5 % resistance; h = 12 W/(m²·K). By hand (closed forms above):
        //   Ø0.200: 11616 turns, 307.6 At  → fails ampere-turns
        //   Ø0.250:  7526 turns, 463.5 At, 19.3 K, 2.54 W → meets, least power: the choice
        //   Ø0.315:  4788 turns, 679.8 At, 44.8 K, 6.35 W → meets
        //   Ø0.400:  3060 turns, 939.2 At, 95.4 K          → fails rise and class 130 (B)
        double[][] sizes = {{0.20, 0.226}, {0.25, 0.28}, {0.315, 0.35}, {0.40, 0.44}};
        List<Wire> wires = new java.util.ArrayList<>();
        for (double[] s : sizes) wires.add(wire(s[0], s[1]));
        WireChoices r = WireChoice.forBobbin(Bobbin.of(q("40 mm"), q("20 mm"), q("15 mm")))
                .withSeries(WireSeries.of("worked example", wires)).withSupply(q("24 V"), 10).withResistanceTolerance(5)
                .withMinAmpereTurns(q("450 A")).withMaxRise(q("50 K")).withAmbient(q("40 degC"))
                .withCooling(Cooling.surfaceCoefficient(q("12 W/(m^2*K)"))).choose();
        assertEquals(2, r.meeting().size(), r.table());
        WireCandidate best = r.best();
        double[] hand = byHand(0.25e-3, 0.28e-3);
        assertEquals("Ø0.250 mm", best.wire().size());
        assertEquals(7526, best.turns());
        assertEquals((int) hand[0], best.turns());
        assertEquals(hand[1], best.resistance20().si(), 1e-9 * hand[1]);
        assertEquals(hand[2] + 273.15, best.hotTemperature().si(), 1e-6);
        assertEquals(hand[3], best.ampereTurnsHot().si(), 1e-6 * hand[3]);
        assertEquals(hand[4], best.powerCold().si(), 1e-9 * hand[4]);
        assertEquals("Ø0.315 mm", r.meeting().get(1).wire().size());
        for (WireCandidate c : r.all()) {
            double[] s = sizes[java.util.Arrays.asList("Ø0.200 mm", "Ø0.250 mm", "Ø0.315 mm", "Ø0.400 mm").indexOf(c.wire().size())];
            double[] hd = byHand(s[0] * 1e-3, s[1] * 1e-3);
            assertEquals((int) hd[0], c.turns(), c.wire().size());
            assertEquals(hd[3], c.ampereTurnsHot().si(), 1e-6 * hd[3], c.wire().size());
        }
        // the others say which requirement fails and by how much
        WireCandidate thin = r.failing().stream().filter(c -> c.wire().size().equals("Ø0.200 mm")).findFirst().orElseThrow();
        double niThin = byHand(0.20e-3, 0.226e-3)[3];
        assertEquals(List.of(String.format(java.util.Locale.ROOT, "ampere-turns %.0f At < 450 At (%+.1f %%)", niThin, 100 * (niThin / 450 - 1))),
                thin.fails());
        WireCandidate thick = r.failing().stream().filter(c -> c.wire().size().equals("Ø0.400 mm")).findFirst().orElseThrow();
        assertEquals(2, thick.fails().size(), thick.fails().toString());
        assertTrue(thick.fails().get(0).startsWith("rise 95.42 K > 50.00 K by 45.42 K"), thick.fails().get(0));
        assertTrue(thick.fails().get(1).contains("over thermal class 130 (B) by 15.42 K"), thick.fails().get(1));
    }

    @Test
    void theWholeSeriesRunsAndWiresThatDoNotFitSaySo() {
        WireChoices r = WireChoice.forBobbin(Bobbin.of(q("25 mm"), q("12 mm"), q("8 mm"))).withSupply(q("12 V"), 10)
                .withMinAmpereTurns(q("300 A")).withMaxPower(q("3.5 W")).withFillLimit(0.9).withBuildFactor(1.1).withLayerTape(q("0.05 mm"))
                .choose();
        assertEquals(WireSeries.metric().size() + WireSeries.awg().size(), r.all().size());
        assertFalse(r.meeting().isEmpty(), r.table());
        for (int i = 1; i < r.meeting().size(); i++) {
            assertTrue(r.meeting().get(i - 1).powerCold().si() <= r.meeting().get(i).powerCold().si(), "best first");
        }
        WireChoices small = WireChoice.forBobbin(Bobbin.of(q("10 mm"), q("8 mm"), q("3 mm"))).withSupply(q("12 V"), 10)
                .withSeries(WireSeries.of("thick", List.of(Wire.metric(q("4 mm"))))).choose();
        assertEquals(0, small.failing().get(0).turns());
        assertTrue(small.failing().get(0).fails().get(0).startsWith("does not fit: one layer takes"), small.table());
        var none = assertThrows(IllegalArgumentException.class, small::best);
        assertTrue(none.getMessage().contains("nearest: Ø4.000 mm"), none.getMessage());
        for (WireCandidate c : r.meeting()) {
            assertTrue(c.ampereTurnsHot().si() >= 300 && c.powerCold().si() <= 3.5, c.toString());
        }
        assertTrue(r.toString().contains("wires meet the requirements; best: "), r.toString());
        assertFalse(r.toString().contains("\n"));
    }

    @Test
    void metricGradesGrowInOrderAndKnownPointIsKept() {
        // 0.100 mm grade 1: maximum overall 0.117 mm (IEC 60317-0-1, as quoted in a published manufacturer's note)
        assertEquals(0.117e-3, Wire.metric(q("0.1 mm")).withInsulation(WireSeries.iecGrade(1)).overallDiameterM(), 1e-12);
        for (Wire w : WireSeries.metric(1).wires()) {
            double d1 = w.overallDiameterM();
            double d2 = w.withInsulation(WireSeries.iecGrade(2)).overallDiameterM();
            double d3 = w.withInsulation(WireSeries.iecGrade(3)).overallDiameterM();
            assertTrue(w.bareDiameterM() < d1 && d1 < d2 && d2 < d3, w.size());
        }
        assertEquals(49, WireSeries.metric(2).size());
        assertThrows(IllegalArgumentException.class, () -> WireSeries.iecGrade(4));
    }

    @Test
    void badRequirementsAreRefusedByName() {
        WireChoice c = WireChoice.forBobbin(Bobbin.of(q("10 mm"), q("8 mm"), q("3 mm")));
        var e = assertThrows(IllegalArgumentException.class, c::choose);
        assertTrue(e.getMessage().contains("supply"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> c.withSupply(q("12 V"), 120));
        assertTrue(e.getMessage().contains("120 %"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> c.withAmbient(q("125 degC")));
        assertTrue(e.getMessage().contains("125.0 °C"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> c.withBuildFactor(0.9));
        assertTrue(e.getMessage().contains("build factor"), e.getMessage());
    }

    @Test
    void dutyHeatsAtTheMeanLoss() {
        // 25 % duty: the steady rise at the mean loss 0.25·V²/R, with constant h the positive root of
        // θ·(k0 + αθ) = 0.25·V²/(0.95·R20·h·A) (the worked example's Ø0.400 mm wire, which fails continuously)
        double bare = 0.40e-3, overall = 0.44e-3, w = 40e-3, di = 20e-3, depth = 15e-3;
        int n = (int) Math.floor(w / overall + 1e-9) * (int) Math.floor(depth / overall + 1e-9);
        double build = Math.floor(depth / overall + 1e-9) * overall;
        double r20 = RHO20 * n * Math.PI * (di + build) / (Math.PI / 4 * bare * bare);
        double area = Math.PI * (di + 2 * build) * w + 2 * Math.PI * (di + build) * build;
        double k0 = 1 + ALPHA * 20, v = 26.4;
        double theta = (-k0 + Math.sqrt(k0 * k0 + 4 * ALPHA * 0.25 * v * v / (r20 * 0.95 * 12 * area))) / (2 * ALPHA);
        WireChoices r = WireChoice.forBobbin(Bobbin.of(q("40 mm"), q("20 mm"), q("15 mm")))
                .withSeries(WireSeries.of("one", List.of(wire(0.40, 0.44)))).withSupply(q("24 V"), 10).withResistanceTolerance(5)
                .withMinAmpereTurns(q("450 A")).withMaxRise(q("50 K")).withAmbient(q("40 degC")).withDuty(25)
                .withCooling(Cooling.surfaceCoefficient(q("12 W/(m^2*K)"))).choose();
        assertEquals(313.15 + theta, r.best().hotTemperature().si(), 1e-6);
        assertTrue(theta < 50, "meets the rise at 25 % duty: " + theta);
        assertThrows(IllegalArgumentException.class, () -> WireChoice.forBobbin(Bobbin.of(q("40 mm"), q("20 mm"), q("15 mm"))).withDuty(120));
    }
}
