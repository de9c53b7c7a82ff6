package org.ampturn.chart;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.ampturn.field.FieldMap;
import org.ampturn.field.Region;
import org.ampturn.field.Solution;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;

/**
 * Figures of field solutions: flux lines (contours of r·A, which carry equal flux between
 * neighbours) with the regions outlined; the flux density |B| as a colour map; both in one flux
 * plot; force against stroke at each mapped current. The view is the device with a margin of half its size.
 */
public final class FieldFigures {
    static final int LEVELS = 24;
    static final int PIXELS = 120;

    private FieldFigures() {}

    /** Flux lines and region outlines of a solution, r across and z up. */
    public static FigureData fluxLines(Solution s) {
        if (s == null) throw new IllegalArgumentException("no field solution to draw (null)");
        double[] view = view(s);
        return new FigureData.Lines("flux lines, " + s.mesh().nodes() + " nodes", "r", Dimension.LENGTH,
                List.of(new Panel("z", Dimension.LENGTH, List.of(outlines(s), lines(s, view)))), List.of());
    }

    /** |B| over the device as a colour map, on a uniform grid of samples. */
    public static FigureData fluxDensity(Solution s) {
        if (s == null) throw new IllegalArgumentException("no field solution to draw (null)");
        return densityMap(s, "flux density |B|", List.of());
    }

    /**
     * The flux plot: flux lines (contours of r·A) over the |B| colour map, with the regions
     * outlined, r across and z up, over the view of {@link #fluxLines} and {@link #fluxDensity}.
     */
    public static FigureData fluxPlot(Solution s) {
        if (s == null) throw new IllegalArgumentException("no field solution to draw (null)");
        return densityMap(s, "flux lines over |B|, " + s.mesh().nodes() + " nodes", List.of(outlines(s), lines(s, view(s))));
    }

    private static FigureData densityMap(Solution s, String title, List<Trace> overlays) {
        double[] view = view(s);
        int n = PIXELS;
        double[] x = new double[n * n], y = new double[n * n], b = new double[n * n];
        for (int j = 0; j < n; j++) {
            for (int i = 0; i < n; i++) {
                double r = view[0] + (view[1] - view[0]) * (i + 0.5) / n, z = view[2] + (view[3] - view[2]) * (j + 0.5) / n;
                int k = j * n + i;
                x[k] = r;
                y[k] = z;
                b[k] = s.fluxDensityAt(r, z)[0];
            }
        }
        return new FigureData.HeatMap(title, "r", Dimension.LENGTH, x, "z", Dimension.LENGTH, y, "|B|", Dimension.FLUX_DENSITY, b, overlays);
    }

    /** The regions' outlines, each closed and ended by a NaN break. */
    private static Trace outlines(Solution s) {
        List<Double> ox = new ArrayList<>(), oy = new ArrayList<>();
        for (Region g : s.mesh().geometry().regions()) {
            double[] cr = g.shape().rs(), cz = g.shape().zs();
            for (int k = 0; k <= cr.length; k++) {
                ox.add(cr[k % cr.length]);
                oy.add(cz[k % cr.length]);
            }
            ox.add(Double.NaN);
            oy.add(Double.NaN);
        }
        return Trace.of("regions", unbox(ox), unbox(oy));
    }

    /** {@link #LEVELS} − 1 evenly spaced contours of r·A over the view, joined into polylines. */
    private static Trace lines(Solution s, double[] view) {
        double[] r = s.mesh().radii(), z = s.mesh().heights(), psi = s.fluxFunction();
        int nr = r.length;
        double lo = Double.POSITIVE_INFINITY, hi = Double.NEGATIVE_INFINITY;
        for (int j = 0; j < z.length; j++) {
            for (int i = 0; i < nr; i++) {
                if (!inView(view, r[i], z[j])) continue;
                lo = Math.min(lo, psi[j * nr + i]);
                hi = Math.max(hi, psi[j * nr + i]);
            }
        }
        List<Double> xs = new ArrayList<>(), ys = new ArrayList<>();
        if (hi > lo) {
            for (int l = 1; l < LEVELS; l++) {
                double c = lo + (hi - lo) * l / LEVELS;
                for (int j = 0; j + 1 < z.length; j++) {
                    for (int i = 0; i + 1 < nr; i++) {
                        if (!inView(view, r[i], z[j]) && !inView(view, r[i + 1], z[j + 1])) continue;
                        int p00 = j * nr + i, p10 = p00 + 1, p11 = p00 + nr + 1, p01 = p00 + nr;
                        contour(c, r[i], z[j], psi[p00], r[i + 1], z[j], psi[p10], r[i + 1], z[j + 1], psi[p11], xs, ys);
                        contour(c, r[i], z[j], psi[p00], r[i + 1], z[j + 1], psi[p11], r[i], z[j + 1], psi[p01], xs, ys);
                    }
                }
            }
        }
        double[][] chained = chain(unbox(xs), unbox(ys), 1e-9 * (view[1] - view[0] + view[3] - view[2]), Build.SAMPLING_ABOVE - 10);
        return Trace.of("flux lines", chained[0], chained[1]);
    }

    /** Force toward closing against stroke, one curve per mapped current (Maxwell stress). */
    public static FigureData forceStroke(FieldMap m) {
        if (m == null) throw new IllegalArgumentException("no field map to draw (null)");
        double[] x = m.positions(), amps = m.currents();
        List<Trace> traces = new ArrayList<>();
        for (int j = 1; j < amps.length; j++) {
            double[] f = new double[x.length];
            for (int k = 0; k < x.length; k++) f[k] = m.forceAt(j, k);
            traces.add(Trace.of(Quantity.of(amps[j], Dimension.CURRENT).toString(), x, f));
        }
        return new FigureData.Lines("force on " + m.part() + " over the stroke", "stroke", Dimension.LENGTH,
                List.of(new Panel("force", Dimension.FORCE, traces)), List.of());
    }

