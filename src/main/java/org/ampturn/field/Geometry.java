package org.ampturn.field;

import java.util.ArrayList;
import java.util.List;
import org.ampturn.material.MagneticMaterial;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;

/**
 * A body of revolution described in the r-z half plane: named regions (materials and windings) in
 * air, inside a truncated domain whose outer boundary carries A = 0. By default the domain reaches
 * {@link #domainFactor()} times the device's size beyond it in r and z (a truncated domain, Silvester
 * and Ferrari, Finite Elements for Electrical Engineers, Cambridge, chapter on open boundaries, from
 * memory); the error this leaves in an air coil's inductance is measured in lib-docs/field.md.
 * Mesh settings travel with the geometry: the largest cell in the device is its size divided by
 * {@link #cellsAcross()}, every interval between region corners gets at least three cells, and cells
 * grow by at most 25 % from one to the next. Immutable; {@code with…} copies check each region.
 */
public final class Geometry {
    static final double GROWTH = 1.25;
    private final List<Region> regions;
    private final double factor;
    private final int cells;
    private final double[] domain; // rMax, zMin, zMax or null (automatic)

    private Geometry(List<Region> regions, double factor, int cells, double[] domain) {
        this.regions = List.copyOf(regions);
        this.factor = factor;
        this.cells = cells;
        this.domain = domain;
    }

    /** An empty geometry: air only, domain factor 8, 12 cells across the device. */
    public static Geometry of() {
        return new Geometry(List.of(), 8, 12, null);
    }

    /** This geometry with one more region; fails when it overlaps another, lies at r &lt; 0 or outside the domain. */
    public Geometry with(Region region) {
        Require.present("region", region);
        for (Region g : regions) {
            if (g.name().equals(region.name())) throw Require.fail("region " + Require.quote(region.name()) + " is already in the geometry; give each region its own name");
        }
        check(region, regions, domain);
        List<Region> list = new ArrayList<>(regions);
        list.add(region);
        return new Geometry(list, factor, cells, domain);
    }

    /** This geometry with a region of material {@code material}. */
    public Geometry with(String name, Shape shape, MagneticMaterial material) {
        return with(Region.of(name, shape, material));
    }

    /** This geometry with a winding region of {@code turns} carrying {@code current}. */
    public Geometry withWinding(String name, Shape shape, int turns, Quantity current) {
        return with(Region.winding(name, shape, turns, current));
    }

    private static void check(Region region, List<Region> others, double[] domain) {
        Shape s = region.shape();
        if (!(s.rMin() >= 0)) throw Require.fail("region " + Require.quote(region.name()) + " reaches r = " + Require.show(s.rMin(), Dimension.LENGTH) + "; radii must be zero or more (the z axis is r = 0)");
        if (domain != null && (s.rMax() > domain[0] || s.zMin() < domain[1] || s.zMax() > domain[2])) {
            throw Require.fail("region " + Require.quote(region.name()) + " (" + s + ") lies outside the domain r 0 to " + Require.show(domain[0], Dimension.LENGTH)
                    + ", z " + Require.show(domain[1], Dimension.LENGTH) + " to " + Require.show(domain[2], Dimension.LENGTH));
        }
        for (Region o : others) {
            if (o.shape().overlaps(s) || boxesOverlap(o.shape(), s) && (inside(o.shape(), s) || inside(s, o.shape()))) {
                String kind = region.isWinding() && o.isMagnetic() || o.isWinding() && region.isMagnetic() ? "a winding inside iron: " : "";
                throw Require.fail("region " + Require.quote(region.name()) + " overlaps region " + Require.quote(o.name()) + " (" + kind + o.shape() + "); regions must not share area");
            }
        }
    }

    private static boolean boxesOverlap(Shape a, Shape b) {
        return a.rMin() < b.rMax() && b.rMin() < a.rMax() && a.zMin() < b.zMax() && b.zMin() < a.zMax();
    }

    /** True when a point just inside {@code a} near one of its corners, or its middle, lies inside {@code b}. */
    private static boolean inside(Shape a, Shape b) {
        double cr = 0, cz = 0;
        int n = a.corners();
        for (int i = 0; i < n; i++) { cr += a.rAt(i); cz += a.zAt(i); }
        cr /= n;
        cz /= n;
        if (a.containsAt(cr, cz) && b.containsAt(cr, cz)) return true;
        for (int i = 0; i < n; i++) {
            double pr = a.rAt(i) + 1e-6 * (cr - a.rAt(i)), pz = a.zAt(i) + 1e-6 * (cz - a.zAt(i));
            if (a.containsAt(pr, pz) && b.containsAt(pr, pz)) return true;
        }
        return false;
    }

