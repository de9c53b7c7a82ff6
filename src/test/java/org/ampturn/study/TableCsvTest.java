package org.ampturn.study;

import static org.ampturn.Ampturn.*;
import static org.junit.jupiter.api.Assertions.*;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A study table as CSV: ASCII SI units in the header, exact SI values, and the user's normal permissions. */
class TableCsvTest {
    @TempDir Path dir;

    @Test
    void headersAreAsciiSiUnitsAndValuesReadBack() throws IOException {
        Table t = sweep("turns", 100, 400, 4, n -> Outputs.of("R", ohm(n * 0.0123), "L", uH(n * 1.5), "hot", degC(40 + n / 10.0)));
        Path f = t.saveCsv(dir.resolve("t.csv").toString());
        byte[] bytes = Files.readAllBytes(f);
        for (byte b : bytes) assertTrue(b >= 0, "numbers only: plain ASCII, no byte-order mark");
        String[] lines = new String(bytes, StandardCharsets.US_ASCII).split("\n");
        // SI units (BIPM SI Brochure, 9th ed.); temperatures as thermodynamic temperature in kelvin
        assertEquals("turns,R (ohm),L (H),hot (K)", lines[0]);
        String[] r2 = lines[2].split(",");
        assertEquals("200", r2[0]);
        assertEquals(200 * 0.0123, Double.parseDouble(r2[1]), 1e-15);
        assertEquals(200 * 1.5e-6, Double.parseDouble(r2[2]), 1e-18);
        assertEquals(273.15 + 60, Double.parseDouble(r2[3]), 1e-9); // 0 °C = 273.15 K (BIPM SI Brochure, 9th ed., 2.3.1)
    }

    @Test
    void nonAsciiLabelsGetAByteOrderMarkSoSpreadsheetsReadThemAsUtf8() throws IOException {
        Table t = sweep("core", List.of("ferrite µ 2000", "iron powder"), c -> ohm(c.length()));
        Path f = t.saveCsv(dir.resolve("labels.csv"));
        byte[] b = Files.readAllBytes(f);
        assertEquals(0xEF, b[0] & 0xFF);
        assertEquals(0xBB, b[1] & 0xFF);
        assertEquals(0xBF, b[2] & 0xFF);
        assertEquals(t.toCsv(), new String(b, 3, b.length - 3, StandardCharsets.UTF_8));
        assertTrue(t.toCsv().startsWith("core,"), t.toCsv());
    }

    @Test
    void aSavedTableHasTheUsersNormalPermissions() throws IOException {
        if (!dir.getFileSystem().supportedFileAttributeViews().contains("posix")) return;
        Path reference = dir.resolve("reference");
        try (OutputStream o = Files.newOutputStream(reference)) {
            o.write('x');
        }
        Path f = sweep("turns", 1, 3, 3, n -> mH(n)).saveCsv(dir.resolve("p.csv").toString());
        assertEquals(Files.getPosixFilePermissions(reference), Files.getPosixFilePermissions(f));
    }
}
