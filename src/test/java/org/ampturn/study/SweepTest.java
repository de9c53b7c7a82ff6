package org.ampturn.study;

import static org.ampturn.Ampturn.*;
import static org.junit.jupiter.api.Assertions.*;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.locks.LockSupport;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.junit.jupiter.api.Test;

class SweepTest {
    static final double MU0 = 4e-7 * Math.PI;

    /**
     * Single-layer solenoid, L = μ0 N² A / (l + 0.45 D): the long-solenoid formula with Wheeler's
     * end correction (H. A. Wheeler, "Simple inductance formulas for radio coils", Proc. IRE 16,
     * 1928; within about 1 % for l > 0.4 D).
     */
    static double solenoid(double turns, double length, double diameter) {
        return MU0 * turns * turns * Math.PI * diameter * diameter / 4 / (length + 0.45 * diameter);
    }

    @Test
    void sweepOfTurnsGivesWholeNumbersAndTheClosedForm() {
        Table t = sweep("turns", 100, 1000, 10, n -> H(solenoid(n, 0.03, 0.01)));
        assertEquals(List.of("turns", "result"), t.columnNames());
        assertEquals(10, t.size());
        assertEquals(Dimension.NONE, t.dimension("turns"));
        assertEquals(Dimension.INDUCTANCE, t.dimension("result"));
        double[] n = t.values("turns");
        double[] l = t.values("result");
        for (int i = 0; i < 10; i++) {
            assertEquals(100 + 100 * i, n[i]);
            assertEquals(solenoid(100 + 100 * i, 0.03, 0.01), l[i], 1e-18);
        }
        Integer first = t.row(0).param("turns");
        assertEquals(100, first);
        String shown = t.toString();
        assertTrue(shown.contains("result (mH)") || shown.contains("result (µH)"), shown);
        assertTrue(shown.contains("1000"), shown);
    }

    @Test
    void aThrowingPointIsMarkedAndTheSweepGoesOn() {
        Table t = sweep("turns", 100, 1000, 10, n -> {
            if (n == 500) throw new IllegalArgumentException("turns 500 do not fit the bobbin");
            return Outputs.of("L", H(solenoid(n, 0.03, 0.01)), "R", ohm(n * 0.01));
        });
        assertEquals(List.of("turns", "L", "R"), t.columnNames());
        assertEquals(1, t.failures());
        assertEquals("turns 500 do not fit the bobbin", t.error(4));
        assertTrue(Double.isNaN(t.values("L")[4]));
        assertEquals(solenoid(600, 0.03, 0.01), t.values("L")[5], 1e-18);
        assertNull(t.error(5));
        assertTrue(t.toString().contains("! turns 500 do not fit the bobbin"), t.toString());
        assertEquals(10, t.rows().size());
        assertFalse(t.rows().get(4).ok());
    }

    @Test
    void quantitiesListsAndTwoParameterGrids() {
        Table gaps = sweep("length", mm(10), mm(40), 4, len -> H(solenoid(200, len.si(), 0.01)));
        assertEquals(Dimension.LENGTH, gaps.dimension("length"));
        assertArrayEquals(new double[] {0.01, 0.02, 0.03, 0.04}, gaps.values("length"), 1e-15);

        Table wires = sweep("wire", List.of("AWG 24", "AWG 26", "AWG 28"), w -> w.length());
        assertFalse(wires.isNumeric("wire"));
        assertEquals(List.of("AWG 24", "AWG 26", "AWG 28"), wires.labels("wire"));
        assertThrows(IllegalArgumentException.class, () -> wires.values("wire"));

        Table grid = sweep(Axis.linear("turns", 100, 300, 3), Axis.of("diameter", mm(10), mm(20)),
                (n, d) -> Map.of("L", H(solenoid(n, 0.03, d.si()))));
        assertEquals(6, grid.size());
        assertEquals(List.of("turns", "diameter", "L"), grid.columnNames());
        assertEquals(200, grid.values("turns")[2]);
        assertEquals(0.010, grid.values("diameter")[2], 1e-15);
        assertEquals(solenoid(300, 0.03, 0.02), grid.values("L")[5], 1e-18);
    }

    @Test
    void longAndFloatEndsKeepTheirType() {
        Axis<Long> longs = Axis.linear("n", 1L, 9L, 5);
        assertEquals(List.of(1L, 3L, 5L, 7L, 9L), longs.values());
        Axis<Float> floats = Axis.linear("x", 0f, 1f, 3);
        assertEquals(List.of(0f, 0.5f, 1f), floats.values());
        Axis<Integer> logTurns = Axis.log("turns", 10, 1000, 3);
        assertEquals(List.of(10, 100, 1000), logTurns.values());
    }

    @Test
    void logStepsAreGeometric() {
        Table t = sweepLog("f", Hz(10), kHz(100), 5, f -> f);
        assertArrayEquals(new double[] {10, 100, 1000, 1e4, 1e5}, t.values("f"), 1e-9);
        assertEquals(Dimension.FREQUENCY, t.dimension("f"));
    }