    /** r0, r1, z0, z1 of the view: the regions' extent with a margin of half the device size. */
    static double[] view(Solution s) {
        double r1 = 0, z0 = Double.POSITIVE_INFINITY, z1 = Double.NEGATIVE_INFINITY;
        for (Region g : s.mesh().geometry().regions()) {
            for (double v : g.shape().rs()) r1 = Math.max(r1, v);
            for (double v : g.shape().zs()) {
                z0 = Math.min(z0, v);
                z1 = Math.max(z1, v);
            }
        }
        double size = Math.max(r1, z1 - z0), m = 0.5 * size;
        double[] rr = s.mesh().radii(), zz = s.mesh().heights();
        return new double[] {0, Math.min(rr[rr.length - 1], r1 + m), Math.max(zz[0], z0 - m), Math.min(zz[zz.length - 1], z1 + m)};
    }

    private static boolean inView(double[] v, double r, double z) {
        return r >= v[0] && r <= v[1] && z >= v[2] && z <= v[3];
    }

    /** The piece of the level-c line in a linear triangle, appended with a NaN break. */
    private static void contour(double c, double ra, double za, double pa, double rb, double zb, double pb, double rc, double zc, double pc,
                                List<Double> xs, List<Double> ys) {
        double[] pr = new double[2], pz = new double[2];
        int n = 0;
        double[][] e = {{ra, za, pa, rb, zb, pb}, {rb, zb, pb, rc, zc, pc}, {rc, zc, pc, ra, za, pa}};
        for (double[] d : e) {
            if (n == 2) break;
            if ((d[2] - c) * (d[5] - c) < 0 || d[2] == c && d[5] != c) {
                double t = (c - d[2]) / (d[5] - d[2]);
                pr[n] = d[0] + t * (d[3] - d[0]);
                pz[n] = d[1] + t * (d[4] - d[1]);
                n++;
            }
        }
        if (n < 2) return;
        xs.add(pr[0]);
        ys.add(pz[0]);
        xs.add(pr[1]);
        ys.add(pz[1]);
        xs.add(Double.NaN);
        ys.add(Double.NaN);
    }

    /**
     * Joins segments (pairs of points between NaN breaks) into polylines by their shared ends, then
     * keeps every k-th inner point so that at most {@code most} points remain (the line renderer
     * draws a trace of up to that many points as given).
     */
    static double[][] chain(double[] x, double[] y, double tol, int most) {
        int segs = x.length / 3;
        java.util.Map<String, List<Integer>> ends = new java.util.HashMap<>();
        for (int k = 0; k < segs; k++) {
            for (int e = 0; e < 2; e++) ends.computeIfAbsent(key(x[3 * k + e], y[3 * k + e], tol), q -> new ArrayList<>()).add(k);
        }
        boolean[] used = new boolean[segs];
        List<double[]> polylines = new ArrayList<>();
        int points = 0;
        for (int k = 0; k < segs; k++) {
            if (used[k]) continue;
            used[k] = true;
            java.util.ArrayDeque<double[]> line = new java.util.ArrayDeque<>();
            line.add(new double[] {x[3 * k], y[3 * k]});
            line.add(new double[] {x[3 * k + 1], y[3 * k + 1]});
            for (int side = 0; side < 2; side++) {
                while (true) {
                    double[] end = side == 0 ? line.peekLast() : line.peekFirst();
                    int next = -1;
                    for (int c : ends.getOrDefault(key(end[0], end[1], tol), List.of())) if (!used[c]) { next = c; break; }
                    if (next < 0) break;
                    used[next] = true;
                    boolean firstMatches = key(x[3 * next], y[3 * next], tol).equals(key(end[0], end[1], tol));
                    double[] other = firstMatches ? new double[] {x[3 * next + 1], y[3 * next + 1]} : new double[] {x[3 * next], y[3 * next]};
                    if (side == 0) line.addLast(other); else line.addFirst(other);
                }
            }
            double[] flat = new double[2 * line.size()];
            int i = 0;
            for (double[] p : line) { flat[i++] = p[0]; flat[i++] = p[1]; }
            polylines.add(flat);
            points += line.size() + 1;
        }
        int step = 1;
        while (thinned(polylines, step) > most) step++;
        List<Double> ox = new ArrayList<>(), oy = new ArrayList<>();
        for (double[] p : polylines) {
            int n = p.length / 2;
            for (int i = 0; i < n; i++) {
                if (i != 0 && i != n - 1 && i % step != 0) continue;
                ox.add(p[2 * i]);
                oy.add(p[2 * i + 1]);
            }
            ox.add(Double.NaN);
            oy.add(Double.NaN);
        }
        if (ox.isEmpty()) { ox.add(Double.NaN); oy.add(Double.NaN); }
        return new double[][] {unbox(ox), unbox(oy)};
    }

    private static int thinned(List<double[]> polylines, int step) {
        int count = 0;
        for (double[] p : polylines) {
            int n = p.length / 2;
            count += Math.min(n, 2 + Math.max(0, (n - 3) / step + 1)) + 1;
        }
        return count;
    }

    private static String key(double x, double y, double tol) {
        return Math.round(x / tol) + ":" + Math.round(y / tol);
    }

    private static double[] unbox(List<Double> v) {
        double[] a = new double[v.size()];
        Arrays.setAll(a, k -> v.get(k));
        return a;
    }
}
