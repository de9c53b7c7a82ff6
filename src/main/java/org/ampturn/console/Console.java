package org.ampturn.console;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.Charset;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CompletionException;
import org.ampturn.Ampturn;
import org.ampturn.worksheet.Outcome;
import org.ampturn.worksheet.Session;
import org.ampturn.worksheet.SessionCommand;
import org.ampturn.worksheet.SessionConsole;
import org.ampturn.worksheet.SessionExtension;
import org.ampturn.worksheet.SessionExtensions;
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
 * The interactive console: a JLine line reader over a {@link Session}. The engine starts in the
 * background while the first prompt waits; entries are Java, lines beginning with {@code #} are
 * commands (see {@link ConsoleCommands}).
 */
public final class Console implements SessionConsole {
    private final Terminal terminal;
    private final LineReader reader;
    private final CompletableFuture<Session> engine;
    private final ConsoleCommands commands = new ConsoleCommands();
    private final List<SessionExtension> extensions;
    private final HelpPages help;
    private final List<Outcome> history = new ArrayList<>();
    private final String arrow;
    private Path file;
    private boolean unsaved;
    private boolean quit;
    private volatile long interruptAt;

    /**
     * A console on {@code terminal}.
     *
     * @param engine      the session, usually still starting ({@link #startEngine(boolean)})
     * @param historyFile where typed lines are kept across sessions, or null for none
     * @param extensions  the plug-ins that add worksheet commands
     */
    public Console(Terminal terminal, CompletableFuture<Session> engine, Path historyFile, List<SessionExtension> extensions, HelpPages help) {
        this(terminal, engine, historyFile, extensions, help, null);
    }

    /** As above; {@code localeCharset} is the charset of the user's locale when known (the prompt then avoids what it cannot show). */
    Console(Terminal terminal, CompletableFuture<Session> engine, Path historyFile, List<SessionExtension> extensions, HelpPages help,
            String localeCharset) {
        this.terminal = terminal;
        this.engine = engine;
        this.extensions = List.copyOf(extensions);
        this.help = help;
        this.arrow = canShow('\u203A', terminal.encoding(), localeCharset) ? "\u203A" : ">";
        for (SessionCommand c : ConsoleBuiltins.of(this)) commands.register(c);
        for (SessionCommand c : ConsoleCommands.worksheetPlaceholders()) commands.register(c);
        commands.registerAll(this.extensions);
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
            Console c = new Console(terminal, engine, hist, SessionExtensions.all(), HelpPages.find(), locale);
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
        return org.ampturn.worksheet.AmpturnHome.dir();
    }

    /** Reads and runs entries until {@code #quit}, Ctrl-D or the end of input; returns the exit code. */
    public int loop(Path worksheet) {
        println(new AttributedStringBuilder().styled(AttributedStyle.BOLD, "ampturn " + Ampturn.version())
                .append(": Java entries over the coil library; #help for help, #quit to leave").toAttributedString());
        // long sweeps and Monte Carlo runs draw their bar on the terminal, not in the entry's output
        org.ampturn.study.Progress.install(org.ampturn.study.Progress.bar(
                new java.io.PrintStream(terminal.output(), true, java.nio.charset.StandardCharsets.UTF_8)));
        if (worksheet != null) openAtStart(worksheet);
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
                else enter(line, false);
            } catch (RuntimeException e) {
                error(e.getMessage() != null ? e.getMessage() : e.toString()); // e.g. the engine did not start
            }
        }
        try {
            reader.getHistory().save();
        } catch (IOException ignored) {
            // history is a convenience
        }
        return 0;
    }

    // ---- SessionConsole ------------------------------------------------------------------------

    @Override
    public Session session() {
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

    @Override
    public PrintWriter out() {
        return terminal.writer();
    }

    @Override
    public boolean confirm(String question) {
        return ask(question) == Answer.YES;
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

    @Override
    public Outcome enter(String entrySource, boolean echo) {
        Session s = session();
        if (echo) echo(entrySource);
        Terminal.SignalHandler previous = terminal.handle(Terminal.Signal.INT, sig -> interrupt(s));
        Outcome o;
        try {
            o = s.eval(entrySource);
        } finally {
            terminal.handle(Terminal.Signal.INT, previous);
            System.out.flush();
            System.err.flush();
        }
        if (o.kept()) {
            history.add(o);
            unsaved = true;
        }
        for (SessionExtension e : extensions) {
            try {
                e.evaluated(this, o);
            } catch (RuntimeException ex) {
                error("could not record the entry: " + ex.getMessage());
            }
        }
        show(o);
        return o;
    }

    @Override
    public List<Outcome> history() {
        return List.copyOf(history);
    }

    @Override
    public void clear() {
        session().clear();
        history.clear();
    }

    @Override
    public Optional<Path> file() {
        return Optional.ofNullable(file);
    }

    @Override
    public void file(Path file) {
        this.file = file;
    }

    @Override
    public boolean unsaved() {
        return unsaved;
    }

    @Override
    public void saved() {
        unsaved = false;
    }

    // ---- inside the console --------------------------------------------------------------------

    /** The worksheet's name for the prompt: the file name without {@code .atw}, or "untitled". */
    String worksheetName() {
        if (file == null) return "untitled";
        String n = file.getFileName().toString();
        return n.endsWith(".atw") ? n.substring(0, n.length() - 4) : n;
    }

    String prompt() {
        return new AttributedStringBuilder().styled(AttributedStyle.BOLD, worksheetName())
                .append(" " + (history.size() + 1) + arrow + " ").toAnsi(terminal);
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
        if (history.isEmpty() || !session().undoLast()) return false;
        Outcome o = history.remove(history.size() - 1);
        unsaved = true;
        for (SessionExtension e : extensions) {
            try {
                e.undone(this, o);
            } catch (RuntimeException ex) {
                error("could not record the undo: " + ex.getMessage());
            }
        }
        out().println("  took back: " + firstLine(o.source()));
        return true;
    }

    /** #quit and Ctrl-D: leave, asking first when there is unsaved work. Returns true when leaving. */
    boolean leave(boolean fromEndOfInput) {
        if (unsaved && !history.isEmpty()) {
            Answer a = ask("Leave without saving " + history.size() + (history.size() == 1 ? " entry?" : " entries?"));
            if (a == Answer.NO) return false;
        }
        quit = true;
        return true;
    }

    void command(String line) {
        String word = line.split("\\s+", 2)[0];
        String arg = line.length() > word.length() ? line.substring(word.length()).strip() : "";
        Optional<SessionCommand> c = commands.find(word);
        if (c.isEmpty()) {
            error("no command " + word + "; #help lists them");
            return;
        }
        try {
            c.get().run(arg, this);
        } catch (Exception e) {
            error(e.getMessage() != null ? e.getMessage() : e.toString());
        }
        out().flush();
    }

    private void openAtStart(Path worksheet) {
        file(worksheet);
        try {
            for (SessionExtension e : extensions) if (e.open(this, worksheet)) return;
            if (!Files.exists(worksheet)) {
                out().println("  new worksheet: " + worksheet + " does not exist yet");
                return;
            }
            List<String> entries = session().splitEntries(Files.readString(worksheet, StandardCharsets.UTF_8));
            out().println("  " + worksheet + ": " + entries.size() + (entries.size() == 1 ? " entry" : " entries"));
            for (String e : entries) for (String l : e.split("\n", -1)) out().println("    " + l);
            if (entries.isEmpty() || !confirm("Run the entries of " + worksheet.getFileName() + "?")) return;
            for (String e : entries) enter(e, true);
            unsaved = false;
        } catch (Exception e) {
            error("cannot open " + worksheet + ": " + e.getMessage());
        }
    }

    private void interrupt(Session s) {
        if (!s.isRunning()) return;
        long now = System.nanoTime();
        if (interruptAt != 0 && now - interruptAt > 1_000_000_000L) {
            out().println("  (still running: on Java 21 and newer only entry code and library loops that check"
                    + " Thread.interrupted() can be stopped)");
            out().flush();
        }
        if (interruptAt == 0) interruptAt = now;
        s.stop();
    }

    private void echo(String source) {
        String[] lines = source.split("\n", -1);
        String p = prompt();
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
