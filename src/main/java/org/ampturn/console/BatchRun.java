package org.ampturn.console;

import java.io.IOException;
import java.io.InputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.List;
import org.ampturn.worksheet.Outcome;
import org.ampturn.worksheet.Session;

/**
 * {@code ampturn run FILE|-}: runs the entries of a file (or of standard input) with no terminal,
 * printing each entry and then its result lines, plain text. An entry that fails prints its
 * {@code ! ...} line and the run goes on; the exit code is 1 when any entry failed.
 */
public final class BatchRun {
    private BatchRun() {}

    /**
     * Runs {@code source} ("-" for standard input).
     *
     * @return 0 when every entry ran, 1 when one failed, 2 when the source could not be read
     */
    public static int run(String source, InputStream stdin, PrintStream out, PrintStream err) {
        String text;
        try {
            text = source.equals("-") ? new String(stdin.readAllBytes(), StandardCharsets.UTF_8)
                    : Files.readString(Path.of(source), StandardCharsets.UTF_8);
        } catch (NoSuchFileException e) {
            err.println("ampturn: no such file: " + source);
            return 2;
        } catch (IOException e) {
            err.println("ampturn: cannot read " + source + ": " + e.getMessage());
            return 2;
        }
        try (Session session = Session.start()) {
            return run(session, text, out);
        }
    }

    /** Runs every entry of {@code text} in {@code session}; returns 1 if any failed, else 0. */
    public static int run(Session session, String text, PrintStream out) {
        boolean failed = false;
        List<Session.Entry> entries = session.entries(text);
        for (Session.Entry e : entries) {
            out.println(e.source());
            out.flush();
            Outcome o = session.eval(e.source());
            for (String line : o.lines()) out.println(line);
            out.flush();
            failed |= o.failed();
        }
        return failed ? 1 : 0;
    }
}
