package org.ampturn.chart;

import static org.ampturn.Ampturn.*;
import static org.junit.jupiter.api.Assertions.*;

import java.awt.Color;
import java.awt.Paint;
import java.awt.Stroke;
import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.stream.Stream;
import org.ampturn.actuator.Plunger;
import org.ampturn.coil.Coil;
import org.ampturn.drive.Clamp;
import org.ampturn.drive.Drive;
import org.ampturn.drive.Transient;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.annotations.XYAnnotation;
import org.jfree.chart.annotations.XYPointerAnnotation;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYItemRenderer;
import org.jfree.chart.title.TextTitle;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** What a figure shows and the files it leaves: titles, curve styles, energy scales, marker labels, stable SVG, one file per save. */
class ChartOutputTest {
    @TempDir Path dir;
    private final ByteArrayOutputStream printed = new ByteArrayOutputStream();

    /** An invented demo actuator (lib-docs/plunger.md): pulls in, and drops out after switch-off. */
    static Transient plungerRun() {
        var p = Plunger.of(300, cm2(1), mm(2)).withParasiticGap(mm(0.5), cm2(1)).withMass(g(5))
                .withSpring(q("500 N/m"), N(2)).withResistance(ohm(5));
        return Drive.dc(V(12)).into(p).offAt(ms(15), Clamp.zener(V(24))).simulate(ms(40));
    }

    static Transient rl(double volts) {
        return Drive.dc(V(volts)).into(Coil.lumped(mH(80), ohm(18))).offAt(ms(25), Clamp.diode()).simulate(ms(45));
    }

    @BeforeEach
    void setUp() {
        Figures.clear();
        Figures.useDirectory(dir.resolve("auto"));
        Figures.printTo(new PrintStream(printed, true, StandardCharsets.UTF_8));
        Figures.useFormats("png");
        Figures.useNumbering(null);
    }

    @AfterEach
    void tearDown() {
        Figures.flush();
        Figures.clear();
        Figures.useDirectory(Path.of(""));
        Figures.printTo(null);
    }

    private static List<XYPlot> subplots(JFreeChart c) {
        List<XYPlot> out = new ArrayList<>();
        for (Object o : ((CombinedDomainXYPlot) c.getXYPlot()).getSubplots()) out.add((XYPlot) o);
        return out;
    }

    @Test
    void aLongTitleWrapsWholeInsteadOfBeingCut() {
        Transient run = plungerRun();
        FigureData.Lines d = Typed.of(run);
        assertTrue(d.title().endsWith(run.circuit()), "the whole circuit is in the title: " + d.title());
        assertFalse(d.title().contains("…"), d.title());
        JFreeChart c = Build.chart(d);
        TextTitle t = c.getTitle();
        assertEquals(d.title(), t.getText());
        assertEquals(Build.TITLE_LINES, t.getMaximumLinesToDisplay());
        // drawn narrow, the title wraps: no title ink within 8 px of the right edge, and ink on a second line
        BufferedImage img = Render.image(c, 640, 700);
        int inkRight = 0, lines = 0;
        boolean inLine = false;
        for (int y = 0; y < 90; y++) {
            boolean any = false;
            for (int x = 0; x < img.getWidth(); x++) {
                if (Pixels.near(img.getRGB(x, y), Style.INK, 60)) {
                    any = true;
                    inkRight = Math.max(inkRight, x);
                }
            }
            if (any && !inLine) lines++;
            inLine = any;
        }
        assertTrue(inkRight < img.getWidth() - 8, "title ink reaches column " + inkRight);
        assertTrue(lines >= 2, "the title wraps onto " + lines + " lines");
    }

