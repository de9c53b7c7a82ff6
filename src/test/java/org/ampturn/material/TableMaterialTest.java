package org.ampturn.material;

import static org.junit.jupiter.api.Assertions.*;

import java.lang.reflect.Field;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.ampturn.units.Quantity;
import org.junit.jupiter.api.Test;

class TableMaterialTest {
    private static final double MU0 = MagneticMaterial.MU0;

    /**
     * The RPN 14 data set (Akima's test data) used by Fritsch and Carlson, SIAM J. Numer. Anal. 17(2),
     * 1980, to show that ordinary cubic splines overshoot where a monotone interpolant must not
     * (from memory). Shifted so the first point is the origin.
     */
    private static final double[] X = {7.99, 8.09, 8.19, 8.7, 9.2, 10, 12, 15, 20};
    private static final double[] Y = {0, 2.76429e-5, 4.37498e-2, 0.169183, 0.469428, 0.943740, 0.998636, 0.999919, 0.999994};

    private static MagneticMaterial rpn14() {
        double[] h = new double[X.length];
        for (int i = 0; i < X.length; i++) h[i] = X[i] - X[0];
        return MagneticMaterial.fromTable("rpn14", h, Y, 1.0);
    }

    @Test
    void monotoneThroughTheFritschCarlsonTestData() {
        MagneticMaterial m = rpn14();
        for (int i = 0; i < X.length; i++) assertEquals(Y[i], m.fluxDensityAt(X[i] - X[0]), 1e-15, "passes through point " + i);
        double prev = -1;
        for (double h = 0; h < 13; h += 0.001) {
            double b = m.fluxDensityAt(h);
            assertTrue(b > prev || (b == prev && b == 0), "B increases at H = " + h);
            assertTrue(b <= Y[Y.length - 1] + MU0 * Math.max(0, h - 12.01) + 1e-12, "no overshoot at H = " + h);
            prev = b;
        }
    }

    @Test
    void inverseIsExactAndSafeEverywhere() {
        for (MagneticMaterial m : new MagneticMaterial[] {rpn14(), Materials.SILICON_STEEL, Materials.LOW_CARBON_STEEL, Materials.NICKEL_IRON}) {
            for (double b = -2.3; b <= 2.3; b += 0.0137) {
                double h = m.fieldAt(b);
                assertEquals(b, m.fluxDensityAt(h), 1e-12, m.name() + " at B = " + b);
            }
        }
    }

    /** Every B-H table: the catalogue's (read by reflection, so a new one is covered), a roll-off material's, and RPN 14. */
    static List<TableMaterial> tables() throws ReflectiveOperationException {
        List<TableMaterial> out = new ArrayList<>();
        out.add((TableMaterial) rpn14());
        for (Field f : Materials.class.getFields()) {
            Object v = f.get(null);
            while (v instanceof LossyMaterial) { // a material with a core-loss model wraps its B-H curve
                Field base = LossyMaterial.class.getDeclaredField("base");
                base.setAccessible(true);
                v = base.get(v);
            }
            if (v instanceof TableMaterial) out.add((TableMaterial) v);
            if (v instanceof RollOffMaterial) out.add(tableOf((RollOffMaterial) v));
        }
        out.add(tableOf((RollOffMaterial) MagneticMaterial.rollOff("roll-off", 3000, Quantity.of(400, "A/m"), 2,
                Quantity.of(1.6, "T"))));
        assertTrue(out.size() >= 5, "tables found: " + out.size());
        return out;
    }

    private static TableMaterial tableOf(RollOffMaterial r) throws ReflectiveOperationException {
        Field f = RollOffMaterial.class.getDeclaredField("table");
        f.setAccessible(true);
        return (TableMaterial) f.get(r);
    }

    @Test
    void fastInverseAgreesWithTheSafeguardedNewtonAndRoundTrips() throws ReflectiveOperationException {
        // the safeguarded Newton iteration (bisection when a step leaves the bracket) converges to rounding: the reference
        SplittableRandom r = new SplittableRandom(17);
        for (TableMaterial t : tables()) {
            double[][] p = t.points();
            double top = p[1][p[1].length - 1];
            for (int k = 0; k < 40_000; k++) {
                double b = k < p[1].length ? p[1][k] : k % 3 == 0 ? top * Math.pow(10, -6 * r.nextDouble()) : top * r.nextDouble();
                if (!(b > 0 && b < top)) continue;
                double fast = t.fieldAt(b), reference = t.guardedInverse(b);
                assertEquals(reference, fast, 1e-11 * reference, t.name() + " at B = " + b);
                assertEquals(b, t.fluxDensityAt(fast), 1e-14 * Math.max(b, 1), t.name() + " round trip at B = " + b);
            }
        }
    }

