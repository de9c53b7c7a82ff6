package org.ampturn.worksheet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Verify catches a changed number, a changed unit, a missing entry; #use runs the other file first. */
class VerifierTest {
    @TempDir
    Path dir;

    static final String SHEET = FakeEvaluator.SHEET;

    static FakeEvaluator truth() {
        return FakeEvaluator.truth();
    }

    private List<Mismatch> verify(String text, Evaluator ev) throws Exception {
        Path f = dir.resolve("w.atw");
        Files.writeString(f, text);
        Worksheet w = WorksheetFiles.read(f, Completeness.BRACKETS);
        return Verifier.compare(f, Replay.run(w, f, ev, p -> WorksheetFiles.read(p, Completeness.BRACKETS), s -> {}));
    }

    @Test
    void allHold() throws Exception {
        assertEquals(List.of(), verify(SHEET, truth()));
    }

    @Test
    void changedNumberIsNamedWithFileLineAndBothTexts() throws Exception {
        FakeEvaluator ev = truth().answer("L.times(I.pow(2)).div(2)", "  = 9.500 mJ");
        List<Mismatch> m = verify(SHEET, ev);
        assertEquals(1, m.size());
        assertEquals(dir.resolve("w.atw") + ":8: 9.500 mJ is not 9.400 mJ to the digits shown\n"
                + "  entry:    L.times(I.pow(2)).div(2)\n  recorded: 9.400 mJ\n  new:      9.500 mJ", m.get(0).toString());
    }

    @Test
    void changedUnitIsAMismatch() throws Exception {
        List<Mismatch> m = verify(SHEET, truth().answer("L.times(I.pow(2)).div(2)", "  = 9.400 mW"));
        assertEquals(1, m.size());
        assertTrue(m.get(0).reason().startsWith("the unit changed"), m.get(0).reason());
    }

    @Test
    void missingEntryIsCaught() throws Exception {
        // the declaration of I was deleted: the energy entry now fails
        String text = SHEET.replace("var I = A(2);\n//= I = 2.000 A\n", "");
        List<Mismatch> m = verify(text, truth());
        assertEquals(1, m.size());
        assertEquals("the entry failed", m.get(0).reason());
        assertEquals(6, m.get(0).line());
        // the entry was deleted but its record stayed: it now hangs on the previous entry
        text = SHEET.replace("var I = A(2);\n", "");
        m = verify(text, truth().needs("L.times(I.pow(2)).div(2)", "L"));
        assertEquals(1, m.size());
        assertEquals("a recorded result line is missing", m.get(0).reason());
        assertEquals("I = 2.000 A", m.get(0).recorded());
    }

    @Test
    void unrecordedOutputIsAMismatch() throws Exception {
        List<Mismatch> m = verify(SHEET, truth().answer("var I = A(2);", "  I = 2.000 A", "  warning: shadowed"));
        assertEquals(1, m.size());
        assertEquals("a new result line that is not recorded", m.get(0).reason());
    }

    @Test
    void useRunsTheSharedWorksheetFirstAndOnce() throws Exception {
        Files.createDirectories(dir.resolve("shared"));
        Files.writeString(dir.resolve("shared/defs.atw"), "// ampturn worksheet 1\n\nvar L = mH(4.7);\n//= L = 4.700 mH\n");
        String text = "// ampturn worksheet 1\n\n#use shared/defs.atw\n#use shared/defs.atw\nvar I = A(2);\n//= I = 2.000 A\n"
                + "L.times(I.pow(2)).div(2)\n//= 9.400 mJ\n";
        FakeEvaluator ev = truth();
        assertEquals(List.of(), verify(text, ev));
        assertEquals(List.of("var L = mH(4.7);", "var I = A(2);", "L.times(I.pow(2)).div(2)"), ev.ran);
    }

    @Test
    void useCycleAndMissingFileAreErrors() throws Exception {
        Files.writeString(dir.resolve("b.atw"), "// ampturn worksheet 1\n\n#use w.atw\n");
        List<Mismatch> m = verify("// ampturn worksheet 1\n\n#use b.atw\n#use nowhere.atw\n", truth());
        assertEquals(2, m.size());
        assertTrue(m.get(0).fresh().contains("would run itself again"), m.get(0).fresh());
        assertTrue(m.get(1).fresh().startsWith("! #use nowhere.atw: "), m.get(1).fresh());
        assertEquals(4, m.get(1).line());
    }
}
