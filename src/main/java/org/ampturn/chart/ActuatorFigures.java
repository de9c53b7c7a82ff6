package org.ampturn.chart;

import java.util.ArrayList;
import java.util.List;
import org.ampturn.actuator.ForceStroke;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;

/** Figures of actuators: force-stroke curves at several currents with the spring and load line on the same axes. */
final class ActuatorFigures {
    private ActuatorFigures() {}

    /** One panel of force against position: a curve per current, then the spring and load line. */
    static FigureData.Lines of(ForceStroke fs) {
        double[] x = fs.positions();
        List<Trace> traces = new ArrayList<>();
        double[] currents = fs.currents();
        for (int k = 0; k < currents.length; k++) {
            traces.add(Trace.of("pull at " + Quantity.of(currents[k], Dimension.CURRENT), x, fs.pull(k)));
        }
        traces.add(Trace.of("spring and load", x, fs.mechanical()));
        Panel force = new Panel("force", Dimension.FORCE, traces);
        return new FigureData.Lines("force-stroke of " + fs.actuator(), "position", Dimension.LENGTH, List.of(force), List.of());
    }
}
