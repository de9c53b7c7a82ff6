package org.ampturn.session;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;

/**
 * What an entry prints on standard output while it runs. Entries run in this JVM, so their
 * {@code System.out} is the process's; for the length of one evaluation it is swapped for a buffer,
 * and the lines become part of the entry's outcome (shown after {@code | } and recorded in the
 * worksheet), in their place under the entry rather than before it.
 *
 * <p>The chart layer's notes (where a figure file went, its preview) are tool messages, not
 * entry output: they keep going to the real standard output.
 */
final class SessionPrinted {
    private static final Object LOCK = new Object();

    private final PrintStream real;
    private final ByteArrayOutputStream buffer = new ByteArrayOutputStream();
    private final boolean capturing;

    private SessionPrinted(PrintStream real, boolean capturing) {
        this.real = real;
        this.capturing = capturing;
    }

    /** Starts capturing (unless another evaluation already is: then this one captures nothing). */
    static SessionPrinted begin() {
        synchronized (LOCK) {
            PrintStream real = System.out;
            if (real instanceof Capture) return new SessionPrinted(real, false);
            SessionPrinted p = new SessionPrinted(real, true);
            if (org.ampturn.chart.Figures.printingTo() == null) org.ampturn.chart.Figures.printTo(real);
            System.setOut(new Capture(p.buffer));
            return p;
        }
    }

    /** Restores standard output; the printed lines, without a trailing empty line. */
    List<String> end() {
        if (!capturing) return List.of();
        synchronized (LOCK) {
            System.out.flush();
            System.setOut(real);
        }
        String text = buffer.toString(StandardCharsets.UTF_8);
        List<String> lines = new ArrayList<>();
        if (text.isEmpty()) return lines;
        for (String l : text.split("\r?\n", -1)) lines.add(l);
        if (lines.get(lines.size() - 1).isEmpty()) lines.remove(lines.size() - 1);
        return lines;
    }

    private static final class Capture extends PrintStream {
        Capture(ByteArrayOutputStream sink) {
            super(sink, true, StandardCharsets.UTF_8);
        }
    }
}
