package org.ampturn.study;

import org.ampturn.units.Require;
import java.io.PrintStream;
import java.time.Duration;
import java.util.Locale;
import java.util.Objects;

/**
 * Listens to a long study: points done out of the total, time spent and an estimate of the time
 * left. A run calls its listener at most about ten times a second and once more when it ends;
 * calls come from any worker thread but never two at once.
 *
 * <p>The console installs its own listener with {@link #install(Progress)}; without one, studies
 * report to {@link #NONE}, which prints nothing.
 */
@FunctionalInterface
public interface Progress {
    /** Called with the state of the run. */
    void update(Status status);

    /** A listener that ignores every update. */
    Progress NONE = s -> {};

    /**
     * The state of a run.
     *
     * @param task      what is being computed, e.g. "sweep of turns"
     * @param done      points finished so far
     * @param total     points in the whole run
     * @param elapsed   time since the run began
     * @param remaining estimated time left (from the rate so far), or null when not yet known
     * @param finished  true on the last call of a run
     * @param stopped   true when the run was interrupted before every point was computed
     */
    record Status(String task, long done, long total, Duration elapsed, Duration remaining,
                  boolean finished, boolean stopped) {
        /** Fraction done, 0 to 1. */
        public double fraction() {
            return total == 0 ? 1 : (double) done / total;
        }

        /** A one-line text bar: {@code sweep of turns [#######.......]  48% 480/1000  1.2 s, about 1.3 s left}. */
        public String bar(int width) {
            int filled = (int) Math.round(fraction() * width);
            StringBuilder sb = new StringBuilder(task).append(" [");
            for (int i = 0; i < width; i++) sb.append(i < filled ? '#' : '.');
            sb.append(String.format(Locale.ROOT, "] %3d%% %d/%d  %s", (int) Math.floor(fraction() * 100), done, total, seconds(elapsed)));
            if (stopped) sb.append(", stopped");
            else if (finished) sb.append(", done");
            else if (remaining != null) sb.append(", about ").append(seconds(remaining)).append(" left");
            return sb.toString();
        }

        private static String seconds(Duration d) {
            double s = d.toNanos() / 1e9;
            if (s < 60) return String.format(Locale.ROOT, "%.1f s", s);
            return String.format(Locale.ROOT, "%d min %02d s", (long) s / 60, (long) s % 60);
        }

        @Override
        public String toString() {
            return bar(20);
        }
    }

    /**
     * A plain-text bar on {@code out}: redraws one line with a carriage return while the run goes
     * on and ends it with a newline. Runs shorter than half a second print nothing.
     */
    static Progress bar(PrintStream out) {
        Require.present("out", out);
        return new Progress() {
            private boolean drawn;
            private int width;

            @Override
            public void update(Status s) {
                if (!drawn && s.elapsed().toMillis() < 500) return;
                drawn = true;
                String text = s.bar(24);
                // a shorter line than the last one drawn must blank out the rest of it
                String pad = " ".repeat(Math.max(0, width - text.length()));
                out.print("\r" + text + (pad.isEmpty() ? "" : pad + "\r" + text));
                width = text.length();
                if (s.finished() || s.stopped()) {
                    out.println();
                    drawn = false;
                    width = 0;
                }
                out.flush();
            }
        };
    }

    /** Makes {@code listener} the one studies report to when they are given none; returns the previous one. */
    static Progress install(Progress listener) {
        return Runner.install(listener);
    }

    /** The listener studies report to when they are given none. */
    static Progress installed() {
        return Runner.installed();
    }
}
