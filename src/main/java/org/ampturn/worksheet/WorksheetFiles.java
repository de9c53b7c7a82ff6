package org.ampturn.worksheet;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.channels.Channels;
import java.nio.channels.FileChannel;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;

/**
 * Reading worksheet files, and saving them so that a failure never damages the old file: the text
 * goes to a temporary file in the same directory, is forced to disk, and is then renamed over the
 * target with an atomic move.
 */
public final class WorksheetFiles {
    private WorksheetFiles() {}

    /** Writes bytes to an open stream; tests inject one that fails part-way. */
    @FunctionalInterface
    public interface Writer {
        void write(OutputStream out, byte[] bytes) throws IOException;

        Writer PLAIN = OutputStream::write;
    }

    /** The folder where a worksheet's charts live: {@code <name>.figures/} beside the file. */
    public static Path figuresFolder(Path worksheet) {
        String n = worksheet.getFileName().toString().replaceFirst("\\.atw$", "");
        return worksheet.toAbsolutePath().getParent().resolve(n + ".figures");
    }

    /** Reads a worksheet; errors name the file. */
    public static Worksheet read(Path file, Completeness completeness) throws IOException, WorksheetFormatException {
        return parse(file, readBytes(file), completeness);
    }

    /**
     * The file's bytes, read once: the caller checks trust on these bytes and parses the same ones
     * ({@link #parse}), so a file swapped between the check and the run cannot run unchecked.
     */
    public static byte[] readBytes(Path file) throws IOException {
        try {
            return Files.readAllBytes(file);
        } catch (NoSuchFileException e) {
            throw new NoSuchFileException(file.toString(), null, "no such file");
        }
    }

    /** Parses bytes read from {@code file}; errors name the file. */
    public static Worksheet parse(Path file, byte[] bytes, Completeness completeness) throws IOException, WorksheetFormatException {
        String text = decode(bytes, file.toString());
        try {
            return WorksheetFormat.parse(text, completeness);
        } catch (WorksheetFormatException e) {
            throw new WorksheetFormatException(file + ": " + e.getMessage(), e.line());
        }
    }

    /** The file as UTF-8 text; a file that is not UTF-8 text is refused with a clear message. */
    public static String readText(Path file) throws IOException {
        byte[] bytes;
        try {
            bytes = Files.readAllBytes(file);
        } catch (NoSuchFileException e) {
            throw new NoSuchFileException(file.toString(), null, "no such file");
        }
        return decode(bytes, file.toString());
    }

    /**
     * The bytes as UTF-8 text; text that is not UTF-8 is refused with the line and the byte where
     * it stops being UTF-8 ({@code name} says whose bytes they are in the message).
     */
    public static String decode(byte[] bytes, String name) throws IOException {
        java.nio.ByteBuffer in = java.nio.ByteBuffer.wrap(bytes);
        java.nio.CharBuffer out = java.nio.CharBuffer.allocate(bytes.length);
        java.nio.charset.CoderResult r = StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT).decode(in, out, true);
        if (r.isError()) {
            int at = in.position();
            int line = 1, lineStart = 0;
            for (int k = 0; k < at; k++) {
                if (bytes[k] == '\n') {
                    line++;
                    lineStart = k + 1;
                }
            }
            throw new IOException(name + " is not UTF-8 text: line " + line + ", byte " + (at - lineStart + 1) + " of the line (0x"
                    + String.format("%02X", bytes[at] & 0xFF) + ", byte " + (at + 1) + " of the file); save it as UTF-8");
        }
        out.flip();
        return out.toString();
    }

    /** Saves the worksheet atomically; returns the bytes written (for the trust store). */
    public static byte[] save(Worksheet w, Path target) throws SaveException {
        return saveText(WorksheetFormat.print(w), target, Writer.PLAIN);
    }

    /** Writes {@code text} to {@code target} through a temporary file and an atomic rename. */
    public static byte[] saveText(String text, Path target, Writer writer) throws SaveException {
        Path abs = target.toAbsolutePath();
        try {
            // a symbolic link stays a link: the file it points to is replaced
            if (Files.isSymbolicLink(abs)) abs = abs.toRealPath();
        } catch (IOException e) {
            throw new SaveException(target, true, e);
        }
        removeStaleTemporaries(abs);
        boolean existed = Files.exists(abs);
        byte[] bytes = text.getBytes(StandardCharsets.UTF_8);
        Path tmp = null;
        try {
            Path dir = abs.getParent();
            tmp = Files.createTempFile(dir, "." + abs.getFileName() + ".", ".tmp");
            keepPermissions(existed ? abs : null, tmp);
            try (FileChannel ch = FileChannel.open(tmp, StandardOpenOption.WRITE, StandardOpenOption.TRUNCATE_EXISTING)) {
                OutputStream out = Channels.newOutputStream(ch);
                writer.write(out, bytes);
                out.flush();
                ch.force(true);
            }
            try {
                Files.move(tmp, abs, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                throw new IOException("this file system cannot rename atomically", e);
            }
            tmp = null;
            forceDirectory(dir);
            return bytes;
        } catch (IOException | RuntimeException e) {
            throw new SaveException(target, existed, e);
        } finally {
            if (tmp != null) {
                try {
                    Files.deleteIfExists(tmp);
                } catch (IOException ignored) {
                    // the temporary file is harmless; the message already says the save failed
                }
            }
        }
    }

    /**
     * Deletes temporary files of earlier saves of {@code target} that a killed process left behind
     * ({@code .NAME.*.tmp} beside it, older than a minute, so a save in progress elsewhere is spared).
     */
    private static void removeStaleTemporaries(Path target) {
        Path dir = target.getParent();
        String prefix = "." + target.getFileName() + ".";
        long old = System.currentTimeMillis() - 60_000;
        try (java.util.stream.Stream<Path> s = Files.list(dir)) {
            for (Path p : s.filter(p -> p.getFileName().toString().startsWith(prefix) && p.getFileName().toString().endsWith(".tmp")).toList()) {
                try {
                    if (Files.getLastModifiedTime(p).toMillis() < old) Files.deleteIfExists(p);
                } catch (IOException ignored) {
                    // another process's file, or gone already
                }
            }
        } catch (IOException | RuntimeException ignored) {
            // tidying is a courtesy
        }
    }

    /** The new file gets the old file's permissions, or rw-r--r-- for a new one (a temporary file starts private). */
    private static void keepPermissions(Path old, Path tmp) {
        try {
            java.util.Set<java.nio.file.attribute.PosixFilePermission> p = old != null ? Files.getPosixFilePermissions(old)
                    : java.nio.file.attribute.PosixFilePermissions.fromString("rw-r--r--");
            Files.setPosixFilePermissions(tmp, p);
        } catch (IOException | UnsupportedOperationException ignored) {
            // not a POSIX file system: the platform's defaults apply
        }
    }

    /** Makes the rename itself durable where the platform allows opening a directory. */
    private static void forceDirectory(Path dir) {
        try (FileChannel ch = FileChannel.open(dir, StandardOpenOption.READ)) {
            ch.force(true);
        } catch (IOException | UnsupportedOperationException ignored) {
            // not possible on every platform; the rename is still atomic
        }
    }
}
