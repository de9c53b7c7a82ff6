package org.ampturn.coil;

import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;
import org.ampturn.wire.Winding;

/**
 * A multilayer air-cored coil of rectangular winding section: {@code layers} layers of
 * {@code turnsPerLayer} turns between an inner and an outer diameter over a winding length.
 * Immutable. Turn centres lie on a regular lattice: layer j at radius r<sub>i</sub> + (j + ½)·c/n<sub>l</sub>,
 * turn t at (t + ½)·b/n<sub>t</sub> along the axis (c the radial build, b the length).
 *
 * <p>{@link #inductance()} is the "exact" value: the sum of Maxwell's mutual inductance over every
 * pair of turns taken as coaxial circular filaments, with the round-wire loop self-inductance
 * μ0·a·(ln(8a/ρ) − 7/4) on the diagonal (Maxwell 1873 §701; Grover, Inductance Calculations, 1946,
 * ch. 13 and 16). It neglects the helix and the crossing from layer to layer, and assumes DC
 * (uniform current in each wire). The approximations are reported beside it by {@link #compare()}:
 * <ul>
 * <li>Wheeler's multilayer formula (Wheeler, Proc. IRE 16, 1928, p. 1398):
 *     L[μH] = 0.8·a²N²/(6a + 9b + 10c), inches, a mean radius, b length, c build; Wheeler: within
 *     about 1 % when the three terms of the denominator are of the same order.</li>
 * <li>Brooks' formula for the coil of maximum inductance per length of wire, square section c × c
 *     with mean radius a = 3c/2 (Brooks, Bureau of Standards J. Research 7, 1931, p. 289; Grover 1946,
 *     ch. 16): L = 1.6994·10<sup>−6</sup>·a·N² H, a in m (from memory). Applies only to those proportions.</li>
 * </ul>
 */
public final class Multilayer implements AirCoil {
    private final int perLayer;
    private final int layers;
    private final double inner;
    private final double outer;
    private final double length;
    private final double wire;
    private final Winding winding; // when built from a winding: its own turn positions

    private Multilayer(int perLayer, int layers, double inner, double outer, double length, double wire) {
        this(perLayer, layers, inner, outer, length, wire, null);
    }

    private Multilayer(int perLayer, int layers, double inner, double outer, double length, double wire, Winding winding) {
        this.perLayer = perLayer;
        this.layers = layers;
        this.inner = inner;
        this.outer = outer;
        this.length = length;
        this.wire = wire;
        this.winding = winding;
    }

    /**
     * The air-cored coil of a {@link Winding} on a round bobbin: the turns where the winding lays
     * them (its packing, a partly filled last layer), the wire's bare diameter for the loop
     * self-inductance, and for Wheeler's formula the winding's mean diameter, length and build.
     */
    public static Multilayer of(Winding winding) {
        if (winding == null) throw Require.fail("winding is missing (null)");
        if (!winding.bobbin().isRound()) {
            throw Require.fail("the winding's bobbin is rectangular (" + winding.bobbin()
                    + "); an air coil of coaxial circles needs a round bobbin");
        }
        double id = winding.bobbin().innerDiameter().si();
        double od = winding.outerDiameter().si();
        return new Multilayer(winding.turnsPerLayer(), winding.layers(), id, od, winding.windingLength().si(),
                winding.wire().bareDiameter().si(), winding);
    }

    /**
     * A coil of {@code layers} × {@code turnsPerLayer} turns between the two diameters over
     * {@code length}. The wire diameter is taken as the smaller of the axial and radial pitch
     * (wires touching) until {@link #withWire(Quantity)} says otherwise.
     */
    public static Multilayer of(int turnsPerLayer, int layers, Quantity innerDiameter, Quantity outerDiameter, Quantity length) {
        Require.turns("turns per layer", turnsPerLayer);
        Require.turns("layers", layers);
        if ((long) turnsPerLayer * layers > Require.MAX_TURNS) {
            throw Require.fail("turns per layer × layers (" + turnsPerLayer + " × " + layers + ") must be at most " + Require.MAX_TURNS);
        }
        double id = Require.length("inner diameter", innerDiameter);
        double od = Require.length("outer diameter", outerDiameter);
        double b = Require.length("length", length);
        if (!(od > id)) {
            throw Require.fail("inner diameter (" + innerDiameter + ") must be less than the outer diameter (" + outerDiameter + ")");
        }
        double pitch = Math.min(b / turnsPerLayer, (od - id) / 2 / layers);
        return new Multilayer(turnsPerLayer, layers, id, od, b, pitch);
    }

