package org.ampturn.study;

import static org.junit.jupiter.api.Assertions.*;

import org.ampturn.session.Outcome;
import org.ampturn.session.Session;
import org.junit.jupiter.api.Test;

/**
 * Studies run inside the console's session: a sweep typed as an entry works, and a stop (what
 * Ctrl-C does) ends a long sweep, keeps the session, and leaves the rows computed so far in the
 * variable, marked incomplete.
 */
class ConsoleStopTest {
    @Test
    void aStoppedSweepKeepsItsRowsInTheSession() throws Exception {
        try (Session s = Session.start()) {
            Outcome ok = s.eval("sweep(\"turns\", 100, 300, 3, n -> H(4e-7 * Math.PI * n * n * 1e-4 / 0.03))");
            assertFalse(ok.failed(), ok.toString());
            assertTrue(String.join("\n", ok.lines()).contains("sweep of turns: 3 rows"), ok.toString());

            Outcome[] slow = new Outcome[1];
            Thread t = new Thread(() -> slow[0] = s.eval(
                    "var t = Sweep.defaults().withThreads(2).of(Axis.linear(\"i\", 1, 200000, 200000), "
                            + "i -> { java.util.concurrent.locks.LockSupport.parkNanos(200_000); return i; });"));
            t.start();
            Thread.sleep(1500);
            s.stop();
            t.join(10_000);
            assertFalse(t.isAlive(), "the entry did not end after the stop");
            assertTrue(slow[0].interrupted(), slow[0].toString());
            assertFalse(slow[0].failed(), "the partial result is shown, not \"! interrupted\": " + slow[0]);
            assertTrue(slow[0].toString().contains("incomplete: stopped after"), slow[0].toString());
            Outcome after = s.eval("t.isComplete() + \" \" + (t.size() - t.failures())");
            assertFalse(after.failed(), after.toString());
            String text = String.join("\n", after.lines());
            assertTrue(text.contains("false"), text);
            int done = Integer.parseInt(text.replaceAll("(?s).*false (\\d+).*", "$1"));
            assertTrue(done > 0 && done < 200_000, text);
            assertEquals("42", String.join("", s.eval("6 * 7").lines()).replaceAll("\\D", ""));
        }
    }
}
