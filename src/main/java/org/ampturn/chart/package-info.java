/**
 * Charts: windows, PNG and SVG files and a one-line terminal preview for transients, sweeps,
 * tolerance runs and B-H curves. The only package that sees JFreeChart and the SVG library.
 *
 * <p>Conventions: data arrive in SI doubles ({@link org.ampturn.chart.Trace},
 * {@link org.ampturn.chart.Mark}); each axis picks its own SI-prefixed display unit from the range
 * of its data ({@link org.ampturn.chart.AxisUnit}) and is labelled {@code current (mA)}. Nothing
 * here is null-tolerant unless its Javadoc says so. Public signatures use only this package's own
 * types, {@link org.ampturn.units} and the JDK, so callers never see the chart library; the
 * library's classes load on the first plot, not before.
 *
 * <p>With a display a figure opens a window (created on the event thread, never blocking the
 * caller; one window per figure name, updated in place). Without one ({@code java.awt.headless}),
 * a figure is written to {@link org.ampturn.chart.Figures#directory()} and its path and a sparkline
 * preview are printed.
 */
package org.ampturn.chart;
