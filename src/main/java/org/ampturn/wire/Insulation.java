package org.ampturn.wire;

import java.util.Objects;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;

/**
 * The enamel (film) insulation of a round magnet wire, as the increase in diameter it adds over the
 * bare conductor. Immutable.
 *
 * <p>The built-in builds give <em>typical nominal</em> increases, not a standard's limits:
 * <ul>
 *   <li>{@link #SINGLE}, {@link #HEAVY}, {@link #TRIPLE}: the single, heavy (double) and triple film
 *       builds of NEMA MW 1000. IEC 60317 grade 1, 2 and 3 are close to them and are given as the
 *       aliases {@link #GRADE_1}, {@link #GRADE_2}, {@link #GRADE_3} (common practice).</li>
 *   <li>The increase is interpolated (log-log) in a short table of bare diameter → nominal increase.
 *       The points at AWG 22, 24 and 26 are nominal overall diameters from a published copper magnet
 *       wire table quoting NEMA MW 1000 (22: 0.0253/0.0266/0.0276/0.0286 in; 24: 0.0201/0.0213/
 *       0.0223/0.0232 in; 26: 0.0159/0.0170/0.0179/0.0187 in for bare/single/heavy/triple). The
 *       points at AWG 40, 30, 18 and 10 are typical values <b>from memory</b>. Beyond the table the
 *       end increase is kept.</li>
 * </ul>
 * For a real wire give its datasheet figure: {@link #ofIncrease(Quantity)} or
 * {@link Wire#withOverallDiameter(Quantity)}.
 */
public final class Insulation {
    // bare diameter (mm) → nominal increase single / heavy / triple (mm); see the class comment
    private static final double[] D = {0.0799, 0.2546, 0.4039, 0.5105, 0.6426, 1.0237, 2.5882};
    private static final double[] SINGLE_INC = {0.0076, 0.0152, 0.0279, 0.0305, 0.0330, 0.0356, 0.0508};
    private static final double[] HEAVY_INC = {0.0152, 0.0279, 0.0508, 0.0559, 0.0584, 0.0635, 0.0889};
    private static final double[] TRIPLE_INC = {0.0229, 0.0406, 0.0711, 0.0787, 0.0838, 0.0914, 0.1270};

    /** Bare conductor, no enamel. */
    public static final Insulation NONE = new Insulation("bare", null, 0);
    /** Single film build (NEMA MW 1000), typical nominal increase. */
    public static final Insulation SINGLE = new Insulation("single build", SINGLE_INC, 0);
    /** Heavy (double) film build (NEMA MW 1000), typical nominal increase. */
    public static final Insulation HEAVY = new Insulation("heavy build", HEAVY_INC, 0);
    /** Triple film build (NEMA MW 1000), typical nominal increase. */
    public static final Insulation TRIPLE = new Insulation("triple build", TRIPLE_INC, 0);
    /** IEC 60317 grade 1, taken as {@link #SINGLE} (common practice). */
    public static final Insulation GRADE_1 = new Insulation("grade 1", SINGLE_INC, 0);
    /** IEC 60317 grade 2, taken as {@link #HEAVY} (common practice). */
    public static final Insulation GRADE_2 = new Insulation("grade 2", HEAVY_INC, 0);
    /** IEC 60317 grade 3, taken as {@link #TRIPLE} (common practice). */
    public static final Insulation GRADE_3 = new Insulation("grade 3", TRIPLE_INC, 0);

    // IEC 60317-0-1 (Table 1) maximum overall diameters of enamelled round copper wire, grades 1, 2, 3 (mm), at
    // these nominal bare diameters; FROM MEMORY except 0.100 mm grade 1 (0.117 mm, seen in a published
    // manufacturer's note quoting the standard). Stored as increases (overall − bare).
    private static final double[] IEC_D = {0.050, 0.100, 0.200, 0.500, 1.000, 2.000, 5.000};
    private static final double[] IEC_G1 = {0.060 - 0.050, 0.117 - 0.100, 0.226 - 0.200, 0.544 - 0.500, 1.062 - 1.000, 2.074 - 2.000, 5.093 - 5.000};
    private static final double[] IEC_G2 = {0.065 - 0.050, 0.125 - 0.100, 0.239 - 0.200, 0.566 - 0.500, 1.093 - 1.000, 2.112 - 2.000, 5.135 - 5.000};
    private static final double[] IEC_G3 = {0.069 - 0.050, 0.132 - 0.100, 0.252 - 0.200, 0.587 - 0.500, 1.124 - 1.000, 2.150 - 2.000, 5.177 - 5.000};

    /**
     * IEC 60317-0-1 grade 1, at its <em>maximum</em> overall diameter (the figure to lay out a bobbin
     * with): interpolated log-log between table points at 0.05 to 5 mm. The table is from memory
     * except the point 0.100 mm → 0.117 mm; check it against the standard before relying on a tight fit.
     */
    public static final Insulation IEC_GRADE_1_MAX = new Insulation("grade 1 max", IEC_D, IEC_G1, 0);
    /** IEC 60317-0-1 grade 2 at its maximum overall diameter (from memory; see {@link #IEC_GRADE_1_MAX}). */
    public static final Insulation IEC_GRADE_2_MAX = new Insulation("grade 2 max", IEC_D, IEC_G2, 0);
    /** IEC 60317-0-1 grade 3 at its maximum overall diameter (from memory; see {@link #IEC_GRADE_1_MAX}). */
    public static final Insulation IEC_GRADE_3_MAX = new Insulation("grade 3 max", IEC_D, IEC_G3, 0);

    private final String name;
    private final double[] dia;
    private final double[] table;
    private final double fixed;

    private Insulation(String name, double[] table, double fixed) {
        this(name, D, table, fixed);
    }

    private Insulation(String name, double[] dia, double[] table, double fixed) {
        this.name = name;
        this.dia = dia;
        this.table = table;
        this.fixed = fixed;
    }

    /** An insulation of a fixed increase in diameter (twice the film thickness), from a datasheet. */
    public static Insulation ofIncrease(Quantity increaseInDiameter) {
        double inc = Require.lengthOrZero("increase in diameter", increaseInDiameter);
        return new Insulation("+" + Quantity.of(inc, Dimension.LENGTH) + " film", null, inc);
    }

    public String name() { return name; }

    /** Increase in diameter for a bare diameter. */
    public Quantity increase(Quantity bareDiameter) {
        return Quantity.of(increaseAt(Require.length("bare diameter", bareDiameter)), Dimension.LENGTH);
    }

    /** Kernel: increase in diameter (m) for a bare diameter (m). */
    public double increaseAt(double bareMetres) {
        Require.finite("bare metres", bareMetres);
        if (table == null) return Require.result("increase", fixed);
        double dmm = bareMetres * 1e3;
        double[] D = dia;
        if (dmm <= D[0]) return Require.result("increase", table[0] * 1e-3);
        int n = D.length;
        if (dmm >= D[n - 1]) return Require.result("increase", table[n - 1] * 1e-3);
        int i = 0;
        while (dmm > D[i + 1]) i++;
        double u = Math.log(dmm / D[i]) / Math.log(D[i + 1] / D[i]);
        return Require.result("increase", Math.exp(Math.log(table[i]) + u * Math.log(table[i + 1] / table[i])) * 1e-3);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Insulation i && i.name.equals(name) && i.fixed == fixed && i.table == table;
    }

    @Override
    public int hashCode() { return Objects.hash(name, fixed); }

    @Override
    public String toString() { return name; }
}
