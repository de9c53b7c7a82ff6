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
 * <p>Format (UTF-8 text, one record per {@code write}, each record ending with a line of a
 * {@code .} and the record's seal; a torn last record is ignored). The seal is an HMAC-SHA256, under
 * a per-user key kept beside the journals ({@code journal.key}, readable by its owner only), of the
 * journal's bytes up to the seal's line: recovery restores only records this tool wrote, so a
 * journal planted in the folder runs nothing. A record whose write failed (a full disk) is cut off
 * again and written once writing works, before the next one, so no later record lands without it:
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
 * p /home/me/gate.atw 3f1c… saving: the file will hold the text of that SHA-256
 * s /home/me/gate.atw       saved: everything so far is in that file
 * . 9a0b…                   the end of a record and its seal
 * </pre>
 */
public final class Journal implements Closeable {
    static final String MAGIC = "// ampturn journal 1";

    private final Path file;
    private final FileChannel channel;
    /** The seal's state over every byte written and kept so far. */
    private javax.crypto.Mac sealed;
    /** The file's length after the last whole record. */
    private long good;
    /** Records whose write failed, to be written before the next one. */
    private final List<String> pending = new ArrayList<>();
    /** For tests: the next write stops half-way with this error (a full disk). */
    IOException failNext;

    private Journal(Path file, FileChannel channel, javax.crypto.Mac mac) {
        this.file = file;
        this.channel = channel;
        this.sealed = mac;
    }

    /** The per-user key of the seals: {@code journal.key} beside the journal folder, made (owner-only) on first use. */
    static byte[] key(Path dir) throws IOException {
        Path k = dir.toAbsolutePath().resolveSibling("journal.key");
        if (Files.exists(k)) return Files.readAllBytes(k);
        Files.createDirectories(k.getParent());
        byte[] key = new byte[32];
        new java.security.SecureRandom().nextBytes(key);
        Path tmp = Files.createTempFile(k.getParent(), ".journal.key.", ".tmp");
        try {
            try {
                Files.setPosixFilePermissions(tmp, java.nio.file.attribute.PosixFilePermissions.fromString("rw-------"));
            } catch (UnsupportedOperationException ignored) {
                // not a POSIX file system
            }
            Files.write(tmp, key);
            try {
                Files.move(tmp, k, java.nio.file.StandardCopyOption.ATOMIC_MOVE);
            } catch (java.nio.file.FileAlreadyExistsException raced) {
                // another console made it first: use that one
            }
        } finally {
            Files.deleteIfExists(tmp);
        }
        return Files.readAllBytes(k);
    }

    static javax.crypto.Mac mac(byte[] key) {
        try {
            javax.crypto.Mac m = javax.crypto.Mac.getInstance("HmacSHA256");
            m.init(new javax.crypto.spec.SecretKeySpec(key, "HmacSHA256"));
            return m;
        } catch (java.security.GeneralSecurityException e) {
            throw new IllegalStateException("this Java lacks HmacSHA256", e);
        }
    }

    static String seal(javax.crypto.Mac state) {
        try {
            return java.util.HexFormat.of().formatHex(((javax.crypto.Mac) state.clone()).doFinal());
        } catch (CloneNotSupportedException e) {
            throw new IllegalStateException(e);
        }
    }

    static javax.crypto.Mac copy(javax.crypto.Mac m) {
        try {
            return (javax.crypto.Mac) m.clone();
        } catch (CloneNotSupportedException e) {
            throw new IllegalStateException(e);
        }
    }

    /** Starts a new journal for this process in {@code dir} (created when missing). */
    public static Journal start(Path dir) throws IOException {
        return start(dir, ProcessHandle.current().pid());
    }

    /** A journal that names {@code pid} as its writer (tests write the journals of dead processes with it). */
    static Journal start(Path dir, long pid) throws IOException {
        Files.createDirectories(dir);
        String stamp = LocalDateTime.now().format(DateTimeFormatter.ofPattern("yyyyMMdd-HHmmss"));
        Path f = dir.resolve(stamp + "-" + pid + ".journal");
        for (int k = 2; Files.exists(f); k++) f = dir.resolve(stamp + "-" + pid + "-" + k + ".journal");
        javax.crypto.Mac mac = mac(key(dir));
        FileChannel ch = FileChannel.open(f, StandardOpenOption.CREATE_NEW, StandardOpenOption.WRITE);
        Journal j = new Journal(f, ch, mac);
        byte[] head = (MAGIC + "\n// pid: " + pid + "\n").getBytes(StandardCharsets.UTF_8);
        j.writeAt(head);
        j.sealed.update(head);
        j.good = head.length;
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

    /** A save of {@code worksheet} with the text of this SHA-256 is about to happen (a kill may come before {@link #saved}). */
    public void saving(Path worksheet, String sha256) throws IOException {
        record("p " + worksheet.toAbsolutePath().normalize() + " " + sha256 + "\n");
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

    /**
     * Appends a record and its seal, forced to disk. Records whose write failed before go first; a
     * failed write is cut off again, so the file always ends with a whole record.
     */
    private synchronized void record(String body) throws IOException {
        pending.add(body);
        while (!pending.isEmpty()) {
            javax.crypto.Mac next = copy(sealed);
            byte[] b = pending.get(0).getBytes(StandardCharsets.UTF_8);
            next.update(b);
            byte[] end = (". " + seal(next) + "\n").getBytes(StandardCharsets.UTF_8);
            byte[] all = new byte[b.length + end.length];
            System.arraycopy(b, 0, all, 0, b.length);
            System.arraycopy(end, 0, all, b.length, end.length);
            try {
                writeAt(all);
            } catch (IOException e) {
                try {
                    channel.truncate(good);
                } catch (IOException ignored) {
                    // the reader drops a record without its seal line anyway
                }
                throw e;
            }
            next.update(end);
            sealed = next;
            good += all.length;
            pending.remove(0);
        }
    }

    private void writeAt(byte[] bytes) throws IOException {
        ByteBuffer b = ByteBuffer.wrap(bytes);
        if (failNext != null) {
            IOException e = failNext;
            failNext = null;
            b.limit(bytes.length / 2);
            while (b.hasRemaining()) channel.write(b, good + b.position());
            throw e;
        }
        while (b.hasRemaining()) channel.write(b, good + b.position());
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
        byte[] key = key(dir);
        for (Path f : files) {
            Recovery r;
            try {
                r = Recovery.read(f, key);
            } catch (IOException | RuntimeException e) {
                continue; // not ours or unreadable; leave it alone
            }
            if (!r.sealed()) continue; // not written by this tool for this user: never offered, never run
            if (r.pid() == ProcessHandle.current().pid() || ProcessHandle.of(r.pid()).map(ProcessHandle::isAlive).orElse(false)) continue;
            if (r.isEmpty()) Files.deleteIfExists(f);
            else out.add(0, r);
        }
        return out;
    }
}
