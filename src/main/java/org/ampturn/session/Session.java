package org.ampturn.session;

import java.io.File;
import java.util.ArrayList;
import java.util.Collections;
import java.util.HashSet;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.stream.Collectors;
import jdk.jshell.Diag;
import jdk.jshell.ExpressionSnippet;
import jdk.jshell.ImportSnippet;
import jdk.jshell.JShell;
import jdk.jshell.JShellException;
import jdk.jshell.MethodSnippet;
import jdk.jshell.Snippet;
import jdk.jshell.SnippetEvent;
import jdk.jshell.SourceCodeAnalysis;
import jdk.jshell.SourceCodeAnalysis.Completeness;
import jdk.jshell.SourceCodeAnalysis.CompletionInfo;
import jdk.jshell.TypeDeclSnippet;
import jdk.jshell.UnresolvedReferenceException;
import jdk.jshell.VarSnippet;
import org.ampturn.session.Outcome.Kind;
import org.ampturn.session.Outcome.Result;

/**
 * A running worksheet session: an embedded JShell that runs entries in this JVM, with the
 * library preloaded: {@code import static org.ampturn.Ampturn.*} at the start, and
 * {@code import org.ampturn.<pkg>.*} for a library package before the first entry that names one
 * of its classes (see {@link SessionImports}). Entries compile against the class path of
 * {@link SessionClassPath}.
 *
 * <p>Entries run in-process (the JDK's local engine), which is about five times quicker per entry
 * than JShell's default remote engine and lets library objects and chart windows live in the same
 * JVM. Two consequences are handled here:
 * <ul>
 *   <li>A call to {@code System.exit}, {@code Runtime.exit} or {@code Runtime.halt} in an entry is
 *       redirected before the entry's classes load (see {@link SessionEngine}); reaching it fails the
 *       entry with the message {@value #EXIT_BLOCKED}, and the session goes on.</li>
 *   <li>{@link #stop()} interrupts the running entry. On Java 17 the JDK stops the entry's thread,
 *       wherever it is. On Java 21 and newer it stops loops in entry code only: a long loop inside a
 *       library method must poll {@link Thread#interrupted()} and throw, or it runs on. An
 *       interrupted entry shows {@value #INTERRUPTED} and the session stays usable.</li>
 * </ul>
 *
 * <p>Output that an entry prints with {@code System.out} goes straight to this JVM's standard
 * output. Methods other than {@link #stop()} are meant to be called from one thread at a time.
 */
public final class Session implements AutoCloseable {
    /** The error text of an entry stopped by {@link #stop()}. */
    public static final String INTERRUPTED = "interrupted";
    /** The error text of an entry that reached System.exit, Runtime.exit or Runtime.halt. */
    public static final String EXIT_BLOCKED = "System.exit and Runtime.halt do not run in a worksheet (they would end the console); use #quit";

    /** A name defined in the session, for {@code #names}. */
    public record Name(String kind, String name, String type, String value) {}

    /** Completion candidates: each is the text that replaces {@code code[anchor, cursor)}. */
    public record Completion(int anchor, List<String> candidates) {}

    private volatile JShell shell;
    private volatile SourceCodeAnalysis analysis;
    private final SessionImports library;
    /** Import lines that went in (the facade's, then library packages as entries name them). */
    private final List<String> imports = new ArrayList<>();
    /** Import lines tried, whether or not they compiled, so none is tried twice. */
    private final Set<String> importsTried = new HashSet<>();
    /** The snippets of those imports: part of the session, not of any entry, so {@link #clear()} keeps them. */
    private final Set<Snippet> preloaded = new HashSet<>();
    private final List<List<Snippet>> entries = new ArrayList<>();
    /** Variables whose declaring entry threw: declared, but holding no value. */
    private final Set<String> failedVariables = new HashSet<>();
    private final Object lock = new Object();
    private volatile boolean running;
    private volatile boolean stopRequested;
    private volatile long generation;

    private volatile SessionEngine engine;
    /** The fewest snippets between renewals (see {@link #renew(List)}). */
    private int renewAt = RENEW_AT;
    /** The snippet count of the engine just after its last renewal (0 for the first engine). */
    private long renewedAt;
    /** The snippet count at which renewal is next considered. */
    private long nextRenewal = RENEW_AT;
    private int renewals;

