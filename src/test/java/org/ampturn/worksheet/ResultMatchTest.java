package org.ampturn.worksheet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.junit.jupiter.api.Test;

/** DESIGN.md "Worksheet format": text must match, numbers to the digits shown. */
class ResultMatchTest {

    static Stream<Arguments> holding() {
        return Stream.of(
                Arguments.of("2.103 mH", "2.103 mH"),
                Arguments.of("2.103 mH", "2.1034 mH"),          // the brief's own example
                Arguments.of("2.103 mH", "2.1026 mH"),          // rounds up to the record
                Arguments.of("2.103 mH", "2103 uH"),            // same value, other prefix
                Arguments.of("2.103 mH", "2103.2 µH"),
                Arguments.of("400", "400.4"),
                Arguments.of("15.45", "15.4500"),
                Arguments.of("1.500e-6", "1.5001e-6"),
                Arguments.of("80.00 °C", "80.003 °C"),
                Arguments.of("coil = single-layer solenoid, 400 turns, 30.00 mm long, 10.00 mm mean diameter",
                        "coil = single-layer solenoid, 400 turns, 30.001 mm long, 10.00 mm mean diameter"),
                Arguments.of("J = 2.5 A/mm^2.", "J = 2.5000 A/mm^2."),
                Arguments.of("-12.00 V", "-12.001 V"));
    }

    static Stream<Arguments> failing() {
        return Stream.of(
                Arguments.of("2.103 mH", "2.113 mH", "2.113 mH is not 2.103 mH to the digits shown"),
                Arguments.of("2.103 mH", "2.1036 mH", "2.1036 mH is not 2.103 mH to the digits shown"),
                Arguments.of("2.103 mH", "2.103 mA", "the unit changed: 2.103 mH (inductance) became 2.103 mA (current)"),
                Arguments.of("2.103 mH", "2.103", "the unit changed: 2.103 mH became 2.103"),
                Arguments.of("400", "401", "401 is not 400 to the digits shown"),
                Arguments.of("coil = 400 turns", "core = 400 turns", "the text differs"),
                Arguments.of("400 turns", "400 turns, 2 layers", "the text differs"),
                Arguments.of("12.00 V", "-12.00 V", "-12.00 V is not 12.00 V to the digits shown"),
                Arguments.of("true", "false", "the text differs"));
    }

    @ParameterizedTest
    @MethodSource("holding")
    void holds(String recorded, String fresh) {
        assertNull(ResultMatch.why(recorded, fresh));
    }

    @ParameterizedTest
    @MethodSource("failing")
    void fails(String recorded, String fresh, String reason) {
        assertEquals(reason, ResultMatch.why(recorded, fresh));
    }

    @Test
    void halfStepFollowsTheDigitsWritten() {
        assertEquals(0.0005, ResultMatch.halfStep("2.103"), 1e-15);
        assertEquals(0.5, ResultMatch.halfStep("400"), 0);
        assertEquals(5e-10, ResultMatch.halfStep("1.500e-6"), 1e-20);
    }

    @Test
    void displayAndRecordFormsConvert() {
        assertEquals("  = 2.103 mH", Evaluation.toDisplay("2.103 mH"));
        assertEquals("  coil = solenoid", Evaluation.toDisplay("coil = solenoid"));
    }
}
