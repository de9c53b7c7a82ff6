package org.ampturn.chart;

import static org.junit.jupiter.api.Assertions.*;

import java.awt.Color;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import javax.imageio.ImageIO;
import javax.xml.parsers.DocumentBuilderFactory;
import org.ampturn.units.Dimension;
import org.jfree.chart.ChartRenderingInfo;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.XYPlot;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Document;

/**
 * Renders figures off-screen and finds the drawn curves by colour. The expected pixel positions
 * come from the axis margins this package sets (x: none; y: 4 % below, 6 % above the data), so a
 * curve drawn in the wrong place, scaled by the wrong prefix or not drawn at all fails.
 */
class RenderTest {
    @TempDir Path dir;

    private static final Color FIRST = Style.series(0);

    private static FigureData.Lines single(double[] x, double[] y) {
        return new FigureData.Lines("", "time", Dimension.TIME,
                List.of(Panel.of("current", Dimension.CURRENT, Trace.of("current", x, y))), List.of());
    }

    /** y = 0 A before 5 s, 1 A from 5 s on. */
    private static FigureData.Lines step(int n) {
        double[] x = new double[n], y = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = 10.0 * i / (n - 1);
            y[i] = x[i] < 5 ? 0 : 1;
        }
        return single(x, y);
    }

    private static Rectangle2D area(ChartRenderingInfo info) {
        return info.getPlotInfo().getSubplotInfo(0).getDataArea();
    }

    /** Row of value v on an axis spanning [lo − 4 % span, hi + 6 % span]. */
    private static double rowOf(Rectangle2D a, double v, double lo, double hi) {
        double span = hi - lo, top = hi + 0.06 * span, bottom = lo - 0.04 * span;
        return a.getMinY() + (top - v) / (top - bottom) * a.getHeight();
    }

    @Test
    void stepLandsMidAxisWithItsLevelsAtTheRightRows() {
        for (int n : new int[] {1001, 100_001}) { // point by point, then by pixel column
            ChartRenderingInfo info = new ChartRenderingInfo();
            BufferedImage img = Render.image(Build.chart(step(n)), 800, 500, info);
            Rectangle2D a = area(info);
            // x axis 0..10 s without margins: the step at 5 s is at the middle column
            int stepColumn = -1;
            int bestSpan = 0;
            for (int x = (int) a.getMinX() + 2; x < a.getMaxX() - 2; x++) {
                int[] rows = Pixels.rowsIn(img, a, x, FIRST);
                int span = rows.length == 0 ? 0 : rows[rows.length - 1] - rows[0];
                if (span > bestSpan) { bestSpan = span; stepColumn = x; }
            }
            assertEquals(a.getCenterX(), stepColumn, 2.5, "step column, n = " + n);
            double low = Pixels.meanRow(img, a, (int) (a.getMinX() + a.getWidth() * 0.25), FIRST);
            double high = Pixels.meanRow(img, a, (int) (a.getMinX() + a.getWidth() * 0.75), FIRST);
            assertEquals(rowOf(a, 0, 0, 1), low, 2.0, "0 A level, n = " + n);
            assertEquals(rowOf(a, 1, 0, 1), high, 2.0, "1 A level, n = " + n);
        }
    }

    @Test
    void rampEndsAtTheCornersOfItsRange() {
        int n = 100_001;
        double[] x = new double[n], y = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = 0.040 * i / (n - 1);          // 0..40 ms
            y[i] = 0.002 + 0.010 * i / (n - 1);  // 2..12 mA
        }
        ChartRenderingInfo info = new ChartRenderingInfo();
        BufferedImage img = Render.image(Build.chart(single(x, y)), 1000, 600, info);
        Rectangle2D a = area(info);
        double first = Pixels.meanRow(img, a, (int) a.getMinX() + 1, FIRST);
        double last = Pixels.meanRow(img, a, (int) a.getMaxX() - 2, FIRST);
        assertEquals(rowOf(a, 2, 2, 12), first, 2.5, "ramp start (2 mA)");
        assertEquals(rowOf(a, 12, 2, 12), last, 2.5, "ramp end (12 mA)");
    }

    @Test
    void transientHasThreePanelsInEngineeringUnits() {
        JFreeChart c = Build.chart(Adapt.transientData(new RlRun(5001)));
        CombinedDomainXYPlot p = (CombinedDomainXYPlot) c.getXYPlot();
        assertEquals("time (ms)", p.getDomainAxis().getLabel());
        List<XYPlot> subs = p.getSubplots();
        assertEquals(List.of("current (mA)", "voltage (V)", "energy (mJ)"),
                subs.stream().map(s -> s.getRangeAxis().getLabel()).toList());
        assertEquals(1, subs.get(0).getDataset().getSeriesCount());
        assertEquals(3, subs.get(1).getDataset().getSeriesCount());
        assertEquals(3, subs.get(2).getDataset().getSeriesCount());
        // peak current 495.9 mA (12/24·(1 − e^(−20/4.1667))) is on the axis in mA, so the axis tops out near 500, not 0.5
        ValueAxis y = subs.get(0).getRangeAxis();
        assertTrue(y.getUpperBound() > 490 && y.getUpperBound() < 540, "current axis top " + y.getUpperBound());
        // τ runs through every panel; the switch-voltage peak sits on the voltage panel
        for (XYPlot s : subs) assertEquals(1, s.getDomainMarkers(org.jfree.chart.ui.Layer.FOREGROUND).size());
        assertEquals(1, subs.get(1).getAnnotations().stream().filter(x -> x instanceof org.jfree.chart.annotations.XYPointerAnnotation).count());
    }

    @Test
    void pngHasTheStatedSizeAndIsNotBlank() throws Exception {
        Figure f = Figure.of("transient", Adapt.transientData(new RlRun(100_001)));
        Path png = dir.resolve("t.png");
        f.save(png.toString(), 1600, 1000);
        BufferedImage img = ImageIO.read(png.toFile());
        assertEquals(1600, img.getWidth());
        assertEquals(1000, img.getHeight());
        assertTrue(Pixels.distinctColours(img) > 50, "a drawn chart has many colours");
        assertTrue(Pixels.count(img, FIRST, 30) > 1000, "the current curve is drawn");
        assertTrue(Pixels.count(img, Style.series(3), 30) > 300, "the switch voltage curve is drawn");
        assertEquals(List.of(png), f.files());
    }

    @Test
    void svgIsAValidDocumentOfSaneSize() throws Exception {
        Figure f = Figure.of("transient", Adapt.transientData(new RlRun(100_001)));
        Path svg = dir.resolve("t.svg");
        f.save(svg.toString(), 1600, 1000);
        long size = Files.size(svg);
        // 7 curves of 100,001 points: drawn per pixel column, not per point (TECH-NOTES §6: 30 MB otherwise)
        assertTrue(size > 20_000 && size < 2_000_000, "SVG size " + size);
        DocumentBuilderFactory f2 = DocumentBuilderFactory.newInstance();
        f2.setNamespaceAware(true);
        f2.setFeature("http://apache.org/xml/features/nonvalidating/load-external-dtd", false);
        Document doc = f2.newDocumentBuilder().parse(svg.toFile());
        assertEquals("svg", doc.getDocumentElement().getLocalName());
        assertEquals("http://www.w3.org/2000/svg", doc.getDocumentElement().getNamespaceURI());
        assertEquals(1600, Double.parseDouble(doc.getDocumentElement().getAttribute("width")));
        assertEquals(1000, Double.parseDouble(doc.getDocumentElement().getAttribute("height")));
        String text = Files.readString(svg);
        // horizontal text stays text (the rotated axis labels come out as outlines)
        assertTrue(text.contains(">time (ms)<") && text.contains(">switch voltage<") && text.contains(">supplied energy<"));
    }

    @Test
    void heatMapColoursRunFromTheDarkEndToThePaleEnd() {
        // z = x on a 5 × 4 grid: the left column of cells is the ramp's dark end, the right column its pale end
        int nx = 5, ny = 4;
        double[] x = new double[nx * ny], y = new double[nx * ny], z = new double[nx * ny];
        for (int i = 0; i < nx; i++) for (int j = 0; j < ny; j++) {
            int k = i * ny + j;
            x[k] = 100 + 100 * i;       // turns
            y[k] = 0.0001 * (j + 1);    // gap 0.1..0.4 mm
            z[k] = 0.5 * i;             // force 0..2 N
        }
        FigureData.HeatMap m = new FigureData.HeatMap("", "turns", Dimension.NONE, x, "gap", Dimension.LENGTH, y,
                "force", Dimension.FORCE, z);
        ChartRenderingInfo info = new ChartRenderingInfo();
        BufferedImage img = Render.image(Build.chart(m), 900, 600, info);
        Rectangle2D a = info.getPlotInfo().getDataArea();
        int midY = (int) a.getCenterY();
        assertTrue(Pixels.near(img.getRGB((int) a.getMinX() + 5, midY), (Color) Style.ramp(0), 6), "left cells dark");
        assertTrue(Pixels.near(img.getRGB((int) a.getMaxX() - 5, midY), (Color) Style.ramp(1), 6), "right cells pale");
        assertTrue(Pixels.near(img.getRGB((int) a.getCenterX(), midY), (Color) Style.ramp(0.5), 6), "middle cells mid-ramp");
        // 0.1..0.4 mm: the largest unit in which the largest value is at least 1 is µm (400 µm)
        assertEquals("gap (µm)", ((XYPlot) Build.chart(m).getPlot()).getRangeAxis().getLabel());
    }

    @Test
    void badFileNamesAndSizesAreRefusedWithTheValue() {
        Figure f = Figure.of("t", step(11));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> f.save(dir.resolve("a.jpg").toString()));
        assertTrue(e.getMessage().contains(".png or .svg"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> f.save(dir.resolve("a.png").toString(), 10, 500));
        assertTrue(e.getMessage().contains("between 100 and") && e.getMessage().contains("10"), e.getMessage());
    }

    @Test
    void aFlatCurveGetsAReadableAxis() {
        FigureData.Lines flat = single(new double[] {0, 1, 2, 3}, new double[] {9, 9, 9, 9});
        JFreeChart c = Build.chart(flat);
        ValueAxis y = ((CombinedDomainXYPlot) c.getXYPlot()).getSubplots().get(0).getRangeAxis();
        Render.image(c, 600, 400); // ranges settle when drawn
        assertTrue(y.getRange().getLength() >= 0.9 - 1e-9, "span " + y.getRange());
        assertTrue(y.getRange().contains(9));
    }
}
