package org.ampturn.worksheet;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Atomic save: a failed write leaves the old file as it was, and says so. */
class WorksheetFilesTest {
    @TempDir
    Path dir;

    @Test
    void saveWritesAndReadsBack() throws Exception {
        Worksheet w = Worksheet.titled("t").with(Block.Entry.of("1 + 2"));
        Path f = dir.resolve("a.atw");
        byte[] bytes = WorksheetFiles.save(w, f);
        assertArrayEquals(bytes, Files.readAllBytes(f));
        assertEquals(w, WorksheetFiles.read(f, Completeness.BRACKETS));
        assertEquals(List.of(f), listing());
    }

    @Test
    void saveKeepsTheOldFilesPermissionsAndGivesNewFilesReadableOnes() throws Exception {
        Path f = dir.resolve("shared.atw");
        WorksheetFiles.save(Worksheet.titled("t"), f);
        assertEquals("rw-r--r--", java.nio.file.attribute.PosixFilePermissions.toString(Files.getPosixFilePermissions(f)));
        Files.setPosixFilePermissions(f, java.nio.file.attribute.PosixFilePermissions.fromString("rw-rw----"));
        WorksheetFiles.save(Worksheet.titled("u"), f);
        assertEquals("rw-rw----", java.nio.file.attribute.PosixFilePermissions.toString(Files.getPosixFilePermissions(f)));
    }

    @Test
    void failedWriteLeavesOldFileIntactAndSaysSo() throws Exception {
        Path f = dir.resolve("coil.atw");
        Files.writeString(f, "// ampturn worksheet 1\n\nold\n");
        byte[] before = Files.readAllBytes(f);
        WorksheetFiles.Writer halfThenFail = (out, bytes) -> {
            out.write(bytes, 0, bytes.length / 2);
            throw new IOException("No space left on device");
        };
        SaveException e = assertThrows(SaveException.class,
                () -> WorksheetFiles.saveText("// ampturn worksheet 1\n\nnew text that is longer\n", f, halfThenFail));
        assertArrayEquals(before, Files.readAllBytes(f));
        assertEquals("could not save " + f + ": io (No space left on device); the file on disk is unchanged", e.getMessage());
        assertEquals(List.of(f), listing(), "the temporary file is removed");
    }

    @Test
    void missingDirectoryIsReportedAsNothingWritten() {
        Path f = dir.resolve("no/such/dir/x.atw");
        SaveException e = assertThrows(SaveException.class, () -> WorksheetFiles.save(Worksheet.titled("t"), f));
        assertTrue(e.getMessage().startsWith("could not save " + f + ": no such file") && e.getMessage().endsWith("nothing was written"),
                e.getMessage());
    }

    @Test
    void nonUtf8FileIsNotAWorksheet() throws Exception {
        Path f = dir.resolve("bin.atw");
        Files.write(f, new byte[] {(byte) 0xff, (byte) 0xfe, 0, 1});
        IOException e = assertThrows(IOException.class, () -> WorksheetFiles.read(f, Completeness.BRACKETS));
        assertEquals(f + " is not UTF-8 text: line 1, byte 1 of the line (0xFF, byte 1 of the file); save it as UTF-8", e.getMessage());
    }

    @Test
    void formatErrorNamesTheFile() throws Exception {
        Path f = dir.resolve("notes.txt");
        Files.writeString(f, "shopping list\n", StandardCharsets.UTF_8);
        WorksheetFormatException e = assertThrows(WorksheetFormatException.class, () -> WorksheetFiles.read(f, Completeness.BRACKETS));
        assertTrue(e.getMessage().startsWith(f + ": not an Ampturn worksheet"), e.getMessage());
    }

    private List<Path> listing() throws IOException {
        try (Stream<Path> s = Files.list(dir)) {
            return s.toList();
        }
    }

    @Test
    void textThatIsNotUtf8IsRefusedWithItsLineAndByte() throws IOException {
        Path f = dir.resolve("latin1.atw");
        Files.write(f, "// ampturn worksheet 1\n\n\"caf\u00e9\"\n".getBytes(StandardCharsets.ISO_8859_1));
        IOException e = assertThrows(IOException.class, () -> WorksheetFiles.readText(f));
        assertEquals(f + " is not UTF-8 text: line 3, byte 5 of the line (0xE9, byte 29 of the file); save it as UTF-8", e.getMessage());
    }
}
