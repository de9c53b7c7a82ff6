package org.ampturn.worksheet;

import java.util.ArrayList;
import java.util.List;

/**
 * What one entry printed: display lines as the console shows them ({@code   = 2.103 mH},
 * {@code   coil = ...}, {@code   ! message}), the chart files it wrote, and whether it failed.
 */
public record Evaluation(List<String> lines, List<String> figures, boolean failed) {
    public Evaluation {
        lines = List.copyOf(lines);
        figures = List.copyOf(figures);
    }

    /** A successful evaluation with these display lines and no figures. */
    public static Evaluation of(String... displayLines) {
        List<String> l = List.of(displayLines);
        return new Evaluation(l, List.of(), l.stream().anyMatch(s -> s.startsWith("  !")));
    }

    /** A failed evaluation with one error message. */
    public static Evaluation error(String message) {
        return new Evaluation(List.of("  ! " + message), List.of(), true);
    }

    /** The lines as a worksheet records them after {@code //= }: {@code 2.103 mH}, {@code coil = ...}. */
    public List<String> records() {
        List<String> out = new ArrayList<>();
        for (String l : lines) out.add(toRecord(l));
        return out;
    }

    /** One display line in recorded form: the two-space indent and a leading {@code "= "} removed. */
    public static String toRecord(String displayLine) {
        String s = displayLine.startsWith("  ") ? displayLine.substring(2) : displayLine;
        if (s.startsWith("= ")) return s.substring(2);
        if (s.equals("=")) return "";
        return s;
    }

    /** A recorded line as the console would display it (the inverse of {@link #toRecord} for results). */
    public static String toDisplay(String record) {
        if (record.startsWith("! ") || record.startsWith("| ") || record.equals("|") || record.startsWith(" ") || record.matches("^[\\p{L}_$][\\p{L}\\p{N}_$]* = .*")) return "  " + record;
        return "  = " + record;
    }
}
