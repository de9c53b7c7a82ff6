package org.ampturn.console;

import java.io.IOException;
import java.io.InputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Supplier;
import org.ampturn.chart.Figures;
import org.ampturn.report.HtmlReport;
import org.ampturn.worksheet.Evaluator;
import org.ampturn.worksheet.Mismatch;
import org.ampturn.worksheet.Replay;
import org.ampturn.worksheet.ShellEvaluator;
import org.ampturn.worksheet.TrustStore;
import org.ampturn.worksheet.Verifier;
import org.ampturn.worksheet.Worksheet;
import org.ampturn.worksheet.WorksheetFiles;
import org.ampturn.worksheet.WorksheetFormat;
import org.ampturn.worksheet.WorksheetFormatException;

/**
 * The command-line verbs of DESIGN.md that work on worksheet files, without a terminal:
 * <pre>
 * ampturn run [--trust] FILE.atw|-              run, print each entry and its result; exit 1 on an error
 * ampturn verify [--trust] FILE.atw...          replay and compare with the records; exit 1 on any mismatch
 * ampturn export [--trust] FILE.atw --html OUT  run and write the report
 * </pre>
 * A file that this machine has not saved or trusted is not run unless {@code --trust} is given
 * (which trusts it for this run only). Entries read from standard input count as typed by the
 * user. Exit codes: 0 all well, 1 an entry failed, a result differs or a file was refused,
 * 2 a usage error or a file that could not be read.
 */
public final class WorksheetCli {
    private final Supplier<Evaluator> evaluators;
    private final TrustStore trust;
    private final InputStream in;
    private final PrintStream out;
    private final PrintStream err;

    private WorksheetCli(Supplier<Evaluator> evaluators, TrustStore trust, InputStream in, PrintStream out, PrintStream err) {
        this.evaluators = evaluators;
        this.trust = trust;
        this.in = in;
        this.out = out;
        this.err = err;
    }

    public static WorksheetCli of(Supplier<Evaluator> evaluators, TrustStore trust, InputStream in, PrintStream out, PrintStream err) {
        return new WorksheetCli(evaluators, trust, in, out, err);
    }

    /** The verbs with the user's trust store and the real JShell session. */
    public static WorksheetCli forUser(InputStream in, PrintStream out, PrintStream err) {
        return of(ShellEvaluator::start, TrustStore.user(), in, out, err);
    }

    /** The verbs this class runs. */
    public static final List<String> VERBS = List.of("run", "verify", "export");

    /**
     * Runs a verb of {@link #VERBS} and returns the exit code. Charts made on the way are written to
     * files, never shown in windows; {@code verify} writes them to a scratch folder and says nothing
     * of them, {@code export} writes SVG for the report.
     */
    public int verb(String verb, List<String> args) {
        Figures.useWindows(false);
        switch (verb) {
            case "run":
                return run(args);
            case "verify":
                Figures.silence();
                return verify(args);
            case "export":
                Figures.useFormats("svg");
                return export(args);
            default:
                throw new IllegalArgumentException("not a worksheet verb: " + verb);
        }
    }

    /** The usage lines of the verbs. */
    public static final String USAGE = String.join("\n",
            "usage: ampturn run [--trust] FILE.atw|-",
            "       ampturn verify [--trust] FILE.atw...",
            "       ampturn export [--trust] FILE.atw --html OUT.html");

    int run(List<String> args) {
        List<String> a = new ArrayList<>(args);
        boolean trusted = a.remove("--trust");
        if (a.size() != 1 || a.get(0).startsWith("--")) return usage("run takes one worksheet file, or - for standard input");
        String name = a.get(0);
        Worksheet w;
        Path file = null;
        try (Evaluator ev = evaluators.get()) {
            if (name.equals("-")) {
                String text = WorksheetFiles.decode(in.readAllBytes(), "standard input");
                w = text.startsWith(WorksheetFormat.MAGIC) ? WorksheetFormat.parse(text, ev.completeness())
                        : WorksheetFormat.parseEntries(text, ev.completeness());
            } else {
                file = Path.of(name);
                w = WorksheetFiles.read(file, ev.completeness());
                if (!trusted && refused(file)) return 1;
            }
            boolean[] failed = {false};
            Path[] current = {file};
            java.util.concurrent.atomic.AtomicInteger done = chartsFor(file, null);
            // the chart layer's notes (file written, preview) go under the entry that made them
            java.io.ByteArrayOutputStream notes = new java.io.ByteArrayOutputStream();
            java.io.PrintStream before = Figures.printingTo();
            Figures.printTo(new java.io.PrintStream(notes, true, StandardCharsets.UTF_8));
            try {
                Replay.run(w, file, ev, loader(ev, trusted), s -> {
                    done.incrementAndGet();
                    if (!s.isIn(current[0])) {
                        current[0] = s.file();
                        out.println("// from " + (s.file() == null ? "standard input" : s.file()));
                    }
                    out.println(s.entry().source());
                    out.print(notes.toString(StandardCharsets.UTF_8));
                    notes.reset();
                    for (String l : s.result().lines()) out.println(l);
                    out.flush();
                    failed[0] |= s.result().failed();
                });
            } finally {
                Figures.printTo(before);
            }
            return failed[0] ? 1 : 0;
        } catch (IOException | WorksheetFormatException e) {
            err.println("ampturn: " + e.getMessage());
            return 2;
        }
    }