    private Session(JShell shell, SessionImports library, SessionEngine engine) {
        this.engine = engine;
        this.shell = shell;
        this.analysis = shell.sourceCodeAnalysis();
        this.library = library;
    }

    private static final java.util.concurrent.atomic.AtomicReference<java.util.concurrent.CompletableFuture<Session>> EARLY =
            new java.util.concurrent.atomic.AtomicReference<>();

    /**
     * Begins building a session on a background thread, so that the compiler warms up while the
     * caller reads its files; the next {@link #start()} takes it. For the batch verbs, which know at
     * once that they will need a session.
     */
    public static void prestart() {
        java.util.concurrent.CompletableFuture<Session> f = new java.util.concurrent.CompletableFuture<>();
        if (!EARLY.compareAndSet(null, f)) return;
        Thread t = new Thread(() -> {
            try {
                f.complete(build());
            } catch (Throwable e) {
                f.completeExceptionally(e);
            }
        }, "ampturn-session-prestart");
        t.setDaemon(true);
        t.start();
    }

    /** A session with the library preloaded (the one {@link #prestart()} began, if any); about a second on a cold JVM. */
    public static Session start() {
        java.util.concurrent.CompletableFuture<Session> f = EARLY.getAndSet(null);
        if (f != null) {
            try {
                return f.join();
            } catch (java.util.concurrent.CompletionException e) {
                // build again below, so the failure shows where it happens
            }
        }
        return build();
    }

    private static Session build() {
        CompilerNoise.install();
        SessionEngine engine = new SessionEngine();
        Session s = new Session(newShell(engine), SessionImports.ofLibrary(), engine);
        synchronized (s.lock) {
            s.addImport(SessionImports.FACADE);
        }
        return s;
    }

    private static JShell newShell(SessionEngine engine) {
        JShell.Builder builder = JShell.builder()
                .executionEngine(engine, Map.of())
                .out(System.out)
                .err(System.err);
        List<File> classPath = SessionClassPath.forEntries();
        if (!classPath.isEmpty()) builder.fileManager(fm -> SessionClassPath.apply(fm, classPath));
        return builder.build();
    }

    /** The fewest snippets between renewals: past about a thousand, JShell's cost per entry grows with their number. */
    static final int RENEW_AT = 1000;

    /**
     * Snippets between renewals per declaration a renewal moves. Each moved declaration is compiled
     * again (5-15 ms, more the more are already moved: every compile imports each live name), while
     * each snippet held adds a few microseconds to every later entry; four snippets per declaration
     * keeps the pauses a small share of the session's time.
     */
    static final int SNIPPETS_PER_MOVED = 4;

    /**
     * The most declarations a renewal moves: moving them is quadratic in their number (a few seconds
     * for 300 on an idle machine), and past that many live names the per-entry cost is set by the
     * names themselves, which a renewal cannot reduce.
     */
    static final int MAX_MOVED = 300;

    /** Another renewal threshold (tests). */
    void renewAt(int snippets) {
        synchronized (lock) {
            renewAt = snippets;
            nextRenewal = renewedAt + snippets;
        }
    }

    /** How many times the session has renewed itself (tests). */
    int renewals() {
        synchronized (lock) {
            return renewals;
        }
    }

    /**
     * Renews the session when it holds enough snippets for the declarations it would move: at least
     * {@link #renewAt} since the last renewal, and {@value #SNIPPETS_PER_MOVED} per declaration. A
     * refused renewal is tried again only after half as many snippets again. Under the lock.
     */
    private void maybeRenew() {
        long count = shell.snippets().count();
        if (count < nextRenewal) return;
        List<Snippet> moving = movable();
        long due = renewedAt + Math.max(renewAt, SNIPPETS_PER_MOVED * (long) moving.size());
        if (count < due) {
            nextRenewal = due;
            return;
        }
        try {
            if (renew(moving)) {
                renewedAt = shell.snippets().count();
                nextRenewal = renewedAt + renewAt;
                return;
            }
        } catch (RuntimeException | LinkageError e) {
            Carry.clear(); // the old session goes on as it was
        }
        nextRenewal = count + renewAt / 2;
    }

