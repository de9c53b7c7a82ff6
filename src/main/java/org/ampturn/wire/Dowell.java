package org.ampturn.wire;

import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;

/**
 * Dowell's method for the AC resistance of a layered winding: P. L. Dowell, "Effects of eddy
 * currents in transformer windings", Proc. IEE 113(8), 1387–1394 (1966).
 *
 * <p>A layer of round wires of diameter d at pitch s is replaced by square conductors of the same
 * area, side h = d·√π/2, and those by a foil of thickness h with the porosity (copper fraction
 * along the layer) η = h/s. The normalised layer thickness is Δ = √η · h/δ, that is
 * Δ = (π/4)^(3/4) · (d/δ) · √(d/s).
 * The ratio of AC to DC resistance of layer m (counted from the zero of the magnetomotive force) is
 * F_m = Δ·[ς1(Δ) + 2m(m − 1)·ς2(Δ)], and for a winding of p layers in one portion of a winding
 * (MMF rising from zero to its peak) the mean is
 * F_R = Δ·[ς1(Δ) + (2/3)(p² − 1)·ς2(Δ)],
 * with ς1 = (sinh 2Δ + sin 2Δ)/(cosh 2Δ − cos 2Δ) and ς2 = (sinh Δ − sin Δ)/(cosh Δ + cos Δ).
 *
 * <p>Range: sinusoidal current; one-dimensional field parallel to the layers (layers filling the
 * window width, a gapped core or open winding breaks this); the foil equivalence is good for
 * η ≳ 0.7 and errs on the high side for sparse layers (common practice, see the literature on
 * Dowell's porosity factor). For an interleaved winding, use p of each MMF portion.
 */
public final class Dowell {
    private Dowell() {}

    /**
     * F_R of a winding portion of {@code layers} layers of {@code wire} at turn pitch {@code pitch}
     * (overall diameter for close-wound turns), sinusoidal current of {@code frequency}, at 20 °C.
     */
    public static double factor(Wire wire, Quantity pitch, int layers, Quantity frequency) {
        double s = Require.length("turn pitch", pitch);
        double f = Require.positive("frequency", frequency, Dimension.FREQUENCY);
        if (s < wire.bareDiameterM()) {
            throw Require.fail("turn pitch must be at least the bare diameter " + wire.bareDiameter() + ", got " + pitch);
        }
        double delta = SkinEffect.depthAt(wire.conductor().rho20(), f);
        return factorAt(deltaOfRoundWire(wire.bareDiameterM(), s, delta), layers);
    }

    /** Kernel: normalised layer thickness Δ of round wire of diameter d at pitch s, skin depth δ (all m). */
    public static double deltaOfRoundWire(double diameter, double pitch, double skinDepth) {
        Require.between("wire diameter", diameter, Dimension.LENGTH, Require.MIN_LENGTH, Require.MAX_LENGTH);
        Require.between("turn pitch", pitch, Dimension.LENGTH, Require.MIN_LENGTH, Require.MAX_LENGTH);
        Require.between("skin depth", skinDepth, Dimension.LENGTH, Require.MIN_LENGTH, Require.MAX_LENGTH);
        return Require.result("delta of round wire", Math.pow(Math.PI / 4, 0.75) * (diameter / skinDepth) * Math.sqrt(diameter / pitch));
    }

    /** Kernel: ς1(Δ) = (sinh 2Δ + sin 2Δ)/(cosh 2Δ − cos 2Δ). */
    public static double varsigma1(double delta) {
        Require.finite("Dowell's Δ (conductor thickness over skin depth)", delta);
        double x = 2 * delta;
        if (x < 1e-3) return Require.result("varsigma1", 1 / delta * (1 + Math.pow(delta, 4) * 4 / 45)); // series: ς1 ≈ 1/Δ + 4Δ³/45
        if (x > 40) return Require.result("varsigma1", 1);
        return Require.result("varsigma1", (Math.sinh(x) + Math.sin(x)) / (Math.cosh(x) - Math.cos(x)));
    }

    /** Kernel: ς2(Δ) = (sinh Δ − sin Δ)/(cosh Δ + cos Δ). */
    public static double varsigma2(double delta) {
        Require.finite("Dowell's Δ (conductor thickness over skin depth)", delta);
        if (delta < 1e-3) return Require.result("varsigma2", Math.pow(delta, 3) / 6); // series: ς2 ≈ Δ³/6
        if (delta > 40) return Require.result("varsigma2", 1);
        return Require.result("varsigma2", (Math.sinh(delta) - Math.sin(delta)) / (Math.cosh(delta) + Math.cos(delta)));
    }

    /** Kernel: F_R of layer m (1 = next to the MMF zero) at normalised thickness Δ. */
    public static double layerFactorAt(double delta, int layer) {
        Require.finite("Dowell's Δ (conductor thickness over skin depth)", delta);
        Require.positive("layer", layer);
        return Require.result("layer factor", delta * (varsigma1(delta) + 2.0 * layer * (layer - 1) * varsigma2(delta)));
    }

    /** Kernel: mean F_R of a winding portion of p layers at normalised thickness Δ. */
    public static double factorAt(double delta, int layers) {
        Require.finite("Dowell's Δ (conductor thickness over skin depth)", delta);
        Require.positive("layers", layers);
        Require.nonNegative("normalised layer thickness Δ", delta);
        if (delta == 0) return Require.result("factor", 1);
        return Require.result("factor", delta * (varsigma1(delta) + 2.0 / 3 * ((double) layers * layers - 1) * varsigma2(delta)));
    }
}
