package org.ampturn.study;

import org.ampturn.units.Require;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicLong;

/**
 * Runs {@code n} points split into fixed blocks on several threads. Blocks are numbered from the
 * point count alone, so anything derived from a block number (a random stream) is the same whatever
 * the number of threads. The calling thread works too, and polls its interrupt flag: once it is
 * interrupted every worker stops after its current point and the run returns what it has.
 */
final class Runner {
    private Runner() {}

    static final int CORES = Runtime.getRuntime().availableProcessors();
    private static volatile Progress installed = Progress.NONE;
    private static final AtomicInteger THREAD_NUMBER = new AtomicInteger();
    /**
     * The workers' own thread group, under the top-level group: stopping the shell's thread group
     * (how the JDK 17 shell stops an entry) does not reach them, so they can hand back what they
     * have computed.
     */
    private static final ThreadGroup GROUP = new ThreadGroup(topGroup(), "ampturn-study");
    private static final ExecutorService POOL = Executors.newCachedThreadPool(r -> {
        Thread t = new Thread(GROUP, r, "ampturn-study-" + THREAD_NUMBER.incrementAndGet());
        t.setDaemon(true);
        return t;
    });

    private static ThreadGroup topGroup() {
        ThreadGroup g = Thread.currentThread().getThreadGroup();
        while (g.getParent() != null) g = g.getParent();
        return g;
    }

    /**
     * Runs a whole study on a worker thread and waits for it. When the waiting thread is
     * interrupted, or stopped by force, the study is told to stop (its thread is interrupted) and
     * its result, marked incomplete, is still returned; the caller's interrupt flag is then set
     * again. Studies started from inside a study run in place.
     */
    static <T> T guarded(java.util.function.Supplier<T> body) {
        if (Thread.currentThread().getThreadGroup() == GROUP) return body.get();
        java.util.concurrent.CompletableFuture<T> result = new java.util.concurrent.CompletableFuture<>();
        Object lock = new Object();
        Thread[] worker = new Thread[1];
        boolean[] stop = new boolean[1];
        POOL.execute(() -> {
            synchronized (lock) {
                worker[0] = Thread.currentThread();
                if (stop[0]) worker[0].interrupt();
            }
            try {
                result.complete(body.get());
            } catch (Throwable e) {
                result.completeExceptionally(e);
            } finally {
                synchronized (lock) {
                    worker[0] = null;
                    Thread.interrupted(); // the pool thread goes back clean
                }
            }
        });
        boolean interrupted = false;
        while (true) {
            try {
                T r = result.get();
                if (interrupted) Thread.currentThread().interrupt();
                return r;
            } catch (InterruptedException e) {
                interrupted = true;
                requestStop(lock, worker, stop);
            } catch (ExecutionException e) {
                if (interrupted) Thread.currentThread().interrupt();
                Throwable c = e.getCause();
                if (c instanceof RuntimeException) throw (RuntimeException) c;
                if (c instanceof Error) throw (Error) c;
                throw new IllegalStateException(c);
            } catch (Error e) {
                if (!isForcedStop(e)) throw e;
                requestStop(lock, worker, stop);
            }
        }
    }

    private static void requestStop(Object lock, Thread[] worker, boolean[] stop) {
        synchronized (lock) {
            stop[0] = true;
            if (worker[0] != null) worker[0].interrupt();
        }
    }

    static Progress install(Progress p) {
        Require.present("progress listener", p);
        Progress old = installed;
        installed = p;
        return old;
    }

    static Progress installed() {
        return installed;
    }

    static int checkThreads(int threads) {
        if (threads < 1 || threads > 1024) {
            throw Require.fail("threads must be between 1 and 1024, got " + threads);
        }
        return threads;
    }

    /** The work of one block: computes points [from, to) and returns how many it finished (from the start). */
    @FunctionalInterface
    interface Block {
        int run(int block, int from, int to, Control control);
    }

    /** Shared by the workers of one run: the stop flag and the progress count. */
    static final class Control {
        private volatile boolean stop;
        private final java.util.concurrent.atomic.LongAdder done = new java.util.concurrent.atomic.LongAdder(); // cheap from many threads at once
        private final AtomicLong lastReport;
        private final long start;
        private final long total;
        private final String task;
        private final Progress progress;
        private final java.util.Set<Thread> workers = new java.util.HashSet<>();

        Control(String task, long total, Progress progress) {
            this.task = task;
            this.total = total;
            this.progress = progress;
            this.start = System.nanoTime();
            this.lastReport = new AtomicLong(start);
        }

        /**
         * Stops the run: every worker is interrupted too, so a long point (a transient, a filament
         * sum) that polls its thread's interrupt flag ends at once rather than when it is done.
         */
        void stopAll() {
            stop = true;
            synchronized (workers) {
                for (Thread t : workers) t.interrupt();
            }
        }

        void enter(Thread t) {
            synchronized (workers) {
                workers.add(t);
                if (stop) t.interrupt();
            }
        }

        void leave(Thread t) {
            synchronized (workers) {
                workers.remove(t);
                Thread.interrupted(); // the pool thread goes back clean
            }
        }

        /** True when the run must stop: the caller was interrupted, or this worker was. */
        boolean stopped() {
            if (stop) return true;
            if (Thread.currentThread().isInterrupted()) {
                stopAll();
                return true;
            }
            return false;
        }

