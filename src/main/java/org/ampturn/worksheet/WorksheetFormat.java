package org.ampturn.worksheet;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.ampturn.Ampturn;

/**
 * Reads and writes the {@code .atw} text format (DESIGN.md, "Worksheet format"):
 * <pre>
 * // ampturn worksheet 1
 * // title: Gate latch coil, 12 V
 * // tool: ampturn 0.1.0
 *
 * // a note
 * coil.inductance()
 * //= 2.103 mH
 * //= figure: gate-latch.figures/03-current.svg
 * //! while (true) {}
 * //= ! interrupted
 * </pre>
 * The header is the first run of {@code // key: value} lines after the first line. Code lines are
 * gathered line by line, like typed input, until the {@link Completeness} says the entry is whole.
 * {@code print(parse(t))} parses back to an equal worksheet, and gives {@code t} again for text
 * this class printed.
 */
public final class WorksheetFormat {
    private WorksheetFormat() {}

    /** The start of a worksheet's first line, before the format number. */
    public static final String MAGIC = "// ampturn worksheet ";
    private static final Pattern MAGIC_LINE = Pattern.compile("^// ampturn worksheet (\\d+)\\s*$");
    private static final Pattern HEADER_LINE = Pattern.compile("^// ([a-z][a-z0-9_-]*): (.*)$");
    private static final String RESULT = "//=";
    private static final String FIGURE = "figure: ";
    private static final String FAILED = "//!";

    static boolean isHeaderKey(String k) {
        return k != null && k.matches("[a-z][a-z0-9_-]*");
    }

    /** Parses a worksheet, splitting entries with the fallback bracket analysis. */
    public static Worksheet parse(String text) throws WorksheetFormatException {
        return parse(text, Completeness.BRACKETS);
    }

    /** Parses a worksheet, splitting entries with {@code completeness}. */
    public static Worksheet parse(String text, Completeness completeness) throws WorksheetFormatException {
        String[] lines = text.replace("\r\n", "\n").split("\n", -1);
        int n = lines.length;
        if (n > 0 && lines[n - 1].isEmpty()) n--; // the final newline
        int i = 0;
        if (n > 0 && lines[0].startsWith("\uFEFF")) lines[0] = lines[0].substring(1);
        Matcher magic = n == 0 ? null : MAGIC_LINE.matcher(lines[0]);
        if (magic == null || !magic.matches()) {
            String first = n == 0 ? "an empty file" : "\"" + abbreviate(lines[0]) + "\"";
            throw new WorksheetFormatException("not an Ampturn worksheet: the first line should be \"" + MAGIC + Worksheet.FORMAT
                    + "\", found " + first, 1);
        }
        int format;
        try {
            format = Integer.parseInt(magic.group(1));
        } catch (NumberFormatException e) {
            format = Integer.MAX_VALUE;
        }
        i = 1;
        Map<String, String> header = new LinkedHashMap<>();
        while (i < n) {
            Matcher h = HEADER_LINE.matcher(lines[i]);
            if (!h.matches()) break;
            header.put(h.group(1), h.group(2));
            i++;
        }
        String tool = header.getOrDefault("tool", "");
        if (format > Worksheet.FORMAT) {
            throw new WorksheetFormatException("worksheet format " + magic.group(1) + " is newer than this Ampturn "
                    + Ampturn.version() + " reads (format " + Worksheet.FORMAT + ")" + (tool.isEmpty() ? "" : "; it was written by " + tool)
                    + "; update Ampturn to open it", 1);
        }
        if (isNewerTool(tool, Ampturn.version())) {
            throw new WorksheetFormatException("written by " + tool + ", newer than this Ampturn " + Ampturn.version()
                    + "; its entries may use library calls this version lacks; update Ampturn to open it", 2);
        }
        if (i < n && lines[i].isEmpty()) i++; // the blank line after the header
        return body(lines, n, i, header, completeness, false);
    }

    /**
     * Parses entries given without a header (standard input of {@code ampturn run -}): lines are
     * numbered from 1 as given, and a line that starts with {@code #} (other than {@code #use}) is
     * kept as an entry of its own, which fails when it runs (see {@link Replay}), instead of refusing
     * all the input.
     */
    public static Worksheet parseEntries(String text, Completeness completeness) throws WorksheetFormatException {
        String[] lines = text.replace("\r\n", "\n").split("\n", -1);
        int n = lines.length;
        if (n > 0 && lines[n - 1].isEmpty()) n--;
        if (n > 0 && lines[0].startsWith("\uFEFF")) lines[0] = lines[0].substring(1);
        return body(lines, n, 0, new LinkedHashMap<>(), completeness, true);
    }

