package org.ampturn.wire;

import java.util.Objects;
import org.ampturn.material.Conductor;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;

/**
 * A winding: a number of turns of one {@link Wire} on a {@link Bobbin}, laid in layers with a
 * {@link Packing}. Immutable. It knows its geometry (turns per layer, layers, build, mean length of
 * turn, wire length, fill) and its copper (resistance at a temperature, mass); the coil package adds
 * the magnetics.
 *
 * <p>Layers are filled from the tube outwards; the last layer may be partly filled. The wire length
 * is the sum over layers of (turns in the layer) × (length of a turn at the layer's centre height),
 * so the mean length of turn is exact for the lattice (leads are not included). Resistance is
 * R(T) = ρ(T)·ℓ/A with ρ(T) from the conductor (IEC 60028 for copper).
 */
public final class Winding {
    private final Wire wire;
    private final int turns;
    private final Bobbin bobbin;
    private final Packing packing;
    // derived
    private final int[] perLayer;
    private final double length;

    private Winding(Wire wire, int turns, Bobbin bobbin, Packing packing) {
        this.wire = wire;
        this.turns = turns;
        this.bobbin = bobbin;
        this.packing = packing;
        double d = wire.overallDiameterM();
        int first = Layout.turnsPerLayer(bobbin.widthM(), d, 1, packing);
        if (first < 1) {
            throw Require.fail("the wire (" + wire.size() + ", " + wire.overallDiameter()
                    + " overall) is wider than the winding width " + bobbin.width() + ": not one turn fits in a layer");
        }
        int second = Layout.turnsPerLayer(bobbin.widthM(), d, 2, packing);
        long needed = Layout.layersNeeded(turns, first, second, packing);
        double build = Layout.build(d, (int) Math.min(Integer.MAX_VALUE, needed), packing);
        if (build > bobbin.depthM() * (1 + 1e-9)) {
            int cap = bobbin.capacity(wire, packing);
            throw Require.fail(turns + " turns of " + wire.size() + " (" + wire.overallDiameter() + " overall) do not fit: "
                    + "they need " + needed + " layers of up to " + first + " turns (" + packing + "), "
                    + q(build) + " deep, and the bobbin is " + bobbin.depth() + " deep, " + q(build - bobbin.depthM())
                    + " too shallow. It holds at most " + cap + " turns, " + (turns - cap) + " fewer than asked");
        }
        int n = (int) needed;
        int[] layers = new int[n];
        int left = turns;
        double len = 0;
        for (int i = 0; i < n; i++) {
            int k = i + 1;
            int in = Math.min(left, Layout.turnsPerLayer(bobbin.widthM(), d, k, packing));
            layers[i] = in;
            left -= in;
            len += in * bobbin.turnLengthAt(Layout.layerCentre(d, k, packing));
        }
        this.perLayer = layers;
        this.length = len;
    }

    private static Quantity q(double metres) { return Quantity.of(metres, Dimension.LENGTH); }

    /** {@code turns} turns of {@code wire} on {@code bobbin}, wound layer on layer. Fails when they do not fit. */
    public static Winding of(Wire wire, int turns, Bobbin bobbin) {
        return of(wire, turns, bobbin, Packing.LAYERED);
    }

    /** {@code turns} turns of {@code wire} on {@code bobbin} with the given packing. Fails when they do not fit. */
    public static Winding of(Wire wire, int turns, Bobbin bobbin, Packing packing) {
        Require.present("wire", wire);
        Require.present("bobbin", bobbin);
        Require.present("packing", packing);
        Require.turns("turns", turns);
        return new Winding(wire, turns, bobbin, packing);
    }

    /** The most turns that fill the bobbin with this wire and packing. */
    public static Winding full(Wire wire, Bobbin bobbin, Packing packing) {
        Require.present("wire", wire);
        Require.present("bobbin", bobbin);
        Require.present("packing", packing);
        int cap = bobbin.capacity(wire, packing);
        if (cap < 1) {
            throw Require.fail("not one turn of " + wire.size() + " (" + wire.overallDiameter() + " overall) fits on the "
                    + bobbin);
        }
        return new Winding(wire, cap, bobbin, packing);
    }

    public Winding withTurns(int n) { return of(wire, n, bobbin, packing); }

    public Winding withWire(Wire w) { return of(w, turns, bobbin, packing); }

    public Winding withBobbin(Bobbin b) { return of(wire, turns, b, packing); }

    public Winding withPacking(Packing p) { return of(wire, turns, bobbin, p); }

    public Wire wire() { return wire; }

    public int turns() { return turns; }

    public Bobbin bobbin() { return bobbin; }

    public Packing packing() { return packing; }

    public Conductor conductor() { return wire.conductor(); }

    /** Turns in a full first layer. */
    public int turnsPerLayer() { return Layout.turnsPerLayer(bobbin.widthM(), wire.overallDiameterM(), 1, packing); }

    /** Number of layers, the last possibly part-filled. */
    public int layers() { return perLayer.length; }

    /** Turns in each layer, from the tube outwards. */
    public int[] turnsInLayers() { return perLayer.clone(); }

    /** Depth the winding takes up (its build). */
    public Quantity buildDepth() { return q(buildM()); }

    /** Depth left unused on the bobbin. */
    public Quantity spareDepth() { return q(bobbin.depthM() - buildM()); }

    /** Copper fill factor: total conductor area / bobbin window (width × depth). */
    public double fillFactor() { return turns * wire.areaM2() / (bobbin.widthM() * bobbin.depthM()); }

