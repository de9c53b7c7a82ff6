package org.ampturn.docs;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.ampturn.chart.Figures;
import org.ampturn.worksheet.Block;
import org.ampturn.worksheet.Mismatch;
import org.ampturn.worksheet.Replay;
import org.ampturn.worksheet.ShellEvaluator;
import org.ampturn.worksheet.Verifier;
import org.ampturn.worksheet.Worksheet;
import org.ampturn.worksheet.WorksheetFormat;

/**
 * The {@code java} examples of a lib-docs page run as one worksheet: the page's code blocks in order,
 * in one fresh session, each entry's expected output on {@code //=} lines under it, exactly as a
 * worksheet records results (lib-docs/worksheets.md). A line of the page maps back from the
 * worksheet, so a problem names the page's line. A file an example saves by a relative name
 * ({@code .save("latch.png")}, {@code .saveCsv("run.csv")}) is written to the run's temporary folder.
 *
 * <p>{@code main(page.md...)} rewrites the {@code //=} lines of the pages from a fresh run (for a
 * writer adding an example; review the diff, it is the documentation).
 */
public final class DocExamples {
    private DocExamples() {}

    /** The examples of a page as worksheet text, and for each worksheet line the page's line (1-based; 0 for the header). */
    record Sheet(Path page, String text, List<Integer> pageLine, List<Integer> indent) {}

    static final String HEADER = "// ampturn worksheet 1\n// title: examples of lib-docs\n\n";

    static Sheet sheet(Path page) throws IOException {
        List<String> md = Files.readAllLines(page, StandardCharsets.UTF_8);
        StringBuilder sb = new StringBuilder(HEADER);
        List<Integer> map = new ArrayList<>(List.of(0, 0, 0));
        List<Integer> indent = new ArrayList<>(List.of(0, 0, 0));
        boolean in = false;
        int ind = 0;
        for (int i = 0; i < md.size(); i++) {
            String line = md.get(i);
            String t = line.strip();
            if (!in && t.equals("```java")) {
                in = true;
                ind = line.indexOf('`');
                continue;
            }
            if (in && t.equals("```")) {
                in = false;
                sb.append('\n');
                map.add(i + 1);
                indent.add(ind);
                continue;
            }
            if (!in) continue;
            sb.append(line.length() >= ind && line.substring(0, ind).isBlank() ? line.substring(ind) : line.stripLeading()).append('\n');
            map.add(i + 1);
            indent.add(ind);
        }
        if (in) throw new IllegalArgumentException(page + ": a ```java block is not closed");
        return new Sheet(page, sb.toString(), map, indent);
    }

    /** True when the page has at least one java example. */
    static boolean hasExamples(Path page) throws IOException {
        return Files.readAllLines(page, StandardCharsets.UTF_8).stream().anyMatch(l -> l.strip().equals("```java"));
    }

    /** One run of a page's examples: each entry with its page line, what it records and what it printed now. */
    record Run(Sheet sheet, List<Replay.Step> steps, List<Mismatch> mismatches) {
        int pageLine(int worksheetLine) {
            return worksheetLine >= 1 && worksheetLine <= sheet.pageLine().size() ? sheet.pageLine().get(worksheetLine - 1) : 0;
        }
    }

    /** Runs a page's examples in a fresh session; figures go to {@code figures}, nothing is printed. */
    static Run run(Path page, Path figures) throws Exception {
        Sheet s = sheet(page);
        Path file = figures.resolve(page.getFileName().toString().replace(".md", ".atw"));
        Files.createDirectories(figures);
        // files an example saves by a relative name go to the temporary folder, not the project's
        String text = s.text().replaceAll("\\.(save|saveCsv)\\(\"(?![/\\\\])", ".$1(\"" + figures.toAbsolutePath().toString().replace("\\", "/") + "/");
        Files.writeString(file, text, StandardCharsets.UTF_8);
        Figures.clear();
        Figures.useNumbering(null);
        Figures.useDirectory(figures);
        Figures.useWindows(false);
        Figures.printTo(new java.io.PrintStream(java.io.OutputStream.nullOutputStream()));
        Figures.silence();
        try (ShellEvaluator ev = ShellEvaluator.start()) {
            Worksheet w = WorksheetFormat.parse(text, ev.completeness());
            List<Replay.Step> steps = Replay.run(w, file, ev, f -> {
                throw new IllegalArgumentException("a lib-docs example cannot #use another file");
            }, x -> { });
            return new Run(s, steps, Verifier.compare(file, steps));
        }
    }

    /** Rewrites the //= lines of a page from a fresh run. */
    public static void main(String[] args) throws Exception {
        Path tmp = Files.createTempDirectory("doc-examples");
        for (String a : args) {
            Path page = Path.of(a);
            Run r = run(page, tmp);
            List<String> md = new ArrayList<>(Files.readAllLines(page, StandardCharsets.UTF_8));
            // insert after each entry's last line, from the bottom up so earlier line numbers hold
            List<Replay.Step> steps = new ArrayList<>(r.steps());
            for (int k = steps.size() - 1; k >= 0; k--) {
                Replay.Step st = steps.get(k);
                Block.Entry e = st.entry();
                int lines = e.source().split("\n", -1).length;
                int firstWs = st.line();
                int lastPage = r.pageLine(firstWs + lines - 1);
                int ind = r.sheet().indent().get(firstWs + lines - 2);
                // drop the //= lines recorded there now
                int at = lastPage; // index after the entry's last line (0-based)
                while (at < md.size() && md.get(at).strip().startsWith("//=")) md.remove(at);
                List<String> rec = st.result().records();
                for (int j = rec.size() - 1; j >= 0; j--) {
                    String v = rec.get(j);
                    md.add(at, " ".repeat(ind) + (v.isEmpty() ? "//=" : "//= " + v));
                }
            }
            Files.write(page, md, StandardCharsets.UTF_8);
            System.out.println(page + ": " + steps.size() + " entries recorded");
        }
    }
}
