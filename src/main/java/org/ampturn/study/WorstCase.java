package org.ampturn.study;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.ampturn.coil.Coil;
import org.ampturn.drive.Clamp;
import org.ampturn.drive.Drive;
import org.ampturn.drive.Transient;
import org.ampturn.material.Conductor;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;

/**
 * The corners that decide a DC coil, as ready-made checks. Immutable; each {@code with…} copy adds a
 * check or sets a spread; {@link #check()} gives the table with the deciding corner marked.
 *
 * <ul>
 * <li>pick-up: lowest supply, hottest coil, top of the resistance tolerance: N·V_min/R_max ≥ the
 *     ampere-turns needed;</li>
 * <li>dissipation: highest supply, coldest coil, bottom of the tolerance: V_max²/R_min ≤ the power
 *     allowed;</li>
 * <li>flyback: highest supply, coldest coil, bottom of the tolerance (the largest current to turn
 *     off): the peak switch voltage of a drive run with the clamp ≤ the switch's rating;</li>
 * <li>drop-out: the highest voltage left across the coil when off (leakage, a supply that does not
 *     fall to zero), coldest coil, bottom of the tolerance: N·V_off/R_min ≤ the ampere-turns at
 *     which the armature is sure to release.</li>
 * </ul>
 * The resistance of the coil at a temperature comes from its own {@link Coil#resistanceAt(double)};
 * a tolerance is applied as a factor. For the flyback run the coil is taken at the temperature at
 * which its resistance is the toleranced one (the resistance is linear in temperature), so a
 * saturating coil keeps its magnetics. The margin of a corner is relative, (limit − value)/limit for
 * an upper limit and (value − need)/need for a lower one; the deciding corner has the least.
 */
public final class WorstCase {
    private final Coil coil;
    private final int turns;
    private final double volts, vtol, rtol, coldK, hotK;
    private final double pickUp, maxPower, dropOut, offVolts, maxSwitch;
    private final Clamp clamp;

    private WorstCase(Coil coil, int turns, double volts, double vtol, double rtol, double coldK, double hotK, double pickUp, double maxPower,
            double dropOut, double offVolts, Clamp clamp, double maxSwitch) {
        this.coil = coil;
        this.turns = turns;
        this.volts = volts;
        this.vtol = vtol;
        this.rtol = rtol;
        this.coldK = coldK;
        this.hotK = hotK;
        this.pickUp = pickUp;
        this.maxPower = maxPower;
        this.dropOut = dropOut;
        this.offVolts = offVolts;
        this.clamp = clamp;
        this.maxSwitch = maxSwitch;
    }

    /**
     * Corners of a coil of {@code turns} turns on a supply of {@code supply} ± {@code supplyTolerancePercent};
     * coil from 20 °C to 20 °C and no resistance tolerance until given.
     */
    public static WorstCase of(Coil coil, int turns, Quantity supply, double supplyTolerancePercent) {
        Require.present("coil", coil);
        Require.turns("turns", turns);
        double v = Require.positive("supply voltage", supply, Dimension.VOLTAGE, Drive.MAX_VOLTS);
        if (!(supplyTolerancePercent >= 0 && supplyTolerancePercent < 100)) {
            throw Require.fail("supply tolerance (" + Require.show(supplyTolerancePercent) + " %) must be from 0 % to below 100 %");
        }
        return new WorstCase(coil, turns, v, supplyTolerancePercent / 100, 0, Conductor.T20, Conductor.T20, Double.NaN, Double.NaN, Double.NaN,
                Double.NaN, null, Double.NaN);
    }

    /** Resistance tolerance of the coil, ± percent (the wire's size tolerance and the turns count). */
    public WorstCase withResistanceTolerance(double percent) {
        Require.between("resistance tolerance (%)", percent, 0, 50);
        return new WorstCase(coil, turns, volts, vtol, percent / 100, coldK, hotK, pickUp, maxPower, dropOut, offVolts, clamp, maxSwitch);
    }

