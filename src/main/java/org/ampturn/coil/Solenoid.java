package org.ampturn.coil;

import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;

/**
 * A single-layer air-cored solenoid: N turns wound evenly over a length l at a mean diameter D
 * (centre of the wire). Immutable.
 *
 * <p>Inductance of the equivalent current sheet (Lorenz 1879; Nagaoka 1909):
 * L<sub>s</sub> = μ0·N²·(πD²/4)/l · K<sub>N</sub>(D/l), with Nagaoka's coefficient
 * K<sub>N</sub> = 4/(3πk′)·[(k′²/k²)(K(k) − E(k)) + E(k) − k], k = D/√(D² + l²), k′ = l/√(D² + l²)
 * (Grover, Inductance Calculations, 1946, ch. 14; Rosa and Grover, Bull. Bureau of Standards 8,
 * 1912). Exact for a current sheet of any proportions.
 *
 * <p>When the wire diameter d is known ({@link #withWire(Quantity)}), the round-wire correction of
 * Rosa (Bull. Bureau of Standards 2, 1906, p. 161; Grover 1946, eq. 177) is applied:
 * L = L<sub>s</sub> − μ0·a·N·(A + B), a = D/2, with A = 5/4 − ln(2p/d) for the self-inductance of a
 * round turn against a strip of the sheet (pitch p = l/N) and B(N) for the mutual inductances,
 * B = (2/N)·Σ<sub>k=1</sub><sup>N−1</sup>(N − k)·f(k),
 * f(k) = ln k − ½[(k+1)² ln(k+1) + (k−1)² ln(k−1) − 2k² ln k] + 3/2 (the geometric-mean-distance
 * form from which Rosa's table of B is computed; B(2) = 3/2 − 2 ln 2 = 0.1137). Valid for pitch much
 * smaller than the radius and d ≤ p; at low frequency (uniform current in the wire).
 */
public final class Solenoid implements AirCoil {
    private final int turns;
    private final double length;
    private final double diameter;
    private final double wire; // NaN when not given

    private Solenoid(int turns, double length, double diameter, double wire) {
        this.turns = turns;
        this.length = length;
        this.diameter = diameter;
        this.wire = wire;
    }

    /**
     * A single-layer solenoid of {@code turns} turns over {@code length} at {@code meanDiameter}
     * (measured to the centre of the wire).
     */
    public static Solenoid singleLayer(int turns, Quantity length, Quantity meanDiameter) {
        Require.turns("turns", turns);
        double l = Require.length("length", length);
        double d = Require.length("mean diameter", meanDiameter);
        return new Solenoid(turns, l, d, Double.NaN);
    }

    /** The same coil wound with round wire of this (bare) diameter; it must not exceed the pitch l/N. */
    public Solenoid withWire(Quantity wireDiameter) {
        double w = Require.length("wire diameter", wireDiameter);
        double p = length / turns;
        if (w > p * (1 + 1e-12)) {
            throw Require.fail("wire diameter (" + wireDiameter + ") must be at most the pitch length/turns = "
                    + Quantity.of(p, Dimension.LENGTH) + ", or the turns overlap");
        }
        if (w >= diameter) throw Require.fail("wire diameter (" + wireDiameter + ") must be less than the mean diameter " + meanDiameter());
        return new Solenoid(turns, length, diameter, w);
    }

    /** The same coil with another number of turns. */
    public Solenoid withTurns(int n) {
        Require.turns("turns", n);
        Solenoid s = new Solenoid(n, length, diameter, Double.NaN);
        return Double.isNaN(wire) ? s : s.withWire(Quantity.of(wire, Dimension.LENGTH));
    }

    @Override public int turns() { return turns; }
    public Quantity length() { return Quantity.of(length, Dimension.LENGTH); }
    public Quantity meanDiameter() { return Quantity.of(diameter, Dimension.LENGTH); }
    public Quantity pitch() { return Quantity.of(length / turns, Dimension.LENGTH); }
    public boolean hasWire() { return !Double.isNaN(wire); }

    /** Nagaoka's coefficient K_N(D/l), exact (elliptic integrals). */
    public double nagaoka() {
        return nagaokaAt(diameter / length);
    }

    /**
     * Best estimate: the current-sheet inductance with Nagaoka's exact coefficient, less Rosa's
     * round-wire correction when the wire diameter is known.
     */
    @Override
    public Quantity inductance() {
        double l = inductanceAt(turns, length, diameter);
        if (hasWire()) l -= roundWireCorrectionAt(turns, length, diameter, wire);
        return Quantity.of(l, Dimension.INDUCTANCE);
    }

    /** The current-sheet inductance L_s = μ0 N² A K_N / l, exact for a current sheet. */
    public Quantity currentSheetInductance() {
        return Quantity.of(inductanceAt(turns, length, diameter), Dimension.INDUCTANCE);
    }

