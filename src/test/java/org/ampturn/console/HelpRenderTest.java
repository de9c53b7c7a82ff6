package org.ampturn.console;

import static org.junit.jupiter.api.Assertions.*;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.jline.terminal.Size;
import org.jline.terminal.Terminal;
import org.jline.terminal.impl.DumbTerminal;
import org.jline.utils.AttributedString;
import org.jline.utils.AttributedStyle;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/** #help pages laid out for a terminal: no raw Markdown, wrapped to the width, tables aligned, long pages paged. */
class HelpRenderTest {
    static Stream<Path> pages() throws IOException {
        return Files.list(Path.of("lib-docs")).filter(p -> p.toString().endsWith(".md")).sorted();
    }

    private static List<AttributedString> render(String page, int width) throws IOException {
        return HelpRender.render(Files.readAllLines(Path.of("lib-docs", page)), width);
    }

    private static boolean isCode(AttributedString l) {
        return l.length() > 6 && l.toString().startsWith("      ") && l.styleAt(6).equals(HelpRender.CODE);
    }

    @ParameterizedTest
    @MethodSource("pages")
    void everyPageIsLaidOutWithoutMarkdownMarksAndWithinTheWidth(Path page) throws IOException {
        List<String> md = Files.readAllLines(page);
        for (int width : new int[] {60, 100}) {
            List<AttributedString> out = HelpRender.render(md, width);
            assertFalse(out.isEmpty(), page.toString());
            for (AttributedString l : out) {
                String s = l.toString();
                assertFalse(s.strip().matches("#{1,6} .*"), page + ": heading mark shown: " + s);
                assertFalse(s.contains("```"), page + ": code fence shown: " + s);
                assertFalse(s.strip().matches("\\|.*\\|") || s.contains("|---"), page + ": table bars shown: " + s);
                if (isCode(l)) continue; // code is never wrapped: a wrapped line of code would read as two statements
                assertFalse(s.contains("**"), page + ": bold marks shown: " + s);
                assertFalse(s.contains("`"), page + ": code marks shown: " + s);
                assertTrue(l.columnLength() <= width, page + " at " + width + " columns: line of " + l.columnLength() + ": " + s);
            }
        }
    }

    @Test
    void headingsAreBoldAndCodeIsIndentedAndColoured() throws IOException {
        List<AttributedString> out = render("transients.md", 80);
        AttributedString title = out.get(0);
        assertEquals("  Transients: what a run returns and how it is solved", title.toString());
        assertTrue(title.styleAt(2).equals(HelpRender.TITLE), "the page title is bold and underlined");
        AttributedString signals = out.stream().filter(l -> l.toString().equals("  Signals")).findFirst().orElseThrow();
        assertEquals(HelpRender.HEADING, signals.styleAt(2));
        AttributedString code = out.stream().filter(l -> l.toString().contains("var coil = Coil.lumped(mH(10), ohm(5));")).findFirst().orElseThrow();
        assertTrue(code.toString().startsWith("      var coil"), code.toString());
        assertTrue(isCode(code));
        // inline code keeps its text and loses its backticks
        assertTrue(out.stream().anyMatch(l -> l.toString().contains("power(\"supply\" | \"coil\"")), "inline code with bars inside");
    }

    @Test
    void tableColumnsLineUpAndWrapInsideTheirColumn() throws IOException {
        List<AttributedString> out = render("transients.md", 80);
        int head = -1;
        for (int i = 0; i < out.size(); i++) if (out.get(i).toString().matches("  metric +meaning")) head = i;
        assertTrue(head >= 0, "the metrics table's header");
        assertEquals(HelpRender.HEADING, out.get(head).styleAt(2));
        int col = out.get(head).toString().indexOf("meaning");
        assertTrue(out.get(head + 1).toString().strip().matches("─+"), "a rule under the header");
        int rows = 0;
        for (int i = head + 2; i < out.size() && !out.get(i).toString().isBlank(); i++) {
            String s = out.get(i).toString();
            assertTrue(s.length() > col, s);
            assertEquals(' ', s.charAt(col - 1), "column 2 starts at " + col + " in: " + s);
            assertNotEquals(' ', s.charAt(col), "column 2 starts at " + col + " in: " + s);
            assertTrue(s.length() <= 80, s);
            rows++;
        }
        assertTrue(rows > 9, "9 metrics, some wrapped: " + rows + " lines");
    }

