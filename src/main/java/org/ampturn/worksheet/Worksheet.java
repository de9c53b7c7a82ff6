package org.ampturn.worksheet;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import org.ampturn.Ampturn;

/**
 * A worksheet: a header of {@code key: value} pairs (title, tool version, ...) and blocks in file
 * order (notes, entries with recorded results, blank lines, {@code #use} references). Immutable;
 * {@code with...} methods return changed copies. Two worksheets are equal when header and blocks
 * are; the source line numbers kept from parsing are not part of equality.
 */
public final class Worksheet {
    /** The format number this tool writes and reads. */
    public static final int FORMAT = 1;

    private final Map<String, String> header;
    private final List<Block> blocks;
    private final int[] parsedLines; // 1-based line of each block in the file it was read from, or null

    Worksheet(Map<String, String> header, List<Block> blocks, int[] parsedLines) {
        this.header = Collections.unmodifiableMap(new LinkedHashMap<>(header));
        this.blocks = List.copyOf(blocks);
        this.parsedLines = parsedLines != null && parsedLines.length == blocks.size() ? parsedLines.clone() : null;
    }

    /** A new worksheet with a title and this tool's version in its header. */
    public static Worksheet titled(String title) {
        Map<String, String> h = new LinkedHashMap<>();
        if (title != null && !title.isBlank()) h.put("title", title.strip());
        h.put("tool", "ampturn " + Ampturn.version());
        return new Worksheet(h, List.of(), null);
    }

    /** A worksheet from a header and blocks. Header keys are lower-case words; values are one line. */
    public static Worksheet of(Map<String, String> header, List<Block> blocks) {
        for (Map.Entry<String, String> e : header.entrySet()) {
            if (!WorksheetFormat.isHeaderKey(e.getKey())) {
                throw new IllegalArgumentException("header key \"" + e.getKey() + "\" must be a lower-case word (letters, digits, - or _)");
            }
            if (e.getValue() == null || e.getValue().contains("\n")) {
                throw new IllegalArgumentException("header value for " + e.getKey() + " must be one line, got " + e.getValue());
            }
        }
        return new Worksheet(header, blocks, null);
    }

    public Map<String, String> header() {
        return header;
    }

    /** The header's title, or "" when there is none. */
    public String title() {
        return header.getOrDefault("title", "");
    }

    /** The tool that wrote it, e.g. {@code ampturn 0.1.0}, or "" when unknown. */
    public String tool() {
        return header.getOrDefault("tool", "");
    }

    public List<Block> blocks() {
        return blocks;
    }

    /** The entries, in order. */
    public List<Block.Entry> entries() {
        List<Block.Entry> out = new ArrayList<>();
        for (Block b : blocks) if (b instanceof Block.Entry) out.add((Block.Entry) b);
        return out;
    }

    /** The 1-based line where block {@code index} starts: as read from the file, else as it would print. */
    public int lineOf(int index) {
        Objects.checkIndex(index, blocks.size());
        if (parsedLines != null) return parsedLines[index];
        return WorksheetFormat.printedLines(this)[index];
    }

    /** A copy with one header value set (added at the end when the key is new). */
    public Worksheet withHeader(String key, String value) {
        Map<String, String> h = new LinkedHashMap<>(header);
        h.put(key, value);
        return of(h, blocks);
    }

    /** A copy with a block added at the end. */
    public Worksheet with(Block block) {
        List<Block> b = new ArrayList<>(blocks);
        b.add(Objects.requireNonNull(block, "block"));
        return new Worksheet(header, b, null);
    }

    /** A copy with other blocks. */
    public Worksheet withBlocks(List<Block> newBlocks) {
        return new Worksheet(header, newBlocks, null);
    }

    /**
     * A copy without its last entry, failed or not (and any notes and blanks after it); unchanged
     * when there is none.
     */
    public Worksheet withoutLastEntry() {
        int i = lastEntryIndex();
        return i < 0 ? this : new Worksheet(header, blocks.subList(0, i), null);
    }

    /** The index of the last entry block, failed or not, or -1. */
    public int lastEntryIndex() {
        for (int i = blocks.size() - 1; i >= 0; i--) {
            if (blocks.get(i) instanceof Block.Entry || blocks.get(i) instanceof Block.Failed) return i;
        }
        return -1;
    }

    /** The entries that failed or were stopped, in order (kept as records, never run). */
    public List<Block.Failed> failed() {
        List<Block.Failed> out = new ArrayList<>();
        for (Block b : blocks) if (b instanceof Block.Failed) out.add((Block.Failed) b);
        return out;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Worksheet && ((Worksheet) o).header.equals(header) && ((Worksheet) o).blocks.equals(blocks);
    }

    @Override
    public int hashCode() {
        return header.hashCode() * 31 + blocks.hashCode();
    }

    @Override
    public String toString() {
        long notes = blocks.stream().filter(b -> b instanceof Block.Note).count();
        String t = title().isEmpty() ? "untitled" : "\"" + title() + "\"";
        return "worksheet " + t + ", " + entries().size() + " entries, " + notes + " notes";
    }
}
