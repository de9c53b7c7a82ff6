package org.ampturn.console;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.ampturn.worksheet.FakeEvaluator;
import org.ampturn.worksheet.TrustStore;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** ampturn run / verify / export: output, exit codes, trust refusal and --trust. */
class WorksheetCliTest {

    /** Runs and workspaces number and place charts for their worksheet: leave the chart layer as other tests expect it. */
    @org.junit.jupiter.api.AfterEach
    void resetCharts() {
        org.ampturn.chart.Figures.useNumbering(null);
        org.ampturn.chart.Figures.useDirectory(java.nio.file.Path.of(""));
    }
    @TempDir
    Path dir;

    final ByteArrayOutputStream out = new ByteArrayOutputStream(), err = new ByteArrayOutputStream();

    WorksheetCli cli(String stdin) {
        return WorksheetCli.of(FakeEvaluator::truth, TrustStore.of(dir.resolve("home/trusted"), null),
                new ByteArrayInputStream(stdin.getBytes(StandardCharsets.UTF_8)),
                new PrintStream(out, true, StandardCharsets.UTF_8), new PrintStream(err, true, StandardCharsets.UTF_8));
    }

    String out() {
        return out.toString(StandardCharsets.UTF_8);
    }

    Path sheet(String name, String text, boolean trusted) throws Exception {
        Path f = dir.resolve(name);
        Files.writeString(f, text);
        if (trusted) TrustStore.of(dir.resolve("home/trusted"), null).trust(f, Files.readAllBytes(f));
        return f;
    }

    @Test
    void verifyPassesAndFails() throws Exception {
        Path good = sheet("good.atw", FakeEvaluator.SHEET, true);
        Path bad = sheet("bad.atw", FakeEvaluator.SHEET.replace("9.400 mJ", "9.500 mJ"), true);
        assertEquals(0, cli("").verb("verify", List.of(good.toString())));
        assertEquals(good + ": 3 entries, all results hold\n", out());
        out.reset();
        assertEquals(1, cli("").verb("verify", List.of(good.toString(), bad.toString())));
        assertTrue(out().contains(bad + ":8: 9.4000 mJ is not 9.500 mJ to the digits shown\n  entry:    L.times(I.pow(2)).div(2)\n"
                + "  recorded: 9.500 mJ\n  new:      9.4000 mJ\n"), out());
        assertTrue(out().endsWith("verified 2 worksheets: 1 hold, 1 differ\n"), out());
    }

    @Test
    void untrustedIsRefusedUnlessTrustIsGiven() throws Exception {
        Path f = sheet("mailed.atw", FakeEvaluator.SHEET, false);
        assertEquals(3, cli("").verb("verify", List.of(f.toString())));
        assertTrue(out().startsWith(f + ": not run: this machine has not saved or trusted this worksheet"), out());
        out.reset();
        assertEquals(3, cli("").verb("run", List.of(f.toString())));
        assertTrue(out().contains("not run"), out());
        out.reset();
        assertEquals(0, cli("").verb("verify", List.of("--trust", f.toString())));
        assertEquals(f + ": 3 entries, all results hold\n", out());
        out.reset();
        assertEquals(3, cli("").verb("verify", List.of(f.toString())), "--trust is for that run only");
    }

    @Test
    void runPrintsEntriesAndResults() throws Exception {
        Path f = sheet("good.atw", FakeEvaluator.SHEET, true);
        assertEquals(0, cli("").verb("run", List.of(f.toString())));
        assertEquals("var L = mH(4.7);\n  L = 4.700 mH\nvar I = A(2);\n  I = 2.000 A\nL.times(I.pow(2)).div(2)\n  = 9.4000 mJ\n", out());
    }

    @Test
    void runFromStandardInputCountsAsTyped() {
        assertEquals(4, cli("var L = mH(4.7);\nnope\n").verb("run", List.of("-")), "an entry failed: exit 4");
        assertEquals("var L = mH(4.7);\n  L = 4.700 mH\nnope\n  ! cannot find symbol in nope\n", out());
    }

    @Test
    void exportWritesTheReport() throws Exception {
        Path f = sheet("good.atw", FakeEvaluator.SHEET.replace("// title: t", "// title: Choke energy"), true);
        Path html = dir.resolve("good.html");
        assertEquals(0, cli("").verb("export", List.of(f.toString(), "--html", html.toString())));
        assertEquals("matches  good.atw:4  var L = mH(4.7);\nmatches  good.atw:6  var I = A(2);\nmatches  good.atw:8  L.times(I.pow(2)).div(2)\n"
                + "wrote " + html + "; every result matches its record\n", out());
        String text = Files.readString(html);
        assertTrue(text.contains("<h1>Choke energy</h1>") && text.contains("= 9.4000 mJ"));
    }

