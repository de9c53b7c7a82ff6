package org.ampturn.bench;

import java.util.concurrent.TimeUnit;
import org.ampturn.coil.Loops;
import org.ampturn.coil.Multilayer;
import org.ampturn.coil.Solenoid;
import org.ampturn.units.Quantity;
import org.openjdk.jmh.annotations.*;

/**
 * Speed targets of the coil kernels (one thread, one core): exact single-layer inductance
 * (elliptic integrals) ≥ 5 million/s; Wheeler forms ≥ 50 million/s; a 20-layer × 200-turn
 * filament-sum multilayer inductance ≤ 20 ms. Inputs change on every call so nothing folds.
 */
@State(Scope.Thread)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class CoilBench {
    private double ratio = 0.37;
    private Multilayer coil;

    @Setup
    public void setup() {
        coil = Multilayer.of(200, 20, Quantity.of(20, "mm"), Quantity.of(40, "mm"), Quantity.of(40, "mm"));
    }

    private double next() {
        ratio += 1e-7;
        if (ratio > 50) ratio = 0.01;
        return ratio;
    }

    @Benchmark
    @BenchmarkMode(Mode.Throughput)
    @OutputTimeUnit(TimeUnit.SECONDS)
    public double exactSingleLayer() {
        return Solenoid.inductanceAt(100, 0.02, 0.02 * next());
    }

    @Benchmark
    @BenchmarkMode(Mode.Throughput)
    @OutputTimeUnit(TimeUnit.SECONDS)
    public double wheeler1928() {
        return Solenoid.wheeler1928At(100, 0.02, 0.02 * next());
    }

    @Benchmark
    @BenchmarkMode(Mode.Throughput)
    @OutputTimeUnit(TimeUnit.SECONDS)
    public double wheeler1982() {
        return Solenoid.wheeler1982At(100, 0.02, 0.02 * next());
    }

    @Benchmark
    @BenchmarkMode(Mode.Throughput)
    @OutputTimeUnit(TimeUnit.SECONDS)
    public double wheelerMultilayer() {
        return Multilayer.wheeler1928At(4000, 0.04, 0.015, 0.01 * next());
    }

    @Benchmark
    @BenchmarkMode(Mode.Throughput)
    @OutputTimeUnit(TimeUnit.SECONDS)
    public double maxwellMutual() {
        return Loops.mutualAt(0.01, 0.012, 0.01 * next());
    }

    @Benchmark
    @BenchmarkMode(Mode.AverageTime)
    @OutputTimeUnit(TimeUnit.MILLISECONDS)
    public Quantity multilayer20x200() {
        return coil.inductance();
    }
}
