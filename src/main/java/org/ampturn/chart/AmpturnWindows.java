package org.ampturn.chart;

import java.awt.GraphicsEnvironment;
import java.awt.Toolkit;
import java.lang.reflect.Field;
import javax.swing.SwingUtilities;

/**
 * The thread that starts the window system, and the name the figure windows carry for the desktop.
 *
 * <p>On X11 a window's class (WM_CLASS, which docks, task bars and window rules group windows by) is
 * the toolkit's {@code awtAppClassName}. The JDK takes it from the class at the bottom of the stack
 * of the thread that first loads the toolkit; started from a plain thread it would read
 * {@code java-lang-Thread}. This thread loads the toolkit, so the name is at least this class's,
 * {@value #FALLBACK_CLASS}; where the JVM lets us (the launcher opens {@code java.desktop/sun.awt.X11}),
 * the name is set to {@value #WINDOW_CLASS} outright. Other platforms have no such name.
 */
final class AmpturnWindows extends Thread {
    /** The window class figure windows carry on X11 when the JVM allows setting it. */
    static final String WINDOW_CLASS = "Ampturn";
    /** The window class they carry otherwise: this class's name as the toolkit spells it. */
    static final String FALLBACK_CLASS = "org-ampturn-chart-AmpturnWindows";

    private Throwable failed;

    AmpturnWindows(ThreadGroup group) {
        super(group, "ampturn-window-start");
        setDaemon(true);
        setContextClassLoader(AmpturnWindows.class.getClassLoader());
    }

    /** Bottom of this thread's stack: the toolkit reads this class's name as the window class. */
    @Override
    public void run() {
        try {
            if (!GraphicsEnvironment.isHeadless()) {
                nameWindows(Toolkit.getDefaultToolkit());
            }
            SwingUtilities.invokeAndWait(() -> { });
        } catch (Throwable e) {
            failed = e;
        }
    }

    Throwable failure() {
        return failed;
    }

    /** Sets the X11 toolkit's application class name where the JVM permits; else leaves the name the toolkit chose. */
    static boolean nameWindows(Toolkit tk) {
        if (!tk.getClass().getName().equals("sun.awt.X11.XToolkit")) return false;
        try {
            Field f = tk.getClass().getDeclaredField("awtAppClassName");
            f.setAccessible(true);
            f.set(null, WINDOW_CLASS);
            return true;
        } catch (ReflectiveOperationException | RuntimeException e) {
            // java.desktop does not open sun.awt.X11 to this code: the class name stays FALLBACK_CLASS
            return false;
        }
    }
}
