package org.ampturn.console;

import java.io.IOException;
import java.io.PrintWriter;
import java.util.List;
import org.jline.terminal.Attributes;
import org.jline.terminal.Terminal;
import org.jline.utils.AttributedString;
import org.jline.utils.AttributedStyle;
import org.jline.utils.InfoCmp;

/**
 * Shows a laid-out help page a screen at a time when it is taller than the terminal: Space shows the
 * next screen, Enter one more line, q (or Esc, Ctrl-C, end of input) stops. A terminal that cannot
 * read single keys (a dumb terminal, output to a file or pipe) or that reports no height gets the
 * whole page at once.
 */
final class HelpPager {
    private HelpPager() {}

    /** Fewer rows than this: no paging (nothing sensible fits). */
    static final int MIN_ROWS = 5;

    static void show(Terminal terminal, List<String> markdown) {
        page(terminal, HelpRender.render(markdown, width(terminal)));
    }

    static int width(Terminal terminal) {
        int w = terminal.getWidth();
        return w <= 0 ? 80 : Math.min(w, 100);
    }

    /** Terminal rows a line takes: a line of code wider than the terminal wraps onto several. */
    static int rows(AttributedString line, int width) {
        int w = line.columnLength();
        return width <= 0 || w <= width ? 1 : (w + width - 1) / width;
    }

    static void page(Terminal terminal, List<AttributedString> lines) {
        PrintWriter out = terminal.writer();
        int rows = terminal.getHeight();
        int width = terminal.getWidth();
        boolean dumb = terminal.getType() == null || terminal.getType().startsWith(Terminal.TYPE_DUMB);
        int total = 0;
        for (AttributedString l : lines) total += rows(l, width);
        if (dumb || rows < MIN_ROWS || total <= rows - 1) {
            for (AttributedString l : lines) out.println(l.toAnsi(terminal));
            out.flush();
            return;
        }
        int screen = rows - 1;
        Attributes before = terminal.enterRawMode();
        try {
            int shown = 0;
            int next = screen;
            while (true) {
                // at least one line, then as many as fit in the rows asked for
                int used = 0;
                int end = shown;
                while (end < lines.size() && (end == shown || used + rows(lines.get(end), width) <= next)) {
                    used += rows(lines.get(end), width);
                    out.println(lines.get(end).toAnsi(terminal));
                    end++;
                }
                shown = end;
                if (shown >= lines.size()) break;
                String prompt = " " + (100 * shown / lines.size()) + " % of the page · Space: more · Enter: one line · q: done ";
                out.print(new AttributedString(prompt, AttributedStyle.INVERSE).toAnsi(terminal));
                out.flush();
                int key = read(terminal);
                out.print('\r');
                if (!terminal.puts(InfoCmp.Capability.clr_eol)) out.print(" ".repeat(prompt.length()) + "\r");
                out.flush();
                if (key < 0 || key == 'q' || key == 'Q' || key == 27 || key == 3 || key == 4) break;
                next = key == '\r' || key == '\n' || key == 'j' ? 1 : screen;
            }
            out.flush();
        } finally {
            terminal.setAttributes(before);
        }
    }

    private static int read(Terminal terminal) {
        try {
            return terminal.reader().read();
        } catch (IOException e) {
            return -1;
        }
    }
}
