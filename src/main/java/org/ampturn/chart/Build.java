package org.ampturn.chart;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Line2D;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.LegendItem;
import org.jfree.chart.LegendItemCollection;
import org.jfree.chart.annotations.XYPointerAnnotation;
import org.jfree.chart.axis.AxisLocation;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.SymbolAxis;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.PaintScale;
import org.jfree.chart.renderer.xy.SamplingXYLineRenderer;
import org.jfree.chart.renderer.xy.StandardXYBarPainter;
import org.jfree.chart.renderer.xy.XYBarRenderer;
import org.jfree.chart.renderer.xy.XYBlockRenderer;
import org.jfree.chart.renderer.xy.XYItemRenderer;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.LegendTitle;
import org.jfree.chart.title.PaintScaleLegend;
import org.jfree.chart.title.TextTitle;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.DefaultXYDataset;
import org.jfree.data.xy.DefaultXYZDataset;
import org.jfree.data.xy.XYBarDataset;

/** Turns {@link FigureData} into a styled chart of the chart library. A fresh chart per call. */
final class Build {
    private Build() {}

    /** Above this many points a curve is drawn by pixel column (min/max per column), not point by point. */
    static final int SAMPLING_ABOVE = 2000;
    /** At or below this many points a curve also shows its points (a coarse sweep). */
    static final int DOTS_UP_TO = 40;

    /** The most lines a figure's title takes. */
    static final int TITLE_LINES = 3;

    static JFreeChart chart(FigureData d) {
        if (d instanceof FigureData.Lines l) return lines(l);
        if (d instanceof FigureData.Histogram h) return histogram(h);
        if (d instanceof FigureData.HeatMap m) return heatMap(m);
        throw new IllegalArgumentException("cannot draw " + d);
    }

    // ---- lines -------------------------------------------------------------------------------

    static JFreeChart lines(FigureData.Lines d) {
        double xMax = 0;
        for (Panel p : d.panels()) for (Trace t : p.traces()) xMax = Math.max(xMax, t.maxAbsX());
        AxisUnit xu = AxisUnit.forRange(d.xDimension(), xMax);
        NumberAxis xAxis = d.xLabels().isEmpty() ? axis(xu.label(d.xQuantity()))
                : style(new SymbolAxis(d.xQuantity(), d.xLabels().toArray(new String[0])));
        xAxis.setAutoRangeIncludesZero(false);
        xAxis.setAutoRangeMinimumSize(xMax > 0 ? 0.1 * xu.toDisplay(xMax) : 1);
        xAxis.setLowerMargin(d.xLabels().isEmpty() ? 0 : 0.03);
        xAxis.setUpperMargin(d.xLabels().isEmpty() ? 0 : 0.03);
        CombinedDomainXYPlot combined = new CombinedDomainXYPlot(xAxis);
        combined.setGap(12);
        combined.setOrientation(PlotOrientation.VERTICAL);
        combined.setBackgroundPaint(Style.PAGE);
        combined.setOutlineVisible(false);

        int colour = 0;
        List<XYPlot> plots = new ArrayList<>();
        LegendItemCollection legendItems = new LegendItemCollection();
        for (Panel p : d.panels()) {
            AxisUnit yu = AxisUnit.forRange(p.dimension(), p.maxAbsY());
            NumberAxis yAxis = axis(yu.label(p.quantity()));
            yAxis.setAutoRangeIncludesZero(false);
            // a flat curve gets a readable span (±5 % of its level) instead of a range of rounding error
            double level = yu.toDisplay(p.maxAbsY());
            yAxis.setAutoRangeMinimumSize(level > 0 ? 0.1 * level : 1);
            DefaultXYDataset ds = new DefaultXYDataset();
            Set<String> keys = new HashSet<>();
            boolean dense = false;
            boolean dots = true;
            for (Trace t : p.traces()) {
                String key = t.name();
                for (int k = 2; !keys.add(key); k++) key = t.name() + " (" + k + ")";
                ds.addSeries(key, new double[][] {xu.toDisplay(t.xs()), yu.toDisplay(t.ys())});
                dense |= t.size() > SAMPLING_ABOVE;
                dots &= t.size() <= DOTS_UP_TO;
            }
            XYItemRenderer r = dense ? sampling() : lineRenderer(dots);
            for (int i = 0; i < p.traces().size(); i++) {
                r.setSeriesPaint(i, Style.series(colour));
                r.setSeriesStroke(i, Style.line(colour));
                colour++;
            }
            XYPlot plot = new XYPlot(ds, null, yAxis, r);
            area(plot);
            for (int i = 0; i < ds.getSeriesCount(); i++) {
                LegendItem li = new LegendItem(String.valueOf(ds.getSeriesKey(i)), null, null, null,
                        new Line2D.Double(-12, 0, 12, 0), r.getSeriesStroke(i), r.getSeriesPaint(i));
                li.setLabelFont(Style.LEGEND);
                li.setLabelPaint(Style.INK);
                legendItems.add(li);
            }
            plot.setFixedLegendItems(new LegendItemCollection());
            combined.add(plot, 1);
            plots.add(plot);
        }
        placeMarks(d, plots, xu);
        JFreeChart chart = new JFreeChart(null, Style.TITLE, combined, false);
        page(chart, d.title());
        if (legendItems.getItemCount() > 1) {
            // one legend for all panels, above them: every curve has its own colour, and nothing is covered
            LegendTitle legend = new LegendTitle(() -> legendItems);
            legend.setItemFont(Style.LEGEND);
            legend.setItemPaint(Style.INK);
            legend.setBackgroundPaint(Style.PAGE);
            legend.setPosition(RectangleEdge.TOP);
            legend.setHorizontalAlignment(org.jfree.chart.ui.HorizontalAlignment.LEFT);
            legend.setItemLabelPadding(new RectangleInsets(2, 4, 2, 14));
            legend.setMargin(new RectangleInsets(0, 60, 6, 0));
            chart.addLegend(legend);
        }
        return chart;
    }