    /**
     * The active declarations a renewal would move: imports, methods, variables and declared types
     * (which refuse the renewal); not the session's own imports, nor an expression's value
     * ({@code $1}); statements and expressions have nothing to move. Under the lock.
     */
    private List<Snippet> movable() {
        return shell.snippets()
                .filter(sn -> sn.kind() == Snippet.Kind.IMPORT || sn.kind() == Snippet.Kind.METHOD
                        || sn.kind() == Snippet.Kind.VAR || sn.kind() == Snippet.Kind.TYPE_DECL)
                .filter(sn -> shell.status(sn).isActive())
                .filter(sn -> !preloaded.contains(sn))
                .filter(sn -> !(sn instanceof VarSnippet v && v.name().startsWith("$")))
                .collect(Collectors.toList());
    }

    /**
     * Moves the session's state into a new JShell, because JShell's cost per entry grows with the
     * number of snippets it has ever held (javac lists the class of every earlier snippet at each
     * compile). The new one gets the imports, the methods (their source again) and every variable
     * with the very object it held, declared with its type and read from {@link Carry}. Nothing runs
     * twice. It is refused, and the old session goes on, when the session holds something that could
     * not move unchanged: a class or record declared in it (its statics and its instances belong to
     * the old engine), or a value made by the old engine (a lambda, or one inside an array, collection
     * or map); and when it holds more than {@value #MAX_MOVED} declarations. The values of expressions
     * ({@code $1}, {@code $2}, names the console never shows) are not moved. Each entry keeps the new
     * snippets of what it declared, so {@link #undoLast()} works as before. Under the lock.
     *
     * @param active the declarations to move ({@link #movable()})
     * @return true when the session was renewed
     */
    private boolean renew(List<Snippet> active) {
        // each moved declaration is compiled again (5-15 ms): a session of very many names keeps its engine
        if (active.size() > MAX_MOVED) return false;
        List<String> replay = new ArrayList<>();
        List<Snippet> replayed = new ArrayList<>(); // the old snippet of each line of replay
        Map<String, Object> carried = new java.util.HashMap<>();
        for (Snippet sn : active) {
            if (sn instanceof TypeDeclSnippet) return false;
            if (sn instanceof ImportSnippet || sn instanceof MethodSnippet) {
                replay.add(sn.source());
                replayed.add(sn);
            } else if (sn instanceof VarSnippet v) {
                if (failedVariables.contains(v.name())) {
                    replay.add(v.typeName() + " " + v.name() + ";");
                    replayed.add(sn);
                    continue;
                }
                boolean[] sessionMade = new boolean[1];
                Object o = engine.objectOf(shell, v, sessionMade);
                if (sessionMade[0]) return false;
                carried.put(v.name(), o);
                replay.add(v.typeName() + " " + v.name() + " = (" + v.typeName() + ") org.ampturn.session.Carry.take(\"" + v.name() + "\");");
                replayed.add(sn);
            }
        }
        SessionEngine freshEngine = new SessionEngine();
        JShell fresh = newShell(freshEngine);
        Set<Snippet> freshImports = new HashSet<>();
        Map<Snippet, List<Snippet>> moved = new java.util.HashMap<>(); // old snippet → its new ones
        boolean ok = true;
        try {
            for (String line : imports) {
                List<SnippetEvent> ev = fresh.eval(line);
                if (ev.isEmpty() || ev.get(0).status() != Snippet.Status.VALID) { ok = false; break; }
                freshImports.add(ev.get(0).snippet());
            }
            Carry.put(carried);
            for (int i = 0; ok && i < replay.size(); i++) {
                for (SnippetEvent e : fresh.eval(replay.get(i))) {
                    if (e.causeSnippet() != null) continue;
                    if (!e.status().isDefined() || e.exception() != null) ok = false;
                    moved.computeIfAbsent(replayed.get(i), k -> new ArrayList<>()).add(e.snippet());
                }
            }
        } finally {
            Carry.clear();
            if (!ok) fresh.close();
        }
        if (!ok) return false;
        JShell old = shell;
        shell = fresh;
        analysis = fresh.sourceCodeAnalysis();
        engine = freshEngine;
        preloaded.clear();
        preloaded.addAll(freshImports);
        // each entry now holds the new snippets of what it declared, so #undo still takes it back
        List<List<Snippet>> renewed = new ArrayList<>();
        for (List<Snippet> entry : entries) {
            List<Snippet> now = new ArrayList<>();
            for (Snippet sn : entry) now.addAll(moved.getOrDefault(sn, List.of()));
            renewed.add(now);
        }
        entries.clear();
        entries.addAll(renewed);
        renewals++;
        old.close();
        return true;
    }

