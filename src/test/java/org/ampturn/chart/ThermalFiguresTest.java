package org.ampturn.chart;

import static org.junit.jupiter.api.Assertions.*;

import java.nio.file.Files;
import java.nio.file.Path;
import org.ampturn.thermal.HeatingCurve;
import org.ampturn.thermal.ThermalNetwork;
import org.ampturn.units.Quantity;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The winding-temperature figure: °C over time, the class limit drawn, files written. */
class ThermalFiguresTest {
    private static Quantity q(String s) { return Quantity.parse(s); }

    @Test
    void windingTemperatureInCelsiusWithTheClassLimit(@TempDir Path dir) throws Exception {
        ThermalNetwork n = ThermalNetwork.twoBody(q("40 J/K"), q("3 K/W"), q("400 J/K"), q("12 K/W"));
        HeatingCurve c = n.heat(q("5 W"), q("3000 s"));
        FigureData.Lines d = (FigureData.Lines) Plots.dataOf(c);
        Panel p = d.panels().get(0);
        assertEquals("temperature (°C)", p.quantity());
        assertEquals(2, p.traces().size(), "winding and frame");
        double[] w = p.traces().get(0).y(), k = c.windingK();
        for (int i = 0; i < w.length; i++) assertEquals(k[i] - 273.15, w[i], 1e-9);
        Mark limit = d.marks().get(0);
        assertEquals(130, limit.y(), 1e-9, "class 130 (B) drawn at 130 °C");
        assertEquals(120, d.marks().get(1).y(), 1e-9, "winding limit: class less the 10 K allowance");
        Path png = dir.resolve("heat.png"), svg = dir.resolve("heat.svg");
        Figure.of("heating", d).save(png.toString());
        Figure.of("heating", d).save(svg.toString());
        assertTrue(Files.size(png) > 1000);
        assertTrue(Files.readString(svg).contains("130"), "the limit's label is in the SVG");
        // a duty cycle plots its climb to the cyclic steady state
        FigureData.Lines duty = (FigureData.Lines) Plots.dataOf(n.duty(q("20 W"), q("30 s"), q("120 s")));
        assertTrue(duty.title().contains("cycles"), duty.title());
    }
}
