package org.ampturn.bench;

import static org.ampturn.Ampturn.*;

import java.util.concurrent.TimeUnit;
import org.ampturn.coil.Coil;
import org.ampturn.drive.Clamp;
import org.ampturn.drive.Drive;
import org.ampturn.thermal.DutyCycle;
import org.ampturn.thermal.ElectroThermalRun;
import org.ampturn.thermal.ThermalNetwork;
import org.ampturn.thermal.WireChoice;
import org.ampturn.thermal.WireChoices;
import org.ampturn.wire.Bobbin;
import org.openjdk.jmh.annotations.*;

/**
 * Heating and wire choice, targets from the thermal issue: the wire choice over every size and grade
 * (IEC 60317 R20 in grades 1-3 and AWG 10-44 in three builds, 252 wires) for one bobbin ≤ 50 ms; a
 * 1,000-cycle thermal-electrical duty run ≤ 200 ms (201 samples per cycle; also measured at the drive's default 2,001).
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class ThermalBench {
    private final WireChoice choice = WireChoice.forBobbin(Bobbin.of(mm(40), mm(20), mm(15))).withSupply(V(24), 10)
            .withMinAmpereTurns(A(450)).withMaxRise(K(60)).withAmbient(degC(50)).withFillLimit(0.92).withBuildFactor(1.08);
    private final ThermalNetwork net = ThermalNetwork.twoBody(JperK(60), KperW(4), JperK(600), KperW(10));
    private final Coil coil = Coil.lumped(mH(200), ohm(40));

    @Benchmark
    public WireChoices wireChoiceAllSizes() {
        return choice.choose();
    }

    /** 201 samples per cycle: enough for the copper energy of each cycle, which is all the heating needs. */
    @Benchmark
    public ElectroThermalRun electroThermal1000Cycles() {
        return ElectroThermalRun.cycles(net, coil, 1000, c -> Drive.dc(V(24)).into(c).offAt(s(1), Clamp.diode()).samples(201).simulate(s(4)), 1000);
    }

    /** The drive's default 2,001 samples per cycle (most of the time is the drive's own transient). */
    @Benchmark
    public ElectroThermalRun electroThermal1000CyclesDefaultSamples() {
        return ElectroThermalRun.cycles(net, coil, 1000, c -> Drive.dc(V(24)).into(c).offAt(s(1), Clamp.diode()).simulate(s(4)), 1000);
    }

    @Benchmark
    public DutyCycle dutyCycleTwoBody() {
        return net.duty(W(20), s(30), s(120));
    }
}
