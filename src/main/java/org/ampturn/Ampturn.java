package org.ampturn;

import org.ampturn.units.Quantity;

/**
 * The facade the console preloads with {@code import static org.ampturn.Ampturn.*}: unit helpers
 * and the study and chart entry points. Every helper is a plain static method, so a worksheet is
 * ordinary Java.
 */
public final class Ampturn {
    private Ampturn() {}

    /** The tool's version, from the jar manifest (or "dev" when run from classes). */
    public static String version() {
        String v = Ampturn.class.getPackage().getImplementationVersion();
        return v != null ? v : "0.1.0";
    }

    // ---- units: each returns a Quantity in SI ------------------------------------------------
    public static Quantity m(double x) { return Quantity.of(x, "m"); }
    public static Quantity cm(double x) { return Quantity.of(x, "cm"); }
    public static Quantity mm(double x) { return Quantity.of(x, "mm"); }
    public static Quantity um(double x) { return Quantity.of(x, "um"); }
    public static Quantity inch(double x) { return Quantity.of(x, "inch"); }
    public static Quantity mil(double x) { return Quantity.of(x, "mil"); }
    public static Quantity mm2(double x) { return Quantity.of(x, "mm^2"); }
    public static Quantity cm2(double x) { return Quantity.of(x, "cm^2"); }

    public static Quantity A(double x) { return Quantity.of(x, "A"); }
    public static Quantity mA(double x) { return Quantity.of(x, "mA"); }
    public static Quantity uA(double x) { return Quantity.of(x, "uA"); }
    public static Quantity V(double x) { return Quantity.of(x, "V"); }
    public static Quantity mV(double x) { return Quantity.of(x, "mV"); }
    public static Quantity kV(double x) { return Quantity.of(x, "kV"); }
    public static Quantity ohm(double x) { return Quantity.of(x, "ohm"); }
    public static Quantity mohm(double x) { return Quantity.of(x, "mohm"); }
    public static Quantity kohm(double x) { return Quantity.of(x, "kohm"); }
    public static Quantity Mohm(double x) { return Quantity.of(x, "Mohm"); }

    public static Quantity H(double x) { return Quantity.of(x, "H"); }
    public static Quantity mH(double x) { return Quantity.of(x, "mH"); }
    public static Quantity uH(double x) { return Quantity.of(x, "uH"); }
    public static Quantity nH(double x) { return Quantity.of(x, "nH"); }
    public static Quantity F(double x) { return Quantity.of(x, "F"); }
    public static Quantity uF(double x) { return Quantity.of(x, "uF"); }
    public static Quantity nF(double x) { return Quantity.of(x, "nF"); }
    public static Quantity pF(double x) { return Quantity.of(x, "pF"); }

    public static Quantity s(double x) { return Quantity.of(x, "s"); }
    public static Quantity ms(double x) { return Quantity.of(x, "ms"); }
    public static Quantity us(double x) { return Quantity.of(x, "us"); }
    public static Quantity ns(double x) { return Quantity.of(x, "ns"); }
    public static Quantity Hz(double x) { return Quantity.of(x, "Hz"); }
    public static Quantity kHz(double x) { return Quantity.of(x, "kHz"); }
    public static Quantity MHz(double x) { return Quantity.of(x, "MHz"); }

    public static Quantity T(double x) { return Quantity.of(x, "T"); }
    public static Quantity mT(double x) { return Quantity.of(x, "mT"); }
    public static Quantity gauss(double x) { return Quantity.of(x, "G"); }
    public static Quantity Wb(double x) { return Quantity.of(x, "Wb"); }
    public static Quantity Apm(double x) { return Quantity.of(x, "A/m"); }
    public static Quantity Oe(double x) { return Quantity.of(x, "Oe"); }

