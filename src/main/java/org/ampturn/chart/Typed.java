package org.ampturn.chart;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.ampturn.drive.Marker;
import org.ampturn.drive.Signal;
import org.ampturn.drive.Transient;
import org.ampturn.study.Limit;
import org.ampturn.study.MonteCarlo;
import org.ampturn.study.Table;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;

/** Reads the drive's transients and the study's tables and tolerance runs into {@link FigureData}. */
final class Typed {
    private Typed() {}

    /** The markers drawn on a transient figure; the others stay in {@code run.markers()}. */
    static final Set<String> KEY_MARKERS = Set.of("τ", "peak switch voltage", "pull-in", "drop-out");
    /** Key instants that also get a faint line through every panel. */
    static final Set<String> TIME_LINES = Set.of("τ", "pull-in");

    // ---- transients --------------------------------------------------------------------------

    /**
     * Stacked panels sharing the time axis: current; coil, resistor and switch voltages (and a
     * snubber capacitor's); stored, dissipated and supplied energy (and clamp and mechanical energy
     * when there is any); the armature position when it moves.
     */
    static FigureData.Lines of(Transient run) {
        Map<String, Signal> by = new LinkedHashMap<>();
        for (Signal s : run.signals()) by.put(s.name(), s);
        List<Panel> panels = new ArrayList<>();
        panel(panels, "current", Dimension.CURRENT, by, "current");
        panel(panels, "voltage", Dimension.VOLTAGE, by, "coil voltage", "resistor voltage", "switch voltage", "snubber capacitor voltage");
        List<String> energies = new ArrayList<>(List.of("stored energy", "dissipated energy", "supplied energy"));
        for (String extra : List.of("clamp energy", "mechanical energy")) {
            Signal s = by.get(extra);
            if (s != null && Trace.maxAbs(s.values()) > 0) energies.add(extra);
        }
        List<Panel> energy = new ArrayList<>();
        panel(energy, "energy", Dimension.ENERGY, by, energies.toArray(new String[0]));
        for (Panel p : energy) panels.addAll(byMagnitude(p, ENERGY_SPREAD));
        panel(panels, "position", Dimension.LENGTH, by, "position");
        if (panels.isEmpty()) throw new IllegalArgumentException("the transient has no current, voltage or energy signals to plot");
        List<Mark> marks = new ArrayList<>();
        for (Marker m : run.markers()) {
            if (!KEY_MARKERS.contains(m.label()) || m.time() == null || !Double.isFinite(m.time().si())) continue;
            if (TIME_LINES.contains(m.label())) marks.add(new Mark("", m.time().si(), Double.NaN, null));
            Mark mark = m.value() != null && Double.isFinite(m.value().si())
                    ? new Mark(m.label(), m.time().si(), m.value().si(), m.signal())
                    : new Mark(m.label(), m.time().si(), Double.NaN, m.signal());
            String text = markText(run, m.label());
            marks.add(text == null ? mark : mark.withText(text));
        }
        return new FigureData.Lines(title(run), "time", Dimension.TIME, panels, marks);
    }

    /** The figure's title: the run's length and its circuit, without the metrics (the panels show those). */
    static String title(Transient run) {
        return "transient " + run.duration() + " of " + run.circuit();
    }

    /**
     * The label of a key marker, stated as the metric it shows so that chart and metric agree: a
     * duration counted from the event that starts it (pull-in from switch-on, drop-out from the final
     * switch-off, τ from switch-on), while the marker itself stands at its time on the axis. Null
     * for a marker labelled with its value and time (the peak switch voltage, an instant).
     */
    static String markText(Transient run, String label) {
        switch (label) {
            case "τ": return "τ = " + run.timeConstant();
            case "pull-in": return "pull-in " + run.pullInTime() + " after switch-on";
            case "drop-out": return "drop-out " + run.dropOutTime() + " after switch-off";
            default: return null;
        }
    }

    /** Curves whose peaks lie more than this factor below a panel's largest peak get their own panel. */
    static final double ENERGY_SPREAD = 20;

