package org.ampturn;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.ampturn.console.WorksheetCli;
import org.ampturn.session.Session;
import org.ampturn.worksheet.ShellEvaluator;
import org.ampturn.worksheet.TrustStore;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code ampturn run}: entries and results in plain text, the run goes on after an error, exit codes. */
class MainRunTest {

    /** Runs and workspaces number and place charts for their worksheet: leave the chart layer as other tests expect it. */
    @org.junit.jupiter.api.AfterEach
    void resetCharts() {
        org.ampturn.chart.Figures.useNumbering(null);
        org.ampturn.chart.Figures.useDirectory(java.nio.file.Path.of(""));
    }
    @TempDir
    Path dir;

    private String run(Session s, String text, int expectedExit) {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        PrintStream out = new PrintStream(bytes, true, StandardCharsets.UTF_8);
        WorksheetCli cli = WorksheetCli.of(() -> ShellEvaluator.over(() -> s), TrustStore.of(dir.resolve("trusted"), null),
                new java.io.ByteArrayInputStream(text.getBytes(StandardCharsets.UTF_8)), out, System.err);
        assertEquals(expectedExit, cli.verb("run", List.of("-")));
        return bytes.toString(StandardCharsets.UTF_8);
    }

    @Test
    void eachEntryIsPrintedWithItsResultsAndAnErrorDoesNotStopTheRun() {
        try (Session s = Session.start()) {
            assertEquals("mm(25).times(2)\n  = 50.00 mm\n", run(s, "mm(25).times(2)\n", 0));
            String out = run(s, "// a note\nvar r = ohm(12);\nr.plus(V(1))\n\nV(24).div(r)\n", 4);
            assertEquals("var r = ohm(12);\n  r = 12.00 Ω\nr.plus(V(1))\n  ! cannot add 1.000 V to 12.00 Ω (voltage and resistance)\n"
                    + "V(24).div(r)\n  = 2.000 A\n", out);
            assertTrue(!out.contains("\u001B["), "no colour in batch output");
        }
    }

    @Test
    void badInputOnStandardInputIsEachEntrysOwnError() {
        try (Session s = Session.start()) {
            assertEquals("1+1\n  = 2\nx catch\n  ! the Java compiler failed on this entry (InternalError); rewrite it, the session goes on\n"
                    + "2+2\n  = 4\n", run(s, "1+1\nx catch\n2+2\n", 4));
            String out = run(s, "#save x.atw\nmm(1).plus(\n2+2\n", 4);
            assertTrue(out.startsWith("#save x.atw\n  ! #save is a console command;"), out);
            assertTrue(out.contains("mm(1).plus(\n  ! reached end of file while parsing\n"), "an unbalanced line is its own entry:\n" + out);
            assertTrue(out.endsWith("2+2\n  = 4\n"), "and does not swallow the next:\n" + out);
        }
    }

    @Test
    void verbsAndOptions() {
        ByteArrayOutputStream o = new ByteArrayOutputStream();
        ByteArrayOutputStream e = new ByteArrayOutputStream();
        PrintStream out = new PrintStream(o, true, StandardCharsets.UTF_8);
        PrintStream err = new PrintStream(e, true, StandardCharsets.UTF_8);
        assertEquals(0, Main.run(List.of("--version"), out, err));
        assertTrue(o.toString(StandardCharsets.UTF_8).startsWith("ampturn " + Ampturn.version()));
        assertEquals(0, Main.run(List.of("--help"), out, err));
        assertTrue(o.toString(StandardCharsets.UTF_8).contains("ampturn run [--trust] FILE.atw|-"));
        assertEquals(2, Main.run(List.of("run", dir.resolve("missing.atw").toString()), out, err));
        assertTrue(e.toString(StandardCharsets.UTF_8).contains("no such file"));
        assertEquals(2, Main.run(List.of("verify", "x.atw"), out, err));
        assertTrue(e.toString(StandardCharsets.UTF_8).contains("x.atw: no such file"));
        assertEquals(2, Main.run(List.of("--frob"), out, err));
        String help = o.toString(StandardCharsets.UTF_8);
        for (String s : List.of("  3  not run: the worksheet is not trusted on this machine", "  4  an entry failed or ran over its limit",
                "AMPTURN_JAVA_OPTS", "AMPTURN_CDS=0", "~/.ampturn/", "-Dampturn.home=DIR", "--entry-limit DURATION")) {
            assertTrue(help.contains(s), "--help names " + s + ":\n" + help);
        }
        assertEquals(2, Main.run(List.of("verfiy"), out, err), "a mistyped verb is a usage error, not a console");
        assertTrue(e.toString(StandardCharsets.UTF_8).contains("\"verfiy\" is neither a verb nor a worksheet (did you mean verify?)"), e.toString());
        assertEquals(2, Main.run(List.of("run"), out, err));
    }