    @Test
    void badUsageAndUnreadableFilesExitTwo() throws Exception {
        assertEquals(2, cli("").verb("export", List.of("x.atw")));
        assertTrue(err.toString(StandardCharsets.UTF_8).contains("usage: ampturn run"));
        Path notes = sheet("notes.atw", "shopping list\n", false);
        assertEquals(2, cli("").verb("verify", List.of(notes.toString())));
        assertTrue(err.toString(StandardCharsets.UTF_8).contains("ampturn: " + notes + ": not an Ampturn worksheet"), err.toString());
        org.junit.jupiter.api.Assertions.assertThrows(IllegalArgumentException.class, () -> cli("").verb("plot", List.of()));
    }

    @Test
    void aFailedEntryIsKeptAsARecordAndNeverRunAgain() throws Exception {
        Path f = sheet("runaway.atw", FakeEvaluator.SHEET + "//! while (true) {}\n//= ! interrupted\n", true);
        FakeEvaluator ev = FakeEvaluator.truth();
        WorksheetCli c = WorksheetCli.of(() -> ev, TrustStore.of(dir.resolve("home/trusted"), null), new ByteArrayInputStream(new byte[0]),
                new PrintStream(out, true, StandardCharsets.UTF_8), new PrintStream(err, true, StandardCharsets.UTF_8));
        assertEquals(0, c.verb("verify", List.of(f.toString())));
        assertEquals(f + ": 3 entries, all results hold (1 failed entry is kept as a record and not run)\n", out());
        assertTrue(!ev.ran.contains("while (true) {}"), ev.ran.toString());
    }

    @Test
    void anEntryOverItsLimitIsStoppedAndNothingAfterItRuns() throws Exception {
        Path f = sheet("slow.atw", FakeEvaluator.SHEET.replace("var I = A(2);", "spin()\nvar I = A(2);"), true);
        FakeEvaluator ev = FakeEvaluator.truth().runsAway("spin()");
        WorksheetCli c = WorksheetCli.of(() -> ev, TrustStore.of(dir.resolve("home/trusted"), null), new ByteArrayInputStream(new byte[0]),
                new PrintStream(out, true, StandardCharsets.UTF_8), new PrintStream(err, true, StandardCharsets.UTF_8));
        assertEquals(4, c.verb("verify", List.of("--entry-limit", "200ms", f.toString())));
        assertTrue(out().contains(f + ":6: the entry failed\n  entry:    spin()\n  recorded: (nothing)\n"
                + "  new:      ! over the entry limit of 200 ms: stopped (--entry-limit sets the limit)\n"), out());
        assertTrue(out().contains(f + ":6: stopped; the entries after it were not run"), out());
        assertEquals(List.of("var L = mH(4.7);", "spin()"), ev.ran, "the replay stopped at the entry over its limit");
        assertEquals(2, cli("").verb("verify", List.of("--entry-limit", "soon", f.toString())));
        assertTrue(err.toString(StandardCharsets.UTF_8).contains("--entry-limit takes a duration such as 30s, 5m or 1h, got \"soon\""));
    }

    @Test
    void trustReachesOnlyTheFilesNamed() throws Exception {
        sheet("valve.atw", "// ampturn worksheet 1\n\nvar L = mH(4.7);\n//= L = 4.700 mH\n", false);
        Path top = sheet("top.atw", "// ampturn worksheet 1\n\n#use valve.atw\nvar I = A(2);\n//= I = 2.000 A\n", false);
        FakeEvaluator ev = FakeEvaluator.truth();
        WorksheetCli c = WorksheetCli.of(() -> ev, TrustStore.of(dir.resolve("home/trusted"), null), new ByteArrayInputStream(new byte[0]),
                new PrintStream(out, true, StandardCharsets.UTF_8), new PrintStream(err, true, StandardCharsets.UTF_8));
        assertEquals(3, c.verb("verify", List.of("--trust", top.toString())), "not run for want of trust: exit 3");
        assertTrue(out().contains("valve.atw is not trusted on this machine, so it was not run; --trust covers only the files named"), out());
        assertTrue(!ev.ran.contains("var L = mH(4.7);"), "the used file did not run: " + ev.ran);
        out.reset();
        assertEquals(0, cli("").verb("verify", List.of("--trust", top.toString(), dir.resolve("valve.atw").toString())),
                "named too, it runs: " + out());
    }