    /** Coldest and hottest coil temperatures (the hottest: ambient plus the rise from a heating or duty result). */
    public WorstCase withTemperatures(Quantity coldest, Quantity hottest) {
        double c = Require.absoluteTemperature("coldest coil temperature", coldest, Conductor.LAW_MIN_K, Conductor.LAW_MAX_K, "the linear resistance law");
        double h = Require.absoluteTemperature("hottest coil temperature", hottest, Conductor.LAW_MIN_K, Conductor.LAW_MAX_K, "the linear resistance law");
        if (!(c <= h)) throw Require.fail("coldest coil temperature " + coldest + " is above the hottest " + hottest);
        return new WorstCase(coil, turns, volts, vtol, rtol, c, h, pickUp, maxPower, dropOut, offVolts, clamp, maxSwitch);
    }

    /** Ampere-turns the coil needs to pick up (as a current: {@code A(450)} for 450 At). */
    public WorstCase withPickUp(Quantity ampereTurns) {
        double v = Require.positive("pick-up ampere-turns", ampereTurns, Dimension.CURRENT, 1e9);
        return new WorstCase(coil, turns, volts, vtol, rtol, coldK, hotK, v, maxPower, dropOut, offVolts, clamp, maxSwitch);
    }

    /** Power the coil may dissipate. */
    public WorstCase withMaxPower(Quantity power) {
        double v = Require.positive("maximum power", power, Dimension.POWER, 1e9);
        return new WorstCase(coil, turns, volts, vtol, rtol, coldK, hotK, pickUp, v, dropOut, offVolts, clamp, maxSwitch);
    }

    /** Ampere-turns below which the armature surely releases, and the highest voltage left on the coil when off. */
    public WorstCase withDropOut(Quantity ampereTurns, Quantity offVoltage) {
        double v = Require.positive("drop-out ampere-turns", ampereTurns, Dimension.CURRENT, 1e9);
        double o = Require.nonNegative("supply-off voltage", offVoltage, Dimension.VOLTAGE, Drive.MAX_VOLTS);
        return new WorstCase(coil, turns, volts, vtol, rtol, coldK, hotK, pickUp, maxPower, v, o, clamp, maxSwitch);
    }

    /** The turn-off clamp and the switch's voltage rating. */
    public WorstCase withFlyback(Clamp c, Quantity switchRating) {
        Require.present("clamp", c);
        double v = Require.positive("switch voltage rating", switchRating, Dimension.VOLTAGE, Drive.MAX_VOLTS);
        return new WorstCase(coil, turns, volts, vtol, rtol, coldK, hotK, pickUp, maxPower, dropOut, offVolts, c, v);
    }

    /** One corner: name, the conditions, the value found, the limit, the relative margin. */
    public record Corner(String name, String conditions, Quantity value, String limit, double margin) {
        public boolean passes() { return margin >= 0; }

        String valueText() {
            return name.equals("pick-up") || name.equals("drop-out") ? String.format(Locale.ROOT, "%.0f At", value.si()) : value.toString();
        }
    }

    /** Every check given, at its corner. Fails when no check was given. */
    public Result check() {
        List<Corner> rows = new ArrayList<>();
        double vmin = volts * (1 - vtol), vmax = volts * (1 + vtol);
        double rHot = coil.resistanceAt(hotK) * (1 + rtol), rCold = coil.resistanceAt(coldK) * (1 - rtol);
        String hot = Quantity.temperatureKelvin(hotK) + ", R +" + pct(rtol) + " = " + ohm(rHot);
        String cold = Quantity.temperatureKelvin(coldK) + ", R −" + pct(rtol) + " = " + ohm(rCold);
        if (!Double.isNaN(pickUp)) {
            double ni = turns * vmin / rHot;
            rows.add(new Corner("pick-up", volt(vmin) + ", " + hot, Quantity.of(ni, Dimension.CURRENT), "≥ " + at(pickUp), ni / pickUp - 1));
        }
        if (!Double.isNaN(maxPower)) {
            double p = vmax * vmax / rCold;
            rows.add(new Corner("dissipation", volt(vmax) + ", " + cold, Quantity.of(p, Dimension.POWER), "≤ " + Quantity.of(maxPower, Dimension.POWER),
                    1 - p / maxPower));
        }
        if (clamp != null) {
            double peak = flybackPeak(vmax, rCold);
            rows.add(new Corner("flyback", volt(vmax) + ", " + cold + ", " + clamp, Quantity.of(peak, Dimension.VOLTAGE),
                    "≤ " + volt(maxSwitch), 1 - peak / maxSwitch));
        }
        if (!Double.isNaN(dropOut)) {
            double ni = turns * offVolts / rCold;
            rows.add(new Corner("drop-out", volt(offVolts) + " off, " + cold, Quantity.of(ni, Dimension.CURRENT), "≤ " + at(dropOut),
                    1 - ni / dropOut));
        }
        if (rows.isEmpty()) throw Require.fail("no check given: add withPickUp, withMaxPower, withFlyback or withDropOut");
        return new Result(Quantity.of(volts, Dimension.VOLTAGE) + " ±" + pct(vtol), rows);
    }

