package org.ampturn.field;

import static org.junit.jupiter.api.Assertions.*;

import org.ampturn.material.Materials;
import org.ampturn.units.Quantity;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

/** Bad geometry gets a clear one-line error that names the region (common practice). */
class FieldBadInputTest {
    static void fails(Executable e, String... words) {
        IllegalArgumentException x = assertThrows(IllegalArgumentException.class, e);
        for (String w : words) assertTrue(x.getMessage().contains(w), "message '" + x.getMessage() + "' lacks '" + w + "'");
        assertFalse(x.getMessage().contains("\n"));
    }

    final Geometry base = Geometry.of().with("core", Shape.rectAt(0, 0, 0.004, 0.02), Materials.LOW_CARBON_STEEL);

    @Test
    void overlappingRegions() {
        fails(() -> base.with("stop", Shape.rectAt(0.002, 0.01, 0.006, 0.03), Materials.LOW_CARBON_STEEL), "\"stop\"", "overlaps", "\"core\"");
        fails(() -> base.with("same", Shape.rectAt(0, 0, 0.004, 0.02), Materials.SILICON_STEEL), "\"same\"", "overlaps");
        fails(() -> base.with("inner", Shape.rectAt(0.001, 0.005, 0.002, 0.006), Materials.AIR), "\"inner\"", "overlaps");
    }

    @Test
    void fringingFactorNeedsAPositiveGapReluctance() {
        Solution s = Geometry.of().withCellsAcross(4).withWinding("coil", Shape.rectAt(0.01, 0, 0.012, 0.01), 10, Quantity.of(1, "A")).solve();
        fails(() -> s.fringingFactor(Quantity.of(0, "A/Wb")), "gap reluctance");
        fails(() -> s.fringingFactor(Quantity.of(-1, "A/Wb")), "gap reluctance");
        fails(() -> s.fringingFactor(Quantity.of(1, "H")), "gap reluctance");
        fails(() -> s.fringingFactor("rim", Quantity.of(1e6, "A/Wb")), "\"rim\"");
    }

    @Test
    void windingInsideIron() {
        fails(() -> base.withWinding("coil", Shape.rectAt(0.001, 0.005, 0.003, 0.01), 100, Quantity.of(1, "A")), "\"coil\"", "winding inside iron", "\"core\"");
    }

    @Test
    void polygonsThatDoNotCloseOrCrossThemselves() {
        fails(() -> Shape.polygonAt(0, 0, 0.01, 0, 0.01), "does not close");
        fails(() -> Shape.polygonAt(0, 0, 0.01, 0.01, 0.01, 0, 0, 0.01), "crosses itself");
        fails(() -> Shape.polygonAt(0, 0, 0.01, 0), "at least three corners");
        fails(() -> Shape.rectAt(0.01, 0, 0.005, 0.01), "r1", "r0");
    }

    @Test
    void missingWindingIsNamed() {
        fails(() -> Region.winding("coil", Shape.rectAt(0.005, 0, 0.008, 0.02), (org.ampturn.wire.Winding) null, Quantity.of(1, "A")), "winding of region", "\"coil\"");
        fails(() -> Region.winding("coil", Shape.rectAt(0.005, 0, 0.008, 0.02), 100, Quantity.of(2e6, "A")), "\"coil\"");
    }

    @Test
    void negativeRadius() {
        fails(() -> base.with("ring", Shape.rectAt(-0.001, 0.03, 0.002, 0.04), Materials.AIR), "\"ring\"", "r = ", "zero or more");
    }

    @Test
    void partMovedOutsideTheDomainOrIntoAnother() {
        Geometry g = base.withDomain(Quantity.of(0.05, "m"), Quantity.of(-0.05, "m"), Quantity.of(0.05, "m"));
        fails(() -> g.moved("core", Quantity.of(0.04, "m")), "\"core\"", "outside the domain");
        Geometry two = base.with("stop", Shape.rectAt(0, 0.021, 0.004, 0.03), Materials.LOW_CARBON_STEEL);
        fails(() -> two.moved("core", Quantity.of(0.005, "m")), "moving \"core\"", "overlaps", "\"stop\"");
        fails(() -> two.moved("plunger", Quantity.of(0.001, "m")), "no region \"plunger\"", "core");
    }

    @Test
    void forceOnAPartWithoutAirAround() {
        Geometry touching = base.with("stop", Shape.rectAt(0, 0.02, 0.004, 0.03), Materials.LOW_CARBON_STEEL)
                .withWinding("coil", Shape.rectAt(0.005, 0, 0.008, 0.02), 100, Quantity.of(1, "A"));
        fails(() -> touching.solve().maxwellForce("core"), "\"core\"", "touches", "\"stop\"");
        fails(() -> touching.solve().fluxLinkage("core"), "\"core\"", "not a winding");
    }
}
