package org.ampturn.worksheet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.InputStreamReader;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A console process killed outright (SIGKILL) loses no entry whose result it showed. */
class JournalKillTest {
    @TempDir
    Path home;

    static String classPath() throws Exception {
        Path tests = Path.of(JournalChild.class.getProtectionDomain().getCodeSource().getLocation().toURI());
        Path main = Path.of(Workspace.class.getProtectionDomain().getCodeSource().getLocation().toURI());
        Path units = Path.of(org.ampturn.units.Quantity.class.getProtectionDomain().getCodeSource().getLocation().toURI());
        return tests + java.io.File.pathSeparator + main + java.io.File.pathSeparator + units;
    }

    @Test
    void killedMidSessionThenRecoversEveryEntry() throws Exception {
        Path java = Path.of(System.getProperty("java.home"), "bin", "java");
        Process child = new ProcessBuilder(java.toString(), "-Dampturn.home=" + home, "-cp", classPath(),
                "org.ampturn.worksheet.JournalChild").redirectErrorStream(true).start();
        List<String> typed = List.of("var L = mH(4.7);", "var I = A(2);", "#note energy of the choke", "L.times(I.pow(2)).div(2)",
                "var R = ohm(12.5);");
        List<String> seen = new ArrayList<>();
        try (Writer w = new OutputStreamWriter(child.getOutputStream(), StandardCharsets.UTF_8);
             BufferedReader r = new BufferedReader(new InputStreamReader(child.getInputStream(), StandardCharsets.UTF_8))) {
            assertTrue(r.readLine().startsWith("journal "));
            for (int k = 0; k < typed.size(); k++) {
                w.write(typed.get(k) + "\n");
                w.flush();
                String line;
                while (!(line = r.readLine()).startsWith("shown ")) seen.add(line);
            }
            assertTrue(child.isAlive());
            child.destroyForcibly();
            assertTrue(child.waitFor(20, TimeUnit.SECONDS));
        }
        assertEquals(137, child.exitValue(), "killed by SIGKILL (128 + 9), not a clean exit");
        assertEquals(List.of("  L = mH(4.7)", "  I = A(2)", "  = L.times(I.pow(2)).div(2)", "  R = ohm(12.5)"), seen);

        List<Recovery> found = Journal.unfinished(home.resolve("journal"));
        assertEquals(1, found.size());
        Recovery rec = found.get(0);
        assertEquals(child.pid(), rec.pid());
        assertEquals(List.of(
                new Block.Entry("var L = mH(4.7);", List.of("L = mH(4.7)"), List.of()),
                new Block.Entry("var I = A(2);", List.of("I = A(2)"), List.of()),
                new Block.Note("energy of the choke"),
                new Block.Entry("L.times(I.pow(2)).div(2)", List.of("L.times(I.pow(2)).div(2)"), List.of()),
                new Block.Entry("var R = ohm(12.5);", List.of("R = ohm(12.5)"), List.of())), rec.blocks());

        // #recover in a new session brings all of it back and runs it again
        FakeEvaluator ev = new FakeEvaluator();
        try (Workspace ws = Workspace.of(ev, FakeEvaluator::new, TrustStore.of(home.resolve("trusted"), null), home.resolve("journal"))) {
            assertEquals(1, ws.recoverable().size());
            ws.recover(ws.recoverable().get(0), Workspace.Confirm.NO, s -> {});
            assertEquals(rec.blocks(), ws.worksheet().blocks());
            assertEquals(List.of("var L = mH(4.7);", "var I = A(2);", "L.times(I.pow(2)).div(2)", "var R = ohm(12.5);"), ev.ran);
            assertTrue(ws.isDirty());
            assertFalse(Files.exists(rec.journal()), "the old journal is gone once restored");
            assertEquals(List.of(), Journal.unfinished(home.resolve("journal")), "our own live journal is not offered");
        }
    }
}
