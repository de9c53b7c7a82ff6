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
        assertEquals(1, cli("").verb("verify", List.of(f.toString())));
        assertTrue(out().startsWith(f + ": not run: this machine has not saved or trusted this worksheet"), out());
        out.reset();
        assertEquals(1, cli("").verb("run", List.of(f.toString())));
        assertTrue(out().contains("not run"), out());
        out.reset();
        assertEquals(0, cli("").verb("verify", List.of("--trust", f.toString())));
        assertEquals(f + ": 3 entries, all results hold\n", out());
        out.reset();
        assertEquals(1, cli("").verb("verify", List.of(f.toString())), "--trust is for that run only");
    }

    @Test
    void runPrintsEntriesAndResults() throws Exception {
        Path f = sheet("good.atw", FakeEvaluator.SHEET, true);
        assertEquals(0, cli("").verb("run", List.of(f.toString())));
        assertEquals("var L = mH(4.7);\n  L = 4.700 mH\nvar I = A(2);\n  I = 2.000 A\nL.times(I.pow(2)).div(2)\n  = 9.4000 mJ\n", out());
    }

    @Test
    void runFromStandardInputCountsAsTyped() {
        assertEquals(1, cli("var L = mH(4.7);\nnope\n").verb("run", List.of("-")));
        assertEquals("var L = mH(4.7);\n  L = 4.700 mH\nnope\n  ! cannot find symbol in nope\n", out());
    }

    @Test
    void exportWritesTheReport() throws Exception {
        Path f = sheet("good.atw", FakeEvaluator.SHEET.replace("// title: t", "// title: Choke energy"), true);
        Path html = dir.resolve("good.html");
        assertEquals(0, cli("").verb("export", List.of(f.toString(), "--html", html.toString())));
        assertEquals("wrote " + html + "\n", out());
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
}
