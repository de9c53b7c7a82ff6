package org.ampturn.bench;

import static org.ampturn.Ampturn.*;

import java.util.concurrent.TimeUnit;
import org.ampturn.actuator.Plunger;
import org.ampturn.coil.Coil;
import org.ampturn.drive.Circuit;
import org.ampturn.drive.Clamp;
import org.ampturn.drive.Drive;
import org.ampturn.drive.SaturatingCoil;
import org.ampturn.drive.Transient;
import org.ampturn.units.Quantity;
import org.openjdk.jmh.annotations.*;

/**
 * Transient solves, targets from the drive issue: linear RL step with 10,000 samples ≤ 1 ms;
 * saturating coil with zener turn-off over 40 ms at rtol 1e-8 ≤ 20 ms; plunger pull-in and
 * drop-out ≤ 50 ms; 1,000 PWM periods ≤ 100 ms.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class DriveBench {
    private final Circuit rlStep = Drive.dc(V(12)).into(Coil.lumped(mH(10), ohm(5))).offAt(ms(20), Clamp.diode()).samples(10_000);
    private final Circuit saturatingZener = Drive.dc(V(12)).into(new SaturatingCoil(40e-3, 0.5, 2e-3, 4))
            .offAt(ms(20), Clamp.zener(V(24))).tolerance(1e-8);
    private final Circuit plunger = Drive.dc(V(12)).into(Plunger.of(300, cm2(1), mm(2)).withParasiticGap(mm(0.5), cm2(1))
            .withMass(g(5)).withSpring(Quantity.of(500, "N/m"), N(2)).withResistance(ohm(5))).offAt(ms(15), Clamp.zener(V(24)));
    private final Circuit pwm = Drive.pwm(V(24), kHz(20), 0.4).into(Coil.lumped(mH(10), ohm(5))).clamp(Clamp.diode()).samples(20_001);
    private final Circuit pwmSaturating = Drive.pwm(V(24), kHz(20), 0.4).into(new SaturatingCoil(40e-3, 0.5, 2e-3, 4))
            .clamp(Clamp.diode()).samples(20_001);

    @Benchmark
    public Transient linearRlStep10kSamples() {
        return rlStep.simulate(ms(40));
    }

    @Benchmark
    public Transient saturatingZenerTurnOff40ms() {
        return saturatingZener.simulate(ms(40));
    }

    @Benchmark
    public Transient plungerPullInDropOut() {
        return plunger.simulate(ms(40));
    }

    @Benchmark
    public Transient pwm1000PeriodsLinear() {
        return pwm.simulate(ms(50));
    }

    @Benchmark
    public Transient pwm1000PeriodsSaturatingOde() {
        return pwmSaturating.simulate(ms(50));
    }
}