    public static Quantity W(double x) { return Quantity.of(x, "W"); }
    public static Quantity mW(double x) { return Quantity.of(x, "mW"); }
    public static Quantity J(double x) { return Quantity.of(x, "J"); }
    public static Quantity mJ(double x) { return Quantity.of(x, "mJ"); }
    public static Quantity N(double x) { return Quantity.of(x, "N"); }
    public static Quantity kg(double x) { return Quantity.of(x, "kg"); }
    public static Quantity g(double x) { return Quantity.of(x, "g"); }

    /** An absolute temperature in degrees Celsius (kelvin inside). */
    public static Quantity degC(double x) { return Quantity.celsius(x); }
    /** A temperature difference in kelvin. */
    public static Quantity K(double x) { return Quantity.of(x, "K"); }

    /** A quantity from text: {@code q("4.7 mH")}, {@code q("2.5 A/mm^2")}. */
    public static Quantity q(String text) { return Quantity.parse(text); }

    // ---- studies ----
    // Sweeps, solve-for-target, optimisation and tolerance analysis (org.ampturn.study). The
    // builders behind them (Sweep, Optimisation, Tolerance, Axis, Param, Varied, Limit, Outputs)
    // are in that package; the console imports it as well.

    /**
     * {@code f} at {@code count} evenly spaced values from {@code from} to {@code to}:
     * {@code sweep("turns", 100, 1000, 10, n -> coil(n).inductance())}. Whole-number ends give whole
     * numbers ({@code Integer}); write {@code 1.0} for real steps.
     */
    public static <N extends Number> org.ampturn.study.Table sweep(String name, N from, N to, int count, java.util.function.Function<N, ?> f) {
        return org.ampturn.study.Sweep.defaults().of(org.ampturn.study.Axis.linear(name, from, to, count), f);
    }

    /** {@code f} at {@code count} evenly spaced quantities: {@code sweep("gap", mm(0.1), mm(1), 10, g -> ...)}. */
    public static org.ampturn.study.Table sweep(String name, Quantity from, Quantity to, int count, java.util.function.Function<Quantity, ?> f) {
        return org.ampturn.study.Sweep.defaults().of(org.ampturn.study.Axis.linear(name, from, to, count), f);
    }

    /** {@code f} at {@code count} values evenly spaced on a log scale (both ends above zero). */
    public static <N extends Number> org.ampturn.study.Table sweepLog(String name, N from, N to, int count, java.util.function.Function<N, ?> f) {
        return org.ampturn.study.Sweep.defaults().of(org.ampturn.study.Axis.log(name, from, to, count), f);
    }

    /** {@code f} at {@code count} quantities evenly spaced on a log scale: {@code sweepLog("f", Hz(10), kHz(100), 41, ...)}. */
    public static org.ampturn.study.Table sweepLog(String name, Quantity from, Quantity to, int count, java.util.function.Function<Quantity, ?> f) {
        return org.ampturn.study.Sweep.defaults().of(org.ampturn.study.Axis.log(name, from, to, count), f);
    }

    /** {@code f} at each value of a list: {@code sweep("wire", List.of(Wire.awg(24), Wire.awg(26)), w -> ...)}. */
    public static <T> org.ampturn.study.Table sweep(String name, java.util.List<T> values, java.util.function.Function<? super T, ?> f) {
        return org.ampturn.study.Sweep.defaults().of(org.ampturn.study.Axis.of(name, values), f);
    }

    /** {@code f} along one axis. */
    public static <A> org.ampturn.study.Table sweep(org.ampturn.study.Axis<A> a, java.util.function.Function<? super A, ?> f) {
        return org.ampturn.study.Sweep.defaults().of(a, f);
    }

    /** {@code f} over the grid of two axes: {@code sweep(Axis.linear("turns", 100, 500, 5), Axis.of("gap", mm(0.1), mm(0.2)), (n, g) -> ...)}. */
    public static <A, B> org.ampturn.study.Table sweep(org.ampturn.study.Axis<A> a, org.ampturn.study.Axis<B> b,
                                                       java.util.function.BiFunction<? super A, ? super B, ?> f) {
        return org.ampturn.study.Sweep.defaults().of(a, b, f);
    }