    private double flybackPeak(double vmax, double rCold) {
        // the temperature at which the coil's own resistance is rCold (its resistance is linear in temperature)
        double r1 = coil.resistanceAt(Conductor.T20), r2 = coil.resistanceAt(Conductor.T20 + 100);
        double t = Conductor.T20 + (rCold - r1) / (r2 - r1) * 100;
        Coil c = coil.atTemperature(Quantity.temperatureKelvin(t));
        double tau = coil.inductance().si() / rCold;
        Transient run = Drive.dc(Quantity.of(vmax, Dimension.VOLTAGE)).into(c).offAt(Quantity.of(8 * tau, Dimension.TIME), clamp)
                .simulate(Quantity.of(16 * tau, Dimension.TIME));
        return run.peakSwitchVoltage().si();
    }

    private static String pct(double f) { return Require.show(100 * f) + " %"; }
    private static String volt(double v) { return Quantity.of(v, Dimension.VOLTAGE).toString(); }
    private static String ohm(double r) { return Quantity.of(r, Dimension.RESISTANCE).toString(); }
    private static String at(double ni) { return String.format(Locale.ROOT, "%.0f At", ni); }

    /** The table of corners with the deciding one (least margin) marked. Immutable. */
    public static final class Result {
        private final String supply;
        private final List<Corner> corners;
        private final int deciding;

        Result(String supply, List<Corner> corners) {
            this.supply = supply;
            this.corners = List.copyOf(corners);
            int d = 0;
            for (int i = 1; i < corners.size(); i++) if (corners.get(i).margin() < corners.get(d).margin()) d = i;
            this.deciding = d;
        }

        public List<Corner> corners() { return corners; }

        /** The corner with the least margin. */
        public Corner deciding() { return corners.get(deciding); }

        /** The corner by name: "pick-up", "dissipation", "flyback", "drop-out". */
        public Corner corner(String name) {
            for (Corner c : corners) if (c.name().equals(name)) return c;
            throw Require.fail("no corner named " + Require.quote(name) + "; corners: " + corners.stream().map(Corner::name).toList());
        }

        public boolean allPass() { return corners.stream().allMatch(Corner::passes); }

        /** The table: one line per corner, the deciding one marked with ◀ (its {@code toString()} is the text). */
        public Text table() { return new Text(tableText()); }

        String tableText() {
            StringBuilder sb = new StringBuilder("worst-case corners, supply " + supply + "\n");
            for (int i = 0; i < corners.size(); i++) {
                Corner c = corners.get(i);
                sb.append(String.format(Locale.ROOT, "  %-11s %-10s %-10s %8s  %-4s  %s%s%n", c.name(), c.valueText(), c.limit(),
                        String.format(Locale.ROOT, "%+.1f %%", 100 * c.margin()), c.passes() ? "ok" : "FAIL", c.conditions(),
                        i == deciding ? "  ◀ deciding" : ""));
            }
            return sb.toString().stripTrailing();
        }

        /** e.g. "worst case 24.00 V ±10 %: 4 corners, all pass; deciding: pick-up 468 At ≥ 450 At (+4.0 %)". */
        @Override
        public String toString() {
            Corner d = deciding();
            long failing = corners.stream().filter(c -> !c.passes()).count();
            return "worst case " + supply + ": " + corners.size() + " corners, " + (failing == 0 ? "all pass" : failing + " FAIL") + "; deciding: "
                    + d.name() + " " + d.valueText() + " " + d.limit() + " (" + String.format(Locale.ROOT, "%+.1f %%", 100 * d.margin()) + ")";
        }
    }

    /** A block of text that the console prints as it is (a table of lines). */
    public record Text(String text) {
        @Override public String toString() { return text; }
    }

    @Override
    public String toString() {
        return "worst-case check of " + coil.describe() + ", " + turns + " turns, " + Quantity.of(volts, Dimension.VOLTAGE) + " ±" + pct(vtol);
    }
}
