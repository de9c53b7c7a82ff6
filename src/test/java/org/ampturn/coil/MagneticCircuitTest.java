package org.ampturn.coil;

import static org.ampturn.Ampturn.*;
import static org.junit.jupiter.api.Assertions.*;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;

import org.ampturn.material.MagneticMaterial;
import org.junit.jupiter.api.Test;

class MagneticCircuitTest {
    static final double MU0 = 4e-7 * Math.PI;
    static final MagneticMaterial FERRITE = MagneticMaterial.linear("ferrite", 2000, mT(350));

    /**
     * Gapped core: μe = μr/(1 + μr·lg/le) and L = μ0·μe·N²·Ae/le (McLyman, Transformer and Inductor
     * Design Handbook, 3rd ed., ch. 2; common practice), gap cut from the path of le.
     */
    @Test
    void gappedCoreMatchesTextbookEffectivePermeability() {
        double le = 0.1, ae = 1e-4, lg = 0.5e-3, mur = 2000;
        MagneticCircuit c = Core.of("core", m(le), m2(ae), FERRITE).withGap(m(lg));
        double mue = mur / (1 + mur * lg / le);
        // the textbook form puts the gap's and the iron's lengths as lg and le - lg: exact Hopkinson
        double rExact = (le - lg) / (MU0 * mur * ae) + lg / (MU0 * ae);
        assertEquals(rExact, c.reluctanceSI(), 1e-9 * rExact);
        assertEquals(mue, c.effectivePermeability(), 0.001 * mue); // differs only by the (le - lg) of the iron
        assertEquals(MU0 * mue * 100 * 100 * ae / le, c.inductance(100).si(), 0.001 * c.inductance(100).si());
        assertEquals(1 / rExact, c.alValue().si(), 1e-18);
        assertEquals(le, c.effectiveLength().si(), 1e-12);
        assertEquals(ae, c.effectiveArea().si(), 1e-15);
    }

    static org.ampturn.units.Quantity m2(double x) {
        return org.ampturn.units.Quantity.of(x, "m^2");
    }

    /** Hopkinson's law for series and parallel parts (reluctances add in series, permeances in parallel; common practice). */
    @Test
    void seriesAndParallelReluctances() {
        Core centre = Core.of("centre", mm(40), mm2(100), FERRITE);
        Core outer1 = Core.of("outer", mm(80), mm2(50), FERRITE);
        Core outer2 = Core.of("outer", mm(80), mm2(50), FERRITE);
        MagneticCircuit e = MagneticCircuit.series(centre, AirGap.of(mm(0.2), mm2(100)), MagneticCircuit.parallel(outer1, outer2));
        double rc = 0.04 / (MU0 * 2000 * 100e-6), rg = 0.2e-3 / (MU0 * 100e-6), ro = 0.08 / (MU0 * 2000 * 50e-6);
        double expect = rc + rg + ro / 2;
        assertEquals(expect, e.reluctanceSI(), 1e-9 * expect);
        // flux halves in each outer leg of half the area: same B as the centre (common practice)
        FluxReport f = e.fluxDensities(200, A(0.5));
        assertEquals(f.parts().get(0).tesla(), f.parts().get(2).tesla(), 1e-9);
        assertEquals(200 * 0.5 / expect / 100e-6, f.parts().get(0).tesla(), 1e-9);
        assertEquals(4, e.parts().size());
    }

    /** IEC 60205 effective parameters: C1 = Σl/A, C2 = Σl/A², le = C1²/C2, Ae = C1/C2, by hand for two pieces. */
    @Test
    void iec60205EffectiveDimensions() {
        MagneticCircuit c = MagneticCircuit.series(Core.of("a", mm(30), mm2(20), FERRITE), Core.of("b", mm(50), mm2(40), FERRITE));
        double c1 = 0.03 / 20e-6 + 0.05 / 40e-6, c2 = 0.03 / 400e-12 + 0.05 / 1600e-12;
        assertEquals(c1 * c1 / c2, c.effectiveLength().si(), 1e-12);
        assertEquals(c1 / c2, c.effectiveArea().si(), 1e-15);
        // all one material and no gap: μe is the material's μr (IEC 60205 definition)
        assertEquals(2000, c.effectivePermeability(), 1e-9);
    }

    /** McLyman's fringing factor F = 1 + (lg/√Ac)·ln(2G/lg) (McLyman 2004, ch. 8; from memory), computed by hand. */
    @Test
    void mcLymanFringing() {
        AirGap g = AirGap.of(mm(1), mm2(100)).withFringing(mm(20));
        double f = 1 + 1e-3 / 0.01 * Math.log(2 * 20e-3 / 1e-3);
        assertEquals(f, g.fringingFactor(), 1e-12);
        assertEquals(1.3689, f, 1e-4);
        assertEquals(AirGap.of(mm(1), mm2(100)).reluctanceSI() / f, g.reluctanceSI(), 1e-6);
        MagneticCircuit c = Core.of("core", mm(100), mm2(100), FERRITE).withGap(mm(1), mm(20));
        assertTrue(c.inductance(50).si() > Core.of("core", mm(100), mm2(100), FERRITE).withGap(mm(1)).inductance(50).si());
        var e = assertThrows(IllegalArgumentException.class, () -> AirGap.of(mm(1), mm2(100)).withFringing(mm(0.4)));
        assertTrue(e.getMessage().contains("window height"), e.getMessage());
    }

