package org.ampturn;

import static org.ampturn.Ampturn.*;
import static org.junit.jupiter.api.Assertions.*;

import java.time.Duration;
import org.ampturn.coil.Loops;
import org.ampturn.coil.Solenoid;
import org.ampturn.drive.Clamp;
import org.ampturn.drive.Drive;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;
import org.ampturn.wire.Wire;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

/**
 * The bad inputs found by fuzzing the console and the library, each refused at once with a message
 * that names the value and the valid range. Before, they hung, gave NaN or ∞ as if it were a
 * value, or ended in a raw JDK exception. The time limit only guards against a hang coming back.
 */
class BadInputRegressionTest {
    private static String refused(Executable call) {
        IllegalArgumentException e = assertTimeoutPreemptively(Duration.ofSeconds(10), () -> assertThrows(IllegalArgumentException.class, call));
        String m = e.getMessage();
        assertTrue(Require.oneLine(m).equals(m), "one line: " + m);
        int head = m.indexOf(": ") < 0 ? m.length() : m.indexOf(": ");
        assertTrue(Math.min(head, m.indexOf("; ") < 0 ? m.length() : m.indexOf("; ")) <= Require.HEADLINE, "headline within 120: " + m);
        return m;
    }

    private static void contains(String message, String... parts) {
        for (String p : parts) assertTrue(message.contains(p), "\"" + message + "\" lacks \"" + p + "\"");
    }

    @Test
    void solenoidKernelWithANaNLengthIsRefusedNotHung() {
        contains(refused(() -> Solenoid.inductanceAt(100, Double.NaN, 0.01)), "length", "NaN", "1.000 nm", "10.00 km");
    }

    @Test
    void mutualInductanceOfHugeLoopsIsRefusedNotHung() {
        contains(refused(() -> Loops.mutualInductance(m(1e200), m(1e200), m(1))), "radius 1", "1.000e200 m", "10.00 km");
        contains(refused(() -> Loops.mutualAt(Double.NaN, 1, 1)), "Maxwell");
    }

    @Test
    void aHysteresisBandOfPicoamperesIsRefused() {
        contains(refused(() -> Drive.peakAndHold(V(12), A(2), A(1)).withHysteresis(A(1e-12))), "hysteresis band", "1.000 pA", "100.0 µA");
    }

    @Test
    void aStudyOfABillionPointsIsRefusedByItsCount() {
        contains(refused(() -> sweep("n", 1, 1_000_000_000, 1_000_000_000, n -> n)), "1000000000 points", "100000000");
        contains(refused(() -> sweep("n", 1, Integer.MAX_VALUE, Integer.MAX_VALUE, n -> n)), "2147483647 points");
    }

    @Test
    void infiniteNaNAndUnderflowingLiteralsAreNotValues() {
        contains(refused(() -> q("1e999 H")), "1e999 H", "position 1", "too large");
        contains(refused(() -> q("NaN V")), "NaN", "position 1", "not a finite number");
        contains(refused(() -> q("1e-400 H")), "position 1", "too small", "not zero");
        assertEquals(0.0, q("0e-400 H").si(), "a zero written with an exponent is still zero");
    }

    @Test
    void unitExponentsAreBounded() {
        contains(refused(() -> q("1.000 m^727379969")), "at most 3 digits", "position 9");
        contains(refused(() -> q("1 m^99")), "beyond ±24");
        contains(refused(() -> m(1).pow(100)), "within ±24");
        contains(refused(() -> q("1 m⁷²⁷³⁷⁹⁹⁶⁹")), "at most 3 digits");
    }

    @Test
    void deeplyNestedBracketsAreRefusedWithoutExhaustingTheStack() {
        String text = "1 " + "(".repeat(1700) + "m" + ")".repeat(1700);
        contains(refused(() -> q(text)), "nest more than 16 deep", "position 19");
        assertEquals(m(3), q("3 ((m))"));
    }

    @Test
    void aSolenoidOfAstronomicalSizeIsRefusedNotNaN() {
        contains(refused(() -> Solenoid.singleLayer(100, m(1e200), m(1e200)).inductance()), "length", "1.000e200 m", "10.00 km");
    }

    @Test
    void resistanceFarBelowTheLinearLawsRangeIsRefused() {
        contains(refused(() -> Wire.awg(28).resistancePerLength(K(1))), "temperature", "-100.0 °C", "400.0 °C", "linear resistance law");
        assertTrue(Wire.awg(28).resistancePerLength(degC(-40)).si() > 0);
    }

    @Test
    void dividingByNothingNamesTheArgument() {
        contains(refused(() -> ms(1).div((Quantity) null)), "cannot divide 1.000 ms by nothing (null)");
        contains(refused(() -> ms(1).div(s(0))), "by zero");
        contains(refused(() -> m(1e200).times(m(1e200))), "overflows");
    }

    @Test
    void tinyValuesShowAsNumbersNotAsZero() {
        assertEquals("-1.000e-300 V", V(-1e-300).toString());
        assertEquals(V(-1e-300), q(V(-1e-300).toString()), "and read back");
        contains(refused(() -> Clamp.diode(V(-1e-300))), "diode forward drop", "-1.000e-300 V");
        assertEquals("1.000e200 m", m(1e200).toString());
    }

    @Test
    void aStudyFunctionThatGivesInfinityMarksItsRowFailedInsteadOfStoringIt() {
        var t = sweepDoubles("x", -1, 1, 3, x -> 1 / x);                 // 1/0 at x = 0
        assertEquals("the function gave Infinity, not a finite number", t.error(1));
        assertTrue(Double.isNaN(t.values("result")[1]));
        assertEquals(1.0, t.values("result")[2]);
        var g = sweep("x", -1, 1, 3, x -> V(1).div(x == 0 ? 1e-320 : x)); // a general sweep of quantities
        assertTrue(g.error(1) != null && g.error(1).contains("overflows"), String.valueOf(g.error(1)));
        var n = sweep("x", -1, 1, 3, x -> 1.0 / x);
        assertEquals("output \"result\" is Infinity, not a finite number", n.error(1));
    }
}