    /** The fast sweep of a closed form, double in, double out, no object per point. */
    public static org.ampturn.study.Table sweepDoubles(String name, double from, double to, int count, java.util.function.DoubleUnaryOperator f) {
        return org.ampturn.study.Sweep.defaults().ofDoubles(name, from, to, count, f);
    }

    /** The x in [lo, hi] where {@code f(x) = target} (Brent's method). */
    public static double solve(java.util.function.DoubleUnaryOperator f, double target, double lo, double hi) {
        return org.ampturn.study.Solve.of(f, target, lo, hi);
    }

    /** The number x in [lo, hi] where the quantity {@code f(x)} reaches {@code target}: turns for an inductance. */
    public static double solve(java.util.function.DoubleFunction<Quantity> f, Quantity target, double lo, double hi) {
        return org.ampturn.study.Solve.of(f, target, lo, hi);
    }

    /** The quantity x in [lo, hi] where {@code f(x)} reaches {@code target}: the gap for an inductance. */
    public static Quantity solve(java.util.function.Function<Quantity, Quantity> f, Quantity target, Quantity lo, Quantity hi) {
        return org.ampturn.study.Solve.of(f, target, lo, hi);
    }

    /** An optimisation that minimises an output: {@code minimise("loss").over(...).subjectTo("L >= 1 mH").run(p -> ...)}. */
    public static org.ampturn.study.Optimisation minimise(String objective) {
        return org.ampturn.study.Optimisation.minimise(objective);
    }

    /** An optimisation that maximises an output. */
    public static org.ampturn.study.Optimisation maximise(String objective) {
        return org.ampturn.study.Optimisation.maximise(objective);
    }

    /** A tolerance study: {@code tolerance(p -> ...).vary(Varied.percent("V", V(12), 10)).monteCarlo(10_000, 1)}. */
    public static org.ampturn.study.Tolerance tolerance(java.util.function.Function<org.ampturn.study.Point, ?> f) {
        return org.ampturn.study.Tolerance.of(f);
    }

    /** A limit on an output, from text: {@code limit("B <= 0.3 T")}. */
    public static org.ampturn.study.Limit limit(String text) {
        return org.ampturn.study.Limit.parse(text);
    }

    /** Named outputs for a study function: {@code outputs("L", l, "R", r)}. */
    public static org.ampturn.study.Outputs outputs(Object... namesAndValues) {
        return org.ampturn.study.Outputs.of(namesAndValues);
    }

    // ---- charts ----
    // Each helper hands over to org.ampturn.chart on first use, so the chart library and AWT load
    // only when something is plotted, never when the console starts.

    /**
     * A figure of a transient (stacked current, voltage and energy panels sharing the time axis,
     * key values marked), a table (columns against the first), a magnetic material (its B-H
     * curve) or a {@code double[]}. Opens a window when a display exists; otherwise writes
     * {@code NN-name.png} next to the worksheet and prints its path and a one-line preview.
     * {@code .save("file.png")} or {@code .save("file.svg", 1600, 1000)} writes a file.
     */
    public static org.ampturn.chart.Figure plot(Object x) { return org.ampturn.chart.Plots.plot(x); }

    /** As {@link #plot(Object)} under a name; plotting again under that name updates its window. */
    public static org.ampturn.chart.Figure plot(String name, Object x) { return org.ampturn.chart.Plots.plot(name, x); }

    /** Columns {@code y} of a sweep table against column {@code x} (every other column when none is named). */
    public static org.ampturn.chart.Figure plot(Object table, String x, String... y) {
        return org.ampturn.chart.Plots.plot(table, x, y);
    }

    /** A heat map of column {@code z} over the two swept columns {@code x} and {@code y}. */
    public static org.ampturn.chart.Figure heatmap(Object table, String x, String y, String z) {
        return org.ampturn.chart.Plots.heatmap(table, x, y, z);
    }