    private static void placeMarks(FigureData.Lines d, List<XYPlot> plots, AxisUnit xu) {
        List<Panel> panels = d.panels();
        AxisUnit[] yu = new AxisUnit[panels.size()];
        for (int i = 0; i < yu.length; i++) yu[i] = AxisUnit.forRange(panels.get(i).dimension(), panels.get(i).maxAbsY());
        for (Mark m : d.marks()) {
            int home = 0;
            for (int i = 0; i < panels.size(); i++) {
                if (panels.get(i).holds(m.trace())) {
                    home = i;
                    break;
                }
            }
            if (m.isVertical()) {
                String text = m.text() != null ? m.text() : m.label() + " = " + shown(m.x(), d.xDimension(), xu);
                boolean everyPanel = m.trace() == null;
                for (int i = 0; i < plots.size(); i++) {
                    if (!everyPanel && i != home) continue;
                    ValueMarker vm = marker(xu.toDisplay(m.x()), Style.MARK, Style.MARK_LINE);
                    if (i == home && !m.label().isEmpty()) {
                        vm.setLabel(text);
                        vm.setLabelAnchor(RectangleAnchor.TOP_RIGHT);
                        vm.setLabelTextAnchor(TextAnchor.TOP_LEFT);
                    }
                    plots.get(i).addDomainMarker(vm);
                }
            } else if (m.isHorizontal()) {
                ValueMarker vm = marker(yu[home].toDisplay(m.y()), Style.MARK, Style.MARK_LINE);
                vm.setLabel(m.text() != null ? m.text() : m.label() + " " + shown(m.y(), panels.get(home).dimension(), yu[home]));
                vm.setLabelAnchor(RectangleAnchor.TOP_LEFT);
                vm.setLabelTextAnchor(TextAnchor.BOTTOM_LEFT);
                plots.get(home).addRangeMarker(vm);
            } else {
                Panel p = panels.get(home);
                double x = xu.toDisplay(m.x());
                double y = yu[home].toDisplay(m.y());
                String text = m.text() != null ? m.text()
                        : m.label() + " " + shown(m.y(), p.dimension(), yu[home]) + " at " + shown(m.x(), d.xDimension(), xu);
                double angle = pointerAngle(p, m);
                XYPointerAnnotation a = new XYPointerAnnotation(text, x, y, angle);
                a.setFont(Style.NOTE);
                a.setPaint(Style.INK);
                a.setArrowPaint(Style.INK_SOFT);
                a.setArrowStroke(new BasicStroke(1f));
                a.setBaseRadius(28);
                a.setTipRadius(6);
                a.setLabelOffset(3);
                a.setArrowLength(6);
                a.setArrowWidth(3);
                a.setTextAnchor(Math.cos(angle) > 0 ? TextAnchor.HALF_ASCENT_LEFT : TextAnchor.HALF_ASCENT_RIGHT);
                a.setBackgroundPaint(LABEL_BACK);
                XYPlot plot = plots.get(home);
                plot.addAnnotation(a);
                dot(plot, x, y);
            }
        }
    }

