package org.ampturn.bench;

import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.util.Locale;
import java.util.function.Supplier;

/**
 * The cases of {@link DriveBench} timed by thread CPU time as well as wall time, for a machine so
 * busy that JMH's wall-clock figures mostly measure waiting for a core. Run by {@code bench/drive-cpu};
 * {@code bench/drive-cpu ac} times the cases of {@link AcDriveBench} instead.
 */
public final class DriveCpuTimeBench {
    private DriveCpuTimeBench() {}

    public static void main(String[] args) {
        ThreadMXBean mx = ManagementFactory.getThreadMXBean();
        if (args.length > 0 && args[0].equals("ac")) { // bench/drive-cpu ac: the cases of AcDriveBench
            AcDriveBench a = new AcDriveBench();
            time(mx, "saturating AC coil, one 50 Hz cycle, core loss drawn (target 5 ms)", a::oneMainsCycleSaturating);
            time(mx, "saturating AC coil, 1 s at 50 Hz, core loss drawn (target 100 ms)", a::oneSecond50HzSaturating);
            time(mx, "saturating AC coil, one 50 Hz cycle, lossless", a::oneMainsCycleSaturatingLossless);
            time(mx, "saturating AC coil, 1 s at 50 Hz, lossless", a::oneSecond50HzSaturatingLossless);
            return;
        }
        DriveBench b = new DriveBench();
        time(mx, "linear RL step, 10,000 samples (target 1 ms)", b::linearRlStep10kSamples);
        time(mx, "saturating coil, zener turn-off, 40 ms, rtol 1e-8 (target 20 ms)", b::saturatingZenerTurnOff40ms);
        time(mx, "plunger pull-in and drop-out (target 50 ms)", b::plungerPullInDropOut);
        time(mx, "1,000 PWM periods, linear coil (target 100 ms)", b::pwm1000PeriodsLinear);
        time(mx, "1,000 PWM periods, saturating coil, numeric", b::pwm1000PeriodsSaturatingOde);
    }

    private static void time(ThreadMXBean mx, String name, Supplier<?> run) {
        long until = System.nanoTime() + 3_000_000_000L; // warm-up
        while (System.nanoTime() < until) run.get();
        long w0 = System.nanoTime(), c0 = mx.getCurrentThreadCpuTime();
        int n = 0;
        while (System.nanoTime() - w0 < 3_000_000_000L) {
            run.get();
            n++;
        }
        double wall = (System.nanoTime() - w0) / 1e6 / n, cpu = (mx.getCurrentThreadCpuTime() - c0) / 1e6 / n;
        System.out.printf(Locale.ROOT, "%-70s cpu %8.3f ms   wall %8.3f ms   (%d runs)%n", name, cpu, wall, n);
    }
}
