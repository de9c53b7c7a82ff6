package org.ampturn.console;

import org.ampturn.worksheet.SessionCommand;
import org.ampturn.worksheet.SessionConsole;

/** A command made of its words and an action; the console's built-ins are these. */
record ConsoleCommand(String name, String usage, String summary, Action action) implements SessionCommand {
    /** What the command does with the rest of its line. */
    @FunctionalInterface
    interface Action {
        void run(String argument, SessionConsole console) throws Exception;
    }

    @Override
    public void run(String argument, SessionConsole console) throws Exception {
        action.run(argument, console);
    }

    /** A worksheet command that this build does not have yet: typing it says so and changes nothing. */
    static ConsoleCommand notYet(String name, String usage, String summary) {
        return new ConsoleCommand(name, usage, summary, (arg, console) -> console.out().println(
                "  ! #" + name + " is not available yet in this build"));
    }
}
