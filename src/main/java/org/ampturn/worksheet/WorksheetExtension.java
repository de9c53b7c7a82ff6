package org.ampturn.worksheet;

import java.io.IOException;
import java.io.PrintStream;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.OptionalInt;
import org.ampturn.chart.Figures;

/**
 * The worksheet layer's plug-in for the console and the command line (found through
 * {@code META-INF/services/org.ampturn.worksheet.SessionExtension}): the commands {@code #open
 * #save #replay #verify #note #figures #export #trust #recover #use}, the journal that records
 * each entry before its result shows, opening the file named on the command line, and the verbs
 * {@code run}, {@code verify} and {@code export} ({@link WorksheetCli}).
 */
public final class WorksheetExtension implements SessionExtension {
    private Workspace ws;
    private List<Path> figuresSeen = ShellEvaluator.chartFiles();

    @Override
    public OptionalInt verb(String verb, List<String> args, PrintStream out, PrintStream err) {
        if (!List.of("run", "verify", "export").contains(verb)) return OptionalInt.empty();
        Figures.useWindows(false);
        if (verb.equals("verify")) Figures.silence();
        if (verb.equals("export")) Figures.useFormats("svg");
        return WorksheetCli.forUser(System.in, out, err).verb(verb, args);
    }

    @Override
    public List<SessionCommand> commands() {
        offerRecovery();
        return List.of(
                new WorksheetCommand("open", "#open FILE", "open a worksheet: show it, run it once trusted", this::open),
                new WorksheetCommand("save", "#save [FILE]", "write the worksheet (atomic: temporary file, then rename)", this::save),
                new WorksheetCommand("replay", "#replay", "clear the session and run every entry again", this::replay),
                new WorksheetCommand("verify", "#verify [FILE]", "replay and compare each result with the recorded one", this::verify),
                new WorksheetCommand("note", "#note TEXT", "add a prose note to the worksheet", this::note),
                new WorksheetCommand("use", "#use FILE", "run another worksheet's entries first (shared coils and materials)", this::use),
                new WorksheetCommand("figures", "#figures", "list the charts made so far and their files", this::figures),
                new WorksheetCommand("export", "#export FILE.html", "write the report: one self-contained HTML file", this::export),
                new WorksheetCommand("trust", "#trust FILE", "mark a worksheet as safe to run on this machine", this::trust),
                new WorksheetCommand("recover", "#recover [N]", "bring back the entries of a session that ended without saving", this::recover));
    }

    @Override
    public boolean open(SessionConsole console, Path file) throws Exception {
        if (!Files.exists(file)) {
            workspace(console).useFile(file);
            console.file(file);
            figureDirectory(file);
            console.out().println("  new worksheet: " + file + " does not exist yet; #save writes it");
            return true;
        }
        open(file.toString(), console);
        return true;
    }

    @Override
    public void evaluated(SessionConsole console, Outcome outcome) {
        Workspace w = workspace(console);
        List<Path> now = ShellEvaluator.chartFiles();
        Evaluation e = ShellEvaluator.evaluation(outcome, figuresSeen, now);
        figuresSeen = now;
        w.record(outcome.source(), e, outcome.kept());
        for (String t : w.takeJournalTrouble()) console.out().println("  ! " + t);
    }

    @Override
    public void undone(SessionConsole console, Outcome outcome) {
        workspace(console).undone();
    }

    // ---- the commands -------------------------------------------------------------------------

    private void open(String arg, SessionConsole c) throws Exception {
        Path f = path(arg, "#open needs a file, e.g. #open gate-latch.atw");
        Workspace w = workspace(c);
        PrintWriter out = c.out();
        if (w.isDirty() && !c.confirm("The current worksheet has unsaved work. Open " + f.getFileName() + " anyway?")) return;
        byte[] bytes = Files.readAllBytes(f);
        Worksheet shown = WorksheetFiles.read(f, w.completeness());
        boolean trusted = w.trustStore().isTrusted(f, bytes);
        if (!trusted) {
            out.println("  " + f + " (" + shown.entries().size() + " entries), not yet trusted on this machine:");
            for (String line : WorksheetFormat.print(shown).split("\n")) out.println("  | " + line);
            out.flush();
        }
        figureDirectory(f);
        Workspace.Opened o = w.open(f, c::confirm, s -> {});
        if (!o.ran()) {
            out.println("  not run. Read it; #trust " + arg.strip() + " marks it safe on this machine, then #open it again");
            return;
        }
        c.file(f);
        c.saved();
        figuresSeen = ShellEvaluator.chartFiles();
        out.println("  opened " + f + ": " + o.worksheet().entries().size() + " entries"
                + (o.differences().isEmpty() ? ", every result as recorded" : "; " + o.differences().size()
                + " results differ from the record (#verify lists them)"));
    }

    private void save(String arg, SessionConsole c) throws Exception {
        Workspace w = workspace(c);
        Path t = w.save(arg.isBlank() ? null : Path.of(arg.strip()));
        c.file(t);
        c.saved();
        figureDirectory(t);
        c.out().println("  saved " + t + " (" + w.worksheet().entries().size() + " entries)");
    }

    private void replay(String arg, SessionConsole c) {
        Workspace w = workspace(c);
        List<Replay.Step> steps = w.replay(c::confirm, s -> {});
        long failed = steps.stream().filter(s -> s.result().failed()).count();
        figuresSeen = ShellEvaluator.chartFiles();
        c.out().println("  replayed " + steps.size() + " entries" + (failed == 0 ? "" : ", " + failed + " failed"));
    }