    /**
     * The import lines the session holds, e.g. {@code import org.ampturn.units.*;}. The facade's
     * static helpers are imported at the start; a library package is imported the first time an
     * entry names one of its classes, and every package once completion is asked for or the
     * console warms up.
     */
    public List<String> imports() {
        synchronized (lock) {
            return List.copyOf(imports);
        }
    }

    /** Imports every library package not imported yet (for completion, which offers their classes). */
    public void importAll() {
        synchronized (lock) {
            for (String line : library.all()) addImport(line);
        }
    }

    /** Imports the packages of the library classes that {@code source} names. Under the lock. */
    private void importFor(String source) {
        for (String line : library.neededBy(source)) addImport(line);
    }

    /** Evaluates one import line once; one that does not compile is dropped and not tried again. Under the lock. */
    private void addImport(String line) {
        if (!importsTried.add(line)) return;
        List<SnippetEvent> ev;
        try {
            ev = shell.eval(line);
        } catch (IllegalStateException e) {
            return; // the session has ended: the entry's own evaluation says so
        }
        if (ev.isEmpty()) return;
        if (ev.get(0).status() == Snippet.Status.VALID) {
            imports.add(line);
            preloaded.add(ev.get(0).snippet());
        } else {
            dropQuietly(ev.get(0).snippet());
        }
    }

    /**
     * Compiles and runs a few throw-away entries and drops them, so that the user's first entry is
     * quick. For the interactive console only, while the first prompt waits; a batch run is faster
     * without it.
     */
    public void warmUp() {
        synchronized (lock) {
            importAll();
            List<Snippet> tmp = new ArrayList<>();
            for (String s : List.of("int ampturn$warm = 1 + 1;", "ampturn$warm * 2",
                    "double ampturn$f(double x) { return x * ampturn$warm; }", "ampturn$f(3.0)",
                    imports.stream().anyMatch(i -> i.contains("Ampturn")) ? "mm(25).times(2)" : "1")) {
                for (SnippetEvent e : shell.eval(s)) if (e.causeSnippet() == null) tmp.add(e.snippet());
            }
            analysis.completionSuggestions("Math.ab", 7, new int[1]);
            Collections.reverse(tmp);
            for (Snippet s : tmp) dropQuietly(s);
        }
    }

    /**
     * Runs one entry (one or several snippets, as typed) and returns what it gave. Parts run in
     * order and the entry stops at the first part that fails. Never throws for bad input.
     */
    public Outcome eval(String entrySource) {
        synchronized (lock) {
            try {
                return evalGuarded(entrySource);
            } catch (RuntimeException | LinkageError | VirtualMachineError | AssertionError e) {
                // the compiler or the engine failed on this entry: that is the entry's error, not the session's end
                return new Outcome(entrySource, Kind.ERROR, List.of(Result.of(Kind.ERROR, toolFailure(e))), false, false);
            }
        }
    }

    /**
     * The message of a failure inside the compiler or the engine (not in the entry's own code): what
     * happened, in one line, and that the session goes on.
     */
    static String toolFailure(Throwable e) {
        Throwable root = e;
        while (root.getCause() != null && root.getCause() != root) root = root.getCause();
        if (e instanceof StackOverflowError || root instanceof StackOverflowError) {
            return "this entry is nested or chained too deeply for the Java compiler; split it into smaller entries";
        }
        if (e instanceof OutOfMemoryError || root instanceof OutOfMemoryError) {
            return "this entry ran out of memory; the session goes on without it";
        }
        return "the Java compiler failed on this entry (" + e.getClass().getSimpleName() + "); rewrite it, the session goes on";
    }

