package org.ampturn.bench;

import java.util.concurrent.TimeUnit;
import org.ampturn.coil.Solenoid;
import org.ampturn.study.Sweep;
import org.ampturn.study.Table;
import org.ampturn.units.Dimension;
import org.openjdk.jmh.annotations.*;

/**
 * A one-million-point sweep of a closed form on the primitive path: the inductance of a
 * single-layer solenoid (current-sheet formula with the exact Nagaoka coefficient) over turns.
 * Target: ≤ 0.5 s on two threads, and close to 2× faster on two threads than on one.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class StudySweepBench {
    @Param({"1", "2"})
    int threads;

    double[] turns;
    Sweep sweep;

    @Setup
    public void setUp() {
        turns = Sweep.steps("turns", 10, 5000, 1_000_000, false);
        sweep = Sweep.defaults().withThreads(threads);
    }

    @Benchmark
    public Table millionPointSweep() {
        return sweep.ofDoubles("turns", Dimension.NONE, turns, "L", Dimension.INDUCTANCE, n -> Solenoid.inductanceAt(n, 0.030, 0.010));
    }
}
