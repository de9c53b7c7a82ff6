package org.ampturn.console;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.Supplier;
import org.ampturn.chart.Figures;
import org.ampturn.report.HtmlReport;
import org.ampturn.worksheet.Evaluator;
import org.ampturn.worksheet.LimitedEvaluator;
import org.ampturn.worksheet.Mismatch;
import org.ampturn.worksheet.Replay;
import org.ampturn.worksheet.ShellEvaluator;
import org.ampturn.worksheet.TrustReview;
import org.ampturn.worksheet.TrustStore;
import org.ampturn.worksheet.Verifier;
import org.ampturn.worksheet.Worksheet;
import org.ampturn.worksheet.WorksheetFiles;
import org.ampturn.worksheet.WorksheetFormat;
import org.ampturn.worksheet.WorksheetFormatException;

/**
 * The command-line verbs of DESIGN.md that work on worksheet files, without a terminal:
 * <pre>
 * ampturn run [--trust] [--entry-limit D] FILE.atw|-              run, print each entry and its result
 * ampturn verify [--trust] [--entry-limit D] FILE.atw...          replay and compare with the records
 * ampturn export [--trust] [--entry-limit D] FILE.atw --html OUT  run, compare, and write the report
 * </pre>
 * A file that this machine has not saved or trusted is not run unless it is named with
 * {@code --trust} (which trusts exactly the files named, for this run only; a worksheet they
 * {@code #use} must be trusted itself or named too). Entries read from standard input count as
 * typed by the user. Each file is read once: the bytes whose hash is checked are the bytes that run.
 * Each entry may run for the entry limit ({@link #DEFAULT_LIMIT} unless {@code --entry-limit}
 * says otherwise); one over it is stopped and reported with its line, and nothing after it runs.
 * Exit codes, the highest applying when several worksheets are verified: {@value #HOLD} all hold,
 * {@value #DIFFER} a result differs from its record, {@value #USAGE} a usage error or a file that
 * could not be read, {@value #NOT_TRUSTED} not run because not trusted, {@value #FAILED} an entry
 * failed or ran over its limit.
 */
public final class WorksheetCli {
    public static final int HOLD = 0;
    public static final int DIFFER = 1;
    public static final int USAGE = 2;
    public static final int NOT_TRUSTED = 3;
    public static final int FAILED = 4;

    /** The time an entry may run in {@code run}, {@code verify} and {@code export} unless {@code --entry-limit} is given. */
    public static final Duration DEFAULT_LIMIT = Duration.ofMinutes(5);

    /** The verbs this class runs. */
    public static final List<String> VERBS = List.of("run", "verify", "export");

    /** The usage lines of the verbs. */
    public static final String USAGE_TEXT = String.join("\n",
            "usage: ampturn run [--trust] [--entry-limit DURATION] FILE.atw|-",
            "       ampturn verify [--trust] [--entry-limit DURATION] FILE.atw...",
            "       ampturn export [--trust] [--entry-limit DURATION] FILE.atw --html OUT.html");

    private final Supplier<Evaluator> evaluators;
    private final TrustStore trust;
    private final InputStream in;
    private final PrintStream out;
    private final PrintStream err;
    private final Runnable stuck;
    /** The #use'd files refused for want of trust in the current run. */
    private final List<Path> refusedUses = new ArrayList<>();

    private WorksheetCli(Supplier<Evaluator> evaluators, TrustStore trust, InputStream in, PrintStream out, PrintStream err, Runnable stuck) {
        this.evaluators = evaluators;
        this.trust = trust;
        this.in = in;
        this.out = out;
        this.err = err;
        this.stuck = stuck;
    }

    /** The verbs over these evaluators; an entry that does not stop after its limit is only reported (for tests). */
    public static WorksheetCli of(Supplier<Evaluator> evaluators, TrustStore trust, InputStream in, PrintStream out, PrintStream err) {
        return new WorksheetCli(evaluators, trust, in, out, err, () -> {});
    }

    /**
     * The verbs with the user's trust store and the real JShell session. An entry that does not
     * stop within {@link LimitedEvaluator#GRACE} after its limit (a library loop that never looks
     * at the interrupt) ends the process with {@value #FAILED}.
     */
    public static WorksheetCli forUser(InputStream in, PrintStream out, PrintStream err) {
        return new WorksheetCli(ShellEvaluator::start, TrustStore.user(), in, out, err, () -> {
            out.flush();
            err.println("ampturn: the entry over its limit did not stop; ending the process");
            err.flush();
            System.exit(FAILED);
        });
    }

    /** What the options before and between the file names said. */
    private record Options(boolean trusted, Duration limit, List<String> rest) {}