    private static final Color LABEL_BACK = new Color(255, 255, 255, 215);

    /** A dot at a marked point, drawn by a second renderer so it keeps its size on screen. */
    private static void dot(XYPlot plot, double x, double y) {
        int index = plot.getDatasetCount();
        DefaultXYDataset ds = new DefaultXYDataset();
        ds.addSeries("mark " + index, new double[][] {{x}, {y}});
        XYLineAndShapeRenderer r = new XYLineAndShapeRenderer(false, true);
        r.setSeriesShape(0, new Ellipse2D.Double(-4, -4, 8, 8));
        r.setSeriesPaint(0, Style.INK);
        r.setSeriesVisibleInLegend(0, false);
        plot.setDataset(index, ds);
        plot.setRenderer(index, r);
    }

    /** Points the label away from the data's middle so it stays inside the panel. */
    private static double pointerAngle(Panel p, Mark m) {
        double xLo = Double.POSITIVE_INFINITY, xHi = Double.NEGATIVE_INFINITY, yLo = xLo, yHi = xHi;
        for (Trace t : p.traces()) {
            for (double v : t.xs()) if (Double.isFinite(v)) { xLo = Math.min(xLo, v); xHi = Math.max(xHi, v); }
            for (double v : t.ys()) if (Double.isFinite(v)) { yLo = Math.min(yLo, v); yHi = Math.max(yHi, v); }
        }
        boolean right = m.x() > (xLo + xHi) / 2;
        boolean high = m.y() > (yLo + yHi) / 2;
        // screen angles: y grows downwards, so "up" is a negative angle
        if (right) return high ? 0.75 * Math.PI : -0.75 * Math.PI;
        return high ? 0.25 * Math.PI : -0.25 * Math.PI;
    }

    // ---- histogram ---------------------------------------------------------------------------

    static JFreeChart histogram(FigureData.Histogram h) {
        Bins b = Bins.of(h.raw(), h.lower(), h.upper());
        AxisUnit xu = AxisUnit.forRange(h.dimension(), b.maxAbs());
        DefaultXYDataset ds = new DefaultXYDataset();
        double[] centres = new double[b.counts().length];
        double[] counts = new double[b.counts().length];
        for (int i = 0; i < centres.length; i++) {
            centres[i] = xu.toDisplay(b.binLo() + (i + 0.5) * b.width());
            counts[i] = b.counts()[i];
        }
        ds.addSeries("runs", new double[][] {centres, counts});
        XYBarDataset bars = new XYBarDataset(ds, xu.toDisplay(b.width()));
        XYBarRenderer r = new XYBarRenderer(0.06);
        r.setBarPainter(new StandardXYBarPainter());
        r.setShadowVisible(false);
        r.setDrawBarOutline(false);
        r.setSeriesPaint(0, Style.BAR);
        NumberAxis xAxis = axis(xu.label(h.quantity()));
        xAxis.setAutoRangeIncludesZero(false);
        NumberAxis yAxis = axis("runs");
        yAxis.setStandardTickUnits(NumberAxis.createIntegerTickUnits(Locale.ROOT));
        yAxis.setUpperMargin(0.12);
        XYPlot plot = new XYPlot(bars, xAxis, yAxis, r);
        area(plot);
        double span = b.axisHi() - b.axisLo();
        xAxis.setRange(xu.toDisplay(b.axisLo() - 0.04 * span), xu.toDisplay(b.axisHi() + 0.04 * span));
        limit(plot, "lower limit", h.lower(), h.dimension(), xu, true);
        limit(plot, "upper limit", h.upper(), h.dimension(), xu, false);
        JFreeChart chart = new JFreeChart(null, Style.TITLE, plot, false);
        page(chart, h.title());
        TextTitle sub = new TextTitle(b.summary(), Style.SUBTITLE);
        sub.setPaint(Style.INK_SOFT);
        sub.setPosition(RectangleEdge.TOP);
        sub.setHorizontalAlignment(org.jfree.chart.ui.HorizontalAlignment.LEFT);
        chart.addSubtitle(sub);
        return chart;
    }

