package org.ampturn.study;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.List;
import org.ampturn.units.Require;
import java.util.Locale;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Unit;
import org.ampturn.units.Units;

/** One column of a {@link Table}: SI numbers of one dimension, or text labels. */
final class Column {
    final String name;
    final Dimension dimension; // null for a column of labels
    final boolean absolute;    // absolute temperatures, shown in °C
    final double[] values;     // SI; NaN where missing
    final String[] labels;     // for label columns

    private Column(String name, Dimension dimension, boolean absolute, double[] values, String[] labels) {
        this.name = name;
        this.dimension = dimension;
        this.absolute = absolute;
        this.values = values;
        this.labels = labels;
    }

    static Column numbers(String name, Dimension d, boolean absolute, double[] values) {
        Require.present("the kind (dimension) of column " + name, d);
        return new Column(name, d, absolute && Dimension.TEMPERATURE.equals(d), values, null);
    }

    static Column labels(String name, String[] labels) {
        return new Column(name, null, false, null, labels);
    }

    boolean numeric() {
        return dimension != null;
    }

    Column permuted(int[] order) {
        if (numeric()) {
            double[] v = new double[order.length];
            for (int i = 0; i < order.length; i++) v[i] = values[order[i]];
            return new Column(name, dimension, absolute, v, null);
        }
        String[] l = new String[order.length];
        for (int i = 0; i < order.length; i++) l[i] = labels[order[i]];
        return new Column(name, null, false, null, l);
    }

    Quantity quantity(int row) {
        double v = values[row];
        return absolute ? Quantity.temperatureKelvin(v) : Quantity.of(v, dimension);
    }

    String text(int row) {
        if (!numeric()) return labels[row] == null ? "" : labels[row];
        double v = values[row];
        if (Double.isNaN(v)) return "";
        if (dimension.isNone() && v == Math.rint(v) && Math.abs(v) < 1e15) return Long.toString((long) v);
        return quantity(row).toString();
    }

    // ---- display: one unit per column ----------------------------------------------------------

    /** How a numeric column is shown: the unit symbol and factor to SI (or the °C offset). */
    static final class Shown {
        final String symbol;
        final double factor;
        final double offset;
        final boolean integers;

        Shown(String symbol, double factor, double offset, boolean integers) {
            this.symbol = symbol;
            this.factor = factor;
            this.offset = offset;
            this.integers = integers;
        }

        String format(double si, int digits) {
            if (Double.isNaN(si)) return "";
            double v = (si - offset) / factor;
            if (integers) return Long.toString(Math.round(v));
            return number(v, digits);
        }
    }

    Shown shown() {
        if (absolute) return new Shown("°C", 1, Units.ZERO_CELSIUS, false);
        double max = 0;
        boolean integers = dimension.isNone();
        int finite = 0;
        for (double v : values) {
            if (!Double.isFinite(v)) continue;
            finite++;
            max = Math.max(max, Math.abs(v));
            if (integers && (v != Math.rint(v) || Math.abs(v) > 1e15)) integers = false;
        }
        if (finite == 0) integers = false;
        Unit chosen = Units.unitFor(dimension, max);
        if (chosen == null) return new Shown(dimension.isNone() ? "" : dimension.baseSymbols(), 1, 0, integers);
        return new Shown(chosen.symbol(), chosen.factor(), 0, false);
    }

    /** A number with {@code digits} significant digits: plain decimals from 0.001 to 1e6, else an exponent. */
    static String number(double v, int digits) {
        if (Double.isNaN(v)) return "NaN";
        if (Double.isInfinite(v)) return v > 0 ? "∞" : "-∞";
        if (v == 0) return "0";
        BigDecimal b = new BigDecimal(v).round(new MathContext(digits, RoundingMode.HALF_EVEN));
        double a = Math.abs(b.doubleValue());
        if (a >= 1e-3 && a < 1e6) {
            int intDigits = b.precision() - b.scale();
            return b.setScale(Math.max(0, digits - intDigits), RoundingMode.HALF_EVEN).toPlainString();
        }
        return String.format(Locale.ROOT, "%." + (digits - 1) + "e", v).replaceFirst("e([+-])0*(\\d)", "e$1$2").replace("e+", "e");
    }
}
