package org.ampturn.docs;

import static org.junit.jupiter.api.Assertions.*;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.ampturn.chart.Figures;
import org.ampturn.worksheet.Mismatch;
import org.ampturn.worksheet.Replay;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Every {@code java} example in lib-docs runs, and prints what the page says it prints: the
 * {@code //=} lines under each entry are compared as {@code ampturn verify} compares a worksheet
 * (text exact, numbers to the digits shown). An example meant to fail shows its error as
 * {@code //= ! message}, and must fail with that message. So the pages cannot drift from the code.
 */
class LibDocsExamplesTest {
    @TempDir Path figures;

    static Stream<Path> pages() throws IOException {
        List<Path> out = new ArrayList<>();
        try (Stream<Path> s = Files.list(Path.of("lib-docs"))) {
            for (Path p : s.filter(p -> p.toString().endsWith(".md")).sorted().toList()) if (DocExamples.hasExamples(p)) out.add(p);
        }
        return out.stream();
    }

    @AfterAll
    static void restoreFigures() {
        Figures.clear();
        Figures.useDirectory(Path.of(""));
        Figures.printTo(null);
        Figures.useWindows(true);
    }

    @ParameterizedTest
    @MethodSource("pages")
    void examplesRunAndPrintWhatThePageSays(Path page) throws Exception {
        DocExamples.Run run = DocExamples.run(page, figures);
        List<String> problems = new ArrayList<>();
        for (Mismatch m : run.mismatches()) {
            boolean expectedError = m.reason().equals("the entry failed") && m.recorded() != null && m.recorded().startsWith("! ")
                    && m.recorded().equals(m.fresh().strip());
            if (expectedError) continue;
            problems.add(page + ":" + run.pageLine(m.line()) + ": " + m.reason() + "\n  entry:    " + m.entry().lines().findFirst().orElse("")
                    + "\n  page:     " + (m.recorded() == null ? "(nothing)" : m.recorded()) + "\n  printed:  " + (m.fresh() == null ? "(nothing)" : m.fresh()));
        }
        // an entry that the page shows failing must fail
        for (Replay.Step s : run.steps()) {
            if (!s.entry().results().isEmpty() && s.entry().results().get(0).startsWith("! ") && !s.result().failed()) {
                problems.add(page + ":" + run.pageLine(s.line()) + ": the page shows an error but the entry ran: " + s.result().records());
            }
        }
        assertTrue(problems.isEmpty(), String.join("\n", problems));
        long checked = run.steps().stream().filter(s -> !s.entry().results().isEmpty()).count();
        assertTrue(checked > 0, page + ": no example shows what it prints");
    }

    @Test
    void aPageThatDriftsFromTheCodeIsCaught(@TempDir Path dir) throws Exception {
        Path page = dir.resolve("drift.md");
        Files.writeString(page, String.join("\n", "# Drift", "```java", "var L = mH(4.7);", "//= L = 4.700 mH",
                "L.times(2)", "//= 9.500 mH", "mm(3).plus(A(2))", "//= ! cannot add 2.000 A to 3.000 mm (current and length)", "```", ""));
        DocExamples.Run run = DocExamples.run(page, dir.resolve("figures"));
        assertEquals(1, run.mismatches().stream().filter(m -> !m.reason().equals("the entry failed")).count(), run.mismatches().toString());
        Mismatch m = run.mismatches().stream().filter(x -> !x.reason().equals("the entry failed")).findFirst().orElseThrow();
        assertEquals("9.500 mH", m.recorded());
        assertEquals("9.400 mH", m.fresh());
        assertEquals(5, run.pageLine(m.line()), "the page's line of the entry");
    }
}
