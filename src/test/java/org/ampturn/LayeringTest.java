package org.ampturn;

import static org.junit.jupiter.api.Assertions.assertEquals;
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

/**
 * DESIGN.md: dependencies point one way, {@code console → (worksheet, report) → session → (chart,
 * study) → domain packages → units}; the report reads the worksheet document, the worksheet never
 * sees the report. Both imports and names written out in full inside the code count.
 */
class LayeringTest {
    private static final Path SRC = Path.of("src/main/java/org/ampturn");
    private static final List<String> DOMAIN = List.of("units", "material", "wire", "coil", "drive", "actuator", "thermal", "field");
    private static final Pattern IMPORT = Pattern.compile("^\\s*import\\s+(?:static\\s+)?([\\w.]+)", Pattern.MULTILINE);
    /** A fully qualified name in code: a package path of lower-case segments, then more. */
    private static final Pattern QUALIFIED = Pattern.compile("(?<![\\w.])((?:org|jdk|java|javax)\\.[a-z]\\w*(?:\\.[a-z]\\w*)*)\\.(?=[A-Za-z])");

    /** Every package a file reaches: by import, and by a name written in full in its code (comments and strings left out). */
    static List<String> references(String text) {
        List<String> out = new ArrayList<>();
        Matcher m = IMPORT.matcher(text);
        while (m.find()) out.add(m.group(1));
        String code = codeOnly(text);
        Matcher q = QUALIFIED.matcher(code);
        while (q.find()) {
            int lineStart = code.lastIndexOf('\n', q.start()) + 1;
            String line = code.substring(lineStart, q.start()).strip();
            if (line.startsWith("import") || line.startsWith("package")) continue;
            String name = q.group(1);
            // org.ampturn.Ampturn and org.ampturn.Main: a class straight under org.ampturn
            int end = q.end();
            int stop = end;
            while (stop < code.length() && Character.isJavaIdentifierPart(code.charAt(stop))) stop++;
            out.add(name + "." + code.substring(end, stop));
        }
        return out;
    }

    /** The text with comments and string literals blanked (so Javadoc links and messages do not count). */
    static String codeOnly(String s) {
        StringBuilder b = new StringBuilder(s.length());
        int i = 0, n = s.length();
        while (i < n) {
            char c = s.charAt(i);
            if (c == '/' && i + 1 < n && s.charAt(i + 1) == '/') {
                while (i < n && s.charAt(i) != '\n') i++;
            } else if (c == '/' && i + 1 < n && s.charAt(i + 1) == '*') {
                int end = s.indexOf("*/", i + 2);
                end = end < 0 ? n : end + 2;
                for (int k = i; k < end; k++) b.append(s.charAt(k) == '\n' ? '\n' : ' ');
                i = end;
            } else if (c == '"' && s.startsWith("\"\"\"", i)) {
                int end = s.indexOf("\"\"\"", i + 3);
                end = end < 0 ? n : end + 3;
                b.append("\"\"");
                i = end;
            } else if (c == '"' || c == '\'') {
                int j = i + 1;
                while (j < n && s.charAt(j) != c && s.charAt(j) != '\n') j += s.charAt(j) == '\\' ? 2 : 1;
                b.append(c).append(c);
                i = Math.min(j + 1, n);
            } else {
                b.append(c);
                i++;
            }
        }
        return b.toString();
    }

    private static List<String> violations(String pkg, List<String> forbidden) throws IOException {
        List<String> bad = new ArrayList<>();
        Path dir = pkg.isEmpty() ? SRC : SRC.resolve(pkg);
        if (!Files.isDirectory(dir)) return bad;
        try (Stream<Path> files = pkg.isEmpty() ? Files.list(dir) : Files.walk(dir)) {
            for (Path f : (Iterable<Path>) files.filter(p -> p.toString().endsWith(".java"))::iterator) {
                for (String ref : references(Files.readString(f))) {
                    for (String prefix : forbidden) {
                        if (ref.equals(prefix) || ref.startsWith(prefix + ".") || ref.startsWith(prefix) && prefix.endsWith(".")) {
                            bad.add(f + " reaches " + ref);
                        }
                    }
                }
            }
        }
        return bad;
    }

    private static void assertNone(List<String> bad) {
        assertTrue(bad.isEmpty(), String.join("\n", bad));
    }

    @Test
    void domainPackagesSeeNoConsoleShellOrCharts() throws IOException {
        List<String> forbidden = List.of("org.jline", "jdk.jshell", "org.jfree", "java.awt", "javax.swing",
                "org.ampturn.console", "org.ampturn.worksheet", "org.ampturn.session", "org.ampturn.report", "org.ampturn.chart",
                "org.ampturn.study", "org.ampturn.Ampturn", "org.ampturn.Main");
        List<String> bad = new ArrayList<>();
        for (String p : DOMAIN) bad.addAll(violations(p, forbidden));
        assertNone(bad);
    }

    @Test
    void onlyTheChartPackageSeesTheChartLibrary() throws IOException {
        List<String> bad = new ArrayList<>();
        for (String p : List.of("study", "session", "worksheet", "report", "console")) {
            bad.addAll(violations(p, List.of("org.jfree.chart", "org.jfree.data", "org.jfree.svg")));
        }
        assertNone(bad);
    }

    @Test
    void onlyTheConsolePackageSeesTheLineReader() throws IOException {
        List<String> bad = new ArrayList<>();
        for (String p : List.of("units", "material", "wire", "coil", "drive", "actuator", "thermal", "study", "chart", "session",
                "worksheet", "report")) {
            bad.addAll(violations(p, List.of("org.jline", "org.ampturn.console")));
        }
        assertNone(bad);
    }

    @Test
    void onlyTheSessionPackageSeesJShell() throws IOException {
        List<String> bad = new ArrayList<>();
        for (String p : List.of("study", "chart", "worksheet", "report", "console", "")) bad.addAll(violations(p, List.of("jdk.jshell")));
        assertNone(bad);
    }

    @Test
    void theSessionDoesNotReachUpIntoTheWorksheetReportOrConsole() throws IOException {
        assertNone(violations("session", List.of("org.ampturn.worksheet", "org.ampturn.report", "org.ampturn.console")));
    }

    @Test
    void theWorksheetDoesNotReachUpIntoTheReportOrConsole() throws IOException {
        assertNone(violations("worksheet", List.of("org.ampturn.report", "org.ampturn.console")));
    }

    @Test
    void studyAndChartDoNotReachUpIntoSessionWorksheetReportOrConsole() throws IOException {
        List<String> bad = new ArrayList<>();
        for (String p : List.of("study", "chart")) {
            bad.addAll(violations(p, List.of("org.ampturn.session", "org.ampturn.worksheet", "org.ampturn.report", "org.ampturn.console")));
        }
        assertNone(bad);
    }

    @Test
    void aNameWrittenInFullCountsLikeAnImport() {
        String text = "package org.ampturn.coil;\n/** See {@link org.ampturn.console.Console}. */\nclass X {\n"
                + "  String s = \"org.ampturn.console.Console\";\n  // org.jline.reader.LineReader in a comment\n"
                + "  Object o = new org.ampturn.console.Console(null);\n  int n = org.ampturn.Ampturn.version().length();\n}\n";
        assertEquals(List.of("org.ampturn.console.Console", "org.ampturn.Ampturn"), references(text));
    }
}
