package org.ampturn.chart;

import java.lang.reflect.InvocationTargetException;
import java.lang.reflect.Method;
import java.lang.reflect.Modifier;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.ampturn.material.MagneticMaterial;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;

/**
 * Reads the library's result objects into {@link FigureData} by their public accessors, so this
 * package depends on the shape of a transient or a table (the accessors DESIGN.md fixes), not on
 * their classes:
 * <ul>
 * <li>a transient: {@code signals()}, each with {@code name()}, {@code dimension()},
 *     {@code times()}, {@code values()} (SI arrays); {@code markers()}, each with {@code label()},
 *     {@code time()}, {@code value()} (a quantity or null) and {@code signal()};</li>
 * <li>a table: {@code columnNames()}, {@code dimension(column)}, {@code values(column)} (SI, NaN
 *     for a failed row);</li>
 * <li>a tolerance result: {@code values(output)} and, when it has them, {@code dimension(output)}
 *     and limits through {@code limits(output)} (with {@code lower()}/{@code upper()}) or
 *     {@code lowerLimit(output)}/{@code upperLimit(output)}.</li>
 * </ul>
 */
final class Adapt {
    private Adapt() {}

    static boolean isTransient(Object o) { return find(o.getClass(), "signals") != null; }
    static boolean isTable(Object o) { return find(o.getClass(), "columnNames") != null; }

    // ---- transients --------------------------------------------------------------------------

    /** One signal of a transient, in SI. */
    record Signal(String name, Dimension dimension, double[] times, double[] values) {}

    static List<Signal> signals(Object run) {
        Object list = call(run, "signals");
        if (!(list instanceof List<?> l)) throw new IllegalArgumentException("signals() of " + describe(run) + " is not a list");
        List<Signal> out = new ArrayList<>();
        for (Object s : l) {
            String name = String.valueOf(call(s, "name"));
            Dimension d = (Dimension) call(s, "dimension");
            double[] t = (double[]) call(s, "times");
            double[] v = (double[]) call(s, "values");
            if (t == null || v == null || t.length == 0 || t.length != v.length) continue;
            out.add(new Signal(name, d, t, v));
        }
        if (out.isEmpty()) throw new IllegalArgumentException(describe(run) + " has no signals to plot");
        return out;
    }

    /** Stacked panels: current, then voltages, then energies, then any other quantity, each with all its signals. */
    static FigureData.Lines transientData(Object run) {
        List<Signal> signals = signals(run);
        Map<Dimension, List<Trace>> groups = new LinkedHashMap<>();
        for (Dimension d : List.of(Dimension.CURRENT, Dimension.VOLTAGE, Dimension.ENERGY)) groups.put(d, new ArrayList<>());
        for (Signal s : signals) groups.computeIfAbsent(s.dimension(), k -> new ArrayList<>()).add(Trace.wrap(s.name(), s.times(), s.values()));
        List<Panel> panels = new ArrayList<>();
        for (Map.Entry<Dimension, List<Trace>> e : groups.entrySet()) {
            if (!e.getValue().isEmpty()) panels.add(new Panel(e.getKey().name(), e.getKey(), e.getValue()));
        }
        return new FigureData.Lines(title(run), "time", Dimension.TIME, panels, marks(run));
    }

    static List<Mark> marks(Object run) {
        if (find(run.getClass(), "markers") == null) return List.of();
        Object list = call(run, "markers");
        List<Mark> out = new ArrayList<>();
        if (!(list instanceof List<?> l)) return out;
        for (Object m : l) {
            String label = String.valueOf(call(m, "label"));
            Quantity t = (Quantity) call(m, "time");
            Quantity v = find(m.getClass(), "value") != null ? (Quantity) call(m, "value") : null;
            String signal = find(m.getClass(), "signal") != null ? (String) call(m, "signal") : null;
            if (t == null || !Double.isFinite(t.si())) continue;
            if (v == null || !Double.isFinite(v.si())) out.add(new Mark(label, t.si(), Double.NaN, null));
            else out.add(new Mark(label, t.si(), v.si(), signal));
        }
        return out;
    }

    /** One signal of several runs on one panel; {@code signal} is a signal name or a quantity word ("current"). */
    static FigureData.Lines overlay(String signal, List<?> runs) {
        if (runs.isEmpty()) throw new IllegalArgumentException("overlay needs at least one transient");
        List<Trace> traces = new ArrayList<>();
        Dimension dim = null;
        String found = null;
        for (int i = 0; i < runs.size(); i++) {
            Object run = runs.get(i);
            if (run == null) throw new IllegalArgumentException("transient " + (i + 1) + " of the overlay is missing (null)");
            Signal s = pick(signals(run), signal, run);
            if (dim != null && !dim.equals(s.dimension())) {
                throw new IllegalArgumentException("cannot overlay " + s.name() + " (" + s.dimension().name() + ") on " + found + " (" + dim.name() + ")");
            }
            dim = s.dimension();
            found = s.name();
            traces.add(Trace.wrap(runLabel(run, i), s.times(), s.values()));
        }
        Set<String> labels = new HashSet<>();
        for (Trace t : traces) labels.add(t.name());
        if (labels.size() < traces.size()) {
            // runs that describe themselves alike are told apart by number
            for (int i = 0; i < traces.size(); i++) {
                Trace t = traces.get(i);
                traces.set(i, Trace.wrap("run " + (i + 1), t.xs(), t.ys()));
            }
        }
        return new FigureData.Lines(found + ", " + runs.size() + " runs", "time", Dimension.TIME,
                List.of(new Panel(found, dim, traces)), List.of());
    }