    private void verify(String arg, SessionConsole c) throws Exception {
        Workspace w = workspace(c);
        Path other = arg.isBlank() ? null : Path.of(arg.strip());
        List<Mismatch> m = w.verify(other, c::confirm, s -> {});
        if (other == null) figuresSeen = ShellEvaluator.chartFiles();
        String what = other == null ? "this worksheet" : other.toString();
        if (m.isEmpty()) {
            c.out().println("  every recorded result of " + what + " holds");
            return;
        }
        for (Mismatch x : m) for (String line : x.toString().split("\n")) c.out().println("  " + line);
        c.out().println("  ! " + m.size() + (m.size() == 1 ? " mismatch" : " mismatches") + " in " + what);
    }

    private void note(String arg, SessionConsole c) {
        if (arg.isBlank()) throw new IllegalArgumentException("#note needs text, e.g. #note pull-in measured at 9.1 V");
        workspace(c).note(arg);
        c.out().println("  noted");
    }

    private void use(String arg, SessionConsole c) throws Exception {
        Path f = path(arg, "#use needs a worksheet file, e.g. #use shared/coils.atw");
        List<Replay.Step> steps = workspace(c).use(f, c::confirm, s -> {});
        long failed = steps.stream().filter(s -> s.result().failed()).count();
        c.out().println("  used " + f + ": " + steps.size() + " entries" + (failed == 0 ? "" : ", " + failed + " failed"));
    }

    private void figures(String arg, SessionConsole c) {
        List<String> recorded = workspace(c).figures();
        if (recorded.isEmpty()) c.out().println("  no charts in this worksheet yet");
        for (String f : recorded) c.out().println("  " + f);
    }

    private void export(String arg, SessionConsole c) throws Exception {
        Path out = path(arg, "#export needs a file name, e.g. #export gate-latch.html");
        Workspace w = workspace(c);
        HtmlReport.write(w.worksheet(), w.file(), null, out);
        c.out().println("  wrote " + out);
    }

    private void trust(String arg, SessionConsole c) throws Exception {
        Path f = path(arg, "#trust needs a file, e.g. #trust from-a-colleague.atw");
        Workspace w = workspace(c);
        w.trust(f);
        c.out().println("  trusted " + f + " as it is now (SHA-256 " + TrustStore.hash(Files.readAllBytes(f)).substring(0, 12)
                + "...) on this machine; an edited copy needs trusting again");
    }

    private void recover(String arg, SessionConsole c) throws Exception {
        Workspace w = workspace(c);
        List<Recovery> all = w.recoverable();
        if (all.isEmpty()) {
            c.out().println("  nothing to recover: no earlier session ended with unsaved work");
            return;
        }
        int pick = 1;
        if (!arg.isBlank()) {
            try {
                pick = Integer.parseInt(arg.strip());
            } catch (NumberFormatException e) {
                pick = 0;
            }
        } else if (all.size() > 1) {
            for (int k = 0; k < all.size(); k++) c.out().println("  " + (k + 1) + ": " + all.get(k));
            c.out().println("  #recover N brings back one of them (1 is the newest)");
            return;
        }
        if (pick < 1 || pick > all.size()) throw new IllegalArgumentException("#recover takes a number from 1 to " + all.size() + ", got " + arg.strip());
        Recovery r = all.get(pick - 1);
        if (r.worksheet() != null && !w.isDirty()) c.file(r.worksheet());
        List<Replay.Step> steps = w.recover(r, c::confirm, s -> {});
        if (w.file() != null) {
            c.file(w.file());
            figureDirectory(w.file());
        }
        figuresSeen = ShellEvaluator.chartFiles();
        c.out().println("  recovered " + r.entries().size() + " unsaved entries" + (r.worksheet() == null ? "" : " on " + r.worksheet())
                + " (" + steps.size() + " entries run); #save keeps them");
    }

    // ---- helpers ------------------------------------------------------------------------------

    private Workspace workspace(SessionConsole c) {
        if (ws == null) {
            try {
                ws = Workspace.forUser(new ConsoleEvaluator(c, ShellEvaluator::chartFiles), ShellEvaluator::start);
            } catch (IOException e) {
                c.out().println("  ! the journal could not be started (" + e.getMessage() + "): unsaved entries are not protected against a crash");
                ws = Workspace.unjournaled(new ConsoleEvaluator(c, ShellEvaluator::chartFiles), ShellEvaluator::start, TrustStore.user());
            }
            Workspace w = ws;
            Figures.useNumbering(w::nextEntryNumber);
            Runtime.getRuntime().addShutdownHook(new Thread(() -> {
                // a clean end with everything saved needs no journal; an unsaved one keeps it for #recover
                if (!w.isDirty()) {
                    try {
                        w.close();
                    } catch (IOException ignored) {
                        // the next start tidies it away
                    }
                }
            }, "ampturn-journal-close"));
        }
        return ws;
    }

    private static void figureDirectory(Path worksheet) {
        String n = worksheet.getFileName().toString().replaceFirst("\\.atw$", "");
        Path parent = worksheet.toAbsolutePath().getParent();
        Figures.useDirectory(parent.resolve(n + ".figures"));
    }

    private static Path path(String arg, String usage) {
        if (arg.isBlank()) throw new IllegalArgumentException(usage);
        return Path.of(arg.strip());
    }

    /** Tells the user at start when an earlier session left unsaved work. */
    private static void offerRecovery() {
        try {
            List<Recovery> all = Journal.unfinished(AmpturnHome.journals());
            if (all.isEmpty()) return;
            Recovery r = all.get(0);
            System.out.println("  an earlier session ended without saving (" + r.entries().size() + " entries"
                    + (r.worksheet() == null ? "" : " on " + r.worksheet().getFileName()) + "): #recover brings "
                    + (all.size() == 1 ? "it" : "one of the " + all.size()) + " back");
            System.out.flush();
        } catch (IOException | RuntimeException ignored) {
            // the offer is a convenience; #recover looks again
        }
    }
}