    @Test
    void noTwoCurvesOfAFigureShareColourAndLine() {
        List<JFreeChart> charts = new ArrayList<>();
        charts.add(Build.chart(Typed.of(plungerRun())));
        Object[] runs = new Object[20];
        for (int i = 0; i < runs.length; i++) runs[i] = rl(10 + i);
        charts.add(Build.chart(Adapt.overlay("current", List.of(runs))));
        for (JFreeChart c : charts) {
            Set<String> seen = new HashSet<>();
            int curves = 0;
            for (XYPlot p : subplots(c)) {
                XYItemRenderer r = p.getRenderer(0);
                for (int s = 0; s < p.getDataset(0).getSeriesCount(); s++) {
                    Paint paint = r.getSeriesPaint(s);
                    Stroke stroke = r.getSeriesStroke(s);
                    assertNotNull(paint);
                    assertNotNull(stroke);
                    String key = paint + " " + describe(stroke);
                    assertTrue(seen.add(key), "two curves drawn " + key);
                    curves++;
                }
            }
            assertTrue(curves >= 10, curves + " curves");
        }
        // the legend shows each curve's own line
        assertTrue(charts.get(1).getLegend().getSources()[0].getLegendItems().get(8).getLineStroke() instanceof java.awt.BasicStroke b
                && b.getDashArray() != null, "the ninth run's legend line is dashed");
    }

    private static String describe(Stroke s) {
        if (!(s instanceof java.awt.BasicStroke b)) return s.toString();
        return b.getLineWidth() + java.util.Arrays.toString(b.getDashArray());
    }

    @Test
    void energiesOfDifferentMagnitudeGetTheirOwnAxes() {
        Transient run = plungerRun();
        FigureData.Lines d = Typed.of(run);
        List<Panel> energy = d.panels().stream().filter(p -> p.quantity().equals("energy")).toList();
        assertTrue(energy.size() >= 2, "supplied (about 320 mJ) and mechanical (about 14 mJ) energy are drawn on separate axes");
        for (Panel p : energy) {
            double top = p.maxAbsY();
            for (Trace t : p.traces()) {
                assertTrue(t.maxAbsY() == 0 || t.maxAbsY() * Typed.ENERGY_SPREAD >= top, t.name() + " is flattened in its panel");
            }
        }
        Panel supplied = energy.stream().filter(p -> p.holds("supplied energy")).findFirst().orElseThrow();
        Panel mech = energy.stream().filter(p -> p.holds("mechanical energy")).findFirst().orElseThrow();
        assertNotSame(supplied, mech);
        // each panel its own unit: mJ for both here, but each scaled to its own largest curve
        JFreeChart c = Build.chart(d);
        List<XYPlot> plots = subplots(c);
        XYPlot sp = plots.get(d.panels().indexOf(supplied)), mp = plots.get(d.panels().indexOf(mech));
        assertTrue(sp.getRangeAxis().getUpperBound() > 10 * mp.getRangeAxis().getUpperBound(),
                sp.getRangeAxis().getUpperBound() + " vs " + mp.getRangeAxis().getUpperBound());
    }

    @Test
    void markerLabelsStateTheMetricsTheyShow() {
        Transient run = plungerRun();
        FigureData.Lines d = Typed.of(run);
        Mark drop = d.marks().stream().filter(m -> m.label().equals("drop-out")).findFirst().orElseThrow();
        Mark pull = d.marks().stream().filter(m -> m.label().equals("pull-in") && m.text() != null).findFirst().orElseThrow();
        // the convention: durations from the event that starts them, the mark at its time on the axis
        assertEquals("drop-out " + run.dropOutTime() + " after switch-off", drop.text());
        assertEquals("pull-in " + run.pullInTime() + " after switch-on", pull.text());
        assertEquals(15e-3 + run.dropOutTime().si(), drop.x(), 1e-12, "switch-off at 15 ms plus the drop-out time");
        assertEquals(run.pullInTime().si(), pull.x(), 1e-12, "switch-on is t = 0");
        List<String> drawn = new ArrayList<>();
        for (XYPlot p : subplots(Build.chart(d))) {
            for (XYAnnotation a : p.getAnnotations()) if (a instanceof XYPointerAnnotation pa) drawn.add(pa.getText());
        }
        assertTrue(drawn.contains(drop.text()) && drawn.contains(pull.text()), drawn.toString());
        assertTrue(drawn.contains("τ = " + run.timeConstant()), drawn.toString());
        assertTrue(drawn.stream().anyMatch(s -> s.startsWith("peak switch voltage " + run.peakSwitchVoltage() + " at ")), drawn.toString());
    }

