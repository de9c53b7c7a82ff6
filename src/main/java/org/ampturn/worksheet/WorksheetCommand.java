package org.ampturn.worksheet;

/** A worksheet command word for the console ({@code #save}, {@code #open}, ...) and its action. */
record WorksheetCommand(String name, String usage, String summary, Action action) implements SessionCommand {
    @FunctionalInterface
    interface Action {
        void run(String argument, SessionConsole console) throws Exception;
    }

    @Override
    public void run(String argument, SessionConsole console) throws Exception {
        action.run(argument, console);
    }
}