    /** Rosa's round-wire correction μ0·a·N·(A + B) (subtracted from the sheet value); needs the wire. */
    public Quantity roundWireCorrection() {
        requireWire("roundWireCorrection");
        return Quantity.of(roundWireCorrectionAt(turns, length, diameter, wire), Dimension.INDUCTANCE);
    }

    /**
     * Wheeler's long-coil formula (Wheeler, Proc. IRE 16, 1928, p. 1398): L[μH] = a²N²/(9a + 10l),
     * a = D/2 and l in inches. Wheeler gives it as within 1 % for l &gt; 0.8a (l/D &gt; 0.4).
     */
    public Quantity wheeler1928() {
        return Quantity.of(wheeler1928At(turns, length, diameter), Dimension.INDUCTANCE);
    }

    /**
     * Wheeler's continuous formula (Wheeler, Proc. IEEE 70, 1982, p. 1449):
     * L = μ0·N²·a·[ln(1 + πa/l) + 1/(2.3 + 1.6·(l/a) + 0.44·(l/a)²)], stated there to be within about
     * 0.1 % (from memory) for any ratio of length to diameter.
     */
    public Quantity wheeler1982() {
        return Quantity.of(wheeler1982At(turns, length, diameter), Dimension.INDUCTANCE);
    }

    /**
     * The "exact" sum over the turns as coaxial circular filaments: N self-inductances of a round-wire
     * loop plus Maxwell's mutual inductance of every pair (helix pitch neglected). Needs the wire.
     */
    public Quantity filamentSum() {
        requireWire("filamentSum");
        return Quantity.of(filaments().selfInductance(), Dimension.INDUCTANCE);
    }

    /** Each approximation beside the exact current-sheet value (and the filament sum when the wire is known). */
    public Comparison compare() {
        double exact = inductanceAt(turns, length, diameter);
        double ratio = diameter / length;
        Comparison.Builder b = Comparison.builder("single-layer solenoid, D/l = " + Quantity.number(ratio), "current sheet (Nagaoka, exact)", exact);
        String w28 = wheeler1928Note(length, diameter);
        b.row("Wheeler 1928 long-coil", wheeler1928At(turns, length, diameter), w28 == null ? "within 1 % for l/D > 0.4" : "OUTSIDE its range (l/D > 0.4): rough");
        b.row("Wheeler 1982 continuous", wheeler1982At(turns, length, diameter), "about 0.1 %, any l/D");
        if (hasWire()) {
            b.row("sheet less Rosa's correction", exact - roundWireCorrectionAt(turns, length, diameter, wire),
                    rosaNote(turns, length, diameter) == null ? "pitch ≪ radius" : "OUTSIDE its range (pitch ≤ D/10): rough");
            b.row("filament sum (Maxwell)", filaments().selfInductance(), "round wire, DC");
        }
        return b.build();
    }

    /** Wheeler's 1928 long-coil formula holds (within 1 %) for l/D above this (Wheeler 1928). */
    public static final double WHEELER_1928_MIN_LENGTH_OVER_DIAMETER = 0.4;
    /**
     * Rosa's round-wire correction treats each turn as a ring in a field that varies slowly over the
     * pitch; the range taken here is a pitch of at most a tenth of the diameter (common practice for
     * "pitch ≪ radius", not a figure of Rosa's).
     */
    public static final double ROSA_MAX_PITCH_OVER_DIAMETER = 0.1;

    /**
     * A note for each approximate formula of this coil that is used outside the range its source
     * states (Wheeler 1928 for l/D ≤ 0.4; Rosa's correction, when the wire is known, for a pitch
     * over D/10); empty when every one is inside. The exact current-sheet value needs none.
     */
    public java.util.List<String> rangeNotes() {
        java.util.List<String> notes = new java.util.ArrayList<>();
        String w = wheeler1928Note(length, diameter);
        if (w != null) notes.add(w);
        if (hasWire()) {
            String r = rosaNote(turns, length, diameter);
            if (r != null) notes.add(r);
        }
        return java.util.List.copyOf(notes);
    }

    static String wheeler1928Note(double length, double diameter) {
        double r = length / diameter;
        if (r > WHEELER_1928_MIN_LENGTH_OVER_DIAMETER) return null;
        return "Wheeler's 1928 long-coil formula is used outside its range: l/D = " + Quantity.number(r) + ", stated within 1 % for l/D > "
                + WHEELER_1928_MIN_LENGTH_OVER_DIAMETER + " (Wheeler 1928): treat it as a rough estimate; inductance() does not use it";
    }

    static String rosaNote(int turns, double length, double diameter) {
        double r = length / turns / diameter;
        if (r <= ROSA_MAX_PITCH_OVER_DIAMETER) return null;
        return "Rosa's round-wire correction is used outside its range: pitch/D = " + Quantity.number(r) + ", taken to hold for pitch/D ≤ "
                + ROSA_MAX_PITCH_OVER_DIAMETER + " (pitch ≪ radius): treat inductance() as a rough estimate";
    }