    @Test
    void theSameFigureSavedTwiceGivesTheSameSvgBytes() throws IOException {
        Figure f = Figure.of("transient", Typed.of(rl(24)));
        Path a = dir.resolve("a.svg"), b = dir.resolve("b.svg");
        f.save(a.toString());
        Figure.of("other", Typed.of(plungerRun())).save(dir.resolve("between.svg").toString());
        f.save(b.toString());
        byte[] x = Files.readAllBytes(a), y = Files.readAllBytes(b);
        assertTrue(new String(x, StandardCharsets.UTF_8).contains("clipPath"), "the document has clip paths, whose ids must be stable");
        assertArrayEquals(x, y);
        // a different figure has other ids, so both can be inlined in one HTML report
        java.util.regex.Pattern id = java.util.regex.Pattern.compile("id='([^']+)'");
        Set<String> ids = new HashSet<>(), others = new HashSet<>();
        id.matcher(new String(x, StandardCharsets.UTF_8)).results().forEach(m -> ids.add(m.group(1)));
        id.matcher(Files.readString(dir.resolve("between.svg"))).results().forEach(m -> others.add(m.group(1)));
        assertFalse(ids.isEmpty() || others.isEmpty());
        ids.retainAll(others);
        assertEquals(Set.of(), ids, "ids shared by two different figures");
    }

    @Test
    void plotThenSaveWritesOnlyTheNamedFile() throws IOException {
        Path target = dir.resolve("f.png");
        Figure f = Plots.plot(rl(24)).save(target.toString());
        assertEquals("figure transient: 4 stacked panels, 8 curves, 16008 points → f.png", f.toString());
        List<Path> all;
        try (Stream<Path> s = Files.walk(dir)) {
            all = s.filter(Files::isRegularFile).toList();
        }
        assertEquals(List.of(target), all, "no numbered file besides f.png");
        assertEquals(List.of(target.toAbsolutePath()), Figures.written().stream().filter(p -> p.startsWith(dir)).toList());
        String out = printed.toString(StandardCharsets.UTF_8);
        assertTrue(out.contains("figure transient → " + target), out);
        // a plot without save still writes its numbered file, once the entry is over
        Plots.plot("again", rl(12));
        Figures.flush();
        assertTrue(Files.isRegularFile(dir.resolve("auto/02-again.png")));
    }

    @Test
    void figureFilesHaveTheUsersNormalPermissions() throws IOException {
        if (!dir.getFileSystem().supportedFileAttributeViews().contains("posix")) return;
        Path reference = dir.resolve("reference");
        try (OutputStream o = Files.newOutputStream(reference)) {
            o.write('x');
        }
        Path png = dir.resolve("p.png");
        Figure.of("transient", Typed.of(rl(24))).save(png.toString());
        assertEquals(Files.getPosixFilePermissions(reference), Files.getPosixFilePermissions(png));
    }

    @Test
    void windowsAreTitledAndClassedForTheDesktop() {
        assertEquals("transient — Ampturn", Windows.title(Figure.of("transient", Typed.of(rl(24)))));
        // the X11 toolkit names an application by the class at the bottom of the stack of the thread
        // that loads it, dots turned into dashes (OpenJDK sun.awt.X11.XToolkit, its constructor)
        assertEquals(AmpturnWindows.class.getName().replace('.', '-'), AmpturnWindows.FALLBACK_CLASS);
        assertEquals("Ampturn", AmpturnWindows.WINDOW_CLASS);
    }

    @Test
    void colourAndLineRoundsAreDistinct() {
        Set<String> seen = new HashSet<>();
        for (int i = 0; i < 100; i++) {
            Color c = Style.series(i);
            assertTrue(seen.add(c + describe(Style.line(i))), "curve " + i);
        }
    }
}
