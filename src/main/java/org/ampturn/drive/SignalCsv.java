package org.ampturn.drive;

import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import org.ampturn.units.Csv;
import org.ampturn.units.Dimension;

/**
 * Signals on one time axis as CSV ({@link Csv}): a {@code time (s)} column, then one column per
 * signal with its SI unit in the header, one row per sample. A switching instant appears as two rows
 * with the same time (the values before and after the jump), as the solver recorded it.
 */
final class SignalCsv {
    private SignalCsv() {}

    static String text(List<Signal> signals) {
        if (signals.isEmpty()) throw new IllegalArgumentException("name at least one signal to write");
        double[] t = signals.get(0).timesShared();
        double[][] v = new double[signals.size()][];
        StringBuilder sb = new StringBuilder(32 * t.length * (signals.size() + 1));
        sb.append(Csv.header("time", Dimension.TIME));
        for (int j = 0; j < signals.size(); j++) {
            Signal s = signals.get(j);
            if (s.timesShared() != t && !Arrays.equals(s.timesShared(), t)) {
                throw new IllegalArgumentException("signal " + s.name() + " is not sampled at the same times as " + signals.get(0).name()
                        + "; write signals of one run together, or each on its own");
            }
            v[j] = s.valuesShared();
            sb.append(',').append(Csv.header(s.name(), s.dimension()));
        }
        sb.append('\n');
        for (int k = 0; k < t.length; k++) {
            sb.append(Csv.number(t[k]));
            for (double[] col : v) sb.append(',').append(Csv.number(col[k]));
            sb.append('\n');
        }
        return sb.toString();
    }

    static Path save(String path, List<Signal> signals) {
        if (path == null || path.isBlank()) throw new IllegalArgumentException("the CSV file name is missing (\"" + path + "\")");
        return save(Path.of(path), signals);
    }

    static Path save(Path path, List<Signal> signals) {
        if (path == null) throw new IllegalArgumentException("the CSV file is missing (null)");
        return Csv.save(path, text(signals));
    }
}
