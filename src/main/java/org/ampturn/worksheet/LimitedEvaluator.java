package org.ampturn.worksheet;

import java.time.Duration;
import java.util.List;
import java.util.concurrent.ScheduledExecutorService;
import java.util.concurrent.ScheduledFuture;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicBoolean;
import org.ampturn.session.Outcome;

/**
 * An {@link Evaluator} that gives each entry a time limit: at the limit the entry is stopped
 * ({@link Evaluator#stop()}) and fails with a message that names the limit; if it has still not
 * returned {@link #GRACE} later (a library loop that never looks at the interrupt), {@code stuck}
 * runs (the command line ends the process there). For the batch verbs, so that a runaway entry
 * never hangs a CI job.
 */
public final class LimitedEvaluator implements Evaluator {
    /** How long a stopped entry may take to stop before {@code stuck} runs. */
    public static final Duration GRACE = Duration.ofSeconds(10);

    private static final ScheduledExecutorService TIMER = timer();

    /** One daemon thread; a cancelled limit leaves the queue at once rather than after the limit (a long session enters thousands). */
    private static ScheduledExecutorService timer() {
        var t = new java.util.concurrent.ScheduledThreadPoolExecutor(1, r -> {
            Thread th = new Thread(r, "ampturn-entry-limit");
            th.setDaemon(true);
            return th;
        });
        t.setRemoveOnCancelPolicy(true);
        return t;
    }

    private final Evaluator inner;
    private final Duration limit;
    private final Duration grace;
    private final Runnable stuck;

    private LimitedEvaluator(Evaluator inner, Duration limit, Duration grace, Runnable stuck) {
        this.inner = inner;
        this.limit = limit;
        this.grace = grace;
        this.stuck = stuck;
    }

    /** Each entry of {@code inner} may run for {@code limit}. */
    public static LimitedEvaluator of(Evaluator inner, Duration limit, Runnable stuck) {
        return of(inner, limit, GRACE, stuck);
    }

    /** As above, with another time to stop after the limit (tests). */
    static LimitedEvaluator of(Evaluator inner, Duration limit, Duration grace, Runnable stuck) {
        if (limit == null || limit.isNegative() || limit.isZero()) throw new IllegalArgumentException("the entry limit must be positive, got " + limit);
        return new LimitedEvaluator(inner, limit, grace, stuck);
    }

    /** The limit as written on the command line: {@code 30 s}, {@code 5 min}. */
    static String shown(Duration d) {
        long ms = d.toMillis();
        if (ms % 3_600_000 == 0) return ms / 3_600_000 + " h";
        if (ms % 60_000 == 0) return ms / 60_000 + " min";
        if (ms % 1000 == 0) return ms / 1000 + " s";
        return ms + " ms";
    }

    @Override
    public Evaluation eval(String source) {
        AtomicBoolean over = new AtomicBoolean();
        ScheduledFuture<?> stop = TIMER.schedule(() -> {
            over.set(true);
            inner.stop();
        }, limit.toMillis(), TimeUnit.MILLISECONDS);
        ScheduledFuture<?> kill = TIMER.schedule(stuck, limit.plus(grace).toMillis(), TimeUnit.MILLISECONDS);
        Evaluation e;
        try {
            e = inner.eval(source);
        } finally {
            stop.cancel(false);
            kill.cancel(false);
        }
        if (!over.get()) return e;
        String msg = "over the entry limit of " + shown(limit) + ": stopped (--entry-limit sets the limit)";
        // the stop reached the entry: it failed, or (a study) ended early with a partial result
        Outcome o = e.outcome();
        List<Outcome.Result> results = new java.util.ArrayList<>(o.results());
        results.removeIf(r -> r.kind() == Outcome.Kind.ERROR);
        results.add(Outcome.Result.of(Outcome.Kind.ERROR, msg));
        return new Evaluation(new Outcome(o.source(), Outcome.Kind.ERROR, results, true, o.kept()), e.figures());
    }

    @Override
    public boolean undoLast() {
        return inner.undoLast();
    }

    @Override
    public Completeness completeness() {
        return inner.completeness();
    }

    @Override
    public void stop() {
        inner.stop();
    }

    @Override
    public void clear() {
        inner.clear();
    }

    @Override
    public void close() {
        inner.close();
    }
}