    /** The current of several transients overlaid on one panel. */
    public static org.ampturn.chart.Figure overlay(Object... transients) { return org.ampturn.chart.Plots.overlay(transients); }

    /** One signal ("switch voltage", or a quantity such as "current") of several transients overlaid. */
    public static org.ampturn.chart.Figure overlay(String signal, Object... transients) {
        return org.ampturn.chart.Plots.overlay(signal, transients);
    }

    /** A histogram of one output of a tolerance run (or a table column), with its limits drawn. */
    public static org.ampturn.chart.Figure histogram(Object result, String output) {
        return org.ampturn.chart.Plots.histogram(result, output);
    }

    /** The B-H curve of a material. */
    public static org.ampturn.chart.Figure plotBH(org.ampturn.material.MagneticMaterial material) {
        return org.ampturn.chart.Plots.bh(material, null);
    }

    /** The B-H curve of a material with the operating point at a flux density (T) or a field strength (A/m). */
    public static org.ampturn.chart.Figure plotBH(org.ampturn.material.MagneticMaterial material, Quantity operatingPoint) {
        return org.ampturn.chart.Plots.bh(material, operatingPoint);
    }

    /** The figures made so far with their files, one a line. */
    public static String figures() { return org.ampturn.chart.Figures.listing(); }

    // ---- thermal ----
    /** A heat capacity in J/K: {@code ThermalNetwork.oneBody(JperK(50), KperW(20))}. */
    public static Quantity JperK(double x) { return Quantity.of(x, "J/K"); }

    /** A thermal resistance in K/W. */
    public static Quantity KperW(double x) { return Quantity.of(x, "K/W"); }

    /** The wire choice for a bobbin over the IEC 60317 metric and AWG series: {@code chooseWire(b).withSupply(V(24), 10)...choose()}. */
    public static org.ampturn.thermal.WireChoice chooseWire(org.ampturn.wire.Bobbin bobbin) {
        return org.ampturn.thermal.WireChoice.forBobbin(bobbin);
    }

    // ---- actuator ----

    /**
     * Force-stroke curves of a plunger at the given currents (41 positions over the stroke), with the
     * spring and load line on the same axes; the figure shows the margin at each current.
     */
    public static org.ampturn.chart.Figure plotForceStroke(org.ampturn.actuator.Plunger plunger, Quantity... currents) {
        if (plunger == null) throw new IllegalArgumentException("no plunger to draw (null)");
        return org.ampturn.chart.Plots.forceStroke(plunger.forceStroke(41, currents));
    }

    // ---- wire ----
    /** An AWG copper magnet wire, heavy build (ASTM B258): {@code awg(24)}, {@code awg(24.5)}. */
    public static org.ampturn.wire.Wire awg(double gauge) { return org.ampturn.wire.Wire.awg(gauge); }

    /** An AWG wire from text: {@code awg("4/0")}, {@code awg("00")}. */
    public static org.ampturn.wire.Wire awg(String gauge) { return org.ampturn.wire.Wire.awg(gauge); }

    // ---- coils and magnetic circuits ----------------------------------------------------------
    /** Magnetic-circuit parts in series (same flux, MMFs add): {@code series(core, gap(mm(0.5), mm2(80)))}. */
    public static org.ampturn.coil.MagneticCircuit series(org.ampturn.coil.MagneticCircuit... parts) {
        return org.ampturn.coil.MagneticCircuit.series(parts);
    }

    /** Magnetic-circuit parts in parallel (same MMF, fluxes add). */
    public static org.ampturn.coil.MagneticCircuit parallel(org.ampturn.coil.MagneticCircuit... parts) {
        return org.ampturn.coil.MagneticCircuit.parallel(parts);
    }

    /** An air gap of {@code length} across pole faces of {@code area}, no fringing. */
    public static org.ampturn.coil.AirGap gap(Quantity length, Quantity area) {
        return org.ampturn.coil.AirGap.of(length, area);
    }

