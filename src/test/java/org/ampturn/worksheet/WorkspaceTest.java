package org.ampturn.worksheet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The console's worksheet: entries, notes, undo, save (trusted), open (trust first), replay, verify. */
class WorkspaceTest {

    /** Runs and workspaces number and place charts for their worksheet: leave the chart layer as other tests expect it. */
    @org.junit.jupiter.api.AfterEach
    void resetCharts() {
        org.ampturn.chart.Figures.useNumbering(null);
        org.ampturn.chart.Figures.useDirectory(java.nio.file.Path.of(""));
    }
    @TempDir
    Path dir;

    private Workspace workspace(FakeEvaluator ev) throws IOException {
        return Workspace.of(ev, VerifierTest::truth, TrustStore.of(dir.resolve("home/trusted"), null), dir.resolve("home/journal"));
    }

    @Test
    void enteredWorkIsSavedTrustedAndReopened() throws Exception {
        try (Workspace ws = workspace(VerifierTest.truth())) {
            assertEquals("untitled 1", ws.name() + " " + ws.nextEntryNumber());
            ws.note("Energy in the choke.");
            assertEquals(List.of("  L = 4.700 mH"), ws.enter("var L = mH(4.7);").lines());
            ws.enter("var I = A(2);");
            assertTrue(ws.enter("nonsense").failed());
            ws.enter("L.times(I.pow(2)).div(2)");
            assertEquals(3, ws.worksheet().entries().size(), "the failed entry is not an entry that runs");
            assertEquals(List.of(new Block.Failed("nonsense", List.of("! cannot find symbol in nonsense"))), ws.worksheet().failed());
            assertTrue(ws.isDirty());
            Path f = ws.save(dir.resolve("choke"));
            assertEquals(dir.resolve("choke.atw"), f);
            assertFalse(ws.isDirty());
            assertEquals("choke", ws.name());
            String text = Files.readString(f);
            assertTrue(text.startsWith("// ampturn worksheet 1\n// title: choke\n// tool: ampturn 0.1.0\n\n// Energy in the choke.\n"
                    + "var L = mH(4.7);\n//= L = 4.700 mH\n"), text);
            assertTrue(text.endsWith("var I = A(2);\n//= I = 2.000 A\n//! nonsense\n//= ! cannot find symbol in nonsense\n"
                    + "L.times(I.pow(2)).div(2)\n//= 9.4000 mJ\n"), text);
            assertTrue(ws.trustStore().isTrusted(f, Files.readAllBytes(f)), "saved here, so trusted");
        }
        FakeEvaluator ev = VerifierTest.truth();
        try (Workspace ws = workspace(ev)) {
            Workspace.Opened o = ws.open(dir.resolve("choke.atw"), Workspace.Confirm.NO, s -> {});
            assertTrue(o.ran());
            assertEquals(3, ev.ran.size(), "the failed record is not run");
            assertFalse(ev.ran.contains("nonsense"));
            assertEquals(List.of(), o.differences());
            assertEquals(List.of(), ws.verify(null, Workspace.Confirm.NO, s -> {}));
        }
    }

    @Test
    void untrustedFileIsShownButNotRunUntilConfirmed() throws Exception {
        Path f = dir.resolve("from-a-colleague.atw");
        Files.writeString(f, VerifierTest.SHEET);
        FakeEvaluator ev = VerifierTest.truth();
        try (Workspace ws = workspace(ev)) {
            Workspace.Opened o = ws.open(f, Workspace.Confirm.NO, s -> {});
            assertFalse(o.ran());
            assertEquals(List.of(), ev.ran, "nothing ran");
            assertEquals(3, o.worksheet().entries().size(), "it is read, for showing");
            assertEquals(0, ws.worksheet().entries().size(), "but it does not replace the current worksheet");
            assertNull(ws.file());
            List<String> asked = new ArrayList<>();
            o = ws.open(f, q -> asked.add(q), s -> {});
            assertTrue(o.ran());
            assertTrue(asked.get(0).contains("was not saved or trusted on this machine"), asked.get(0));
            assertEquals(3, ev.ran.size());
            assertTrue(ws.trustStore().isTrusted(f, Files.readAllBytes(f)), "confirming trusts it");
        }
    }

    @Test
    void verifyOfAnotherFileRefusesUntrustedAndUsesAFreshEvaluator() throws Exception {
        Path f = dir.resolve("other.atw");
        Files.writeString(f, VerifierTest.SHEET);
        FakeEvaluator ev = new FakeEvaluator();
        try (Workspace ws = workspace(ev)) {
            IOException e = assertThrows(IOException.class, () -> ws.verify(f, Workspace.Confirm.NO, s -> {}));
            assertTrue(e.getMessage().endsWith("is not trusted on this machine, so it was not run; #trust " + f + " to allow it"));
            ws.trust(f);
            assertEquals(List.of(), ws.verify(f, Workspace.Confirm.NO, s -> {}));
            assertEquals(List.of(), ev.ran, "the workspace's own session was not touched");
        }
    }

