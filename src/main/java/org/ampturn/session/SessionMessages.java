package org.ampturn.session;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import jdk.jshell.Diag;
import jdk.jshell.EvalException;
import jdk.jshell.JShellException;
import org.ampturn.session.Outcome.Kind;
import org.ampturn.session.Outcome.Result;

/** Turns JShell's diagnostics and exceptions into the one-line messages a worksheet shows. */
final class SessionMessages {
    private SessionMessages() {}

    /** JDK exceptions whose message says enough on its own (the library throws these). */
    private static final List<String> PLAIN = List.of("java.lang.IllegalArgumentException",
            "java.lang.IllegalStateException", "java.lang.UnsupportedOperationException");

    /** The message of an exception thrown by an entry: the library's message, or the JDK's type and message. */
    static String exception(JShellException ex) {
        var blocked = Session.blockedExit(ex);
        if (blocked.isPresent()) return blocked.get();
        String msg = ex.getMessage();
        if (!(ex instanceof EvalException)) return msg != null ? msg : "the entry could not run";
        String cls = ((EvalException) ex).getExceptionClassName();
        if (cls == null) cls = "";
        boolean plain = cls.startsWith("org.ampturn.") || PLAIN.contains(cls);
        if (msg != null) msg = scrub(msg);
        if (plain && msg != null && !msg.isBlank()) return msg;
        String simple = cls.substring(cls.lastIndexOf('.') + 1);
        return msg == null || msg.isBlank() ? simple : simple + ": " + msg;
    }

    /**
     * A compile error: the first error's message, compacted to one line, and a caret under its
     * column in the entry's text. Further errors of the same part are added as extra results.
     */
    static Result compileError(List<Diag> diags, String entry, int pieceStart, String piece) {
        if (diags.isEmpty()) return Result.of(Kind.ERROR, "the entry is not valid Java");
        Diag d = diags.get(0);
        List<String> detail = caret(entry, pieceStart, d, piece);
        StringBuilder text = new StringBuilder(message(d));
        for (int i = 1; i < diags.size() && i < 3; i++) {
            String more = message(diags.get(i));
            if (!more.contentEquals(text)) text.append("\nand: ").append(more);
        }
        return new Result(Kind.ERROR, text.toString(), detail);
    }

    /** javac's message on one line: "cannot find symbol: variable x", without locations or wrapper names. */
    static String message(Diag d) {
        String raw = d.getMessage(Locale.ROOT);
        if (raw == null) return "error";
        String[] lines = raw.split("\\R");
        StringBuilder sb = new StringBuilder(lines[0].strip());
        if (sb.length() > 0 && sb.charAt(sb.length() - 1) == ';') sb.setLength(sb.length() - 1);
        boolean first = true;
        for (int i = 1; i < lines.length; i++) {
            String l = lines[i].strip();
            if (l.isEmpty() || l.startsWith("location:")) continue;
            if (l.startsWith("symbol:")) {
                sb.append(": ").append(l.substring("symbol:".length()).strip());
            } else {
                sb.append(first ? "; " : ", ").append(l.replaceAll("\\s+", " "));
                first = false;
            }
        }
        String text = scrub(sb.toString()).replaceAll("\\s+", " ");
        // "required/found" already says it; and class names read better without their packages
        text = text.replace(", reason: actual and formal argument lists differ in length", "");
        return text.replaceAll("\\b(?:org\\.ampturn(?:\\.[a-z]\\w*)*|java\\.lang|java\\.util)\\.(?=[A-Z])", "");
    }

    /** Removes the names of JShell's wrapper classes ({@code REPL.$JShell$16.s} becomes {@code s}). */
    static String scrub(String text) {
        return text.replaceAll("(REPL\\.)?\\$JShell\\$\\d+[A-Z]?\\$?\\.?", "");
    }

    private static List<String> caret(String entry, int pieceStart, Diag d, String piece) {
        long pos = d.getPosition();
        if (pos < 0) pos = d.getStartPosition();
        if (pos < 0) return List.of();
        int at = (int) Math.min(pieceStart + pos, entry.length());
        if (at < 0) return List.of();
        int lineStart = entry.lastIndexOf('\n', at - 1) + 1;
        int lineEnd = entry.indexOf('\n', at);
        if (lineEnd < 0) lineEnd = entry.length();
        if (at > lineEnd) at = lineEnd;
        String line = entry.substring(lineStart, lineEnd);
        StringBuilder mark = new StringBuilder();
        for (int i = lineStart; i < at; i++) mark.append(entry.charAt(i) == '\t' ? '\t' : ' ');
        mark.append('^');
        List<String> out = new ArrayList<>();
        out.add(line.stripTrailing());
        out.add(mark.toString());
        return out;
    }
}