    private static void limit(XYPlot plot, String label, double si, Dimension d, AxisUnit xu, boolean lower) {
        if (Double.isNaN(si)) return;
        ValueMarker m = marker(xu.toDisplay(si), Style.LIMIT, Style.LIMIT_LINE);
        m.setLabel(label + " " + Quantity.of(si, d));
        m.setLabelPaint(Style.LIMIT);
        // labels face inward, towards the accepted range, so they stay inside the plot
        m.setLabelAnchor(lower ? RectangleAnchor.TOP_RIGHT : RectangleAnchor.TOP_LEFT);
        m.setLabelTextAnchor(lower ? TextAnchor.TOP_LEFT : TextAnchor.TOP_RIGHT);
        plot.addDomainMarker(m);
    }

    // ---- heat map ----------------------------------------------------------------------------

    static JFreeChart heatMap(FigureData.HeatMap m) {
        AxisUnit xu = AxisUnit.forRange(m.xDimension(), Trace.maxAbs(m.xs()));
        AxisUnit yu = AxisUnit.forRange(m.yDimension(), Trace.maxAbs(m.ys()));
        AxisUnit zu = AxisUnit.forRange(m.zDimension(), Trace.maxAbs(m.zs()));
        DefaultXYZDataset ds = new DefaultXYZDataset();
        double[] z = zu.toDisplay(m.zs());
        ds.addSeries(m.zQuantity(), new double[][] {xu.toDisplay(m.xs()), yu.toDisplay(m.ys()), z});
        double zLo = Double.POSITIVE_INFINITY, zHi = Double.NEGATIVE_INFINITY;
        for (double v : z) if (Double.isFinite(v)) { zLo = Math.min(zLo, v); zHi = Math.max(zHi, v); }
        if (!(zLo <= zHi)) { zLo = 0; zHi = 1; }
        if (zLo == zHi) { zLo -= 0.5; zHi += 0.5; }
        Ramp scale = new Ramp(zLo, zHi);
        XYBlockRenderer r = new XYBlockRenderer();
        r.setBlockWidth(xu.toDisplay(step(m.xs())));
        r.setBlockHeight(yu.toDisplay(step(m.ys())));
        r.setPaintScale(scale);
        NumberAxis xAxis = axis(xu.label(m.xQuantity()));
        NumberAxis yAxis = axis(yu.label(m.yQuantity()));
        xAxis.setAutoRangeIncludesZero(false);
        yAxis.setAutoRangeIncludesZero(false);
        xAxis.setLowerMargin(0);
        xAxis.setUpperMargin(0);
        yAxis.setLowerMargin(0);
        yAxis.setUpperMargin(0);
        XYPlot plot = new XYPlot(ds, xAxis, yAxis, r);
        area(plot);
        plot.setDomainGridlinesVisible(false);
        plot.setRangeGridlinesVisible(false);
        overlay(plot, m, xu, yu);
        JFreeChart chart = new JFreeChart(null, Style.TITLE, plot, false);
        page(chart, m.title());
        NumberAxis zAxis = axis(zu.label(m.zQuantity()));
        zAxis.setRange(zLo, zHi);
        PaintScaleLegend legend = new PaintScaleLegend(scale, zAxis);
        legend.setPosition(RectangleEdge.RIGHT);
        legend.setAxisLocation(AxisLocation.BOTTOM_OR_RIGHT);
        legend.setStripWidth(14);
        legend.setMargin(new RectangleInsets(12, 10, 12, 6));
        legend.setBackgroundPaint(Style.PAGE);
        chart.addSubtitle(legend);
        return chart;
    }

