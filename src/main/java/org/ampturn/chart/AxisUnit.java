package org.ampturn.chart;

import org.ampturn.units.Dimension;
import org.ampturn.units.Unit;
import org.ampturn.units.Units;

/**
 * The display unit of one axis, chosen from the range of its data: the largest SI-prefixed unit
 * of the dimension in which the largest magnitude is at least 1 (0.0123 A → mA, 12.3 mA on the
 * axis; 0.8 A → mA, 800 mA). The axis is labelled {@code current (mA)}.
 *
 * @param symbol the unit symbol, empty for a pure number
 * @param factor SI value of one display unit (1e-3 for mA)
 */
public record AxisUnit(String symbol, double factor) {

    /** The unit for data of dimension {@code d} whose largest magnitude is {@code maxAbs} (SI). */
    public static AxisUnit forRange(Dimension d, double maxAbs) {
        Unit chosen = Units.unitFor(d, maxAbs);
        if (chosen == null) return new AxisUnit(d.isNone() ? "" : d.baseSymbols(), 1);
        return new AxisUnit(chosen.symbol(), chosen.factor());
    }


    /** The axis label: {@code current (mA)}, or just the word for a pure number. */
    public String label(String quantity) {
        return symbol.isEmpty() ? quantity : quantity + " (" + symbol + ")";
    }

    double toDisplay(double si) {
        return si / factor;
    }

    /** A copy of SI values in display units. */
    double[] toDisplay(double[] si) {
        double[] r = new double[si.length];
        double k = 1 / factor;
        for (int i = 0; i < si.length; i++) r[i] = si[i] * k;
        return r;
    }
}
