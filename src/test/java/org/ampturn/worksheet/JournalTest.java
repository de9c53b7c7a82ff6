package org.ampturn.worksheet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
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
        Journal saved = Journal.start(dir, 999999999L);
        saved.entry(Block.Entry.of("1"));
        saved.saved(Path.of("/tmp/x.atw"));
        saved.abandon();
        assertEquals(List.of(), Journal.unfinished(dir));
        assertFalse(Files.exists(saved.file()));
        Journal unsaved = Journal.start(dir, 999999999L);
        unsaved.entry(new Block.Entry("1", List.of("1"), List.of()));
        unsaved.abandon();
        List<Recovery> found = Journal.unfinished(dir);
        assertEquals(1, found.size());
        assertTrue(found.get(0).toString().startsWith("unsaved work of an ended session: 1 entries, 0 notes, on a new worksheet"));
    }

    @Test
    void aJournalThisToolDidNotWriteIsNeverOffered() throws Exception {
        // planted: the right format, but no seal made with this user's key
        Path planted = dir.resolve("20260101-000000-999999998.journal");
        Files.writeString(planted, Journal.MAGIC + "\n// pid: 999999998\ne java.nio.file.Files.delete(java.nio.file.Path.of(\"x\"));\n.\n");
        assertEquals(List.of(), Journal.unfinished(dir));
        assertTrue(Files.exists(planted), "left alone, not run and not deleted");
        assertFalse(Recovery.read(planted).sealed());
        // ours, but edited afterwards: not offered either
        Journal j = Journal.start(dir, 999999997L);
        j.entry(new Block.Entry("var a = 1;", List.of("a = 1"), List.of()));
        j.abandon();
        Files.writeString(j.file(), Files.readString(j.file()).replace("var a = 1;", "var a = 2;"));
        assertEquals(List.of(), Journal.unfinished(dir));
    }

    @Test
    void aTornRecordIsWrittenAgainBeforeTheNextSoNothingIsLost() throws Exception {
        Journal j = Journal.start(dir, 999999996L);
        j.entry(new Block.Entry("var a = 1;", List.of("a = 1"), List.of()));
        j.failNext = new IOException("No space left on device");
        assertThrows(IOException.class, () -> j.entry(new Block.Entry("var b = a + 1;", List.of("b = 2"), List.of())));
        assertFalse(Files.readString(j.file()).contains("var b"), "the half-written record is cut off again");
        j.entry(new Block.Entry("var c = b * 2;", List.of("c = 4"), List.of()));
        j.abandon();
        assertEquals(List.of("var a = 1;", "var b = a + 1;", "var c = b * 2;"),
                Recovery.read(j.file()).entries().stream().map(Block.Entry::source).toList(), "in order, none lost, none twice");
    }

    @Test
    void aSaveKilledAfterItsRenameDoesNotBringEntriesBackTwice() throws Exception {
        Path w = dir.resolve("w.atw");
        Journal j = Journal.start(dir, 999999995L);
        j.entry(new Block.Entry("var a = 1;", List.of("a = 1"), List.of()));
        String text = "// ampturn worksheet 1\n\nvar a = 1;\n//= a = 1\n";
        j.saving(w, TrustStore.hash(text.getBytes(java.nio.charset.StandardCharsets.UTF_8)));
        Files.writeString(w, text); // the rename happened; the process died before the "saved" record
        j.abandon();
        Recovery r = Recovery.read(j.file());
        assertEquals(w, r.worksheet());
        assertTrue(r.isEmpty(), "the work is in the file: nothing to add to it again");
    }
}
