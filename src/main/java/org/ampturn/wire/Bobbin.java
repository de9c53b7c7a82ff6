package org.ampturn.wire;

import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;

/**
 * The space a winding is wound into: a bobbin (or former) with a winding width between its cheeks
 * and a depth from the tube to the limit of the winding, around either a round tube or a
 * rectangular core leg. Immutable.
 *
 * <p>The length of a turn at a height r above the tube is π·(D + 2r) on a round tube of outer
 * diameter D, and 2(a + b) + 2πr on a rectangular tube a × b with sharp corners (the turn follows
 * the tube sides and rounds each corner with a quarter circle of radius r, common practice).
 */
public final class Bobbin {
    private final double width;
    private final double depth;
    private final double innerDiameter; // round tube; NaN for rectangular
    private final double sideA;
    private final double sideB;

    private Bobbin(double width, double depth, double innerDiameter, double sideA, double sideB) {
        this.width = width;
        this.depth = depth;
        this.innerDiameter = innerDiameter;
        this.sideA = sideA;
        this.sideB = sideB;
    }

    /**
     * A round bobbin or former.
     *
     * @param width winding width, between the cheeks (axial)
     * @param innerDiameter diameter the first layer is wound on (outside of the tube)
     * @param depth radial depth available for the winding
     */
    public static Bobbin of(Quantity width, Quantity innerDiameter, Quantity depth) {
        double w = Require.length("winding width", width);
        double di = Require.length("inner diameter", innerDiameter);
        double h = Require.length("winding depth", depth);
        return new Bobbin(w, h, di, Double.NaN, Double.NaN);
    }

    /**
     * A bobbin on a rectangular core leg (an E core's centre leg, a C core's limb).
     *
     * @param width winding width, between the cheeks
     * @param tubeSideA one side of the rectangle the first layer is wound on
     * @param tubeSideB the other side
     * @param depth depth available for the winding
     */
    public static Bobbin rectangular(Quantity width, Quantity tubeSideA, Quantity tubeSideB, Quantity depth) {
        double w = Require.length("winding width", width);
        double a = Require.length("tube side A", tubeSideA);
        double b = Require.length("tube side B", tubeSideB);
        double h = Require.length("winding depth", depth);
        return new Bobbin(w, h, Double.NaN, a, b);
    }

    public boolean isRound() { return !Double.isNaN(innerDiameter); }

    public Quantity width() { return Quantity.of(width, Dimension.LENGTH); }

    public Quantity depth() { return Quantity.of(depth, Dimension.LENGTH); }

    /** Winding window area, width × depth. */
    public Quantity windowArea() { return Quantity.of(width * depth, Dimension.AREA); }

    /** Inner diameter of a round bobbin; fails for a rectangular one. */
    public Quantity innerDiameter() {
        if (!isRound()) throw new IllegalStateException("a rectangular bobbin has no inner diameter; see tubeSideA() and tubeSideB()");
        return Quantity.of(innerDiameter, Dimension.LENGTH);
    }

    public Quantity tubeSideA() { return Quantity.of(isRound() ? innerDiameter : sideA, Dimension.LENGTH); }

    public Quantity tubeSideB() { return Quantity.of(isRound() ? innerDiameter : sideB, Dimension.LENGTH); }

    /** The most turns of {@code wire} that fit, wound layer on layer. */
    public int capacity(Wire wire) { return capacity(wire, Packing.LAYERED); }

    /** The most turns of {@code wire} that fit with the given packing. */
    public int capacity(Wire wire, Packing packing) {
        double d = wire.overallDiameterM();
        int perLayer = Layout.turnsPerLayer(width, d, 1, packing);
        if (perLayer <= 0) return 0;
        long layers = Layout.layersThatFit(depth, d, packing);
        long odd = perLayer, even = Layout.turnsPerLayer(width, d, 2, packing);
        long total = packing == Packing.LAYERED ? layers * odd : (layers + 1) / 2 * odd + layers / 2 * even;
        return (int) Math.min(Integer.MAX_VALUE, total);
    }

    // ---- kernels ----
    double widthM() { return width; }
    double depthM() { return depth; }

    /** Kernel: length (m) of one turn whose centre is at height r (m) above the tube. */
    public double turnLengthAt(double heightAboveTube) {
        Require.finite("height above tube", heightAboveTube);
        if (isRound()) return Require.result("turn length", Math.PI * (innerDiameter + 2 * heightAboveTube));
        return Require.result("turn length", 2 * (sideA + sideB) + 2 * Math.PI * heightAboveTube);
    }

    /** Kernel: the perimeter of the outside of a winding of build b (m) (for its cooling surface). */
    double perimeterAt(double build) {
        return turnLengthAt(build);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Bobbin b && b.width == width && b.depth == depth && Double.compare(b.innerDiameter, innerDiameter) == 0
                && Double.compare(b.sideA, sideA) == 0 && Double.compare(b.sideB, sideB) == 0;
    }

    @Override
    public int hashCode() { return java.util.Objects.hash(width, depth, innerDiameter, sideA, sideB); }

    @Override
    public String toString() {
        String tube = isRound() ? "Ø" + innerDiameter() + " tube" : tubeSideA() + " × " + tubeSideB() + " tube";
        return "bobbin " + width() + " wide, " + depth() + " deep on a " + tube;
    }
}
