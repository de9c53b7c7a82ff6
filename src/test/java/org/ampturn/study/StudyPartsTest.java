package org.ampturn.study;

import static org.ampturn.Ampturn.*;
import static org.junit.jupiter.api.Assertions.*;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.time.Duration;
import java.util.concurrent.locks.LockSupport;
import org.ampturn.units.Dimension;
import org.junit.jupiter.api.Test;

/** Limits, outputs, the text bar, long tables and a stopped Monte Carlo run. */
class StudyPartsTest {
    @Test
    void limitsReadTheWaysEngineersWriteThem() {
        Limit a = Limit.parse("L >= 1 mH"), b = Limit.parse("B≤0.3 T"), c = Limit.parse("rise <= 40 K");
        assertTrue(a.isLowerBound());
        assertFalse(b.isLowerBound());
        assertEquals(Dimension.FLUX_DENSITY, b.bound().dimension());
        assertEquals(0.3, b.bound().si(), 1e-15);
        assertEquals(Dimension.TEMPERATURE, c.bound().dimension());
        assertEquals(1e-3, a.margin(mH(2)).si(), 1e-15);
        assertTrue(a.isMet(mH(1)));
        assertFalse(b.isMet(T(0.31)));
        var e = assertThrows(IllegalArgumentException.class, () -> a.margin(A(1)));
        assertTrue(e.getMessage().contains("current") && e.getMessage().contains("inductance"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> Limit.parse("L >= 1 zz"));
        assertTrue(e.getMessage().startsWith("cannot read the limit \"L >= 1 zz\""), e.getMessage());
        assertEquals("L ≥ 1.000 mH", a.toString());
    }

    @Test
    void outputsComeInPairs() {
        Outputs o = Outputs.of("L", mH(1), "R", ohm(2));
        assertEquals(java.util.List.of("L", "R"), o.names());
        assertEquals(ohm(2), o.quantity("R"));
        assertThrows(IllegalArgumentException.class, () -> Outputs.of("L", mH(1), "R"));
        var e = assertThrows(IllegalArgumentException.class, () -> Outputs.of("L", mH(1), "L", mH(2)));
        assertEquals("output L is given twice", e.getMessage());
        assertEquals("L = 1.000 mH, R = 2.000 Ω", o.toString());
    }

    @Test
    void theTextBarDrawsOneLineAndEndsIt() {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        Progress bar = Progress.bar(new PrintStream(bytes, true, StandardCharsets.UTF_8));
        bar.update(new Progress.Status("sweep of turns", 10, 100, Duration.ofMillis(100), Duration.ofSeconds(1), false, false));
        assertEquals("", bytes.toString(StandardCharsets.UTF_8), "a run under half a second draws nothing");
        bar.update(new Progress.Status("sweep of turns", 50, 100, Duration.ofSeconds(1), Duration.ofSeconds(1), false, false));
        bar.update(new Progress.Status("sweep of turns", 100, 100, Duration.ofSeconds(2), Duration.ZERO, true, false));
        String s = bytes.toString(StandardCharsets.UTF_8);
        assertTrue(s.startsWith("\rsweep of turns [############............]  50% 50/100  1.0 s, about 1.0 s left"), s);
        assertTrue(s.endsWith("100% 100/100  2.0 s, done" + System.lineSeparator()), s);
    }

    @Test
    void longTablesShowTheirEnds() {
        Table t = sweepDoubles("x", 1, 100, 100, x -> x * x);
        String[] lines = t.toString().split("\n");
        assertEquals(1 + 1 + 20 + 1 + 10, lines.length);
        assertTrue(lines[22].contains("70 more rows"), lines[22]);
        assertTrue(lines[lines.length - 1].trim().startsWith("100"), lines[lines.length - 1]);
    }

    @Test
    void aStoppedMonteCarloKeepsItsRunsAndSaysSo() throws Exception {
        Tolerance slow = tolerance(p -> {
            LockSupport.parkNanos(200_000);
            return Outputs.of("z", p.get("x"));
        }).vary(Varied.plusMinus("x", 10, 1)).withThreads(2);
        MonteCarlo[] out = new MonteCarlo[1];
        Thread t = new Thread(() -> out[0] = slow.monteCarlo(200_000, 5));
        t.start();
        Thread.sleep(300);
        t.interrupt();
        t.join(5000);
        assertFalse(t.isAlive());
        MonteCarlo mc = out[0];
        assertFalse(mc.isComplete());
        double[] z = mc.values("z");
        int done = 0;
        for (double v : z) if (!Double.isNaN(v)) done++;
        assertTrue(done > 0 && done < 200_000, "runs computed: " + done);
        assertEquals(10.0, mc.mean("z").si(), 0.1);
        assertTrue(mc.toString().contains("incomplete"), mc.toString());
        // the computed runs are the same runs as in a full run with this seed
        double[] full = tolerance(p -> Outputs.of("z", p.get("x"))).vary(Varied.plusMinus("x", 10, 1)).monteCarlo(512, 5).values("z");
        for (int i = 0; i < 256; i++) if (!Double.isNaN(z[i])) assertEquals(full[i], z[i]);
    }
}
