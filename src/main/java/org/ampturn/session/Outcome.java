package org.ampturn.session;

import java.util.ArrayList;
import java.util.List;

/**
 * What one entry gave when it ran: its source, its kind and the results to show under it.
 *
 * <p>{@link #lines()} is the display the console and {@code ampturn run} print, for example
 * {@code "  = 9.000 mJ"}, {@code "  coil = single-layer solenoid, ..."},
 * {@code "  defined method f(double)"} or {@code "  ! cannot find symbol: variable x"} followed by the
 * offending source line and a caret under its column. {@link #recorded()} is the same without the
 * indent and the {@code "= "} of a value, as a worksheet keeps it after {@code //=}.
 *
 * @param source      the entry as typed (may span several lines)
 * @param kind        the entry's kind; {@link Kind#ERROR} when any part of it failed
 * @param results     one result per part that shows something, in order
 * @param interrupted true when the entry was stopped by {@link Session#stop()}: it failed with
 *                    {@value Session#INTERRUPTED}, or (a study that keeps what it did) it ended early
 *                    with a partial value, which it shows
 * @param kept        true when the entry left something in the session (a value, a definition,
 *                    a statement that ran), so it counts as an entry of the worksheet and
 *                    {@link Session#undoLast()} takes it back; false when the compiler rejected all
 *                    of it or it was empty
 */
public record Outcome(String source, Kind kind, List<Result> results, boolean interrupted, boolean kept) {

    /** What an entry (or one result of it) is. */
    public enum Kind {
        /** an expression with a value: {@code = 9.000 mJ} */
        VALUE,
        /** a variable declaration: {@code coil = ...} */
        DECLARATION,
        /** a method, class, interface, record, enum or import */
        DEFINITION,
        /** a compile error, an exception, an interrupt or a blocked call */
        ERROR,
        /** a statement or a void call: nothing to show */
        NOTHING,
        /** a line the entry printed on standard output: {@code | text} */
        PRINTED
    }

    /**
     * One result line.
     *
     * @param kind   VALUE, DECLARATION, DEFINITION or ERROR
     * @param text   the text without indent: {@code "9.000 mJ"}, {@code "coil = ..."},
     *               {@code "defined method f(double)"}, or the error message
     * @param detail for a compile error, the offending source line and a caret line under it; else empty
     * @param value  for a value or a declaration, the object itself (a {@code Quantity}, a
     *               {@code Transient}, ...), read from the session when the entry ran; null when
     *               there is none or it could not be read. It lives only in this process: a worksheet
     *               records the text
     */
    public record Result(Kind kind, String text, List<String> detail, Object value) {
        public Result {
            detail = List.copyOf(detail);
        }

        /** A result without the object behind it. */
        public Result(Kind kind, String text, List<String> detail) {
            this(kind, text, detail, null);
        }

        public static Result of(Kind kind, String text) {
            return new Result(kind, text, List.of());
        }
    }

    public Outcome {
        results = List.copyOf(results);
    }

    /** True when the entry did not run cleanly: compile error, exception, interrupt or blocked call. */
    public boolean failed() {
        return kind == Kind.ERROR;
    }

    /** The display lines, each starting with two spaces; empty for a statement that shows nothing. */
    public List<String> lines() {
        List<String> out = new ArrayList<>();
        for (Result r : results) {
            String head;
            switch (r.kind()) {
                case VALUE: head = "  = "; break;
                case ERROR: head = "  ! "; break;
                case PRINTED: head = "  | "; break;
                default: head = "  ";
            }
            String[] parts = r.text().split("\n", -1);
            out.add(head + parts[0]);
            for (int i = 1; i < parts.length; i++) out.add("    " + parts[i]);
            for (String d : r.detail()) out.add("    " + d);
        }
        return out;
    }

    /**
     * The results as a worksheet records them after {@code //=}, one line each: a value's text alone
     * ({@code "9.000 mJ"}), a declaration as {@code "coil = ..."}, a definition as shown, an error
     * as {@code "! message"}, printed text as {@code "| text"}; the further lines of a result (a
     * table, a compile error's source line and caret) indented by two spaces.
     */
    public List<String> recorded() {
        List<String> out = new ArrayList<>();
        for (Result r : results) {
            String head = r.kind() == Kind.ERROR ? "! " : r.kind() == Kind.PRINTED ? "| " : "";
            String[] parts = r.text().split("\n", -1);
            out.add(head + parts[0]);
            for (int i = 1; i < parts.length; i++) out.add("  " + parts[i]);
            for (String d : r.detail()) out.add("  " + d);
        }
        return out;
    }

    /** The objects the entry's values and declarations hold, in order (none for an entry that failed). */
    public List<Object> values() {
        List<Object> out = new ArrayList<>();
        for (Result r : results) if (r.value() != null) out.add(r.value());
        return out;
    }

    /** The display lines joined with newlines (handy in tests and logs). */
    @Override
    public String toString() {
        return String.join("\n", lines());
    }
}
