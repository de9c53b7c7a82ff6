package org.ampturn.study;

import static org.ampturn.Ampturn.*;
import static org.junit.jupiter.api.Assertions.*;

import org.ampturn.units.Quantity;
import org.junit.jupiter.api.Test;

class SolveTest {
    static final double MU0 = SweepTest.MU0;

    @Test
    void turnsForATargetInductanceMatchTheInvertedClosedForm() {
        // L = μ0 N² A / (l + 0.45 D) (Wheeler 1928) inverted by hand: N = sqrt(L (l + 0.45 D) / (μ0 A))
        double l = 0.030, d = 0.010, target = 2e-3;
        double expected = Math.sqrt(target * (l + 0.45 * d) / (MU0 * Math.PI * d * d / 4));
        double n = solve(x -> H(SweepTest.solenoid(x, l, d)), mH(2), 100, 5000);
        assertEquals(expected, n, 1e-9 * expected);
        double plain = solve(x -> SweepTest.solenoid(x, l, d), 2e-3, 5000, 100); // ends in either order
        assertEquals(expected, plain, 1e-9 * expected);
    }

    @Test
    void aQuantityForAQuantity() {
        // the length that gives 1 mH with 400 turns on 10 mm: l = μ0 N² A / L − 0.45 D
        double d = 0.010, n = 400;
        double expected = MU0 * n * n * Math.PI * d * d / 4 / 1e-3 - 0.45 * d;
        Quantity len = solve(x -> H(SweepTest.solenoid(n, x.si(), d)), mH(1), mm(1), mm(100));
        assertEquals(expected, len.in("m"), 1e-12);
        assertTrue(len.toString().endsWith("mm"), len.toString());
    }

    @Test
    void aTargetOutsideTheRangeGivesFAtBothEnds() {
        var e = assertThrows(SolveException.class, () -> solve(x -> H(SweepTest.solenoid(x, 0.03, 0.01)), mH(50), 100, 1000));
        String m = e.getMessage();
        assertTrue(m.contains("not bracketed"), m);
        assertTrue(m.contains("f(100) = " + H(SweepTest.solenoid(100, 0.03, 0.01))), m);
        assertTrue(m.contains("f(1000) = " + H(SweepTest.solenoid(1000, 0.03, 0.01))), m);
        assertTrue(m.contains("both below"), m);
    }

    @Test
    void failuresOfTheFunctionAreNamed() {
        var e = assertThrows(SolveException.class, () -> solve(x -> {
            if (x > 900) throw new IllegalArgumentException("too many turns for the bobbin");
            return x;
        }, 500, 1, 1000));
        assertTrue(e.getMessage().startsWith("f failed at x = 1000: too many turns"), e.getMessage());
        e = assertThrows(SolveException.class, () -> solve(x -> A(x), mH(1), 1, 10));
        assertTrue(e.getMessage().contains("current") && e.getMessage().contains("inductance"), e.getMessage());
        var bad = assertThrows(IllegalArgumentException.class, () -> solve(x -> x, 1, 2, 2));
        assertTrue(bad.getMessage().contains("empty"), bad.getMessage());
        assertThrows(SolveException.class, () -> solve(x -> Double.NaN, 1, 0, 2));
    }
}