    @Test
    void undoAndReplayKeepWorksheetAndSessionInStep() throws Exception {
        FakeEvaluator ev = VerifierTest.truth();
        try (Workspace ws = workspace(ev)) {
            assertNull(ws.undo());
            ws.enter("var L = mH(4.7);");
            ws.enter("var I = A(2);");
            assertEquals("var I = A(2);", ws.undo());
            assertEquals(1, ws.worksheet().entries().size());
            ev.answer("var L = mH(4.7);", "  L = 4.7000 mH");
            ev.ran.clear();
            ws.replay(Workspace.Confirm.NO, s -> {});
            assertEquals(List.of("var L = mH(4.7);"), ev.ran);
            assertEquals(List.of("L = 4.7000 mH"), ws.worksheet().entries().get(0).results(), "replay records fresh results");
        }
    }

    @Test
    void useRunsSharedDefinitionsAndRecordsTheLine() throws Exception {
        Files.createDirectories(dir.resolve("team"));
        Path shared = dir.resolve("team/defs.atw");
        Files.writeString(shared, "// ampturn worksheet 1\n\nvar L = mH(4.7);\n//= L = 4.700 mH\n");
        FakeEvaluator ev = VerifierTest.truth();
        try (Workspace ws = workspace(ev)) {
            ws.save(dir.resolve("mine.atw"));
            Exception e = assertThrows(IOException.class, () -> ws.use(Path.of("team/defs.atw"), Workspace.Confirm.NO, s -> {}));
            assertTrue(e.getMessage().contains("is not trusted on this machine"), e.getMessage());
            ws.trust(shared);
            ws.use(Path.of("team/defs.atw"), Workspace.Confirm.NO, s -> {});
            ws.enter("var I = A(2);");
            ws.enter("L.times(I.pow(2)).div(2)");
            assertEquals(List.of(new Block.Use("team/defs.atw"), new Block.Entry("var I = A(2);", List.of("I = 2.000 A"), List.of()),
                    new Block.Entry("L.times(I.pow(2)).div(2)", List.of("9.4000 mJ"), List.of())), ws.worksheet().blocks());
            ws.save(null);
            assertEquals(List.of(), ws.verify(dir.resolve("mine.atw"), Workspace.Confirm.NO, s -> {}));
        }
    }

    @Test
    void replayedEntriesAreNotAddedTwiceAndUndoReachesTheJournal() throws Exception {
        FakeEvaluator ev = VerifierTest.truth();
        try (Workspace ws = workspace(ev)) {
            ws.enter("var L = mH(4.7);");
            ws.enter("oops");
            assertEquals(1, ws.worksheet().entries().size());
            ws.replay(Workspace.Confirm.NO, s -> {});
            assertEquals(1, ws.worksheet().entries().size(), "a replayed entry is not added twice");
            assertEquals("oops", ws.undo(), "the failed record goes first");
            assertEquals(1, ws.worksheet().entries().size());
            assertEquals(List.of("var L = mH(4.7);"), ev.ran.subList(ev.ran.size() - 1, ev.ran.size()), "the failed entry was not replayed");
            assertEquals("var L = mH(4.7);", ws.undo());
            assertEquals(0, ws.worksheet().entries().size());
            List<Recovery> none = Journal.unfinished(dir.resolve("home/journal"));
            assertEquals(List.of(), none, "a live journal is never offered");
            Recovery r = Recovery.read(ws.journal().file());
            assertEquals(List.of(), r.blocks(), "the undo reached the journal");
        }
    }

    @Test
    void saveWithoutNameSaysHow() throws Exception {
        try (Workspace ws = workspace(VerifierTest.truth())) {
            IOException e = assertThrows(IOException.class, () -> ws.save(null));
            assertEquals("this worksheet has no file yet: give a name, e.g. #save coil.atw", e.getMessage());
        }
    }

    @Test
    void aStoppedEntryIsSavedAsARecordAndOpeningDoesNotRunIt() throws Exception {
        FakeEvaluator ev = VerifierTest.truth().interrupts("while (true) {}");
        Path f = dir.resolve("runaway.atw");
        try (Workspace ws = workspace(ev)) {
            ws.enter("var L = mH(4.7);");
            assertTrue(ws.enter("while (true) {}").interrupted());
            ws.save(f);
        }
        assertTrue(Files.readString(f).endsWith("var L = mH(4.7);\n//= L = 4.700 mH\n//! while (true) {}\n//= ! interrupted\n"), Files.readString(f));
        FakeEvaluator again = VerifierTest.truth().runsAway("while (true) {}");
        try (Workspace ws = workspace(again)) {
            Workspace.Opened o = ws.open(f, Workspace.Confirm.NO, s -> {});
            assertTrue(o.ran());
            assertEquals(List.of("var L = mH(4.7);"), again.ran, "the stopped entry is a record: it does not run (it would never end)");
            assertEquals(List.of(), o.differences());
            assertEquals(1, o.worksheet().failed().size());
        }
    }

