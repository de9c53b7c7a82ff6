package org.ampturn.chart;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.ampturn.units.Dimension;

/** Demo data shaped like the study's table (columnNames(), dimension(col), values(col)). */
public final class FakeTable {
    private final Map<String, double[]> values = new LinkedHashMap<>();
    private final Map<String, Dimension> dims = new LinkedHashMap<>();

    public FakeTable with(String name, Dimension d, double... v) {
        values.put(name, v);
        dims.put(name, d);
        return this;
    }

    public List<String> columnNames() { return List.copyOf(values.keySet()); }
    public Dimension dimension(String col) { return dims.get(col); }
    public double[] values(String col) { return values.get(col).clone(); }
    @Override public String toString() { return "table, " + values.size() + " columns"; }
}
