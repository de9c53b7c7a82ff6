package org.ampturn.worksheet;

import java.io.Closeable;
import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.time.LocalDateTime;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;

/**
 * The session's journal: every change to the worksheet (an evaluated entry with its results, a note,
 * an undo, opening or saving a file) is appended to a file under {@link AmpturnHome#journals()} and
 * forced to disk ({@link FileChannel#force}) before the caller shows its result. A console killed
 * at any moment therefore loses nothing that was shown; the next start finds the journal of the
 * dead process ({@link #unfinished}) and {@code #recover} restores it. A clean exit deletes the
 * journal.
 *
 * <p>Format (UTF-8 text, one record per {@code write}, each record ending with a {@code .} line;
 * a torn last record is ignored):
 * <pre>
 * // ampturn journal 1
 * // pid: 4242
 * o /home/me/gate.atw      the worksheet now is that file as it is on disk ("-" for a new one)
 * e var L = mH(4.7);        an entry's source lines ...
 * F while (true) {}         ... or a failed entry's (then its results with "=")
 * = L = 4.700 mH            ... its recorded results ...
 * f gate.figures/01.svg     ... and figures
 * n a note                  a note
 * x shared/coils.atw        a #use line
 * u                         undo of the last entry
 * s /home/me/gate.atw       saved: everything so far is in that file
 * .
 * </pre>
 */
public final class Journal implements Closeable {
    static final String MAGIC = "// ampturn journal 1";

    private final Path file;
    private final FileChannel channel;

    private Journal(Path file, FileChannel channel) {
        this.file = file;
        this.channel = channel;
    }

    /** Starts a new journal for this process in {@code dir} (created when missing). */
    public static Journal start(Path dir) throws IOException {
        Files.createDirectories(dir);
        long pid = ProcessHandle.current().pid();
        String stamp = LocalDateTime.now().format(DateTimeFormatter.ofPattern("yyyyMMdd-HHmmss"));
        Path f = dir.resolve(stamp + "-" + pid + ".journal");
        for (int k = 2; Files.exists(f); k++) f = dir.resolve(stamp + "-" + pid + "-" + k + ".journal");
        FileChannel ch = FileChannel.open(f, StandardOpenOption.CREATE_NEW, StandardOpenOption.WRITE, StandardOpenOption.APPEND);
        Journal j = new Journal(f, ch);
        j.write(MAGIC + "\n// pid: " + pid + "\n");
        return j;
    }

    /** The journal file. */
    public Path file() {
        return file;
    }

    /** The worksheet is now {@code worksheet} as it is on disk, or a new empty one (null). */
    public void opened(Path worksheet) throws IOException {
        record("o " + (worksheet == null ? "-" : worksheet.toAbsolutePath().normalize()) + "\n");
    }

    /** Everything so far is saved in {@code worksheet}. */
    public void saved(Path worksheet) throws IOException {
        record("s " + worksheet.toAbsolutePath().normalize() + "\n");
    }

    /** An evaluated entry with its recorded results; on disk when this returns. */
    public void entry(Block.Entry e) throws IOException {
        StringBuilder sb = new StringBuilder();
        for (String l : e.source().split("\n", -1)) sb.append("e ").append(l).append('\n');
        for (String r : e.results()) for (String l : r.split("\n", -1)) sb.append("= ").append(l).append('\n');
        for (String f : e.figures()) sb.append("f ").append(f).append('\n');
        record(sb.toString());
    }

    /** An entry that failed or was stopped, with what it gave; on disk when this returns. */
    public void failed(Block.Failed f) throws IOException {
        StringBuilder sb = new StringBuilder();
        for (String l : f.source().split("\n", -1)) sb.append("F ").append(l).append('\n');
        for (String r : f.results()) for (String l : r.split("\n", -1)) sb.append("= ").append(l).append('\n');
        record(sb.toString());
    }

    public void note(String text) throws IOException {
        record("n " + text + "\n");
    }

    /** A {@code #use} line was added. */
    public void use(String path) throws IOException {
        record("x " + path + "\n");
    }

    /** The last entry was taken back. */
    public void undo() throws IOException {
        record("u\n");
    }

    private void record(String body) throws IOException {
        write(body + ".\n");
    }

    private synchronized void write(String s) throws IOException {
        ByteBuffer b = ByteBuffer.wrap(s.getBytes(StandardCharsets.UTF_8));
        while (b.hasRemaining()) channel.write(b);
        channel.force(false);
    }

    /** Ends the journal of a session that ended cleanly: nothing needs recovering, so it is deleted. */
    @Override
    public void close() throws IOException {
        channel.close();
        Files.deleteIfExists(file);
    }

    /** Closes the file but keeps it (for tests that simulate a crash without a second process). */
    void abandon() throws IOException {
        channel.close();
    }

    /**
     * Journals in {@code dir} left by processes that are no longer running and that hold unsaved
     * work, newest first. Journals of dead processes with nothing unsaved are deleted.
     */
    public static List<Recovery> unfinished(Path dir) throws IOException {
        List<Recovery> out = new ArrayList<>();
        if (!Files.isDirectory(dir)) return out;
        List<Path> files;
        try (Stream<Path> s = Files.list(dir)) {
            files = s.filter(p -> p.getFileName().toString().endsWith(".journal")).sorted().toList();
        }
        for (Path f : files) {
            Recovery r;
            try {
                r = Recovery.read(f);
            } catch (IOException | RuntimeException e) {
                continue; // not ours or unreadable; leave it alone
            }
            if (r.pid() == ProcessHandle.current().pid() || ProcessHandle.of(r.pid()).map(ProcessHandle::isAlive).orElse(false)) continue;
            if (r.isEmpty()) Files.deleteIfExists(f);
            else out.add(0, r);
        }
        return out;
    }
}
