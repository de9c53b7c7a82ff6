package org.ampturn.field;

import java.util.Arrays;
import java.util.List;
import java.util.TreeSet;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;

/**
 * A graded tensor-product mesh of a {@link Geometry}: grid lines in r and in z pass through every
 * corner of every region, so each interval between corners (every air gap among them) has at least
 * three cells across; each cell is split into two first-order triangles along its rising diagonal.
 * A triangle takes the region whose outline contains its centroid: rectangles and polygons with
 * edges along r and z are meshed exactly, a slanted edge becomes a staircase whose area error is at
 * most half a cell along the edge. Cell sizes grow by at most 25 % per cell away from the device.
 * Quality is the smallest triangle angle (45° for square cells). {@link #refined()} halves every cell.
 */
public final class Mesh {
    static final int MIN_CELLS = 3;
    static double CORNER = 0.25;
    final Geometry geometry;
    final double[] r;
    final double[] z;
    final int[] region; // per triangle: index of the geometry's region, -1 for air
    private final int level;

    private Mesh(Geometry geometry, double[] r, double[] z, int level) {
        this.geometry = geometry;
        this.r = r;
        this.z = z;
        this.level = level;
        long tris = 2L * (r.length - 1) * (z.length - 1);
        if (tris > 20_000_000) throw Require.fail("mesh of " + tris + " triangles is too large (limit 20,000,000); use fewer cells across or refine less");
        Require.fitsInMemory("mesh nodes", (long) r.length * z.length, 400);
        this.region = assign(geometry, r, z);
    }

    static Mesh of(Geometry g) {
        double[] d = g.domainAt();
        TreeSet<Double> rb = new TreeSet<>(), zb = new TreeSet<>();
        rb.add(0.0);
        rb.add(d[0]);
        zb.add(d[1]);
        zb.add(d[2]);
        double rDev = 0, z0 = Double.POSITIVE_INFINITY, z1 = Double.NEGATIVE_INFINITY;
        for (Region reg : g.regions()) {
            Shape s = reg.shape();
            for (int i = 0; i < s.corners(); i++) {
                rb.add(s.rAt(i));
                zb.add(s.zAt(i));
            }
            rDev = Math.max(rDev, s.rMax());
            z0 = Math.min(z0, s.zMin());
            z1 = Math.max(z1, s.zMax());
        }
        double h = Math.max(rDev, z1 - z0) / g.cellsAcross();
        return new Mesh(g, axis(toArray(rb), 0, rDev, h), axis(toArray(zb), z0, z1, h), 0);
    }

    /** The same grid for another position of the geometry's parts (the virtual-work pair). */
    static Mesh onGrid(Geometry g, double[] r, double[] z) {
        return new Mesh(g, r, z, 0);
    }

    private static double[] toArray(TreeSet<Double> s) {
        double[] a = new double[s.size()];
        int k = 0;
        for (double v : s) a[k++] = v;
        return a;
    }

    /**
     * Grid coordinates through every break point: intervals inside [lo, hi] get cells no larger than
     * h and at least {@link #MIN_CELLS}; the size may grow by {@link Geometry#GROWTH} per cell away
     * from them (a size field limited in gradient, placed by equal steps of ∫dx/size).
     */
    static double[] axis(double[] breaks, double lo, double hi, double h) {
        int n = breaks.length;
        double tol = 1e-12 * Math.max(1e-9, hi - lo);
        double[] size = new double[n - 1];
        boolean[] in = new boolean[n - 1];
        for (int j = 0; j < n - 1; j++) {
            double len = breaks[j + 1] - breaks[j];
            in[j] = breaks[j] >= lo - tol && breaks[j + 1] <= hi + tol;
            size[j] = in[j] ? Math.min(h, len / MIN_CELLS) : Double.POSITIVE_INFINITY;
        }
        double g = Geometry.GROWTH - 1;
        java.util.function.DoubleUnaryOperator sizeAt = x -> {
            double s = Double.POSITIVE_INFINITY;
            for (int j = 0; j < n - 1; j++) {
                if (!in[j]) continue;
                double dist = x < breaks[j] ? breaks[j] - x : x > breaks[j + 1] ? x - breaks[j + 1] : 0;
                s = Math.min(s, size[j] + g * dist);
            }
            // finer cells toward every corner line (field singularities sit at region corners)
            for (int j = 0; j < n; j++) {
                if (breaks[j] < lo - tol || breaks[j] > hi + tol) continue;
                s = Math.min(s, h * CORNER + g * Math.abs(x - breaks[j]));
            }
            return s == Double.POSITIVE_INFINITY ? h : s;
        };
        double[] out = new double[64];
        int count = 0;
        out[count++] = breaks[0];
        double[] raw = new double[64];
        for (int j = 0; j < n - 1; j++) {
            double a = breaks[j], b = breaks[j + 1];
            // march with the local size (never stepping into a smaller size), then scale onto [a, b]
            int m = 0;
            raw[m++] = a;
            double x = a;
            while (x < b) {
                double st = sizeAt.applyAsDouble(x);
                st = Math.min(st, sizeAt.applyAsDouble(Math.min(b, x + st)));
                x += st;
                if (m + 1 > raw.length) raw = Arrays.copyOf(raw, 2 * raw.length);
                raw[m++] = x;
                if (m > 200_000) throw Require.fail("mesh grading needs more than 200,000 lines in one interval; the geometry's sizes differ too much");
            }
            int steps = m - 1;
            if (steps > 1 && raw[m - 1] - b > 0.5 * (raw[m - 1] - raw[m - 2])) steps--; // drop a short last step: stretch instead
            int want = in[j] ? MIN_CELLS : 1;
            for (int c = 1; c <= Math.max(steps, want); c++) {
                double pos;
                if (steps >= want) pos = a + (raw[c] - a) * (b - a) / (raw[steps] - a);
                else pos = a + (b - a) * c / want;
                if (count + 2 > out.length) out = Arrays.copyOf(out, 2 * out.length);
                out[count++] = c == Math.max(steps, want) ? b : pos;
            }
        }
        return Arrays.copyOf(out, count);
    }