    private Options options(List<String> args) {
        List<String> rest = new ArrayList<>();
        boolean trusted = false;
        Duration limit = DEFAULT_LIMIT;
        for (int k = 0; k < args.size(); k++) {
            String a = args.get(k);
            if (a.equals("--trust")) {
                trusted = true;
            } else if (a.equals("--entry-limit")) {
                if (k + 1 >= args.size()) throw new IllegalArgumentException("--entry-limit needs a duration, e.g. --entry-limit 30s");
                limit = duration(args.get(++k));
            } else if (a.startsWith("--entry-limit=")) {
                limit = duration(a.substring("--entry-limit=".length()));
            } else if (a.startsWith("--") && !a.equals("--html")) {
                throw new IllegalArgumentException("unknown option " + a);
            } else {
                rest.add(a);
            }
        }
        return new Options(trusted, limit, rest);
    }

    /** {@code 30s}, {@code 5m}, {@code 2h}, {@code 500ms} or a plain number of seconds. */
    static Duration duration(String text) {
        java.util.regex.Matcher m = java.util.regex.Pattern.compile("(\\d+(?:\\.\\d+)?)(ms|s|m|h)?").matcher(text.strip());
        if (!m.matches()) throw new IllegalArgumentException("--entry-limit takes a duration such as 30s, 5m or 1h, got \"" + text + "\"");
        double v = Double.parseDouble(m.group(1));
        String unit = m.group(2) == null ? "s" : m.group(2);
        double ms = v * switch (unit) {
            case "ms" -> 1;
            case "s" -> 1000;
            case "m" -> 60_000;
            default -> 3_600_000;
        };
        if (!(ms >= 1)) throw new IllegalArgumentException("--entry-limit must be at least 1 ms, got \"" + text + "\"");
        return Duration.ofMillis((long) ms);
    }

    /**
     * Runs a verb of {@link #VERBS} and returns the exit code. Charts made on the way are written to
     * files, never shown in windows; {@code verify} writes them to a scratch folder and says nothing
     * of them, {@code export} writes SVG for the report.
     */
    public int verb(String verb, List<String> args) {
        Options o;
        try {
            o = options(args);
        } catch (IllegalArgumentException e) {
            return usage(e.getMessage());
        }
        Figures.useWindows(false);
        switch (verb) {
            case "run":
                return run(o);
            case "verify":
                // a sink rather than nothing, so that the session's capture of standard output does not point the chart notes back at it
                Figures.printTo(new PrintStream(java.io.OutputStream.nullOutputStream(), true, StandardCharsets.UTF_8));
                Figures.silence();
                return verify(o);
            case "export":
                Figures.useFormats("svg");
                return export(o);
            default:
                throw new IllegalArgumentException("not a worksheet verb: " + verb);
        }
    }

    private Evaluator limited(Evaluator ev, Options o) {
        return LimitedEvaluator.of(ev, o.limit(), stuck);
    }

    private int run(Options o) {
        if (o.rest().size() != 1) return usage("run takes one worksheet file, or - for standard input");
        String name = o.rest().get(0);
        Worksheet w;
        Path file = null;
        try (Evaluator base = evaluators.get()) {
            Evaluator ev = limited(base, o);
            if (name.equals("-")) {
                String text = WorksheetFiles.decode(in.readAllBytes(), "standard input");
                w = text.startsWith(WorksheetFormat.MAGIC) ? WorksheetFormat.parse(text, ev.completeness())
                        : WorksheetFormat.parseEntries(text, ev.completeness());
            } else {
                file = Path.of(name);
                byte[] bytes = WorksheetFiles.readBytes(file);
                w = WorksheetFiles.parse(file, bytes, ev.completeness());
                if (!(o.trusted() || isTrusted(file, bytes))) return refused(file, bytes);
            }
            boolean[] failed = {false};
            Path[] current = {file};
            AtomicInteger done = chartsFor(file, null);
            // the chart layer's notes (file written, preview) go under the entry that made them
            ByteArrayOutputStream notes = new ByteArrayOutputStream();
            PrintStream before = Figures.printingTo();
            Figures.printTo(new PrintStream(notes, true, StandardCharsets.UTF_8));
            try {
                Replay.run(w, file, ev, loader(ev, o, file), s -> {
                    done.incrementAndGet();
                    if (!s.isIn(current[0])) {
                        current[0] = s.file();
                        out.println("// from " + (s.file() == null ? "standard input" : s.file()));
                    }
                    out.println(s.entry().source());
                    out.print(notes.toString(StandardCharsets.UTF_8));
                    notes.reset();
                    for (String l : s.result().lines()) out.println(l);
                    if (s.result().interrupted()) out.println("  ! " + where(s) + ": stopped; the entries after it were not run");
                    out.flush();
                    failed[0] |= s.result().failed() || s.result().interrupted();
                });
            } finally {
                Figures.printTo(before);
            }
            return !refusedUses.isEmpty() ? NOT_TRUSTED : failed[0] ? FAILED : HOLD;
        } catch (IOException | WorksheetFormatException e) {
            err.println("ampturn: " + e.getMessage());
            return USAGE;
        }
    }

