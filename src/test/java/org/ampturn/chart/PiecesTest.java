package org.ampturn.chart;

import static org.junit.jupiter.api.Assertions.*;

import java.util.List;
import java.util.stream.Stream;
import org.ampturn.material.MagneticMaterial;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/** Axis units, sparklines, bins, B-H data and the adapters. */
class PiecesTest {
    /** SI prefixes m = 1e-3, µ = 1e-6, k = 1e3 (SI Brochure, BIPM, 9th ed. 2019, table 7). */
    static Stream<Arguments> axisUnits() {
        return Stream.of(
                Arguments.of(Dimension.CURRENT, 0.0123, "current", "current (mA)", 1e-3),
                Arguments.of(Dimension.CURRENT, 0.8, "current", "current (mA)", 1e-3),
                Arguments.of(Dimension.CURRENT, 2.5, "current", "current (A)", 1),
                Arguments.of(Dimension.TIME, 0.040, "time", "time (ms)", 1e-3),
                Arguments.of(Dimension.TIME, 250e-6, "time", "time (µs)", 1e-6),
                Arguments.of(Dimension.VOLTAGE, 212, "voltage", "voltage (V)", 1),
                Arguments.of(Dimension.VOLTAGE, 1500, "voltage", "voltage (kV)", 1e3),
                Arguments.of(Dimension.ENERGY, 0.0955, "energy", "energy (mJ)", 1e-3),
                Arguments.of(Dimension.FIELD_STRENGTH, 1035, "field strength", "field strength (kA/m)", 1e3),
                Arguments.of(Dimension.CURRENT, 0.0, "current", "current (A)", 1),
                Arguments.of(Dimension.NONE, 300, "turns", "turns", 1));
    }

    @ParameterizedTest
    @MethodSource("axisUnits")
    void eachAxisTakesThePrefixOfItsRange(Dimension d, double maxAbs, String word, String label, double factor) {
        AxisUnit u = AxisUnit.forRange(d, maxAbs);
        assertEquals(label, u.label(word));
        assertEquals(factor, u.factor(), factor * 1e-12);
    }

    @Test
    void sparklineOfARampRisesFromTheLowestToTheHighestBlock() {
        double[] x = new double[101], y = new double[101];
        for (int i = 0; i <= 100; i++) { x[i] = i; y[i] = 2 * i; }
        String s = Preview.sparkline(x, y, 16);
        assertEquals(16, s.length());
        assertEquals('▁', s.charAt(0));
        assertEquals('█', s.charAt(15));
        for (int i = 1; i < s.length(); i++) assertTrue(s.charAt(i) >= s.charAt(i - 1), s);
        assertEquals("▄▄▄▄", Preview.sparkline(new double[] {0, 1, 2}, new double[] {5, 5, 5}, 4), "a flat line sits mid-height");
        assertEquals("▁█", Preview.sparkline(new double[] {0, 1, 2, 3}, new double[] {0, Double.NaN, 9, 9}, 2), "NaN is skipped");
    }

    @Test
    void binsCountEveryValueAndTheOnesOutsideTheLimits() {
        double[] v = new double[102];
        for (int i = 0; i < 100; i++) v[i] = i + 1;   // 1..100
        v[100] = Double.NaN;                           // two failed runs
        v[101] = Double.NaN;
        Bins b = Bins.of(v, 10.5, 90.5);
        assertEquals(10, b.counts().length, "√100 bins");
        assertEquals(100, java.util.Arrays.stream(b.counts()).sum());
        assertEquals(20, b.outside(), "1..10 and 91..100");
        assertEquals(2, b.failed());
        assertEquals("100 runs, 20 outside the limits (20.0 %), 2 failed (not binned)", b.summary());
        for (int c : b.counts()) assertTrue(c >= 9 && c <= 11, "uniform data fill the bins evenly: " + c);
    }

