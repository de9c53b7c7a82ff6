package org.ampturn.worksheet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Duration;
import java.util.List;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;

/** The batch verbs' per-entry limit: an entry over it is stopped, and one that will not stop is reported so the process can end. */
class LimitedEvaluatorTest {
    @Test
    void anEntryWithinItsLimitIsUntouched() {
        LimitedEvaluator ev = LimitedEvaluator.of(FakeEvaluator.truth(), Duration.ofSeconds(5), () -> { });
        Evaluation e = ev.eval("var L = mH(4.7);");
        assertFalse(e.failed() || e.interrupted());
        assertEquals(List.of("L = 4.700 mH"), e.records());
    }

    @Test
    void anEntryThatIgnoresTheStopIsReportedStuck() throws Exception {
        CountDownLatch stuck = new CountDownLatch(1);
        CountDownLatch release = new CountDownLatch(1);
        Evaluator deaf = source -> {
            try {
                release.await(); // a library loop that never looks at the interrupt
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
            return FakeEvaluator.evaluation(source, "  = 1");
        };
        LimitedEvaluator ev = LimitedEvaluator.of(deaf, Duration.ofMillis(100), Duration.ofMillis(100), stuck::countDown);
        Evaluation[] result = new Evaluation[1];
        Thread t = new Thread(() -> result[0] = ev.eval("spin()"));
        t.start();
        assertTrue(stuck.await(10, TimeUnit.SECONDS), "the stuck handler ran (the command line ends the process there)");
        release.countDown();
        t.join(5000);
        assertFalse(t.isAlive());
        assertTrue(result[0].interrupted() && result[0].failed(), "what it returned late is still over the limit");
        // what it gave before it ended (a study's partial result) is kept, under the message
        assertEquals(List.of("1", "! over the entry limit of 100 ms: stopped (--entry-limit sets the limit)"), result[0].records());
    }
}
