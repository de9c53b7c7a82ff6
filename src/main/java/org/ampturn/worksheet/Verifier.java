package org.ampturn.worksheet;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * Compares replayed entries with their recorded {@code //=} lines (see {@link ResultMatch}). An
 * entry that fails is always reported; a recorded line with no fresh counterpart, or a fresh line
 * that was never recorded, is a mismatch. Entries of worksheets pulled in with {@code #use} are
 * checked for errors only; their records are checked when those files are verified.
 */
public final class Verifier {
    private Verifier() {}

    public static List<Mismatch> compare(Path file, List<Replay.Step> steps) {
        List<Mismatch> out = new ArrayList<>();
        for (Replay.Step s : steps) {
            boolean own = s.isIn(file);
            Path where = s.file() == null ? file : s.file();
            List<String> rec = s.entry().results(), now = s.result().records();
            if (s.result().failed()) {
                String err = "! " + s.result().error();
                out.add(new Mismatch(where, s.line(), s.entry().source(), rec.isEmpty() ? null : String.join(" / ", rec), err, "the entry failed"));
                continue;
            }
            if (!own) continue;
            for (int k = 0; k < Math.max(rec.size(), now.size()); k++) {
                String r = k < rec.size() ? rec.get(k) : null, n = k < now.size() ? now.get(k) : null;
                String why = r == null ? "a new result line that is not recorded"
                        : n == null ? "a recorded result line is missing"
                        : ResultMatch.why(r, n);
                if (why != null) out.add(new Mismatch(where, s.line(), s.entry().source(), r, n, why));
            }
        }
        return out;
    }
}