    @Test
    void theBytesHashedAreTheBytesRun() throws Exception {
        // a FIFO serves the trusted text to the first reader and other text to any second one
        Path fifo = dir.resolve("swap.atw");
        org.junit.jupiter.api.Assumptions.assumeTrue(new ProcessBuilder("mkfifo", fifo.toString()).start().waitFor() == 0, "no mkfifo here");
        String good = FakeEvaluator.SHEET;
        String hostile = good.replace("var I = A(2);", "hostile()");
        TrustStore.of(dir.resolve("home/trusted"), null).trust(fifo, good.getBytes(StandardCharsets.UTF_8));
        Thread server = new Thread(() -> {
            for (String text : List.of(good, hostile)) {
                try (var o = Files.newOutputStream(fifo)) {
                    o.write(text.getBytes(StandardCharsets.UTF_8));
                    o.close();
                    Thread.sleep(500); // the reader sees the end of the first text before a second writer opens
                } catch (Exception e) {
                    return;
                }
            }
        });
        server.setDaemon(true);
        server.start();
        FakeEvaluator ev = FakeEvaluator.truth();
        WorksheetCli c = WorksheetCli.of(() -> ev, TrustStore.of(dir.resolve("home/trusted"), null), new ByteArrayInputStream(new byte[0]),
                new PrintStream(out, true, StandardCharsets.UTF_8), new PrintStream(err, true, StandardCharsets.UTF_8));
        assertEquals(0, c.verb("run", List.of(fifo.toString())), out() + err);
        assertTrue(!ev.ran.contains("hostile()"), ev.ran.toString());
    }

    @Test
    void exportShowsEachEntrysMatchAndFailsOnADifference() throws Exception {
        Path f = sheet("tampered.atw", FakeEvaluator.SHEET.replace("9.400 mJ", "9.900 mJ"), true);
        Path html = dir.resolve("tampered.html");
        assertEquals(1, cli("").verb("export", List.of(f.toString(), "--html", html.toString())));
        assertTrue(out().contains("DIFFERS  tampered.atw:8  L.times(I.pow(2)).div(2)\n"), out());
        assertTrue(out().contains("; 1 result differs from the record (marked in the report)"), out());
        String text = Files.readString(html);
        assertTrue(text.contains("Differs from the record (9.4000 mJ is not 9.900 mJ to the digits shown): recorded <code>9.900 mJ</code>"), text);
    }

    @Test
    void exportNeverOverwritesTheWorksheet() throws Exception {
        Path f = sheet("keep.atw", FakeEvaluator.SHEET, true);
        assertEquals(2, cli("").verb("export", List.of(f.toString(), "--html", f.toString())));
        assertTrue(err.toString(StandardCharsets.UTF_8).contains("the report would replace the worksheet " + f + " itself"), err.toString());
        assertEquals(2, cli("").verb("export", List.of(f.toString(), "--html", dir.resolve("other.atw").toString())));
        assertEquals(FakeEvaluator.SHEET, Files.readString(f));
    }

    @Test
    void exportDrawsItsChartsAsideAndEmbedsThem() throws Exception {
        Path f = sheet("coil.atw", "// ampturn worksheet 1\n\n"
                + "var t = sweep(\"turns\", 100, 300, 3, n -> Outputs.of(\"L\", Solenoid.singleLayer(n, mm(30), mm(10)).inductance()))\n"
                + "plot(t)\n", true);
        Path html = dir.resolve("coil.html");
        WorksheetCli c = WorksheetCli.of(org.ampturn.worksheet.ShellEvaluator::start, TrustStore.of(dir.resolve("home/trusted"), null),
                new ByteArrayInputStream(new byte[0]), new PrintStream(out, true, StandardCharsets.UTF_8), new PrintStream(err, true, StandardCharsets.UTF_8));
        try {
            c.verb("export", List.of(f.toString(), "--html", html.toString()));
        } finally {
            org.ampturn.chart.Figures.useNumbering(null);
            org.ampturn.chart.Figures.useDirectory(Path.of(""));
            org.ampturn.chart.Figures.useFormats("png");
        }
        assertTrue(!Files.exists(dir.resolve("coil.figures")), "the worksheet's folder is left as it was: " + out());
        String text = Files.readString(html);
        assertTrue(text.contains("src=\"data:image/svg+xml;base64,"), "the chart drawn aside is in the report: " + out() + err);
    }
}
