package org.ampturn.worksheet;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Pattern;

/**
 * What a person reads before a worksheet they did not write runs: a summary first (the lines that
 * reach files, processes, the network, class loading or reflection, or end the program, each with
 * its line number; and, when the same path was trusted before, the lines changed since), then the
 * whole text. Every line is shown with its control characters made visible, so that terminal escape
 * sequences in a comment, a string or a record cannot move the cursor and hide an entry.
 */
public final class TrustReview {
    private TrustReview() {}

    /** A line that does something a calculation does not need. */
    public record Risk(int line, String kind, String text) {
        @Override
        public String toString() {
            return "line " + line + ": " + kind + ": " + text;
        }
    }

    private record Rule(String kind, Pattern pattern) {}

    private static final List<Rule> RULES = List.of(
            new Rule("files", Pattern.compile("\\bjava\\s*\\.\\s*nio\\b|\\bjava\\s*\\.\\s*io\\b|\\bFiles\\s*\\.|\\bnew\\s+File\\w*\\s*\\(|\\bFileChannel\\b"
                    + "|\\bRandomAccessFile\\b|\\bPaths?\\s*\\.\\s*(?:get|of)\\b|\\bFile(?:Input|Output)Stream\\b|\\bFile(?:Reader|Writer)\\b")),
            new Rule("processes", Pattern.compile("\\bProcessBuilder\\b|\\bRuntime\\s*\\.\\s*getRuntime\\b|\\.\\s*exec\\s*\\(|\\bProcessHandle\\b")),
            new Rule("network", Pattern.compile("\\bjava\\s*\\.\\s*net\\b|\\bSocket\\w*\\b|\\bURL\\w*\\b|\\bURI\\b|\\bHttp\\w*\\b|\\bInetAddress\\b")),
            new Rule("class loading", Pattern.compile("ClassLoader\\b|\\bClass\\s*\\.\\s*forName\\b|\\bloadClass\\b|\\bdefineClass\\b"
                    + "|\\bServiceLoader\\b|\\bSystem\\s*\\.\\s*load(?:Library)?\\b|\\bMethodHandles?\\b|\\bLookup\\b")),
            new Rule("reflection", Pattern.compile("\\bjava\\s*\\.\\s*lang\\s*\\.\\s*reflect\\b|\\bgetDeclared\\w*\\b|\\bsetAccessible\\b"
                    + "|\\.\\s*getMethods?\\s*\\(|\\.\\s*getFields?\\s*\\(|\\.\\s*invoke\\s*\\(|\\bUnsafe\\b")),
            new Rule("System.exit", Pattern.compile("\\bSystem\\s*\\.\\s*exit\\b|\\bexit\\s*\\(|\\bhalt\\s*\\(")),
            new Rule("environment", Pattern.compile("\\bSystem\\s*\\.\\s*(?:getenv|setProperty|setOut|setErr|setIn|getProperties)\\b")),
            new Rule("hidden text", Pattern.compile("\\\\u+[0-9a-fA-F]{4}|[\\p{Cc}&&[^\\t]]|\\p{Cf}")),
            new Rule("runs another worksheet", Pattern.compile("^#use\\b")));

    /** The lines of {@code text} that do something beyond a calculation, in order; one entry per line and kind. */
    public static List<Risk> risks(String text) {
        List<Risk> out = new ArrayList<>();
        String[] lines = text.split("\\r?\\n", -1);
        for (int i = 0; i < lines.length; i++) {
            for (Rule r : RULES) {
                if (r.pattern().matcher(lines[i]).find()) out.add(new Risk(i + 1, r.kind(), visible(lines[i].strip())));
            }
        }
        return out;
    }

    /**
     * The text with every control or format character (escape, carriage return, bell, bidirectional
     * overrides, zero-width characters) shown as {@code \x1B} or {@code \u202E}; tabs become spaces.
     */
    public static String visible(String s) {
        StringBuilder b = new StringBuilder(s.length());
        s.codePoints().forEach(cp -> {
            int type = Character.getType(cp);
            if (cp == '\t') {
                b.append("    ");
            } else if (type == Character.CONTROL || type == Character.FORMAT || type == Character.LINE_SEPARATOR
                    || type == Character.PARAGRAPH_SEPARATOR || type == Character.PRIVATE_USE || type == Character.UNASSIGNED
                    || type == Character.SURROGATE) {
                b.append(cp < 0x100 ? String.format("\\x%02X", cp) : String.format("\\u%04X", cp));
            } else {
                b.appendCodePoint(cp);
            }
        });
        return b.toString();
    }

    /**
     * The lines that differ between an earlier trusted version and this one, as {@code - 12: old}
     * and {@code + 12: new} (line numbers in their own version); empty when they are the same.
     */
    public static List<String> changes(String before, String after) {
        String[] a = before.split("\\r?\\n", -1), b = after.split("\\r?\\n", -1);
        if ((long) a.length * b.length > 4_000_000L) return List.of("(too long to compare line by line)");
        int[][] lcs = new int[a.length + 1][b.length + 1];
        for (int i = a.length - 1; i >= 0; i--) {
            for (int j = b.length - 1; j >= 0; j--) {
                lcs[i][j] = a[i].equals(b[j]) ? lcs[i + 1][j + 1] + 1 : Math.max(lcs[i + 1][j], lcs[i][j + 1]);
            }
        }
        List<String> out = new ArrayList<>();
        int i = 0, j = 0;
        while (i < a.length || j < b.length) {
            if (i < a.length && j < b.length && a[i].equals(b[j])) {
                i++;
                j++;
            } else if (j < b.length && (i >= a.length || lcs[i][j + 1] >= lcs[i + 1][j])) {
                out.add("+ " + (j + 1) + ": " + visible(b[j]));
                j++;
            } else {
                out.add("- " + (i + 1) + ": " + visible(a[i]));
                i++;
            }
        }
        return out;
    }

    /**
     * The review of {@code file} as lines to print: what it is, the risky lines, the changes since
     * {@code earlier} (the text trusted before at the same path, or null), then the whole text
     * numbered, control characters visible.
     */
    public static List<String> lines(Path file, String text, String earlier) {
        List<String> out = new ArrayList<>();
        String[] all = text.split("\\r?\\n", -1);
        int n = all.length > 0 && all[all.length - 1].isEmpty() ? all.length - 1 : all.length;
        out.add(visible(file.toString()) + " (" + n + " lines) is not trusted on this machine. A worksheet is code; read it first.");
        List<Risk> risks = risks(text);
        if (risks.isEmpty()) {
            out.add("No line reaches files, processes, the network, class loading or reflection, or ends the program.");
        } else {
            out.add("Lines that do more than calculate:");
            for (Risk r : risks) out.add("  ! " + r);
        }
        if (earlier != null) {
            List<String> ch = changes(earlier, text);
            out.add(ch.isEmpty() ? "Unchanged since it was last trusted at this path."
                    : "Changed since it was last trusted at this path (" + ch.size() + " lines):");
            for (String c : ch) out.add("  " + c);
        }
        out.add("The whole text:");
        int width = String.valueOf(n).length();
        for (int i = 0; i < n; i++) out.add(String.format("%" + width + "d | %s", i + 1, visible(all[i])));
        // the summary again, in one line, where the question will be asked
        if (!risks.isEmpty()) {
            out.add("Do more than calculate: " + String.join(", ", risks.stream().map(r -> "line " + r.line() + " (" + r.kind() + ")").distinct().toList()));
        }
        return out;
    }
}
