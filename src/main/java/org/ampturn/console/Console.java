package org.ampturn.console;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.Charset;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CompletionException;
import java.util.function.Supplier;
import org.ampturn.Ampturn;
import org.ampturn.session.Outcome;
import org.ampturn.session.Session;
import org.ampturn.worksheet.AmpturnHome;
import org.ampturn.worksheet.Evaluation;
import org.ampturn.worksheet.Journal;
import org.ampturn.worksheet.Recovery;
import org.ampturn.worksheet.Replay;
import org.ampturn.worksheet.ShellEvaluator;
import org.ampturn.worksheet.Workspace;
import org.jline.reader.EndOfFileException;
import org.jline.reader.LineReader;
import org.jline.reader.LineReaderBuilder;
import org.jline.reader.UserInterruptException;
import org.jline.terminal.Terminal;
import org.jline.terminal.TerminalBuilder;
import org.jline.utils.AttributedString;
import org.jline.utils.AttributedStringBuilder;
import org.jline.utils.AttributedStyle;

/**
 * The interactive console: a JLine line reader over a worksheet ({@link Workspace}) whose entries
 * run in a {@link Session}. The engine starts in the background while the first prompt waits;
 * entries are Java, lines beginning with {@code #} are commands (see {@link ConsoleBuiltins} and
 * {@link WorksheetCommands}). The worksheet owns the file, the entries and the unsaved state; the
 * console only reads and shows them.
 */
public final class Console {
    private final Terminal terminal;
    private final LineReader reader;
    private final CompletableFuture<Session> engine;
    private final ConsoleCommands commands = new ConsoleCommands();
    private final HelpPages help;
    private final Workspace worksheet;
    private final String journalProblem;
    private final String arrow;
    private boolean quit;
    private volatile long interruptAt;

    /**
     * A console on {@code terminal}.
     *
     * @param engine      the session, usually still starting ({@link #startEngine(boolean)})
     * @param historyFile where typed lines are kept across sessions, or null for none
     */
    public Console(Terminal terminal, CompletableFuture<Session> engine, Path historyFile, HelpPages help) {
        this(terminal, engine, historyFile, help, null);
    }

    /** As above; {@code localeCharset} is the charset of the user's locale when known (the prompt then avoids what it cannot show). */
    Console(Terminal terminal, CompletableFuture<Session> engine, Path historyFile, HelpPages help, String localeCharset) {
        this.terminal = terminal;
        this.engine = engine;
        this.help = help;
        this.arrow = canShow('\u203A', terminal.encoding(), localeCharset) ? "\u203A" : ">";
        Workspace w;
        String problem = null;
        ShellEvaluator shell = ShellEvaluator.over(this::session);
        try {
            w = Workspace.forUser(shell, ShellEvaluator::start);
        } catch (IOException e) {
            problem = "the journal could not be started (" + e.getMessage() + "): unsaved entries are not protected against a crash";
            w = Workspace.unjournaled(shell, ShellEvaluator::start, org.ampturn.worksheet.TrustStore.user());
        }
        this.worksheet = w;
        this.journalProblem = problem;
        // a chart is numbered by the entry that makes it, alike in the console, run, verify and export
        org.ampturn.chart.Figures.useNumbering(w::nextEntryNumber);
        for (ConsoleCommand c : ConsoleBuiltins.of(this)) commands.register(c);
        for (ConsoleCommand c : WorksheetCommands.of(this)) commands.register(c);
        LineReaderBuilder b = LineReaderBuilder.builder()
                .terminal(terminal)
                .appName("ampturn")
                .parser(new ConsoleParser(this::needsMore))
                .completer(new ConsoleCompleter(this::readySession, commands::words))
                .highlighter(new ConsoleHighlighter())
                .variable(LineReader.SECONDARY_PROMPT_PATTERN, "%P ")
                .variable(LineReader.HISTORY_SIZE, 2000)
                .variable(LineReader.HISTORY_FILE_SIZE, 5000)
                .option(LineReader.Option.DISABLE_EVENT_EXPANSION, true)
                .option(LineReader.Option.INSERT_BRACKET, false)
                .option(LineReader.Option.AUTO_PARAM_SLASH, false)
                .option(LineReader.Option.AUTO_REMOVE_SLASH, false);
        if (historyFile != null) b.variable(LineReader.HISTORY_FILE, historyFile);
        this.reader = b.build();
    }

