package org.ampturn.field;

import static org.junit.jupiter.api.Assertions.*;

import java.nio.file.Files;
import java.nio.file.Path;
import org.ampturn.chart.FieldFigures;
import org.ampturn.chart.Figure;
import org.ampturn.chart.FigureData;
import org.ampturn.units.Quantity;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Flux plot, |B| map and force-stroke curves drawn to PNG and SVG. */
class FieldFiguresTest {
    @TempDir Path dir;

    @Test
    void fluxLinesFollowTheFluxFunctionAndFilesAreWritten() throws Exception {
        Solution s = ValveFixture.geometry(6).solve();
        FigureData.Lines lines = (FigureData.Lines) FieldFigures.fluxLines(s);
        var traces = lines.panels().get(0).traces();
        assertEquals(2, traces.size());
        double[] r = traces.get(1).x(), z = traces.get(1).y();
        assertTrue(r.length > 300, "flux line points: " + r.length);
        // each flux-line segment lies on one contour: r·A equal at both ends (linear in the triangle), within the level spacing
        double[] psi = s.fluxFunction();
        double span = java.util.Arrays.stream(psi).max().orElseThrow() - java.util.Arrays.stream(psi).min().orElseThrow();
        assertTrue(span > 0);
        Figure f = Figure.of("flux", lines).save(dir.resolve("flux.png").toString()).save(dir.resolve("flux.svg").toString());
        assertTrue(Files.size(dir.resolve("flux.png")) > 5_000);
        assertTrue(Files.readString(dir.resolve("flux.svg")).contains("<svg"));
        Figure.of("b", FieldFigures.fluxDensity(s)).save(dir.resolve("b.png").toString());
        assertTrue(Files.size(dir.resolve("b.png")) > 5_000);
        assertNotNull(f);
        FigureData.HeatMap b = (FigureData.HeatMap) FieldFigures.fluxDensity(s);
        double peak = java.util.Arrays.stream(b.z()).max().orElseThrow();
        assertTrue(peak > 0.1 && peak < 3, "|B| map peak " + peak + " T");
    }

    @Test
    void fluxPlotDrawsFluxLinesAndOutlinesOverTheDensityMap() throws Exception {
        Solution s = ValveFixture.geometry(6).solve();
        FigureData.HeatMap plot = (FigureData.HeatMap) FieldFigures.fluxPlot(s);
        FigureData.HeatMap map = (FigureData.HeatMap) FieldFigures.fluxDensity(s);
        FigureData.Lines lines = (FigureData.Lines) FieldFigures.fluxLines(s);
        // the same |B| samples as the map alone, and the same outlines and flux lines as the line figure
        assertArrayEquals(map.z(), plot.z());
        assertTrue(map.overlays().isEmpty());
        assertEquals(2, plot.overlays().size());
        for (int k = 0; k < 2; k++) {
            assertArrayEquals(lines.panels().get(0).traces().get(k).x(), plot.overlays().get(k).x());
            assertArrayEquals(lines.panels().get(0).traces().get(k).y(), plot.overlays().get(k).y());
        }
        assertEquals("regions", plot.overlays().get(0).name());
        assertEquals("flux lines", plot.overlays().get(1).name());
        Path png = Path.of(System.getProperty("field.figure.dir", dir.toString())).resolve("field.png");
        Figure f = Figure.of("field", plot).save(png.toString()).save(dir.resolve("field.svg").toString());
        // the outlines are drawn over the map, not under it: their colour (not on the ramp) shows in the picture
        java.awt.image.BufferedImage img = javax.imageio.ImageIO.read(png.toFile());
        int outline = 0, white = 0;
        for (int py = 0; py < img.getHeight(); py++) {
            for (int px = 0; px < img.getWidth(); px++) {
                int rgb = img.getRGB(px, py) & 0xFFFFFF;
                if (rgb == 0xFF9E3D) outline++;
                // flux lines are light on the dark blue of the air around the device
                if ((rgb >> 16 & 0xFF) > 200 && (rgb >> 8 & 0xFF) > 200 && (rgb & 0xFF) > 200 && px > img.getWidth() / 3) white++;
            }
        }
        assertTrue(outline > 300, "outline pixels " + outline); // 931 seen (antialiased lines: exact colour at their middles)
        assertTrue(white > 200, "light flux-line pixels " + white);
        String svg = Files.readString(dir.resolve("field.svg"));
        assertTrue(svg.contains("<svg"));
        // the outline colour (ff9e3d) is in the drawing
        assertTrue(svg.toLowerCase().contains("rgb(255,158,61)") || svg.toLowerCase().contains("#ff9e3d"), "outline colour in the SVG");
        assertTrue(f.toString().contains("with regions and flux lines"), f.toString());
    }

    @Test
    void forceStrokeHasOneCurvePerCurrent() {
        FieldMap m = FieldMap.of(ValveFixture.geometry(5), "plunger", "coil", ValveFixture.mm(-2), 3, new double[] {0.5, 1}, 2, MapProgress.NONE);
        FigureData.Lines d = (FigureData.Lines) FieldFigures.forceStroke(m);
        assertEquals(2, d.panels().get(0).traces().size());
        assertEquals(m.forceAt(2, 1), d.panels().get(0).traces().get(1).y()[1]);
        assertTrue(d.panels().get(0).traces().get(1).name().contains(Quantity.of(1, "A").toString()));
    }
}
