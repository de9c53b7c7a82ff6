package org.ampturn.chart;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.ampturn.material.MagneticMaterial;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;

/**
 * The plotting entry points behind the facade's {@code plot}, {@code overlay}, {@code heatmap},
 * {@code histogram} and {@code plotBH}. Each makes a {@link Figure}, shows it
 * ({@link Figures#show}) and returns it.
 */
public final class Plots {
    private Plots() {}

    /**
     * A figure of anything plottable: a transient (stacked current, voltage and energy panels), a
     * table (every column against the first), a magnetic material (its B-H curve), a
     * {@link FigureData}, a {@code double[]} (against its index), or a figure (shown again).
     */
    public static Figure plot(Object x) {
        if (x == null) throw new IllegalArgumentException("nothing to plot (null)");
        return plot(defaultName(x), x);
    }

    /** As {@link #plot(Object)}, under a name: plotting again under the same name updates that window. */
    public static Figure plot(String name, Object x) {
        if (x == null) throw new IllegalArgumentException("nothing to plot (null)");
        return Figures.show(Figure.of(name, data(x)));
    }

    /** What {@link #plot(Object)} would draw for {@code x}, without showing it. */
    public static FigureData dataOf(Object x) {
        if (x == null) throw new IllegalArgumentException("nothing to plot (null)");
        return data(x);
    }

    static FigureData data(Object x) {
        if (x instanceof Figure f) return f.data();
        if (x instanceof FigureData d) return d;
        if (x instanceof MagneticMaterial m) return Adapt.bhData(m, null);
        if (x instanceof org.ampturn.drive.Transient t) return Typed.of(t);
        if (x instanceof org.ampturn.drive.Signal s) return Typed.of(s);
        if (x instanceof org.ampturn.study.Table t) return Typed.of(t);
        if (x instanceof org.ampturn.study.MonteCarlo mc) return Typed.of(mc);
        if (x instanceof org.ampturn.thermal.HeatingCurve c) return ThermalFigures.of(c);
        if (x instanceof org.ampturn.thermal.DutyCycle d) return ThermalFigures.of(d);
        if (x instanceof org.ampturn.thermal.ElectroThermalRun r) return ThermalFigures.of(r);
        if (x instanceof double[] v) {
            double[] i = new double[v.length];
            Arrays.setAll(i, k -> k);
            return new FigureData.Lines("", "index", Dimension.NONE,
                    List.of(Panel.of("value", Dimension.NONE, Trace.of("values", i, v))), List.of());
        }
        if (Adapt.isTransient(x)) return Adapt.transientData(x);
        if (Adapt.isTable(x)) {
            List<String> cols = Adapt.columns(x);
            if (cols.isEmpty()) throw new IllegalArgumentException("the table has no columns to plot");
            return Adapt.tableData(x, cols.get(0), List.of());
        }
        throw new IllegalArgumentException("cannot plot " + Adapt.describe(x)
                + "; plot takes a transient, a table, a magnetic material, a heating curve, duty cycle or electro-thermal run, a double[] or figure data");
    }

    static String defaultName(Object x) {
        if (x instanceof Figure f) return f.name();
        if (x instanceof FigureData d) return d.kind();
        if (x instanceof MagneticMaterial) return "B-H";
        if (x instanceof org.ampturn.drive.Transient) return "transient";
        if (x instanceof org.ampturn.drive.Signal s) return s.name();
        if (x instanceof org.ampturn.study.Table t) return t.parameterNames().size() == 2 ? "map" : "sweep";
        if (x instanceof org.ampturn.study.MonteCarlo) return "histogram";
        if (x instanceof org.ampturn.thermal.HeatingCurve || x instanceof org.ampturn.thermal.DutyCycle
                || x instanceof org.ampturn.thermal.ElectroThermalRun) return "heating";
        if (x instanceof double[]) return "values";
        if (Adapt.isTransient(x)) return "transient";
        if (Adapt.isTable(x)) return "sweep";
        return "figure";
    }

    /** Columns {@code y} (all others when none are named) of a table against column {@code x}: a sweep. */
    public static Figure plot(Object table, String x, String... y) {
        if (table == null) throw new IllegalArgumentException("no table to plot (null)");
        if (table instanceof org.ampturn.study.Table t) return Figures.show(Figure.of("sweep", Typed.lines(t, x, List.of(y))));
        return Figures.show(Figure.of("sweep", Adapt.tableData(table, x, List.of(y))));
    }

    /** A heat map of column {@code z} over columns {@code x} and {@code y} of a two-parameter sweep. */
    public static Figure heatmap(Object table, String x, String y, String z) {
        if (table == null) throw new IllegalArgumentException("no table to map (null)");
        if (table instanceof org.ampturn.study.Table t) return Figures.show(Figure.of("map", Typed.heatMap(t, x, y, z)));
        return Figures.show(Figure.of("map", Adapt.heatMapData(table, x, y, z)));
    }

    /** The current of several transients on one panel. */
    public static Figure overlay(Object... runs) {
        return overlay("current", runs);
    }

    /** One signal (by name, e.g. "switch voltage", or by quantity, e.g. "current") of several transients on one panel. */
    public static Figure overlay(String signal, Object... runs) {
        if (runs == null || runs.length == 0) throw new IllegalArgumentException("overlay needs at least one transient");
        return Figures.show(Figure.of("overlay", Adapt.overlay(signal, Arrays.asList(runs))));
    }

    /** A histogram of one output of a tolerance run (or a table column), with its limits when the result has them. */
    public static Figure histogram(Object result, String output) {
        if (result == null) throw new IllegalArgumentException("no result to draw (null)");
        if (result instanceof org.ampturn.study.MonteCarlo mc) return Figures.show(Figure.of("histogram", Typed.of(mc, output)));
        return Figures.show(Figure.of("histogram", Adapt.histogramData(result, output)));
    }

    /** A histogram of SI values of one dimension, with limits (either may be null). */
    public static Figure histogram(String quantity, Dimension d, double[] si, Quantity lower, Quantity upper) {
        double lo = lower == null ? Double.NaN : Require.si("lower limit", lower, d);
        double hi = upper == null ? Double.NaN : Require.si("upper limit", upper, d);
        return Figures.show(Figure.of("histogram", new FigureData.Histogram(quantity + " in " + si.length + " runs", quantity, d, si, lo, hi)));
    }

    /** The B-H curve of a material with an operating point (a flux density or a field strength; null for none). */
    public static Figure bh(MagneticMaterial m, Quantity operatingPoint) {
        if (m == null) throw new IllegalArgumentException("no material to draw (null)");
        return Figures.show(Figure.of("B-H", Adapt.bhData(m, operatingPoint)));
    }

    /** Force-stroke curves with the spring and load line (see {@code Plunger.forceStroke}). */
    public static Figure forceStroke(org.ampturn.actuator.ForceStroke fs) {
        if (fs == null) throw new IllegalArgumentException("no force-stroke curves to draw (null)");
        return Figures.show(Figure.of("force-stroke", ActuatorFigures.of(fs)));
    }

    /** Several curves given directly: name, x and y arrays in SI, all of one x and one y dimension. */
    public static FigureData lines(String xQuantity, Dimension xd, String yQuantity, Dimension yd, List<Trace> traces) {
        return new FigureData.Lines("", xQuantity, xd, List.of(new Panel(yQuantity, yd, new ArrayList<>(traces))), List.of());
    }
}
