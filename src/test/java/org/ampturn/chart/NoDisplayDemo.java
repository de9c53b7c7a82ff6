package org.ampturn.chart;

import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Run with DISPLAY naming a display that does not exist and java.awt.headless=false (bench/chart
 * window does): plot must fall back to a file, say why, and not throw. Exits 1 otherwise.
 */
public final class NoDisplayDemo {
    public static void main(String[] args) throws Exception {
        Path dir = Files.createTempDirectory("nodisplay");
        Figures.useDirectory(dir);
        Figure f = Plots.plot(new RlRun(2001));
        Plots.plot(new RlRun(2001, 0.5));
        boolean ok = f.files().size() == 1 && Files.isRegularFile(dir.resolve("01-transient.png"))
                && Files.isRegularFile(dir.resolve("02-transient.png"));
        System.out.println((ok ? "ok   " : "FAIL ") + "an unreachable display (" + System.getenv("DISPLAY") + ") falls back to files: " + f.files());
        System.exit(ok ? 0 : 1);
    }
}