    /**
     * A Brooks coil: square winding section of side c, inner diameter 2c, outer 4c, length c
     * (mean radius 3c/2), wound as n × n turns; {@code turns} must be a perfect square n².
     */
    public static Multilayer brooks(int turns, Quantity side) {
        Require.turns("turns", turns);
        double c = Require.length("side of the winding section", side);
        int n = (int) Math.round(Math.sqrt(turns));
        if (n * n != turns) {
            throw Require.fail("turns (" + turns + ") must be a perfect square for an n × n Brooks winding, e.g. "
                    + (n * n) + " or " + ((n + 1) * (n + 1)));
        }
        return new Multilayer(n, n, 2 * c, 4 * c, c, c / n);
    }

    /** The same coil with round wire of this diameter (at most the smaller pitch). */
    public Multilayer withWire(Quantity wireDiameter) {
        if (winding != null) throw new IllegalStateException("this coil takes its wire from its winding; change the winding's wire instead");
        double w = Require.length("wire diameter", wireDiameter);
        double pitch = Math.min(length / perLayer, (outer - inner) / 2 / layers);
        if (w > pitch * (1 + 1e-9)) {
            throw Require.fail("wire diameter (" + wireDiameter + ") must be at most the smaller pitch "
                    + Quantity.of(pitch, Dimension.LENGTH) + ", or the turns overlap");
        }
        return new Multilayer(perLayer, layers, inner, outer, length, w);
    }

    @Override public int turns() { return winding != null ? winding.turns() : perLayer * layers; }
    public int turnsPerLayer() { return perLayer; }
    public int layers() { return layers; }
    public Quantity innerDiameter() { return Quantity.of(inner, Dimension.LENGTH); }
    public Quantity outerDiameter() { return Quantity.of(outer, Dimension.LENGTH); }
    public Quantity length() { return Quantity.of(length, Dimension.LENGTH); }
    public Quantity meanDiameter() { return Quantity.of((inner + outer) / 2, Dimension.LENGTH); }
    /** Radial build c = (OD − ID)/2. */
    public Quantity build() { return Quantity.of((outer - inner) / 2, Dimension.LENGTH); }
    public Quantity wireDiameter() { return Quantity.of(wire, Dimension.LENGTH); }

    /** True when the section is square and the mean radius is 1.5 times its side (within 1 %). */
    public boolean isBrooks() {
        double c = (outer - inner) / 2, a = (inner + outer) / 4;
        return Math.abs(length / c - 1) < 0.01 && Math.abs(a / (1.5 * c) - 1) < 0.01;
    }

    /** The filament-sum ("exact") inductance. */
    @Override
    public Quantity inductance() {
        return Quantity.of(filaments().selfInductance(), Dimension.INDUCTANCE);
    }

    /** Wheeler's 1928 multilayer formula. */
    public Quantity wheeler1928() {
        return Quantity.of(wheeler1928At(turns(), length, (inner + outer) / 4, (outer - inner) / 2), Dimension.INDUCTANCE);
    }

    /** Brooks' formula L = 1.6994e-6·a·N²; only for a coil of Brooks proportions ({@link #isBrooks()}). */
    public Quantity brooksFormula() {
        if (!isBrooks()) {
            throw new IllegalStateException("Brooks' formula holds only for a square section c × c with mean radius 1.5c; this coil has length "
                    + length() + ", build " + build() + ", mean radius " + Quantity.of((inner + outer) / 4, Dimension.LENGTH));
        }
        return Quantity.of(brooksAt(turns(), (inner + outer) / 4), Dimension.INDUCTANCE);
    }