    Filaments filaments() {
        double rho = hasWire() ? wire / 2 : 0.5 * length / turns;
        return new Filaments(new double[] {diameter / 2}, turns, length / turns, rho);
    }

    private void requireWire(String what) {
        if (!hasWire()) throw new IllegalStateException(what + " needs the wire diameter: use withWire(mm(...)) first");
    }

    // ---- kernels (SI doubles) ----------------------------------------------------------------

    /** Nagaoka's coefficient for a ratio of diameter to length D/l &gt; 0. */
    public static double nagaokaAt(double diameterOverLength) {
        double x = Require.between("diameter/length", diameterOverLength, 1e-12, 1e12);
        double h = Math.sqrt(1 + x * x);
        return Require.result("nagaoka", Elliptic.nagaoka(x / h, 1 / h));
    }

    /** Current-sheet inductance (H) of N turns over length l (m) at mean diameter D (m). */
    public static double inductanceAt(double turns, double length, double diameter) {
        checkKernel(turns, length, diameter);
        double inv = 1 / Math.sqrt(diameter * diameter + length * length);
        double kn = Elliptic.nagaoka(diameter * inv, length * inv);
        return Require.result("inductance", Elliptic.MU0 * turns * turns * Math.PI * diameter * diameter / (4 * length) * kn);
    }

    /** Wheeler 1928 (H): L[μH] = a²N²/(9a + 10l), inches. */
    public static double wheeler1928At(double turns, double length, double diameter) {
        checkKernel(turns, length, diameter);
        double a = diameter / 2;
        return Require.result("wheeler1928at", 1e-6 * a * a * turns * turns / (INCH * (9 * a + 10 * length)));
    }

    /** Wheeler 1982 (H). */
    public static double wheeler1982At(double turns, double length, double diameter) {
        checkKernel(turns, length, diameter);
        double a = diameter / 2, l = length;
        // ln(1 + πa/l) + 1/(2.3 + 1.6 l/a + 0.44 (l/a)²), the second term as a²/(2.3a² + 1.6al + 0.44l²):
        // two independent divisions, which the processor overlaps
        double u = a / l;
        double t2 = a * a / (a * (2.3 * a + 1.6 * l) + 0.44 * l * l);
        return Require.result("wheeler1982at", Elliptic.MU0 * turns * turns * a * (LogKernel.log(1 + Math.PI * u) + t2));
    }

    /** Rosa's correction μ0·a·N·(A + B) in H. */
    public static double roundWireCorrectionAt(int turns, double length, double diameter, double wire) {
        checkKernel(turns, length, diameter);
        Require.between("wire diameter", wire, Dimension.LENGTH, Require.MIN_LENGTH, diameter);
        double p = length / turns;
        double a = 5.0 / 4 - Math.log(2 * p / wire);
        return Require.result("round wire correction", Elliptic.MU0 * diameter / 2 * turns * (a + rosaB(turns)));
    }

    /** Rosa's B(N): the mutual-inductance part of the round-wire correction. */
    public static double rosaB(int n) {
        Require.turns("turns", n);
        double s = 0;
        for (int k = 1; k < n; k++) s += (double) (n - k) * rosaF(k);
        return Require.result("rosa b", 2 * s / n);
    }

    private static double rosaF(int k) {
        if (k >= 8) {
            double u = 1.0 / ((double) k * k);
            return u * (1.0 / 12 + u * (1.0 / 60 + u * (1.0 / 168 + u / 360)));
        }
        double lk = Math.log(k);
        double lp = Math.log(k + 1);
        double lm = k > 1 ? Math.log(k - 1) : 0;
        return lk - 0.5 * ((k + 1.0) * (k + 1) * lp + (k - 1.0) * (k - 1) * lm - 2.0 * k * k * lk) + 1.5;
    }

    static final double INCH = 0.0254;

    /** The kernels' door: turns from 1 to the library's limit, lengths within the library's range (NaN fails). */
    static void checkKernel(double turns, double length, double diameter) {
        Require.between("turns", turns, 1, Require.MAX_TURNS);
        Require.between("length", length, Dimension.LENGTH, Require.MIN_LENGTH, Require.MAX_LENGTH);
        Require.between("diameter", diameter, Dimension.LENGTH, Require.MIN_LENGTH, Require.MAX_LENGTH);
    }

    @Override
    public String toString() {
        String s = "single-layer solenoid, " + turns + " turns, " + length() + " long, " + meanDiameter() + " mean diameter";
        if (hasWire()) s += ", wire " + Quantity.of(wire, Dimension.LENGTH);
        return s;
    }
}
