package org.ampturn.bench;

import static org.ampturn.Ampturn.*;

import java.util.concurrent.TimeUnit;
import org.ampturn.actuator.Plunger;
import org.ampturn.drive.Circuit;
import org.ampturn.drive.Clamp;
import org.ampturn.drive.Drive;
import org.ampturn.drive.Transient;
import org.ampturn.material.MagneticMaterial;
import org.ampturn.units.Quantity;
import org.openjdk.jmh.annotations.*;

/**
 * A plunger transient with a solid-iron eddy ladder of four shells and bounce at the stops
 * (restitution 0.3), 24 V on for 10 ms then a zener turn-off, 20 ms in all: target ≤ 5 ms a run,
 * so that a 10,000-run Monte Carlo stays under 30 s on two cores. The same valve without eddy
 * currents and with a shorted turn, for comparison.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class ActuatorBench {
    private static final Plunger VALVE = Plunger.of(420, mm2(28), mm(0.8)).withResistance(ohm(9.5)).withMass(g(4))
            .withSpring(Quantity.of(2000, "N/m"), N(1)).withLoad(N(1)).withIron(mm(40), MagneticMaterial.linear("steel", 800, T(1.8)))
            .withFringing(mm(2)).withRestitution(0.3);
    private final Circuit ladder = Drive.dc(V(24)).into(VALVE.withSolidIron(mm(6), mm(30), Quantity.of(1.5e-7, "Ω·m"), 4, Quantity.of(0.3, "mH")))
            .offAt(ms(10), Clamp.zener(V(33)));
    private final Circuit shortedTurn = Drive.dc(V(24)).into(VALVE.withShortedTurn(mohm(1), Quantity.of(0.3, "mH")))
            .offAt(ms(10), Clamp.zener(V(33)));
    private final Circuit plain = Drive.dc(V(24)).into(VALVE).offAt(ms(10), Clamp.zener(V(33)));

    @Benchmark
    public Transient plungerEddyLadderAndBounce() {
        return ladder.simulate(ms(20));
    }

    @Benchmark
    public Transient plungerShortedTurnAndBounce() {
        return shortedTurn.simulate(ms(20));
    }

    @Benchmark
    public Transient plungerBounceOnly() {
        return plain.simulate(ms(20));
    }
}