    private static Worksheet body(String[] lines, int n, int i, Map<String, String> header, Completeness completeness, boolean commandsAsEntries)
            throws WorksheetFormatException {
        List<Block> blocks = new ArrayList<>();
        List<Integer> starts = new ArrayList<>();
        StringBuilder pending = null;
        int pendingStart = 0;
        for (; i < n; i++) {
            String line = lines[i];
            if (pending != null && startsAfresh(pending, line)) {
                // an unfinished line followed by one that starts a statement: the unfinished one is an
                // entry of its own (the compiler says what it lacks), and does not swallow this one
                addEntry(blocks, starts, pending.toString(), pendingStart);
                pending = null;
            }
            if (pending != null) {
                pending.append('\n').append(line);
                if (completeness.isComplete(pending.toString()) && !continuedBelow(lines, i)) {
                    addEntry(blocks, starts, pending.toString(), pendingStart);
                    pending = null;
                }
                continue;
            }
            if (line.isBlank()) {
                blocks.add(new Block.Blank());
                starts.add(i + 1);
            } else if (line.startsWith(FAILED)) {
                String src = line.substring(FAILED.length());
                if (src.startsWith(" ")) src = src.substring(1);
                int last = blocks.size() - 1;
                if (last >= 0 && blocks.get(last) instanceof Block.Failed && ((Block.Failed) blocks.get(last)).results().isEmpty()) {
                    Block.Failed f = (Block.Failed) blocks.get(last);
                    blocks.set(last, new Block.Failed(f.source() + "\n" + src, List.of()));
                } else if (!src.isBlank()) {
                    blocks.add(new Block.Failed(src, List.of()));
                    starts.add(i + 1);
                }
            } else if (line.startsWith(RESULT) && !blocks.isEmpty() && blocks.get(blocks.size() - 1) instanceof Block.Failed) {
                Block.Failed f = (Block.Failed) blocks.get(blocks.size() - 1);
                String r = line.substring(RESULT.length());
                if (r.startsWith(" ")) r = r.substring(1);
                List<String> results = new ArrayList<>(f.results());
                results.add(r);
                blocks.set(blocks.size() - 1, new Block.Failed(f.source(), results));
            } else if (line.startsWith(RESULT)) {
                int last = blocks.size() - 1;
                if (last < 0 || !(blocks.get(last) instanceof Block.Entry)) {
                    throw new WorksheetFormatException("line " + (i + 1) + ": a recorded result (//=) must follow its entry directly, found \""
                            + abbreviate(line) + "\"", i + 1);
                }
                Block.Entry e = (Block.Entry) blocks.get(last);
                String r = line.substring(RESULT.length());
                if (r.startsWith(" ")) r = r.substring(1);
                List<String> results = new ArrayList<>(e.results());
                List<String> figures = new ArrayList<>(e.figures());
                if (r.startsWith(FIGURE)) figures.add(r.substring(FIGURE.length()).strip());
                else results.add(r);
                blocks.set(last, e.withRecord(results, figures));
            } else if (line.startsWith("//")) {
                String t = line.substring(2);
                blocks.add(new Block.Note(t.startsWith(" ") ? t.substring(1) : t));
                starts.add(i + 1);
            } else if (line.startsWith("#use ")) {
                blocks.add(new Block.Use(line.substring(5).strip()));
                starts.add(i + 1);
            } else if (line.startsWith("#") && commandsAsEntries) {
                addEntry(blocks, starts, line, i + 1);
            } else if (line.startsWith("#")) {
                throw new WorksheetFormatException("line " + (i + 1) + ": \"" + abbreviate(line)
                        + "\" is a console command; a worksheet may hold only #use lines", i + 1);
            } else {
                pending = new StringBuilder(line);
                pendingStart = i + 1;
                if (completeness.isComplete(line) && !continuedBelow(lines, i)) {
                    addEntry(blocks, starts, line, pendingStart);
                    pending = null;
                }
            }
        }
        if (pending != null) addEntry(blocks, starts, pending.toString(), pendingStart); // unfinished: the run reports it
        int[] at = starts.stream().mapToInt(Integer::intValue).toArray();
        return new Worksheet(header, blocks, at);
    }

