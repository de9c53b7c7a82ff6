package org.ampturn.thermal;

import java.util.List;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.wire.Wire;

/**
 * One wire of a {@link WireChoice}: the turns that fill the bobbin with it and how the coil does at
 * its corners, with the requirements it fails and by how much. Immutable.
 */
public final class WireCandidate {
    private final Wire wire;
    private final int turns, layers;
    private final double r20, rHot, pCold, iHot, hotK, rise, mlt, area, tol;
    private final List<String> fails;
    private final List<String> notes;
    final double shortfall; // sum of relative shortfalls, for ranking the failing ones

    WireCandidate(Wire wire, int turns, int layers, double r20, double rHot, double pCold, double iHot, double hotK, double rise, double mlt,
            double area, double tol, List<String> fails, List<String> notes, double shortfall) {
        this.wire = wire;
        this.turns = turns;
        this.layers = layers;
        this.r20 = r20;
        this.rHot = rHot;
        this.pCold = pCold;
        this.iHot = iHot;
        this.hotK = hotK;
        this.rise = rise;
        this.mlt = mlt;
        this.area = area;
        this.tol = tol;
        this.fails = List.copyOf(fails);
        this.notes = List.copyOf(notes);
        this.shortfall = shortfall;
    }

    public Wire wire() { return wire; }
    /** Turns that fill the usable depth (0 when not one layer fits). */
    public int turns() { return turns; }
    public int layers() { return layers; }
    /** Nominal resistance at 20 °C. */
    public Quantity resistance20() { return Quantity.of(r20, Dimension.RESISTANCE); }
    /** Highest resistance: hot (at {@link #hotTemperature()}) and at the top of the resistance tolerance. */
    public Quantity resistanceHot() { return Quantity.of(rHot, Dimension.RESISTANCE); }
    /** Highest power: highest supply, coldest coil, bottom of the resistance tolerance. */
    public Quantity powerCold() { return Quantity.of(pCold, Dimension.POWER); }
    /** Lowest current: lowest supply, hot coil, top of the resistance tolerance. */
    public Quantity currentHot() { return Quantity.of(iHot, Dimension.CURRENT); }
    /** Lowest ampere-turns (turns × lowest current), as a current. */
    public Quantity ampereTurnsHot() { return Quantity.of(iHot * turns, Dimension.CURRENT); }
    /** Steady winding temperature at the highest supply and ambient. */
    public Quantity hotTemperature() { return Quantity.temperatureKelvin(hotK); }
    /** Rise of that over the hottest ambient. */
    public Quantity rise() { return Quantity.of(rise, Dimension.TEMPERATURE); }
    public Quantity meanTurnLength() { return Quantity.of(mlt, Dimension.LENGTH); }
    /** The winding's outside surface that sheds the heat. */
    public Quantity surfaceArea() { return Quantity.of(area, Dimension.AREA); }
    /** Resistance tolerance used (fraction). */
    public double resistanceTolerance() { return tol; }
    /** True when every requirement is met. */
    public boolean meets() { return fails.isEmpty(); }
    /** The requirements not met, each with by how much; empty when it meets them all. */
    public List<String> fails() { return fails; }
    /** Notes on the estimate (a heating rule used outside its range). */
    public List<String> notes() { return notes; }

    /** One row: size, grade, turns, resistances, power, current, ampere-turns, temperature, verdict. */
    @Override
    public String toString() {
        if (turns == 0) return wire.size() + " " + wire.insulation().name() + ": " + String.join("; ", fails);
        return wire.size() + " " + wire.insulation().name() + ": " + turns + " turns in " + layers + " layers, R20 " + resistance20() + ", hot "
                + resistanceHot() + ", P " + powerCold() + ", I " + currentHot() + ", " + WireChoices.at(iHot * turns) + ", " + hotTemperature()
                + (meets() ? "" : " — fails: " + String.join("; ", fails));
    }
}
