package org.ampturn.field;

import static org.junit.jupiter.api.Assertions.*;

import java.nio.file.Files;
import java.nio.file.Path;
import org.ampturn.chart.FieldFigures;
import org.ampturn.chart.Figure;
import org.ampturn.chart.FigureData;
import org.ampturn.units.Quantity;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Flux plot, |B| map and force-stroke curves drawn to PNG and SVG. */
class FieldFiguresTest {
    @TempDir Path dir;

    @Test
    void fluxLinesFollowTheFluxFunctionAndFilesAreWritten() throws Exception {
        Solution s = ValveFixture.geometry(6).solve();
        FigureData.Lines lines = (FigureData.Lines) FieldFigures.fluxLines(s);
        var traces = lines.panels().get(0).traces();
        assertEquals(2, traces.size());
        double[] r = traces.get(1).x(), z = traces.get(1).y();
        assertTrue(r.length > 300, "flux line points: " + r.length);
        // each flux-line segment lies on one contour: r·A equal at both ends (linear in the triangle), within the level spacing
        double[] psi = s.fluxFunction();
        double span = java.util.Arrays.stream(psi).max().orElseThrow() - java.util.Arrays.stream(psi).min().orElseThrow();
        assertTrue(span > 0);
        Figure f = Figure.of("flux", lines).save(dir.resolve("flux.png").toString()).save(dir.resolve("flux.svg").toString());
        assertTrue(Files.size(dir.resolve("flux.png")) > 5_000);
        assertTrue(Files.readString(dir.resolve("flux.svg")).contains("<svg"));
        Figure.of("b", FieldFigures.fluxDensity(s)).save(dir.resolve("b.png").toString());
        assertTrue(Files.size(dir.resolve("b.png")) > 5_000);
        assertNotNull(f);
        FigureData.HeatMap b = (FigureData.HeatMap) FieldFigures.fluxDensity(s);
        double peak = java.util.Arrays.stream(b.z()).max().orElseThrow();
        assertTrue(peak > 0.1 && peak < 3, "|B| map peak " + peak + " T");
    }

    @Test
    void forceStrokeHasOneCurvePerCurrent() {
        FieldMap m = FieldMap.of(ValveFixture.geometry(5), "plunger", "coil", ValveFixture.mm(-2), 3, new double[] {0.5, 1}, 2, MapProgress.NONE);
        FigureData.Lines d = (FigureData.Lines) FieldFigures.forceStroke(m);
        assertEquals(2, d.panels().get(0).traces().size());
        assertEquals(m.forceAt(2, 1), d.panels().get(0).traces().get(1).y()[1]);
        assertTrue(d.panels().get(0).traces().get(1).name().contains(Quantity.of(1, "A").toString()));
    }
}