    private static String where(Replay.Step s) {
        return (s.file() == null ? "standard input" : s.file().toString()) + ":" + s.line();
    }

    private int verify(Options o) {
        if (o.rest().isEmpty() || o.rest().contains("--html")) return usage("verify takes one or more worksheet files");
        try (Evaluator base = evaluators.get()) {
            return verifyAll(o, limited(base, o));
        } catch (IOException e) {
            err.println("ampturn: " + e.getMessage());
            return USAGE;
        }
    }

    private int verifyAll(Options o, Evaluator ev) throws IOException {
        int hold = 0, differ = 0, refused = 0, unreadable = 0, failedFiles = 0;
        for (String name : o.rest()) {
            Path f = Path.of(name);
            Worksheet w;
            try {
                byte[] bytes = WorksheetFiles.readBytes(f);
                w = WorksheetFiles.parse(f, bytes, ev.completeness());
                if (!(o.trusted() || isTrusted(f, bytes))) {
                    refused(f, bytes);
                    refused++;
                    continue;
                }
            } catch (IOException | WorksheetFormatException e) {
                err.println("ampturn: " + e.getMessage());
                unreadable++;
                continue;
            }
            ev.clear();
            refusedUses.clear();
            List<Replay.Step> steps;
            // charts made while verifying are not kept: the records are what is compared
            try (Scratch scratch = Scratch.create()) {
                AtomicInteger done = chartsFor(f, scratch.dir());
                steps = Replay.run(w, f, ev, loader(ev, o, f), s -> done.incrementAndGet());
            }
            List<Mismatch> m = Verifier.compare(f, steps);
            long own = steps.stream().filter(s -> s.isIn(f)).count();
            boolean anyFailed = steps.stream().anyMatch(s -> s.result().failed() || s.result().interrupted());
            int notRun = w.failed().size();
            String kept = notRun == 0 ? "" : " (" + notRun + (notRun == 1 ? " failed entry is kept as a record" : " failed entries are kept as records") + " and not run)";
            if (m.isEmpty()) {
                out.println(f + ": " + own + " entries, all results hold" + kept);
                hold++;
            } else {
                for (Mismatch x : m) out.println(x);
                for (Replay.Step s : steps) if (s.result().interrupted()) out.println(where(s) + ": stopped; the entries after it were not run");
                out.println(f + ": " + m.size() + (m.size() == 1 ? " mismatch" : " mismatches") + " in " + own + " entries" + kept);
                if (!refusedUses.isEmpty()) refused++; // a #use'd file was not trusted: its entries did not run
                else if (anyFailed) failedFiles++;
                else differ++;
            }
            out.flush();
        }
        if (o.rest().size() > 1) {
            out.println("verified " + o.rest().size() + " worksheets: " + hold + " hold, " + differ + " differ"
                    + (failedFiles > 0 ? ", " + failedFiles + " with failed entries" : "")
                    + (refused > 0 ? ", " + refused + " not trusted" : "") + (unreadable > 0 ? ", " + unreadable + " unreadable" : ""));
        }
        if (failedFiles > 0) return FAILED;
        if (refused > 0) return NOT_TRUSTED;
        if (unreadable > 0) return USAGE;
        return differ > 0 ? DIFFER : HOLD;
    }

    /** A scratch folder for charts made while verifying, deleted when closed or when the process is stopped. */
    private record Scratch(Path dir, Thread hook) implements AutoCloseable {
        static Scratch create() throws IOException {
            Path d = Files.createTempDirectory("ampturn-verify-");
            Thread h = new Thread(() -> deleteTree(d), "ampturn-verify-cleanup");
            Runtime.getRuntime().addShutdownHook(h);
            return new Scratch(d, h);
        }

        @Override
        public void close() {
            deleteTree(dir);
            try {
                Runtime.getRuntime().removeShutdownHook(hook);
            } catch (IllegalStateException ignored) {
                // the process is ending: the hook runs anyway
            }
        }
    }

    private static void deleteTree(Path dir) {
        try (java.util.stream.Stream<Path> s = Files.walk(dir)) {
            for (Path p : s.sorted(java.util.Comparator.reverseOrder()).toList()) Files.deleteIfExists(p);
        } catch (IOException ignored) {
            // a scratch folder under the system's temporary directory
        }
    }

