package org.ampturn.worksheet;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HashSet;
import java.util.HexFormat;
import java.util.List;
import java.util.Set;

/**
 * Which worksheets may run on this machine. A worksheet is code, so one is trusted only when its
 * exact content (SHA-256) is in the user's trust store ({@link AmpturnHome#trustStore()}), or when
 * it is a demo worksheet that ships with the tool (a file under {@code worksheets/} of the tool's
 * directory). Saving on this machine adds the saved content. The store is a text file, one
 * {@code <sha256-hex> <path>} line per trusted content; the path is only a reminder.
 */
public final class TrustStore {
    private final Path store;
    private final Path demoDir;

    private TrustStore(Path store, Path demoDir) {
        this.store = store;
        this.demoDir = demoDir;
    }

    /** The user's store, with the tool's demo directory (see {@link #toolDemoDirectory()}). */
    public static TrustStore user() {
        return of(AmpturnHome.trustStore(), toolDemoDirectory());
    }

    /** A store in {@code file}; worksheets under {@code demoDir} (may be null) are trusted as shipped. */
    public static TrustStore of(Path file, Path demoDir) {
        return new TrustStore(file, demoDir == null ? null : demoDir.toAbsolutePath().normalize());
    }

    /**
     * The demo worksheets' directory: {@code worksheets/} next to the tool's jar's {@code target/}
     * (or classes) directory, or the directory named by the system property {@code ampturn.demos}.
     */
    public static Path toolDemoDirectory() {
        String p = System.getProperty("ampturn.demos");
        if (p != null && !p.isBlank()) return Path.of(p);
        try {
            Path code = Path.of(TrustStore.class.getProtectionDomain().getCodeSource().getLocation().toURI());
            // target/ampturn.jar or target/classes -> project directory
            Path project = code.getParent() == null ? null : code.getParent().getParent();
            return project == null ? null : project.resolve("worksheets");
        } catch (Exception e) {
            return null;
        }
    }

    /** SHA-256 of the content, in lower-case hex. */
    public static String hash(byte[] content) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(content));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("this Java lacks SHA-256", e);
        }
    }

    /** True when this content may run: its hash is in the store, or the file is a shipped demo. */
    public boolean isTrusted(Path file, byte[] content) throws IOException {
        if (isDemo(file)) return true;
        return hashes().contains(hash(content));
    }

    /** True when the file lies in the tool's demo directory. */
    public boolean isDemo(Path file) {
        if (demoDir == null || file == null) return false;
        try {
            Path real = file.toRealPath();
            Path demos = Files.isDirectory(demoDir) ? demoDir.toRealPath() : demoDir;
            return real.startsWith(demos);
        } catch (IOException e) {
            return false;
        }
    }

    /**
     * Adds this content to the store (no change when it is there already), and keeps a copy of it,
     * so that a later version of the same path can be shown with what changed ({@link #earlier}).
     */
    public void trust(Path file, byte[] content) throws IOException {
        String h = hash(content);
        if (hashes().contains(h)) return;
        Files.createDirectories(store.toAbsolutePath().getParent());
        Path copy = copies().resolve(h + ".atw");
        if (!Files.exists(copy)) {
            Files.createDirectories(copies());
            WorksheetFiles.saveText(new String(content, StandardCharsets.UTF_8), copy, WorksheetFiles.Writer.PLAIN);
        }
        String line = h + " " + (file == null ? "-" : file.toAbsolutePath().normalize()) + "\n";
        Files.writeString(store, line, StandardCharsets.UTF_8, java.nio.file.StandardOpenOption.CREATE,
                java.nio.file.StandardOpenOption.APPEND);
    }

    private Path copies() {
        return store.toAbsolutePath().resolveSibling("trusted-copies");
    }

    /**
     * The text last trusted at {@code file}'s path (as kept when it was trusted), or null when
     * that path was never trusted or its copy is gone.
     */
    public String earlier(Path file) {
        if (file == null || !Files.exists(store)) return null;
        String path = file.toAbsolutePath().normalize().toString();
        try {
            String found = null;
            for (String l : Files.readAllLines(store, StandardCharsets.UTF_8)) {
                int sp = l.indexOf(' ');
                if (sp > 0 && l.substring(sp + 1).equals(path)) found = l.substring(0, sp);
            }
            if (found == null) return null;
            Path copy = copies().resolve(found + ".atw");
            return Files.exists(copy) ? WorksheetFiles.decode(Files.readAllBytes(copy), copy.toString()) : null;
        } catch (IOException e) {
            return null;
        }
    }

    /** Where the store lives. */
    public Path location() {
        return store;
    }

    private Set<String> hashes() throws IOException {
        Set<String> out = new HashSet<>();
        if (!Files.exists(store)) return out;
        List<String> lines = Files.readAllLines(store, StandardCharsets.UTF_8);
        for (String l : lines) {
            String t = l.strip();
            if (t.isEmpty() || t.startsWith("#")) continue;
            int sp = t.indexOf(' ');
            out.add(sp < 0 ? t : t.substring(0, sp));
        }
        return out;
    }

    @Override
    public String toString() {
        return "trust store " + store + (demoDir == null ? "" : ", demos in " + demoDir);
    }
}
