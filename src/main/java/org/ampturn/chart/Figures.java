package org.ampturn.chart;

import java.awt.GraphicsEnvironment;
import java.io.PrintStream;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.function.IntSupplier;

/**
 * The figures made so far and where they go. With a display (and windows not turned off) a figure
 * opens in a window; otherwise it is written to {@link #directory()} as {@code NN-name.png} and
 * its path and preview are printed.
 *
 * <p>The worksheet sets the directory and the number per worksheet entry
 * ({@code gate-latch.figures/03-current.png}); batch runs turn windows off.
 */
public final class Figures {
    private Figures() {}

    private static volatile Path directory = Path.of("");
    private static volatile IntSupplier numbering;
    private static volatile PrintStream out;
    private static volatile boolean quiet;
    private static volatile boolean windows = true;
    private static volatile List<String> formats = List.of("png");
    private static final List<Figure> MADE = new CopyOnWriteArrayList<>();

    /** Where figures without a window are written; the working directory unless changed. */
    public static Path directory() { return directory; }

    public static void useDirectory(Path dir) {
        if (dir == null) throw new IllegalArgumentException("figure directory is missing (null)");
        directory = dir;
    }

    /** Where the number NN in file names comes from (the worksheet entry); default the count of figures made. */
    public static void useNumbering(IntSupplier next) { numbering = next; }

    /** Where paths and previews are printed; null for {@code System.out} at the time of printing. */
    public static void printTo(PrintStream stream) {
        out = stream;
        quiet = false;
    }

    /** The stream set by {@link #printTo}, or null when notes go to {@code System.out}. */
    public static PrintStream printingTo() {
        return out;
    }

    /** No printing at all. */
    public static void silence() { quiet = true; }

    /**
     * Whether a figure shown in a window is also written to a file (so a worksheet records it for
     * its report); off unless turned on. Without a window the file is always written.
     */
    public static void useFilesWithWindows(boolean on) { filesWithWindows = on; }

    private static volatile boolean filesWithWindows;

    /** Turns windows on or off (batch runs write files even when a display exists). */
    public static void useWindows(boolean on) { windows = on; }

    /** File formats written when there is no window: "png", "svg" or both. */
    public static void useFormats(String... exts) {
        List<String> f = new ArrayList<>();
        for (String e : exts) {
            String x = e.toLowerCase(Locale.ROOT).replaceFirst("^\\.", "");
            if (!x.equals("png") && !x.equals("svg")) throw new IllegalArgumentException("figure format must be png or svg, got \"" + e + "\"");
            f.add(x);
        }
        if (f.isEmpty()) throw new IllegalArgumentException("give at least one figure format: png or svg");
        formats = List.copyOf(f);
    }

    /** True when figures open in windows: a display exists and windows are on. */
    public static boolean windowsShown() {
        Display.settle();
        return windows && !windowsFailed && !GraphicsEnvironment.isHeadless();
    }

    private static volatile boolean windowsFailed;

    /**
     * Starts the window system ahead of the first plot (call from a background thread at start-up
     * to take the first window's start-up cost off the user's first plot); does nothing headless.
     */
    public static void prepareWindows() {
        if (windowsShown()) Windows.prepare();
    }

    /** The figures made so far, oldest first. */
    public static List<Figure> made() {
        flush();
        return List.copyOf(MADE);
    }

    /** The latest figure of that name. */
    public static Optional<Figure> named(String name) {
        for (int i = MADE.size() - 1; i >= 0; i--) if (MADE.get(i).name().equals(name)) return Optional.of(MADE.get(i));
        return Optional.empty();
    }

    /** One line per figure: name, what it shows, its files; for the figures command. */
    public static String listing() {
        flush();
        if (MADE.isEmpty()) return "no figures yet";
        StringBuilder sb = new StringBuilder();
        for (Figure f : MADE) {
            if (sb.length() > 0) sb.append('\n');
            sb.append(f.name()).append(": ").append(Figure.describe(f.data()));
            List<Path> files = f.files();
            if (files.isEmpty()) sb.append(" (window only)");
            for (int i = 0; i < files.size(); i++) sb.append(i == 0 ? " → " : ", ").append(files.get(i));
        }
        return sb.toString();
    }