    /** The same geometry with region {@code name} moved along z by {@code dz} (a plunger at a stroke). */
    public Geometry moved(String name, Quantity dz) {
        return movedAt(name, Require.si("move of " + Require.quote(name), dz, Dimension.LENGTH));
    }

    Geometry movedAt(String name, double dz) {
        Require.between("move of " + Require.quote(name) + " (m)", dz, -Require.MAX_LENGTH, Require.MAX_LENGTH);
        int k = indexOf(name);
        Region moved = regions.get(k).shiftedAt(dz);
        List<Region> others = new ArrayList<>(regions);
        others.remove(k);
        try {
            check(moved, others, domain);
        } catch (IllegalArgumentException e) {
            throw Require.fail("moving " + Require.quote(name) + " by " + Require.show(dz, Dimension.LENGTH) + ": " + e.getMessage());
        }
        List<Region> list = new ArrayList<>(regions);
        list.set(k, moved);
        return new Geometry(list, factor, cells, domain);
    }

    /** The same geometry with winding {@code name} at another current. */
    public Geometry withCurrent(String name, Quantity current) {
        return withAmps(name, Require.si("current of " + Require.quote(name), current, Dimension.CURRENT));
    }

    Geometry withAmps(String name, double amps) {
        int k = indexOf(name);
        Region g = regions.get(k);
        if (!g.isWinding()) throw Require.fail("region " + Require.quote(name) + " is not a winding: it has no current");
        List<Region> list = new ArrayList<>(regions);
        list.set(k, g.withAmps(amps));
        return new Geometry(list, factor, cells, domain);
    }

    /** The same geometry with the domain reaching {@code factor} device sizes beyond the device (2 to 100). */
    public Geometry withDomainFactor(double factor) {
        Require.between("domain factor", factor, 2, 100);
        return new Geometry(regions, factor, cells, null);
    }

    /** The same geometry inside a fixed domain r 0 to rMax, z zMin to zMax (A = 0 on its outer edges). */
    public Geometry withDomain(Quantity rMax, Quantity zMin, Quantity zMax) {
        double r = Require.length("domain radius", rMax);
        double z0 = Require.si("domain lower end", zMin, Dimension.LENGTH), z1 = Require.si("domain upper end", zMax, Dimension.LENGTH);
        if (!(z1 > z0)) throw Require.fail("domain upper end (" + zMax + ") must be above its lower end (" + zMin + ")");
        double[] d = {r, z0, z1};
        for (Region g : regions) check(g, List.of(), d);
        return new Geometry(regions, factor, cells, d);
    }

    /** The same geometry meshed with at most size/{@code cells} per cell in the device (4 to 400). */
    public Geometry withCellsAcross(int cells) {
        Require.between("cells across the device", cells, 4, 400);
        return new Geometry(regions, factor, cells, domain);
    }

    public List<Region> regions() { return regions; }
    public double domainFactor() { return factor; }
    public int cellsAcross() { return cells; }

    /** The region called {@code name}. */
    public Region region(String name) {
        return regions.get(indexOf(name));
    }

    int indexOf(String name) {
        Require.present("region name", name);
        for (int i = 0; i < regions.size(); i++) if (regions.get(i).name().equals(name)) return i;
        List<String> names = new ArrayList<>();
        for (Region g : regions) names.add(g.name());
        throw Require.fail("no region " + Require.quote(name) + " in the geometry; its regions are " + Require.names(names));
    }

    /** The domain as {rMax, zMin, zMax} (m). */
    double[] domainAt() {
        if (regions.isEmpty()) throw Require.fail("the geometry has no regions; add a winding and its parts first");
        if (domain != null) return domain.clone();
        double rDev = 0, z0 = Double.POSITIVE_INFINITY, z1 = Double.NEGATIVE_INFINITY;
        for (Region g : regions) {
            rDev = Math.max(rDev, g.shape().rMax());
            z0 = Math.min(z0, g.shape().zMin());
            z1 = Math.max(z1, g.shape().zMax());
        }
        double size = Math.max(rDev, z1 - z0);
        return new double[] {rDev + factor * size, z0 - factor * size, z1 + factor * size};
    }

    /** The mesh of this geometry. */
    public Mesh mesh() {
        return Mesh.of(this);
    }

    /** Solve on the default mesh. */
    public Solution solve() {
        return mesh().solve();
    }

    /** The axial force on region {@code part} on the default mesh, both ways. */
    public AxialForce force(String part) {
        return mesh().force(part);
    }

    @Override
    public String toString() {
        List<String> names = new ArrayList<>();
        for (Region g : regions) names.add(g.name());
        return "geometry of " + regions.size() + (regions.size() == 1 ? " region " : " regions ") + names + ", domain factor " + Require.show(factor) + ", " + cells + " cells across";
    }
}
