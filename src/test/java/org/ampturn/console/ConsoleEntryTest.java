package org.ampturn.console;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Typing entries: results, multi-line entries, errors, completion, interrupt (DESIGN.md, "The console"). */
class ConsoleEntryTest {
    @TempDir
    Path docs;

    @Test
    void aValueADeclarationAndAMultiLineMethod() throws Exception {
        try (ConsoleHarness h = new ConsoleHarness(docs)) {
            h.await("untitled 1");
            h.type("mm(25).times(2)\r");
            int at = h.await("  = 50.00 mm");
            h.type("var coil = mm(10);\r");
            at = h.await("  coil = 10.00 mm", at);
            h.type("double half(double v) {\r");
            h.type("  return v / 2;\r");
            h.type("}\r");
            at = h.await("  defined method half(double)", at);
            h.type("half(5)\r");
            at = h.await("  = 2.5", at);
            h.await("untitled 5", at);
        }
    }

    @Test
    void aCompileErrorShowsItsMessageAndACaret() throws Exception {
        try (ConsoleHarness h = new ConsoleHarness(docs)) {
            h.type("mm(1).times(qq)\r");
            int at = h.await("  ! cannot find symbol: variable qq");
            at = h.await("    mm(1).times(qq)\n", at);
            h.await("                ^", at);
            // a rejected entry is not counted: the next prompt keeps number 1
            h.type("1 + 1\r");
            h.await("  = 2", at);
            assertTrue(h.screen().contains("untitled 1>") || h.screen().contains("untitled 1\u203A"), h.screen());
            assertEquals(1, h.console.worksheet().entryCount());
        }
    }

    @Test
    void tabCompletesALibraryMethodAndASessionVariable() throws Exception {
        try (ConsoleHarness h = new ConsoleHarness(docs)) {
            h.type("var wireLength = m(3);\r");
            int at = h.await("  wireLength = 3.000 m");
            h.type("wireLen\t.ti\t2)\r"); // wireLen -> wireLength, .ti -> .times(
            h.await("  = 6.000 m", at);
        }
    }

    @Test
    void ctrlCStopsARunawayLoopAndTheSessionKeepsItsVariables() throws Exception {
        try (ConsoleHarness h = new ConsoleHarness(docs)) {
            h.type("long spins = 0;\r");
            int at = h.await("  spins = 0");
            h.type("while (true) { spins++; }\r");
            Thread.sleep(700);
            long t0 = System.nanoTime();
            h.interrupt();
            at = h.await("  ! interrupted", at);
            assertTrue(System.nanoTime() - t0 < 1_500_000_000L, "interrupt took over a second");
            h.type("spins > 0\r");
            h.await("  = true", at);
        }
    }

    @Test
    void theEndOfInputLeavesEvenWithUnsavedWork() throws Exception {
        ConsoleHarness h = new ConsoleHarness(docs);
        h.type("mm(2)\r");
        h.await("  = 2.000 mm");
        assertEquals(0, h.end());
        assertTrue(h.screen().contains("Leave without saving 1 entry?"), h.screen());
        assertFalse(h.screen().contains("Exception"), h.screen());
        h.close();
    }

    @Test
    void thePromptFallsBackToAsciiWhereTheLocaleCannotShowTheArrow() {
        java.nio.charset.Charset utf8 = java.nio.charset.StandardCharsets.UTF_8;
        assertTrue(Console.canShow('\u203A', utf8, null));
        assertTrue(Console.canShow('\u203A', utf8, "UTF-8"));
        assertFalse(Console.canShow('\u203A', utf8, "ANSI_X3.4-1968"));
        assertFalse(Console.canShow('\u203A', java.nio.charset.StandardCharsets.US_ASCII, null));
    }
}
