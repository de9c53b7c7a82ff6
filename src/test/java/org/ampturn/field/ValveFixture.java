package org.ampturn.field;

import org.ampturn.actuator.Plunger;
import org.ampturn.material.Materials;
import org.ampturn.units.Quantity;

/** An invented valve solenoid used by the field tests: a steel frame with a fixed stop, a 400-turn coil, a plunger closing 2 mm downward. */
final class ValveFixture {
    private ValveFixture() {}

    static Quantity mm(double v) { return Quantity.of(v * 1e-3, "m"); }

    /** The plunger open: 2 mm stroke plus 0.1 mm residual gap above the stop; it closes toward −z. */
    static Geometry geometry(int cells) {
        double m = 1e-3;
        return Geometry.of().withCellsAcross(cells)
                .with("frame", Shape.polygonAt(0, -2 * m, 12 * m, -2 * m, 12 * m, 22 * m, 4.2 * m, 22 * m, 4.2 * m, 20 * m, 10.5 * m, 20 * m,
                        10.5 * m, 0, 4 * m, 0, 4 * m, 8 * m, 0, 8 * m), Materials.LOW_CARBON_STEEL)
                .withWinding("coil", Shape.rectAt(4.5 * m, 0.5 * m, 10 * m, 19.5 * m), 400, Quantity.of(1, "A"))
                .with("plunger", Shape.rectAt(0, 10.1 * m, 4 * m, 30 * m), Materials.LOW_CARBON_STEEL);
    }

    /** The lumped model of the same valve (Plunger: working gap over the pole face, sliding gap in the top plate). */
    static Plunger lumped() {
        double pole = Math.PI * 16e-6;
        double sliding = 2 * Math.PI * 4.1e-3 * 2e-3;
        return Plunger.of(400, Quantity.of(pole, "m^2"), mm(2)).withResidualGap(mm(0.1)).withParasiticGap(mm(0.2), Quantity.of(sliding, "m^2"))
                .withMass(Quantity.of(0.012, "kg")).withSpring(Quantity.of(800, "N/m"), Quantity.of(1.5, "N")).withResistance(Quantity.of(12, "ohm"));
    }
}
