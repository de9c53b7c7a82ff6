package org.ampturn.bench;

import static org.ampturn.Ampturn.*;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import java.util.function.Function;
import org.ampturn.study.MonteCarlo;
import org.ampturn.study.Point;
import org.ampturn.study.StreamedMonteCarlo;
import org.ampturn.study.Tolerance;
import org.ampturn.study.Varied;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.openjdk.jmh.annotations.*;

/**
 * The per-run cost of a Monte Carlo of a closed-form model against the model's own cost, on one
 * thread. The model is the long-solenoid inductance L = μ0 N² A / l (an invented coil: 400 turns
 * ± 2 %, 50 mm² ± 5 %, 30 mm ± 3 %). {@code model} calls it on a ready point, as a run does;
 * {@code monteCarloPerRun} and {@code streamedPerRun} are a 100,000-run study divided by the runs.
 * Target: the per-run figure minus the model's ≤ 10 × the model's.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class StudyStreamBench {
    static final int RUNS = 100_000;
    static final double MU0 = 4e-7 * Math.PI;

    static Quantity solenoid(Point p) {
        return Quantity.of(MU0 * p.si("N") * p.si("N") * p.si("A") / p.si("l"), Dimension.INDUCTANCE);
    }

    static Tolerance study() {
        return tolerance(StudyStreamBench::solenoid)
                .vary(Varied.percent("N", 400, 2), Varied.percent("A", mm2(50), 5), Varied.percent("l", mm(30), 3))
                .limit("result >= 0.3 mH").withThreads(1);
    }

    Tolerance study;
    Point point;
    Function<Point, Quantity> model = StudyStreamBench::solenoid;

    @Setup
    public void setUp() {
        study = study();
        // one run's point, taken from a run of the study itself
        Point[] seen = new Point[1];
        tolerance(p -> {
            seen[0] = p;
            return solenoid(p);
        }).vary(study.parameters().toArray(new Varied[0])).withThreads(1).monteCarlo(2, 1);
        point = seen[0];
    }

    @Benchmark
    public Quantity model() {
        return model.apply(point);
    }

    @Benchmark
    @OperationsPerInvocation(RUNS)
    public MonteCarlo monteCarloPerRun() {
        return study.monteCarlo(RUNS, 2026);
    }

    @Benchmark
    @OperationsPerInvocation(RUNS)
    public StreamedMonteCarlo streamedPerRun() {
        return study.monteCarloStreamed(RUNS, 2026);
    }

    /**
     * Memory per run and a 5-million-run study in a small heap: run with {@code -Xmx512m}
     * ({@code bench/study memory}). Prints the heap kept by a full run per run, and the figures
     * of a streamed run.
     */
    public static void main(String[] args) {
        int runs = args.length > 0 ? Integer.parseInt(args[0]) : 5_000_000;
        Tolerance t = study().withThreads(Runtime.getRuntime().availableProcessors());
        Runtime rt = Runtime.getRuntime();
        System.out.printf("max heap %d MB, %d runs of L = μ0 N² A / l (3 drawn parameters, 1 output)%n", rt.maxMemory() >> 20, runs);
        long before = used();
        long start = System.nanoTime();
        MonteCarlo mc = t.monteCarlo(runs, 2026);
        double fullSeconds = (System.nanoTime() - start) / 1e9;
        long after = used();
        System.out.printf("full run: %.1f s, heap kept %.1f MB = %.1f bytes per run (3 inputs + 1 output = 32 bytes of raw results)%n",
                fullSeconds, (after - before) / 1e6, (double) (after - before) / runs);
        System.out.println("  mean " + mc.mean("result") + ", σ " + mc.standardDeviation("result") + ", 99.9 % " + mc.percentile("result", 99.9));
        mc = null;
        before = used();
        start = System.nanoTime();
        StreamedMonteCarlo s = t.monteCarloStreamed(runs, 2026);
        double streamSeconds = (System.nanoTime() - start) / 1e9;
        long kept = used() - before;
        System.out.printf("streamed run: %.1f s, heap kept %.2f MB%n", streamSeconds, kept / 1e6);
        System.out.println("  mean " + s.mean("result") + ", σ " + s.standardDeviation("result") + ", 99.9 % " + s.percentile("result", 99.9));
    }

    private static long used() {
        Runtime rt = Runtime.getRuntime();
        for (int i = 0; i < 3; i++) System.gc();
        return rt.totalMemory() - rt.freeMemory();
    }
}
