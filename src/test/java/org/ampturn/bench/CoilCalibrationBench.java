package org.ampturn.bench;

import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.*;

/** Calibration for CoilBench on a shared machine: the harness alone, and one Math.log. */
@State(Scope.Thread)
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.SECONDS)
@Warmup(iterations = 2, time = 1)
@Measurement(iterations = 3, time = 1)
@Fork(1)
public class CoilCalibrationBench {
    private double x = 0.37;

    @Benchmark
    public double baseline() {
        x += 1e-7;
        return x;
    }

    @Benchmark
    public double log() {
        x += 1e-7;
        return Math.log(1 + x);
    }
}
