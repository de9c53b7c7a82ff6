package org.ampturn.console;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Opening a worksheet named on the command line, and history kept across consoles. */
class ConsoleFileTest {
    @TempDir
    Path dir;

    @Test
    void aWorksheetIsShownThenRunWhenTheUserSaysSo() throws Exception {
        Path ws = dir.resolve("valve-coil.atw");
        Files.writeString(ws, "// ampturn worksheet 1\n// title: valve coil\n\nvar bobbin = mm(18)\n//= bobbin = 18.00 mm\n"
                + "double layers(double d) {\n  return bobbin.si() / d;\n}\nlayers(0.5e-3)\n");
        try (ConsoleHarness h = new ConsoleHarness(dir, null, ws)) {
            int at = h.await(ws + " (9 lines) is not trusted on this machine.");
            at = h.await("  4 | var bobbin = mm(18)", at);
            at = h.await("A worksheet is code: run it?", at);
            h.type("y\r");
            at = h.await("valve-coil 1> var bobbin = mm(18)".replace(">", h.arrow()), at);
            at = h.await("  bobbin = 18.00 mm", at);
            at = h.await("  defined method layers(double)", at);
            // 18 mm of bobbin over 0.5 mm wire: 36 turns a layer (common practice: winding width / wire diameter)
            at = h.await("  = 36.0", at);
            at = h.await("opened " + ws + ": 3 entries", at);
            h.await("valve-coil 4", at);
            assertEquals(3, h.console.worksheet().entryCount());
        }
    }

    @Test
    void declinedWorksheetIsShownButNotRun() throws Exception {
        Path ws = dir.resolve("relay.atw");
        Files.writeString(ws, "// ampturn worksheet 1\n\nvar pull = N(2.5)\n");
        try (ConsoleHarness h = new ConsoleHarness(dir, null, ws)) {
            int at = h.await("A worksheet is code: run it?");
            h.type("n\r");
            at = h.await("not run.", at);
            h.type("#names\r");
            h.await("  no names defined yet", at);
        }
    }

    @Test
    void aFileThatIsNotAWorksheetIsRefusedByName() throws Exception {
        Path ws = dir.resolve("notes.atw");
        Files.writeString(ws, "var pull = N(2.5)\n");
        try (ConsoleHarness h = new ConsoleHarness(dir, null, ws)) {
            h.await("! cannot open " + ws + ": " + ws + ": not an Ampturn worksheet");
        }
    }

    @Test
    void historyIsKeptAcrossConsoles() throws Exception {
        Path hist = dir.resolve("history");
        ConsoleHarness first = new ConsoleHarness(dir, hist, null);
        first.type("mH(4.7).times(2)\r");
        first.await("  = 9.400 mH");
        first.type("#digits 4\r");
        first.await("  digits = 4");
        assertEquals(0, first.end());
        first.close();
        assertTrue(Files.readString(hist).contains("mH(4.7).times(2)"));
        try (ConsoleHarness second = new ConsoleHarness(dir, hist, null)) {
            second.await("untitled 1");
            second.type("\u001B[A\u001B[A\r"); // two lines up: the entry typed in the first console
            second.await("  = 9.400 mH");
        }
    }
}
