package org.ampturn.bench;

import static org.ampturn.Ampturn.*;

import java.util.concurrent.TimeUnit;
import org.ampturn.coil.Core;
import org.ampturn.coil.WoundCoil;
import org.ampturn.drive.Circuit;
import org.ampturn.drive.Drive;
import org.ampturn.drive.Transient;
import org.ampturn.material.Materials;
import org.openjdk.jmh.annotations.*;

/**
 * AC coil runs, targets of the AC-coils work: one mains cycle (20 ms at 50 Hz) of a saturating AC
 * coil ≤ 5 ms; one second of a 50 Hz run (50 cycles) ≤ 100 ms. The coil: 500 turns, 5 Ω, on a
 * silicon-steel core 200 mm × 400 mm² (B-H table), 60 V RMS switched on at a zero crossing, so the
 * flux's DC offset drives the core well past its knee in the first cycles; its core loss is drawn by
 * the circuit (core-loss branch) unless the name says "lossless". Default tolerance and samples.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class AcDriveBench {
    private final WoundCoil coil = WoundCoil.of(500, ohm(5), Core.of(mm(200), q("400 mm^2"), Materials.SILICON_STEEL));
    private final Circuit ac = Drive.sine(V(60), Hz(50)).into(coil);
    private final Circuit lossless = ac.withoutCoreLoss();

    @Benchmark
    public Transient oneMainsCycleSaturating() {
        return ac.simulate(ms(20));
    }

    @Benchmark
    public Transient oneSecond50HzSaturating() {
        return ac.simulate(s(1));
    }

    @Benchmark
    public Transient oneMainsCycleSaturatingLossless() {
        return lossless.simulate(ms(20));
    }

    @Benchmark
    public Transient oneSecond50HzSaturatingLossless() {
        return lossless.simulate(s(1));
    }
}