    /** Mean length of turn (wire length / turns). */
    public Quantity meanTurnLength() { return q(length / turns); }

    /** Length of wire in the winding (no leads). */
    public Quantity wireLength() { return q(length); }

    /** DC resistance at 20 °C. */
    public Quantity resistance() { return Quantity.of(resistanceAt(Conductor.T20), Dimension.RESISTANCE); }

    /** DC resistance at a temperature. */
    public Quantity resistance(Quantity temperature) {
        return Quantity.of(resistanceAt(Wire.kelvin(temperature)), Dimension.RESISTANCE);
    }

    /** Mass of the conductor. */
    public Quantity copperMass() { return Quantity.of(wire.massPerLength().si() * length, Dimension.MASS); }

    /** Outer diameter of the winding on a round bobbin (inner diameter + 2 × build). */
    public Quantity outerDiameter() {
        return q(bobbin.innerDiameter().si() + 2 * buildM());
    }

    /** Mean diameter of a winding on a round bobbin (inner diameter + build): the D of Wheeler's and Brooks's formulas. */
    public Quantity meanDiameter() {
        return q(bobbin.innerDiameter().si() + buildM());
    }

    /** Axial length the turns occupy: turns per layer × overall diameter (plus half a diameter when orthocyclic, more than one layer). */
    public Quantity windingLength() {
        double d = wire.overallDiameterM();
        double l = turnsPerLayer() * d + (packing == Packing.ORTHOCYCLIC && layers() > 1 && turnsPerLayer() * d + d / 2 <= bobbin.widthM() ? d / 2 : 0);
        return q(l);
    }

    /**
     * Kernel: the position of every turn's centre on a round bobbin, as {radii[], axial positions[]}
     * in metres, axial positions measured from the middle of the winding width; for filament sums.
     */
    public double[][] turnCentres() {
        double di = bobbin.innerDiameter().si();
        double d = wire.overallDiameterM();
        double[] r = new double[turns], z = new double[turns];
        int t = 0;
        for (int i = 0; i < perLayer.length; i++) {
            int k = i + 1;
            double radius = di / 2 + Layout.layerCentre(d, k, packing);
            double start = -bobbin.widthM() / 2 + d / 2 + (packing == Packing.ORTHOCYCLIC && k % 2 == 0 ? d / 2 : 0);
            for (int j = 0; j < perLayer[i]; j++, t++) {
                r[t] = radius;
                z[t] = start + j * d;
            }
        }
        return new double[][] {r, z};
    }

    /**
     * Outside surface of the winding that can shed heat: the outer face (outer perimeter × width)
     * plus the two end faces (perimeter at mid-build × build, each). The inner face, on the tube or
     * core, is not counted.
     */
    public Quantity surfaceArea() {
        double b = buildM();
        double outer = bobbin.turnLengthAt(b) * bobbin.widthM();
        double ends = 2 * bobbin.turnLengthAt(b / 2) * b;
        return Quantity.of(outer + ends, Dimension.AREA);
    }

    /**
     * AC/DC resistance ratio at a frequency by Dowell's method ({@link Dowell}), with all layers in one
     * MMF portion (a single winding whose field rises from zero at the tube to the outside), at 20 °C.
     */
    public double acResistanceFactor(Quantity frequency) {
        return acFactorAt(Require.positive("frequency", frequency, Dimension.FREQUENCY), Conductor.T20);
    }

    /**
     * AC resistance at a frequency and temperature: R_dc(T) × F_R (Dowell, with the skin depth of the
     * conductor at T), for a sinusoidal current of that frequency.
     */
    public Quantity acResistance(Quantity frequency, Quantity temperature) {
        double f = Require.positive("frequency", frequency, Dimension.FREQUENCY);
        double k = Wire.kelvin(temperature);
        return Quantity.of(resistanceAt(k) * acFactorAt(f, k), Dimension.RESISTANCE);
    }

    private double acFactorAt(double f, double kelvin) {
        double delta = SkinEffect.depthAt(wire.conductor().resistivityAt(kelvin), f);
        double pitch = bobbin.widthM() / turnsPerLayer();
        double dd = Dowell.deltaOfRoundWire(wire.bareDiameterM(), pitch, delta);
        return Dowell.factorAt(dd, layers());
    }

    // ---- kernels ----

    /** Kernel: DC resistance (Ω) at a temperature (K). */
    public double resistanceAt(double kelvin) {
        Require.finite("temperature (K)", kelvin);
        return Require.result("resistance", wire.resistancePerLengthAt(kelvin) * length);
    }

    /** Kernel: wire length (m). */
    public double wireLengthM() { return length; }

    double buildM() { return Layout.build(wire.overallDiameterM(), perLayer.length, packing); }

    @Override
    public boolean equals(Object o) {
        return o instanceof Winding w && w.turns == turns && w.wire.equals(wire) && w.bobbin.equals(bobbin) && w.packing == packing;
    }

    @Override
    public int hashCode() { return Objects.hash(wire, turns, packing); }

    /** e.g. "winding: 400 turns AWG 28 copper, 8 layers of 50 (layer-wound), fill 0.48, 41.2 m, 8.31 Ω at 20 °C". */
    @Override
    public String toString() {
        return "winding: " + turns + " turns " + wire.size() + " " + wire.conductor().name() + ", " + layers() + " layers of up to "
                + turnsPerLayer() + " (" + packing + "), fill " + Quantity.number(fillFactor()).format(3) + ", MLT " + meanTurnLength()
                + ", " + wireLength() + ", " + resistance() + " at 20 °C";
    }
}
