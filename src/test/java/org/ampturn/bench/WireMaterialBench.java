package org.ampturn.bench;

import java.util.concurrent.TimeUnit;
import org.ampturn.material.CoreLoss;
import org.ampturn.material.MagneticMaterial;
import org.ampturn.material.Materials;
import org.ampturn.units.Quantity;
import org.ampturn.wire.Bobbin;
import org.ampturn.wire.Dowell;
import org.ampturn.wire.SkinEffect;
import org.ampturn.wire.Winding;
import org.ampturn.wire.Wire;
import org.openjdk.jmh.annotations.*;

/** Kernels of the wire and material packages that sweeps and the transient solver call in loops. */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Warmup(iterations = 2, time = 1)
@Measurement(iterations = 3, time = 1)
@Fork(1)
public class WireMaterialBench {
    private final MagneticMaterial steel = Materials.SILICON_STEEL;
    private final CoreLoss loss = Materials.MNZN_FERRITE.coreLoss().orElseThrow();
    private final Wire wire = Wire.awg(24);
    private final Bobbin bobbin = Bobbin.of(Quantity.of(20, "mm"), Quantity.of(10, "mm"), Quantity.of(5, "mm"));
    private double x = 0.3;

    @Benchmark
    public double roundWireFactorSeries() {
        x = x > 29 ? 0.3 : x + 0.37;
        return SkinEffect.roundWireFactorAt(x);
    }

    @Benchmark
    public double dowellFactor() {
        x = x > 5 ? 0.3 : x + 0.37;
        return Dowell.factorAt(x, 7);
    }

    @Benchmark
    public double bhTableFluxDensity() {
        x = x > 29 ? 0.3 : x + 0.37;
        return steel.fluxDensityAt(x * 1000);
    }

    @Benchmark
    public double bhTableInverse() {
        x = x > 2.1 ? 0.05 : x + 0.037;
        return steel.fieldAt(x);
    }

    /**
     * The inverse inside the table (B from 0.05 to 1.95 T), and the same B through the safeguarded
     * Newton iteration alone (the inverse before the dense inverse table; reached by reflection),
     * measured side by side so a loaded machine still gives their ratio.
     */
    @Benchmark
    public double bhTableInverseInTable() {
        y = y > 1.95 ? 0.05 : y + 0.037;
        return steel.fieldAt(y);
    }

    @Benchmark
    public double bhTableInverseSafeguarded() throws Throwable {
        y = y > 1.95 ? 0.05 : y + 0.037;
        return (double) GUARDED.invokeExact(steelTable, y);
    }

    private double y = 0.05;
    private static final java.lang.invoke.MethodHandle GUARDED = guarded();
    private final MagneticMaterial steelTable = tableOf(steel);

    /** The B-H table under the catalogue's silicon steel (which adds a core-loss model around it). */
    private static MagneticMaterial tableOf(MagneticMaterial m) {
        try {
            Class<?> lossy = Class.forName("org.ampturn.material.LossyMaterial");
            while (lossy.isInstance(m)) {
                java.lang.reflect.Field f = lossy.getDeclaredField("base");
                f.setAccessible(true);
                m = (MagneticMaterial) f.get(m);
            }
            return m;
        } catch (ReflectiveOperationException e) {
            throw new IllegalStateException(e);
        }
    }

    private static java.lang.invoke.MethodHandle guarded() {
        try {
            java.lang.reflect.Method m = Class.forName("org.ampturn.material.TableMaterial").getDeclaredMethod("guardedInverse", double.class);
            m.setAccessible(true);
            return java.lang.invoke.MethodHandles.lookup().unreflect(m)
                    .asType(java.lang.invoke.MethodType.methodType(double.class, MagneticMaterial.class, double.class));
        } catch (ReflectiveOperationException e) {
            throw new IllegalStateException(e);
        }
    }

    @Benchmark
    public double igseTriangle() {
        x = x > 0.9 ? 0.05 : x + 0.037;
        return loss.densityTriangularAt(1e5, 0.1, x);
    }

    @Benchmark
    public Winding windingOf200Turns() {
        return Winding.of(wire, 200, bobbin);
    }
}
