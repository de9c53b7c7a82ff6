package org.ampturn.wire;

import org.ampturn.units.Require;
/** The lattice of a round-wire winding (see {@link Packing}); lengths in metres. */
final class Layout {
    private Layout() {}

    private static final double ROOT3_2 = Math.sqrt(3) / 2;
    private static final double EPS = 1e-9; // a turn that fits to within a nanometre fits

    /** Turns in layer k (1-based) across a width w for wire of overall diameter d. */
    static int turnsPerLayer(double w, double d, int k, Packing p) {
        double usable = (p == Packing.ORTHOCYCLIC && k % 2 == 0) ? w - d / 2 : w;
        return (int) Math.floor(usable / d * (1 + EPS));
    }

    /** Layers that fit in a depth h. */
    static int layersThatFit(double h, double d, Packing p) {
        if (h < d * (1 - EPS)) return 0;
        if (h / d > 1e8) throw Require.fail("the winding depth is more than 1e8 wire diameters; check the units");
        if (p == Packing.LAYERED) return (int) Math.floor(h / d * (1 + EPS));
        return 1 + (int) Math.floor((h - d) / (d * ROOT3_2) * (1 + EPS) + EPS);
    }

    /** Layers needed for n turns (layer 1 holding a turns, even layers b when orthocyclic). */
    static long layersNeeded(long n, int a, int b, Packing p) {
        if (p == Packing.LAYERED) return (n + a - 1) / a;
        if (b == 0) return 2 * ((n + a - 1) / a) - 1;
        long pairs = n / (a + b), rem = n - pairs * (a + b);
        if (rem == 0) return 2 * pairs;
        return rem <= a ? 2 * pairs + 1 : 2 * pairs + 2;
    }

    /** Height of the centre of layer k above the tube. */
    static double layerCentre(double d, int k, Packing p) {
        return p == Packing.LAYERED ? (k - 0.5) * d : d / 2 + (k - 1) * d * ROOT3_2;
    }

    /** Depth taken by n layers. */
    static double build(double d, int layers, Packing p) {
        if (layers == 0) return 0;
        return p == Packing.LAYERED ? layers * d : d + (layers - 1) * d * ROOT3_2;
    }

    /** Layer pitch (centre to centre). */
    static double layerPitch(double d, Packing p) {
        return p == Packing.LAYERED ? d : d * ROOT3_2;
    }
}
