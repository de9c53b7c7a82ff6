package org.ampturn.chart;

import java.awt.Dimension;
import java.awt.GraphicsEnvironment;
import java.awt.Rectangle;
import java.awt.event.WindowAdapter;
import java.awt.event.WindowEvent;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import javax.swing.JFrame;
import javax.swing.SwingUtilities;
import javax.swing.WindowConstants;
import org.jfree.chart.ChartPanel;
import org.jfree.chart.JFreeChart;

/**
 * One window per figure name. Built and changed on the event thread only (invokeLater), so the
 * caller never waits for the window; closing a window disposes it and forgets the name, and the
 * figure itself is kept.
 */
final class Windows {
    private Windows() {}

    /** Touched on the event thread only. */
    private static final Map<String, Frame> OPEN = new HashMap<>();

    private record Frame(JFrame frame, ChartPanel panel) {}

    private static volatile boolean prepared;

    /** The display is named but cannot be reached (or refuses windows): figures go to files instead. */
    static final class Unavailable extends RuntimeException {
        Unavailable(Throwable cause) {
            super("no window: " + (cause.getMessage() != null ? cause.getMessage() : cause.toString()), cause);
        }
    }

    /**
     * Starts the window system from a thread of the top thread group. The event thread takes the
     * thread group of whoever first touches the window system; when that is a JShell snippet, the
     * event thread lands in the shell's execution group, and the shell stops the threads of that
     * group (seen on Java 17: windows then stay blank). So the first touch is made here instead, by
     * {@link AmpturnWindows}, which also gives the windows their class name on X11.
     */
    static void prepare() {
        if (prepared) return;
        synchronized (Windows.class) {
            if (prepared) return;
            ThreadGroup top = Thread.currentThread().getThreadGroup();
            while (top.getParent() != null) top = top.getParent();
            AmpturnWindows t = new AmpturnWindows(top);
            t.start();
            try {
                t.join();
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                return;
            }
            Throwable failed = t.failure();
            if (failed != null) {
                Throwable c = failed instanceof java.lang.reflect.InvocationTargetException ite && ite.getCause() != null
                        ? ite.getCause() : failed;
                throw new Unavailable(c);
            }
            prepared = true;
        }
    }

    static void show(Figure f) {
        prepare();
        JFreeChart chart = Build.chart(f.data()); // built here, so a bad figure fails in the caller's thread
        SwingUtilities.invokeLater(() -> {
            Frame w = OPEN.get(f.name());
            if (w != null && w.frame().isDisplayable()) {
                w.panel().setChart(chart);
                w.frame().toFront();
                return;
            }
            JFrame frame = new JFrame(title(f));
            ChartPanel panel = new ChartPanel(chart, false);
            panel.setMouseWheelEnabled(true);
            panel.setMaximumDrawWidth(4000);
            panel.setMaximumDrawHeight(3000);
            panel.setPreferredSize(fit(new Dimension(1000, 700)));
            frame.setContentPane(panel);
            frame.setDefaultCloseOperation(WindowConstants.DISPOSE_ON_CLOSE);
            frame.addWindowListener(new WindowAdapter() {
                @Override public void windowClosed(WindowEvent e) {
                    Frame now = OPEN.get(f.name());
                    if (now != null && now.frame() == frame) OPEN.remove(f.name());
                }
            });
            frame.pack();
            frame.setLocationByPlatform(true);
            frame.setVisible(true);
            OPEN.put(f.name(), new Frame(frame, panel));
        });
    }

    /** The window's title: the figure's name, then the program's, as desktops list windows. */
    static String title(Figure f) {
        return f.name() + " — Ampturn";
    }

    private static Dimension fit(Dimension want) {
        Rectangle screen = GraphicsEnvironment.getLocalGraphicsEnvironment().getMaximumWindowBounds();
        return new Dimension(Math.min(want.width, screen.width - 40), Math.min(want.height, screen.height - 60));
    }

    /** Names of the open windows (waits for the event thread; for checks and scripts). */
    static List<String> open() {
        String[][] names = new String[1][];
        try {
            SwingUtilities.invokeAndWait(() -> names[0] = OPEN.keySet().toArray(new String[0]));
        } catch (Exception e) {
            throw new IllegalStateException("cannot list the open figure windows: " + e.getMessage(), e);
        }
        return List.of(names[0]);
    }
}
