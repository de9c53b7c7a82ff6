package org.ampturn.field;

import java.util.Arrays;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;

/**
 * A closed outline in the r-z half plane (r ≥ 0): a rectangle or a simple polygon, the cross-section
 * of a body of revolution about the z axis. Coordinates in metres. A polygon is given by its corners
 * in order (either sense); it must not cross itself.
 */
public final class Shape {
    private final double[] r;
    private final double[] z;
    private final boolean rect;

    private Shape(double[] r, double[] z, boolean rect) {
        this.r = r;
        this.z = z;
        this.rect = rect;
    }

    /** The rectangle with corners (r0, z0) and (r1, z1): radii r0 &lt; r1, heights z0 &lt; z1. */
    public static Shape rect(Quantity r0, Quantity z0, Quantity r1, Quantity z1) {
        return rectAt(Require.si("inner radius r0", r0, Dimension.LENGTH), Require.si("lower end z0", z0, Dimension.LENGTH),
                Require.si("outer radius r1", r1, Dimension.LENGTH), Require.si("upper end z1", z1, Dimension.LENGTH));
    }

    /** {@link #rect} in metres. */
    public static Shape rectAt(double r0, double z0, double r1, double z1) {
        Require.between("inner radius r0 (m)", r0, -Require.MAX_LENGTH, Require.MAX_LENGTH);
        Require.between("lower end z0 (m)", z0, -Require.MAX_LENGTH, Require.MAX_LENGTH);
        Require.between("outer radius r1 (m)", r1, -Require.MAX_LENGTH, Require.MAX_LENGTH);
        Require.between("upper end z1 (m)", z1, -Require.MAX_LENGTH, Require.MAX_LENGTH);
        if (!(r1 - r0 >= Require.MIN_LENGTH)) throw Require.fail("rectangle: outer radius r1 (" + show(r1) + ") must exceed inner radius r0 (" + show(r0) + ")");
        if (!(z1 - z0 >= Require.MIN_LENGTH)) throw Require.fail("rectangle: upper end z1 (" + show(z1) + ") must exceed lower end z0 (" + show(z0) + ")");
        return new Shape(new double[] {r0, r1, r1, r0}, new double[] {z0, z0, z1, z1}, true);
    }

    /**
     * A polygon through the points (r, z) given as pairs in metres: {@code r0, z0, r1, z1, ...}; at
     * least three corners, closed back to the first (repeating the first point at the end is allowed).
     */
    public static Shape polygonAt(double... rz) {
        Require.present("polygon corners", rz);
        if (rz.length % 2 != 0) throw Require.fail("polygon does not close: " + rz.length + " numbers is not a whole number of (r, z) pairs");
        int n = rz.length / 2;
        if (n >= 2 && rz[0] == rz[2 * n - 2] && rz[1] == rz[2 * n - 1]) n--;
        if (n < 3) throw Require.fail("polygon needs at least three corners, got " + n);
        double[] r = new double[n], z = new double[n];
        for (int i = 0; i < n; i++) {
            r[i] = Require.between("polygon r[" + i + "] (m)", rz[2 * i], -Require.MAX_LENGTH, Require.MAX_LENGTH);
            z[i] = Require.between("polygon z[" + i + "] (m)", rz[2 * i + 1], -Require.MAX_LENGTH, Require.MAX_LENGTH);
        }
        Shape s = new Shape(r, z, false);
        String why = s.defect();
        if (why != null) throw Require.fail("polygon " + why);
        return s;
    }

    /** A polygon of corners given as quantities, in pairs (r, z). */
    public static Shape polygon(Quantity... rz) {
        Require.present("polygon corners", rz);
        double[] v = new double[rz.length];
        for (int i = 0; i < v.length; i++) v[i] = Require.si("polygon corner " + (i / 2) + (i % 2 == 0 ? " r" : " z"), rz[i], Dimension.LENGTH);
        return polygonAt(v);
    }

    /** Why the polygon is unusable (repeated corner, crossing edges, no area), or null. */
    private String defect() {
        int n = r.length;
        for (int i = 0; i < n; i++) {
            int j = (i + 1) % n;
            if (r[i] == r[j] && z[i] == z[j]) return "repeats corner " + i + " at (" + show(r[i]) + ", " + show(z[i]) + ")";
        }
        for (int i = 0; i < n; i++) {
            for (int k = i + 1; k < n; k++) {
                if (k == i + 1 || (i == 0 && k == n - 1)) continue;
                if (segmentsMeet(r[i], z[i], r[(i + 1) % n], z[(i + 1) % n], r[k], z[k], r[(k + 1) % n], z[(k + 1) % n])) {
                    return "crosses itself: edge " + i + " meets edge " + k;
                }
            }
        }
        if (!(Math.abs(signedArea()) > 0)) return "encloses no area";
        return null;
    }

