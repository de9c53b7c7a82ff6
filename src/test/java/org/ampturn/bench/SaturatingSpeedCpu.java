package org.ampturn.bench;

import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.util.Arrays;
import java.util.Locale;
import java.util.function.Supplier;

/**
 * The cases of {@link SaturatingSpeedBench} by thread CPU time, interleaved round by round so that
 * the two sides of each ratio meet the same load (for a machine so busy that wall-clock figures
 * mostly measure waiting for a core). Prints each round's ratio and their median. Run by
 * {@code bench/satspeed cpu [rounds]}.
 */
public final class SaturatingSpeedCpu {
    private SaturatingSpeedCpu() {}

    private static final ThreadMXBean MX = ManagementFactory.getThreadMXBean();
    private static volatile Object sink;

    public static void main(String[] args) {
        int rounds = args.length > 0 ? Integer.parseInt(args[0]) : 10;
        SaturatingSpeedBench b = new SaturatingSpeedBench();
        Supplier<?>[] cases = {b::libraryTable, b::bareTable, b::libraryAnalytic, b::bareAnalytic,
            () -> loop(b::currentOfFluxSolver), () -> loop(b::currentOfFluxCoil), () -> loop(b::tableLookup)};
        String[] names = {"library, B-H table coil", "bare DP853, B-H table coil", "library, analytic coil", "bare DP853, analytic coil",
            "i(λ) as the solver evaluates it (x1000)", "i(λ) as the coil gives it (x1000)", "B-H table lookup, B from H (x1000)"};
        for (Supplier<?> c : cases) cpu(c, 2_000_000_000L); // warm-up
        double[][] t = new double[cases.length][rounds];
        for (int r = 0; r < rounds; r++) {
            for (int c = 0; c < cases.length; c++) t[c][r] = cpu(cases[c], 400_000_000L);
            System.out.printf(Locale.ROOT, "round %2d: table coil %.2fx, analytic coil %.2fx, i(λ) %.2fx the lookup (load %s)%n", r + 1,
                    t[0][r] / t[1][r], t[2][r] / t[3][r], t[4][r] / t[6][r], load());
        }
        System.out.println();
        for (int c = 0; c < cases.length; c++) {
            double[] s = t[c].clone();
            Arrays.sort(s);
            System.out.printf(Locale.ROOT, "%-42s median %10.1f us CPU (rounds %.1f-%.1f)%n", names[c], s[rounds / 2] / 1e3, s[0] / 1e3, s[rounds - 1] / 1e3);
        }
        System.out.printf(Locale.ROOT, "%nmedian of the rounds' ratios: B-H table coil %.2fx the bare integrator, analytic coil %.2fx (target <= 2x); "
                + "solver's i(λ) %.2fx a B-H table lookup (target <= 2x); load average %s%n",
                median(t[0], t[1]), median(t[2], t[3]), median(t[4], t[6]), load());
    }

    private static Object loop(java.util.function.DoubleSupplier k) {
        double s = 0;
        for (int i = 0; i < 1000; i++) s += k.getAsDouble();
        return s;
    }

    /** CPU nanoseconds per call of {@code run}, over about {@code budget} ns of CPU. */
    private static double cpu(Supplier<?> run, long budget) {
        long c0 = MX.getCurrentThreadCpuTime(), n = 0;
        while (MX.getCurrentThreadCpuTime() - c0 < budget) {
            sink = run.get();
            n++;
        }
        return (MX.getCurrentThreadCpuTime() - c0) / (double) n;
    }

    private static double median(double[] a, double[] b) {
        double[] r = new double[a.length];
        for (int k = 0; k < a.length; k++) r[k] = a[k] / b[k];
        Arrays.sort(r);
        return r[r.length / 2];
    }

    private static String load() {
        try {
            return String.join(" ", Arrays.copyOf(java.nio.file.Files.readString(java.nio.file.Path.of("/proc/loadavg")).split(" "), 3));
        } catch (java.io.IOException | RuntimeException e) {
            return "unknown";
        }
    }
}