    /**
     * Lines over a heat map, drawn after it: the first overlay as outlines (a light line on a dark
     * edge), the others as contours (a thin light line on a darker halo), so they read on both ends
     * of the ramp. The axes keep the map's range.
     */
    private static void overlay(XYPlot plot, FigureData.HeatMap m, AxisUnit xu, AxisUnit yu) {
        if (m.overlays().isEmpty()) return;
        DefaultXYDataset ds = new DefaultXYDataset();
        XYLineAndShapeRenderer r = new XYLineAndShapeRenderer(true, false);
        r.setDrawSeriesLineAsPath(false);
        int k = 0;
        for (int i = 0; i < m.overlays().size(); i++) {
            Trace t = m.overlays().get(i);
            double[][] xy = {xu.toDisplay(t.xs()), yu.toDisplay(t.ys())};
            boolean outline = i == 0;
            // the dark under-stroke, then the light line on top of it
            ds.addSeries(t.name() + " (edge " + i + ")", xy);
            r.setSeriesPaint(k, outline ? Style.OUTLINE_EDGE : Style.CONTOUR_HALO);
            r.setSeriesStroke(k++, outline ? Style.OUTLINE_EDGE_LINE : Style.CONTOUR_HALO_LINE);
            ds.addSeries(t.name() + " (" + i + ")", xy);
            r.setSeriesPaint(k, outline ? Style.OUTLINE : Style.CONTOUR);
            r.setSeriesStroke(k++, outline ? Style.OUTLINE_LINE : Style.CONTOUR_LINE);
        }
        plot.setDataset(1, ds);
        plot.setRenderer(1, r);
        plot.setDatasetRenderingOrder(org.jfree.chart.plot.DatasetRenderingOrder.FORWARD);
        plot.setSeriesRenderingOrder(org.jfree.chart.plot.SeriesRenderingOrder.FORWARD);
        ((NumberAxis) plot.getDomainAxis()).setAutoRange(false);
        double[] xs = xu.toDisplay(m.xs()), ys = yu.toDisplay(m.ys());
        double bx = xu.toDisplay(step(m.xs())) / 2, by = yu.toDisplay(step(m.ys())) / 2;
        plot.getDomainAxis().setRange(min(xs) - bx, max(xs) + bx);
        plot.getRangeAxis().setRange(min(ys) - by, max(ys) + by);
    }

    private static double min(double[] v) { return Arrays.stream(v).filter(Double::isFinite).min().orElse(0); }
    private static double max(double[] v) { return Arrays.stream(v).filter(Double::isFinite).max().orElse(1); }

    /** The grid step of one parameter: the smallest gap between distinct finite values (1 when there is one value). */
    static double step(double[] v) {
        double[] s = Arrays.stream(v).filter(Double::isFinite).sorted().distinct().toArray();
        double best = Double.POSITIVE_INFINITY;
        for (int i = 1; i < s.length; i++) best = Math.min(best, s[i] - s[i - 1]);
        if (Double.isInfinite(best)) return s.length == 1 && s[0] != 0 ? Math.abs(s[0]) * 0.1 : 1;
        return best;
    }

    /** Our colour ramp as the chart library's paint scale. */
    static final class Ramp implements PaintScale {
        private final double lo, hi;
        Ramp(double lo, double hi) { this.lo = lo; this.hi = hi; }
        @Override public double getLowerBound() { return lo; }
        @Override public double getUpperBound() { return hi; }
        @Override public java.awt.Paint getPaint(double value) { return Style.ramp((value - lo) / (hi - lo)); }
    }

    // ---- shared pieces -----------------------------------------------------------------------

    private static SamplingXYLineRenderer sampling() {
        SamplingXYLineRenderer r = new SamplingXYLineRenderer();
        r.setDefaultStroke(Style.LINE);
        return r;
    }

