package org.ampturn.worksheet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The units fixture verifies against the real JShell session, and a changed record is caught. */
class ShellVerifyTest {

    /** Runs and workspaces number and place charts for their worksheet: leave the chart layer as other tests expect it. */
    @org.junit.jupiter.api.AfterEach
    void resetCharts() {
        org.ampturn.chart.Figures.useNumbering(null);
        org.ampturn.chart.Figures.useDirectory(java.nio.file.Path.of(""));
    }
    static ShellEvaluator shell;

    @TempDir
    Path dir;

    @BeforeAll
    static void start() {
        shell = ShellEvaluator.start();
    }

    @AfterAll
    static void end() {
        shell.close();
    }

    private List<Mismatch> verify(String text) throws Exception {
        Path f = dir.resolve("units-check.atw");
        Files.writeString(f, text);
        Worksheet w = WorksheetFiles.read(f, shell.completeness());
        shell.clear();
        return Verifier.compare(f, Replay.run(w, f, shell, p -> WorksheetFiles.read(p, shell.completeness()), s -> {}));
    }

    @Test
    void fixtureHolds() throws Exception {
        String text = WorksheetFormatTest.fixture("units-check.atw");
        assertEquals(List.of(), verify(text));
        // the session's analysis splits the method into one entry, like the fallback does
        assertEquals(WorksheetFormat.parse(text), WorksheetFormat.parse(text, shell.completeness()));
    }

    @Test
    void changedNumberUnitAndMissingEntryAreCaught() throws Exception {
        String text = WorksheetFormatTest.fixture("units-check.atw");
        // 4.7 mH * (2 A)^2 / 2 = 9.4 mJ, the energy of an inductor; a record of 9.500 mJ is wrong
        List<Mismatch> m = verify(text.replace("//= 9.400 mJ", "//= 9.500 mJ"));
        assertEquals(1, m.size());
        assertEquals("9.400 mJ is not 9.500 mJ to the digits shown", m.get(0).reason());
        assertEquals(11, m.get(0).line());
        m = verify(text.replace("//= 9.400 mJ", "//= 9.400 mW"));
        assertTrue(m.get(0).reason().startsWith("the unit changed"), m.get(0).reason());
        m = verify(text.replace("var I = A(2);\n", ""));
        assertEquals("a recorded result line is missing", m.get(0).reason());
        m = verify(text.replace("var I = A(2);\n//= I = 2.000 A\n", ""));
        assertEquals("the entry failed", m.get(0).reason());
    }
}
