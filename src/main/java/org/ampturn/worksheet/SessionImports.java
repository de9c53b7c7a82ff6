package org.ampturn.worksheet;

import java.io.IOException;
import java.net.URISyntaxException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.CodeSource;
import java.util.ArrayList;
import java.util.Enumeration;
import java.util.List;
import java.util.TreeSet;
import java.util.jar.JarEntry;
import java.util.jar.JarFile;
import java.util.stream.Stream;

/** The imports a session preloads: the facade's static helpers and every library package with classes. */
final class SessionImports {
    private SessionImports() {}

    /** Packages a worksheet does not import: the machinery that runs it. */
    private static final List<String> HIDDEN = List.of("worksheet", "console");

    /** Import lines to try, in order; the session drops any that do not compile. */
    static List<String> candidates() {
        List<String> out = new ArrayList<>();
        out.add("import static org.ampturn.Ampturn.*;");
        TreeSet<String> pkgs = packages();
        if (pkgs.remove("units")) out.add("import org.ampturn.units.*;");
        for (String p : pkgs) out.add("import org.ampturn." + p + ".*;");
        return out;
    }

    /** Subpackages of org.ampturn that hold at least one top-level class, from the jar or class directory. */
    static TreeSet<String> packages() {
        TreeSet<String> out = new TreeSet<>();
        try {
            CodeSource cs = org.ampturn.Ampturn.class.getProtectionDomain().getCodeSource();
            if (cs == null) return out;
            Path where = Path.of(cs.getLocation().toURI());
            if (Files.isDirectory(where)) {
                Path root = where.resolve("org/ampturn");
                try (Stream<Path> dirs = Files.list(root)) {
                    dirs.filter(Files::isDirectory).forEach(d -> {
                        try (Stream<Path> files = Files.list(d)) {
                            if (files.anyMatch(SessionImports::isTopLevelClass)) out.add(d.getFileName().toString());
                        } catch (IOException ignored) {
                            // unreadable directory: leave the package out
                        }
                    });
                }
            } else {
                try (JarFile jar = new JarFile(where.toFile())) {
                    for (Enumeration<JarEntry> en = jar.entries(); en.hasMoreElements(); ) {
                        String n = en.nextElement().getName();
                        if (!n.startsWith("org/ampturn/") || !n.endsWith(".class")) continue;
                        String[] parts = n.split("/");
                        if (parts.length == 4 && !parts[3].contains("$") && !parts[3].equals("package-info.class")) out.add(parts[2]);
                    }
                }
            }
        } catch (IOException | URISyntaxException | RuntimeException e) {
            // no listing: only the facade is imported
        }
        out.removeAll(HIDDEN);
        return out;
    }

    private static boolean isTopLevelClass(Path p) {
        String n = p.getFileName().toString();
        return n.endsWith(".class") && !n.contains("$") && !n.equals("package-info.class");
    }
}