    private static Signal pick(List<Signal> signals, String want, Object run) {
        for (Signal s : signals) if (s.name().equalsIgnoreCase(want)) return s;
        for (Signal s : signals) if (s.dimension().name().equalsIgnoreCase(want)) return s;
        List<String> names = signals.stream().map(Signal::name).toList();
        throw new IllegalArgumentException("no signal \"" + want + "\" in " + describe(run) + "; it has " + String.join(", ", names));
    }

    private static String runLabel(Object run, int i) {
        String s = String.valueOf(run);
        return s.length() <= 48 ? s : "run " + (i + 1);
    }

    // ---- tables ------------------------------------------------------------------------------

    @SuppressWarnings("unchecked")
    static List<String> columns(Object table) {
        return List.copyOf((List<String>) call(table, "columnNames"));
    }

    static double[] column(Object table, String name) {
        List<String> cols = columns(table);
        if (!cols.contains(name)) {
            throw new IllegalArgumentException("no column \"" + name + "\" in the table; its columns are " + String.join(", ", cols));
        }
        return (double[]) call(table, "values", name);
    }

    static Dimension dimension(Object table, String name) {
        return (Dimension) call(table, "dimension", name);
    }

    /** Columns {@code y} against column {@code x}; columns of one dimension share a panel. */
    static FigureData.Lines tableData(Object table, String x, List<String> y) {
        if (x == null) throw new IllegalArgumentException("name the x column of the table");
        double[] xs = column(table, x);
        List<String> ys = new ArrayList<>(y);
        if (ys.isEmpty()) for (String c : columns(table)) if (!c.equals(x)) ys.add(c);
        if (ys.isEmpty()) throw new IllegalArgumentException("the table has only the column \"" + x + "\"; nothing to plot against it");
        Map<Dimension, List<Trace>> groups = new LinkedHashMap<>();
        Map<Dimension, String> words = new LinkedHashMap<>();
        for (String c : ys) {
            double[] v = column(table, c);
            Dimension d = dimension(table, c);
            groups.computeIfAbsent(d, k -> new ArrayList<>()).add(Trace.wrap(c, xs, v));
            words.merge(d, c, (a, b) -> d.isNone() ? a + ", " + b : d.name());
        }
        List<Panel> panels = new ArrayList<>();
        for (Map.Entry<Dimension, List<Trace>> e : groups.entrySet()) panels.add(new Panel(words.get(e.getKey()), e.getKey(), e.getValue()));
        return new FigureData.Lines(String.join(", ", ys) + " against " + x, x, dimension(table, x), panels, List.of());
    }

    static FigureData.HeatMap heatMapData(Object table, String x, String y, String z) {
        return new FigureData.HeatMap(z + " over " + x + " and " + y,
                x, dimension(table, x), column(table, x), y, dimension(table, y), column(table, y),
                z, dimension(table, z), column(table, z));
    }

    // ---- tolerance runs ----------------------------------------------------------------------

    static FigureData.Histogram histogramData(Object result, String output) {
        double[] v = (double[]) call(result, "values", output);
        double lower = Double.NaN, upper = Double.NaN;
        Dimension d = null;
        if (find(result.getClass(), "dimension", String.class) != null) d = (Dimension) call(result, "dimension", output);
        if (find(result.getClass(), "limits", String.class) != null) {
            Object lim = call(result, "limits", output);
            if (lim != null) {
                Quantity lo = quantityOf(lim, "lower", "min", "lo");
                Quantity hi = quantityOf(lim, "upper", "max", "hi");
                if (lo != null) { lower = lo.si(); d = d == null ? lo.dimension() : d; }
                if (hi != null) { upper = hi.si(); d = d == null ? hi.dimension() : d; }
            }
        } else {
            if (find(result.getClass(), "lowerLimit", String.class) != null) {
                Quantity lo = (Quantity) call(result, "lowerLimit", output);
                if (lo != null) { lower = lo.si(); d = d == null ? lo.dimension() : d; }
            }
            if (find(result.getClass(), "upperLimit", String.class) != null) {
                Quantity hi = (Quantity) call(result, "upperLimit", output);
                if (hi != null) { upper = hi.si(); d = d == null ? hi.dimension() : d; }
            }
        }
        return new FigureData.Histogram(output + " in " + v.length + " runs", output, d == null ? Dimension.NONE : d, v, lower, upper);
    }

    private static Quantity quantityOf(Object o, String... names) {
        for (String n : names) {
            if (find(o.getClass(), n) != null) {
                Object v = call(o, n);
                if (v instanceof Quantity q) return q;
            }
        }
        return null;
    }

    // ---- B-H curves --------------------------------------------------------------------------

