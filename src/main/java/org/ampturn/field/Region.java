package org.ampturn.field;

import java.util.Objects;
import org.ampturn.material.MagneticMaterial;
import org.ampturn.material.Materials;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;

/**
 * A named region of a field geometry: an outline with a magnetic material, or a winding region of
 * {@code turns} carrying {@code current} spread uniformly over its cross-section (the current
 * density is N·I divided by the meshed area, so the ampere-turns are exact). A winding region is
 * non-magnetic (μr = 1). Immutable.
 */
public final class Region {
    private final String name;
    private final Shape shape;
    private final MagneticMaterial material;
    private final int turns;
    private final double current;

    private Region(String name, Shape shape, MagneticMaterial material, int turns, double current) {
        this.name = name;
        this.shape = shape;
        this.material = material;
        this.turns = turns;
        this.current = current;
    }

    /** A region of a magnetic material (air, a linear μr, or a B-H table). */
    public static Region of(String name, Shape shape, MagneticMaterial material) {
        Require.name("region", name);
        Require.present("shape of region " + Require.quote(name), shape);
        Require.present("material of region " + Require.quote(name), material);
        return new Region(name, shape, material, 0, 0);
    }

    /** A winding region of {@code turns} carrying {@code current} (uniform density). */
    public static Region winding(String name, Shape shape, int turns, Quantity current) {
        Require.name("region", name);
        Require.present("shape of region " + Require.quote(name), shape);
        Require.turns("turns of winding " + Require.quote(name), turns);
        double i = Require.si("current of winding " + Require.quote(name), current, Dimension.CURRENT);
        return new Region(name, shape, Materials.AIR, turns, checkCurrent(name, i));
    }

    /** A winding region with the turns of a designed {@code Winding} (its section is the outline given). */
    public static Region winding(String name, Shape shape, org.ampturn.wire.Winding winding, Quantity current) {
        Require.present("winding of region " + Require.quote(name), winding);
        return winding(name, shape, winding.turns(), current);
    }

    private static double checkCurrent(String name, double i) {
        return Require.between("current of winding " + Require.quote(name) + " (A)", i, -1e6, 1e6);
    }

    public String name() { return name; }
    public Shape shape() { return shape; }
    public MagneticMaterial material() { return material; }
    public boolean isWinding() { return turns > 0; }
    public int turns() { return turns; }
    public Quantity current() { return Quantity.of(current, Dimension.CURRENT); }
    double amps() { return current; }

    /** The same winding with another current. */
    public Region withCurrent(Quantity i) {
        if (!isWinding()) throw Require.fail("region " + Require.quote(name) + " is not a winding: it has no current");
        return withAmps(Require.si("current of winding " + Require.quote(name), i, Dimension.CURRENT));
    }

    Region withAmps(double i) {
        return new Region(name, shape, material, turns, checkCurrent(name, i));
    }

    Region shiftedAt(double dz) {
        return new Region(name, shape.shiftedAt(dz), material, turns, current);
    }

    /** True for a region that is magnetically more than air (μr above 1.5 or a B-H table). */
    boolean isMagnetic() {
        return !isWinding() && (!material.isLinear() || material.relativePermeability() > 1.5);
    }

    @Override
    public String toString() {
        String what = isWinding() ? turns + " turns at " + current() : material.name();
        return name + ": " + what + ", " + shape;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Region g && name.equals(g.name) && shape.equals(g.shape) && material.equals(g.material)
                && turns == g.turns && Double.compare(current, g.current) == 0;
    }

    @Override
    public int hashCode() {
        return Objects.hash(name, shape, turns, current);
    }
}
