package org.ampturn.session;

import java.io.IOException;
import java.net.URISyntaxException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.CodeSource;
import java.util.ArrayList;
import java.util.Enumeration;
import java.util.HashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.jar.JarEntry;
import java.util.jar.JarFile;
import java.util.stream.Stream;

/**
 * The imports a session offers: the facade's static helpers, and one on-demand import for each
 * library package with classes ({@code import org.ampturn.coil.*;}).
 *
 * <p>A session imports a package when an entry first names one of its classes. Every import is
 * one more compilation, and every import in place is resolved again in each later entry's
 * compilation: with all ten imports made at the start, {@code ampturn run} of one line took
 * 1.61 s here against 1.42 s with the facade's alone (median of 10, 2 cores). Names resolve as if
 * every package were imported, because a package is in place before the entry that names it is
 * compiled.
 */
final class SessionImports {
    /** The facade's static helpers ({@code mm(..)}, {@code plot(..)}, ...), imported at the start. */
    static final String FACADE = "import static org.ampturn.Ampturn.*;";

    /** Packages a worksheet does not import: the machinery that runs it. */
    private static final List<String> HIDDEN = List.of("session", "worksheet", "report", "console");

    /**
     * Simple name of each top-level library class to the last segment of its package ("Solenoid" to
     * "coil"); a name in two packages maps to both, so that it is as ambiguous as with every
     * package imported.
     */
    private final Map<String, Set<String>> packagesOf;
    private final TreeSet<String> packages = new TreeSet<>();

    private SessionImports(Map<String, Set<String>> packagesOf) {
        this.packagesOf = Map.copyOf(packagesOf);
        packagesOf.values().forEach(packages::addAll);
    }

    /** The library as found beside this class: in its jar, or in its class directory. */
    static SessionImports ofLibrary() {
        return new SessionImports(libraryClasses());
    }

    /** For tests: a library of the given classes, each "package.SimpleName" under org.ampturn. */
    static SessionImports of(List<String> classes) {
        Map<String, Set<String>> m = new HashMap<>();
        for (String c : classes) {
            int dot = c.indexOf('.');
            m.computeIfAbsent(c.substring(dot + 1), k -> new TreeSet<>()).add(c.substring(0, dot));
        }
        return new SessionImports(m);
    }

    /** Every import line: the facade's, then units, then the other packages in alphabetical order. */
    List<String> all() {
        List<String> out = new ArrayList<>();
        out.add(FACADE);
        if (packages.contains("units")) out.add(line("units"));
        for (String p : packages) if (!p.equals("units")) out.add(line(p));
        return out;
    }

    /**
     * The package imports that {@code source} needs: one for each package with a class whose simple
     * name appears in the source as an identifier (not in a comment, string or character literal),
     * in order of first appearance.
     */
    List<String> neededBy(String source) {
        Set<String> out = new LinkedHashSet<>();
        for (String id : identifiers(source)) {
            for (String p : packagesOf.getOrDefault(id, Set.of())) out.add(line(p));
        }
        return List.copyOf(out);
    }

    private static String line(String pkg) {
        return "import org.ampturn." + pkg + ".*;";
    }

    /**
     * The identifiers of Java source that begin with a capital letter (class names by Java's naming
     * convention), in order of first appearance, skipping comments, string literals, text blocks and
     * character literals. Unterminated comments and literals run to the end of the text.
     */
    static Set<String> identifiers(String src) {
        Set<String> out = new LinkedHashSet<>();
        int n = src.length();
        int i = 0;
        while (i < n) {
            char c = src.charAt(i);
            if (c == '/' && i + 1 < n && src.charAt(i + 1) == '/') {
                while (i < n && src.charAt(i) != '\n') i++;
            } else if (c == '/' && i + 1 < n && src.charAt(i + 1) == '*') {
                int end = src.indexOf("*/", i + 2);
                i = end < 0 ? n : end + 2;
            } else if (c == '"' && src.startsWith("\"\"\"", i)) {
                int end = i + 3;
                while (end < n && !src.startsWith("\"\"\"", end)) end += src.charAt(end) == '\\' ? 2 : 1;
                i = Math.min(n, end + 3);
            } else if (c == '"' || c == '\'') {
                int j = i + 1;
                while (j < n && src.charAt(j) != c && src.charAt(j) != '\n') j += src.charAt(j) == '\\' ? 2 : 1;
                i = Math.min(n, j + 1);
            } else if (Character.isJavaIdentifierStart(c)) {
                int j = i + 1;
                while (j < n && Character.isJavaIdentifierPart(src.charAt(j))) j++;
                if (Character.isUpperCase(c)) out.add(src.substring(i, j));
                i = j;
            } else if (Character.isDigit(c)) {
                // a number such as 1e3 or 0xFF: its letters are not identifiers
                while (i < n && (Character.isLetterOrDigit(src.charAt(i)) || src.charAt(i) == '.' || src.charAt(i) == '_')) i++;
            } else {
                i++;
            }
        }
        return out;
    }

    /** Top-level classes of the subpackages of org.ampturn, from the jar or class directory. */
    private static Map<String, Set<String>> libraryClasses() {
        Map<String, Set<String>> out = new HashMap<>();
        try {
            CodeSource cs = org.ampturn.Ampturn.class.getProtectionDomain().getCodeSource();
            if (cs == null) return out;
            Path where = Path.of(cs.getLocation().toURI());
            if (Files.isDirectory(where)) {
                Path root = where.resolve("org/ampturn");
                try (Stream<Path> files = Files.walk(root, 2)) {
                    files.forEach(f -> add(root.relativize(f).toString().replace('\\', '/'), out));
                }
            } else {
                try (JarFile jar = new JarFile(where.toFile())) {
                    for (Enumeration<JarEntry> en = jar.entries(); en.hasMoreElements(); ) {
                        String n = en.nextElement().getName();
                        if (n.startsWith("org/ampturn/")) add(n.substring("org/ampturn/".length()), out);
                    }
                }
            }
        } catch (IOException | URISyntaxException | RuntimeException e) {
            // no listing: only the facade is imported, and entries name other classes in full
        }
        return out;
    }

    /** Records {@code pkg/Name.class} when it is a top-level class of a package a worksheet imports. */
    private static void add(String relative, Map<String, Set<String>> out) {
        String[] parts = relative.split("/");
        if (parts.length != 2 || !parts[1].endsWith(".class")) return;
        String name = parts[1].substring(0, parts[1].length() - ".class".length());
        if (name.contains("$") || name.equals("package-info") || HIDDEN.contains(parts[0])) return;
        out.computeIfAbsent(name, k -> new TreeSet<>()).add(parts[0]);
    }
}