    private Outcome evalGuarded(String entrySource) {
        {
            maybeRenew();
            importFor(entrySource);
            List<Snippet> added = new ArrayList<>();
            List<Result> results = new ArrayList<>();
            Kind kind = Kind.NOTHING;
            boolean failed = false;
            boolean interrupted = false;
            String rest = entrySource;
            int consumed = 0;
            while (!rest.isBlank() && !failed) {
                CompletionInfo ci = analyze(rest);
                if (ci != null && ci.completeness() == Completeness.EMPTY) break;
                String piece;
                String remaining;
                if (ci != null && ci.completeness().isComplete()) {
                    piece = ci.source();
                    remaining = ci.remaining();
                } else {
                    piece = rest; // incomplete: run it anyway so the compiler says what is missing
                    remaining = "";
                }
                int pieceStart = locate(entrySource, piece, consumed);
                List<SnippetEvent> events;
                stopRequested = false;
                generation++;
                running = true;
                SessionPrinted printed = SessionPrinted.begin();
                try {
                    events = shell.eval(piece);
                } catch (IllegalStateException e) {
                    results.add(Result.of(Kind.ERROR, "the session has ended: " + e.getMessage()));
                    failed = true;
                    break;
                } finally {
                    running = false;
                    CompilerNoise.reset();
                    for (String line : printed.end()) results.add(Result.of(Kind.PRINTED, line));
                }
                // stopped mid-run; an entry that caught the stop and returned (a study with its partial
                // result) finished normally and shows its value
                if (stopRequested) interrupted = true;
                if (stopRequested && !gaveValue(events)) {
                    failed = true;
                    results.add(Result.of(Kind.ERROR, INTERRUPTED));
                    for (SnippetEvent e : events) if (e.causeSnippet() == null) added.add(e.snippet());
                    break;
                }
                boolean shown = false;
                for (SnippetEvent e : events) {
                    if (e.causeSnippet() != null) continue; // a dependent snippet changed state
                    added.add(e.snippet());
                    Result r = describe(e, events, entrySource, pieceStart, piece);
                    if (r == null) continue;
                    results.add(r);
                    shown = true;
                    if (r.kind() == Kind.ERROR) failed = true;
                    else kind = r.kind();
                }
                if (interrupted && !shown) { // stopped with nothing of its own to show: say so
                    failed = true;
                    results.add(Result.of(Kind.ERROR, INTERRUPTED));
                }
                if (interrupted) break; // the rest of a stopped entry does not run
                consumed = entrySource.length() - remaining.length();
                if (consumed < 0) consumed = 0;
                rest = remaining;
            }
            if (failed) kind = Kind.ERROR;
            boolean kept = added.stream().anyMatch(sn -> shell.status(sn).isActive());
            if (kept) entries.add(added);
            for (Snippet sn : added) if (isTemporaryValue(sn)) dropQuietly(sn);
            return new Outcome(entrySource, kind, results, interrupted, kept);
        }
    }

    /**
     * Interrupts the entry that is running, if any; safe to call from any thread. A stop that
     * arrives while the entry is still being compiled is repeated until its code runs and stops.
     */
    public void stop() {
        if (!running) return;
        long gen = generation;
        stopRequested = true;
        stopEngine();
        Thread again = new Thread(() -> {
            while (running && generation == gen) {
                try {
                    Thread.sleep(50);
                } catch (InterruptedException e) {
                    return;
                }
                if (running && generation == gen) stopEngine();
            }
        }, "ampturn-stop");
        again.setDaemon(true);
        again.start();
    }

    private void stopEngine() {
        try {
            shell.stop();
        } catch (RuntimeException ignored) {
            // the engine may have finished between the check and the call
        }
    }

    /** True while an entry runs. */
    public boolean isRunning() {
        return running;
    }

    /**
     * Takes the last entry's snippets out of the session. A definition that the entry had replaced
     * is not brought back (replay the worksheet for that).
     *
     * @return true when there was an entry to take back
     */
    public boolean undoLast() {
        synchronized (lock) {
            if (entries.isEmpty()) return false;
            List<Snippet> last = entries.remove(entries.size() - 1);
            for (int i = last.size() - 1; i >= 0; i--) dropQuietly(last.get(i));
            return true;
        }
    }

    /** Takes every entry out of the session; the preloaded imports stay. For replay. */
    public void clear() {
        synchronized (lock) {
            List<Snippet> all = shell.snippets().collect(Collectors.toList());
            Collections.reverse(all);
            for (Snippet s : all) if (!preloaded.contains(s)) dropQuietly(s);
            entries.clear();
            failedVariables.clear();
        }
    }

    /** How many entries have run (and not been undone) since the start or the last {@link #clear()}. */
    public int entryCount() {
        synchronized (lock) {
            return entries.size();
        }
    }

