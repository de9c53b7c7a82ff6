package org.ampturn.worksheet;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * The unsaved work in the journal of a session that ended without saving: the worksheet file it
 * was on (or none) and the notes, entries and undos made since that file was last opened or saved.
 */
public final class Recovery {
    private final Path journal;
    private final long pid;
    private final Path worksheet;
    private final List<Block> blocks; // unsaved notes and entries, undos applied
    private final int undosPastBase;
    private final boolean sealed;

    private Recovery(Path journal, long pid, Path worksheet, List<Block> blocks, int undosPastBase, boolean sealed) {
        this.journal = journal;
        this.pid = pid;
        this.worksheet = worksheet;
        this.blocks = List.copyOf(blocks);
        this.undosPastBase = undosPastBase;
        this.sealed = sealed;
    }

    /** True when every record carries this tool's seal for this user: only such a journal is recovered. */
    public boolean sealed() {
        return sealed;
    }

    /** Reads a journal, checking its seals with the key beside its folder. */
    public static Recovery read(Path journal) throws IOException {
        return read(journal, Journal.key(journal.toAbsolutePath().getParent()));
    }

    /**
     * Reads a journal. A record counts only when its seal (see {@link Journal}) matches under
     * {@code key}; a journal with any record that does not is not this tool's ({@link #sealed()} false).
     */
    static Recovery read(Path journal, byte[] key) throws IOException {
        List<String> lines = List.of(new String(Files.readAllBytes(journal), StandardCharsets.UTF_8).split("\n", -1));
        if (lines.isEmpty() || !lines.get(0).equals(Journal.MAGIC)) throw new IOException(journal + " is not a journal");
        javax.crypto.Mac mac = Journal.mac(key);
        long pid = -1;
        Path base = null;
        List<Block> blocks = new ArrayList<>();
        int undos = 0;
        boolean sealed = true;
        String[] saving = null; // path and SHA-256 of a save that may not have finished
        List<String> rec = new ArrayList<>();
        for (int i = 0; i < lines.size(); i++) {
            String l = lines.get(i);
            boolean last = i == lines.size() - 1;
            byte[] bytes = (last ? l : l + "\n").getBytes(StandardCharsets.UTF_8);
            if (l.equals(".") || l.startsWith(". ")) {
                if (!l.equals(". " + Journal.seal(mac))) {
                    sealed = false; // not written by this tool with this key
                    break;
                }
                mac.update(bytes);
                // a whole record: apply it
                char tag = rec.isEmpty() ? '?' : rec.get(0).charAt(0);
                String arg = rec.isEmpty() ? "" : rec.get(0).length() > 2 ? rec.get(0).substring(2) : "";
                switch (tag) {
                    case 'o':
                    case 's':
                        base = arg.equals("-") ? null : Path.of(arg);
                        blocks.clear();
                        undos = 0;
                        saving = null;
                        break;
                    case 'p': {
                        int sp = arg.lastIndexOf(' ');
                        saving = sp > 0 ? new String[] {arg.substring(0, sp), arg.substring(sp + 1)} : null;
                        break;
                    }
                    case 'n':
                        blocks.add(new Block.Note(arg));
                        break;
                    case 'x':
                        blocks.add(new Block.Use(arg));
                        break;
                    case 'u':
                        int lastEntry = lastEntry(blocks);
                        if (lastEntry >= 0) blocks.subList(lastEntry, blocks.size()).clear();
                        else undos++;
                        break;
                    case 'e':
                        blocks.add(entry(rec));
                        break;
                    case 'F':
                        Block.Entry e = entry(rec);
                        blocks.add(new Block.Failed(e.source(), e.results()));
                        break;
                    default:
                        break;
                }
                rec.clear();
                continue;
            }
            mac.update(bytes);
            if (l.startsWith("// pid: ")) {
                pid = Long.parseLong(l.substring(8).strip());
            } else if (l.length() >= 1 && !l.startsWith("//")) {
                rec.add(l);
            }
        }
        // lines left in rec belong to a record torn by the crash: it was never shown, so it is dropped
        if (saving != null) {
            // killed between the save's rename and its journal record: if the file holds what was
            // being saved, the work is in it and nothing is to be brought back twice
            Path f = Path.of(saving[0]);
            try {
                if (Files.exists(f) && TrustStore.hash(Files.readAllBytes(f)).equals(saving[1])) {
                    base = f;
                    blocks.clear();
                    undos = 0;
                }
            } catch (IOException ignored) {
                // the file cannot be read: recover the journal's own record of the work
            }
        }
        return new Recovery(journal, pid, base, blocks, undos, sealed);
    }

    private static int lastEntry(List<Block> blocks) {
        for (int i = blocks.size() - 1; i >= 0; i--) if (blocks.get(i) instanceof Block.Entry || blocks.get(i) instanceof Block.Failed) return i;
        return -1;
    }

    private static Block.Entry entry(List<String> rec) {
        List<String> src = new ArrayList<>(), res = new ArrayList<>(), fig = new ArrayList<>();
        for (String l : rec) {
            String body = l.length() > 2 ? l.substring(2) : "";
            switch (l.charAt(0)) {
                case 'e': case 'F': src.add(body); break;
                case '=': res.add(body); break;
                case 'f': fig.add(body); break;
                default: break;
            }
        }
        return new Block.Entry(String.join("\n", src), res, fig);
    }

    /** The journal file this came from. */
    public Path journal() {
        return journal;
    }

    /** The process that wrote it. */
    public long pid() {
        return pid;
    }

    /** The worksheet file the session was on, or null for a new worksheet. */
    public Path worksheet() {
        return worksheet;
    }

    /** The unsaved notes and entries, in order. */
    public List<Block> blocks() {
        return blocks;
    }

    /** The unsaved entries. */
    public List<Block.Entry> entries() {
        return blocks.stream().filter(b -> b instanceof Block.Entry).map(b -> (Block.Entry) b).toList();
    }

    /** How many entries of the base file were taken back before anything new was added. */
    int undosPastBase() {
        return undosPastBase;
    }

    /** True when there is nothing to recover. */
    public boolean isEmpty() {
        return blocks.isEmpty() && undosPastBase == 0;
    }

    /** The worksheet as the session had it: {@code base} (the file's saved content) plus the unsaved work. */
    public Worksheet applyTo(Worksheet base) {
        Worksheet w = base;
        for (int k = 0; k < undosPastBase; k++) w = w.withoutLastEntry();
        for (Block b : blocks) w = w.with(b);
        return w;
    }

    /** Deletes the journal once its work is restored (or the user declines it). */
    public void discard() throws IOException {
        Files.deleteIfExists(journal);
    }

    @Override
    public String toString() {
        long notes = blocks.stream().filter(b -> b instanceof Block.Note).count();
        return "unsaved work of an ended session: " + entries().size() + " entries, " + notes + " notes, on "
                + (worksheet == null ? "a new worksheet" : worksheet.toString()) + " (" + journal.getFileName() + ")";
    }
}