    private static int[] assign(Geometry g, double[] r, double[] z) {
        int nr = r.length - 1, nz = z.length - 1;
        int[] out = new int[2 * nr * nz];
        Arrays.fill(out, -1);
        List<Region> regions = g.regions();
        for (int k = 0; k < regions.size(); k++) {
            Shape s = regions.get(k).shape();
            int i0 = cellOf(r, s.rMin()), j0 = cellOf(z, s.zMin());
            for (int j = j0; j < nz && z[j] < s.zMax(); j++) {
                for (int i = i0; i < nr && r[i] < s.rMax(); i++) {
                    // triangle 0: (i,j),(i+1,j),(i+1,j+1); triangle 1: (i,j),(i+1,j+1),(i,j+1)
                    for (int t = 0; t < 2; t++) {
                        double cr = t == 0 ? (r[i] + 2 * r[i + 1]) / 3 : (2 * r[i] + r[i + 1]) / 3;
                        double cz = t == 0 ? (2 * z[j] + z[j + 1]) / 3 : (z[j] + 2 * z[j + 1]) / 3;
                        if (!s.containsAt(cr, cz)) continue;
                        int e = 2 * (j * nr + i) + t;
                        if (out[e] >= 0) {
                            throw Require.fail("region " + Require.quote(regions.get(k).name()) + " overlaps region "
                                    + Require.quote(regions.get(out[e]).name()) + " near r " + Require.show(cr, Dimension.LENGTH) + ", z " + Require.show(cz, Dimension.LENGTH));
                        }
                        out[e] = k;
                    }
                }
            }
        }
        for (int k = 0; k < regions.size(); k++) {
            boolean any = false;
            for (int v : out) if (v == k) { any = true; break; }
            if (!any) throw Require.fail("region " + Require.quote(regions.get(k).name()) + " is thinner than one cell and got no triangles; give it a larger outline");
        }
        return out;
    }

    /** The cell i with a[i] ≤ v &lt; a[i+1], clamped to the grid. */
    static int cellOf(double[] a, double v) {
        int k = Arrays.binarySearch(a, v);
        if (k < 0) k = -k - 2;
        return Math.max(0, Math.min(a.length - 2, k));
    }

    /** The mesh with every cell halved in r and in z (four times the triangles). */
    public Mesh refined() {
        return new Mesh(geometry, halve(r), halve(z), level + 1);
    }

    static double[] halve(double[] a) {
        double[] out = new double[2 * a.length - 1];
        for (int i = 0; i < a.length - 1; i++) {
            out[2 * i] = a[i];
            out[2 * i + 1] = 0.5 * (a[i] + a[i + 1]);
        }
        out[out.length - 1] = a[a.length - 1];
        return out;
    }

    /** Solve the field on this mesh (Newton iterations when a region has a B-H table). */
    public Solution solve() {
        return Fem.solve(this);
    }

    /** The axial force on region {@code part}, by Maxwell stress and by virtual work (three solves). */
    public AxialForce force(String part) {
        return AxialForce.of(this, part);
    }

    public Geometry geometry() { return geometry; }
    /** Radii of the grid lines (m), rising from the axis. */
    public double[] radii() { return r.clone(); }
    /** Heights of the grid lines (m), rising. */
    public double[] heights() { return z.clone(); }
    public int nodes() { return r.length * z.length; }
    public int triangles() { return region.length; }
    /** How many times {@link #refined()} was applied. */
    public int refinements() { return level; }
    int nr() { return r.length; }
    int nzLines() { return z.length; }

    /** Smallest angle of any triangle (degrees); 45 for square cells. */
    public double minAngleDegrees() {
        double worst = 1;
        for (int i = 0; i + 1 < r.length; i++) {
            for (int j = 0; j + 1 < z.length; j++) {
                double a = r[i + 1] - r[i], b = z[j + 1] - z[j];
                worst = Math.min(worst, Math.min(a, b) / Math.max(a, b));
            }
        }
        return Math.toDegrees(Math.atan(worst));
    }

    /** Smallest cell side anywhere in the mesh. */
    public Quantity smallestCell() {
        double m = Double.POSITIVE_INFINITY;
        for (int i = 0; i + 1 < r.length; i++) m = Math.min(m, r[i + 1] - r[i]);
        for (int j = 0; j + 1 < z.length; j++) m = Math.min(m, z[j + 1] - z[j]);
        return Quantity.of(m, Dimension.LENGTH);
    }

    /** Domain of the mesh: radius and height. */
    public Quantity domainRadius() { return Quantity.of(r[r.length - 1], Dimension.LENGTH); }

    @Override
    public String toString() {
        return String.format("mesh %,d nodes, %,d triangles (%d × %d lines), smallest cell %s, min angle %.1f°%s", nodes(), triangles(), r.length, z.length,
                smallestCell(), minAngleDegrees(), level == 0 ? "" : ", refined " + level + "×");
    }
}
