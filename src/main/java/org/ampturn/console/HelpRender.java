package org.ampturn.console;

import java.util.ArrayList;
import java.util.List;
import org.jline.utils.AttributedString;
import org.jline.utils.AttributedStringBuilder;
import org.jline.utils.AttributedStyle;

/**
 * Lays out a help page (the Markdown of {@code lib-docs/}) for a terminal of a given width:
 * headings in bold (the page title also underlined), paragraphs and list items wrapped at word
 * boundaries with a hanging indent, code blocks indented and coloured but never wrapped (a wrapped
 * line of code would read as two statements), tables with aligned columns (cells wrapped inside
 * their column when the table is wider than the terminal) and inline {@code code}, bold and italic
 * shown as styles rather than as the Markdown marks. Only the Markdown the pages use is read; any
 * other line is shown as text.
 */
final class HelpRender {
    private HelpRender() {}

    static final AttributedStyle TITLE = AttributedStyle.BOLD.underline();
    static final AttributedStyle HEADING = AttributedStyle.BOLD;
    static final AttributedStyle CODE = AttributedStyle.DEFAULT.foreground(AttributedStyle.CYAN);
    static final AttributedStyle RULE = AttributedStyle.DEFAULT.faint();
    /** Left margin of every line, as the console indents its output. */
    static final String MARGIN = "  ";

    /** The page laid out for {@code width} columns (at least 30 are assumed). */
    static List<AttributedString> render(List<String> markdown, int width) {
        int w = Math.max(30, width) - MARGIN.length();
        List<AttributedString> out = new ArrayList<>();
        int i = 0;
        while (i < markdown.size()) {
            String line = markdown.get(i);
            String t = line.strip();
            if (t.isEmpty()) {
                blank(out);
                i++;
            } else if (t.startsWith("```")) {
                int indent = line.indexOf('`');
                i++;
                blank(out);
                while (i < markdown.size() && !markdown.get(i).strip().startsWith("```")) {
                    String code = markdown.get(i);
                    code = code.length() >= indent && code.substring(0, indent).isBlank() ? code.substring(indent) : code.stripLeading();
                    out.add(line("    " + code, CODE));
                    i++;
                }
                i++; // the closing fence
                blank(out);
            } else if (t.startsWith("#")) {
                int level = 0;
                while (level < t.length() && t.charAt(level) == '#') level++;
                String text = t.substring(level).strip();
                blank(out);
                for (AttributedString l : wrap(inline(text, level == 1 ? TITLE : HEADING), w, "", "")) out.add(l);
                if (level == 1) blank(out);
                i++;
            } else if (t.startsWith("|")) {
                List<String> rows = new ArrayList<>();
                while (i < markdown.size() && markdown.get(i).strip().startsWith("|")) rows.add(markdown.get(i++).strip());
                blank(out);
                out.addAll(table(rows, w));
                blank(out);
            } else if (isItem(t)) {
                String mark = t.startsWith("- ") || t.startsWith("* ") ? "•" : t.substring(0, t.indexOf(' '));
                int itemIndent = line.indexOf(t.charAt(0));
                StringBuilder text = new StringBuilder(t.substring(t.indexOf(' ') + 1).strip());
                i++;
                // continuation lines: indented deeper than the marker, not a new item or block
                while (i < markdown.size()) {
                    String next = markdown.get(i);
                    String nt = next.strip();
                    int nIndent = next.length() - next.stripLeading().length();
                    if (nt.isEmpty() || nt.startsWith("```") || nt.startsWith("|") || nt.startsWith("#") || (isItem(nt) && nIndent <= itemIndent + 1)) break;
                    if (isItem(nt)) break;
                    text.append(' ').append(nt);
                    i++;
                }
                String pad = " ".repeat(itemIndent);
                String first = pad + mark + " ";
                out.addAll(wrap(inline(text.toString(), AttributedStyle.DEFAULT), w, first, " ".repeat(first.length())));
            } else {
                StringBuilder para = new StringBuilder(t);
                i++;
                while (i < markdown.size()) {
                    String nt = markdown.get(i).strip();
                    if (nt.isEmpty() || nt.startsWith("```") || nt.startsWith("|") || nt.startsWith("#") || isItem(nt)) break;
                    para.append(' ').append(nt);
                    i++;
                }
                out.addAll(wrap(inline(para.toString(), AttributedStyle.DEFAULT), w, "", ""));
            }
        }
        while (!out.isEmpty() && out.get(out.size() - 1).length() == 0) out.remove(out.size() - 1);
        while (!out.isEmpty() && out.get(0).length() == 0) out.remove(0);
        List<AttributedString> margined = new ArrayList<>(out.size());
        for (AttributedString l : out) margined.add(l.length() == 0 ? l : new AttributedStringBuilder().append(MARGIN).append(l).toAttributedString());
        return margined;
    }