    private static XYLineAndShapeRenderer lineRenderer(boolean dots) {
        XYLineAndShapeRenderer r = new XYLineAndShapeRenderer(true, dots);
        r.setDefaultShape(new Ellipse2D.Double(-3, -3, 6, 6));
        r.setAutoPopulateSeriesShape(false);
        r.setDrawSeriesLineAsPath(false);
        return r;
    }

    static NumberAxis axis(String label) {
        return style(new NumberAxis(label));
    }

    static <A extends NumberAxis> A style(A a) {
        a.setLabelFont(Style.AXIS);
        a.setLabelPaint(Style.INK);
        a.setTickLabelFont(Style.TICKS);
        a.setTickLabelPaint(Style.INK_SOFT);
        a.setAxisLinePaint(Style.INK_SOFT);
        a.setTickMarkPaint(Style.INK_SOFT);
        a.setTickMarkOutsideLength(3);
        a.setTickMarkInsideLength(0);
        a.setLabelInsets(new RectangleInsets(4, 4, 4, 4));
        // generous label insets make the tick choice coarser: fewer, more legible ticks
        a.setTickLabelInsets(new RectangleInsets(7, 14, 7, 14));
        a.setLowerMargin(0.04);
        a.setUpperMargin(0.06);
        // a curve resting at zero stays clear of the frame rather than sticking to it
        a.setAutoRangeStickyZero(false);
        return a;
    }

    private static void area(XYPlot plot) {
        plot.setBackgroundPaint(Style.AREA);
        plot.setOutlinePaint(Style.GRID);
        plot.setOutlineStroke(new BasicStroke(1f));
        plot.setDomainGridlinePaint(Style.GRID);
        plot.setRangeGridlinePaint(Style.GRID);
        plot.setDomainGridlineStroke(Style.GRID_LINE);
        plot.setRangeGridlineStroke(Style.GRID_LINE);
        plot.setDomainGridlinesVisible(true);
        plot.setRangeGridlinesVisible(true);
        plot.setAxisOffset(new RectangleInsets(0, 0, 0, 0));
        plot.setRangeZeroBaselineVisible(true);
        plot.setRangeZeroBaselinePaint(Style.INK_SOFT);
        plot.setRangeZeroBaselineStroke(new BasicStroke(0.8f));
    }

    private static ValueMarker marker(double at, Color c, java.awt.Stroke s) {
        ValueMarker m = new ValueMarker(at, c, s);
        m.setLabelFont(Style.NOTE);
        m.setLabelPaint(Style.INK);
        m.setLabelOffset(new RectangleInsets(3, 4, 3, 4));
        m.setLabelBackgroundColor(LABEL_BACK);
        return m;
    }

    private static void page(JFreeChart chart, String title) {
        chart.setBackgroundPaint(Style.PAGE);
        chart.setPadding(new RectangleInsets(10, 10, 10, 14));
        chart.setAntiAlias(true);
        chart.setTextAntiAlias(true);
        if (title != null && !title.isBlank()) {
            TextTitle t = new TextTitle(title, Style.TITLE);
            t.setPaint(Style.INK);
            t.setHorizontalAlignment(org.jfree.chart.ui.HorizontalAlignment.LEFT);
            // a long title wraps at word boundaries, every line flush left; past TITLE_LINES lines
            // the last shown line ends in an ellipsis, so nothing is cut mid-glyph at the edge
            t.setTextAlignment(org.jfree.chart.ui.HorizontalAlignment.LEFT);
            t.setMaximumLinesToDisplay(TITLE_LINES);
            t.setExpandToFitSpace(false);
            t.setPadding(new RectangleInsets(0, 4, 6, 0));
            chart.setTitle(t);
        }
    }

    static ValueAxis xAxisOf(JFreeChart c) {
        return c.getXYPlot().getDomainAxis();
    }

    static Font font(int size) {
        return new Font(Style.FACE, Font.PLAIN, size);
    }

    /** A value for a label: engineering notation, but a zero in the axis's own unit (0 mm, not 0 m). */
    private static String shown(double si, org.ampturn.units.Dimension d, AxisUnit axis) {
        if (si == 0 && !axis.symbol().isEmpty()) return "0 " + axis.symbol();
        return Quantity.of(si, d).toString();
    }
}