    /**
     * Splits a panel so that no curve is drawn flat against one twenty times larger: curves are taken
     * largest peak first, and a curve joins the current panel when its peak is at least
     * 1/{@code spread} of that panel's largest, else opens a new panel below (its own axis and unit).
     * Curves keep their order within a panel; an all-zero curve stays with the largest.
     */
    static List<Panel> byMagnitude(Panel p, double spread) {
        List<Trace> traces = new ArrayList<>(p.traces());
        List<Trace> bySize = new ArrayList<>(traces);
        bySize.sort((a, b) -> Double.compare(b.maxAbsY(), a.maxAbsY()));
        Map<Trace, Integer> group = new java.util.IdentityHashMap<>();
        List<Double> tops = new ArrayList<>();
        for (Trace t : bySize) {
            double peak = t.maxAbsY();
            if (!tops.isEmpty() && (peak == 0 || peak * spread >= tops.get(tops.size() - 1))) {
                group.put(t, peak == 0 ? 0 : tops.size() - 1);
            } else {
                tops.add(peak);
                group.put(t, tops.size() - 1);
            }
        }
        List<Panel> out = new ArrayList<>();
        for (int g = 0; g < tops.size(); g++) {
            List<Trace> members = new ArrayList<>();
            for (Trace t : traces) if (group.get(t) == g) members.add(t);
            out.add(new Panel(p.quantity(), p.dimension(), members));
        }
        return out;
    }

    private static void panel(List<Panel> panels, String word, Dimension d, Map<String, Signal> by, String... names) {
        List<Trace> traces = new ArrayList<>();
        for (String n : names) {
            Signal s = by.get(n);
            if (s != null && s.dimension().equals(d) && s.size() > 0) traces.add(Trace.wrap(n, s.times(), s.values()));
        }
        if (!traces.isEmpty()) panels.add(new Panel(word, d, traces));
    }

    /** One signal on its own panel. */
    static FigureData.Lines of(Signal s) {
        Panel p = new Panel(s.name(), s.dimension(), List.of(Trace.wrap(s.name(), s.times(), s.values())));
        return new FigureData.Lines(s.name(), "time", Dimension.TIME, List.of(p), List.of());
    }

    // ---- tables ------------------------------------------------------------------------------

    /**
     * A whole table: a heat map of the first numeric output over a two-parameter sweep, else every
     * numeric output against the first parameter.
     */
    static FigureData of(Table t) {
        List<String> params = t.parameterNames();
        List<String> outs = numeric(t, t.outputNames());
        if (params.isEmpty() || outs.isEmpty()) {
            throw new IllegalArgumentException("the table has " + params.size() + " parameters and " + outs.size()
                    + " numeric outputs; plot needs a parameter and an output: " + t.columnNames());
        }
        if (params.size() == 2 && t.isNumeric(params.get(0)) && t.isNumeric(params.get(1))) {
            return heatMap(t, params.get(0), params.get(1), outs.get(0));
        }
        return lines(t, params.get(0), outs);
    }

    private static List<String> numeric(Table t, List<String> cols) {
        List<String> r = new ArrayList<>();
        for (String c : cols) if (t.isNumeric(c)) r.add(c);
        return r;
    }

    /**
     * Columns {@code ys} (all numeric outputs when empty) against column {@code x}. In a sweep of
     * two parameters, each value of the other parameter gets its own curve. A column of labels
     * (wire sizes) as x is drawn at equal steps with the labels as ticks.
     */
    static FigureData.Lines lines(Table t, String x, List<String> ys) {
        if (!t.columnNames().contains(x)) {
            throw new IllegalArgumentException("no column \"" + x + "\" in the table; its columns are " + String.join(", ", t.columnNames()));
        }
        List<String> y = new ArrayList<>(ys);
        if (y.isEmpty()) for (String c : numeric(t, t.outputNames())) if (!c.equals(x)) y.add(c);
        if (y.isEmpty()) throw new IllegalArgumentException("the table has no numeric column besides \"" + x + "\" to plot");
        for (String c : y) {
            if (!t.columnNames().contains(c)) {
                throw new IllegalArgumentException("no column \"" + c + "\" in the table; its columns are " + String.join(", ", t.columnNames()));
            }
            if (!t.isNumeric(c)) throw new IllegalArgumentException("column \"" + c + "\" holds labels, not numbers; it cannot be a curve");
        }
        boolean labelled = !t.isNumeric(x);
        double[] xs;
        List<String> xLabels = List.of();
        Dimension xd;
        if (labelled) {
            xLabels = t.labels(x);
            xs = new double[xLabels.size()];
            Arrays.setAll(xs, i -> i);
            xd = Dimension.NONE;
        } else {
            xs = t.values(x);
            xd = t.dimension(x);
        }
        String other = null;
        List<String> params = t.parameterNames();
        if (!labelled && params.size() == 2 && params.contains(x)) {
            other = params.get(0).equals(x) ? params.get(1) : params.get(0);
        }
        Map<Dimension, List<Trace>> groups = new LinkedHashMap<>();
        Map<Dimension, String> words = new LinkedHashMap<>();
        for (String c : y) {
            Dimension d = t.dimension(c);
            double[] v = t.values(c);
            List<Trace> list = groups.computeIfAbsent(d, k -> new ArrayList<>());
            words.merge(d, c, (a, b) -> d.isNone() ? a + ", " + b : d.name());
            if (other == null) {
                list.add(sorted(c, xs, v));
            } else {
                for (Map.Entry<String, int[]> g : splitBy(t, other).entrySet()) {
                    int[] rows = g.getValue();
                    double[] gx = new double[rows.length], gy = new double[rows.length];
                    for (int i = 0; i < rows.length; i++) { gx[i] = xs[rows[i]]; gy[i] = v[rows[i]]; }
                    list.add(sorted(c + ", " + other + " = " + g.getKey(), gx, gy));
                }
            }
        }
        List<Panel> panels = new ArrayList<>();
        for (Map.Entry<Dimension, List<Trace>> e : groups.entrySet()) panels.add(new Panel(words.get(e.getKey()), e.getKey(), e.getValue()));
        return new FigureData.Lines(String.join(", ", y) + " against " + x, x, xd, panels, List.of(), xLabels);
    }

