package org.ampturn.coil;

import org.ampturn.units.Require;
import java.util.ArrayList;
import java.util.List;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;

/**
 * Inductance by several methods side by side, each with its relative error against a reference
 * method. Immutable; {@link #toString()} is a small text table for the console.
 */
public final class Comparison {
    /** One method's result: name, inductance (H), relative error against the reference, range note. */
    public record Row(String method, double henry, double relativeError, String validity) {
        public Quantity inductance() {
            return Quantity.of(henry, Dimension.INDUCTANCE);
        }
    }

    private final String title;
    private final String referenceName;
    private final double reference;
    private final List<Row> rows;

    private Comparison(String title, String referenceName, double reference, List<Row> rows) {
        this.title = title;
        this.referenceName = referenceName;
        this.reference = reference;
        this.rows = List.copyOf(rows);
    }

    static Builder builder(String title, String referenceName, double reference) {
        return new Builder(title, referenceName, reference);
    }

    public String title() { return title; }
    public String referenceMethod() { return referenceName; }
    public Quantity reference() { return Quantity.of(reference, Dimension.INDUCTANCE); }
    public List<Row> rows() { return rows; }

    /** The row of the method whose name starts with {@code prefix} (case-insensitive). */
    public Row row(String prefix) {
        Require.present("method name", prefix);
        for (Row r : rows) if (r.method().toLowerCase().startsWith(prefix.toLowerCase())) return r;
        throw Require.fail("no method named " + Require.quote(prefix) + " in this comparison; methods: "
                + rows.stream().map(Row::method).toList());
    }

    @Override
    public String toString() {
        StringBuilder sb = new StringBuilder(title).append('\n');
        int w = referenceName.length();
        for (Row r : rows) w = Math.max(w, r.method().length());
        String fmt = "  %-" + w + "s  %12s  %9s  %s%n";
        sb.append(String.format(fmt, referenceName, reference(), "reference", ""));
        for (Row r : rows) {
            String err = Double.isNaN(r.relativeError()) ? "n/a" : String.format(java.util.Locale.ROOT, "%+.3f %%", 100 * r.relativeError());
            sb.append(String.format(fmt, r.method(), Double.isNaN(r.henry()) ? "n/a" : r.inductance().toString(), err, r.validity()));
        }
        return sb.toString().lines().map(String::stripTrailing).collect(java.util.stream.Collectors.joining("\n"));
    }

    static final class Builder {
        private final String title;
        private final String referenceName;
        private final double reference;
        private final List<Row> rows = new ArrayList<>();

        private Builder(String title, String referenceName, double reference) {
            this.title = title;
            this.referenceName = referenceName;
            this.reference = reference;
        }

        Builder row(String method, double henry, String validity) {
            rows.add(new Row(method, henry, henry / reference - 1, validity));
            return this;
        }

        Comparison build() {
            return new Comparison(title, referenceName, reference, rows);
        }
    }
}
