package org.ampturn.bench;

import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.util.Locale;
import java.util.function.Supplier;
import org.ampturn.drive.Transient;

/**
 * The cases of {@link ActuatorBench} timed by thread CPU time as well as wall time, for a machine so
 * busy that JMH's wall-clock figures mostly measure waiting for a core; with each run's derivative
 * evaluations (from its notes), which do not depend on the machine at all. Run by {@code bench/actuator-cpu}.
 */
public final class ActuatorCpuTimeBench {
    private ActuatorCpuTimeBench() {}

    public static void main(String[] args) {
        ActuatorBench b = new ActuatorBench();
        ThreadMXBean mx = ManagementFactory.getThreadMXBean();
        time(mx, "plunger, eddy ladder of 4 shells and bounce (target 5 ms)", b::plungerEddyLadderAndBounce);
        time(mx, "plunger, shorted turn and bounce (target 5 ms)", b::plungerShortedTurnAndBounce);
        time(mx, "plunger, bounce only", b::plungerBounceOnly);
    }

    private static void time(ThreadMXBean mx, String name, Supplier<Transient> run) {
        String work = run.get().notes().stream().filter(s -> s.contains("derivative evaluations")).findFirst().orElse("");
        long until = System.nanoTime() + 3_000_000_000L; // warm-up
        while (System.nanoTime() < until) run.get();
        long w0 = System.nanoTime(), c0 = mx.getCurrentThreadCpuTime();
        int n = 0;
        while (System.nanoTime() - w0 < 5_000_000_000L) {
            run.get();
            n++;
        }
        double wall = (System.nanoTime() - w0) / 1e6 / n, cpu = (mx.getCurrentThreadCpuTime() - c0) / 1e6 / n;
        System.out.printf(Locale.ROOT, "%-60s cpu %7.3f ms   wall %7.3f ms   (%d runs; %s)%n", name, cpu, wall, n, work);
    }
}
