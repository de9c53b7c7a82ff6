package org.ampturn.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javax.imageio.ImageIO;
import org.ampturn.worksheet.Block;
import org.ampturn.worksheet.Completeness;
import org.ampturn.worksheet.FakeEvaluator;
import org.ampturn.worksheet.Replay;
import org.ampturn.worksheet.Worksheet;
import org.ampturn.worksheet.WorksheetFiles;
import org.ampturn.worksheet.WorksheetFormat;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The report: self-contained, notes as prose, entries with results, charts inline, cautions, deferral. */
class HtmlReportTest {

    /** Runs and workspaces number and place charts for their worksheet: leave the chart layer as other tests expect it. */
    @org.junit.jupiter.api.AfterEach
    void resetCharts() {
        org.ampturn.chart.Figures.useNumbering(null);
        org.ampturn.chart.Figures.useDirectory(java.nio.file.Path.of(""));
    }
    @TempDir
    Path dir;

    static final String SVG = "<?xml version=\"1.0\"?>\n<svg xmlns=\"http://www.w3.org/2000/svg\" width=\"400\" height=\"120\" viewBox=\"0 0 400 120\">"
            + "<script>alert(1)</script><polyline fill=\"none\" stroke=\"#1f6f8b\" stroke-width=\"2\" points=\"0,110 40,70 80,45 120,30 160,20 200,15 240,12 280,11 320,110 360,112\"/>"
            + "<text x=\"8\" y=\"14\" font-size=\"12\">current (A) against time (ms)</text></svg>\n";

    Path sheet() throws Exception {
        Files.createDirectories(dir.resolve("gate.figures"));
        Files.writeString(dir.resolve("gate.figures/01-current.svg"), SVG);
        BufferedImage img = new BufferedImage(4, 3, BufferedImage.TYPE_INT_RGB);
        ImageIO.write(img, "png", dir.resolve("gate.figures/02-energy.png").toFile());
        String text = "// ampturn worksheet 1\n// title: Gate latch <coil> & drive\n// tool: ampturn 0.1.0\n\n"
                + "// The latch coil runs from 12 V.\n// Its switch opens at 20 ms.\n//\n// A second paragraph.\n"
                + "var L = mH(180);\n//= L = 180.0 mH\n"
                + "var I = A(4.2);\n//= I = 4.200 A\n"
                + "L.times(I.pow(2)).div(2)\n//= 1.588 J\n//= figure: gate.figures/01-current.svg\n"
                + "V(230)\n//= 230.0 V\n//= figure: gate.figures/02-energy.png\n"
                + "degC(118)\n//= 118.0 °C\n//= figure: gate.figures/missing.svg\n";
        Path f = dir.resolve("gate.atw");
        Files.writeString(f, text);
        return f;
    }

    @Test
    void reportIsSelfContainedAndComplete() throws Exception {
        Path f = sheet();
        Worksheet w = WorksheetFiles.read(f, Completeness.BRACKETS);
        String html = HtmlReport.render(w, f, null);
        assertTrue(html.startsWith("<!DOCTYPE html>\n<html lang=\"en\">"));
        assertTrue(html.contains("<title>Gate latch &lt;coil&gt; &amp; drive</title>"), "title escaped");
        assertTrue(html.contains("<h1>Gate latch &lt;coil&gt; &amp; drive</h1>"));
        assertTrue(html.contains("<dt>tool</dt><dd>ampturn 0.1.0</dd>"));
        // notes become paragraphs: consecutive lines join, an empty comment line ends one
        assertTrue(html.contains("<p class=\"note\">The latch coil runs from 12 V. Its switch opens at 20 ms.</p>\n<p class=\"note\">A second paragraph.</p>"), html);
        assertTrue(html.contains("<pre class=\"src\"><code>var L = mH(180);</code></pre>\n<pre class=\"out\">L = 180.0 mH</pre>"));
        assertTrue(html.contains("<pre class=\"out\">= 1.588 J</pre>"));
        // charts inline as data images: SVG too, so a browser runs none of its scripts
        assertTrue(html.contains("<figure class=\"chart\"><img alt=\"gate.figures/01-current.svg\" src=\"data:image/svg+xml;base64,"), html);
        assertTrue(html.contains("src=\"data:image/png;base64,iVBORw0KGgo"), "PNG signature in base64");
        assertTrue(html.contains("Figure gate.figures/missing.svg was not found next to the worksheet."));
        assertFalse(html.contains("<script"), "no script");
        assertFalse(html.contains("<?xml"));
        // nothing fetched from elsewhere
        Matcher ref = Pattern.compile("(?i)(src|href)\\s*=\\s*\"(?!data:|#)").matcher(html);
        assertFalse(ref.find(), "no external reference");
        assertFalse(html.contains("<link") || html.contains("@import") || html.contains("url("));
        assertTrue(html.contains("@page { size: A4;"));
        assertTrue(html.contains("on Java " + System.getProperty("java.version")));
        assertTrue(html.contains("defer to local codes and standards and to licensed professional practice"));
    }