    /**
     * True when {@code line} cannot continue the unfinished {@code pending} text: the pending text
     * is open only in round or square brackets or after an operator (not in a block, a comment or a
     * text block), and the line starts at its first column with a word or a number. A body of a
     * method or a class, open in a brace, is never cut.
     */
    static boolean startsAfresh(CharSequence pending, String line) {
        if (line.isEmpty() || !(Character.isJavaIdentifierStart(line.charAt(0)) || Character.isDigit(line.charAt(0)))) return false;
        String p = pending.toString();
        if (p.contains("\"\"\"") || p.contains("/*")) return false;
        int braces = 0, others = 0;
        boolean inString = false;
        char quote = 0;
        for (int k = 0; k < p.length(); k++) {
            char c = p.charAt(k);
            if (inString) {
                if (c == '\\') k++;
                else if (c == quote || c == '\n') inString = false;
                continue;
            }
            if (c == '/' && k + 1 < p.length() && p.charAt(k + 1) == '/') {
                int nl = p.indexOf('\n', k);
                if (nl < 0) break;
                k = nl;
                continue;
            }
            if (c == '"' || c == '\'') {
                inString = true;
                quote = c;
            } else if (c == '{') {
                braces++;
            } else if (c == '}') {
                braces--;
            } else if (c == '(' || c == '[') {
                others++;
            } else if (c == ')' || c == ']') {
                others--;
            }
        }
        return braces <= 0 && others > 0 && !inString;
    }

    /**
     * True when the line after {@code i} goes on with a method call ({@code .offAt(...)}): a chain
     * written one call a line is one entry, although its first line is already a whole statement.
     * No Java statement starts with a dot, so this never joins two entries.
     */
    static boolean continuedBelow(String[] lines, int i) {
        return i + 1 < lines.length && lines[i + 1].stripLeading().startsWith(".")
                && !lines[i + 1].stripLeading().startsWith("...");
    }

    private static void addEntry(List<Block> blocks, List<Integer> starts, String source, int line) {
        blocks.add(Block.Entry.of(source));
        starts.add(line);
    }

    /** The worksheet as {@code .atw} text, ending with a newline. */
    public static String print(Worksheet w) {
        StringBuilder sb = new StringBuilder();
        sb.append(MAGIC).append(Worksheet.FORMAT).append('\n');
        for (Map.Entry<String, String> e : w.header().entrySet()) sb.append("// ").append(e.getKey()).append(": ").append(e.getValue()).append('\n');
        if (!w.blocks().isEmpty()) sb.append('\n');
        for (Block b : w.blocks()) printBlock(sb, b);
        return sb.toString();
    }

    private static void printBlock(StringBuilder sb, Block b) {
        if (b instanceof Block.Blank) {
            sb.append('\n');
        } else if (b instanceof Block.Note) {
            String t = ((Block.Note) b).text();
            sb.append(t.isEmpty() ? "//" : "// " + t).append('\n');
        } else if (b instanceof Block.Use) {
            sb.append("#use ").append(((Block.Use) b).path()).append('\n');
        } else if (b instanceof Block.Failed) {
            Block.Failed f = (Block.Failed) b;
            for (String l : f.source().split("\n", -1)) sb.append(l.isEmpty() ? FAILED : FAILED + " " + l).append('\n');
            for (String r : f.results()) sb.append(r.isEmpty() ? RESULT : RESULT + " " + r).append('\n');
        } else {
            Block.Entry e = (Block.Entry) b;
            sb.append(e.source()).append('\n');
            for (String r : e.results()) sb.append(r.isEmpty() ? RESULT : RESULT + " " + r).append('\n');
            for (String f : e.figures()) sb.append(RESULT).append(' ').append(FIGURE).append(f).append('\n');
        }
    }

    /** The line each block starts on when printed. */
    static int[] printedLines(Worksheet w) {
        int[] at = new int[w.blocks().size()];
        int line = 1 + w.header().size() + (w.blocks().isEmpty() ? 0 : 1);
        for (int k = 0; k < at.length; k++) {
            at[k] = line + 1;
            StringBuilder sb = new StringBuilder();
            printBlock(sb, w.blocks().get(k));
            line += (int) sb.chars().filter(c -> c == '\n').count();
        }
        return at;
    }

    /** True when {@code tool} ("ampturn 0.2.0") names a later version than {@code ours} ("0.1.0"). */
    static boolean isNewerTool(String tool, String ours) {
        Matcher t = Pattern.compile("^ampturn (\\d+(?:\\.\\d+)*)").matcher(tool.strip());
        Matcher o = Pattern.compile("^(\\d+(?:\\.\\d+)*)").matcher(ours);
        if (!t.find() || !o.find()) return false;
        String[] a = t.group(1).split("\\."), b = o.group(1).split("\\.");
        for (int k = 0; k < Math.max(a.length, b.length); k++) {
            long x = k < a.length ? Long.parseLong(a[k]) : 0, y = k < b.length ? Long.parseLong(b[k]) : 0;
            if (x != y) return x > y;
        }
        return false;
    }

    private static String abbreviate(String s) {
        return s.length() <= 60 ? s : s.substring(0, 57) + "...";
    }
}