    /** Linear saturation current by Ampère's law: N·I = Bsat·(l/(μ0μr) + lg/μ0) (common practice). */
    @Test
    void linearSaturationCurrent() {
        MagneticCircuit c = Core.of("core", mm(100), mm2(100), FERRITE).withGap(mm(0.5));
        Saturation s = c.saturation(100);
        double expect = 0.35 * (0.0995 / (MU0 * 2000) + 0.5e-3 / MU0) / 100;
        assertEquals(expect, s.current().si(), 1e-9 * expect);
        assertEquals("core", s.first().name());
        assertTrue(s.isClearAt(A(0.9 * expect)));
        assertFalse(s.isClearAt(A(1.1 * expect)));
        assertTrue(s.at(A(2 * expect)).startsWith("SATURATED"), s.at(A(2 * expect)));
        assertTrue(s.at(A(2 * expect)).contains("100 %"), s.at(A(2 * expect)));
    }

    /** The thinner of two series pieces saturates first (same flux, higher B; common practice). */
    @Test
    void thinnerPieceSaturatesFirst() {
        MagneticMaterial steel = MagneticMaterial.linear("steel", 1500, T(1.6));
        MagneticCircuit c = MagneticCircuit.series(Core.of("yoke", mm(60), mm2(200), steel), Core.of("armature", mm(40), mm2(120), steel),
                AirGap.of(mm(0.3), mm2(200)));
        Saturation s = c.saturation(300);
        assertEquals("armature", s.first().name());
        assertEquals(200.0 / 120, s.parts().get(1).amps() / s.parts().get(0).amps(), 1e-9);
    }

    /**
     * Nonlinear core, checked against the closed-form inverse of the Fröhlich-Kennelly relation: for
     * B chosen, H = H(B), and Ampère's law N·I = H·l + B·lg/μ0 gives the current; the circuit must
     * return that B at that current.
     */
    @Test
    void nonlinearCircuitSolvesAmperesLaw() {
        FrohlichMaterial steel = new FrohlichMaterial(1.6, 200, 1.5);
        double l = 0.12, a = 2e-4, lg = 0.2e-3;
        MagneticCircuit c = MagneticCircuit.series(Core.of("steel", m(l), m2(a), steel), AirGap.of(m(lg), m2(a)));
        for (double b : new double[] {0.2, 1.0, 1.4, 1.7}) {
            double ni = steel.fieldAt(b) * l + b * lg / MU0;
            assertEquals(b * a, c.fluxAt(ni), 1e-10 * b * a, "B = " + b);
            assertEquals(ni, c.mmfAt(b * a), 1e-9 * ni);
        }
        // saturation: B = 1.5 T reached at N·I = H(1.5)·l + 1.5·lg/μ0
        double isat = (steel.fieldAt(1.5) * l + 1.5 * lg / MU0) / 250;
        assertEquals(isat, c.saturation(250).current().si(), 1e-8 * isat);
        assertFalse(c.isLinear());
    }

    /** Nonlinear parallel legs: fluxes add at one MMF (common practice); checked against each leg alone. */
    @Test
    void nonlinearParallel() {
        FrohlichMaterial steel = new FrohlichMaterial(1.6, 200, 1.5);
        Core a = Core.of("a", mm(100), mm2(100), steel), b = Core.of("b", mm(150), mm2(60), steel);
        MagneticCircuit p = MagneticCircuit.parallel(a, b);
        double f = 300;
        assertEquals(a.fluxAt(f) + b.fluxAt(f), p.fluxAt(f), 1e-15);
        assertEquals(f, p.mmfAt(p.fluxAt(f)), 1e-9 * f);
    }

    /**
     * A B-H table material of the material package (low-carbon steel, typical values) in a closed
     * core: Ampère's law gives I_sat = H(B_sat)·l/N exactly (common practice); and with a gap the
     * solution satisfies H(B)·l + B·lg/μ0 = N·I.
     */
    @Test
    void tableMaterialCore() {
        MagneticMaterial steel = org.ampturn.material.Materials.LOW_CARBON_STEEL;
        Core core = Core.of("steel", mm(200), mm2(300), steel);
        double bsat = steel.saturationFluxDensity().si();
        assertEquals(steel.fieldAt(bsat) * 0.2 / 150, core.saturation(150).current().si(), 1e-9 * core.saturation(150).current().si());
        MagneticCircuit c = core.withGap(mm(0.4));
        double i = 2.0;
        double b = c.fluxDensities(150, A(i)).part("steel").tesla();
        assertEquals(150 * i, steel.fieldAt(b) * 0.1996 + b * 0.4e-3 / MU0, 1e-9 * 150 * i);
    }

    @Test
    void badInput() {
        Core core = Core.of("core", mm(100), mm2(100), FERRITE);
        var e = assertThrows(IllegalArgumentException.class, () -> core.withGap(mm(120)));
        assertTrue(e.getMessage().contains("gap length (120.0 mm)") && e.getMessage().contains("100.0 mm"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> Core.of("x", mm(-1), mm2(100), FERRITE));
        assertTrue(e.getMessage().contains("path length"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> Core.of("x", mm(10), mm(100), FERRITE));
        assertTrue(e.getMessage().contains("area") && e.getMessage().contains("length"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> AirGap.of(Quantity.of(Double.NaN, Dimension.LENGTH), mm2(1)));
        assertTrue(e.getMessage().contains("gap length"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> core.inductance(0));
        assertTrue(e.getMessage().contains("turns"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> MagneticCircuit.series());
    }

    @Test
    void describesItself() {
        String s = Core.of("core", mm(100), mm2(100), FERRITE).withGap(mm(0.5)).toString();
        assertTrue(s.startsWith("magnetic circuit: core + gap 500.0 µm"), s);
    }
}
