package org.ampturn.chart;

import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;

/**
 * A figure made by {@code plot}: a name, what it shows ({@link FigureData}) and the files it has
 * been saved to. {@link #save(String)} writes PNG or SVG by the file's extension. The handle stays
 * valid after its window is closed; {@link #show()} opens it again.
 */
public final class Figure {
    /** Size of {@link #save(String)} in pixels: a legible report figure. */
    public static final int DEFAULT_WIDTH = 1200;
    public static final int DEFAULT_HEIGHT = 800;

    private final String name;
    private final FigureData data;
    private final List<Path> files = new CopyOnWriteArrayList<>();

    Figure(String name, FigureData data) {
        this.name = name;
        this.data = data;
    }

    /** A figure of the given data, not yet shown or registered; {@link Figures#show} does both. */
    public static Figure of(String name, FigureData data) {
        if (data == null) throw new IllegalArgumentException("figure \"" + name + "\" has nothing to show (null)");
        return new Figure(Figures.checkName(name), data);
    }

    public String name() { return name; }

    public FigureData data() { return data; }

    /** Files written so far, oldest first (writing this figure's own file first if it is due). */
    public List<Path> files() {
        Figures.flush();
        return List.copyOf(files);
    }

    List<Path> filesWritten() { return List.copyOf(files); }

    /** Writes the figure at {@value #DEFAULT_WIDTH}×{@value #DEFAULT_HEIGHT} pixels; PNG or SVG by extension. */
    public Figure save(String path) {
        return save(path, DEFAULT_WIDTH, DEFAULT_HEIGHT);
    }

    /**
     * Writes the figure at a stated size (pixels; for SVG the user units of the drawing), PNG or
     * SVG by the extension. A relative path is taken from the working directory.
     */
    public Figure save(String path, int width, int height) {
        if (path == null || path.isBlank()) throw new IllegalArgumentException("figure file name is missing; give for example \"coil.png\" or \"coil.svg\"");
        return save(Path.of(path), width, height);
    }

    /**
     * Writes the figure at a stated size, PNG or SVG by the extension, atomically and with the
     * user's normal file permissions. Saving the figure that {@code plot} just made writes this file
     * instead of the numbered one {@code plot} would otherwise write.
     */
    public Figure save(Path path, int width, int height) {
        if (path == null) throw new IllegalArgumentException("figure file is missing (null)");
        write(path, width, height);
        Figures.savedByUser(this, path);
        return this;
    }

    void write(Path path, int width, int height) {
        Render.checkSize(width, height);
        Render.formatOf(path);
        Display.settle();
        Render.write(Build.chart(data), path, width, height);
        if (!files.contains(path)) files.add(path);
        Figures.written(path);
    }

    /** Opens (or refreshes) this figure's window when a display exists; otherwise does nothing. */
    public Figure show() {
        if (Figures.windowsShown()) Windows.show(this);
        return this;
    }

    /** The one-line terminal preview: a sparkline of the main curve with its range. */
    public String preview() {
        return Preview.of(data);
    }

    @Override
    public String toString() {
        Figures.flush();
        StringBuilder sb = new StringBuilder("figure ").append(name).append(": ").append(describe(data));
        // the file's name only: a worksheet records this text, and the folder differs between the
        // console, a batch run and verify (the worksheet's //= figure: lines hold the path)
        if (!files.isEmpty()) sb.append(" → ").append(files.get(files.size() - 1).getFileName());
        return sb.toString();
    }

    static String describe(FigureData d) {
        if (d instanceof FigureData.Lines l) {
            int curves = 0, points = 0;
            for (Panel p : l.panels()) {
                curves += p.traces().size();
                points += p.points();
            }
            return (l.panels().size() == 1 ? "1 panel" : l.panels().size() + " stacked panels") + ", "
                    + curves + (curves == 1 ? " curve" : " curves") + ", " + points + " points";
        }
        if (d instanceof FigureData.Histogram h) return "histogram of " + h.quantity() + ", " + h.raw().length + " runs";
        FigureData.HeatMap m = (FigureData.HeatMap) d;
        return "map of " + m.zQuantity() + " over " + m.xQuantity() + " and " + m.yQuantity() + ", " + m.zs().length + " cells"
                + (m.overlays().isEmpty() ? "" : ", with " + String.join(" and ", m.overlays().stream().map(Trace::name).toList()));
    }
}
