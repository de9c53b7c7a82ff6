package org.ampturn.console;

import java.util.List;
import java.util.Optional;
import org.ampturn.units.Quantity;
import org.ampturn.session.Session;

/** The console's own commands: #help, #names, #undo, #digits, #quit. */
final class ConsoleBuiltins {
    private ConsoleBuiltins() {}

    static List<ConsoleCommand> of(Console c) {
        return List.of(
                new ConsoleCommand("help", "#help [topic]", "this list, or the page of a topic", arg -> help(c, arg)),
                new ConsoleCommand("names", "#names", "the names defined so far, with type and value", arg -> names(c)),
                new ConsoleCommand("undo", "#undo", "take the last entry out of the worksheet and the session", arg -> {
                    if (!c.undo()) c.error("nothing to take back");
                }),
                new ConsoleCommand("digits", "#digits N", "significant digits shown for quantities (1 to 15)", arg -> digits(c, arg)),
                new ConsoleCommand("quit", "#quit", "leave (asks when there is unsaved work)", arg -> c.leave(false)));
    }

    private static void help(Console c, String topic) {
        var out = c.out();
        if (topic.isEmpty()) {
            out.println("  Type Java: mm(25).times(2), var coil = ..., methods over several lines.");
            out.println("  Tab completes, Ctrl-C stops a running entry, Ctrl-D on an empty line leaves.");
            out.println("  Commands:");
            int w = c.commands().all().stream().mapToInt(x -> x.usage().length()).max().orElse(10);
            for (ConsoleCommand cmd : c.commands().all()) out.println("    " + pad(cmd.usage(), w) + "  " + cmd.summary());
            List<String> topics = c.help().topics();
            out.println(topics.isEmpty() ? "  No help topics found (lib-docs/ is missing)."
                    : "  Topics (#help TOPIC): " + String.join(", ", topics));
            return;
        }
        Optional<ConsoleCommand> cmd = topic.startsWith("#") ? c.commands().find(topic) : Optional.empty();
        if (cmd.isEmpty()) {
            Optional<List<String>> page = c.help().page(topic);
            if (page.isPresent()) {
                HelpPager.show(c.terminal(), page.get());
                return;
            }
            cmd = c.commands().find(topic);
        }
        if (cmd.isPresent()) {
            out.println("  " + cmd.get().usage() + "  " + cmd.get().summary());
            return;
        }
        c.error("no help topic \"" + topic + "\"; topics: " + String.join(", ", c.help().topics()));
    }

    private static void names(Console c) {
        List<Session.Name> names = c.session().names();
        if (names.isEmpty()) {
            c.out().println("  no names defined yet");
            return;
        }
        int wn = names.stream().mapToInt(n -> n.name().length()).max().orElse(4);
        int wt = names.stream().mapToInt(n -> describe(n).length()).max().orElse(4);
        for (Session.Name n : names) {
            String line = "  " + pad(n.name(), wn) + "  " + pad(describe(n), wt) + (n.value().isEmpty() ? "" : "  " + n.value());
            c.out().println(line.stripTrailing());
        }
    }

    private static String describe(Session.Name n) {
        switch (n.kind()) {
            case "variable": return n.type();
            case "method": return "method, gives " + n.type();
            default: return n.kind();
        }
    }

    private static void digits(Console c, String arg) {
        if (arg.isEmpty()) {
            c.out().println("  digits = " + Quantity.displayDigits());
            return;
        }
        int n;
        try {
            n = Integer.parseInt(arg);
        } catch (NumberFormatException e) {
            c.error("#digits needs a whole number from 1 to 15, got \"" + arg + "\"");
            return;
        }
        Quantity.setDisplayDigits(n);
        c.out().println("  digits = " + Quantity.displayDigits());
    }

    private static String pad(String s, int w) {
        return s.length() >= w ? s : s + " ".repeat(w - s.length());
    }
}