    /** {@code ampturn [FILE]}: the console on the system terminal; returns the exit code. */
    public static int main(String fileName) {
        CompletableFuture<Session> engine = startEngine(true);
        try (Terminal terminal = TerminalBuilder.builder().system(true).name("ampturn").build()) {
            Path dir = userDir();
            Path hist = null;
            try {
                Files.createDirectories(dir);
                hist = dir.resolve("history");
            } catch (IOException e) {
                System.err.println("ampturn: history is not kept (" + e.getMessage() + ")");
            }
            // JLine writes UTF-8 unless told otherwise; the locale says what the terminal shows
            String locale = System.getProperty("stdout.encoding", System.getProperty("sun.stdout.encoding"));
            Console c = new Console(terminal, engine, hist, HelpPages.find(), locale);
            return c.loop(fileName == null ? null : Path.of(fileName));
        } catch (IOException e) {
            System.err.println("ampturn: no terminal: " + e.getMessage());
            return 2;
        }
    }

    /** Starts a session on a background thread; {@code warm} also compiles throw-away entries (interactive use). */
    public static CompletableFuture<Session> startEngine(boolean warm) {
        CompletableFuture<Session> f = new CompletableFuture<>();
        Thread t = new Thread(() -> {
            try {
                Session s = Session.start();
                if (warm) s.warmUp();
                f.complete(s);
            } catch (Throwable e) {
                f.completeExceptionally(e);
            }
        }, "ampturn-engine-start");
        t.setDaemon(true);
        t.start();
        return f;
    }

    /** True when both the terminal's charset and the locale's (when known) can encode {@code c}. */
    static boolean canShow(char c, Charset terminal, String localeCharset) {
        if (terminal != null && !terminal.newEncoder().canEncode(c)) return false;
        if (localeCharset == null) return true;
        try {
            return Charset.forName(localeCharset).newEncoder().canEncode(c);
        } catch (IllegalArgumentException | UnsupportedOperationException e) {
            return true;
        }
    }

    /** The folder for history and per-user files, shared with the journal and trust store. */
    static Path userDir() {
        return AmpturnHome.dir();
    }

    /** Reads and runs entries until {@code #quit}, Ctrl-D or the end of input; returns the exit code. */
    public int loop(Path file) {
        println(new AttributedStringBuilder().styled(AttributedStyle.BOLD, "ampturn " + Ampturn.version())
                .append(": Java entries over the coil library; #help for help, #quit to leave").toAttributedString());
        // long sweeps and Monte Carlo runs draw their bar on the terminal, not in the entry's output
        org.ampturn.study.Progress.install(org.ampturn.study.Progress.bar(
                new java.io.PrintStream(terminal.output(), true, java.nio.charset.StandardCharsets.UTF_8)));
        if (journalProblem != null) error(journalProblem);
        offerRecovery();
        if (file != null) WorksheetCommands.openAtStart(this, file);
        while (!quit) {
            String line;
            try {
                line = reader.readLine(prompt());
            } catch (UserInterruptException e) {
                continue; // Ctrl-C at the prompt drops the line
            } catch (EndOfFileException e) {
                if (leave(true)) break;
                continue;
            }
            if (line.isBlank()) continue;
            try {
                if (line.stripLeading().startsWith("#")) command(line.strip());
                else enter(line);
            } catch (RuntimeException e) {
                error(e.getMessage() != null ? e.getMessage() : e.toString()); // e.g. the engine did not start
            }
        }
        try {
            reader.getHistory().save();
        } catch (IOException ignored) {
            // history is a convenience
        }
        // a clean end with everything saved needs no journal; unsaved work keeps it for #recover
        if (!worksheet.isDirty()) {
            try {
                worksheet.close();
            } catch (IOException ignored) {
                // the next start tidies it away
            }
        }
        return 0;
    }