    /** How many variables the session holds, hidden ones included (for tests). */
    long variableCount() {
        synchronized (lock) {
            return shell.variables().count();
        }
    }

    /** The variables, methods and types defined so far (not the temporary values of expressions). */
    public List<Name> names() {
        synchronized (lock) {
            List<Name> out = new ArrayList<>();
            shell.variables().filter(v -> !v.name().startsWith("$")).forEach(v -> {
                String value;
                try {
                    value = shell.varValue(v);
                } catch (IllegalStateException | IllegalArgumentException e) {
                    value = "(no value)";
                }
                out.add(new Name("variable", v.name(), LIBRARY_PACKAGE.matcher(v.typeName()).replaceAll(""), value));
            });
            shell.methods().forEach(m -> out.add(new Name("method", m.name() + "(" + m.parameterTypes() + ")",
                    returnType(m.signature()), "")));
            shell.types().forEach(t -> out.add(new Name(typeKind(t), t.name(), "", "")));
            return out;
        }
    }

    /**
     * True when the text typed so far is not a whole entry yet (an open brace, an unfinished
     * expression), so the console asks for another line.
     */
    public boolean needsMore(String text) {
        synchronized (lock) {
            Completeness c = completeness(text);
            return !c.isComplete() && c != Completeness.EMPTY;
        }
    }

    /**
     * Completion candidates at {@code cursor}: library classes and methods, session variables and
     * methods. Candidates that fit the expected type come first.
     */
    public Completion complete(String code, int cursor) {
        synchronized (lock) {
            importAll();
            int[] anchor = new int[1];
            List<SourceCodeAnalysis.Suggestion> all = analysis.completionSuggestions(code, cursor, anchor);
            Set<String> out = new LinkedHashSet<>();
            for (SourceCodeAnalysis.Suggestion s : all) if (s.matchesType()) out.add(s.continuation());
            for (SourceCodeAnalysis.Suggestion s : all) out.add(s.continuation());
            out.removeIf(s -> s.startsWith("ampturn$") || s.startsWith("$"));
            return new Completion(anchor[0], List.copyOf(out));
        }
    }

    /** The signatures of the method or constructor being called at {@code cursor}, e.g. {@code Quantity Ampturn.mm(double)}. */
    public List<String> signatures(String code, int cursor) {
        synchronized (lock) {
            importAll();
            return analysis.documentation(code, cursor, false).stream()
                    .map(SourceCodeAnalysis.Documentation::signature).collect(Collectors.toList());
        }
    }

    @Override
    public void close() {
        shell.close();
    }

    // ---- helpers ------------------------------------------------------------------------------

    /** True when a stopped snippet still ended with a value of its own (a study that returned its partial result). */
    private static boolean gaveValue(List<SnippetEvent> events) {
        // a statement stopped before or while it ran reports VALID with no exception and an empty
        // value: only a non-empty value is a result the entry returned
        return events.stream().anyMatch(e -> e.causeSnippet() == null && e.exception() == null && e.value() != null
                && !e.value().isEmpty() && e.status() == Snippet.Status.VALID);
    }

    /** The analysis of the text's first snippet, or null when the analysis itself failed on it. */
    private CompletionInfo analyze(String text) {
        try {
            return analysis.analyzeCompletion(text);
        } catch (RuntimeException | LinkageError | VirtualMachineError | AssertionError e) {
            return null;
        }
    }

    /** Completeness of the whole text, which may hold several snippets. */
    private Completeness completeness(String text) {
        try {
            return completenessUnguarded(text);
        } catch (RuntimeException | LinkageError | VirtualMachineError | AssertionError e) {
            return Completeness.COMPLETE; // the analysis failed: let the compiler report on the entry
        }
    }

    private Completeness completenessUnguarded(String text) {
        String rest = text;
        boolean any = false;
        while (true) {
            CompletionInfo ci = analysis.analyzeCompletion(rest);
            Completeness c = ci.completeness();
            if (c == Completeness.EMPTY) return any ? Completeness.COMPLETE : Completeness.EMPTY;
            if (!c.isComplete()) return c;
            any = true;
            rest = ci.remaining();
            if (rest.isBlank()) return c;
        }
    }