    @Test
    void beyondTheTableOnlyTheVacuumTermGrows() {
        MagneticMaterial s = Materials.SILICON_STEEL; // last point 2.00 T at 50 kA/m
        assertEquals(2.00 + MU0 * 50e3, s.fluxDensityAt(100e3), 1e-12);
        assertEquals(1.0, s.incrementalPermeabilityAt(80e3), 0);
        // slope is continuous at the last point (the end tangent is μ0)
        assertEquals(1.0, s.incrementalPermeabilityAt(50e3 - 1e-3), 1e-3);
        // odd symmetry
        assertEquals(-s.fluxDensityAt(321), s.fluxDensityAt(-321), 0);
        assertEquals(-s.fieldAt(1.1), s.fieldAt(-1.1), 0);
        assertFalse(s.isLinear());
    }

    @Test
    void incrementalPermeabilityIsTheSlope() {
        MagneticMaterial s = Materials.LOW_CARBON_STEEL;
        for (double h : new double[] {50, 250, 700, 4000, 30000}) {
            double num = (s.fluxDensityAt(h + 1e-3) - s.fluxDensityAt(h - 1e-3)) / 2e-3 / MU0;
            assertEquals(num, s.incrementalPermeabilityAt(h), num * 1e-5, "at H = " + h);
        }
        assertEquals(0.30 / 100 / MU0, s.relativePermeability(), 1e-9);
        assertEquals(1.38 / (MU0 * 1000), s.amplitudePermeabilityAt(1000), 1e-9);
    }

    @Test
    void quantityTableAndSurface() {
        MagneticMaterial m = MagneticMaterial.fromTable("q", new Quantity[] {Quantity.parse("100 A/m"), Quantity.parse("1 kA/m")},
                new Quantity[] {Quantity.parse("0.5 T"), Quantity.parse("1.2 T")}, Quantity.parse("1.1 T"));
        assertEquals(0.5, m.fluxDensity(Quantity.parse("100 A/m")).si(), 1e-15);
        assertEquals(1000, m.field(Quantity.parse("1.2 T")).si(), 1e-9);
        assertEquals(0, m.fluxDensityAt(0), 0);
        assertTrue(m.toString().startsWith("q: B-H table of 3 points"), m.toString());
    }

    @Test
    void badTablesAreRefused() {
        var e = assertThrows(IllegalArgumentException.class,
                () -> MagneticMaterial.fromTable("x", new double[] {0, 100, 100}, new double[] {0, 1, 1.2}, 1));
        assertTrue(e.getMessage().contains("H must increase strictly") && e.getMessage().contains("H[2]"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class,
                () -> MagneticMaterial.fromTable("x", new double[] {0, 100, 200}, new double[] {0, 1.2, 1.1}, 1));
        assertTrue(e.getMessage().contains("B must increase strictly"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> MagneticMaterial.fromTable("x", new double[] {0, 100}, new double[] {0.1, 1}, 1));
        assertTrue(e.getMessage().contains("B at H = 0 must be 0"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> MagneticMaterial.fromTable("x", new double[] {0, 100}, new double[] {0}, 1));
        assertTrue(e.getMessage().contains("as many B values"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> MagneticMaterial.fromTable("x", new double[] {0, Double.NaN}, new double[] {0, 1}, 1));
        assertTrue(e.getMessage().contains("finite"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> MagneticMaterial.fromTable("x", new double[] {10}, new double[] {1}, -1));
        assertTrue(e.getMessage().contains("saturation"), e.getMessage());
    }

    @Test
    void genericClassesAreMarkedTypical() {
        for (MagneticMaterial m : Materials.all()) {
            if (m != Materials.AIR) assertTrue(m.name().contains("typical"), m.name());
            assertTrue(m.relativePermeability() >= 1, m.name());
        }
        assertEquals(1.0, Materials.AIR.relativePermeability());
        assertTrue(Materials.AIR.toString().contains("does not saturate"));
        assertTrue(Materials.MNZN_FERRITE.coreLoss().isPresent());
        assertTrue(Materials.LOW_CARBON_STEEL.coreLoss().isEmpty());
        // a lossy copy keeps the B-H relation
        MagneticMaterial s = Materials.SILICON_STEEL;
        assertEquals(MagneticMaterial.fromTable("p", new double[] {0, 40, 60, 100, 200, 400, 1000, 2500, 5000, 10000, 20000, 50000},
                new double[] {0, 0.40, 0.70, 1.00, 1.20, 1.32, 1.43, 1.53, 1.62, 1.72, 1.83, 2.00}, 1.6).fluxDensityAt(333), s.fluxDensityAt(333), 0);
    }
}
