package org.ampturn.console;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.ampturn.worksheet.AmpturnHome;
import org.ampturn.worksheet.Recovery;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The worksheet commands in a console over a dumb terminal: journal, save, verify, export, trust. */
class WorksheetCommandsTest {
    @TempDir
    Path dir;

    String oldHome;

    @BeforeEach
    void home() {
        oldHome = System.getProperty(AmpturnHome.PROPERTY);
        System.setProperty(AmpturnHome.PROPERTY, dir.resolve("home").toString());
    }

    @AfterEach
    void restore() {
        // the worksheet numbers chart files by entry; leave the chart layer as other tests expect it
        org.ampturn.chart.Figures.useNumbering(null);
        org.ampturn.chart.Figures.useDirectory(Path.of(""));
        if (oldHome == null) System.clearProperty(AmpturnHome.PROPERTY);
        else System.setProperty(AmpturnHome.PROPERTY, oldHome);
    }

    @Test
    void typedEntriesAreJournaledSavedAndTrusted() throws Exception {
        try (ConsoleHarness h = new ConsoleHarness(dir)) {
            h.type("var L = mH(4.7);\r");
            int at = h.await("  L = 4.700 mH");
            h.type("#note the choke\r");
            at = h.await("  noted", at);
            h.type("L.times(A(2).pow(2)).div(2)\r");
            at = h.await("  = 9.400 mJ", at);
            // on disk in the journal before anything was saved
            List<Path> journals;
            try (var s = Files.list(dir.resolve("home/journal"))) {
                journals = s.toList();
            }
            assertEquals(1, journals.size());
            assertEquals(2, Recovery.read(journals.get(0)).entries().size());
            Path f = dir.resolve("choke.atw");
            h.type("#save " + f + "\r");
            at = h.await("saved " + f + " (2 entries)", at);
            assertEquals(f, h.console.worksheet().file());
            assertFalse(h.console.worksheet().isDirty());
            String text = Files.readString(f);
            assertTrue(text.contains("var L = mH(4.7);\n//= L = 4.700 mH\n\n// the choke\nL.times(A(2).pow(2)).div(2)\n//= 9.400 mJ\n"), text);
            h.type("#verify\r");
            at = h.await("every recorded result of this worksheet holds", at);
            h.type("#export " + dir.resolve("choke.html") + "\r");
            h.await("wrote " + dir.resolve("choke.html"), at);
            assertTrue(Files.readString(dir.resolve("choke.html")).contains("<pre class=\"out\">= 9.400 mJ</pre>"));
            assertEquals("choke 3", h.console.prompt().replaceAll("\u001B\\[[0-9;?]*[A-Za-z]", "").substring(0, 7),
                    "the prompt shows the worksheet's name and the next entry's number");
        }
    }

    @Test
    void untrustedOpenShowsThenRunsOnlyWhenConfirmed() throws Exception {
        Path f = dir.resolve("mailed.atw");
        try (var in = getClass().getResourceAsStream("/org/ampturn/worksheet/units-check.atw")) {
            Files.write(f, in.readAllBytes());
        }
        try (ConsoleHarness h = new ConsoleHarness(dir)) {
            h.type("#open " + f + "\r");
            int at = h.await(f + " (20 lines) is not trusted on this machine.");
            at = h.await("  No line reaches files, processes, the network", at);
            at = h.await(" 1 | // ampturn worksheet 1\n", at);
            at = h.await("A worksheet is code: run it?", at);
            h.type("n\r");
            at = h.await("not run.", at);
            assertEquals(0, h.console.worksheet().entryCount(), "nothing ran");
            h.type("#open " + f + "\r");
            at = h.await("run it?", at);
            h.type("y\r");
            at = h.await("opened " + f + ": 5 entries, every result as recorded", at);
            assertEquals(5, h.console.worksheet().entryCount());
            // now trusted: opening again asks nothing
            h.type("#open " + f + "\r");
            at = h.await("opened " + f + ": 5 entries", at);
            assertFalse(h.screen().substring(at - 200).contains("[y/N]"), h.screen());
        }
    }

    @Test
    void aStoppedEntryStaysAsARecordAndRunsAgainOnlyWhenAsked() throws Exception {
        try (ConsoleHarness h = new ConsoleHarness(dir)) {
            h.type("long spins = 0;\r");
            int at = h.await("  spins = 0");
            h.type("while (spins < 1) { }\r");
            Thread.sleep(300);
            h.interrupt();
            at = h.await("  ! interrupted", at);
            h.type("spins = 5;\r");
            at = h.await("  = 5", at);
            Path f = dir.resolve("spin.atw");
            h.type("#save " + f + "\r");
            at = h.await("saved " + f + " (2 entries)", at);
            assertTrue(Files.readString(f).contains("//! while (spins < 1) { }\n//= ! interrupted\n"), Files.readString(f));
            h.type("#replay\r");
            at = h.await("  replayed 2 entries", at);
            h.type("#rerun\r");
            at = h.await("  running again: while (spins < 1) { }", at);
            h.await("spin 4" + h.arrow(), at);
            assertEquals(3, h.console.worksheet().entryCount(), "it ran (spins is 5 now) and is an entry again");
        }
    }

    @Test
    void theTrustQuestionComesAfterTheRiskyLinesWithEscapesMadeVisible() throws Exception {
        Path f = dir.resolve("mailed.atw");
        Files.writeString(f, "// ampturn worksheet 1\n\nvar L = mH(4.7);\n//= L = 4.700 mH \u001B[1A\u001B[2K\n"
                + "java.nio.file.Files.writeString(java.nio.file.Path.of(\"/tmp/x\"), \"y\");\n");
        try (ConsoleHarness h = new ConsoleHarness(dir)) {
            h.type("#open " + f + "\r");
            int at = h.await("  ! line 4: hidden text: //= L = 4.700 mH \\x1B[1A\\x1B[2K");
            at = h.await("  ! line 5: files: java.nio.file.Files.writeString(", at);
            at = h.await("4 | //= L = 4.700 mH \\x1B[1A\\x1B[2K", at);
            at = h.await("Do more than calculate: line 4 (hidden text), line 5 (files)", at);
            at = h.await("A worksheet is code: run it?", at);
            h.type("n\r");
            h.await("not run.", at);
            assertEquals(0, h.console.worksheet().entryCount());
        }
    }

    @Test
    void exportNeverReplacesTheOpenWorksheet() throws Exception {
        Path f = dir.resolve("latch.atw");
        try (ConsoleHarness h = new ConsoleHarness(dir)) {
            h.type("var L = mH(4.7);\r");
            int at = h.await("  L = 4.700 mH");
            h.type("#save " + f + "\r");
            at = h.await("saved " + f, at);
            String saved = Files.readString(f);
            h.type("#export " + f + "\r");
            at = h.await("  ! the report would replace the worksheet " + f + " itself; name an .html file", at);
            assertEquals(saved, Files.readString(f), "the worksheet is as it was saved");
        }
    }
}
