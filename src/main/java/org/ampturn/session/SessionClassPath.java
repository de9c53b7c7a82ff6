package org.ampturn.session;

import java.io.File;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.net.URI;
import java.net.URISyntaxException;
import java.net.URL;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import javax.tools.StandardJavaFileManager;
import javax.tools.StandardLocation;

/**
 * The class path an entry is compiled against: this JVM's class path without the libraries that
 * only the tool itself uses (line editing, chart drawing and SVG writing). A worksheet sees the
 * Ampturn library, Commons Math and the JDK; it draws charts through {@code plot(..)}.
 *
 * <p>Entries still run in this JVM, so nothing changes for the code they call. What changes is
 * the compiler's work: it indexes every class path entry when it first looks up a package, and
 * completion does not offer the console's own classes.
 */
final class SessionClassPath {
    private SessionClassPath() {}

    /** A class in each library that worksheets do not compile against. */
    private static final List<String> TOOL_ONLY = List.of(
            "org/jline/reader/LineReader.class",
            "org/jfree/chart/JFreeChart.class",
            "org/jfree/svg/SVGGraphics2D.class");

    /**
     * The entries of {@code java.class.path} less the tool-only libraries, or an empty list when
     * nothing is to be left out (the compiler then uses its default, the whole class path).
     */
    static List<File> forEntries() {
        String cp = System.getProperty("java.class.path", "");
        ClassLoader loader = SessionClassPath.class.getClassLoader();
        Set<Path> left = new HashSet<>();
        for (String probe : TOOL_ONLY) {
            Path p = containerOf(loader == null ? null : loader.getResource(probe));
            if (p != null) left.add(p);
        }
        if (left.isEmpty() || cp.isEmpty()) return List.of();
        List<File> out = new ArrayList<>();
        boolean leftOut = false;
        for (String e : cp.split(File.pathSeparator)) {
            if (e.isEmpty()) continue;
            if (left.contains(normal(Path.of(e)))) leftOut = true;
            else out.add(new File(e));
        }
        return leftOut ? out : List.of();
    }

    /** Sets the compiler's class path; for {@code JShell.Builder.fileManager}. */
    static StandardJavaFileManager apply(StandardJavaFileManager fm, List<File> classPath) {
        try {
            fm.setLocation(StandardLocation.CLASS_PATH, classPath);
            return fm;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** The jar a resource was found in, or null (also for a class directory: the tool's libraries come as jars). */
    static Path containerOf(URL url) {
        if (url == null) return null;
        try {
            String s = url.toString();
            if (s.startsWith("jar:")) {
                int bang = s.indexOf("!/");
                return bang < 0 ? null : normal(Path.of(new URI(s.substring(4, bang))));
            }
            return null;
        } catch (URISyntaxException | RuntimeException e) {
            return null;
        }
    }

    private static Path normal(Path p) {
        return p.toAbsolutePath().normalize();
    }
}