    /** Every figure file written in this JVM, in order, one item per write (never forgotten). */
    private static final List<Path> WRITTEN = new CopyOnWriteArrayList<>();

    static void written(Path file) { WRITTEN.add(file.toAbsolutePath()); }

    /**
     * The log of figure files written so far, one item per write, oldest first. It only grows, so
     * the files an entry wrote are the items added while it ran, even when it rewrote a file that an
     * earlier entry had written. Writes the last figure's own file first, if it is still due
     * ({@link #flush()}).
     */
    public static List<Path> written() {
        flush();
        return List.copyOf(WRITTEN);
    }

    /** Forgets the figures made (a fresh session); windows stay open. */
    public static void clear() {
        flush();
        MADE.clear();
    }

    /** The figure whose own file is still to be written, and the number it was given; guarded by its class. */
    private record Due(Figure figure, int number, boolean inWindow) {}

    private static Due due;

    /**
     * Shows a figure under its name: refreshes that name's window, or, without a window, arranges
     * its own file {@code NN-name.png} in {@link #directory()} and prints the path and the preview.
     * Never throws for want of a display.
     *
     * <p>The file is written when the figure is next looked at (its text, its files, the list of
     * figures), when another figure is shown, or when the session collects the entry's files, unless
     * the figure is saved to a file of the user's choice first: {@code plot(x).save("f.png")}
     * writes {@code f.png} and nothing else.
     */
    public static Figure show(Figure f) {
        flush();
        MADE.add(f);
        boolean shown = false;
        Display.settle();
        String note = Display.takeNote();
        if (note != null) print(note);
        if (windowsShown()) {
            try {
                Windows.show(f);
                shown = true;
            } catch (java.awt.HeadlessException | java.awt.AWTError | Windows.Unavailable e) {
                // a display is named but cannot be reached: say so once, then write files like a headless run
                windowsFailed = true;
                print(e instanceof Windows.Unavailable ? e.getMessage() + "; writing figure files instead"
                        : "no window (" + e.getMessage() + "); writing figure files instead");
            }
        }
        if (!shown || filesWithWindows) {
            int n = numbering != null ? numbering.getAsInt() : MADE.size();
            synchronized (Figures.class) {
                due = new Due(f, n, shown);
            }
        }
        return f;
    }

    /** Writes the file of the last figure shown, if it is still due; a program that plots without saving calls it before it ends. */
    public static void flush() {
        Due d;
        synchronized (Figures.class) {
            d = due;
            due = null;
        }
        if (d == null) return;
        for (String ext : formats) {
            Path file = directory.resolve(String.format(Locale.ROOT, "%02d-%s.%s", d.number(), slug(d.figure().name()), ext));
            d.figure().write(file, Figure.DEFAULT_WIDTH, Figure.DEFAULT_HEIGHT);
        }
        print("figure " + d.figure().name() + " → " + String.join(", ", d.figure().filesWritten().stream().map(Path::toString).toList()));
        if (!d.inWindow()) print(d.figure().preview());
    }

    /**
     * Called when the user saves a figure to a file of their choice: if it is the figure whose own
     * file is due, that file is not written, and the path (and, without a window, the preview) is
     * printed for the user's file instead.
     */
    static void savedByUser(Figure f, Path file) {
        Due d;
        synchronized (Figures.class) {
            if (due == null || due.figure() != f) return;
            d = due;
            due = null;
        }
        print("figure " + f.name() + " → " + file);
        if (!d.inWindow()) print(f.preview());
    }

    private static void print(String line) {
        if (quiet) return;
        PrintStream s = out != null ? out : System.out;
        s.println("  " + line);
        s.flush();
    }

    /** A name safe in a file name: lower case letters, digits and dashes. */
    static String slug(String name) {
        String s = name.toLowerCase(Locale.ROOT).replaceAll("[^a-z0-9]+", "-").replaceAll("^-+|-+$", "");
        return s.isEmpty() ? "figure" : s;
    }

    static String checkName(String name) {
        if (name == null || name.isBlank()) throw new IllegalArgumentException("figure name is missing; give a word such as \"current\"");
        if (name.length() > 80) throw new IllegalArgumentException("figure name must be at most 80 characters, got " + name.length());
        return name.strip();
    }
}