    @Test
    void ctrlCDuringAReplayStopsTheWholeReplayAndKeepsWhatRan() throws Exception {
        Path f = dir.resolve("long.atw");
        Files.writeString(f, VerifierTest.SHEET);
        FakeEvaluator ev = VerifierTest.truth().runsAway("var I = A(2);");
        try (Workspace ws = workspace(ev)) {
            ws.trust(f);
            Thread stopper = new Thread(() -> {
                while (!ev.ran.contains("var I = A(2);")) Thread.onSpinWait();
                ws.stop();
            });
            stopper.start();
            Workspace.Opened o = ws.open(f, Workspace.Confirm.NO, s -> {});
            stopper.join();
            assertEquals(List.of("var L = mH(4.7);", "var I = A(2);"), ev.ran, "the entry after the stopped one did not run");
            assertEquals(2, o.steps().size());
            assertTrue(o.steps().get(1).result().interrupted());
            assertEquals(3, ws.worksheet().entries().size(), "what was not run is still in the worksheet");
        }
    }

    @Test
    void twoConsolesOnOneFileDoNotLoseWork() throws Exception {
        Path f = dir.resolve("shared.atw");
        try (Workspace a = workspace(VerifierTest.truth()); Workspace b = workspace(VerifierTest.truth())) {
            a.enter("var L = mH(4.7);");
            a.save(f);
            b.open(f, Workspace.Confirm.NO, s -> {});
            a.enter("var I = A(2);");
            b.enter("L.times(I.pow(2)).div(2)");
            b.save(null); // B saves first
            IOException e = assertThrows(IOException.class, () -> a.save(null));
            assertTrue(e.getMessage().contains("changed on disk since this console opened or saved it"), e.getMessage());
            assertTrue(e.getMessage().contains("#save " + dir.resolve("shared-2.atw")), e.getMessage());
            assertTrue(a.isDirty(), "A's work is still unsaved, so its journal stays");
            assertTrue(Files.readString(f).contains("L.times(I.pow(2)).div(2)"), "B's save is intact");
            a.save(dir.resolve("shared-2.atw"));
            assertTrue(Files.readString(dir.resolve("shared-2.atw")).contains("var I = A(2);"));
            IOException other = assertThrows(IOException.class, () -> workspace(VerifierTest.truth()).save(f));
            assertTrue(other.getMessage().contains("already exists and is not this worksheet's file"), other.getMessage());
        }
    }

    @Test
    void savingASymlinkedWorksheetKeepsTheLink() throws Exception {
        Path real = Files.createDirectories(dir.resolve("repo")).resolve("coil.atw");
        Path link = dir.resolve("coil.atw");
        try (Workspace a = workspace(VerifierTest.truth())) {
            a.enter("var L = mH(4.7);");
            a.save(real);
        }
        Files.createSymbolicLink(link, real);
        try (Workspace b = workspace(VerifierTest.truth())) {
            b.open(link, Workspace.Confirm.NO, s -> {});
            b.enter("var I = A(2);");
            b.save(null);
        }
        assertTrue(Files.isSymbolicLink(link), "still a link");
        assertTrue(Files.readString(real).contains("var I = A(2);"), "the file it points to got the work");
        try (var s = Files.list(real.getParent())) {
            assertEquals(List.of(real), s.toList(), "no temporary file left beside it");
        }
    }

    @Test
    void chartsMadeBeforeTheFirstSaveMoveBesideTheWorksheet() throws Exception {
        Path loose = Files.createDirectories(dir.resolve("elsewhere")).resolve("03-current.svg");
        Files.writeString(loose, "<svg xmlns='http://www.w3.org/2000/svg'/>");
        FakeEvaluator ev = VerifierTest.truth();
        ev.answers.put("plot(run)", new Evaluation(FakeEvaluator.evaluation("plot(run)", "  = figure current").outcome(), List.of(loose.toString())));
        Path f = dir.resolve("proj/gate.atw");
        Files.createDirectories(f.getParent());
        try (Workspace ws = workspace(ev)) {
            ws.enter("plot(run)");
            assertEquals(List.of(loose.toString()), ws.worksheet().entries().get(0).figures(), "before a save: where it was made");
            ws.save(f);
            assertEquals(List.of("gate.figures/03-current.svg"), ws.worksheet().entries().get(0).figures());
        }
        assertTrue(Files.exists(dir.resolve("proj/gate.figures/03-current.svg")));
        assertFalse(Files.exists(loose), "moved, not left behind");
        assertTrue(Files.readString(f).contains("//= figure: gate.figures/03-current.svg\n"), Files.readString(f));
    }
}