    @Test
    void aChildProcessExitsFourWhenAnEntryFailsAndSurvivesSystemExit() throws Exception {
        Path script = dir.resolve("script.atw");
        Files.writeString(script, "// ampturn worksheet 1\n\nmm(25).times(2)\nSystem.exit(0);\nmA(250).times(ohm(48))\n");
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        Process p = new ProcessBuilder(java, "-cp", System.getProperty("java.class.path"), "org.ampturn.Main", "run", "--trust", script.toString())
                .redirectErrorStream(true).start();
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(p.waitFor(60, TimeUnit.SECONDS));
        assertEquals(4, p.exitValue(), out);
        assertTrue(out.contains("mm(25).times(2)\n  = 50.00 mm\n"), out);
        assertTrue(out.contains("  ! " + Session.EXIT_BLOCKED), out);
        // Ohm's law: 250 mA through 48 ohm is 12 V (common practice)
        assertTrue(out.endsWith("mA(250).times(ohm(48))\n  = 12.00 V\n"), out);

        Files.writeString(script, "var ok = mm(1);\n");
        p = new ProcessBuilder(java, "-cp", System.getProperty("java.class.path"), "org.ampturn.Main", "run", "-")
                .redirectInput(script.toFile()).redirectErrorStream(true).start();
        out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(p.waitFor(60, TimeUnit.SECONDS));
        assertEquals(0, p.exitValue(), out);
        assertEquals("var ok = mm(1);\n  ok = 1.000 mm\n", out);
    }

    @Test
    void aStoppedVerifyLeavesNoScratchFolder() throws Exception {
        Path tmp = Files.createDirectories(dir.resolve("tmp"));
        Path sheet = dir.resolve("slow.atw");
        Files.writeString(sheet, "// ampturn worksheet 1\n\nThread.sleep(60_000);\n");
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        Process p = new ProcessBuilder(java, "-Djava.io.tmpdir=" + tmp, "-Dampturn.home=" + dir.resolve("home"), "-cp", System.getProperty("java.class.path"),
                "org.ampturn.Main", "verify", "--trust", sheet.toString()).redirectErrorStream(true).start();
        long until = System.nanoTime() + 60_000_000_000L;
        boolean seen = false;
        while (!seen && System.nanoTime() < until) {
            try (var s = Files.list(tmp)) {
                seen = s.anyMatch(f -> f.getFileName().toString().startsWith("ampturn-verify-"));
            }
            Thread.sleep(50);
        }
        assertTrue(seen, "verify made its scratch folder");
        p.destroy(); // SIGTERM, as a CI job's cancel sends; Ctrl-C's SIGINT ends the same way
        assertTrue(p.waitFor(30, TimeUnit.SECONDS));
        try (var s = Files.list(tmp)) {
            assertEquals(List.of(), s.filter(f -> f.getFileName().toString().startsWith("ampturn-verify-")).toList());
        }
    }
}