    /** Tells the user at the start when an earlier session left unsaved work. */
    private void offerRecovery() {
        try {
            List<Recovery> all = worksheet.recoverable();
            if (all.isEmpty()) return;
            Recovery r = all.get(0);
            out().println("  an earlier session ended without saving (" + r.entries().size() + " entries"
                    + (r.worksheet() == null ? "" : " on " + r.worksheet().getFileName()) + "): #recover brings "
                    + (all.size() == 1 ? "it" : "one of the " + all.size()) + " back");
            out().flush();
        } catch (IOException | RuntimeException ignored) {
            // the offer is a convenience; #recover looks again
        }
    }

    // ---- what the commands use -----------------------------------------------------------------

    /** The running session (waits for it if it is still starting). */
    Session session() {
        try {
            return engine.join();
        } catch (CompletionException e) {
            throw new IllegalStateException("the Java engine did not start: " + e.getCause(), e.getCause());
        }
    }

    /** True when the typed text continues on the next line; false when the engine could not start (the entry then shows why). */
    private boolean needsMore(String text) {
        try {
            return session().needsMore(text);
        } catch (RuntimeException e) {
            return false;
        }
    }

    /** The session when it has started, else null (completion must not wait). */
    Session readySession() {
        return engine.isDone() && !engine.isCompletedExceptionally() ? engine.join() : null;
    }

    /** The worksheet this console works on. */
    Workspace worksheet() {
        return worksheet;
    }

    PrintWriter out() {
        return terminal.writer();
    }

    /** Asks a yes/no question; false on no, on an empty answer or at the end of input. */
    boolean confirm(String question) {
        return ask(question) == Answer.YES;
    }

    /** Questions of the worksheet: asked here; a trust review is printed first. */
    Workspace.Confirm asker() {
        return new Workspace.Confirm() {
            @Override
            public boolean ask(String question) {
                return confirm(question);
            }

            @Override
            public boolean review(List<String> review, String question) {
                // the lines that do more than calculate stand out; every line's control characters are already visible
                for (String line : review) {
                    boolean risky = line.startsWith("  ! ") || line.startsWith("Do more than calculate") || line.startsWith("  + ");
                    println(new AttributedString("  " + line, risky ? AttributedStyle.BOLD.foreground(AttributedStyle.RED) : AttributedStyle.DEFAULT));
                }
                return confirm(question);
            }
        };
    }

    enum Answer { YES, NO, END }

    Answer ask(String question) {
        Object before = reader.getVariable(LineReader.DISABLE_HISTORY);
        reader.setVariable(LineReader.DISABLE_HISTORY, true);
        try {
            String a = reader.readLine("  " + question + " [y/N] ");
            return a.strip().toLowerCase().startsWith("y") ? Answer.YES : Answer.NO;
        } catch (UserInterruptException e) {
            return Answer.NO;
        } catch (EndOfFileException e) {
            return Answer.END;
        } finally {
            reader.setVariable(LineReader.DISABLE_HISTORY, before == null ? false : before);
        }
    }

    /** Runs a typed entry through the worksheet (which records and journals it) and shows its result. */
    void enter(String source) {
        Evaluation e = interruptible(() -> worksheet.enter(source));
        show(e.outcome());
        for (String t : worksheet.takeJournalTrouble()) error(t);
    }

    /**
     * Runs {@code work} with Ctrl-C stopping the entry that runs in it; a replay stops after the
     * stopped entry (see {@link Replay}).
     */
    <T> T interruptible(Supplier<T> work) {
        Terminal.SignalHandler previous = terminal.handle(Terminal.Signal.INT, sig -> interrupt());
        try {
            return work.get();
        } finally {
            terminal.handle(Terminal.Signal.INT, previous);
            System.out.flush();
            System.err.flush();
        }
    }

    /** What a replay shows of each entry it runs: the entry under its number, then its result. */
    java.util.function.Consumer<Replay.Step> stepPrinter() {
        int[] n = {0};
        return s -> {
            echo(s.entry().source(), ++n[0]);
            show(s.result().outcome());
        };
    }

    // ---- inside the console --------------------------------------------------------------------

