package org.ampturn.coil;

import static org.ampturn.Ampturn.*;
import static org.junit.jupiter.api.Assertions.*;

import org.ampturn.material.MagneticMaterial;
import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.junit.jupiter.api.Test;

class ToroidTest {
    static final double MU0 = 4e-7 * Math.PI;

    /** Rectangular section: L = μ0μrN²h/(2π)·ln(OD/ID) (Grover 1946, ch. 17), by hand. */
    @Test
    void rectangularClosedForm() {
        Toroid t = Toroid.rectangular(100, mm(20), mm(40), mm(10), 1.0);
        double expect = MU0 * 1e4 * 0.01 / (2 * Math.PI) * Math.log(2);
        assertEquals(expect, t.inductance().si(), 1e-15);
        assertEquals("13.86 µH", t.inductance().toString());
        Toroid f = Toroid.rectangular(100, mm(20), mm(40), mm(10), 2500);
        assertEquals(2500 * expect, f.inductance().si(), 1e-12);
        // the IEC 60205 effective dimensions reproduce the exact inductance (identity of the two forms)
        assertEquals(f.inductance().si(), f.asCore().inductance(100).si(), 1e-12 * f.inductance().si());
    }

    /**
     * Circular section: L = μ0μrN²(R − √(R² − a²)) (Grover 1946, ch. 17), against a quadrature of
     * Ampère's-law flux over the circular section done here with Commons Math (independent route).
     */
    @Test
    void circularClosedFormMatchesQuadrature() {
        double rr = 0.02, a = 0.008;
        Toroid t = Toroid.circular(50, m(2 * rr), m(2 * a), 1.0);
        var quad = new IterativeLegendreGaussIntegrator(32, 1e-13, 1e-15);
        // r = R + a sin θ removes the square-root end points
        double phiPerAmp = quad.integrate(100000, th -> MU0 * 50 / (2 * Math.PI * (rr + a * Math.sin(th))) * 2 * a * a * Math.cos(th) * Math.cos(th),
                -Math.PI / 2, Math.PI / 2);
        assertEquals(50 * phiPerAmp, t.inductance().si(), 1e-8 * t.inductance().si());
        assertEquals(t.inductance().si(), t.fluxLinkageAt(1), 1e-10 * t.inductance().si());
        // thin ring limit μ0 N² a²/(2R) (common practice)
        Toroid thin = Toroid.circular(50, m(1), mm(2), 1.0);
        assertEquals(MU0 * 2500 * 1e-6 / (2 * 0.5), thin.inductance().si(), 1e-5 * thin.inductance().si());
    }

    /** Inner edge saturates first: I = H(Bsat)·2π·r_inner/N (Ampère's law; common practice). */
    @Test
    void saturationAtInnerEdge() {
        MagneticMaterial m = MagneticMaterial.linear("powder", 60, T(1.0));
        Toroid t = Toroid.rectangular(40, mm(14), mm(24), mm(8), m);
        double expect = 1.0 / (MU0 * 60) * 2 * Math.PI * 0.007 / 40;
        assertEquals(expect, t.saturationCurrent().si(), 1e-9 * expect);
        assertEquals(1.0, t.peakFluxDensity(org.ampturn.units.Quantity.of(expect, "A")).si(), 1e-9);
    }

    /** Nonlinear core: flux linkage by quadrature against Commons Math quadrature of B(H(r)) for the Fröhlich-Kennelly test material. */
    @Test
    void nonlinearFluxLinkage() {
        FrohlichMaterial steel = new FrohlichMaterial(1.6, 200, 1.5);
        Toroid t = Toroid.rectangular(200, mm(30), mm(50), mm(10), steel);
        double i = 0.8;
        var quad = new IterativeLegendreGaussIntegrator(32, 1e-12, 1e-15);
        double ref = 200 * 0.01 * quad.integrate(100000, r -> steel.fluxDensityAt(200 * i / (2 * Math.PI * r)), 0.015, 0.025);
        assertEquals(ref, t.fluxLinkageAt(i), 1e-9 * ref);
        assertTrue(t.inductance(A(i)).si() < t.inductance().si());
    }

    @Test
    void coreGivenOnlyByPermeabilityHasNoSaturationCheck() {
        var e = assertThrows(IllegalStateException.class, () -> Toroid.rectangular(10, mm(20), mm(30), mm(10), 100).saturationCurrent());
        assertTrue(e.getMessage().contains("MagneticMaterial"), e.getMessage());
        assertTrue(Core.of("air", mm(10), mm2(10), org.ampturn.material.Materials.AIR).withGap(mm(1)).saturation(10).parts().isEmpty());
    }

    @Test
    void badInput() {
        var e = assertThrows(IllegalArgumentException.class, () -> Toroid.rectangular(10, mm(40), mm(20), mm(10), 1.0));
        assertTrue(e.getMessage().contains("inner diameter (40.00 mm)") && e.getMessage().contains("outer diameter (20.00 mm)"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> Toroid.rectangular(10, mm(20), mm(20), mm(10), 1.0));
        assertTrue(e.getMessage().contains("less than"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> Toroid.rectangular(-5, mm(20), mm(30), mm(10), 1.0));
        assertTrue(e.getMessage().contains("turns") && e.getMessage().contains("-5"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> Toroid.circular(10, mm(20), mm(20), 1.0));
        assertTrue(e.getMessage().contains("section diameter"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> Toroid.rectangular(10, mm(20), mm(30), mm(10), Double.NaN));
        assertTrue(e.getMessage().contains("relative permeability") && e.getMessage().contains("NaN"), e.getMessage());
    }
}