    // ---- field ----
    // Axisymmetric field solutions (org.ampturn.field): geometry in the r-z half plane, solve,
    // force both ways, force-stroke-current maps a drive integrates, flux plots.

    /** A rectangle in the r-z half plane with corners (r0, z0) and (r1, z1): {@code rect(mm(0), mm(0), mm(4), mm(20))}. */
    public static org.ampturn.field.Shape rect(Quantity r0, Quantity z0, Quantity r1, Quantity z1) {
        return org.ampturn.field.Shape.rect(r0, z0, r1, z1);
    }

    /** A polygon in the r-z half plane through corners given as (r, z) pairs: {@code polygon(mm(0), mm(0), mm(4), mm(0), mm(3), mm(2))}. */
    public static org.ampturn.field.Shape polygon(Quantity... rz) {
        return org.ampturn.field.Shape.polygon(rz);
    }

    /** An empty field geometry: add regions with {@code .with(name, shape, material)} and {@code .withWinding(name, shape, turns, current)}. */
    public static org.ampturn.field.Geometry geometry() {
        return org.ampturn.field.Geometry.of();
    }

    /**
     * A force-stroke-current map of {@code part} moved over {@code travel} (signed: the direction in
     * which it closes) in {@code positions} steps, at the given currents (A) of {@code winding}, on
     * every core, with the console's progress bar; Ctrl-C keeps the positions done.
     */
    public static org.ampturn.field.FieldMap fieldMap(org.ampturn.field.Geometry geometry, String part, String winding, Quantity travel,
                                                      int positions, double... currentsAmps) {
        org.ampturn.study.Progress bar = org.ampturn.study.Progress.installed();
        long start = System.nanoTime();
        String task = "field map of " + part;
        org.ampturn.field.FieldMap m = org.ampturn.field.FieldMap.of(geometry, part, winding, travel, positions, currentsAmps,
                Runtime.getRuntime().availableProcessors(), (done, total) -> {
                    java.time.Duration spent = java.time.Duration.ofNanos(System.nanoTime() - start);
                    java.time.Duration left = done == 0 ? null : spent.multipliedBy(total - done).dividedBy(done);
                    bar.update(new org.ampturn.study.Progress.Status(task, done, total, spent, left, done == total, false));
                });
        if (!m.isComplete()) {
            bar.update(new org.ampturn.study.Progress.Status(task, m.positionsDone(), positions, java.time.Duration.ofNanos(System.nanoTime() - start), null, true, true));
        }
        return m;
    }

    /** Flux lines (contours of r·A) of a field solution with its regions outlined. */
    public static org.ampturn.chart.Figure plotFlux(org.ampturn.field.Solution solution) {
        return org.ampturn.chart.Figures.show(org.ampturn.chart.Figure.of("flux", org.ampturn.chart.FieldFigures.fluxLines(solution)));
    }

    /** The flux plot of a field solution: flux lines over the |B| colour map, regions outlined. */
    public static org.ampturn.chart.Figure plotField(org.ampturn.field.Solution solution) {
        return org.ampturn.chart.Figures.show(org.ampturn.chart.Figure.of("field", org.ampturn.chart.FieldFigures.fluxPlot(solution)));
    }

    /** The flux density |B| of a field solution as a colour map. */
    public static org.ampturn.chart.Figure plotFluxDensity(org.ampturn.field.Solution solution) {
        return org.ampturn.chart.Figures.show(org.ampturn.chart.Figure.of("flux-density", org.ampturn.chart.FieldFigures.fluxDensity(solution)));
    }

    /** Force against stroke at each current of a field map. */
    public static org.ampturn.chart.Figure plotForce(org.ampturn.field.FieldMap map) {
        return org.ampturn.chart.Figures.show(org.ampturn.chart.Figure.of("force-stroke", org.ampturn.chart.FieldFigures.forceStroke(map)));
    }
}
