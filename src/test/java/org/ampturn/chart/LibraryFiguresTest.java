package org.ampturn.chart;

import static org.ampturn.Ampturn.*;
import static org.junit.jupiter.api.Assertions.*;

import java.awt.image.BufferedImage;
import java.util.List;
import java.util.Map;
import org.ampturn.coil.Coil;
import org.ampturn.drive.Clamp;
import org.ampturn.drive.Drive;
import org.ampturn.drive.Transient;
import org.ampturn.study.Axis;
import org.ampturn.study.MonteCarlo;
import org.ampturn.study.Outputs;
import org.ampturn.study.Table;
import org.ampturn.study.Varied;
import org.ampturn.units.Dimension;
import org.jfree.chart.axis.SymbolAxis;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.junit.jupiter.api.Test;

/** Figures of the library's own results: a drive transient, sweep tables and a tolerance run. */
class LibraryFiguresTest {
    /** 12 V into 50 mH, 10 Ω: τ = L/R = 5 ms, final current V/R = 1.2 A (first-order RL step, any circuit text). */
    private static Transient rl() {
        return Drive.dc(V(12)).into(Coil.lumped(mH(50), ohm(10))).offAt(ms(30), Clamp.diode()).simulate(ms(50));
    }

    @Test
    void transientPanelsAndKeyMarks() {
        FigureData.Lines d = Typed.of(rl());
        // the diode's clamp energy is far below the supplied energy: it gets an energy panel of its own
        assertEquals(List.of("current", "voltage", "energy", "energy"), d.panels().stream().map(Panel::quantity).toList());
        assertEquals(List.of("clamp energy"), d.panels().get(3).traces().stream().map(Trace::name).toList());
        assertEquals(List.of("coil voltage", "resistor voltage", "switch voltage"),
                d.panels().get(1).traces().stream().map(Trace::name).toList());
        assertTrue(d.panels().get(2).traces().stream().map(Trace::name).toList()
                .containsAll(List.of("stored energy", "dissipated energy", "supplied energy")));
        Mark tau = d.marks().stream().filter(m -> m.label().equals("τ")).findFirst().orElseThrow();
        assertEquals(0.005, tau.x(), 0.005 * 0.01, "τ = L/R = 5 ms");
        assertEquals(1.2 * (1 - Math.exp(-1)), tau.y(), 0.01, "the current at τ is 63.2 % of V/R");
        assertTrue(d.marks().stream().anyMatch(m -> m.label().equals("peak switch voltage") && "switch voltage".equals(m.trace())));
        CombinedDomainXYPlot p = (CombinedDomainXYPlot) Build.chart(d).getXYPlot();
        assertEquals("current (A)", ((org.jfree.chart.plot.XYPlot) p.getSubplots().get(0)).getRangeAxis().getLabel(), "1.2 A at most");
        assertEquals("time (ms)", p.getDomainAxis().getLabel());
        BufferedImage img = Render.image(Build.chart(d), 1000, 700);
        assertTrue(Pixels.count(img, Style.series(0), 30) > 500, "current drawn");
    }

    @Test
    void sweepsOfOneAndTwoParametersAndOfLabels() {
        Table t = sweep("turns", 100, 400, 4, n -> mH(0.01 * n * n / 100));
        FigureData.Lines one = Typed.lines(t, "turns", List.of());
        assertEquals(1, one.panels().size());
        assertEquals(4, one.panels().get(0).traces().get(0).size());

        Table grid = sweep(Axis.linear("turns", 100, 300, 3), Axis.of("gap", mm(0.2), mm(0.4)),
                (n, g) -> Map.of("L", H(1e-7 * n * n / g.si())));
        FigureData whole = Typed.of(grid);
        assertTrue(whole instanceof FigureData.HeatMap, "a two-parameter sweep is a map");
        FigureData.Lines split = Typed.lines(grid, "turns", List.of("L"));
        assertEquals(List.of("L, gap = 200.0 µm", "L, gap = 400.0 µm"),
                split.panels().get(0).traces().stream().map(Trace::name).toList());
        for (Trace tr : split.panels().get(0).traces()) {
            double[] x = tr.xs();
            assertArrayEquals(new double[] {100, 200, 300}, x, 0, "one curve per gap, in increasing turns");
        }

        Table wires = sweep("wire", List.of("AWG 24", "AWG 26", "AWG 28"), w -> ohm(w.length()));
        FigureData.Lines byWire = Typed.lines(wires, "wire", List.of());
        assertEquals(List.of("AWG 24", "AWG 26", "AWG 28"), byWire.xLabels());
        assertTrue(((CombinedDomainXYPlot) Build.chart(byWire).getXYPlot()).getDomainAxis() instanceof SymbolAxis);
    }

    @Test
    void toleranceHistogramCarriesTheLimit() {
        MonteCarlo mc = tolerance(p -> Outputs.of("y", p.get("a").times(2)))
                .vary(Varied.percent("a", V(10), 5).normal())
                .limit("y <= 20.5 V")
                .monteCarlo(2000, 3);
        FigureData.Histogram h = Typed.of(mc);
        assertEquals("y", h.quantity());
        assertEquals(Dimension.VOLTAGE, h.dimension());
        assertEquals(20.5, h.upper(), 1e-12);
        assertTrue(Double.isNaN(h.lower()));
        Bins b = Bins.of(h.raw(), h.lower(), h.upper());
        // y = 2a, a normal with σ = 0.5/3 V: y > 20.5 V is z > 1.5, 6.7 % one-sided (standard normal table)
        assertEquals(0.0668, b.outside() / 2000.0, 0.02);
        assertTrue(Build.chart(h).getXYPlot().getDomainMarkers(org.jfree.chart.ui.Layer.FOREGROUND).size() == 1, "the limit is drawn");
    }
}