    String prompt() {
        return prompt(worksheet.entryCount() + 1);
    }

    private String prompt(int number) {
        return new AttributedStringBuilder().styled(AttributedStyle.BOLD, worksheet.name())
                .append(" " + number + arrow + " ").toAnsi(terminal);
    }

    ConsoleCommands commands() {
        return commands;
    }

    HelpPages help() {
        return help;
    }

    Terminal terminal() {
        return terminal;
    }

    /** Takes the last entry back; false when there is none. */
    boolean undo() {
        String last = worksheet.undo();
        if (last == null) return false;
        out().println("  took back: " + firstLine(last));
        return true;
    }

    /** #quit and Ctrl-D: leave, asking first when there is unsaved work. Returns true when leaving. */
    boolean leave(boolean fromEndOfInput) {
        int n = worksheet.entryCount();
        if (worksheet.isDirty() && n > 0) {
            Answer a = ask("Leave without saving " + n + (n == 1 ? " entry?" : " entries?"));
            if (a == Answer.NO) return false;
        }
        quit = true;
        return true;
    }

    void command(String line) {
        String word = line.split("\\s+", 2)[0];
        String arg = line.length() > word.length() ? line.substring(word.length()).strip() : "";
        Optional<ConsoleCommand> c = commands.find(word);
        if (c.isEmpty()) {
            error("no command " + word + "; #help lists them");
            return;
        }
        try {
            interruptible(() -> {
                try {
                    c.get().run(arg);
                    return null;
                } catch (Exception e) {
                    throw new CommandFailed(e);
                }
            });
        } catch (CommandFailed f) {
            Exception e = (Exception) f.getCause();
            error(e.getMessage() != null ? e.getMessage() : e.toString());
        }
        out().flush();
    }

    /** Carries a command's checked failure out of {@link #interruptible}. */
    private static final class CommandFailed extends RuntimeException {
        CommandFailed(Exception cause) {
            super(cause);
        }
    }

    private void interrupt() {
        Session s = readySession();
        if (s == null || !s.isRunning()) return;
        long now = System.nanoTime();
        if (interruptAt != 0 && now - interruptAt > 1_000_000_000L) {
            out().println("  (still running: on Java 21 and newer only entry code and library loops that check"
                    + " Thread.interrupted() can be stopped)");
            out().flush();
        }
        if (interruptAt == 0) interruptAt = now;
        worksheet.stop();
    }

    private void echo(String source, int number) {
        String[] lines = source.split("\n", -1);
        String p = prompt(number);
        int width = AttributedString.fromAnsi(p).columnLength();
        out().println(p + lines[0]);
        for (int i = 1; i < lines.length; i++) out().println(" ".repeat(width) + lines[i]);
    }

    /** Prints an outcome: values plain, errors and carets in red, definitions dimmed. */
    void show(Outcome o) {
        interruptAt = 0;
        for (Outcome.Result r : o.results()) {
            AttributedStyle style;
            switch (r.kind()) {
                case ERROR: style = AttributedStyle.DEFAULT.foreground(AttributedStyle.RED); break;
                case DEFINITION: style = AttributedStyle.DEFAULT.faint(); break;
                default: style = AttributedStyle.DEFAULT;
            }
            List<String> lines = new Outcome(o.source(), r.kind(), List.of(r), false, o.kept()).lines();
            int textLines = r.text().split("\n", -1).length;
            for (int i = 0; i < lines.size(); i++) {
                boolean sourceLine = i == textLines; // the offending source line stays uncoloured
                println(new AttributedString(lines.get(i), sourceLine ? AttributedStyle.DEFAULT : style));
            }
        }
        out().flush();
    }

    void error(String message) {
        println(new AttributedString("  ! " + message, AttributedStyle.DEFAULT.foreground(AttributedStyle.RED)));
        out().flush();
    }

    private void println(AttributedString s) {
        out().println(s.toAnsi(terminal));
        out().flush();
    }

    static String firstLine(String s) {
        int nl = s.indexOf('\n');
        return nl < 0 ? s : s.substring(0, nl) + " ...";
    }
}