    @Test
    void badRangesSayWhatIsWrong() {
        var e = assertThrows(IllegalArgumentException.class, () -> sweep("turns", 100, 1000, 0, n -> n));
        assertEquals("count of turns (0) must be at least 1", e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> sweep("wire", List.of(), w -> w));
        assertEquals("the list of values for wire is empty", e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> sweep("turns", 1, 10, 20, n -> n));
        assertTrue(e.getMessage().contains("more than the 10 whole numbers"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> sweepLog("f", Hz(0), Hz(10), 5, f -> f));
        assertTrue(e.getMessage().contains("greater than zero"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> sweep("gap", mm(1), A(2), 5, g -> g));
        assertTrue(e.getMessage().contains("length") && e.getMessage().contains("current"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> sweep("turns", 100, 1000, 1, n -> n));
        assertTrue(e.getMessage().contains("count 1 cannot span"), e.getMessage());
    }

    @Test
    void aChangeOfDimensionMidwayIsTheRowsError() {
        Table t = sweep("x", 1, 3, 3, x -> x == 2 ? A(1) : H(1));
        assertNull(t.error(0));
        assertTrue(t.error(1).contains("was a inductance") || t.error(1).contains("inductance"), t.error(1));
        assertTrue(Double.isNaN(t.values("result")[1]));
    }

    @Test
    void sortFilterAndBest() {
        Table t = sweep("turns", 100, 1000, 10, n -> Outputs.of("L", H(solenoid(n, 0.03, 0.01)), "loss", W(Math.abs(n - 420) * 0.01)));
        assertEquals(400, t.min("loss").<Integer>param("turns"));
        assertEquals(1000, t.max("L").<Integer>param("turns"));
        assertEquals(400, t.best("loss", false).<Integer>param("turns"));
        Table sorted = t.sortedBy("loss");
        assertEquals(400, sorted.values("turns")[0]);
        assertEquals(500, sorted.values("turns")[1]);
        assertEquals(1000, t.sortedByDescending("turns").values("turns")[0]);
        Table big = t.where("L", l -> l > 1e-3);
        for (double l : big.values("L")) assertTrue(l > 1e-3);
        assertEquals(t.size(), big.size() + t.where("L", l -> l <= 1e-3).size());
        assertEquals(3, t.where(r -> r.<Integer>param("turns") <= 300).size());
    }

    @Test
    void csvCarriesSiUnitsAndLeavesFailedCellsEmpty() throws Exception {
        Table t = sweep("turns", 1, 3, 3, n -> {
            if (n == 2) throw new IllegalStateException("no, \"two\"");
            return Outputs.of("L", mH(n));
        });
        String csv = t.toCsv();
        String[] lines = csv.split("\n");
        assertEquals("turns,L (H),error", lines[0]);
        assertEquals("1,0.001,", lines[1]);
        assertEquals("2,,\"no, \"\"two\"\"\"", lines[2]);
        java.nio.file.Path f = java.nio.file.Files.createTempDirectory("sweep").resolve("t.csv");
        t.saveCsv(f);
        assertEquals(csv, java.nio.file.Files.readString(f));
    }

    @Test
    void doublesPathMatchesTheClosedFormOnAnyNumberOfThreads() {
        Sweep one = Sweep.defaults().withThreads(1), two = Sweep.defaults().withThreads(2);
        double[] xs = Sweep.steps("turns", 10, 1000, 100_001, false);
        Table a = one.ofDoubles("turns", Dimension.NONE, xs, "L", Dimension.INDUCTANCE, n -> solenoid(n, 0.03, 0.01));
        Table b = two.ofDoubles("turns", Dimension.NONE, xs, "L", Dimension.INDUCTANCE, n -> solenoid(n, 0.03, 0.01));
        assertArrayEquals(a.values("L"), b.values("L"));
        assertEquals(solenoid(10, 0.03, 0.01), a.values("L")[0]);
        assertEquals(solenoid(1000, 0.03, 0.01), a.values("L")[100_000]);
        Table c = one.ofDoubles("x", -1, 1, 3, x -> {
            if (x < 0) throw new ArithmeticException("negative x");
            return Math.sqrt(x);
        });
        assertEquals("negative x", c.error(0));
        assertTrue(Double.isNaN(c.values("result")[0]));
        assertEquals(1.0, c.values("result")[2]);
    }

    @Test
    void anInterruptStopsTheSweepAndKeepsWhatWasComputed() throws Exception {
        Table[] out = new Table[1];
        Thread t = new Thread(() -> out[0] = Sweep.defaults().withThreads(2).of(Axis.linear("i", 1, 100_000, 100_000), i -> {
            LockSupport.parkNanos(200_000);
            return i;
        }));
        t.start();
        Thread.sleep(300);
        t.interrupt();
        t.join(5000);
        assertFalse(t.isAlive(), "the sweep did not stop");
        Table r = out[0];
        assertFalse(r.isComplete());
        int done = 0;
        for (int i = 0; i < r.size(); i++) if (r.error(i) == null) done++;
        assertTrue(done > 0 && done < 100_000, "computed " + done);
        assertEquals("not computed: the sweep was stopped", r.error(r.size() - 1));
        assertTrue(r.toString().contains("incomplete: stopped after"), r.toString().lines().findFirst().get());
    }

    @Test
    void progressReachesTheTotal() {
        List<Progress.Status> seen = new ArrayList<>();
        Sweep.defaults().withProgress(seen::add).of(Axis.linear("i", 1, 50, 50), i -> i);
        Progress.Status last = seen.get(seen.size() - 1);
        assertTrue(last.finished());
        assertFalse(last.stopped());
        assertEquals(50, last.done());
        assertEquals(50, last.total());
        assertTrue(last.bar(10).contains("[##########] 100% 50/50"), last.bar(10));
    }

    @Test
    void tableTextUsesOneUnitPerColumn() {
        Quantity.setDisplayDigits(4);
        Table t = sweep("length", mm(10), mm(30), 3, len -> Outputs.of("L", uH(len.si() * 1e5)));
        String s = t.toString();
        assertTrue(s.startsWith("sweep of length: 3 rows"), s);
        assertTrue(s.contains("length (mm)"), s);
        assertTrue(s.contains("L (mH)"), s);
        assertTrue(s.contains("30.00") && s.contains("3.000"), s);
    }
}
