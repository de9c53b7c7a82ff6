package org.ampturn.console;

import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.ampturn.report.HtmlReport;
import org.ampturn.worksheet.Block;
import org.ampturn.worksheet.Mismatch;
import org.ampturn.worksheet.Recovery;
import org.ampturn.worksheet.Replay;
import org.ampturn.worksheet.TrustReview;
import org.ampturn.worksheet.Workspace;

/**
 * The worksheet commands of the console: {@code #open #save #replay #verify #note #use #figures
 * #export #trust #recover}, and opening the file named on the command line. Each calls the
 * console's {@link Workspace} directly and prints what it did.
 */
final class WorksheetCommands {
    private final Console c;

    private WorksheetCommands(Console c) {
        this.c = c;
    }

    static List<ConsoleCommand> of(Console console) {
        WorksheetCommands w = new WorksheetCommands(console);
        return List.of(
                new ConsoleCommand("open", "#open FILE", "open a worksheet: show it, run it once trusted", w::open),
                new ConsoleCommand("save", "#save [FILE]", "write the worksheet (atomic: temporary file, then rename)", w::save),
                new ConsoleCommand("replay", "#replay", "clear the session and run every entry again", w::replay),
                new ConsoleCommand("verify", "#verify [FILE]", "replay and compare each result with the recorded one", w::verify),
                new ConsoleCommand("note", "#note TEXT", "add a prose note to the worksheet", w::note),
                new ConsoleCommand("use", "#use FILE", "run another worksheet's entries first (shared coils and materials)", w::use),
                new ConsoleCommand("figures", "#figures", "list the charts made so far and their files", w::figures),
                new ConsoleCommand("export", "#export FILE.html", "write the report: one self-contained HTML file", w::export),
                new ConsoleCommand("trust", "#trust FILE", "mark a worksheet as safe to run on this machine", w::trust),
                new ConsoleCommand("recover", "#recover [N]", "bring back the entries of a session that ended without saving", w::recover),
                new ConsoleCommand("rerun", "#rerun", "run the last failed or stopped entry again (its record stays)", w::rerun));
    }

    /** {@code ampturn FILE.atw}: opens the file, or names it for the first save when it does not exist yet. */
    static void openAtStart(Console console, Path file) {
        WorksheetCommands w = new WorksheetCommands(console);
        try {
            if (!Files.exists(file)) {
                console.worksheet().useFile(file);
                console.out().println("  new worksheet: " + file + " does not exist yet; #save writes it");
                return;
            }
            console.interruptible(() -> {
                try {
                    w.open(file.toString());
                    return null;
                } catch (Exception e) {
                    throw new IllegalStateException(e.getMessage(), e);
                }
            });
        } catch (RuntimeException e) {
            console.error("cannot open " + file + ": " + e.getMessage());
        }
    }

    private Workspace ws() {
        return c.worksheet();
    }

    private void open(String arg) throws Exception {
        Path f = path(arg, "#open needs a file, e.g. #open gate-latch.atw");
        Workspace w = ws();
        PrintWriter out = c.out();
        if (w.isDirty() && w.entryCount() > 0 && !c.confirm("The current worksheet has unsaved work. Open " + f.getFileName() + " anyway?")) return;
        Workspace.Opened o = w.open(f, c.asker(), c.stepPrinter());
        if (!o.ran()) {
            out.println("  not run. Read it; #trust " + arg.strip() + " marks it safe on this machine, then #open it again");
            return;
        }
        out.println("  opened " + f + ": " + o.worksheet().entries().size() + " entries"
                + (o.differences().isEmpty() ? ", every result as recorded" : "; " + o.differences().size()
                + " results differ from the record (#verify lists them)"));
    }

    private void save(String arg) throws Exception {
        Workspace w = ws();
        Path t = w.save(arg.isBlank() ? null : Path.of(arg.strip()));
        c.out().println("  saved " + t + " (" + w.entryCount() + " entries)");
    }

