package org.ampturn.worksheet;

import java.io.PrintStream;
import java.util.List;
import java.util.OptionalInt;

/**
 * A plug-in of the console and the command line, found with {@link java.util.ServiceLoader}: list
 * the implementing class in {@code src/main/resources/META-INF/services/org.ampturn.worksheet.SessionExtension}.
 * Every method has a default that does nothing, so an extension implements only what it adds.
 */
public interface SessionExtension {
    /** Console commands this extension adds or replaces ({@code #save}, {@code #open}, ...). */
    default List<SessionCommand> commands() {
        return List.of();
    }

    /**
     * Handles a command-line verb ({@code run}, {@code verify}, {@code export}) with its arguments
     * (after the verb). Returns the process exit code, or empty to leave the verb to the next
     * extension or the built-in behaviour.
     */
    default OptionalInt verb(String verb, List<String> args, PrintStream out, PrintStream err) {
        return OptionalInt.empty();
    }

    /**
     * The console opens on a worksheet file named on the command line ({@code ampturn FILE.atw}).
     * Return true when the extension has opened it (shown it, settled trust, run it); false leaves
     * it to the console's own plain replay.
     */
    default boolean open(SessionConsole console, java.nio.file.Path file) throws Exception {
        return false;
    }

    /** Called after each entry ran and before its result is shown (a journal writes it here). */
    default void evaluated(SessionConsole console, Outcome outcome) {}

    /** Called after {@code #undo} took the last entry back. */
    default void undone(SessionConsole console, Outcome outcome) {}
}