        /** Counts {@code k} finished points, reports progress when due, and tells whether to stop. */
        boolean tick(int k) {
            done.add(k);
            if (progress != Progress.NONE) {
                long now = System.nanoTime();
                long last = lastReport.get();
                if (now - last >= 100_000_000L && lastReport.compareAndSet(last, now)) report(done.sum(), now, false);
            }
            return stopped();
        }

        private void report(long d, long now, boolean finished) {
            Duration elapsed = Duration.ofNanos(now - start);
            Duration left = d > 0 && !finished ? Duration.ofNanos((long) ((now - start) * (double) (total - d) / d)) : null;
            Progress.Status s = new Progress.Status(task, d, total, elapsed, finished ? Duration.ZERO : left, finished, finished && d < total);
            synchronized (this) {
                progress.update(s);
            }
        }

        void finish() {
            if (progress != Progress.NONE) report(done.sum(), System.nanoTime(), true);
        }
    }

    /** The outcome of a run: how many points of each block were finished. */
    static final class Outcome {
        private final int n;
        private final int blockSize;
        private final int[] doneInBlock;

        Outcome(int n, int blockSize, int[] doneInBlock) {
            this.n = n;
            this.blockSize = blockSize;
            this.doneInBlock = doneInBlock;
        }

        boolean isDone(int point) {
            int b = point / blockSize;
            return point - b * blockSize < doneInBlock[b];
        }

        int computed() {
            int c = 0;
            for (int d : doneInBlock) c += d;
            return c;
        }

        boolean complete() {
            return computed() == n;
        }
    }

    static Outcome run(String task, int n, int blockSize, int threads, Progress progress, Block body) {
        int blocks = (int) ((n + (long) blockSize - 1) / blockSize);
        int[] done = new int[blocks];
        Control control = new Control(task, n, progress == null ? installed : progress);
        AtomicInteger next = new AtomicInteger();
        Throwable[] failure = new Throwable[1];
        Thread caller = Thread.currentThread();
        Runnable worker = () -> {
            boolean helper = Thread.currentThread() != caller;
            if (helper) control.enter(Thread.currentThread());
            try {
                int b;
                while (!control.stopped() && (b = next.getAndIncrement()) < blocks) {
                    int from = b * blockSize;
                    int to = Math.min(n, from + blockSize);
                    done[b] = body.run(b, from, to, control);
                }
            } catch (RuntimeException | Error e) {
                control.stop = true;
                if (!isForcedStop(e)) {
                    synchronized (failure) {
                        if (failure[0] == null) failure[0] = e;
                    }
                }
            } finally {
                if (helper) control.leave(Thread.currentThread());
            }
        };
        int helpers = Math.min(checkThreads(threads), blocks) - 1;
        List<Future<?>> futures = new ArrayList<>();
        boolean interrupted = false;
        try {
            for (int i = 0; i < helpers; i++) futures.add(POOL.submit(worker));
            worker.run();
            for (Future<?> f : futures) {
                while (true) {
                    try {
                        f.get();
                        break;
                    } catch (InterruptedException e) {
                        interrupted = true;
                        control.stopAll();
                    } catch (ExecutionException e) {
                        break; // the worker records its own failure
                    } catch (Error e) {
                        if (!isForcedStop(e)) throw e;
                        control.stopAll(); // stopped by force while waiting: wait for the workers, then return
                    }
                }
            }
        } finally {
            // also reached when the caller is stopped by force: the workers must not run on
            if (!interrupted && Thread.currentThread().isInterrupted()) interrupted = true;
            control.stop = control.stop || interrupted;
            if (futures.size() < helpers || failure[0] != null) control.stop = true;
        }
        control.finish();
        if (interrupted) Thread.currentThread().interrupt();
        if (failure[0] instanceof RuntimeException) throw (RuntimeException) failure[0];
        if (failure[0] instanceof Error) throw (Error) failure[0];
        return new Outcome(n, blockSize, done);
    }

    /**
     * True for the error a thread gets when it is stopped by force ({@code Thread.stop}, which the
     * JDK 17 shell uses for Ctrl-C). A run treats it as a request to stop and returns what it has,
     * so a stopped sweep still hands back its rows.
     */
    static boolean isForcedStop(Throwable e) {
        return e.getClass().getName().equals("java.lang.ThreadDeath");
    }

    /** A block size that gives each thread several blocks for even loads; it depends on {@code n} only. */
    static int blockSizeFor(int n, int max) {
        return Math.max(1, Math.min(max, n / 64));
    }

    /** Mixes a seed and a block number into an independent seed (the SplitMix64 finaliser, Steele et al. 2014). */
    static long seedFor(long seed, long block) {
        long z = seed + (block + 1) * 0x9E3779B97F4A7C15L;
        z = (z ^ (z >>> 30)) * 0xBF58476D1CE4E5B9L;
        z = (z ^ (z >>> 27)) * 0x94D049BB133111EBL;
        return z ^ (z >>> 31);
    }

    static String describe(Throwable e) {
        String m = e.getMessage();
        String type = e.getClass().getSimpleName();
        if (m == null || m.isBlank()) return type;
        if (e instanceof IllegalArgumentException || e instanceof ArithmeticException || e instanceof IllegalStateException) return m;
        return type + ": " + m;
    }
}