    @Test
    void cautionsFollowWhatWasComputed() throws Exception {
        Path f = sheet();
        String html = HtmlReport.render(WorksheetFiles.read(f, Completeness.BRACKETS), f, null);
        assertTrue(html.contains("<h3>Voltage above 60 V</h3>"));
        assertTrue(html.contains("<h3>Mains-level voltage</h3>"));
        assertTrue(html.contains("<h3>Stored energy above 1 J</h3>"));
        assertTrue(html.contains("<h3>Hot surface</h3>"));
        assertTrue(html.contains("<h3>Above the class A insulation limit</h3>"));
        assertTrue(html.contains("Seen at line 13: 1.588 J."), html);
        assertTrue(html.contains("Seen at line 16: 230.0 V."), html);
    }

    @Test
    void lowValuesGiveNoCautionButStillTheDeferral() {
        List<Cautions.Caution> none = Cautions.scan(List.of(new Cautions.Seen(3, "V(12)", List.of("12.00 V", "9.400 mJ", "40.00 °C", "58.00 V"))));
        assertEquals(List.of(), none);
        String html = HtmlReport.render(Worksheet.titled("low").with(new Block.Entry("V(12)", List.of("12.00 V"), List.of())), null, null);
        assertTrue(html.contains("None of the common-practice caution thresholds"));
        assertTrue(html.contains(Cautions.DEFER));
    }

    @Test
    void freshResultsReplaceRecordedOnes() throws Exception {
        Path f = sheet();
        Worksheet w = WorksheetFiles.read(f, Completeness.BRACKETS);
        FakeEvaluator ev = new FakeEvaluator().answer("var L = mH(180);", "  L = 180.0 mH").answer("var I = A(4.2);", "  I = 4.200 A")
                .answer("L.times(I.pow(2)).div(2)", "  = 1.588 J").answer("V(230)", "  = 12.00 V");
        String html = HtmlReport.render(w, f, Replay.run(w, f, ev, p -> null, s -> {}));
        assertTrue(html.contains("<pre class=\"out\">= 12.00 V</pre>"));
        assertTrue(html.contains("<span class=\"err\">! cannot find symbol in degC(118)</span>"));
        assertTrue(html.contains("Some entries failed when the worksheet was run for this report (line 19)"), html);
        assertFalse(html.contains("<h3>Mains-level voltage</h3>"), "cautions follow the fresh values");
    }

    @Test
    void fixedSizeSvgGetsAViewBoxSoItScalesInsteadOfBeingCropped() {
        assertEquals("<svg xmlns='http://www.w3.org/2000/svg' viewBox=\"0 0 1200.0 800.0\" width=\"100%\"><g/></svg>",
                HtmlReport.scalable("<svg xmlns='http://www.w3.org/2000/svg' width='1200.0' height='800.0'><g/></svg>"));
        String withBox = "<svg viewBox=\"0 0 10 10\" width=\"10\"><g/></svg>";
        assertEquals(withBox, HtmlReport.scalable(withBox));
        // the test drawing above has a viewBox already and is kept as drawn
        assertTrue(HtmlReport.scalable(SVG).contains("width=\"400\" height=\"120\" viewBox=\"0 0 400 120\""));
    }

    /** Writes the sample report where a person (or a browser) can look at it: target/report-sample.html. */
    @Test
    void writesASampleForTheBrowserCheck() throws Exception {
        Path f = sheet();
        Path out = Path.of("target/report-sample.html").toAbsolutePath();
        HtmlReport.write(WorksheetFiles.read(f, Completeness.BRACKETS), f, null, out);
        assertTrue(Files.size(out) > 2000);
    }

    @Test
    void aHostileSvgNeverRunsAndOnlyTheFiguresFolderIsRead() throws Exception {
        Path f = sheet();
        Files.writeString(dir.resolve("gate.figures/03-evil.svg"), "<svg xmlns=\"http://www.w3.org/2000/svg\" onload=\"alert(1)\">"
                + "<foreignObject><body xmlns=\"http://www.w3.org/1999/xhtml\"><script>alert(2)</script></body></foreignObject></svg>");
        Files.writeString(dir.resolve("secret.svg"), "<svg xmlns=\"http://www.w3.org/2000/svg\"><text>private drawing</text></svg>");
        Path outside = Files.createTempFile("ampturn-outside-", ".svg");
        Files.writeString(outside, "<svg xmlns=\"http://www.w3.org/2000/svg\"><text>another folder</text></svg>");
        Files.createSymbolicLink(dir.resolve("gate.figures/04-link.svg"), dir.resolve("secret.svg"));
        try {
            String text = Files.readString(f) + "mm(1)\n//= 1.000 mm\n//= figure: gate.figures/03-evil.svg\n//= figure: gate.figures/../secret.svg\n"
                    + "//= figure: " + outside + "\n//= figure: gate.figures/04-link.svg\n";
            Files.writeString(f, text);
            String html = HtmlReport.render(WorksheetFiles.read(f, Completeness.BRACKETS), f, null);
            assertFalse(html.contains("onload") || html.contains("foreignObject") || html.contains("<svg") || html.contains("alert("),
                    "SVG markup never reaches the page");
            assertTrue(html.contains("<img alt=\"gate.figures/03-evil.svg\" src=\"data:image/svg+xml;base64,"), "embedded as an image only");
            assertTrue(html.contains("Figure secret.svg is outside the worksheet's figures folder, so it is not embedded."), html);
            assertTrue(html.contains("Figure " + outside + " is outside the worksheet's figures folder"), html);
            assertTrue(html.contains("Figure gate.figures/04-link.svg is outside the worksheet's figures folder"), "a link out is followed and refused");
            for (var m : Pattern.compile("base64,([A-Za-z0-9+/=]+)").matcher(html).results().toList()) {
                String decoded = new String(java.util.Base64.getDecoder().decode(m.group(1)), java.nio.charset.StandardCharsets.ISO_8859_1);
                assertFalse(decoded.contains("private drawing") || decoded.contains("another folder"), "no outside file was read into the report");
            }
        } finally {
            Files.deleteIfExists(outside);
        }
    }