    private int export(Options o) {
        List<String> a = new ArrayList<>(o.rest());
        int at = a.indexOf("--html");
        if (at < 0 || at + 1 >= a.size() || a.size() != 3) return usage("export takes a worksheet and --html OUT.html");
        Path target = Path.of(a.get(at + 1));
        a.remove(at + 1);
        a.remove(at);
        Path f = Path.of(a.get(0));
        String clash = HtmlReport.clash(f, target);
        if (clash != null) return usage(clash);
        try (Evaluator base = evaluators.get()) {
            Evaluator ev = limited(base, o);
            byte[] bytes = WorksheetFiles.readBytes(f);
            Worksheet w = WorksheetFiles.parse(f, bytes, ev.completeness());
            if (!(o.trusted() || isTrusted(f, bytes))) return refused(f, bytes);
            // the fresh run draws its charts in a scratch folder: exporting leaves the worksheet's folder as it was
            try (Scratch scratch = Scratch.create()) {
                AtomicInteger done = chartsFor(f, scratch.dir());
                List<Replay.Step> steps = Replay.run(w, f, ev, loader(ev, o, f), s -> done.incrementAndGet());
                List<Mismatch> m = Verifier.compare(f, steps);
                // per entry: does the fresh result match the record?
                Set<Integer> differing = new HashSet<>();
                for (Mismatch x : m) if (x.file() != null && x.file().toAbsolutePath().normalize().equals(f.toAbsolutePath().normalize())) differing.add(x.line());
                for (Replay.Step s : steps) {
                    if (!s.isIn(f)) continue;
                    String first = s.entry().source().lines().findFirst().orElse("");
                    String verdict = s.result().failed() || s.result().interrupted() ? "FAILED " : differing.contains(s.line()) ? "DIFFERS" : "matches";
                    out.println(verdict + "  " + f.getFileName() + ":" + s.line() + "  " + first + (s.entry().source().contains("\n") ? " ..." : ""));
                }
                for (Mismatch x : m) out.println(x);
                HtmlReport.write(w, f, steps, m, List.of(scratch.dir()), target);
                boolean failed = steps.stream().anyMatch(s -> s.result().failed() || s.result().interrupted());
                out.println("wrote " + target + (m.isEmpty() ? "; every result matches its record"
                        : "; " + m.size() + (m.size() == 1 ? " result differs" : " results differ") + " from the record (marked in the report)"));
                return !refusedUses.isEmpty() ? NOT_TRUSTED : failed ? FAILED : m.isEmpty() ? HOLD : DIFFER;
            }
        } catch (IOException | WorksheetFormatException e) {
            err.println("ampturn: " + e.getMessage());
            return USAGE;
        }
    }

    /**
     * Charts made while {@code w} runs go to its figures folder (or to {@code dir}), numbered by
     * entry; returns the step counter to advance after each step.
     */
    private static AtomicInteger chartsFor(Path worksheet, Path dir) {
        AtomicInteger done = new AtomicInteger();
        if (dir == null && worksheet != null) dir = WorksheetFiles.figuresFolder(worksheet);
        if (dir != null) Figures.useDirectory(dir);
        Figures.useNumbering(() -> done.get() + 1);
        return done;
    }

    private boolean isTrusted(Path f, byte[] bytes) throws IOException {
        return trust.isTrusted(f, bytes);
    }

    private int refused(Path f, byte[] bytes) {
        out.println(TrustReview.visible(f.toString()) + ": not run: this machine has not saved or trusted this worksheet (its content hash is not in "
                + trust.location() + "). A worksheet is code: read it, then give --trust, or #trust it in the console.");
        for (TrustReview.Risk r : TrustReview.risks(new String(bytes, StandardCharsets.UTF_8))) out.println("  ! " + r);
        return NOT_TRUSTED;
    }

    /**
     * Loads {@code #use}d worksheets: each must be trusted itself, or named on the command line
     * with {@code --trust}; its bytes are read once, checked and parsed.
     */
    private Replay.Loader loader(Evaluator ev, Options o, Path top) {
        Set<Path> named = new HashSet<>();
        if (o.trusted()) for (String n : o.rest()) if (!n.equals("-") && !n.equals("--html")) named.add(canonical(Path.of(n)));
        return p -> {
            byte[] bytes = WorksheetFiles.readBytes(p);
            Worksheet w = WorksheetFiles.parse(p, bytes, ev.completeness());
            if (!named.contains(canonical(p)) && !trust.isTrusted(p, bytes)) {
                refusedUses.add(p);
                throw new IOException(p + " is not trusted on this machine, so it was not run; --trust covers only the files named:"
                        + " name it too, or #trust it");
            }
            return w;
        };
    }

    private static Path canonical(Path p) {
        try {
            return p.toRealPath();
        } catch (IOException e) {
            return p.toAbsolutePath().normalize();
        }
    }

    private int usage(String why) {
        err.println("ampturn: " + why);
        err.println(USAGE_TEXT);
        return USAGE;
    }
}
