package org.ampturn.console;

import java.util.List;
import java.util.function.Supplier;
import org.ampturn.session.Session;
import org.jline.reader.Candidate;
import org.jline.reader.Completer;
import org.jline.reader.LineReader;
import org.jline.reader.ParsedLine;

/**
 * Tab completion from JShell's source analysis (library classes and methods, session names),
 * and of command words after {@code #}.
 */
final class ConsoleCompleter implements Completer {
    private final Supplier<Session> session;
    private final Supplier<List<String>> commandWords;

    ConsoleCompleter(Supplier<Session> session, Supplier<List<String>> commandWords) {
        this.session = session;
        this.commandWords = commandWords;
    }

    @Override
    public void complete(LineReader reader, ParsedLine line, List<Candidate> candidates) {
        String buffer = line.line();
        int cursor = line.cursor();
        int wordStart = cursor - line.wordCursor();
        if (buffer.stripLeading().startsWith("#")) {
            if (line.wordIndex() == 0) {
                for (String w : commandWords.get()) candidates.add(new Candidate("#" + w, "#" + w, null, null, null, null, true));
            }
            return;
        }
        Session s = session.get();
        if (s == null) return; // still starting
        Session.Completion c = s.complete(buffer, cursor);
        if (c.anchor() < wordStart) return;
        String head = buffer.substring(wordStart, c.anchor());
        for (String cont : c.candidates()) {
            candidates.add(new Candidate(head + cont, cont, null, null, null, null, false));
        }
    }
}
