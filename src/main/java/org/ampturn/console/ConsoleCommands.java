package org.ampturn.console;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.ampturn.worksheet.SessionCommand;
import org.ampturn.worksheet.SessionExtension;

/**
 * The command words of the console, in the order {@code #help} lists them. The console's own
 * commands and placeholders for the worksheet commands come first; a command from a
 * {@link SessionExtension} with the same word replaces the one registered before it.
 */
final class ConsoleCommands {
    private final Map<String, SessionCommand> byName = new LinkedHashMap<>();

    /** Adds a command, or replaces the one with the same word (keeping its place in the list). */
    void register(SessionCommand c) {
        byName.put(c.name(), c);
    }

    void registerAll(List<SessionExtension> extensions) {
        for (SessionExtension e : extensions) for (SessionCommand c : e.commands()) register(c);
    }

    /** The command for a word, with or without its {@code #}. */
    Optional<SessionCommand> find(String word) {
        String w = word.startsWith("#") ? word.substring(1) : word;
        return Optional.ofNullable(byName.get(w));
    }

    List<SessionCommand> all() {
        return new ArrayList<>(byName.values());
    }

    List<String> words() {
        return new ArrayList<>(byName.keySet());
    }

    /** The placeholders for the worksheet commands of DESIGN.md, until an extension provides them. */
    static List<SessionCommand> worksheetPlaceholders() {
        return List.of(
                ConsoleCommand.notYet("open", "#open FILE", "open a worksheet: show it, run it once trusted"),
                ConsoleCommand.notYet("save", "#save [FILE]", "write the worksheet"),
                ConsoleCommand.notYet("replay", "#replay", "clear the session and run every entry again"),
                ConsoleCommand.notYet("verify", "#verify [FILE]", "replay and compare each result with the recorded one"),
                ConsoleCommand.notYet("note", "#note TEXT", "add a prose note to the worksheet"),
                ConsoleCommand.notYet("figures", "#figures", "list the charts made so far and their files"),
                ConsoleCommand.notYet("export", "#export FILE.html", "write the report"),
                ConsoleCommand.notYet("trust", "#trust FILE", "mark a worksheet as safe to run on this machine"),
                ConsoleCommand.notYet("recover", "#recover", "bring back the entries of a session that ended without saving"));
    }
}