    private static boolean isItem(String t) {
        return t.startsWith("- ") || t.startsWith("* ") || t.matches("\\d{1,2}[.)] .*");
    }

    private static void blank(List<AttributedString> out) {
        if (!out.isEmpty() && out.get(out.size() - 1).length() > 0) out.add(AttributedString.EMPTY);
    }

    private static AttributedString line(String s, AttributedStyle style) {
        return new AttributedString(s, style);
    }

    /** Inline marks: `code`, **bold**, *italic* or _italic_, [text](link) as "text (link)"; backslash escapes. */
    static AttributedString inline(String s, AttributedStyle base) {
        AttributedStringBuilder b = new AttributedStringBuilder();
        int i = 0;
        while (i < s.length()) {
            char c = s.charAt(i);
            if (c == '\\' && i + 1 < s.length() && "\\`*_[]|#".indexOf(s.charAt(i + 1)) >= 0) {
                b.style(base).append(s.charAt(i + 1));
                i += 2;
            } else if (c == '`') {
                int ticks = 1;
                while (i + ticks < s.length() && s.charAt(i + ticks) == '`') ticks++;
                String fence = "`".repeat(ticks);
                int end = s.indexOf(fence, i + ticks);
                if (end < 0) { b.style(base).append(s.substring(i)); break; }
                b.style(base.foreground(AttributedStyle.CYAN)).append(s.substring(i + ticks, end).strip());
                i = end + ticks;
            } else if (s.startsWith("**", i)) {
                int end = s.indexOf("**", i + 2);
                if (end < 0) { b.style(base).append("**"); i += 2; continue; }
                b.append(inline(s.substring(i + 2, end), base.bold()));
                i = end + 2;
            } else if ((c == '*' || c == '_') && i + 1 < s.length() && !Character.isWhitespace(s.charAt(i + 1))
                    && (i == 0 || !Character.isLetterOrDigit(s.charAt(i - 1)))) {
                int end = s.indexOf(c, i + 1);
                if (end < 0 || (end + 1 < s.length() && Character.isLetterOrDigit(s.charAt(end + 1)))) {
                    b.style(base).append(c);
                    i++;
                    continue;
                }
                b.append(inline(s.substring(i + 1, end), base.italic()));
                i = end + 1;
            } else if (c == '[') {
                int close = s.indexOf("](", i);
                int end = close < 0 ? -1 : s.indexOf(')', close);
                if (close < 0 || end < 0) { b.style(base).append(c); i++; continue; }
                b.append(inline(s.substring(i + 1, close), base));
                b.style(base).append(" (").append(s.substring(close + 2, end)).append(")");
                i = end + 1;
            } else {
                b.style(base).append(c);
                i++;
            }
        }
        return b.toAttributedString();
    }

    /** Wraps styled text at spaces to {@code width} columns; the first line starts with {@code first}, the others with {@code rest}. */
    static List<AttributedString> wrap(AttributedString text, int width, String first, String rest) {
        List<AttributedString> out = new ArrayList<>();
        String plain = text.toString();
        int start = 0;
        String lead = first;
        while (start < plain.length()) {
            int room = Math.max(10, width - lead.length());
            int end;
            if (plain.length() - start <= room) {
                end = plain.length();
            } else {
                end = plain.lastIndexOf(' ', start + room);
                if (end <= start) {
                    end = plain.indexOf(' ', start + room);
                    if (end < 0) end = plain.length();
                }
            }
            out.add(new AttributedStringBuilder().append(lead).append(text.subSequence(start, end)).toAttributedString());
            start = end;
            while (start < plain.length() && plain.charAt(start) == ' ') start++;
            lead = rest;
        }
        if (out.isEmpty()) out.add(new AttributedString(first));
        return out;
    }