    /** Row indexes by the text of a column's value, in order of first appearance. */
    private static Map<String, int[]> splitBy(Table t, String column) {
        List<String> text = t.labels(column);
        Map<String, List<Integer>> m = new LinkedHashMap<>();
        for (int i = 0; i < text.size(); i++) m.computeIfAbsent(text.get(i), k -> new ArrayList<>()).add(i);
        Map<String, int[]> r = new LinkedHashMap<>();
        for (Map.Entry<String, List<Integer>> e : m.entrySet()) r.put(e.getKey(), e.getValue().stream().mapToInt(Integer::intValue).toArray());
        return r;
    }

    /** A trace in increasing x (a parallel sweep may return rows in any order). */
    private static Trace sorted(String name, double[] x, double[] y) {
        Integer[] idx = new Integer[x.length];
        for (int i = 0; i < idx.length; i++) idx[i] = i;
        Arrays.sort(idx, (a, b) -> Double.compare(x[a], x[b]));
        double[] sx = new double[x.length], sy = new double[x.length];
        for (int i = 0; i < idx.length; i++) { sx[i] = x[idx[i]]; sy[i] = y[idx[i]]; }
        return Trace.wrap(name, sx, sy);
    }

    static FigureData.HeatMap heatMap(Table t, String x, String y, String z) {
        for (String c : List.of(x, y, z)) {
            if (!t.columnNames().contains(c)) {
                throw new IllegalArgumentException("no column \"" + c + "\" in the table; its columns are " + String.join(", ", t.columnNames()));
            }
            if (!t.isNumeric(c)) throw new IllegalArgumentException("column \"" + c + "\" holds labels; a heat map needs numbers");
        }
        return new FigureData.HeatMap(z + " over " + x + " and " + y, x, t.dimension(x), t.values(x), y, t.dimension(y), t.values(y),
                z, t.dimension(z), t.values(z));
    }

    // ---- tolerance runs ----------------------------------------------------------------------

    /** The histogram of one output of a Monte Carlo run, with the tightest lower and upper limits on it. */
    static FigureData.Histogram of(MonteCarlo mc, String output) {
        if (!mc.outputNames().contains(output)) {
            throw new IllegalArgumentException("no output \"" + output + "\" in the tolerance run; its outputs are " + String.join(", ", mc.outputNames()));
        }
        double lower = Double.NaN, upper = Double.NaN;
        for (Limit l : mc.limits()) {
            if (!l.output().equals(output)) continue;
            double b = l.bound().si();
            if (l.isLowerBound()) lower = Double.isNaN(lower) ? b : Math.max(lower, b);
            else upper = Double.isNaN(upper) ? b : Math.min(upper, b);
        }
        double[] v = mc.values(output);
        return new FigureData.Histogram(output + " in " + v.length + " runs", output, mc.dimension(output), v, lower, upper);
    }

    /** The first output of a tolerance run that has a limit, else its first output. */
    static FigureData.Histogram of(MonteCarlo mc) {
        for (Limit l : mc.limits()) if (mc.outputNames().contains(l.output())) return of(mc, l.output());
        if (mc.outputNames().isEmpty()) throw new IllegalArgumentException("the tolerance run has no outputs to draw");
        return of(mc, mc.outputNames().get(0));
    }

    static Quantity q(double si, Dimension d) { return Quantity.of(si, d); }
}
