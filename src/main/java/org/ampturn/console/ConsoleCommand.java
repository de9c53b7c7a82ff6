package org.ampturn.console;

/** A console command word such as {@code #save}: how to type it, one line for {@code #help}, and its action. */
record ConsoleCommand(String name, String usage, String summary, Action action) {
    /** What the command does with the rest of its line (stripped, empty when none). */
    @FunctionalInterface
    interface Action {
        /** Runs the command; any failure is printed as {@code ! message} and the console goes on. */
        void run(String argument) throws Exception;
    }

    void run(String argument) throws Exception {
        action.run(argument);
    }
}
