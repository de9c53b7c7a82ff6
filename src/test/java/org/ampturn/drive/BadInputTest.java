package org.ampturn.drive;

import static org.ampturn.Ampturn.*;
import static org.junit.jupiter.api.Assertions.*;

import java.util.concurrent.CancellationException;
import org.ampturn.coil.Coil;
import org.ampturn.units.Quantity;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

/** Bad input gives a clear error that names the value; a run that cannot be solved says why. */
class BadInputTest {
    private final Coil coil = Coil.lumped(mH(10), ohm(5));

    private static void fails(Executable e, String... words) {
        Exception ex = assertThrows(RuntimeException.class, e);
        for (String w : words) assertTrue(ex.getMessage().contains(w), "message \"" + ex.getMessage() + "\" lacks \"" + w + "\"");
    }

    @Test
    void times() {
        fails(() -> Drive.dc(V(12)).into(coil).offAt(ms(-1), Clamp.diode()), "off time", "-1.000 ms");
        fails(() -> Drive.dc(V(12)).into(coil).offAt(ms(50), Clamp.diode()).simulate(ms(40)), "off time (50.00 ms)", "after the end");
        fails(() -> Drive.dc(V(12)).into(coil).simulate(ms(-5)), "duration");
        fails(() -> Drive.dc(V(12)).into(coil).simulate(ms(0)), "duration");
        fails(() -> Drive.dc(V(12)).into(coil).simulate(V(3)), "duration must be a time");
    }

    @Test
    void coilsAndClamps() {
        fails(() -> Coil.lumped(mH(0), ohm(5)), "inductance");
        fails(() -> Drive.dc(V(12)).into(new SaturatingCoil(0, 1, 0, 1)).simulate(ms(1)), "inductance must be greater than zero");
        fails(() -> Drive.dc(V(12)).into(coil).offAt(ms(5), Clamp.tvs(V(10))).simulate(ms(10)), "TVS", "10.00 V", "above the supply (12.00 V)");
        fails(() -> Drive.dc(V(24)).into(coil).offAt(ms(5), Clamp.none(V(20))).simulate(ms(10)), "above the supply");
        fails(() -> Drive.pwm(V(12), kHz(1), 0.5).into(coil).simulate(ms(10)), "no clamp");
        fails(() -> Drive.dc(V(12)).into(coil).offAt(ms(5)).simulate(ms(10)), "no clamp");
        fails(() -> Clamp.zener(V(-3)), "zener voltage");
        fails(() -> Clamp.snubber(ohm(0), nF(10)), "snubber resistance");
    }

    @Test
    void drives() {
        fails(() -> Drive.pwm(V(12), kHz(1), 1.5), "PWM duty must be between 1.000e-4 and 1, got 1.500");
        fails(() -> Drive.pwm(V(12), kHz(1), 0), "duty");
        fails(() -> Drive.pwm(V(12), Hz(-1), 0.5), "PWM frequency");
        fails(() -> Drive.peakAndHold(V(12), A(1), A(2)), "hold current", "below the pull-in");
        fails(() -> Drive.peakAndHold(V(12), A(5), A(1)).into(coil).offAt(ms(5), Clamp.diode()).simulate(ms(10)), "never reached", "2.400 A");
        fails(() -> Drive.peakAndHold(V(12), A(2), A(1)).withHysteresis(A(3)), "hysteresis band");
        fails(() -> Drive.peakAndHold(V(12), A(2), A(1.5)).withHysteresis(A(2.5)).withPeakTime(ms(2)).into(coil).offAt(ms(5), Clamp.diode())
                .simulate(ms(10)), "hysteresis band (2.500 A)", "below the pull-in current (2.000 A)");
        fails(() -> Drive.dc(V(12)).withHysteresis(A(0.1)), "peak-and-hold");
        fails(() -> Drive.dc(V(0)), "supply voltage");
        fails(() -> Drive.dc(V(12)).into(coil).samples(1), "samples must be a whole number from 2 to 20000000, got 1");
        fails(() -> Drive.dc(V(12)).into(coil).tolerance(0.5), "tolerance must be between 1.000e-12 and 0.001000, got 0.5000");
        fails(() -> Drive.dc(V(12)).into(coil).at(K(80)), "absolute temperature");
    }

    @Test
    void aDivergingCoreIsReportedNotPlotted() {
        // a core model that fails beyond its range: the run must say so rather than draw a curve
        SaturatingCoil broken = new SaturatingCoil(10e-3, 1, 0.5e-3, 0) {
            @Override
            public double currentAt(double lam) {
                return lam > 0.005 ? Double.NaN : super.currentAt(lam);
            }
        };
        fails(() -> Drive.dc(V(1)).into(broken).simulate(ms(10)), "not finite", "diverges");
    }

    @Test
    void aStiffSnubberIsReported() {
        // 10 H with a 1 pF snubber: time constants 12 orders apart; the explicit solver gives up with a reason
        Coil big = Coil.lumped(H(10), ohm(1));
        fails(() -> Drive.dc(V(12)).into(big).offAt(ms(1), Clamp.snubber(ohm(1), pF(1))).numeric().simulate(s(10)), "stiff");
        // the same linear circuit is solved piece by piece in closed form and finishes
        Transient run = Drive.dc(V(12)).into(big).offAt(ms(1), Clamp.snubber(ohm(1), pF(1))).simulate(s(10));
        assertTrue(run.energy().relativeBalanceError() < 1e-6, run.energy().toString());
    }

    @Test
    void interruptStopsTheRun() {
        Thread.currentThread().interrupt();
        try {
            CancellationException ex = assertThrows(CancellationException.class,
                    () -> Drive.pwm(V(12), kHz(1), 0.5).into(coil).clamp(Clamp.diode()).simulate(ms(100)));
            assertTrue(ex.getMessage().contains("interrupted"), ex.getMessage());
        } finally {
            Thread.interrupted();
        }
        // from another thread, while a long numeric run is under way (as the console's Ctrl-C does)
        Circuit longRun = Drive.pwm(V(12), kHz(20), 0.5).into(new SaturatingCoil(10e-3, 1, 0.5e-3, 5)).clamp(Clamp.diode());
        java.util.concurrent.atomic.AtomicReference<Throwable> seen = new java.util.concurrent.atomic.AtomicReference<>();
        Thread worker = new Thread(() -> {
            try {
                longRun.simulate(s(100)); // 2,000,000 periods: minutes of work unless stopped
            } catch (Throwable t) {
                seen.set(t);
            }
        });
        worker.start();
        try {
            Thread.sleep(300);
        } catch (InterruptedException e) {
            throw new AssertionError(e);
        }
        worker.interrupt();
        try {
            worker.join(10_000);
        } catch (InterruptedException e) {
            throw new AssertionError(e);
        }
        assertFalse(worker.isAlive(), "the run did not stop within 10 s of the interrupt");
        assertTrue(seen.get() instanceof CancellationException, String.valueOf(seen.get()));
        // and a fresh run afterwards works
        assertEquals(Quantity.of(2.4, "A").si(), Drive.dc(V(12)).into(coil).simulate(ms(50)).finalCurrent().si(), 1e-12);
    }
}
