package org.ampturn.bench;

import java.util.concurrent.TimeUnit;
import org.ampturn.actuator.Plunger;
import org.ampturn.drive.Drive;
import org.ampturn.drive.Transient;
import org.ampturn.field.FieldArmature;
import org.ampturn.field.FieldMap;
import org.ampturn.field.Geometry;
import org.ampturn.field.MapProgress;
import org.ampturn.field.Mesh;
import org.ampturn.field.Shape;
import org.ampturn.field.Solution;
import org.ampturn.material.MagneticMaterial;
import org.ampturn.material.Materials;
import org.ampturn.units.Quantity;
import org.openjdk.jmh.annotations.*;

/**
 * The field solver: a linear and a saturating solve of a plunger valve on a mesh of about 20,000
 * nodes (targets ≤ 150 ms and ≤ 1 s on one core), and the pull-in transient on a field map
 * (target ≤ 20 ms). The 20 × 10 map (≤ 30 s, ≥ 1.7× on 2 threads) is {@link FieldMapBench}.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class FieldBench {
    Mesh linear;
    Mesh saturating;
    FieldArmature armature;
    Plunger lumped;

    /** The invented pilot valve of the demo worksheet (lib-docs/field.md). */
    static Geometry valve(MagneticMaterial iron, int cells, double amps) {
        double m = 1e-3;
        return Geometry.of().withCellsAcross(cells)
                .with("frame", Shape.polygonAt(0, -2 * m, 12 * m, -2 * m, 12 * m, 22 * m, 4.2 * m, 22 * m, 4.2 * m, 20 * m, 10.5 * m, 20 * m,
                        10.5 * m, 0, 4 * m, 0, 4 * m, 8 * m, 0, 8 * m), iron)
                .withWinding("coil", Shape.rectAt(4.5 * m, 0.5 * m, 10 * m, 19.5 * m), 400, Quantity.of(amps, "A"))
                .with("plunger", Shape.rectAt(0, 10.1 * m, 4 * m, 30 * m), iron);
    }

    static Plunger lumped() {
        return Plunger.of(400, Quantity.of(50.27e-6, "m^2"), Quantity.of(2e-3, "m")).withResidualGap(Quantity.of(0.1e-3, "m"))
                .withParasiticGap(Quantity.of(0.2e-3, "m"), Quantity.of(51.52e-6, "m^2")).withMass(Quantity.of(0.012, "kg"))
                .withSpring(Quantity.of(800, "N/m"), Quantity.of(1.5, "N")).withResistance(Quantity.of(12, "ohm"));
    }

    @Setup
    public void setUp() {
        MagneticMaterial linearIron = MagneticMaterial.linear("linear steel", 1000, Quantity.of(1.6, "T"));
        // 24 cells across, refined once: about 20,000 nodes
        linear = valve(linearIron, 12, 2).mesh().refined();
        saturating = valve(Materials.LOW_CARBON_STEEL, 12, 4).moved("plunger", Quantity.of(-2e-3, "m")).mesh().refined();
        System.out.println("\nlinear: " + linear + "\nsaturating: " + saturating);
        lumped = lumped();
        FieldMap map = FieldMap.of(valve(Materials.LOW_CARBON_STEEL, 8, 1), "plunger", "coil", Quantity.of(-2e-3, "m"), 6,
                new double[] {0.25, 0.5, 1, 2, 4}, 2, MapProgress.NONE);
        armature = map.armature(lumped);
    }

    @Benchmark
    public Solution linearSolve() {
        return linear.solve();
    }

    @Benchmark
    public Solution saturatingSolve() {
        return saturating.solve();
    }

    @Benchmark
    public Transient pullInOnFieldMap() {
        return Drive.dc(Quantity.of(24, "V")).into(armature).simulate(Quantity.of(0.03, "s"));
    }
}
