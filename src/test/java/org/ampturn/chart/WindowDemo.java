package org.ampturn.chart;

import java.awt.Frame;
import java.awt.event.WindowEvent;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import javax.swing.SwingUtilities;
import jdk.jshell.JShell;
import jdk.jshell.SnippetEvent;
import org.ampturn.material.MagneticMaterial;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;

/**
 * Opens figures in real windows (run under Xvfb by bench/chart window) and checks what a user at
 * the console relies on: plot returns before the window is drawn, a second plot under the same
 * name reuses the window, closing a window keeps the figure, and a snippet evaluated by JShell
 * (local execution, as the console runs) opens a window through the facade. Tiles the windows
 * and waits, so the script can take a screenshot; exits 1 on a failed check.
 */
public final class WindowDemo {
    private static int failures;

    private static void check(boolean ok, String what) {
        System.out.println((ok ? "ok   " : "FAIL ") + what);
        if (!ok) failures++;
    }

    public static void main(String[] args) throws Exception {
        long hold = args.length > 0 ? Long.parseLong(args[0]) : 6000;
        check(Figures.windowsShown(), "a display is present: " + System.getenv("DISPLAY"));

        // from a snippet, as the console evaluates it
        JShell js = null;
        if (Boolean.getBoolean("demo.noshell")) {
            Plots.plot(new RlRun(100_001));
        } else {
            js = JShell.builder().executionEngine("local").build();
            String[] snippets = {
                "import static org.ampturn.Ampturn.*;",
                "var run = new org.ampturn.chart.RlRun(100_001);",
                "long t0 = System.nanoTime();",
                "var fig = plot(run);",
                "long ms = (System.nanoTime() - t0) / 1_000_000;",
            };
            for (String s : snippets) {
                for (SnippetEvent e : js.eval(s)) {
                    if (e.exception() != null) throw new IllegalStateException(s + ": " + e.exception(), e.exception());
                    if (e.status() != jdk.jshell.Snippet.Status.VALID) throw new IllegalStateException(s + ": " + e.status());
                }
            }
            String ms = js.eval("ms").get(0).value();
            System.out.println("     plot(run) from a snippet returned in " + ms + " ms (100,001 points, first chart in the process)");
            check(js.eval("fig.name()").get(0).value().equals("\"transient\""), "the snippet got a figure handle");
        }
        waitForWindows(1);
        check(Windows.open().equals(List.of("transient")), "one window, named transient");
        check(titles().equals(List.of("transient — Ampturn")), "its title names the figure and the program: " + titles());
        String toolkit = java.awt.Toolkit.getDefaultToolkit().getClass().getName();
        if (toolkit.equals("sun.awt.X11.XToolkit")) {
            // the toolkit was started by AmpturnWindows, so the X11 window class is ours, not java-lang-Thread
            java.lang.reflect.Method m = Class.forName(toolkit).getDeclaredMethod("getAWTAppClassName");
            String wmClass;
            try {
                m.setAccessible(true);
                wmClass = (String) m.invoke(null);
            } catch (RuntimeException e) {
                wmClass = null; // the JVM does not open sun.awt.X11: read it with xprop instead (bench/chart window)
            }
            if (wmClass != null) {
                check(wmClass.equals(AmpturnWindows.WINDOW_CLASS) || wmClass.equals(AmpturnWindows.FALLBACK_CLASS), "X11 window class " + wmClass);
            }
        }

        // plotting again under the same name updates that window
        if (!Boolean.getBoolean("demo.noreplot")) Plots.plot(new RlRun(50_001, 0.8));
        waitForWindows(1);
        check(Windows.open().size() == 1 && countShowing() == 1, "same name, same window (" + countShowing() + " showing)");

        FakeTable sweep = new FakeTable().with("turns", Dimension.NONE, 200, 300, 400, 500, 600, 700, 800)
                .with("inductance", Dimension.INDUCTANCE, 2.1e-3, 4.6e-3, 8.3e-3, 12.9e-3, 18.6e-3, 25.4e-3, 33.1e-3)
                .with("resistance", Dimension.RESISTANCE, 3.2, 4.9, 6.5, 8.1, 9.8, 11.4, 13.0);
        Plots.plot(sweep, "turns");
        java.util.Random r = new java.util.Random(11);
        double[] v = new double[2000];
        for (int i = 0; i < v.length; i++) v[i] = 0.50 + 0.018 * r.nextGaussian();
        Plots.histogram("pull-in current", Dimension.CURRENT, v, Quantity.parse("455 mA"), Quantity.parse("545 mA"));
        Plots.bh(MagneticMaterial.linear("demo iron", 1800, Quantity.parse("1.6 T")), Quantity.parse("1.2 T"));
        waitForWindows(4);
        check(Windows.open().size() == 4, "four windows: " + Windows.open());

        // closing a window loses nothing: the figure saves, and plotting it again reopens it
        Figure hist = Figures.named("histogram").orElseThrow();
        SwingUtilities.invokeAndWait(() -> {
            for (Frame f : Frame.getFrames()) {
                if (f.getTitle().startsWith("histogram")) f.dispatchEvent(new WindowEvent(f, WindowEvent.WINDOW_CLOSING));
            }
        });
        Thread.sleep(300);
        check(!Windows.open().contains("histogram"), "the closed window is gone");
        Path saved = Files.createTempDirectory("demo").resolve("histogram.png");
        hist.save(saved.toString());
        check(Files.size(saved) > 10_000, "a closed figure still saves: " + saved);
        Plots.plot(hist);
        waitForWindows(4);
        check(Windows.open().contains("histogram"), "plotting it again reopens it");

        if (Boolean.getBoolean("demo.threads")) {
            for (Thread t : Thread.getAllStackTraces().keySet()) {
                System.out.println("     thread " + t.getName() + " group " + (t.getThreadGroup() == null ? "-" : t.getThreadGroup().getName()));
            }
        }
        if (js != null && !Boolean.getBoolean("demo.keepshell")) js.close();
        // a worksheet can ask for files as well as windows, to record them for its report
        Figures.useDirectory(Files.createTempDirectory("demo-files"));
        Figures.useFilesWithWindows(true);
        Figure again = Plots.plot(sweep, "turns");
        Figures.useFilesWithWindows(false);
        waitForWindows(4);
        check(again.files().size() == 1 && Files.isRegularFile(again.files().get(0)) && Windows.open().size() == 4,
                "a window and a file when asked: " + again.files());

        tile();
        java.awt.Robot robot = new java.awt.Robot();
        long start = System.nanoTime();
        for (Frame f : Frame.getFrames()) {
            if (!f.isShowing()) continue;
            int colours = 0;
            for (int i = 0; i < 100 && colours <= 20; i++) {
                SwingUtilities.invokeAndWait(() -> { });
                colours = Pixels.distinctColours(robot.createScreenCapture(f.getBounds()));
                if (colours <= 20) Thread.sleep(100);
            }
            check(colours > 20, "window \"" + f.getTitle() + "\" shows a chart (" + colours + " colours on screen, after "
                    + (System.nanoTime() - start) / 1_000_000 + " ms)");
        }
        System.out.println("READY");
        System.out.flush();
        Thread.sleep(hold);
        System.out.println(failures == 0 ? "all window checks passed" : failures + " window checks failed");
        System.exit(failures == 0 ? 0 : 1);
    }

    private static List<String> titles() {
        List<String> t = new java.util.ArrayList<>();
        for (Frame f : Frame.getFrames()) if (f.isShowing()) t.add(f.getTitle());
        return t;
    }

    private static int countShowing() {
        int n = 0;
        for (Frame f : Frame.getFrames()) if (f.isShowing()) n++;
        return n;
    }

    private static void waitForWindows(int n) throws Exception {
        for (int i = 0; i < 100; i++) {
            SwingUtilities.invokeAndWait(() -> { });
            if (countShowing() >= n) {
                Thread.sleep(400); // let the charts paint
                return;
            }
            Thread.sleep(50);
        }
    }

    /** Two by two on the screen, so one screenshot shows every window. */
    private static void tile() throws Exception {
        SwingUtilities.invokeAndWait(() -> {
            java.awt.Rectangle s = java.awt.GraphicsEnvironment.getLocalGraphicsEnvironment().getMaximumWindowBounds();
            int i = 0;
            for (Frame f : Frame.getFrames()) {
                if (!f.isShowing()) continue;
                int w = s.width / 2, h = s.height / 2;
                f.setBounds((i % 2) * w, (i / 2) * h, w, h);
                f.validate();
                i++;
            }
        });
        Thread.sleep(800);
    }
}
