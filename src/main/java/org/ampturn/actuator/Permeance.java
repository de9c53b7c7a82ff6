package org.ampturn.actuator;

import org.ampturn.material.MagneticMaterial;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;

/**
 * Permeances of air paths by the method of probable flux paths: the field around a gap is split
 * into simple shapes whose permeance follows from a mean path length and a mean area, or from
 * integrating along assumed circular paths (H. C. Roters, Electromagnetic Devices, Wiley 1941,
 * ch. 5; the formulas here are from memory of that method and are checked in the tests against
 * their own derivations). Kernels in SI (henries, metres); μ0 = 4π·10⁻⁷ H/m.
 * <ul>
 * <li>Parallel faces: P = μ0·A/g.</li>
 * <li>Half cylinder between the two side edges of a gap (fringing right at the edge), length l
 *     along the edge: mean path 1.22·g, mean area 0.322·g·l, so P = 0.264·μ0·l (Roters' 0.26·μ0·l),
 *     whatever the gap.</li>
 * <li>Half annulus from the side faces, of radial width t beyond the half cylinder, along
 *     semicircular paths of radius r from g/2 to g/2 + t: P = (μ0·l/π)·ln(1 + 2t/g) (exact for
 *     such paths); Roters' mean-length form 2μ0·l·t/(π(g + t)) agrees closely for t &lt; 3g.</li>
 * <li>Leakage between coaxial cylinders of radii r1 &lt; r2 over a coil of length l, with the MMF
 *     rising linearly along it: P = 2π·μ0·l/ln(r2/r1), of which one third counts for the
 *     flux linkage and the stored energy (the linearly distributed MMF; Roters ch. 7).</li>
 * </ul>
 * Range: gaps short against the pole's width; the shapes are estimates of a field plot, good to
 * some ten per cent for the fringe itself (Roters ch. 5).
 */
public final class Permeance {
    private Permeance() {}

    static final double MU0 = MagneticMaterial.MU0;

    /** μ0·A/g (H). */
    public static double parallelFacesAt(double area, double gap) {
        return Require.result("permeance", MU0 * area / gap);
    }

    /** μ0·(0.322/1.22)·l (H): the half cylinder along an edge of length l. */
    public static double halfCylinderAt(double edgeLength) {
        return Require.result("permeance", MU0 * 0.322 / 1.22 * edgeLength);
    }

    /** (μ0·l/π)·ln(1 + 2t/g) (H): the half annulus of width t along an edge of length l at gap g. */
    public static double halfAnnulusAt(double edgeLength, double gap, double width) {
        return Require.result("permeance", MU0 * edgeLength / Math.PI * Math.log1p(2 * width / gap));
    }

    /** d/dg of the half annulus: −(μ0·l/π)·2t/(g·(g + 2t)) (H/m). */
    static double halfAnnulusSlopeAt(double edgeLength, double gap, double width) {
        return -MU0 * edgeLength / Math.PI * 2 * width / (gap * (gap + 2 * width));
    }

    /** 2π·μ0·l/ln(r2/r1) (H): between coaxial cylinders (all of it; a coil's linearly rising MMF counts a third). */
    public static double coaxialAt(double length, double innerRadius, double outerRadius) {
        return Require.result("permeance", 2 * Math.PI * MU0 * length / Math.log(outerRadius / innerRadius));
    }

    /** The half cylinder along an edge: 0.264·μ0·l. */
    public static Quantity halfCylinder(Quantity edgeLength) {
        return perm(halfCylinderAt(Require.length("edge length", edgeLength)));
    }

    /** The half annulus of width t along an edge of length l at gap g. */
    public static Quantity halfAnnulus(Quantity edgeLength, Quantity gap, Quantity width) {
        return perm(halfAnnulusAt(Require.length("edge length", edgeLength), Require.length("gap", gap), Require.length("fringe width", width)));
    }

    /** Parallel faces: μ0·A/g. */
    public static Quantity parallelFaces(Quantity area, Quantity gap) {
        return perm(parallelFacesAt(Require.positive("pole area", area, Dimension.AREA), Require.length("gap", gap)));
    }

    /** Between coaxial cylinders of radii r1 &lt; r2 over a length l. */
    public static Quantity coaxial(Quantity length, Quantity innerRadius, Quantity outerRadius) {
        double l = Require.length("length", length), r1 = Require.length("inner radius", innerRadius), r2 = Require.length("outer radius", outerRadius);
        if (!(r2 > r1)) throw Require.fail("outer radius (" + outerRadius + ") must be greater than the inner radius (" + innerRadius + ")");
        return perm(coaxialAt(l, r1, r2));
    }

    private static Quantity perm(double h) {
        return Quantity.of(h, Dimension.INDUCTANCE);
    }
}
