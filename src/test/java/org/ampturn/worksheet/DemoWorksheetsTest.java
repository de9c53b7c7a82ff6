package org.ampturn.worksheet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.ampturn.Ampturn;
import org.junit.jupiter.api.BeforeAll;
import org.ampturn.console.WorksheetCli;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The demo worksheets shipped in {@code worksheets/}: each one replays in a fresh JShell session
 * and every result still matches what it recorded (the same check as {@code ampturn verify}, run
 * in process through {@link WorksheetCli}), without {@code --trust}, because shipped demos are
 * trusted. Their content is checked for what a calculation log handed to a colleague needs: a
 * title, the tool version, prose notes, a recorded result under every entry, and the cautions.
 */
class DemoWorksheetsTest {

    /** Runs and workspaces number and place charts for their worksheet: leave the chart layer as other tests expect it. */
    @org.junit.jupiter.api.AfterEach
    void resetCharts() {
        org.ampturn.chart.Figures.useNumbering(null);
        org.ampturn.chart.Figures.useDirectory(java.nio.file.Path.of(""));
    }
    static final Path DEMOS = Path.of("worksheets");
    static final List<String> EXPECTED = List.of("buoy-choke.atw", "fixture-magnet.atw", "gate-latch.atw", "seed-sorter-valve.atw");

    static List<Path> demos;

    @BeforeAll
    static void list() throws IOException {
        try (Stream<Path> s = Files.list(DEMOS)) {
            demos = s.filter(p -> p.getFileName().toString().endsWith(".atw")).sorted().toList();
        }
    }

    @Test
    void theFourScenariosShip() {
        List<String> names = demos.stream().map(p -> p.getFileName().toString()).toList();
        assertTrue(names.containsAll(EXPECTED), "demo worksheets found: " + names);
    }

    @Test
    void everyDemoVerifiesWithoutTrustFlag(@TempDir Path home) {
        // a trust store that has never seen these files: only the shipped-demo rule can admit them
        TrustStore trust = TrustStore.of(home.resolve("trusted"), DEMOS);
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        WorksheetCli cli = WorksheetCli.of(ShellEvaluator::start, trust, new ByteArrayInputStream(new byte[0]),
                new PrintStream(out, true, StandardCharsets.UTF_8), new PrintStream(err, true, StandardCharsets.UTF_8));
        List<String> args = new ArrayList<>();
        for (Path p : demos) args.add(p.toString());

        int rc = cli.verb("verify", args);

        String report = out.toString(StandardCharsets.UTF_8);
        assertEquals(0, rc, report + err.toString(StandardCharsets.UTF_8));
        for (Path p : demos) {
            assertTrue(report.contains(p + ": "), "no verdict for " + p + ":\n" + report);
            assertTrue(report.lines().anyMatch(l -> l.startsWith(p + ": ") && l.endsWith("all results hold")),
                    p + " does not hold:\n" + report);
        }
        assertFalse(report.contains("not trusted") || report.contains("not run"), report);
    }

    @Test
    void demosAreTrustedAsShipped(@TempDir Path home) throws IOException {
        TrustStore trust = TrustStore.of(home.resolve("trusted"), DEMOS);
        for (Path p : demos) assertTrue(trust.isTrusted(p, Files.readAllBytes(p)), p + " is not taken as a shipped demo");
        // and the same content elsewhere is not: the trust comes from where the file lies
        Path copy = home.resolve("copy.atw");
        Files.copy(demos.get(0), copy);
        assertFalse(trust.isTrusted(copy, Files.readAllBytes(copy)));
    }

    @Test
    void everyDemoIsAFullCalculationLog() throws Exception {
        for (Path p : demos) {
            String text = WorksheetFiles.readText(p);
            Worksheet w = WorksheetFormat.parse(text);
            assertFalse(w.title().isBlank(), p + " has no title");
            assertEquals("ampturn " + Ampturn.version(), w.tool(), p + " names another tool version");
            long notes = w.blocks().stream().filter(b -> b instanceof Block.Note).count();
            List<Block.Entry> entries = w.entries();
            assertTrue(entries.size() >= 10, p + " has only " + entries.size() + " entries");
            assertTrue(notes >= entries.size() / 2, p + " has " + notes + " note lines for " + entries.size() + " entries");
            for (Block.Entry e : entries) {
                assertFalse(e.results().isEmpty(), p + ": entry without a recorded result: " + e.source());
                for (String r : e.results()) assertFalse(r.strip().startsWith("!"), p + ": recorded an error: " + r);
            }
            assertTrue(text.contains("CAUTION"), p + " shows no caution");
            assertTrue(text.contains("local codes and licensed practice"), p + " does not defer to local codes and licensed practice");
            assertTrue(text.contains("invented demo scenario"), p + " does not say it is an invented scenario");
        }
    }
}
