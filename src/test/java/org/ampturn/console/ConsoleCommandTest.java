package org.ampturn.console;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.ampturn.units.Quantity;
import org.ampturn.worksheet.AmpturnHome;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The # commands of DESIGN.md: help, names, undo, digits, unknown words, leaving after a save. */
class ConsoleCommandTest {
    @TempDir
    Path docs;

    @Test
    void helpListsCommandsAndTopicsAndShowsAPage() throws Exception {
        Files.writeString(docs.resolve("solenoid.md"), "# Single-layer solenoid\nNagaoka coefficient page\n");
        Files.writeString(docs.resolve("wire.md"), "# Magnet wire\n");
        try (ConsoleHarness h = new ConsoleHarness(docs)) {
            h.type("#help\r");
            int at = h.await("Topics (#help TOPIC): solenoid, wire");
            assertTrue(h.screen().contains("#digits N"), h.screen());
            assertTrue(h.screen().contains("#save [FILE]"), h.screen());
            h.type("#help sol\r");
            at = h.await("  Nagaoka coefficient page", at);
            h.type("#help nothing-like-it\r");
            h.await("  ! no help topic \"nothing-like-it\"", at);
        }
    }

    @Test
    void namesUndoAndDigits() throws Exception {
        int digits = Quantity.displayDigits();
        try (ConsoleHarness h = new ConsoleHarness(docs)) {
            h.type("var bore = mm(12.5);\r");
            int at = h.await("  bore = 12.50 mm");
            h.type("var spare = A(2);\r");
            at = h.await("  spare = 2.000 A", at);
            h.type("#names\r");
            at = h.await("  bore   Quantity  12.50 mm", at);
            h.type("#undo\r");
            at = h.await("  took back: var spare = A(2);", at);
            h.type("#names\r");
            at = h.await("  bore", at);
            h.type("#digits 6\r");
            at = h.await("  digits = 6", at);
            h.type("bore\r");
            at = h.await("  = 12.5000 mm", at);
            h.type("#digits 99\r");
            at = h.await("  ! digits must be between 1 and 15, got 99", at);
            h.type("#undo\r#undo\r#undo\r");
            h.await("  ! nothing to take back", at);
            assertFalse(h.screen().substring(at).contains("spare"), h.screen());
        } finally {
            Quantity.setDisplayDigits(digits);
        }
    }

    @Test
    void unknownWordsAreNamedAndTheConsoleGoesOn() throws Exception {
        try (ConsoleHarness h = new ConsoleHarness(docs)) {
            h.type("#frobnicate\r");
            int at = h.await("  ! no command #frobnicate");
            h.type("#note\r");
            at = h.await("  ! #note needs text, e.g. #note pull-in measured at 9.1 V", at);
            h.type("6 * 7\r");
            h.await("  = 42", at);
        }
    }

    @Test
    void savedWorkNeedsNoQuestionOnLeaving() throws Exception {
        Path home = docs.resolve("home");
        String old = System.getProperty(AmpturnHome.PROPERTY);
        System.setProperty(AmpturnHome.PROPERTY, home.toString());
        try {
            ConsoleHarness h = new ConsoleHarness(docs);
            h.type("uH(47)\r");
            int at = h.await("  = 47.00 µH");
            h.type("#save " + docs.resolve("choke.atw") + "\r");
            h.await("  saved " + docs.resolve("choke.atw") + " (1 entries)", at);
            assertEquals(0, h.end());
            assertFalse(h.screen().contains("Leave without saving"), "saved work needs no question:\n" + h.screen());
            h.close();
            try (var files = Files.list(home.resolve("journal"))) {
                assertEquals(0, files.count(), "a clean end with everything saved leaves no journal");
            }
        } finally {
            if (old == null) System.clearProperty(AmpturnHome.PROPERTY);
            else System.setProperty(AmpturnHome.PROPERTY, old);
        }
    }
}
