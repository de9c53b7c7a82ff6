package org.ampturn.session;

import java.io.OutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;

/**
 * Standard error, less the Java compiler's own report of a crash inside it ("An exception has
 * occurred in the compiler ... please file a bug", then a stack trace of thousands of lines). The
 * session turns such a crash into the entry's one-line error; the compiler writes its report to the
 * standard error it found when it started, so this filter is put in place before the session's
 * compiler starts. Everything else, an entry's own {@code System.err} included, passes through.
 */
final class CompilerNoise extends OutputStream {
    private static final byte[] BANNER = "An exception has occurred in the compiler".getBytes(StandardCharsets.UTF_8);
    private static volatile boolean installed;

    private final PrintStream real;
    private volatile boolean muted;
    private int matched;

    private CompilerNoise(PrintStream real) {
        this.real = real;
    }

    private static CompilerNoise current;

    /** Puts the filter in front of standard error (once per process). */
    static synchronized void install() {
        if (installed) return;
        installed = true;
        current = new CompilerNoise(System.err);
        System.setErr(new PrintStream(current, true, StandardCharsets.UTF_8));
    }

    /** Ends the muting that a crash report began; called after each compilation. */
    static void reset() {
        CompilerNoise c = current;
        if (c != null) {
            c.muted = false;
            c.matched = 0;
        }
    }

    @Override
    public synchronized void write(int b) {
        if (muted) return;
        // the banner starts a line; until it is complete its bytes wait, then pass or are dropped
        if (b == BANNER[matched]) {
            matched++;
            if (matched == BANNER.length) {
                muted = true;
                matched = 0;
            }
            return;
        }
        if (matched > 0) {
            real.write(BANNER, 0, matched);
            matched = 0;
            if (b == BANNER[0]) {
                matched = 1;
                return;
            }
        }
        real.write(b);
    }

    @Override
    public synchronized void write(byte[] b, int off, int len) {
        for (int i = off; i < off + len; i++) write(b[i]);
    }

    @Override
    public void flush() {
        real.flush();
    }
}
