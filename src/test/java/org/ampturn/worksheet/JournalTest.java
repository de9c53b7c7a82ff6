package org.ampturn.worksheet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The journal's records: what recovery rebuilds from them, torn records, clean ends. */
class JournalTest {
    @TempDir
    Path dir;

    @Test
    void recoveryFollowsOpenSaveNoteUndo() throws Exception {
        Journal j = Journal.start(dir);
        j.opened(dir.resolve("gate.atw"));
        j.entry(new Block.Entry("var a = 1;", List.of("a = 1"), List.of()));
        j.saved(dir.resolve("gate.atw"));
        j.entry(new Block.Entry("void f() {\n}", List.of("defined method f()"), List.of("f.svg")));
        j.note("a note");
        j.entry(new Block.Entry("a + 1", List.of("2"), List.of()));
        j.undo();
        j.entry(new Block.Entry("a + 2", List.of("3", ""), List.of()));
        Recovery r = Recovery.read(j.file());
        j.abandon();
        assertEquals(dir.resolve("gate.atw").toAbsolutePath(), r.worksheet());
        assertEquals(List.of(new Block.Entry("void f() {\n}", List.of("defined method f()"), List.of("f.svg")),
                new Block.Note("a note"), new Block.Entry("a + 2", List.of("3", ""), List.of())), r.blocks());
        // applied to the saved file's content
        Worksheet saved = Worksheet.titled("gate").with(Block.Entry.of("var a = 1;"));
        assertEquals(4, r.applyTo(saved).blocks().size());
    }

    @Test
    void undoPastTheSaveTakesASavedEntryBack() throws Exception {
        Journal j = Journal.start(dir);
        j.saved(dir.resolve("w.atw"));
        j.undo();
        Recovery r = Recovery.read(j.file());
        j.abandon();
        assertFalse(r.isEmpty());
        Worksheet saved = Worksheet.titled("w").with(Block.Entry.of("1")).with(Block.Entry.of("2"));
        assertEquals(List.of(Block.Entry.of("1")), r.applyTo(saved).blocks());
    }

    @Test
    void tornLastRecordIsDropped() throws Exception {
        Journal j = Journal.start(dir);
        j.entry(new Block.Entry("var a = 1;", List.of("a = 1"), List.of()));
        j.abandon();
        // the process died in the middle of writing the next record
        Files.writeString(j.file(), "e var b = 2;\n= b = ", StandardCharsets.UTF_8, StandardOpenOption.APPEND);
        assertEquals(List.of(new Block.Entry("var a = 1;", List.of("a = 1"), List.of())), Recovery.read(j.file()).blocks());
    }

    @Test
    void cleanCloseLeavesNothingAndSavedWorkIsNotOffered() throws Exception {
        Journal j = Journal.start(dir);
        j.entry(Block.Entry.of("1"));
        j.close();
        assertFalse(Files.exists(j.file()));
        // a dead process's journal whose work was all saved is tidied away
        Path dead = dir.resolve("20260101-000000-999999999.journal");
        Files.writeString(dead, Journal.MAGIC + "\n// pid: 999999999\ne 1\n.\ns /tmp/x.atw\n.\n");
        assertEquals(List.of(), Journal.unfinished(dir));
        assertFalse(Files.exists(dead));
        Files.writeString(dead, Journal.MAGIC + "\n// pid: 999999999\ne 1\n= 1\n.\n");
        List<Recovery> found = Journal.unfinished(dir);
        assertEquals(1, found.size());
        assertTrue(found.get(0).toString().startsWith("unsaved work of an ended session: 1 entries, 0 notes, on a new worksheet"));
    }
}
