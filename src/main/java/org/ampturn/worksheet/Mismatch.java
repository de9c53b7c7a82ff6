package org.ampturn.worksheet;

import java.nio.file.Path;

/**
 * One place where a replayed worksheet did not give what it records: the file and line of the
 * entry, the recorded and the new text (either may be empty when a line is missing), and why.
 */
public record Mismatch(Path file, int line, String entry, String recorded, String fresh, String reason) {

    /** Several lines: where, the entry's first line, recorded and new text. */
    @Override
    public String toString() {
        String first = entry.lines().findFirst().orElse("");
        return (file == null ? "(worksheet)" : file.toString()) + ":" + line + ": " + reason + "\n"
                + "  entry:    " + first + (entry.contains("\n") ? " ..." : "") + "\n"
                + "  recorded: " + (recorded == null ? "(nothing)" : recorded) + "\n"
                + "  new:      " + (fresh == null ? "(nothing)" : fresh);
    }
}
