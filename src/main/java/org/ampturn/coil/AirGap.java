package org.ampturn.coil;

import java.util.List;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;

/**
 * An air gap in a magnetic circuit: reluctance R = l<sub>g</sub>/(μ0·A·F), F the fringing factor
 * (1 without fringing).
 *
 * <p>Fringing: McLyman's factor F = 1 + (l<sub>g</sub>/√A<sub>c</sub>)·ln(2G/l<sub>g</sub>), G the
 * height of the winding window (C. Wm. T. McLyman, Transformer and Inductor Design Handbook, 3rd ed.,
 * 2004, ch. 8, "fringing flux"; from memory). It widens the gap's effective area by F. Approximate:
 * meant for gaps small against both √A<sub>c</sub> and G (l<sub>g</sub> ≲ √A<sub>c</sub>/4, say);
 * McLyman's examples give F of about 1.1 to 1.5. Needs G &gt; l<sub>g</sub>/2 (F ≥ 1).
 */
public final class AirGap implements MagneticCircuit {
    private final double length;
    private final double area;
    private final double fringing;
    private final double window;

    private AirGap(double length, double area, double fringing, double window) {
        this.length = length;
        this.area = area;
        this.fringing = fringing;
        this.window = window;
    }

    /** A gap of {@code length} across pole faces of {@code area}, without fringing. */
    public static AirGap of(Quantity length, Quantity area) {
        double g = Require.length("gap length", length);
        double a = Require.positive("gap area", area, Dimension.AREA);
        return new AirGap(g, a, 1, Double.NaN);
    }

    /** The same gap with McLyman's fringing factor for a winding window of height {@code windowHeight}. */
    public AirGap withFringing(Quantity windowHeight) {
        double gw = Require.length("window height", windowHeight);
        if (!(2 * gw > length)) {
            throw Require.fail("window height (" + windowHeight + ") must exceed half the gap " + length()
                    + " for McLyman's fringing factor; valid range: > " + Quantity.of(length / 2, Dimension.LENGTH));
        }
        return new AirGap(length, area, mcLymanFactor(length, area, gw), gw);
    }

    /** McLyman's fringing factor F = 1 + (lg/√Ac)·ln(2G/lg); lengths in m, area in m². */
    public static double mcLymanFactor(double gap, double area, double windowHeight) {
        Require.between("gap length", gap, Dimension.LENGTH, Require.MIN_LENGTH, Require.MAX_LENGTH);
        Require.between("area", area, Dimension.AREA, Require.MIN_LENGTH * Require.MIN_LENGTH, Require.MAX_LENGTH * Require.MAX_LENGTH);
        Require.between("window height", windowHeight, Dimension.LENGTH, Require.MIN_LENGTH, Require.MAX_LENGTH);
        return Require.result("mc lyman factor", 1 + gap / Math.sqrt(area) * Math.log(2 * windowHeight / gap));
    }

    public Quantity length() { return Quantity.of(length, Dimension.LENGTH); }
    public Quantity area() { return Quantity.of(area, Dimension.AREA); }
    /** The fringing factor F (1 when no fringing is modelled). */
    public double fringingFactor() { return fringing; }

    @Override public String name() { return "gap " + length(); }
    @Override public double reluctanceSI() { return length / (MU0 * area * fringing); }
    @Override public boolean isLinear() { return true; }
    @Override public double c1() { return length / area; }
    @Override public double c2() { return length / (area * area); }
    @Override public double fluxAt(double ampereTurns) {
        Require.finite("mmf (A)", ampereTurns);
        return Require.result("flux", ampereTurns / reluctanceSI());
    }
    @Override public double mmfAt(double weber) {
        Require.finite("flux (Wb)", weber);
        return Require.result("mmf", weber * reluctanceSI());
    }
    @Override public List<MagneticCircuit> parts() { return List.of(this); }

    /** Flux density in the gap, Φ/(F·A): the flux spread over the area widened by fringing. */
    @Override
    public void fluxDensities(double weber, double[] out, int[] next) {
        out[next[0]++] = weber / (area * fringing);
    }

    @Override
    public String toString() {
        String f = fringing == 1 ? "no fringing" : "fringing factor " + Quantity.number(fringing) + " (McLyman, window " + Quantity.of(window, Dimension.LENGTH) + ")";
        return "air gap " + length() + " over " + area() + ", " + f + "; R = " + reluctance();
    }
}
