package org.ampturn.bench;

import java.util.concurrent.TimeUnit;
import org.ampturn.field.FieldMap;
import org.ampturn.field.MapProgress;
import org.ampturn.material.Materials;
import org.ampturn.units.Quantity;
import org.openjdk.jmh.annotations.*;

/**
 * A 20-stroke × 10-current field map of the pilot valve (the default mesh, 8 cells across), on 1 and
 * 2 threads, one shot per measurement. Targets: ≤ 30 s on 2 threads, ≥ 1.7× faster than on 1.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 1)
@Measurement(iterations = 2)
@Fork(value = 1, jvmArgs = {"-Xmx500m"})
public class FieldMapBench {
    @Param({"1", "2"})
    int threads;

    @Benchmark
    public FieldMap map20x10() {
        double[] amps = {0.2, 0.4, 0.6, 0.8, 1, 1.5, 2, 2.5, 3, 4};
        return FieldMap.of(FieldBench.valve(Materials.LOW_CARBON_STEEL, 8, 1), "plunger", "coil", Quantity.of(-2e-3, "m"), 20, amps, threads,
                MapProgress.NONE);
    }
}
