package org.ampturn.study;

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
    private static final ExecutorService POOL = Executors.newCachedThreadPool(r -> {
        Thread t = new Thread(r, "ampturn-study-" + THREAD_NUMBER.incrementAndGet());
        t.setDaemon(true);
        return t;
    });

    static Progress install(Progress p) {
        Objects.requireNonNull(p, "progress listener");
        Progress old = installed;
        installed = p;
        return old;
    }

    static Progress installed() {
        return installed;
    }

    static int checkThreads(int threads) {
        if (threads < 1 || threads > 1024) {
            throw new IllegalArgumentException("threads must be between 1 and 1024, got " + threads);
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
        private final Thread caller;
        private volatile boolean stop;
        private final AtomicLong done = new AtomicLong();
        private final AtomicLong lastReport;
        private final long start;
        private final long total;
        private final String task;
        private final Progress progress;

        Control(String task, long total, Progress progress) {
            this.caller = Thread.currentThread();
            this.task = task;
            this.total = total;
            this.progress = progress;
            this.start = System.nanoTime();
            this.lastReport = new AtomicLong(start);
        }

        /** True when the run must stop: the caller was interrupted, or this worker was. */
        boolean stopped() {
            if (stop) return true;
            if (Thread.currentThread().isInterrupted()) {
                stop = true;
                return true;
            }
            return false;
        }

        /** Counts {@code k} finished points, reports progress when due, and tells whether to stop. */
        boolean tick(int k) {
            long d = done.addAndGet(k);
            if (progress != Progress.NONE) {
                long now = System.nanoTime();
                long last = lastReport.get();
                if (now - last >= 100_000_000L && lastReport.compareAndSet(last, now)) report(d, now, false);
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
            if (progress != Progress.NONE) report(done.get(), System.nanoTime(), true);
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
        Runnable worker = () -> {
            try {
                int b;
                while (!control.stopped() && (b = next.getAndIncrement()) < blocks) {
                    int from = b * blockSize;
                    int to = Math.min(n, from + blockSize);
                    done[b] = body.run(b, from, to, control);
                }
            } catch (RuntimeException | Error e) {
                synchronized (failure) {
                    if (failure[0] == null) failure[0] = e;
                }
                control.stop = true;
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
                        control.stop = true;
                    } catch (ExecutionException e) {
                        break; // the worker records its own failure
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
