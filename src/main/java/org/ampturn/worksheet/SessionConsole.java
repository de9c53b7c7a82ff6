package org.ampturn.worksheet;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

/**
 * What the interactive console offers to a {@link SessionCommand} or a {@link SessionExtension}:
 * the session, the output, a yes/no question, the entries typed so far and the worksheet's name.
 * The console implements it; the worksheet layer uses it without seeing the terminal.
 */
public interface SessionConsole {
    /** The running session (waits for it if it is still starting). */
    Session session();

    /** Where to print; plain text, flushed by the console after each command. */
    PrintWriter out();

    /** Asks a yes/no question on the terminal; false on no, on an empty answer or when there is no terminal. */
    boolean confirm(String question);

    /**
     * Runs an entry as if typed: shows it (when {@code echo}), runs it, tells the extensions, shows
     * the result and adds it to {@link #history()}.
     */
    Outcome enter(String entrySource, boolean echo);

    /** The entries run so far in this console (after undo), with their outcomes, oldest first. */
    List<Outcome> history();

    /** Forgets the history and clears the session (the preloaded imports stay); for replay and open. */
    void clear();

    /** The worksheet file, once the worksheet has one. */
    Optional<Path> file();

    /** Names the worksheet's file; the prompt then shows its name. */
    void file(Path file);

    /** True when entries ran since the last {@link #saved()} (or since the start). */
    boolean unsaved();

    /** Marks the history as saved, so {@code #quit} leaves without asking. */
    void saved();
}