    /** Points on a B-H curve (about; points that coincide are drawn once). */
    static final int BH_POINTS = 400;

    /**
     * The first-quadrant B-H curve of a material from H = 0 to past saturation (1.3 × the field at
     * the saturation flux density for a linear material, 3 × for one whose curve bends), with the
     * saturation flux density and, when given, the operating point (a flux density or a field).
     */
    static FigureData.Lines bhData(MagneticMaterial m, Quantity operating) {
        double bsat = m.saturationFluxDensity().si();
        double hsat = m.fieldAt(bsat);
        if (!(hsat > 0) || !Double.isFinite(hsat)) hsat = bsat / (MagneticMaterial.MU0 * Math.max(1, m.relativePermeability()));
        double hMax = (m.isLinear() ? 1.3 : 3) * hsat;
        double hOp = Double.NaN, bOp = Double.NaN;
        if (operating != null) {
            if (operating.is(Dimension.FLUX_DENSITY)) {
                bOp = operating.si();
                hOp = m.fieldAt(bOp);
            } else if (operating.is(Dimension.FIELD_STRENGTH)) {
                hOp = operating.si();
                bOp = m.fluxDensityAt(hOp);
            } else {
                throw new IllegalArgumentException("operating point must be a flux density (T) or a field strength (A/m), got "
                        + operating + " (" + operating.dimension().name() + ")");
            }
            if (!Double.isFinite(hOp) || !Double.isFinite(bOp)) {
                throw new IllegalArgumentException("operating point " + operating + " is off the curve of " + m.name());
            }
            hMax = Math.max(hMax, 1.25 * Math.abs(hOp));
        }
        // half the points at equal steps of H, half at equal steps of B, so the steep start of a
        // soft material's curve is drawn as finely as its knee and its flat top
        int half = BH_POINTS / 2;
        double bMax = m.fluxDensityAt(hMax);
        java.util.TreeSet<Double> hs = new java.util.TreeSet<>();
        for (int i = 0; i <= half; i++) hs.add(hMax * i / half);
        for (int i = 1; i < half; i++) {
            double hb = m.fieldAt(bMax * i / half);
            if (Double.isFinite(hb) && hb > 0 && hb < hMax) hs.add(hb);
        }
        double[] h = hs.stream().mapToDouble(Double::doubleValue).toArray();
        double[] b = new double[h.length];
        for (int i = 0; i < h.length; i++) b[i] = m.fluxDensityAt(h[i]);
        List<Mark> marks = new ArrayList<>();
        marks.add(new Mark("saturation", Double.NaN, bsat, null));
        if (operating != null) marks.add(new Mark("operating point", hOp, bOp, null));
        Panel p = new Panel("flux density", Dimension.FLUX_DENSITY, List.of(Trace.wrap(m.name(), h, b)));
        return new FigureData.Lines("B-H curve, " + m.name(), "field strength", Dimension.FIELD_STRENGTH, List.of(p), marks);
    }

    // ---- reflection --------------------------------------------------------------------------

    static String title(Object o) {
        String s = String.valueOf(o);
        return s.length() <= 110 ? s : s.substring(0, 107) + "…";
    }

    static String describe(Object o) {
        return o == null ? "null" : "a " + o.getClass().getSimpleName();
    }

    /** Calls a public method by name, through a public type (the object's class may be hidden). */
    static Object call(Object o, String name, Object... args) {
        Class<?>[] types = new Class<?>[args.length];
        for (int i = 0; i < args.length; i++) types[i] = args[i] == null ? String.class : args[i].getClass();
        Method m = find(o.getClass(), name, types);
        if (m == null) {
            throw new IllegalArgumentException("cannot plot " + describe(o) + ": it has no public " + name + "()");
        }
        try {
            return m.invoke(o, args);
        } catch (InvocationTargetException e) {
            Throwable c = e.getCause();
            if (c instanceof RuntimeException r) throw r;
            if (c instanceof Error err) throw err;
            throw new IllegalStateException(name + "() of " + describe(o) + " failed: " + c, c);
        } catch (IllegalAccessException e) {
            throw new IllegalStateException("cannot call " + name + "() of " + describe(o) + ": " + e.getMessage(), e);
        }
    }

    static Method find(Class<?> c, String name, Class<?>... types) {
        Deque<Class<?>> todo = new ArrayDeque<>();
        Set<Class<?>> seen = new HashSet<>();
        todo.add(c);
        while (!todo.isEmpty()) {
            Class<?> k = todo.poll();
            if (!seen.add(k)) continue;
            if (Modifier.isPublic(k.getModifiers())) {
                try {
                    Method m = k.getMethod(name, types);
                    if (Modifier.isPublic(m.getDeclaringClass().getModifiers())) return m;
                    // the method is inherited from a hidden class: look for it through an interface
                } catch (NoSuchMethodException e) {
                    // try the supertypes
                }
            }
            if (k.getSuperclass() != null) todo.add(k.getSuperclass());
            todo.addAll(List.of(k.getInterfaces()));
        }
        return null;
    }

    static String lower(String s) { return s.toLowerCase(Locale.ROOT); }
}
