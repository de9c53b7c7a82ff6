package org.ampturn.actuator;

import static org.ampturn.Ampturn.*;
import static org.junit.jupiter.api.Assertions.*;

import org.ampturn.coil.Core;
import org.ampturn.coil.MagneticCircuit;
import org.ampturn.material.MagneticMaterial;
import org.ampturn.units.Quantity;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class ElectromagnetForceTest {
    static final double MU0 = 4e-7 * Math.PI;

    /** Maxwell's pull: 1 T over 1 cm² gives 1/(2μ0)·1e-4 = 39.79 N (common practice: about 40 N/cm² at 1 T). */
    @Test
    void maxwellStress() {
        assertEquals(39.789, Force.ofFluxDensity(T(1), cm2(1)).si(), 1e-3);
        assertEquals(0.5 * 4 * 0.02, Force.ofInductanceSlope(A(2), Quantity.of(0.02, "H/m")).si(), 1e-12);
    }

    /**
     * Linear iron: the two methods agree, and equal the closed form n·Φ²/(2μ0A) with
     * Φ = N·i/(R_iron + n·x/(μ0A)) (Roters 1941, ch. 5; by hand).
     */
    @ParameterizedTest(name = "gap {0} mm")
    @ValueSource(doubles = {0.05, 0.3, 2})
    void linearMethodsAgreeAndMatchClosedForm(double gapMm) {
        MagneticMaterial iron = MagneticMaterial.linear("iron", 1500, T(1.6));
        MagneticCircuit path = Core.of("yoke and armature", mm(120), mm2(150), iron);
        Electromagnet em = Electromagnet.of(500, path, mm2(150), 2);
        double x = gapMm * 1e-3, i = 0.4;
        double r = path.reluctanceSI() + 2 * x / (MU0 * 150e-6);
        double phi = 500 * i / r;
        double closed = 2 * phi * phi / (2 * MU0 * 150e-6);
        assertEquals(closed, em.forceAt(x, i), 1e-12 * closed);
        assertEquals(closed, em.forceByCoenergyAt(x, i), 1e-7 * closed);
        assertEquals(em.force(mm(gapMm), A(i)).si(), em.forceByCoenergy(mm(gapMm), A(i)).si(), 1e-7 * closed);
        // and ½ i² dL/dx with dL/dx from the inductance at two gaps
        double h = 1e-6 * x;
        double dl = (em.inductance(Quantity.of(x + h, "m")).si() - em.inductance(Quantity.of(x - h, "m")).si()) / (2 * h);
        assertEquals(closed, Force.ofInductanceSlope(A(i), Quantity.of(-dl, "H/m")).si(), 1e-5 * closed);
    }

    /** Saturating iron (Fröhlich-Kennelly test material): the Maxwell-stress force and the co-energy derivative still agree (lumped model). */
    @ParameterizedTest(name = "current {0} A")
    @ValueSource(doubles = {0.2, 1.0, 5.0})
    void nonlinearMethodsAgree(double i) {
        MagneticMaterial steel = new MagneticMaterial() {
            public String name() { return "test steel"; }
            public double relativePermeability() { return 1 + 1.6 / (MU0 * 200); }
            public Quantity saturationFluxDensity() { return T(1.5); }
            public boolean isLinear() { return false; }
            public double fluxDensityAt(double h) { return MU0 * h + 1.6 * h / (200 + Math.abs(h)); }
            public double fieldAt(double b) {
                double s = Math.signum(b), bb = Math.abs(b), p = MU0 * 200 + 1.6 - bb;
                return s * (-p + Math.sqrt(p * p + 4 * MU0 * bb * 200)) / (2 * MU0);
            }
        };
        Electromagnet em = Electromagnet.of(800, Core.of("steel", mm(150), mm2(100), steel), mm2(100), 2);
        double x = 0.2e-3;
        double f1 = em.forceAt(x, i), f2 = em.forceByCoenergyAt(x, i);
        assertEquals(f1, f2, 1e-5 * f1);
        assertTrue(em.gapFluxDensity(mm(0.2), A(i)).si() > 0);
    }

    /** A B-H table material from the material package (low-carbon steel, typical values): the two methods still agree. */
    @Test
    void tableMaterialMethodsAgree() {
        MagneticCircuit path = Core.of("yoke", mm(150), mm2(100), org.ampturn.material.Materials.LOW_CARBON_STEEL);
        Electromagnet em = Electromagnet.of(600, path, mm2(100), 2);
        for (double i : new double[] {0.3, 2, 8}) {
            double f1 = em.forceAt(0.3e-3, i), f2 = em.forceByCoenergyAt(0.3e-3, i);
            assertEquals(f1, f2, 1e-4 * f1, "i = " + i);
        }
    }

    @Test
    void badInput() {
        MagneticCircuit path = Core.of("iron", mm(120), mm2(150), MagneticMaterial.linear("iron", 1500, T(1.6)));
        var e = assertThrows(IllegalArgumentException.class, () -> Electromagnet.of(0, path, mm2(150), 2));
        assertTrue(e.getMessage().contains("turns"));
        Electromagnet em = Electromagnet.of(100, path, mm2(150), 2);
        e = assertThrows(IllegalArgumentException.class, () -> em.force(mm(0), A(1)));
        assertTrue(e.getMessage().contains("gap") && e.getMessage().contains("from 1.000 nm to 10.00 km, got 0.000 m"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> em.force(mm(1), org.ampturn.units.Quantity.of(Double.NaN, org.ampturn.units.Dimension.CURRENT)));
        assertTrue(e.getMessage().contains("current"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> Force.ofFluxDensity(T(1), cm2(-1)));
        assertTrue(e.getMessage().contains("pole area"), e.getMessage());
    }
}