    static boolean segmentsMeet(double ax, double ay, double bx, double by, double cx, double cy, double dx, double dy) {
        double d1 = cross(cx, cy, dx, dy, ax, ay), d2 = cross(cx, cy, dx, dy, bx, by);
        double d3 = cross(ax, ay, bx, by, cx, cy), d4 = cross(ax, ay, bx, by, dx, dy);
        if (((d1 > 0 && d2 < 0) || (d1 < 0 && d2 > 0)) && ((d3 > 0 && d4 < 0) || (d3 < 0 && d4 > 0))) return true;
        return d1 == 0 && onSegment(cx, cy, dx, dy, ax, ay) || d2 == 0 && onSegment(cx, cy, dx, dy, bx, by)
                || d3 == 0 && onSegment(ax, ay, bx, by, cx, cy) || d4 == 0 && onSegment(ax, ay, bx, by, dx, dy);
    }

    /** Proper crossing only: the two segments cut through each other at one interior point. */
    static boolean segmentsCross(double ax, double ay, double bx, double by, double cx, double cy, double dx, double dy) {
        double d1 = cross(cx, cy, dx, dy, ax, ay), d2 = cross(cx, cy, dx, dy, bx, by);
        double d3 = cross(ax, ay, bx, by, cx, cy), d4 = cross(ax, ay, bx, by, dx, dy);
        return ((d1 > 0 && d2 < 0) || (d1 < 0 && d2 > 0)) && ((d3 > 0 && d4 < 0) || (d3 < 0 && d4 > 0));
    }

    private static double cross(double ax, double ay, double bx, double by, double px, double py) {
        return (bx - ax) * (py - ay) - (by - ay) * (px - ax);
    }

    private static boolean onSegment(double ax, double ay, double bx, double by, double px, double py) {
        return Math.min(ax, bx) <= px && px <= Math.max(ax, bx) && Math.min(ay, by) <= py && py <= Math.max(ay, by);
    }

    private double signedArea() {
        double a = 0;
        for (int i = 0, n = r.length; i < n; i++) {
            int j = (i + 1) % n;
            a += r[i] * z[j] - r[j] * z[i];
        }
        return a / 2;
    }

    /** True when (pr, pz) lies inside (even-odd rule; points on the outline may go either way). */
    public boolean containsAt(double pr, double pz) {
        if (rect) return pr > r[0] && pr < r[1] && pz > z[0] && pz < z[2];
        boolean in = false;
        for (int i = 0, j = r.length - 1; i < r.length; j = i++) {
            if ((z[i] > pz) != (z[j] > pz) && pr < (r[j] - r[i]) * (pz - z[i]) / (z[j] - z[i]) + r[i]) in = !in;
        }
        return in;
    }

    /** The same outline moved along z by {@code dz} metres. */
    Shape shiftedAt(double dz) {
        double[] nz = z.clone();
        for (int i = 0; i < nz.length; i++) nz[i] += dz;
        return new Shape(r.clone(), nz, rect);
    }

    /** True for a rectangle or a polygon whose edges all run along r or z (meshed exactly). */
    boolean isAxisAligned() {
        for (int i = 0, n = r.length; i < n; i++) {
            int j = (i + 1) % n;
            if (r[i] != r[j] && z[i] != z[j]) return false;
        }
        return true;
    }

    /** Radii of the corners (m), in order. */
    public double[] rs() { return r.clone(); }
    /** Heights of the corners (m), in order. */
    public double[] zs() { return z.clone(); }
    int corners() { return r.length; }
    double rAt(int i) { return r[i]; }
    double zAt(int i) { return z[i]; }
    double rMin() { return Arrays.stream(r).min().orElseThrow(); }
    double rMax() { return Arrays.stream(r).max().orElseThrow(); }
    double zMin() { return Arrays.stream(z).min().orElseThrow(); }
    double zMax() { return Arrays.stream(z).max().orElseThrow(); }

    /** Area of the cross-section (m²). */
    public Quantity area() { return Quantity.of(Math.abs(signedArea()), Dimension.AREA); }

    /** True when any edge of this outline properly crosses one of {@code o}, or a corner of one lies strictly inside the other. */
    boolean overlaps(Shape o) {
        for (int i = 0, n = r.length; i < n; i++) {
            for (int k = 0, m = o.r.length; k < m; k++) {
                if (segmentsCross(r[i], z[i], r[(i + 1) % n], z[(i + 1) % n], o.r[k], o.z[k], o.r[(k + 1) % m], o.z[(k + 1) % m])) return true;
            }
        }
        return false;
    }

    private static String show(double m) {
        return Require.show(m, Dimension.LENGTH);
    }

    @Override
    public String toString() {
        if (rect) return "rectangle r " + show(r[0]) + " to " + show(r[1]) + ", z " + show(z[0]) + " to " + show(z[2]);
        return "polygon of " + r.length + " corners, r " + show(rMin()) + " to " + show(rMax()) + ", z " + show(zMin()) + " to " + show(zMax());
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Shape s && rect == s.rect && Arrays.equals(r, s.r) && Arrays.equals(z, s.z);
    }

    @Override
    public int hashCode() {
        return 31 * Arrays.hashCode(r) + Arrays.hashCode(z);
    }
}