    @Test
    void bhCurveMarksSaturationAndTheOperatingPoint() {
        MagneticMaterial m = MagneticMaterial.linear("demo iron", 1000, Quantity.parse("1.5 T"));
        FigureData.Lines d = Adapt.bhData(m, Quantity.parse("1 T"));
        // B = μ0·μr·H (definition of relative permeability), μ0 = 4π·1e-7 H/m: H = 1 T / (μ0·1000) = 795.77 A/m
        Mark op = d.marks().get(1);
        assertEquals("operating point", op.label());
        assertEquals(795.775, op.x(), 1e-3);
        assertEquals(1.0, op.y(), 1e-12);
        Mark sat = d.marks().get(0);
        assertTrue(sat.isHorizontal());
        assertEquals(1.5, sat.y(), 0);
        Trace t = d.panels().get(0).traces().get(0);
        double[] h = t.xs(), b = t.ys();
        assertEquals(0, h[0]);
        // a linear material is drawn to 1.3 × the field at saturation: 1.3 · 1.5 / (μ0·1000) = 1551.8 A/m
        assertEquals(1551.76, h[h.length - 1], 0.01);
        assertEquals(1.95, b[b.length - 1], 1e-9);
        FigureData.Lines byField = Adapt.bhData(m, Quantity.parse("2 kA/m"));
        assertEquals(2000 * 4e-7 * Math.PI * 1000, byField.marks().get(1).y(), 1e-12);
        double[] hf = byField.panels().get(0).traces().get(0).xs();
        assertTrue(hf[hf.length - 1] >= 2500 - 1e-9, "the curve reaches past the point");
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> Adapt.bhData(m, Quantity.parse("3 A")));
        assertTrue(e.getMessage().contains("flux density (T) or a field strength (A/m), got 3.000 A"), e.getMessage());
    }

    @Test
    void sweepColumnsShareAPanelPerDimension() {
        FakeTable t = new FakeTable()
                .with("turns", Dimension.NONE, 100, 200, 300, 400)
                .with("inductance", Dimension.INDUCTANCE, 1e-3, 4e-3, Double.NaN, 16e-3)
                .with("resistance", Dimension.RESISTANCE, 1, 2, 3, 4)
                .with("hot resistance", Dimension.RESISTANCE, 1.2, 2.4, 3.6, 4.8);
        FigureData.Lines d = Adapt.tableData(t, "turns", List.of());
        assertEquals(List.of("inductance", "resistance"), d.panels().stream().map(Panel::quantity).toList());
        assertEquals(2, d.panels().get(1).traces().size());
        assertTrue(Double.isNaN(d.panels().get(0).traces().get(0).ys()[2]), "a failed row stays a gap");
        assertEquals("turns", d.xQuantity());
        FigureData.Lines one = Adapt.tableData(t, "turns", List.of("inductance"));
        assertEquals(1, one.panels().size());
        org.jfree.chart.plot.CombinedDomainXYPlot plot = (org.jfree.chart.plot.CombinedDomainXYPlot) Build.chart(one).getXYPlot();
        assertEquals("inductance (mH)", plot.getSubplots().get(0).getRangeAxis().getLabel(), "16 mH at most");
    }

    @Test
    void transientMarkersBecomeMarks() {
        FigureData.Lines d = Adapt.transientData(new RlRun(101));
        assertEquals(2, d.marks().size());
        Mark tau = d.marks().get(0);
        assertTrue(tau.isVertical());
        assertEquals(0.1 / 24, tau.x(), 1e-15, "τ = L/R");
        Mark peak = d.marks().get(1);
        assertTrue(peak.isPoint());
        assertEquals("switch voltage", peak.trace());
        assertEquals(List.of("current", "voltage", "energy"), d.panels().stream().map(Panel::quantity).toList());
    }

    @Test
    void overlayTellsLikeRunsApartByNumber() {
        FigureData.Lines d = Adapt.overlay("current", List.of(new RlRun(101), new RlRun(101, 0.5)));
        assertEquals(List.of("run 1", "run 2"), d.panels().get(0).traces().stream().map(Trace::name).toList());
        FigureData.Lines v = Adapt.overlay("switch voltage", List.of(new RlRun(101)));
        assertEquals(Dimension.VOLTAGE, v.panels().get(0).dimension());
    }

    @Test
    void anUnreachableDisplayIsToldApart() {
        // nothing listens on display 977 (no socket file, no abstract socket, TCP port 6977 closed)
        assertFalse(Display.reachable(":977"));
        assertFalse(Display.reachable("unix:977.0"));
        assertTrue(Display.reachable("no-colon"), "an unknown form is left to the window system");
    }
}
