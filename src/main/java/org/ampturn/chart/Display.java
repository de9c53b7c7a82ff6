package org.ampturn.chart;

import java.io.IOException;
import java.net.InetSocketAddress;
import java.net.Socket;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;

/**
 * Decides, before the window system first loads, whether a named X display can be reached. When
 * {@code DISPLAY} names a display that is not there, Java 17 fails every drawing (even off-screen
 * images) with "Can't connect to X11 window server"; running headless instead keeps files and
 * previews working. So an unreachable display switches this process to headless, once, with a note.
 */
final class Display {
    private Display() {}

    private static boolean settled;
    private static volatile String note;

    /** Call before anything asks whether the process is headless. */
    static synchronized void settle() {
        if (settled) return;
        settled = true;
        // headless asked for: nothing to decide. Asked for windows (false) on a display that is not
        // there, nothing could be drawn at all, so that request is overruled like the default.
        if ("true".equalsIgnoreCase(System.getProperty("java.awt.headless"))) return;
        String os = System.getProperty("os.name", "").toLowerCase(Locale.ROOT);
        if (os.contains("win") || os.contains("mac")) return;
        String d = System.getenv("DISPLAY");
        if (d == null || d.isBlank()) return; // no display named: the runtime is headless already
        if (!reachable(d)) {
            System.setProperty("java.awt.headless", "true");
            note = "the display " + d + " cannot be reached; figures go to files";
        }
    }

    /** A note to print once when the display was given up, else null; cleared by reading. */
    static String takeNote() {
        String n = note;
        note = null;
        return n;
    }

    /** {@code [host]:N[.S]}: a local display by its socket, a remote one by TCP port 6000 + N. */
    static boolean reachable(String display) {
        int colon = display.lastIndexOf(':');
        if (colon < 0) return true; // a form we do not know: let the window system decide
        String host = display.substring(0, colon);
        String rest = display.substring(colon + 1);
        int dot = rest.indexOf('.');
        int n;
        try {
            n = Integer.parseInt(dot < 0 ? rest : rest.substring(0, dot));
        } catch (NumberFormatException e) {
            return true;
        }
        if (host.isEmpty() || host.equals("unix")) {
            if (Files.exists(Path.of("/tmp/.X11-unix/X" + n))) return true;
            if (abstractSocket(n)) return true;
            return tcp("localhost", 6000 + n);
        }
        return tcp(host, 6000 + n);
    }

    /** Linux lists abstract sockets (an X server's "@/tmp/.X11-unix/XN") in /proc/net/unix. */
    private static boolean abstractSocket(int n) {
        try {
            Path p = Path.of("/proc/net/unix");
            if (!Files.isReadable(p)) return false;
            String want = "@/tmp/.X11-unix/X" + n;
            for (String line : Files.readAllLines(p)) if (line.endsWith(want)) return true;
        } catch (IOException | RuntimeException e) {
            return false;
        }
        return false;
    }

    private static boolean tcp(String host, int port) {
        try (Socket s = new Socket()) {
            s.connect(new InetSocketAddress(host, port), 400);
            return true;
        } catch (IOException | RuntimeException e) {
            return false;
        }
    }
}
