package org.ampturn.console;

import static org.junit.jupiter.api.Assertions.fail;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PipedInputStream;
import java.io.PipedOutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.concurrent.CompletableFuture;
import org.ampturn.session.Session;
import org.ampturn.worksheet.AmpturnHome;
import org.jline.terminal.Terminal;
import org.jline.terminal.Size;
import org.jline.terminal.impl.DumbTerminal;

/**
 * A console on a dumb terminal over byte streams: tests type into it and wait, with a timeout,
 * for text to appear in what it printed.
 */
final class ConsoleHarness implements AutoCloseable {
    private static volatile CompletableFuture<Session> shared;

    private final PipedOutputStream keys = new PipedOutputStream();
    private final ByteArrayOutputStream screen = new ByteArrayOutputStream();
    private final Terminal terminal;
    final Console console;
    private final Thread loop;
    private volatile Integer exit;

    ConsoleHarness(Path docs) throws IOException {
        this(docs, null, null);
    }

    /**
     * A console with a history file (or null) that opens {@code worksheet} (or null) at the start.
     * Its per-user folder (journal, trust store) is a temporary one unless the test named one
     * with the {@code ampturn.home} property.
     */
    ConsoleHarness(Path docs, Path history, Path worksheet) throws IOException {
        if (System.getProperty(AmpturnHome.PROPERTY) == null) {
            System.setProperty(AmpturnHome.PROPERTY, java.nio.file.Files.createTempDirectory("ampturn-console-test-").toString());
        }
        PipedInputStream in = new PipedInputStream(keys, 1 << 16);
        // a dumb terminal that calls itself "ansi", so that the reader edits and completes as on a
        // real one (JLine's own reader tests do the same)
        terminal = new DumbTerminal("ampturn-test", "ansi", in, screen, StandardCharsets.UTF_8);
        terminal.setSize(new Size(120, 40));
        console = new Console(terminal, freshSession(), history, new HelpPages(docs));
        loop = new Thread(() -> exit = console.loop(worksheet), "console-under-test");
        loop.setDaemon(true);
        loop.start();
    }

    /** A fresh session per console (sessions are cheap once the JVM is warm). */
    private static CompletableFuture<Session> freshSession() {
        return Console.startEngine(false);
    }

    /** The prompt's arrow as this terminal shows it. */
    String arrow() {
        return console.prompt().replaceAll("\u001B\\[[0-9;?]*[A-Za-z]", "").strip().endsWith("\u203A") ? "\u203A" : ">";
    }

    void type(String text) throws IOException {
        keys.write(text.getBytes(StandardCharsets.UTF_8));
        keys.flush();
    }

    /** What the terminal does on Ctrl-C while an entry runs (the tty raises SIGINT; here the test does). */
    void interrupt() {
        terminal.raise(Terminal.Signal.INT);
    }

    /** Waits until the screen holds {@code text} after position {@code from}; returns the position after it. */
    int await(String text, int from) throws InterruptedException {
        long until = System.nanoTime() + 30_000_000_000L;
        while (System.nanoTime() < until) {
            String s = screen();
            int at = s.indexOf(text, from);
            if (at >= 0) return at + text.length();
            Thread.sleep(20);
        }
        fail("no \"" + text + "\" on the screen after 30 s; screen was:\n" + screen());
        return -1;
    }

    int await(String text) throws InterruptedException {
        return await(text, 0);
    }

    String screen() {
        synchronized (screen) {
            return new String(screen.toByteArray(), StandardCharsets.UTF_8).replaceAll("\u001B\\[[0-9;?]*[A-Za-z]", "").replace("\r\n", "\n").replace("\r", "");
        }
    }

    /** Closes the input (the console sees the end of input, like Ctrl-D) and waits for the loop to end. */
    Integer end() throws Exception {
        keys.close();
        loop.join(20_000);
        return exit;
    }

    @Override
    public void close() throws Exception {
        if (loop.isAlive()) end();
        terminal.close();
        // the console numbers charts by entry and puts them beside its worksheet: leave the chart layer as other tests expect it
        org.ampturn.chart.Figures.useNumbering(null);
        org.ampturn.chart.Figures.useDirectory(Path.of(""));
    }
}
