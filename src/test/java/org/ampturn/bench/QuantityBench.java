package org.ampturn.bench;

import java.util.concurrent.TimeUnit;
import org.ampturn.units.Quantity;
import org.openjdk.jmh.annotations.*;

/** Parse and display of quantities, the console's per-result cost. */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Warmup(iterations = 2, time = 1)
@Measurement(iterations = 3, time = 1)
@Fork(1)
public class QuantityBench {
    private final Quantity q = Quantity.parse("4.7 mH");

    @Benchmark
    public Quantity parse() {
        return Quantity.parse("2.5 A/mm^2");
    }

    @Benchmark
    public String display() {
        return q.toString();
    }
}
