package org.ampturn.units;

import static org.junit.jupiter.api.Assertions.*;

import java.io.IOException;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The shared CSV conventions and the atomic writer behind every saved CSV and figure. */
class CsvTest {
    @TempDir Path dir;

    @Test
    void headersCarryTheSiUnitInAscii() {
        // SI coherent units (BIPM SI Brochure, 9th ed., table 4), spelled in ASCII
        assertEquals("current (A)", Csv.header("current", Dimension.CURRENT));
        assertEquals("R (ohm)", Csv.header("R", Dimension.RESISTANCE));
        assertEquals("flux linkage (Wb)", Csv.header("flux linkage", Dimension.FLUX));
        assertEquals("area (m^2)", Csv.header("area", Dimension.AREA));
        assertEquals("rho (ohm*m)", Csv.header("rho", Dimension.RESISTIVITY));
        assertEquals("h (W/(m^2*K))", Csv.header("h", Dimension.HEAT_TRANSFER_COEFFICIENT));
        assertEquals("hot spot (K)", Csv.header("hot spot", Dimension.TEMPERATURE));
        assertEquals("turns", Csv.header("turns", Dimension.NONE));
        assertEquals("\"a, b (V)\"", Csv.header("a, b", Dimension.VOLTAGE));
        // the ASCII spelling reads back as the same unit
        assertEquals(1.0, Quantity.parse("1 " + Csv.asciiUnit(Dimension.RESISTIVITY).replace("*", "·")).si(), 0);
        assertEquals(Dimension.RESISTANCE, Quantity.parse("1 " + Csv.asciiUnit(Dimension.RESISTANCE)).dimension());
    }

    @Test
    void numbersReadBackExactlyAndMissingValuesAreEmpty() {
        for (double v : new double[] {0.1, 1e-9, 2.4 * (1 - Math.exp(-10)), -3.75e12, 1.0 / 3}) {
            assertEquals(v, Double.parseDouble(Csv.number(v)), 0, Csv.number(v));
        }
        assertEquals("400", Csv.number(400));
        assertEquals("", Csv.number(Double.NaN));
        assertEquals("\"say \"\"hi\"\", twice\"", Csv.cell("say \"hi\", twice"));
        assertEquals("\"two\nlines\"", Csv.cell("two\nlines"));
    }

    @Test
    void aByteOrderMarkOnlyWhenTheTextIsNotAscii() {
        byte[] ascii = Csv.bytes("a,b\n1,2\n");
        assertEquals("a,b\n1,2\n", new String(ascii, StandardCharsets.US_ASCII));
        byte[] utf = Csv.bytes("wire\n0.50 mm Ω\n");
        // EF BB BF is U+FEFF in UTF-8 (The Unicode Standard, ch. 23.8, byte order mark)
        assertArrayEquals(new byte[] {(byte) 0xEF, (byte) 0xBB, (byte) 0xBF}, java.util.Arrays.copyOf(utf, 3));
        assertEquals("wire\n0.50 mm Ω\n", new String(utf, 3, utf.length - 3, StandardCharsets.UTF_8));
    }

    @Test
    void newFilesGetTheUsersNormalPermissionsNotPrivateOnes() throws IOException {
        if (!dir.getFileSystem().supportedFileAttributeViews().contains("posix")) return;
        Path reference = dir.resolve("reference.txt");
        try (OutputStream o = Files.newOutputStream(reference)) {
            o.write('x');
        }
        Path f = Csv.save(dir.resolve("out.csv"), "a\n1\n");
        assertEquals(Files.getPosixFilePermissions(reference), Files.getPosixFilePermissions(f),
                "a CSV file gets what any new file of the user gets (umask)");
        if (!Files.getPosixFilePermissions(reference).equals(PosixFilePermissions.fromString("rw-------"))) {
            // with a umask wider than 077 the old writer's private temporary file would show here
            assertNotEquals(PosixFilePermissions.fromString("rw-------"), Files.getPosixFilePermissions(f));
        }
        Files.setPosixFilePermissions(f, PosixFilePermissions.fromString("rw-r-----"));
        Csv.save(f, "a\n2\n");
        assertEquals(PosixFilePermissions.fromString("rw-r-----"), Files.getPosixFilePermissions(f), "an existing file keeps its permissions");
        assertEquals("a\n2\n", Files.readString(f));
    }

    @Test
    void aFailedWriteLeavesTheOldFileAndNoTemporaryFile() throws IOException {
        Path f = Csv.save(dir.resolve("keep.csv"), "a\n1\n");
        UncheckedIOException e = assertThrows(UncheckedIOException.class, () -> AtomicFile.write(f, out -> {
            out.write("a\n".getBytes(StandardCharsets.US_ASCII));
            throw new IOException("disk full");
        }));
        assertTrue(e.getMessage().contains("keep.csv") && e.getMessage().contains("disk full"), e.getMessage());
        assertEquals("a\n1\n", Files.readString(f));
        try (Stream<Path> files = Files.list(dir)) {
            assertEquals(List.of(f), files.toList(), "no temporary file is left");
        }
    }

    @Test
    void aFolderAsTargetIsRefusedByName() {
        UncheckedIOException e = assertThrows(UncheckedIOException.class, () -> Csv.save(dir, "a\n"));
        assertTrue(e.getMessage().contains(dir.toString()) && e.getMessage().contains("folder"), e.getMessage());
    }
}