    @Test
    void listsGetBulletsWithAHangingIndent() {
        List<AttributedString> out = HelpRender.render(List.of("Intro.", "", "- first item that is long enough to wrap past the width of this narrow terminal",
                "  and continues here", "- second `code` item", "1. numbered"), 40);
        List<String> text = out.stream().map(AttributedString::toString).toList();
        assertEquals("  Intro.", text.get(0));
        assertEquals("", text.get(1));
        assertTrue(text.get(2).startsWith("  • first item"), text.toString());
        for (int i = 3; text.get(i).startsWith("    "); i++) assertFalse(text.get(i).startsWith("     "), "hanging indent of 2: " + text);
        assertTrue(text.stream().anyMatch(s -> s.endsWith("and continues here")), text.toString());
        assertTrue(text.contains("  • second code item"), text.toString());
        assertTrue(text.contains("  1. numbered"), text.toString());
        AttributedString second = out.stream().filter(l -> l.toString().contains("second")).findFirst().orElseThrow();
        assertEquals(AttributedStyle.DEFAULT.foreground(AttributedStyle.CYAN), second.styleAt(second.toString().indexOf("code")));
        assertEquals(AttributedStyle.BOLD, HelpRender.inline("**strong** word", AttributedStyle.DEFAULT).styleAt(0));
        assertEquals("strong word", HelpRender.inline("**strong** word", AttributedStyle.DEFAULT).toString());
        assertEquals("spec (https://example.org)", HelpRender.inline("[spec](https://example.org)", AttributedStyle.DEFAULT).toString());
    }

    private static Terminal terminal(String keys, ByteArrayOutputStream screen, int rows) throws IOException {
        // a terminal over byte streams that calls itself xterm, as the console tests do (no pty, so output is synchronous)
        Terminal t = new DumbTerminal("help-test", "xterm", new ByteArrayInputStream(keys.getBytes(StandardCharsets.US_ASCII)), screen,
                StandardCharsets.UTF_8);
        t.setSize(new Size(80, rows));
        return t;
    }

    private static List<AttributedString> numbered(int n) {
        List<AttributedString> lines = new ArrayList<>();
        for (int i = 1; i <= n; i++) lines.add(new AttributedString("line " + i));
        return lines;
    }

    @Test
    void aLongPageIsShownAScreenAtATime() throws IOException {
        ByteArrayOutputStream screen = new ByteArrayOutputStream();
        try (Terminal t = terminal("q", screen, 10)) {
            HelpPager.page(t, numbered(30));
        }
        String s = screen.toString(StandardCharsets.UTF_8);
        assertTrue(s.contains("line 9\n") || s.contains("line 9\r\n"), s);
        assertFalse(s.contains("line 10"), "one screen (9 lines and the prompt), then q stops: " + s);
        assertTrue(s.contains("30 % of the page"), s);
    }

    @Test
    void spaceShowsTheNextScreenAndEnterOneLine() throws IOException {
        ByteArrayOutputStream screen = new ByteArrayOutputStream();
        try (Terminal t = terminal(" \rq", screen, 10)) {
            HelpPager.page(t, numbered(30));
        }
        String s = screen.toString(StandardCharsets.UTF_8);
        assertTrue(s.contains("line 19"), s);
        assertFalse(s.contains("line 20"), s);
        assertTrue(s.contains("63 % of the page"), "after 19 of 30 lines: " + s);
        // end of input ends the pager too, and a short page is shown whole with no prompt
        screen.reset();
        try (Terminal t = terminal("", screen, 10)) {
            HelpPager.page(t, numbered(5));
        }
        s = screen.toString(StandardCharsets.UTF_8);
        assertTrue(s.contains("line 5") && !s.contains("% of the page"), s);
    }

    @Test
    void aLineWiderThanTheTerminalCountsItsRows() throws IOException {
        List<AttributedString> lines = numbered(30);
        lines.set(2, new AttributedString("x".repeat(200))); // 3 rows on an 80-column terminal
        ByteArrayOutputStream screen = new ByteArrayOutputStream();
        try (Terminal t = terminal("q", screen, 10)) {
            HelpPager.page(t, lines);
        }
        String s = screen.toString(StandardCharsets.UTF_8);
        assertTrue(s.contains("line 7"), s);
        assertFalse(s.contains("line 8"), "9 rows: lines 1-2, the 3-row line, lines 4-7: " + s);
        assertEquals(3, HelpPager.rows(lines.get(2), 80));
        assertEquals(1, HelpPager.rows(lines.get(0), 80));
    }

    @Test
    void aDumbTerminalGetsTheWholePage() throws IOException {
        ByteArrayOutputStream screen = new ByteArrayOutputStream();
        try (Terminal t = new DumbTerminal("help-test", Terminal.TYPE_DUMB, new ByteArrayInputStream(new byte[0]), screen, StandardCharsets.UTF_8)) {
            t.setSize(new Size(80, 10));
            HelpPager.page(t, numbered(30));
        }
        String s = screen.toString(StandardCharsets.UTF_8);
        assertTrue(s.contains("line 30") && !s.contains("% of the page"), s);
    }
}