    /** Wheeler (and Brooks, when the proportions fit) beside the filament sum. */
    public Comparison compare() {
        double exact = filaments().selfInductance();
        Comparison.Builder b = Comparison.builder("multilayer coil, " + turns() + " turns", "filament sum (Maxwell, exact)", exact);
        b.row("Wheeler 1928 multilayer", wheeler1928At(turns(), length, (inner + outer) / 4, (outer - inner) / 2),
                rangeNotes().isEmpty() ? "about 1 % when 6a, 9b, 10c are alike" : "OUTSIDE its range (6a, 9b, 10c within 3×): rough");
        if (isBrooks()) b.row("Brooks 1931", brooksAt(turns(), (inner + outer) / 4), "Brooks proportions only");
        double d = (inner + outer) / 2;
        b.row("current sheet at mean diameter", Solenoid.inductanceAt(turns(), length, d), "thin build only");
        return b.build();
    }

    /**
     * Wheeler's multilayer formula is "about 1 %" when the three terms 6a, 9b and 10c of its
     * denominator are of the same order (Wheeler 1928); the range taken here is the largest at most
     * this many times the smallest (an interpretation, from memory, not a figure of Wheeler's).
     */
    public static final double WHEELER_1928_MAX_TERM_RATIO = 3;

    /**
     * A note when Wheeler's multilayer formula is used outside its range (its terms 6a, 9b, 10c more
     * than 3× apart); empty when inside. {@link #inductance()} is the filament sum and needs none.
     */
    public java.util.List<String> rangeNotes() {
        double a = (inner + outer) / 4, c = (outer - inner) / 2;
        double t1 = 6 * a, t2 = 9 * length, t3 = 10 * c;
        double ratio = Math.max(t1, Math.max(t2, t3)) / Math.min(t1, Math.min(t2, t3));
        if (ratio <= WHEELER_1928_MAX_TERM_RATIO) return java.util.List.of();
        return java.util.List.of("Wheeler's 1928 multilayer formula is used outside its range: its terms 6a, 9b, 10c are "
                + Quantity.number(ratio) + "× apart, taken to hold (about 1 %) within " + Require.show(WHEELER_1928_MAX_TERM_RATIO)
                + "×: treat wheeler1928() as a rough estimate; inductance() does not use it");
    }

    Filaments filaments() {
        if (winding != null) return windingFilaments();
        double c = (outer - inner) / 2;
        double[] r = new double[layers];
        for (int j = 0; j < layers; j++) r[j] = inner / 2 + (j + 0.5) * c / layers;
        return new Filaments(r, perLayer, length / perLayer, wire / 2);
    }

    /** Layers of the winding's lattice: radius, count and first axial position of each. */
    private Filaments windingFilaments() {
        double[][] rz = winding.turnCentres();
        double[] r = rz[0], z = rz[1];
        int[] counts = winding.turnsInLayers();
        double[] radii = new double[counts.length], starts = new double[counts.length];
        int t = 0;
        for (int i = 0; i < counts.length; i++) {
            radii[i] = r[t];
            starts[i] = z[t];
            t += counts[i];
        }
        double pitch = winding.wire().overallDiameter().si();
        return new Filaments(radii, counts, starts, pitch, wire / 2);
    }

    // ---- kernels ----------------------------------------------------------------------------

    /** Wheeler 1928 multilayer (H): L[μH] = 0.8 a²N²/(6a + 9b + 10c), inches; arguments in m. */
    public static double wheeler1928At(double turns, double length, double meanRadius, double build) {
        Solenoid.checkKernel(turns, length, meanRadius);
        Require.between("build", build, Dimension.LENGTH, 0, Require.MAX_LENGTH);
        double a = meanRadius;
        return Require.result("wheeler1928at", 0.8e-6 * a * a * turns * turns / (Solenoid.INCH * (6 * a + 9 * length + 10 * build)));
    }

    /** Brooks (H): 1.6994e-6·a·N², a the mean radius in m. */
    public static double brooksAt(double turns, double meanRadius) {
        Solenoid.checkKernel(turns, meanRadius, meanRadius);
        return Require.result("brooks", 1.6994e-6 * meanRadius * turns * turns);
    }

    @Override
    public String toString() {
        if (winding != null) {
            return "multilayer coil of " + winding.turns() + " turns in " + layers + " layers (" + winding.packing() + "), " + innerDiameter() + " to "
                    + outerDiameter() + " diameter, " + length() + " long";
        }
        return "multilayer coil, " + layers + " layers × " + perLayer + " turns, " + innerDiameter() + " to " + outerDiameter()
                + " diameter, " + length() + " long" + (isBrooks() ? " (Brooks proportions)" : "");
    }
}