    private Result describe(SnippetEvent e, List<SnippetEvent> events, String entry, int pieceStart, String piece) {
        Snippet sn = e.snippet();
        JShellException ex = e.exception();
        if (ex instanceof UnresolvedReferenceException) {
            var target = ((UnresolvedReferenceException) ex).getSnippet();
            String name = target instanceof MethodSnippet ? ((MethodSnippet) target).name() + "(...)" : target.source().strip();
            String needs = unresolved(target);
            if (needs.isEmpty()) {
                List<Diag> errs = errors(target);
                return Result.of(Kind.ERROR, name + " cannot run: " + (errs.isEmpty() ? "it uses something not defined yet" : SessionMessages.message(errs.get(0))));
            }
            return Result.of(Kind.ERROR, name + " cannot run until " + needs + " is defined");
        }
        if (ex != null) {
            if (sn instanceof VarSnippet) failedVariables.add(((VarSnippet) sn).name());
            String noValue = noValue(ex, piece);
            return Result.of(Kind.ERROR, noValue != null ? noValue : SessionMessages.exception(ex));
        }
        if (sn instanceof VarSnippet && e.status() == Snippet.Status.VALID) failedVariables.remove(((VarSnippet) sn).name());
        switch (e.status()) {
            case REJECTED: {
                Result r = SessionMessages.compileError(errors(sn), entry, pieceStart, piece);
                for (String name : failedVariables) {
                    if (r.text().equals("cannot find symbol: variable " + name) || r.text().startsWith("cannot find symbol: variable " + name + "\n")) {
                        return new Result(Kind.ERROR, name + " has no value: its entry failed", r.detail());
                    }
                }
                return r;
            }
            case VALID:
            case RECOVERABLE_DEFINED:
            case RECOVERABLE_NOT_DEFINED:
                break;
            default:
                return null;
        }
        boolean redefined = events.stream().anyMatch(o -> o.causeSnippet() == sn && o.status() == Snippet.Status.OVERWRITTEN);
        String unresolved = unresolved(sn);
        if (unresolved.isEmpty() && e.status() != Snippet.Status.VALID) {
            List<Diag> errs = errors(sn);
            if (!errs.isEmpty()) unresolved = "this is fixed: " + SessionMessages.message(errs.get(0));
        }
        if (sn instanceof VarSnippet) {
            VarSnippet v = (VarSnippet) sn;
            if (e.status() == Snippet.Status.RECOVERABLE_NOT_DEFINED) {
                return Result.of(Kind.ERROR, v.name() + " cannot be used until " + unresolved + " is defined");
            }
            String value = shown(e.value(), v.typeName());
            Object object = e.status() == Snippet.Status.VALID ? engine.lastValue(v.name()) : null;
            if (v.subKind() == Snippet.SubKind.TEMP_VAR_EXPRESSION_SUBKIND) return new Result(Kind.VALUE, value, List.of(), object);
            return new Result(Kind.DECLARATION, v.name() + " = " + value, List.of(), object);
        }
        if (sn instanceof ExpressionSnippet) {
            ExpressionSnippet x = (ExpressionSnippet) sn;
            if ("void".equals(x.typeName())) return null;
            return Result.of(Kind.VALUE, shown(e.value(), x.typeName()));
        }
        if (sn instanceof MethodSnippet) {
            MethodSnippet m = (MethodSnippet) sn;
            String text = (redefined ? "redefined method " : "defined method ") + m.name() + "(" + m.parameterTypes() + ")";
            if (!unresolved.isEmpty()) text += usableOnce(unresolved);
            return Result.of(Kind.DEFINITION, text);
        }
        if (sn instanceof TypeDeclSnippet) {
            TypeDeclSnippet t = (TypeDeclSnippet) sn;
            String text = (redefined ? "redefined " : "defined ") + typeKind(t) + " " + t.name();
            if (!unresolved.isEmpty()) text += usableOnce(unresolved);
            return Result.of(Kind.DEFINITION, text);
        }
        if (sn instanceof ImportSnippet) {
            return Result.of(Kind.DEFINITION, "imported " + ((ImportSnippet) sn).fullname()
                    + (((ImportSnippet) sn).isStatic() ? " (static)" : ""));
        }
        return null; // a statement shows nothing
    }