    int verify(List<String> args) {
        List<String> a = new ArrayList<>(args);
        boolean trusted = a.remove("--trust");
        if (a.isEmpty() || a.stream().anyMatch(s -> s.startsWith("--"))) return usage("verify takes one or more worksheet files");
        try (Evaluator ev = evaluators.get()) {
            return verifyAll(a, trusted, ev);
        } catch (IOException e) {
            err.println("ampturn: " + e.getMessage());
            return 2;
        }
    }

    private int verifyAll(List<String> names, boolean trusted, Evaluator ev) throws IOException {
        int hold = 0, differ = 0, refused = 0, unreadable = 0;
        for (String name : names) {
            Path f = Path.of(name);
            Worksheet w;
            try {
                w = WorksheetFiles.read(f, ev.completeness());
                if (!trusted && refused(f)) {
                    refused++;
                    continue;
                }
            } catch (IOException | WorksheetFormatException e) {
                err.println("ampturn: " + e.getMessage());
                unreadable++;
                continue;
            }
            ev.clear();
            // charts made while verifying are not kept: the records are what is compared
            Path scratch = Files.createTempDirectory("ampturn-verify-");
            java.util.concurrent.atomic.AtomicInteger done = chartsFor(f, scratch);
            List<Replay.Step> steps;
            try {
                steps = Replay.run(w, f, ev, loader(ev, trusted), s -> done.incrementAndGet());
            } finally {
                deleteTree(scratch);
            }
            List<Mismatch> m = Verifier.compare(f, steps);
            long own = steps.stream().filter(s -> s.isIn(f)).count();
            if (m.isEmpty()) {
                out.println(f + ": " + own + " entries, all results hold");
                hold++;
            } else {
                for (Mismatch x : m) out.println(x);
                out.println(f + ": " + m.size() + (m.size() == 1 ? " mismatch" : " mismatches") + " in " + own + " entries");
                differ++;
            }
            out.flush();
        }
        if (names.size() > 1) {
            out.println("verified " + names.size() + " worksheets: " + hold + " hold, " + differ + " differ"
                    + (refused > 0 ? ", " + refused + " not trusted" : "") + (unreadable > 0 ? ", " + unreadable + " unreadable" : ""));
        }
        if (unreadable > 0 && hold + differ + refused == 0) return 2;
        return differ + refused + unreadable == 0 ? 0 : 1;
    }

    private static void deleteTree(Path dir) {
        try (java.util.stream.Stream<Path> s = Files.walk(dir)) {
            for (Path p : s.sorted(java.util.Comparator.reverseOrder()).toList()) Files.deleteIfExists(p);
        } catch (IOException ignored) {
            // a scratch folder under the system's temporary directory
        }
    }

    int export(List<String> args) {
        List<String> a = new ArrayList<>(args);
        boolean trusted = a.remove("--trust");
        int at = a.indexOf("--html");
        if (at < 0 || at + 1 >= a.size() || a.size() != 3) return usage("export takes a worksheet and --html OUT.html");
        Path target = Path.of(a.get(at + 1));
        a.remove(at + 1);
        a.remove(at);
        Path f = Path.of(a.get(0));
        try (Evaluator ev = evaluators.get()) {
            Worksheet w = WorksheetFiles.read(f, ev.completeness());
            if (!trusted && refused(f)) return 1;
            java.util.concurrent.atomic.AtomicInteger done = chartsFor(f, null);
            List<Replay.Step> steps = Replay.run(w, f, ev, loader(ev, trusted), s -> done.incrementAndGet());
            HtmlReport.write(w, f, steps, target);
            long failed = steps.stream().filter(s -> s.result().failed()).count();
            out.println("wrote " + target + (failed == 0 ? "" : " (" + failed + " entries failed; their messages are in the report)"));
            return failed == 0 ? 0 : 1;
        } catch (IOException | WorksheetFormatException e) {
            err.println("ampturn: " + e.getMessage());
            return 2;
        }
    }

    /**
     * Charts made while {@code w} runs go to {@code <name>.figures/} next to it (or to {@code dir}),
     * numbered by entry; returns the step counter to advance after each step.
     */
    private static java.util.concurrent.atomic.AtomicInteger chartsFor(Path worksheet, Path dir) {
        java.util.concurrent.atomic.AtomicInteger done = new java.util.concurrent.atomic.AtomicInteger();
        if (dir == null && worksheet != null) dir = WorksheetFiles.figuresFolder(worksheet);
        if (dir != null) Figures.useDirectory(dir);
        Figures.useNumbering(() -> done.get() + 1);
        return done;
    }

    private boolean refused(Path f) throws IOException {
        if (trust.isTrusted(f, Files.readAllBytes(f))) return false;
        out.println(f + ": not run: this machine has not saved or trusted this worksheet (its content hash is not in "
                + trust.location() + "). A worksheet is code: read it, then give --trust, or #trust it in the console.");
        return true;
    }

    private Replay.Loader loader(Evaluator ev, boolean trusted) {
        return p -> {
            Worksheet w = WorksheetFiles.read(p, ev.completeness());
            if (!trusted && !trust.isTrusted(p, Files.readAllBytes(p))) {
                throw new IOException(p + " is not trusted on this machine, so it was not run; give --trust or #trust it");
            }
            return w;
        };
    }

    private int usage(String why) {
        err.println("ampturn: " + why);
        err.println(USAGE);
        return 2;
    }
}
