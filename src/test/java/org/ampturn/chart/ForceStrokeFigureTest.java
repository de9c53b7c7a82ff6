package org.ampturn.chart;

import static org.ampturn.Ampturn.*;
import static org.junit.jupiter.api.Assertions.*;

import java.awt.image.BufferedImage;
import java.util.List;
import org.ampturn.actuator.ForceStroke;
import org.ampturn.actuator.Plunger;
import org.ampturn.units.Quantity;
import org.junit.jupiter.api.Test;

/** Force-stroke curves with the spring and load line. */
class ForceStrokeFigureTest {
    static final Plunger VALVE = Plunger.of(420, mm2(28), mm(0.8)).withResistance(ohm(9.5))
            .withSpring(Quantity.of(2000, "N/m"), N(1)).withLoad(N(1)).withConicalPole(45);

    @Test
    void curvesAreThePlungersForceAndTheLineIsSpringPlusLoad() {
        ForceStroke fs = VALVE.forceStroke(11, A(0.2), A(1));
        double[] x = fs.positions(), line = fs.mechanical();
        for (int k = 0; k < 2; k++) {
            double[] pull = fs.pull(k);
            double margin = Double.POSITIVE_INFINITY;
            for (int j = 0; j < x.length; j++) {
                assertEquals(VALVE.force(A(fs.currents()[k]), m(x[j])).si(), pull[j], 1e-12 * pull[j]);
                // spring with preload plus the constant load (Hooke's law; common practice)
                assertEquals(1 + 2000 * x[j] + 1, line[j], 1e-12);
                margin = Math.min(margin, pull[j] - line[j]);
            }
            assertEquals(margin, fs.margin(k).si(), 0);
        }
        assertEquals(0.8e-3, x[x.length - 1], 0);
        assertTrue(fs.margin(0).si() < 0 && fs.margin(1).si() > 0, fs.toString());
        assertTrue(fs.toString().startsWith("force-stroke of plunger 420 turns"), fs.toString());
    }

    @Test
    void theFigureHasOneCurvePerCurrentAndTheLine() {
        FigureData.Lines d = ActuatorFigures.of(VALVE.forceStroke(21, A(0.2), A(0.5), A(1)));
        assertEquals(1, d.panels().size());
        assertEquals(List.of("pull at 200.0 mA", "pull at 500.0 mA", "pull at 1.000 A", "spring and load"),
                d.panels().get(0).traces().stream().map(Trace::name).toList());
        assertEquals("position", d.xQuantity());
        BufferedImage img = Render.image(Build.chart(d), 900, 600);
        assertTrue(Pixels.count(img, Style.series(0), 30) > 200, "first curve drawn");
        assertThrows(IllegalArgumentException.class, () -> VALVE.forceStroke(1, A(1)));
        assertThrows(IllegalArgumentException.class, () -> VALVE.forceStroke(11));
    }
}
