package org.ampturn.worksheet;

import java.util.List;

/**
 * One piece of a worksheet, in file order: a prose note, an entry with its recorded results, an
 * entry that failed or was stopped (kept as a record, never run again), a blank line, or a
 * reference to another worksheet whose entries run first.
 */
public sealed interface Block {

    /** A plain comment line; becomes prose in the report. {@code text} is the line after {@code // }. */
    record Note(String text) implements Block {
        public Note {
            if (text == null || text.contains("\n")) throw new IllegalArgumentException("a note is one line of text, got " + text);
        }
    }

    /**
     * A Java snippet (one entry as JShell's completeness analysis splits it, possibly several lines)
     * and what it printed when it was recorded: result lines (the text after {@code //= }) and the
     * chart files it wrote.
     */
    record Entry(String source, List<String> results, List<String> figures) implements Block {
        public Entry {
            if (source == null || source.isBlank()) throw new IllegalArgumentException("an entry needs source text");
            results = List.copyOf(results);
            figures = List.copyOf(figures);
        }

        /** An entry with no recorded result yet. */
        public static Entry of(String source) {
            return new Entry(source, List.of(), List.of());
        }

        /** The same source with these recorded results and figures. */
        public Entry withRecord(List<String> newResults, List<String> newFigures) {
            return new Entry(source, newResults, newFigures);
        }
    }

    /**
     * An entry that failed (did not compile, threw) or was stopped (Ctrl-C, its time limit), with
     * what it gave: kept so the worksheet records what happened, but never run by open, replay or
     * verify. In the file its source lines start with {@code //!} and its results follow as
     * {@code //=} lines.
     */
    record Failed(String source, List<String> results) implements Block {
        public Failed {
            if (source == null || source.isBlank()) throw new IllegalArgumentException("a failed entry needs source text");
            results = List.copyOf(results);
        }
    }

    /** An empty line, kept so a saved worksheet keeps its layout. */
    record Blank() implements Block {}

    /** {@code #use path}: the entries of another worksheet (path relative to this one) run first. */
    record Use(String path) implements Block {
        public Use {
            if (path == null || path.isBlank() || path.contains("\n")) throw new IllegalArgumentException("#use needs a file name, got " + path);
        }
    }
}
