package org.ampturn.drive;

import static org.ampturn.Ampturn.*;
import static org.junit.jupiter.api.Assertions.*;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.ampturn.coil.Coil;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A transient written as CSV reads back to the same samples, with the SI unit of each column in its header. */
class TransientCsvTest {
    @TempDir Path dir;

    private final Transient run = Drive.dc(V(12)).into(Coil.lumped(mH(10), ohm(5))).offAt(ms(20), Clamp.zener(V(30))).simulate(ms(40));

    /** A reader of RFC 4180 records (quoted cells, doubled quotes), written here so the test does not trust the writer. */
    static List<List<String>> parse(String text) {
        List<List<String>> rows = new ArrayList<>();
        List<String> row = new ArrayList<>();
        StringBuilder cell = new StringBuilder();
        boolean quoted = false;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (quoted) {
                if (c == '"' && i + 1 < text.length() && text.charAt(i + 1) == '"') { cell.append('"'); i++; }
                else if (c == '"') quoted = false;
                else cell.append(c);
            } else if (c == '"') {
                quoted = true;
            } else if (c == ',') {
                row.add(cell.toString()); cell.setLength(0);
            } else if (c == '\n') {
                row.add(cell.toString()); cell.setLength(0); rows.add(row); row = new ArrayList<>();
            } else if (c != '\r') {
                cell.append(c);
            }
        }
        assertTrue(cell.length() == 0 && row.isEmpty(), "the last record ends with a line break");
        return rows;
    }

    @Test
    void everySignalIsAColumnThatReadsBackToTheSamples() throws IOException {
        Path f = run.saveCsv(dir.resolve("run.csv").toString());
        byte[] bytes = Files.readAllBytes(f);
        for (byte b : bytes) assertTrue(b >= 0, "a transient's CSV is plain ASCII (no byte-order mark)");
        List<List<String>> rows = parse(new String(bytes, java.nio.charset.StandardCharsets.US_ASCII));
        List<String> head = rows.get(0);
        assertEquals("time (s)", head.get(0));
        assertEquals(run.signals().size() + 1, head.size());
        assertEquals(run.current().size() + 1, rows.size(), "one row per sample");
        for (int j = 0; j < run.signals().size(); j++) {
            Signal s = run.signals().get(j);
            assertTrue(head.get(j + 1).startsWith(s.name() + " ("), head.get(j + 1));
            double[] v = s.values(), t = s.times();
            for (int k = 0; k < v.length; k++) {
                assertEquals(t[k], Double.parseDouble(rows.get(k + 1).get(0)), 0);
                assertEquals(v[k], Double.parseDouble(rows.get(k + 1).get(j + 1)), 0, s.name() + " at sample " + k);
            }
        }
        // SI units (BIPM SI Brochure, 9th ed.) of the signals a transient carries
        assertTrue(head.containsAll(List.of("current (A)", "flux linkage (Wb)", "coil voltage (V)", "switch voltage (V)",
                "supply power (W)", "stored energy (J)", "clamp energy (J)")), head.toString());
    }

    @Test
    void theCurrentColumnFollowsTheClosedForm() throws IOException {
        // i(t) = (V/R)(1 − e^(−tR/L)) before turn-off (Hayt, Kemmerly and Durbin, Engineering Circuit Analysis, 8th ed., ch. 8)
        List<List<String>> rows = parse(Files.readString(run.current().saveCsv(dir.resolve("i.csv").toString())));
        assertEquals(List.of("time (s)", "current (A)"), rows.get(0));
        int checked = 0;
        for (List<String> r : rows.subList(1, rows.size())) {
            double t = Double.parseDouble(r.get(0));
            if (t >= 0.020) break;
            assertEquals(12.0 / 5 * (1 - Math.exp(-t * 5 / 0.010)), Double.parseDouble(r.get(1)), 1e-9, "i at " + t);
            checked++;
        }
        assertTrue(checked > 100, "checked " + checked + " samples");
    }

    @Test
    void chosenSignalsInTheOrderGiven() {
        List<List<String>> rows = parse(run.toCsv(run.switchVoltage(), run.current()));
        assertEquals(List.of("time (s)", "switch voltage (V)", "current (A)"), rows.get(0));
        assertEquals(run.current().size() + 1, rows.size());
        Transient other = Drive.dc(V(12)).into(Coil.lumped(mH(10), ohm(5))).simulate(ms(5));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> run.toCsv(run.current(), other.current()));
        assertTrue(e.getMessage().contains("not from this run"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> run.toCsv(new Signal[0]));
    }

    @Test
    void aSavedRunHasTheUsersNormalPermissions() throws IOException {
        if (!dir.getFileSystem().supportedFileAttributeViews().contains("posix")) return;
        Path reference = dir.resolve("reference");
        try (OutputStream o = Files.newOutputStream(reference)) {
            o.write('x');
        }
        Path f = run.saveCsv(dir.resolve("run.csv").toString());
        assertEquals(Files.getPosixFilePermissions(reference), Files.getPosixFilePermissions(f));
    }

    @Test
    void aMissingFileNameIsRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> run.saveCsv(" "));
        assertTrue(e.getMessage().contains("file name"), e.getMessage());
    }
}
