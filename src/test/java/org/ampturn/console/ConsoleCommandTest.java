package org.ampturn.console;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.ampturn.units.Quantity;
import org.ampturn.worksheet.Outcome;
import org.ampturn.worksheet.SessionCommand;
import org.ampturn.worksheet.SessionConsole;
import org.ampturn.worksheet.SessionExtension;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The # commands of DESIGN.md, and how a worksheet extension plugs its commands in. */
class ConsoleCommandTest {
    @TempDir
    Path docs;

    @Test
    void helpListsCommandsAndTopicsAndShowsAPage() throws Exception {
        Files.writeString(docs.resolve("solenoid.md"), "# Single-layer solenoid\nNagaoka coefficient page\n");
        Files.writeString(docs.resolve("wire.md"), "# Magnet wire\n");
        try (ConsoleHarness h = new ConsoleHarness(List.of(), docs)) {
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
        try (ConsoleHarness h = new ConsoleHarness(List.of(), docs)) {
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
    void worksheetCommandsAnswerBeforeTheyExistAndUnknownWordsAreNamed() throws Exception {
        try (ConsoleHarness h = new ConsoleHarness(List.of(), docs)) {
            int at = 0;
            for (String w : List.of("open x.atw", "save", "replay", "verify", "note a", "figures", "export r.html", "trust x.atw", "recover")) {
                h.type("#" + w + "\r");
                at = h.await("  ! #" + w.split(" ")[0] + " is not available yet in this build", at);
            }
            h.type("#frobnicate\r");
            at = h.await("  ! no command #frobnicate", at);
            h.type("6 * 7\r");
            h.await("  = 42", at);
        }
    }

    @Test
    void anExtensionReplacesAPlaceholderAndSeesEveryEntry() throws Exception {
        List<String> journal = new ArrayList<>();
        SessionCommand save = new SessionCommand() {
            public String name() { return "save"; }
            public String usage() { return "#save [FILE]"; }
            public String summary() { return "write the worksheet"; }
            public void run(String argument, SessionConsole console) {
                console.out().println("  wrote " + console.history().size() + " entries to " + argument);
                console.saved();
            }
        };
        SessionExtension ext = new SessionExtension() {
            @Override
            public List<SessionCommand> commands() {
                return List.of(save);
            }

            @Override
            public void evaluated(SessionConsole console, Outcome outcome) {
                journal.add(outcome.source() + " -> " + outcome.recorded());
            }
        };
        ConsoleHarness h = new ConsoleHarness(List.of(ext), docs);
        h.type("uH(47)\r");
        int at = h.await("  = 47.00 µH");
        h.type("#save choke.atw\r");
        h.await("  wrote 1 entries to choke.atw", at);
        assertEquals(0, h.end());
        assertFalse(h.screen().contains("Leave without saving"), "saved work needs no question:\n" + h.screen());
        assertEquals(List.of("uH(47) -> [47.00 µH]"), journal);
        h.close();
    }
}
