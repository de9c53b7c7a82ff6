package org.ampturn.worksheet;

/**
 * A console command word such as {@code #save}: the console looks the word up, passes the rest of
 * the line and prints what the command writes. Commands are contributed by a
 * {@link SessionExtension}; one with the same {@link #name()} as a built-in placeholder replaces it.
 */
public interface SessionCommand {
    /** The word without the {@code #}, e.g. {@code "save"}. */
    String name();

    /** How to type it, e.g. {@code "#save [FILE]"}. */
    String usage();

    /** One line for {@code #help}. */
    String summary();

    /**
     * Runs the command.
     *
     * @param argument the rest of the line after the word, stripped (empty when none)
     * @param console  the console the command runs in: its session, output and questions
     * @throws Exception any failure; the console prints its message as {@code ! message} and goes on
     */
    void run(String argument, SessionConsole console) throws Exception;
}
