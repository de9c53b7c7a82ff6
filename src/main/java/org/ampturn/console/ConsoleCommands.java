package org.ampturn.console;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/** The command words of the console, in the order {@code #help} lists them. */
final class ConsoleCommands {
    private final Map<String, ConsoleCommand> byName = new LinkedHashMap<>();

    /** Adds a command; a word can be registered once. */
    void register(ConsoleCommand c) {
        if (byName.putIfAbsent(c.name(), c) != null) throw new IllegalArgumentException("#" + c.name() + " is registered twice");
    }

    /** The command for a word, with or without its {@code #}. */
    Optional<ConsoleCommand> find(String word) {
        String w = word.startsWith("#") ? word.substring(1) : word;
        return Optional.ofNullable(byName.get(w));
    }

    List<ConsoleCommand> all() {
        return new ArrayList<>(byName.values());
    }

    List<String> words() {
        return new ArrayList<>(byName.keySet());
    }
}