    /** A Markdown table with aligned columns; cells wrap inside their column when the table is wider than {@code width}. */
    static List<AttributedString> table(List<String> rows, int width) {
        List<List<AttributedString>> cells = new ArrayList<>();
        int header = -1;
        for (String r : rows) {
            List<String> parts = split(r);
            if (parts.stream().allMatch(p -> p.strip().matches(":?-{2,}:?"))) {
                if (header < 0) header = cells.size() - 1;
                continue;
            }
            List<AttributedString> row = new ArrayList<>();
            for (String p : parts) row.add(inline(p.strip(), cells.isEmpty() ? HEADING : AttributedStyle.DEFAULT));
            cells.add(row);
        }
        int n = cells.stream().mapToInt(List::size).max().orElse(0);
        int[] col = new int[n];
        for (List<AttributedString> r : cells) for (int j = 0; j < r.size(); j++) col[j] = Math.max(col[j], r.get(j).columnLength());
        int gap = 2;
        while (sum(col) + gap * (n - 1) > width) {
            int widest = 0;
            for (int j = 1; j < n; j++) if (col[j] > col[widest]) widest = j;
            if (col[widest] <= 8) break;
            col[widest]--;
        }
        List<AttributedString> out = new ArrayList<>();
        for (int ri = 0; ri < cells.size(); ri++) {
            List<AttributedString> r = cells.get(ri);
            List<List<AttributedString>> wrapped = new ArrayList<>();
            int height = 1;
            for (int j = 0; j < n; j++) {
                AttributedString c = j < r.size() ? r.get(j) : AttributedString.EMPTY;
                List<AttributedString> lines = c.columnLength() <= col[j] ? List.of(c) : wrap(c, col[j], "", "");
                wrapped.add(lines);
                height = Math.max(height, lines.size());
            }
            for (int k = 0; k < height; k++) {
                AttributedStringBuilder b = new AttributedStringBuilder();
                for (int j = 0; j < n; j++) {
                    AttributedString piece = k < wrapped.get(j).size() ? wrapped.get(j).get(k) : AttributedString.EMPTY;
                    b.append(piece);
                    if (j < n - 1) b.append(" ".repeat(Math.max(0, col[j] - piece.columnLength()) + gap));
                }
                out.add(trimEnd(b.toAttributedString()));
            }
            if (ri == header) out.add(new AttributedString("─".repeat(Math.min(width, sum(col) + gap * (n - 1))), RULE));
        }
        return out;
    }

    private static AttributedString trimEnd(AttributedString s) {
        String p = s.toString();
        int end = p.length();
        while (end > 0 && p.charAt(end - 1) == ' ') end--;
        return end == p.length() ? s : s.subSequence(0, end);
    }

    private static int sum(int[] a) {
        int s = 0;
        for (int v : a) s += v;
        return s;
    }

    /** The cells of a table row: split at unescaped bars outside inline code. */
    static List<String> split(String row) {
        String r = row.strip();
        if (r.startsWith("|")) r = r.substring(1);
        if (r.endsWith("|") && !r.endsWith("\\|")) r = r.substring(0, r.length() - 1);
        List<String> parts = new ArrayList<>();
        StringBuilder cur = new StringBuilder();
        boolean code = false;
        for (int i = 0; i < r.length(); i++) {
            char c = r.charAt(i);
            if (c == '\\' && i + 1 < r.length() && r.charAt(i + 1) == '|') {
                cur.append('|');
                i++;
            } else if (c == '`') {
                code = !code;
                cur.append(c);
            } else if (c == '|' && !code) {
                parts.add(cur.toString());
                cur.setLength(0);
            } else {
                cur.append(c);
            }
        }
        parts.add(cur.toString());
        return parts;
    }
}