    private void replay(String arg) {
        List<Replay.Step> steps = ws().replay(c.asker(), c.stepPrinter());
        long failed = steps.stream().filter(s -> s.result().failed()).count();
        c.out().println("  replayed " + steps.size() + " entries" + (failed == 0 ? "" : ", " + failed + " failed"));
    }

    private void verify(String arg) throws Exception {
        Path other = arg.isBlank() ? null : Path.of(arg.strip());
        List<Mismatch> m = ws().verify(other, c.asker(), s -> {});
        String what = other == null ? "this worksheet" : other.toString();
        if (m.isEmpty()) {
            c.out().println("  every recorded result of " + what + " holds");
            return;
        }
        for (Mismatch x : m) for (String line : x.toString().split("\n")) c.out().println("  " + line);
        c.out().println("  ! " + m.size() + (m.size() == 1 ? " mismatch" : " mismatches") + " in " + what);
    }

    private void note(String arg) {
        if (arg.isBlank()) throw new IllegalArgumentException("#note needs text, e.g. #note pull-in measured at 9.1 V");
        ws().note(arg);
        c.out().println("  noted");
    }

    private void use(String arg) throws Exception {
        Path f = path(arg, "#use needs a worksheet file, e.g. #use shared/coils.atw");
        List<Replay.Step> steps = ws().use(f, c.asker(), c.stepPrinter());
        long failed = steps.stream().filter(s -> s.result().failed()).count();
        c.out().println("  used " + f + ": " + steps.size() + " entries" + (failed == 0 ? "" : ", " + failed + " failed"));
    }

    private void figures(String arg) {
        List<String> recorded = ws().figures();
        if (recorded.isEmpty()) c.out().println("  no charts in this worksheet yet");
        for (String f : recorded) c.out().println("  " + f);
    }

    private void export(String arg) throws Exception {
        Path out = path(arg, "#export needs a file name, e.g. #export gate-latch.html");
        Workspace w = ws();
        HtmlReport.write(w.worksheet(), w.file(), null, out);
        c.out().println("  wrote " + out);
    }

    private void trust(String arg) throws Exception {
        Path f = path(arg, "#trust needs a file, e.g. #trust from-a-colleague.atw");
        String hash = ws().trust(f);
        c.out().println("  trusted " + f + " as it is now (SHA-256 " + hash.substring(0, 12)
                + "...) on this machine; an edited copy needs trusting again");
    }

    private void recover(String arg) throws Exception {
        Workspace w = ws();
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
        // what will run, before it runs: the journal is this tool's (its seals hold), but show it
        c.out().println("  " + TrustReview.visible(r.toString()) + (r.worksheet() == null ? "" : "; its file's entries run first") + ":");
        for (Block b : r.blocks()) {
            if (b instanceof Block.Entry) for (String l : ((Block.Entry) b).source().split("\n")) c.out().println("  | " + TrustReview.visible(l));
            else if (b instanceof Block.Failed) c.out().println("  | (failed, kept as a record, not run) " + TrustReview.visible(((Block.Failed) b).source().lines().findFirst().orElse("")));
            else if (b instanceof Block.Use) c.out().println("  | #use " + TrustReview.visible(((Block.Use) b).path()));
        }
        if (!c.confirm("Run these again to bring the work back?")) {
            c.out().println("  not recovered; the journal stays (#recover asks again)");
            return;
        }
        List<Replay.Step> steps = w.recover(r, c.asker(), c.stepPrinter());
        c.out().println("  recovered " + r.entries().size() + " unsaved entries" + (r.worksheet() == null ? "" : " on " + r.worksheet())
                + " (" + steps.size() + " entries run); #save keeps them");
    }

    private void rerun(String arg) {
        List<Block.Failed> failed = ws().worksheet().failed();
        if (failed.isEmpty()) throw new IllegalArgumentException("no failed or stopped entry to run again");
        String source = failed.get(failed.size() - 1).source();
        c.out().println("  running again: " + Console.firstLine(source));
        c.enter(source);
    }

    private static Path path(String arg, String usage) {
        if (arg.isBlank()) throw new IllegalArgumentException(usage);
        return Path.of(arg.strip());
    }
}