    /**
     * For a null pointer met by an entry that uses a variable whose own entry failed (so it holds
     * no value): says so by name instead of "NullPointerException". Null otherwise.
     */
    private String noValue(JShellException ex, String piece) {
        if (!(ex instanceof jdk.jshell.EvalException)
                || !"java.lang.NullPointerException".equals(((jdk.jshell.EvalException) ex).getExceptionClassName())) return null;
        for (String name : failedVariables) {
            if (java.util.regex.Pattern.compile("(?<![\\w$.])" + java.util.regex.Pattern.quote(name) + "(?![\\w$])").matcher(piece).find()) {
                return name + " has no value: its entry failed";
            }
        }
        return null;
    }

    private static String usableOnce(String unresolved) {
        return unresolved.startsWith("this is fixed: ") ? ", usable once " + unresolved
                : ", usable once " + unresolved + " is defined";
    }

    private List<Diag> errors(Snippet sn) {
        return shell.diagnostics(sn).filter(Diag::isError).collect(Collectors.toList());
    }

    private String unresolved(Snippet sn) {
        if (!(sn instanceof jdk.jshell.DeclarationSnippet)) return "";
        return shell.unresolvedDependencies((jdk.jshell.DeclarationSnippet) sn).collect(Collectors.joining(", "));
    }

    private static String typeKind(TypeDeclSnippet t) {
        switch (t.subKind()) {
            case INTERFACE_SUBKIND: return "interface";
            case ENUM_SUBKIND: return "enum";
            case ANNOTATION_TYPE_SUBKIND: return "annotation";
            case RECORD_SUBKIND: return "record";
            default: return "class";
        }
    }

    /**
     * The package part of a library type's name. JShell names a variable's type in full when its
     * package is not imported yet ({@code org.ampturn.study.Table}); {@code #names} shows it
     * as {@code Table}, as the library's packages are imported as soon as an entry names them.
     */
    private static final java.util.regex.Pattern LIBRARY_PACKAGE = java.util.regex.Pattern.compile("\\borg\\.ampturn\\.(?:[a-z][a-z0-9]*\\.)*(?=[A-Z])");

    private static String returnType(String signature) {
        int close = signature.lastIndexOf(')');
        return close >= 0 ? signature.substring(close + 1) : signature;
    }

    /** Where {@code piece} (as the analysis returned it) starts in the entry's text. */
    private static int locate(String entry, String piece, int from) {
        String core = piece.strip();
        if (core.endsWith(";")) core = core.substring(0, core.length() - 1).strip();
        int at = core.isEmpty() ? -1 : entry.indexOf(core, Math.min(from, entry.length()));
        if (at < 0) return from;
        int lead = piece.indexOf(core);
        return at - Math.max(lead, 0);
    }

    /**
     * True for the hidden variable ({@code $12}) that JShell makes to hold an expression's value.
     * The console shows the value and never the name, so nothing can refer to it; it is dropped
     * once shown. Left in place, every such variable is imported into each later entry's compile,
     * and an entry took 45 ms after 50 expressions and 51 ms after 400 instead of 12-23 ms.
     */
    private static boolean isTemporaryValue(Snippet s) {
        return s instanceof VarSnippet && s.subKind() == Snippet.SubKind.TEMP_VAR_EXPRESSION_SUBKIND;
    }

    private void dropQuietly(Snippet s) {
        try {
            if (shell.status(s).isActive()) shell.drop(s);
        } catch (IllegalArgumentException | IllegalStateException ignored) {
            // already gone
        }
    }

    static Optional<String> blockedExit(JShellException ex) {
        for (Throwable t = ex; t != null; t = t.getCause()) {
            String m = t.getMessage();
            if (m != null && m.contains(SessionEngine.BLOCKED)) return Optional.of(EXIT_BLOCKED);
        }
        return Optional.empty();
    }


    /**
     * A value as shown: a {@code double} or {@code float} with the display digits of quantities
     * ({@code 590.5}, not {@code 590.4999999999236}), so a worksheet records what the engineer
     * reads and verify compares it to those digits; anything else as JShell gives it.
     */
    static String shown(String value, String typeName) {
        if (value == null) return "";
        switch (typeName) {
            case "double": case "float": case "Double": case "Float":
                try {
                    return org.ampturn.units.Quantity.number(Double.parseDouble(value)).toString();
                } catch (NumberFormatException e) {
                    return value;
                }
            default:
                return value;
        }
    }
}
