package org.ampturn.chart;

import static org.junit.jupiter.api.Assertions.*;

import java.awt.GraphicsEnvironment;
import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import javax.imageio.ImageIO;
import org.ampturn.units.Dimension;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Without a display a figure goes to a file next to the worksheet, with its path and a preview printed. */
class FiguresTest {
    @TempDir Path dir;
    private final ByteArrayOutputStream printed = new ByteArrayOutputStream();

    @BeforeEach
    void setUp() {
        Figures.clear();
        Figures.useDirectory(dir.resolve("gate-latch.figures"));
        Figures.printTo(new PrintStream(printed, true, StandardCharsets.UTF_8));
        Figures.useFormats("png");
    }

    @AfterEach
    void tearDown() {
        Figures.clear();
        Figures.useDirectory(Path.of(""));
        Figures.useNumbering(null);
        Figures.printTo(null);
        Figures.useFormats("png");
    }

    private String out() {
        return printed.toString(StandardCharsets.UTF_8);
    }

    @Test
    void headlessPlotWritesTheFileAndPrintsPathAndPreview() throws Exception {
        assertTrue(GraphicsEnvironment.isHeadless(), "the tests run headless (surefire argLine)");
        Figures.useNumbering(() -> 3);
        Figure f = Plots.plot(new RlRun(20_001));
        Figures.flush(); // the session does this when the entry ends
        Path png = dir.resolve("gate-latch.figures/03-transient.png");
        assertTrue(Files.isRegularFile(png), "figure file " + png);
        assertEquals(Figure.DEFAULT_WIDTH, ImageIO.read(png.toFile()).getWidth());
        String[] lines = out().strip().split("\n");
        assertEquals(2, lines.length, out());
        assertTrue(lines[0].contains(png.toString()), lines[0]);
        // current 0 → 495.9 mA (12/24·(1 − e^(−20/4.167))) and back to 0: it reaches the top block
        // mid-way and ends on the lowest one
        assertTrue(lines[1].startsWith("  current "), lines[1]);
        String spark = lines[1].substring("  current ".length(), "  current ".length() + Preview.WIDTH);
        assertEquals('█', spark.charAt(Preview.WIDTH / 2 - 1), spark);
        assertEquals('▁', spark.charAt(Preview.WIDTH - 1), spark);
        assertTrue(lines[1].contains("0.000 A … 495.9 mA"), lines[1]);
        assertEquals(List.of(png), f.files());
        assertTrue(f.toString().startsWith("figure transient: 3 stacked panels, 7 curves"), f.toString());
    }

    @Test
    void figuresAreListedWithTheirFiles() {
        Figures.useFormats("png", "svg");
        Plots.plot("current", new RlRun(2001));
        Plots.plot(new FakeTable().with("turns", Dimension.NONE, 100, 200, 300)
                .with("inductance", Dimension.INDUCTANCE, 1e-3, 4e-3, 9e-3), "turns");
        List<Figure> made = Figures.made();
        assertEquals(2, made.size());
        assertEquals(2, made.get(0).files().size(), "png and svg");
        String listing = Figures.listing();
        assertTrue(listing.contains("current: 3 stacked panels") && listing.contains("01-current.png") && listing.contains("01-current.svg"), listing);
        assertTrue(listing.contains("sweep: 1 panel, 1 curve, 3 points") && listing.contains("02-sweep.png"), listing);
        assertEquals("current", Figures.named("current").orElseThrow().name());
    }

    @Test
    void silencedFiguresPrintNothing() {
        Figures.silence();
        Plots.plot(new double[] {1, 2, 3});
        Figures.flush();
        assertEquals("", out());
        assertTrue(Files.isRegularFile(dir.resolve("gate-latch.figures/01-values.png")));
    }

    @Test
    void slugsAreSafeFileNames() {
        assertEquals("b-h", Figures.slug("B-H"));
        assertEquals("switch-voltage-2", Figures.slug("  switch voltage / 2 "));
        assertEquals("figure", Figures.slug("τ"));
    }

    @Test
    void plotRefusesWhatItCannotDraw() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> Plots.plot("a word"));
        assertTrue(e.getMessage().contains("cannot plot a String"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> Plots.overlay("flux", new RlRun(11)));
        assertTrue(e.getMessage().contains("no signal \"flux\"") && e.getMessage().contains("switch voltage"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> Plots.plot(new FakeTable().with("a", Dimension.NONE, 1), "b"));
        assertTrue(e.getMessage().contains("no column \"b\"") && e.getMessage().contains("a"), e.getMessage());
    }

    @Test
    void theFacadeDrawsEachKindToAFile() {
        var run = org.ampturn.drive.Drive.dc(org.ampturn.Ampturn.V(12))
                .into(org.ampturn.coil.Coil.lumped(org.ampturn.Ampturn.mH(50), org.ampturn.Ampturn.ohm(10)))
                .offAt(org.ampturn.Ampturn.ms(20), org.ampturn.drive.Clamp.diode()).simulate(org.ampturn.Ampturn.ms(40));
        org.ampturn.Ampturn.plot(run);
        org.ampturn.Ampturn.plot("second", run);
        org.ampturn.Ampturn.overlay(run, run);
        var t = org.ampturn.Ampturn.sweep("turns", 100, 400, 4, n -> org.ampturn.Ampturn.mH(n / 1e3));
        org.ampturn.Ampturn.plot(t, "turns");
        org.ampturn.Ampturn.plotBH(org.ampturn.material.MagneticMaterial.linear("demo", 1000, org.ampturn.Ampturn.T(1.5)),
                org.ampturn.Ampturn.T(1));
        List<String> names = Figures.made().stream().map(Figure::name).toList();
        assertEquals(List.of("transient", "second", "overlay", "sweep", "B-H"), names);
        for (Figure f : Figures.made()) {
            assertEquals(1, f.files().size(), f.toString());
            assertTrue(Files.isRegularFile(f.files().get(0)), f.toString());
        }
        assertTrue(org.ampturn.Ampturn.figures().contains("05-b-h.png"), org.ampturn.Ampturn.figures());
    }
}
