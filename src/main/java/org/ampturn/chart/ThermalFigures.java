package org.ampturn.chart;

import java.util.ArrayList;
import java.util.List;
import org.ampturn.thermal.DutyCycle;
import org.ampturn.thermal.ElectroThermalRun;
import org.ampturn.thermal.HeatingCurve;
import org.ampturn.units.Dimension;

/**
 * Figures of heating over time: the winding (and frame) temperature in °C against time, with the
 * insulation class limit and the winding limit (class less the hot-spot allowance) drawn as lines.
 */
final class ThermalFigures {
    private ThermalFigures() {}

    /** Cycles of a duty drawn by {@link #of(DutyCycle)}: enough to see the climb, at most 200. */
    static final int DUTY_CYCLES = 200;

    static FigureData.Lines of(HeatingCurve c) {
        double[] t = c.timesS(), w = c.windingK();
        double[] wc = new double[w.length];
        for (int i = 0; i < w.length; i++) wc[i] = w[i] - 273.15;
        List<Trace> traces = new ArrayList<>();
        traces.add(Trace.of("winding", t, wc));
        if (c.hasFrame()) {
            double[] f = c.frameK();
            double[] fc = new double[f.length];
            for (int i = 0; i < f.length; i++) fc[i] = f[i] - 273.15;
            traces.add(Trace.of("frame", t, fc));
        }
        String word = "temperature (°C)";
        Panel p = new Panel(word, Dimension.NONE, traces);
        double limit = c.classLimitK() - 273.15, allowance = c.hotSpotAllowance().si();
        List<Mark> marks = new ArrayList<>();
        marks.add(new Mark("class limit", Double.NaN, limit, word, c.insulationClass() + " limit " + fmt(limit) + " °C"));
        if (allowance > 0) {
            marks.add(new Mark("winding limit", Double.NaN, limit - allowance, word,
                    "winding limit " + fmt(limit - allowance) + " °C (hot spot " + fmt(allowance) + " K above)"));
        }
        return new FigureData.Lines("winding temperature, " + c.label(), "time", Dimension.TIME, List.of(p), marks);
    }

    static FigureData.Lines of(DutyCycle d) {
        long n = d.cyclesToSteady();
        int cycles = (int) Math.max(2, Math.min(DUTY_CYCLES, n < 0 ? DUTY_CYCLES : n + 2));
        return of(d.curve(cycles));
    }

    static FigureData.Lines of(ElectroThermalRun r) {
        return of(r.curve());
    }

    private static String fmt(double v) {
        return org.ampturn.units.Quantity.number(v).format(4);
    }
}
