package org.ampturn.bench;

import static org.ampturn.Ampturn.*;

import java.util.concurrent.TimeUnit;
import org.ampturn.coil.Coil;
import org.ampturn.drive.Clamp;
import org.ampturn.drive.Drive;
import org.ampturn.drive.Transient;
import org.ampturn.study.MonteCarlo;
import org.ampturn.study.Outputs;
import org.ampturn.study.Point;
import org.ampturn.study.Tolerance;
import org.ampturn.study.Varied;
import org.openjdk.jmh.annotations.*;

/**
 * 10,000 Monte Carlo runs of a linear RL drive: 12 V ± 10 % switched onto 10 mH ± 20 % and
 * 5 Ω ± 5 %, off at 20 ms into a diode clamp (0.7 V), 40 ms in all. {@code driveTransients} runs
 * the drive package's transient ({@code Drive.dc(..).into(Coil.lumped(..)).offAt(..).simulate(..)},
 * 2,001 samples a run); {@code closedFormRl} the closed form sampled at 2,001 instants:
 * i = V/R (1 − e^(−tR/L)) while on; after the switch opens i = (I0 + Vd/R) e^(−(t − t_off)R/L) − Vd/R
 * until it reaches zero. Target: ≤ 2 s on two threads.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 2, time = 2)
@Measurement(iterations = 3, time = 2)
@Fork(1)
public class StudyMonteCarloBench {
    @Param({"1", "2"})
    int threads;

    Tolerance study;
    Tolerance drive;

    static Outputs rlDrive(Point p) {
        double v = p.si("V"), l = p.si("L"), r = p.si("R");
        double vd = 0.7, tOff = 0.020, end = 0.040;
        int steps = 2000;
        double peak = 0, charge = 0, dt = end / steps, i0 = v / r * (1 - Math.exp(-tOff * r / l)), tZero = end;
        for (int k = 0; k <= steps; k++) {
            double t = k * dt, i;
            if (t <= tOff) i = v / r * (1 - Math.exp(-t * r / l));
            else {
                i = (i0 + vd / r) * Math.exp(-(t - tOff) * r / l) - vd / r;
                if (i <= 0) {
                    i = 0;
                    tZero = Math.min(tZero, t);
                }
            }
            peak = Math.max(peak, i);
            charge += i * dt;
        }
        return Outputs.of("peak", A(peak), "stored", J(0.5 * l * i0 * i0), "decay", s(tZero - tOff), "charge", q(charge + " C"));
    }

    @Setup
    public void setUp() {
        study = tolerance(StudyMonteCarloBench::rlDrive)
                .vary(Varied.percent("V", V(12), 10), Varied.percent("L", mH(10), 20).normal(), Varied.percent("R", ohm(5), 5))
                .limit("peak >= 2 A")
                .withThreads(threads);
        drive = tolerance(StudyMonteCarloBench::driven)
                .vary(Varied.percent("V", V(12), 10), Varied.percent("L", mH(10), 20).normal(), Varied.percent("R", ohm(5), 5))
                .limit("peak >= 2 A")
                .withThreads(threads);
    }

    static Outputs driven(Point p) {
        Transient run = Drive.dc(p.get("V")).into(Coil.lumped(p.get("L"), p.get("R"))).offAt(ms(20), Clamp.diode()).simulate(ms(40));
        return Outputs.of("peak", run.peakCurrent(), "decay", run.decayTime(), "clamp", run.clampEnergy().at(ms(40)));
    }

    @Benchmark
    public MonteCarlo closedFormRl() {
        return study.monteCarlo(10_000, 2026);
    }

    @Benchmark
    public MonteCarlo driveTransients() {
        return drive.monteCarlo(10_000, 2026);
    }
}
