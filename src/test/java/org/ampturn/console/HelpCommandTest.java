package org.ampturn.console;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** #help TOPIC in the console: the page laid out, not raw Markdown, and a long page paged until q. */
class HelpCommandTest {
    @TempDir
    Path docs;

    @Test
    void aPageIsLaidOutAndALongOnePagedUntilQ() throws Exception {
        List<String> page = new ArrayList<>(List.of("# Long page", "", "| name | value |", "|---|---|", "| `a` | one |", "| `bbbbbb` | two |", ""));
        for (int i = 1; i <= 60; i++) page.add("- item " + i);
        Files.write(docs.resolve("long.md"), page);
        try (ConsoleHarness h = new ConsoleHarness(docs)) {
            h.type("#help long\r");
            int at = h.await("% of the page");
            String shown = h.screen();
            assertTrue(shown.contains("  Long page\n"), shown);
            assertTrue(shown.contains("  a       one\n") && shown.contains("  bbbbbb  two\n"), "aligned table without bars or backticks:\n" + shown);
            assertTrue(shown.contains("  • item 1\n"), shown);
            assertFalse(shown.contains("# Long page") || shown.contains("|---|"), shown);
            assertFalse(shown.contains("item 60"), "the page stops at the terminal's height (40 rows)");
            h.type("q");
            h.type("mm(2).times(3)\r");
            h.await("= 6.000 mm", at);
            assertFalse(h.screen().contains("item 60"), "q left the page");
        }
    }
}
