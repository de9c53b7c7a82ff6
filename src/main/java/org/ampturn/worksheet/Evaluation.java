package org.ampturn.worksheet;

import java.util.List;
import org.ampturn.session.Outcome;

/**
 * What one entry gave when it ran: the session's typed {@link Outcome} and the chart files the entry
 * wrote (paths as the chart layer wrote them). Whether it failed, and how it is recorded and shown,
 * come from the outcome's typed results, never from its display text.
 */
public record Evaluation(Outcome outcome, List<String> figures) {
    public Evaluation {
        java.util.Objects.requireNonNull(outcome, "outcome");
        figures = List.copyOf(figures);
    }

    /** An entry that failed with one message and ran nothing (a refused {@code #use}, an entry over its time limit). */
    public static Evaluation error(String source, String message) {
        return new Evaluation(new Outcome(source, Outcome.Kind.ERROR, List.of(Outcome.Result.of(Outcome.Kind.ERROR, message)), false, false),
                List.of());
    }

    /** True when the entry did not run cleanly (compile error, exception, interrupt, blocked call). */
    public boolean failed() {
        return outcome.failed();
    }

    /** True when the entry was stopped before it finished (Ctrl-C or its time limit). */
    public boolean interrupted() {
        return outcome.interrupted();
    }

    /** The display lines ({@code "  = 2.103 mH"}, {@code "  ! message"}). */
    public List<String> lines() {
        return outcome.lines();
    }

    /** The results as a worksheet records them after {@code //= }. */
    public List<String> records() {
        return outcome.recorded();
    }

    /** The first error message, or "" when the entry did not fail. */
    public String error() {
        for (Outcome.Result r : outcome.results()) if (r.kind() == Outcome.Kind.ERROR) return r.text();
        return "";
    }

    /**
     * A recorded line as the console would display it: {@code "! msg"}, {@code "| printed"},
     * {@code "coil = ..."} and definitions as they are, values after {@code "= "}. For records read
     * from a file, where no typed result exists.
     */
    public static String toDisplay(String record) {
        if (record.startsWith("! ") || record.startsWith("| ") || record.equals("|") || record.startsWith(" ") || record.matches("^[\\p{L}_$][\\p{L}\\p{N}_$]* = .*")
                || record.startsWith("defined ") || record.startsWith("redefined ") || record.startsWith("imported ")) return "  " + record;
        return "  = " + record;
    }
}
