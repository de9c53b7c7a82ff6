package org.ampturn.units;

import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;

/**
 * A unit of measure: a symbol, a factor to SI, an offset (only the degree Celsius has one) and a
 * dimension. Units are read from the text engineers type: {@code mH}, {@code kohm}, {@code kΩ},
 * {@code A/mm^2}, {@code W/(m²·K)}, {@code degC}.
 */
public final class Unit {
    private static final Map<String, Unit> CACHE = new ConcurrentHashMap<>();

    private final String symbol;
    private final double factor;
    private final double offset;
    private final Dimension dimension;

    Unit(String symbol, double factor, double offset, Dimension dimension) {
        this.symbol = symbol;
        this.factor = factor;
        this.offset = offset;
        this.dimension = dimension;
    }

    /** Reads a unit expression; fails with a message that names the text and the position. */
    public static Unit parse(String text) {
        if (text == null) throw Require.fail("a unit is missing (null); give one such as \"mH\" or \"\" for a pure number");
        Unit u = CACHE.get(text);
        if (u == null) {
            u = new UnitParser(text).parse();
            if (CACHE.size() < 10_000 && text.length() <= 64) CACHE.put(text, u); // long texts are rare: no cache of megabytes
        }
        return u;
    }

    public String symbol() {
        return symbol;
    }

    /** Multiply a value in this unit by this to get SI (ignoring any offset). */
    public double factor() {
        return factor;
    }

    public Dimension dimension() {
        return dimension;
    }

    /** True for the degree Celsius, whose zero is not the SI zero. */
    public boolean isOffset() {
        return offset != 0;
    }

    public double toSi(double value) {
        Require.finite("value", value);
        return Require.result("to si", value * factor + offset);
    }

    public double fromSi(double si) {
        Require.finite("SI value", si);
        return Require.result("from si", (si - offset) / factor);
    }

    @Override
    public String toString() {
        return symbol;
    }
}