    @Test
    void theReportCarriesWhatADesignFileNeedsAtTheTop() throws Exception {
        Path f = dir.resolve("choke.atw");
        Files.writeString(f, FakeEvaluator.SHEET.replace("// title: t\n", "// title: Choke energy\n// author: R. Ortiz\n// checker: M. Lind\n"
                + "// revision: C\n// date: 2026-11-30\n"));
        Worksheet w = WorksheetFiles.read(f, Completeness.BRACKETS);
        String recorded = HtmlReport.render(w, f, null);
        for (String s : List.of("<dt>author</dt><dd>R. Ortiz</dd>", "<dt>checker</dt><dd>M. Lind</dd>", "<dt>revision</dt><dd>C</dd>",
                "<dt>date</dt><dd>2026-11-30</dd>", "<dt>SHA-256</dt><dd><code>" + org.ampturn.worksheet.TrustStore.hash(Files.readAllBytes(f)),
                "<dt>made with</dt><dd>Ampturn " + org.ampturn.Ampturn.version(), "not verified: the results are as recorded",
                "<h3>Inputs</h3>\n<ul>\n<li><code>L = 4.700 mH</code></li>\n<li><code>I = 2.000 A</code></li>",
                "<h3>Results</h3>\n<ul>\n<li><code>L.times(I.pow(2)).div(2)  =  9.400 mJ</code></li>")) {
            assertTrue(recorded.contains(s), s + " in:\n" + recorded);
        }
        assertTrue(recorded.indexOf("id=\"summary\"") < recorded.indexOf("<main>"), "the summary comes before the entries");
        List<Replay.Step> steps = Replay.run(w, f, FakeEvaluator.truth(), p -> null, s -> {});
        assertTrue(HtmlReport.render(w, f, steps, List.of()).contains("<dd class=\"ok\">verified: computed afresh on"));
        List<Replay.Step> wrong = Replay.run(w, f, FakeEvaluator.truth().answer("L.times(I.pow(2)).div(2)", "  = 9.900 mJ"), p -> null, s -> {});
        String differs = HtmlReport.render(w, f, wrong, org.ampturn.worksheet.Verifier.compare(f, wrong));
        assertTrue(differs.contains("<dd class=\"notok\">NOT verified: computed afresh on"), differs);
        assertTrue(HtmlReport.render(Worksheet.titled("none"), null, null).contains("<dt>author</dt><dd>(not given in the header)</dd>"));
    }

    @Test
    void cautionsComeFromTheResultsThatRaisedThem() throws Exception {
        Path f = dir.resolve("typed.atw");
        // a text that reads like 300 V, and a quantity of 300 V; 60 V is the common-practice touch limit
        Files.writeString(f, "// ampturn worksheet 1\n\n\"300 V\"\n//= 300 V\nV(300).times(0.2)\n//= 60.00 V\n");
        try (org.ampturn.worksheet.ShellEvaluator shell = org.ampturn.worksheet.ShellEvaluator.start()) {
            Worksheet w = WorksheetFiles.read(f, shell.completeness());
            List<Replay.Step> steps = Replay.run(w, f, shell, p -> null, s -> {});
            assertTrue(steps.get(1).result().outcome().values().get(0) instanceof org.ampturn.units.Quantity, "the object itself is kept");
            String html = HtmlReport.render(w, f, steps, List.of());
            assertFalse(html.contains("<h3>Voltage above 60 V</h3>"),
                    "a string is not a voltage, and 300 V × 0.2 = 60 V is not above 60 V, whatever the text: " + html);
            String recorded = HtmlReport.render(w, f, null);
            assertTrue(recorded.contains("<h3>Voltage above 60 V</h3>"), "from records alone the text is all there is");
        }
    }
}
