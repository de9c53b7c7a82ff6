package org.ampturn.worksheet;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/** The .atw format of DESIGN.md ("Worksheet format"): reading, writing, round trip, refusals. */
class WorksheetFormatTest {

    static String fixture(String name) throws IOException {
        try (InputStream in = WorksheetFormatTest.class.getResourceAsStream(name)) {
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
    }

    @Test
    void aChainWrittenOneCallALineIsOneEntry() throws Exception {
        String text = "// ampturn worksheet 1\n// title: chain\n// tool: ampturn 0.1.0\n\n"
                + "var run = Drive.dc(V(12)).into(coil)\n        .offAt(ms(20), Clamp.diode())\n        .simulate(ms(40));\n"
                + "//= run = transient\nrun\n";
        Worksheet w = WorksheetFormat.parse(text);
        assertEquals(List.of(
                new Block.Entry("var run = Drive.dc(V(12)).into(coil)\n        .offAt(ms(20), Clamp.diode())\n        .simulate(ms(40));",
                        List.of("run = transient"), List.of()),
                new Block.Entry("run", List.of(), List.of())), w.blocks());
        assertEquals(text, WorksheetFormat.print(w));
    }

    @Test
    void readsHeaderNotesEntriesResultsAndFigures() throws Exception {
        String text = "// ampturn worksheet 1\n// title: Gate latch coil, 12 V\n// tool: ampturn 0.1.0\n\n"
                + "// A note.\nvar x = mH(2.103);\n//= x = 2.103 mH\n\nx\n//= 2.103 mH\n//= figure: gate.figures/01.svg\n";
        Worksheet w = WorksheetFormat.parse(text);
        assertEquals(Map.of("title", "Gate latch coil, 12 V", "tool", "ampturn 0.1.0"), w.header());
        assertEquals("Gate latch coil, 12 V", w.title());
        assertEquals(List.of(new Block.Note("A note."),
                new Block.Entry("var x = mH(2.103);", List.of("x = 2.103 mH"), List.of()),
                new Block.Blank(),
                new Block.Entry("x", List.of("2.103 mH"), List.of("gate.figures/01.svg"))), w.blocks());
        assertEquals(5, w.lineOf(0));
        assertEquals(6, w.lineOf(1));
        assertEquals(9, w.lineOf(3));
        assertEquals(text, WorksheetFormat.print(w));
    }

    @Test
    void fixtureRoundTripsExactly() throws Exception {
        String text = fixture("units-check.atw");
        Worksheet w = WorksheetFormat.parse(text);
        String printed = WorksheetFormat.print(w);
        assertEquals(text, printed);
        assertEquals(w, WorksheetFormat.parse(printed));
        assertEquals(5, w.entries().size());
        // the method is one entry of three lines, with its record
        Block.Entry method = w.entries().get(3);
        assertTrue(method.source().startsWith("double hot(") && method.source().endsWith("}"), method.source());
        assertEquals(List.of("defined method hot(double,double)"), method.results());
    }

    @Test
    void builtWorksheetRoundTripsAndKnowsItsLines() throws Exception {
        Worksheet w = Worksheet.titled("Relay coil")
                .with(new Block.Note("first note"))
                .with(new Block.Entry("for (int i = 0; i < 2; i++) {\n  System.out.println(i);\n}", List.of("0", "1"), List.of()))
                .with(new Block.Use("shared/coils.atw"))
                .with(new Block.Note(""))
                .with(new Block.Entry("1 + 1", List.of("2", ""), List.of("a.png", "b.svg")));
        String text = WorksheetFormat.print(w);
        Worksheet back = WorksheetFormat.parse(text);
        assertEquals(w, back);
        assertEquals(text, WorksheetFormat.print(back));
        for (int k = 0; k < w.blocks().size(); k++) assertEquals(back.lineOf(k), w.lineOf(k), "block " + k);
        assertEquals("1 + 1", text.split("\n")[back.lineOf(4) - 1]);
    }

    @Test
    void multiLineExpressionIsOneEntry() throws Exception {
        Worksheet w = WorksheetFormat.parse("// ampturn worksheet 1\n\nmH(2).plus(\n   uH(300))\n//= 2.300 mH\n");
        assertEquals(List.of(new Block.Entry("mH(2).plus(\n   uH(300))", List.of("2.300 mH"), List.of())), w.blocks());
    }

    @Test
    void givenCompletenessDecidesTheSplit() throws Exception {
        // a splitter that wants two lines per entry
        Completeness pairs = s -> s.contains("\n");
        Worksheet w = WorksheetFormat.parse("// ampturn worksheet 1\n\na\nb\nc\nd\n", pairs);
        assertEquals(List.of("a\nb", "c\nd"), w.entries().stream().map(Block.Entry::source).toList());
    }

    @Test
    void notAWorksheetIsRefusedClearly() {
        WorksheetFormatException e = assertThrows(WorksheetFormatException.class, () -> WorksheetFormat.parse("var x = 3;\n"));
        assertEquals("not an Ampturn worksheet: the first line should be \"// ampturn worksheet 1\", found \"var x = 3;\"", e.getMessage());
        e = assertThrows(WorksheetFormatException.class, () -> WorksheetFormat.parse(""));
        assertTrue(e.getMessage().contains("found an empty file"), e.getMessage());
    }

    @Test
    void newerFormatOrNewerToolIsRefusedClearly() {
        WorksheetFormatException e = assertThrows(WorksheetFormatException.class,
                () -> WorksheetFormat.parse("// ampturn worksheet 2\n// tool: ampturn 3.0\n"));
        assertTrue(e.getMessage().startsWith("worksheet format 2 is newer than this Ampturn"), e.getMessage());
        assertTrue(e.getMessage().contains("written by ampturn 3.0") && e.getMessage().contains("update Ampturn"), e.getMessage());
        e = assertThrows(WorksheetFormatException.class, () -> WorksheetFormat.parse("// ampturn worksheet 1\n// tool: ampturn 0.10.0\n"));
        assertTrue(e.getMessage().startsWith("written by ampturn 0.10.0, newer than this Ampturn 0.1.0"), e.getMessage());
    }

    @Test
    void versionComparisonIsNumeric() {
        assertTrue(WorksheetFormat.isNewerTool("ampturn 0.10.0", "0.9.1"));
        assertTrue(WorksheetFormat.isNewerTool("ampturn 1", "0.9"));
        assertFalse(WorksheetFormat.isNewerTool("ampturn 0.1.0", "0.1.0"));
        assertFalse(WorksheetFormat.isNewerTool("ampturn 0.1", "0.1.0"));
        assertFalse(WorksheetFormat.isNewerTool("something else 9", "0.1.0"));
    }

    @Test
    void resultWithoutEntryAndStrayCommandsAreErrorsWithLine() {
        WorksheetFormatException e = assertThrows(WorksheetFormatException.class,
                () -> WorksheetFormat.parse("// ampturn worksheet 1\n\n// note\n//= 3\n"));
        assertEquals(4, e.line());
        e = assertThrows(WorksheetFormatException.class, () -> WorksheetFormat.parse("// ampturn worksheet 1\n#save x.atw\n"));
        assertEquals(2, e.line());
    }

    @Test
    void bracketCompletenessFollowsStringsCommentsAndOperators() {
        assertTrue(Completeness.BRACKETS.isComplete("var s = \"{(\";"));
        assertTrue(Completeness.BRACKETS.isComplete("int x = 3; // {"));
        assertFalse(Completeness.BRACKETS.isComplete("void f() {"));
        assertFalse(Completeness.BRACKETS.isComplete("/* open"));
        assertFalse(Completeness.BRACKETS.isComplete("var t = \"\"\"\n  text"));
        assertFalse(Completeness.BRACKETS.isComplete("double x = 3 +"));
        assertFalse(Completeness.BRACKETS.isComplete("coil."));
        assertTrue(Completeness.BRACKETS.isComplete("i++"));
        assertTrue(Completeness.BRACKETS.isComplete("char c = '}';"));
    }

    @Test
    void entriesWithoutAHeaderAreNumberedFromTheirFirstLine() throws Exception {
        Worksheet w = WorksheetFormat.parseEntries("mm(1)\n\n#digits 3\nfoo(\nbar()\n", Completeness.BRACKETS);
        assertEquals(List.of("mm(1)", "#digits 3", "foo(", "bar()"), w.entries().stream().map(Block.Entry::source).toList());
        int[] lines = new int[4];
        int e = 0;
        for (int k = 0; k < w.blocks().size(); k++) if (w.blocks().get(k) instanceof Block.Entry) lines[e++] = w.lineOf(k);
        assertArrayEquals(new int[] {1, 3, 4, 5}, lines);
        // in a file, a console command is refused by line; an open brace still gathers its body
        assertEquals(1, WorksheetFormat.parse("// ampturn worksheet 1\n\nvoid f() {\nint x = 1;\n}\n", Completeness.BRACKETS).entries().size());
    }
}
