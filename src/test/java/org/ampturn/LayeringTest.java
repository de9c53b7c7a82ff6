package org.ampturn;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/** DESIGN.md: dependencies point one way; the domain library never sees the console or the charts. */
class LayeringTest {
    private static final Path SRC = Path.of("src/main/java/org/ampturn");
    private static final List<String> DOMAIN = List.of("units", "material", "wire", "coil", "drive", "actuator", "thermal");
    private static final Pattern IMPORT = Pattern.compile("^\\s*import\\s+(?:static\\s+)?([\\w.]+)", Pattern.MULTILINE);

    private static List<String> violations(String pkg, List<String> forbidden) throws IOException {
        List<String> bad = new ArrayList<>();
        Path dir = SRC.resolve(pkg);
        if (!Files.isDirectory(dir)) return bad;
        try (Stream<Path> files = Files.walk(dir)) {
            for (Path f : (Iterable<Path>) files.filter(p -> p.toString().endsWith(".java"))::iterator) {
                String text = Files.readString(f);
                Matcher m = IMPORT.matcher(text);
                while (m.find()) {
                    for (String prefix : forbidden) {
                        if (m.group(1).startsWith(prefix)) bad.add(f + " imports " + m.group(1));
                    }
                }
                for (String prefix : forbidden) {
                    // fully qualified use without an import
                    if (text.contains(prefix + ".") && !prefix.startsWith("org.ampturn.")) {
                        for (String line : text.split("\n")) {
                            if (line.contains(prefix + ".") && !line.strip().startsWith("import") && !line.strip().startsWith("*")
                                    && !line.strip().startsWith("//")) {
                                bad.add(f + " uses " + prefix + " in: " + line.strip());
                            }
                        }
                    }
                }
            }
        }
        return bad;
    }

    @Test
    void domainPackagesSeeNoConsoleShellOrCharts() throws IOException {
        List<String> forbidden = List.of("org.jline", "jdk.jshell", "org.jfree", "java.awt", "javax.swing",
                "org.ampturn.console", "org.ampturn.worksheet", "org.ampturn.chart", "org.ampturn.study", "org.ampturn.Ampturn",
                "org.ampturn.Main");
        List<String> bad = new ArrayList<>();
        for (String p : DOMAIN) bad.addAll(violations(p, forbidden));
        assertTrue(bad.isEmpty(), String.join("\n", bad));
    }

    @Test
    void onlyTheChartPackageSeesTheChartLibrary() throws IOException {
        List<String> bad = new ArrayList<>();
        for (String p : List.of("study", "worksheet", "console")) bad.addAll(violations(p, List.of("org.jfree.chart", "org.jfree.data", "org.jfree.svg")));
        assertTrue(bad.isEmpty(), String.join("\n", bad));
    }

    @Test
    void onlyTheConsolePackageSeesTheLineReader() throws IOException {
        List<String> bad = new ArrayList<>();
        for (String p : List.of("units", "material", "wire", "coil", "drive", "actuator", "thermal", "study", "chart", "worksheet")) {
            bad.addAll(violations(p, List.of("org.jline", "org.ampturn.console")));
        }
        assertTrue(bad.isEmpty(), String.join("\n", bad));
    }

    @Test
    void studyAndChartDoNotReachUpIntoWorksheetOrConsole() throws IOException {
        List<String> bad = new ArrayList<>();
        for (String p : List.of("study", "chart")) bad.addAll(violations(p, List.of("org.ampturn.worksheet", "org.ampturn.console")));
        assertTrue(bad.isEmpty(), String.join("\n", bad));
    }
}
