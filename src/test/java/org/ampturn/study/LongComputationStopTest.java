package org.ampturn.study;

import static org.ampturn.Ampturn.*;
import static org.junit.jupiter.api.Assertions.*;

import java.util.concurrent.CancellationException;
import java.util.concurrent.atomic.AtomicReference;
import java.util.function.Supplier;
import org.ampturn.coil.Multilayer;
import org.ampturn.drive.Clamp;
import org.ampturn.drive.Drive;
import org.ampturn.units.Quantity;
import org.junit.jupiter.api.Test;

/**
 * An interrupt (what the console's Ctrl-C sends on Java 21 and later) ends long library work
 * promptly, even when a single point of a study takes many seconds: the study's workers are
 * interrupted too and the library's loops poll the flag. Limits are generous (a few seconds) so a
 * loaded machine does not fail them; the work stopped would take far longer.
 */
class LongComputationStopTest {
    /** 1,000,000 turns in 200 layers: a filament sum of about 10⁸ evaluations of Maxwell's formula, seconds of work. */
    private static final Multilayer BIG = Multilayer.of(5000, 200, mm(10), mm(60), mm(100));

    /** Runs {@code body} on a thread, interrupts it after 400 ms and returns what it gave or threw, failing if it did not end within 5 s. */
    private static Object interruptAfterStart(Supplier<Object> body) throws InterruptedException {
        AtomicReference<Object> out = new AtomicReference<>();
        Thread t = new Thread(() -> {
            try {
                out.set(body.get());
            } catch (Throwable e) {
                out.set(e);
            }
        });
        t.start();
        Thread.sleep(400);
        assertTrue(t.isAlive(), "the work ended before it was interrupted: it is too short to test stopping");
        t.interrupt();
        t.join(5000);
        assertFalse(t.isAlive(), "the work did not stop within 5 s of the interrupt");
        return out.get();
    }

    @Test
    void anInterruptStopsALongFilamentSum() throws Exception {
        Object r = interruptAfterStart(() -> BIG.inductance());
        assertTrue(r instanceof CancellationException, String.valueOf(r));
        assertTrue(((Exception) r).getMessage().contains("interrupted"), ((Exception) r).getMessage());
    }

    @Test
    void anInterruptStopsEveryWorkerOfASweepOfLongPoints() throws Exception {
        Object r = interruptAfterStart(() -> Sweep.defaults().withThreads(2).of(Axis.linear("n", 1, 4, 4), n -> BIG.inductance()));
        assertTrue(r instanceof Table, String.valueOf(r));
        Table t = (Table) r;
        assertFalse(t.isComplete(), t.toString());
        for (int i = 0; i < t.size(); i++) {
            String e = t.error(i);
            assertTrue(e != null && (e.contains("interrupted") || e.contains("not computed")), "row " + i + ": " + e);
        }
    }

    @Test
    void anInterruptStopsAMonteCarloOfLongTransients() throws Exception {
        var coil = org.ampturn.coil.Coil.lumped(mH(10), ohm(5));
        Object r = interruptAfterStart(() -> tolerance(p -> Drive.pwm(p.get("V"), kHz(20), 0.5).into(coil).clamp(Clamp.diode())
                .simulate(s(50)).finalCurrent())
                .vary(Varied.percent("V", V(12), 10)).withThreads(2).monteCarlo(8, 1));
        assertTrue(r instanceof MonteCarlo, String.valueOf(r));
        assertFalse(((MonteCarlo) r).table().isComplete());
    }

    @Test
    void aStudyTooLargeIsRefusedByItsCountBeforeItStarts() {
        var e = assertThrows(IllegalArgumentException.class, () -> sweep("n", 1, Integer.MAX_VALUE, Integer.MAX_VALUE, n -> n));
        assertTrue(e.getMessage().contains("2147483647 points of the sweep of n") && e.getMessage().contains("100000000"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> sweepDoubles("x", 0, 1, Integer.MAX_VALUE, x -> x));
        assertTrue(e.getMessage().contains("2147483647"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class,
                () -> tolerance(p -> p.get("V")).vary(Varied.percent("V", V(12), 10)).monteCarlo(Integer.MAX_VALUE, 1));
        assertTrue(e.getMessage().contains("2147483647 Monte Carlo runs"), e.getMessage());
        // the memory check names the count and what it would take
        e = assertThrows(IllegalArgumentException.class, () -> org.ampturn.units.Require.fitsInMemory("sweep points", 99_000_000, 1e6));
        assertTrue(e.getMessage().startsWith("99000000 sweep points need about") && e.getMessage().contains("free"), e.getMessage());
        assertEquals(Quantity.of(1, "m"), m(1), "an ordinary value after the refusals");
    }
}
