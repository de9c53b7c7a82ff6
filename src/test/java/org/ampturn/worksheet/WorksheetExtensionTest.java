package org.ampturn.worksheet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The console plug-in over a real session and a console stand-in: commands, journal, trust. */
class WorksheetExtensionTest {
    static Session session;

    @TempDir
    Path dir;

    String oldHome;

    @BeforeAll
    static void start() {
        session = Session.start();
    }

    @AfterAll
    static void end() {
        session.close();
    }

    @BeforeEach
    void home() {
        oldHome = System.getProperty(AmpturnHome.PROPERTY);
        System.setProperty(AmpturnHome.PROPERTY, dir.resolve("home").toString());
        session.clear();
    }

    @AfterEach
    void restore() {
        // the extension numbers chart files by entry; leave the chart layer as other tests expect it
        org.ampturn.chart.Figures.useNumbering(null);
        org.ampturn.chart.Figures.useDirectory(Path.of(""));
        if (oldHome == null) System.clearProperty(AmpturnHome.PROPERTY);
        else System.setProperty(AmpturnHome.PROPERTY, oldHome);
    }

    /** Just enough of the console: runs entries, tells the extension, answers questions from a queue. */
    static final class Stand implements SessionConsole {
        final SessionExtension ext;
        final StringWriter text = new StringWriter();
        final PrintWriter out = new PrintWriter(text, true);
        final Deque<Boolean> answers = new ArrayDeque<>();
        final List<Outcome> history = new ArrayList<>();
        Path file;
        boolean unsaved;

        Stand(SessionExtension ext) {
            this.ext = ext;
        }

        @Override public Session session() { return session; }
        @Override public PrintWriter out() { return out; }
        @Override public boolean confirm(String q) { out.println("? " + q); return !answers.isEmpty() && answers.pop(); }
        @Override public Outcome enter(String src, boolean echo) {
            Outcome o = session.eval(src);
            if (o.kept()) { history.add(o); unsaved = true; }
            ext.evaluated(this, o);
            return o;
        }
        @Override public List<Outcome> history() { return List.copyOf(history); }
        @Override public void clear() { session.clear(); history.clear(); }
        @Override public Optional<Path> file() { return Optional.ofNullable(file); }
        @Override public void file(Path f) { file = f; }
        @Override public boolean unsaved() { return unsaved; }
        @Override public void saved() { unsaved = false; }

        void command(String word, String arg) throws Exception {
            for (SessionCommand c : ext.commands()) if (c.name().equals(word)) { c.run(arg, this); return; }
            throw new AssertionError("no command " + word);
        }

        String take() {
            String s = text.toString();
            text.getBuffer().setLength(0);
            return s;
        }
    }

    @Test
    void isFoundByTheConsole() {
        assertTrue(SessionExtensions.all().stream().anyMatch(e -> e instanceof WorksheetExtension));
        List<String> words = new ArrayList<>();
        for (SessionCommand c : new WorksheetExtension().commands()) words.add(c.name());
        assertEquals(List.of("open", "save", "replay", "verify", "note", "use", "figures", "export", "trust", "recover"), words);
    }

    @Test
    void typedEntriesAreJournaledSavedAndTrusted() throws Exception {
        Stand c = new Stand(new WorksheetExtension());
        c.enter("var L = mH(4.7);", false);
        c.command("note", "the choke");
        c.enter("L.times(A(2).pow(2)).div(2)", false);
        // on disk in the journal before anything was saved
        List<Path> journals;
        try (var s = Files.list(dir.resolve("home/journal"))) {
            journals = s.toList();
        }
        assertEquals(1, journals.size());
        assertEquals(2, Recovery.read(journals.get(0)).entries().size());
        Path f = dir.resolve("choke.atw");
        c.command("save", f.toString());
        assertTrue(c.take().contains("saved " + f + " (2 entries)"));
        assertEquals(f, c.file);
        assertFalse(c.unsaved);
        String text = Files.readString(f);
        assertTrue(text.contains("var L = mH(4.7);\n//= L = 4.700 mH\n\n// the choke\nL.times(A(2).pow(2)).div(2)\n//= 9.400 mJ\n"), text);
        c.command("verify", "");
        assertTrue(c.take().contains("every recorded result of this worksheet holds"));
        c.command("export", dir.resolve("choke.html").toString());
        assertTrue(Files.readString(dir.resolve("choke.html")).contains("<pre class=\"out\">= 9.400 mJ</pre>"));
    }

    @Test
    void untrustedOpenShowsThenRunsOnlyWhenConfirmed() throws Exception {
        Path f = dir.resolve("mailed.atw");
        Files.writeString(f, WorksheetFormatTest.fixture("units-check.atw"));
        Stand c = new Stand(new WorksheetExtension());
        c.answers.add(false);
        c.command("open", f.toString());
        String shown = c.take();
        assertTrue(shown.contains("not yet trusted on this machine:\n  | // ampturn worksheet 1\n"), shown);
        assertTrue(shown.contains("? " + f + " was not saved or trusted on this machine. A worksheet is code: run it?"), shown);
        assertTrue(shown.contains("not run."), shown);
        assertEquals(0, c.history.size(), "nothing ran");
        c.answers.add(true);
        c.command("open", f.toString());
        assertTrue(c.take().contains("opened " + f + ": 5 entries, every result as recorded"));
        assertEquals(5, c.history.size());
        // now trusted: opening again asks nothing
        c.command("open", f.toString());
        assertFalse(c.take().contains("? "));
    }
}
