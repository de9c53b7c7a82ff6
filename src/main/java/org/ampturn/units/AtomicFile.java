package org.ampturn.units;

import java.io.IOException;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.nio.channels.Channels;
import java.nio.channels.FileChannel;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.PosixFilePermission;
import java.util.Set;
import java.util.concurrent.ThreadLocalRandom;

/**
 * Writes a file so that a reader never sees half of it and a failure leaves the old file whole: the
 * bytes go to a hidden temporary file in the target's folder, are forced to disk, and the temporary
 * file is then renamed over the target.
 *
 * <p>Permissions: a new file gets what any program of the user gets, the operating system's default
 * for new files less the user's umask (usually rw-r--r--), because the temporary file is created
 * plainly rather than with {@code Files.createTempFile}, which makes it private (rw-------). A file
 * that already exists keeps its permissions.
 */
public final class AtomicFile {
    private AtomicFile() {}

    /** Writes the content to an open stream. */
    @FunctionalInterface
    public interface Content {
        void writeTo(OutputStream out) throws IOException;
    }

    /** Writes {@code bytes} to {@code target} atomically; returns the absolute path. */
    public static Path write(Path target, byte[] bytes) {
        return write(target, out -> out.write(bytes));
    }

    /**
     * Writes what {@code content} produces to {@code target} atomically, creating missing folders;
     * returns the absolute path. Fails with an {@link UncheckedIOException} that names the file.
     */
    public static Path write(Path target, Content content) {
        if (target == null) throw new IllegalArgumentException("the file to write is missing (null)");
        Path abs = target.toAbsolutePath().normalize();
        Path dir = abs.getParent();
        Path tmp = null;
        try {
            if (Files.isDirectory(abs)) throw new IOException("it is a folder");
            Files.createDirectories(dir);
            tmp = createTemp(dir, abs.getFileName().toString());
            keepPermissions(abs, tmp);
            try (FileChannel ch = FileChannel.open(tmp, StandardOpenOption.WRITE)) {
                OutputStream out = Channels.newOutputStream(ch);
                content.writeTo(out);
                out.flush();
                ch.force(true);
            }
            try {
                Files.move(tmp, abs, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(tmp, abs, StandardCopyOption.REPLACE_EXISTING);
            }
            tmp = null;
            return abs;
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write " + target + ": " + describe(e), e);
        } finally {
            if (tmp != null) {
                try {
                    Files.deleteIfExists(tmp);
                } catch (IOException ignored) {
                    // the message already says the write failed; a stray hidden file is harmless
                }
            }
        }
    }

    /** A new hidden file beside the target, created with the default permissions (umask applies). */
    private static Path createTemp(Path dir, String name) throws IOException {
        for (int attempt = 0; ; attempt++) {
            Path tmp = dir.resolve("." + name + "." + Long.toUnsignedString(ThreadLocalRandom.current().nextLong(), 36) + ".tmp");
            try {
                Files.newOutputStream(tmp, StandardOpenOption.CREATE_NEW, StandardOpenOption.WRITE).close();
                return tmp;
            } catch (FileAlreadyExistsException e) {
                if (attempt > 20) throw e;
            }
        }
    }

    private static void keepPermissions(Path old, Path tmp) {
        if (!Files.exists(old)) return;
        try {
            Set<PosixFilePermission> p = Files.getPosixFilePermissions(old);
            Files.setPosixFilePermissions(tmp, p);
        } catch (IOException | UnsupportedOperationException ignored) {
            // not a POSIX file system: the platform's defaults apply
        }
    }

    private static String describe(IOException e) {
        String m = e.getMessage();
        if (e instanceof java.nio.file.AccessDeniedException) return "permission denied";
        if (e instanceof java.nio.file.NoSuchFileException) return "no such folder";
        if (e instanceof java.nio.file.FileSystemException fse && fse.getReason() != null) return fse.getReason();
        return m == null ? e.getClass().getSimpleName() : m;
    }
}
