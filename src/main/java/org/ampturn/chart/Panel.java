package org.ampturn.chart;

import java.util.List;
import org.ampturn.units.Dimension;

/**
 * One stacked panel of a line figure: curves of one physical quantity sharing a y axis.
 *
 * @param quantity  the axis word, e.g. "current"; the axis reads {@code current (mA)}
 * @param dimension the dimension of every trace's y values
 * @param traces    the curves, at least one
 */
public record Panel(String quantity, Dimension dimension, List<Trace> traces) {
    public Panel {
        if (quantity == null) throw new IllegalArgumentException("panel quantity is missing (null)");
        if (dimension == null) throw new IllegalArgumentException("panel \"" + quantity + "\" needs a dimension, got null");
        if (traces == null || traces.isEmpty()) throw new IllegalArgumentException("panel \"" + quantity + "\" has no traces");
        traces = List.copyOf(traces);
    }

    public static Panel of(String quantity, Dimension dimension, Trace... traces) {
        return new Panel(quantity, dimension, List.of(traces));
    }

    boolean holds(String traceOrQuantity) {
        if (traceOrQuantity == null) return false;
        if (quantity.equalsIgnoreCase(traceOrQuantity)) return true;
        for (Trace t : traces) if (t.name().equalsIgnoreCase(traceOrQuantity)) return true;
        return false;
    }

    double maxAbsY() {
        double m = 0;
        for (Trace t : traces) m = Math.max(m, t.maxAbsY());
        return m;
    }

    int points() {
        int n = 0;
        for (Trace t : traces) n += t.size();
        return n;
    }
}
