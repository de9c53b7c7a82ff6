package org.ampturn.units;

import static org.junit.jupiter.api.Assertions.*;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class QuantityTest {

    @AfterEach
    void resetDigits() {
        Quantity.setDisplayDigits(4);
    }

    /** Each row: unit text, SI factor, and where the factor is defined. */
    @ParameterizedTest(name = "{0} = {1} SI ({2})")
    @CsvSource(delimiter = ';', value = {
            "m; 1; SI Brochure 9th ed. Table 2 (base unit)",
            "mm; 1e-3; SI Brochure 9th ed. Table 7 (prefix milli)",
            "µm; 1e-6; SI Brochure 9th ed. Table 7 (prefix micro)",
            "um; 1e-6; common practice ASCII spelling of micro",
            "inch; 0.0254; NIST SP 811 (2008) B.8, exact",
            "mil; 2.54e-5; NIST SP 811 (2008) B.8, exact",
            "A; 1; SI Brochure 9th ed. Table 2",
            "mA; 1e-3; SI Brochure 9th ed. Table 7",
            "V; 1; SI Brochure 9th ed. Table 4",
            "Ω; 1; SI Brochure 9th ed. Table 4",
            "kohm; 1e3; SI Brochure 9th ed. Table 4 and 7",
            "H; 1; SI Brochure 9th ed. Table 4",
            "uH; 1e-6; SI Brochure 9th ed. Table 4 and 7",
            "s; 1; SI Brochure 9th ed. Table 2",
            "kHz; 1e3; SI Brochure 9th ed. Table 4 and 7",
            "T; 1; SI Brochure 9th ed. Table 4",
            "G; 1e-4; NIST SP 811 (2008) B.8, gauss",
            "Wb; 1; SI Brochure 9th ed. Table 4",
            "A/m; 1; SI Brochure 9th ed. Table 5",
            "Oe; 79.57747154594767; NIST SP 811 (2008) B.8, oersted = 1000/(4 pi) A/m",
            "J; 1; SI Brochure 9th ed. Table 4",
            "W; 1; SI Brochure 9th ed. Table 4",
            "N; 1; SI Brochure 9th ed. Table 4",
            "kg; 1; SI Brochure 9th ed. Table 2",
            "g; 1e-3; SI Brochure 9th ed. 3 (prefixes attach to gram)",
            "K; 1; SI Brochure 9th ed. Table 2",
            "A/mm^2; 1e6; SI Brochure 9th ed. Table 5 and 7",
            "Ω·m; 1; SI Brochure 9th ed. Table 6",
    })
    void unitFactorsMatchPublishedDefinitions(String unit, double factor, String source) {
        assertEquals(factor, Unit.parse(unit).factor(), Math.abs(factor) * 1e-15, source);
    }

    @Test
    void degreeCelsiusIsKelvinMinus273_15() {
        // SI Brochure 9th ed. 2.3.1: t/°C = T/K − 273.15
        Quantity t = Quantity.parse("40 degC");
        assertEquals(313.15, t.si(), 1e-12);
        assertEquals("40.00 °C", t.toString());
        assertEquals(40, t.in("degC"), 1e-12);
        Quantity rise = Quantity.parse("100 degC").minus(t);
        assertEquals("60.00 K", rise.toString());
        assertEquals("100.0 °C", t.plus(rise).toString());
        assertThrows(IllegalArgumentException.class, () -> t.plus(t));
    }

    @ParameterizedTest
    @CsvSource(delimiter = ';', value = {
            "4.7 mH; 4.700 mH", "4.7mH; 4.700 mH", "1.2 kohm; 1.200 kΩ", "1.2 kΩ; 1.200 kΩ",
            "25 mm; 25.00 mm", "25mm; 25.00 mm", "0.35 T; 350.0 mT", "100 kHz; 100.0 kHz",
            "2.5 A/mm^2; 2.500 A/mm²", "12.5 mm; 12.50 mm", "0.001 H; 1.000 mH", "999.96 uH; 1.000 mH",
            "1.724e-8 ohm*m; 17.24 nΩ·m", "3 mm^2; 3.000 mm²", "10 W/(m^2*K); 10.00 W/(m²·K)",
            "0 A; 0.000 A", "-3.3 V; -3.300 V", "2.2 uF; 2.200 µF", "5000 G; 500.0 mT", "1 inch; 25.40 mm",
            "12 ms; 12.00 ms", "1.5 kg; 1.500 kg", "20 g; 20.00 g", "0.5; 0.5000", "1e-7; 1.000e-7",
    })
    void parsesWhatEngineersTypeAndPrintsEngineeringNotation(String text, String shown) {
        Quantity q = Quantity.parse(text);
        assertEquals(shown, q.toString());
        // the printed text reads back to the same value at the digits shown
        assertTrue(Quantity.parse(shown).isCloseTo(q, 5e-4), shown);
    }

    @Test
    void derivedDimensionsPrintWithTheirOwnUnit() {
        Quantity v = Quantity.parse("12 V"), r = Quantity.parse("4 ohm");
        assertEquals("3.000 A", v.div(r).toString());
        assertEquals("9.000 mJ", Quantity.parse("2 mH").times(Quantity.parse("3 A").pow(2)).times(0.5).toString());
        assertEquals("1.000 T", Quantity.parse("1 Wb").div(Quantity.parse("1 m^2")).toString());
        assertEquals("50.00 mm", Quantity.parse("25 mm").times(2).toString());
    }

    @Test
    void roundTripsAcrossManyMagnitudes() {
        String[] units = {"H", "A", "m", "V", "Ω", "J", "W", "T", "s", "Hz", "N", "F", "A/m"};
        for (String u : units) {
            for (double v = 1.23456e-11; v < 1e7; v *= 7.3) {
                Quantity q = Quantity.of(v, u);
                Quantity back = Quantity.parse(q.toString());
                assertTrue(back.isCloseTo(q, 5e-4), q + " read back as " + back);
            }
        }
    }

    @Test
    void digitsAreSettable() {
        Quantity q = Quantity.parse("2.10345 mH");
        assertEquals("2.1 mH", q.format(2));
        Quantity.setDisplayDigits(6);
        assertEquals("2.10345 mH", q.toString());
        assertThrows(IllegalArgumentException.class, () -> Quantity.setDisplayDigits(0));
    }

    @Test
    void dimensionMismatchNamesBothSides() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> Quantity.parse("2 A").plus(Quantity.parse("3 mm")));
        assertEquals("cannot add 3.000 mm to 2.000 A (length and current)", e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> Quantity.parse("2 A").in("mH"));
        assertTrue(e.getMessage().contains("current") && e.getMessage().contains("inductance"), e.getMessage());
    }

    @Test
    void badTextNamesTheTextAndPosition() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> Quantity.parse("4.7 mQ"));
        assertTrue(e.getMessage().contains("\"4.7 mQ\""), e.getMessage());
        assertTrue(e.getMessage().contains("unknown unit \"mQ\""), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> Quantity.parse("abc"));
        assertTrue(e.getMessage().contains("position 1"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> Unit.parse("A/"));
        assertThrows(IllegalArgumentException.class, () -> Unit.parse("m^"));
    }

    @Test
    void nanAndInfinitiesPrintButAreNotReadOrMade() {
        Quantity nan = Quantity.of(Double.NaN, Dimension.CURRENT);
        assertEquals("NaN A", nan.toString());
        assertEquals("∞ A", Quantity.of(Double.POSITIVE_INFINITY, Dimension.CURRENT).toString());
        assertEquals(nan, Quantity.of(Double.NaN, Dimension.CURRENT), "exact equals treats NaN as itself");
        // what a user types or computes never becomes NaN or ∞ without a word
        for (String text : new String[] {"NaN A", "∞ A", "-inf H", "Infinity V"}) {
            var e = assertThrows(IllegalArgumentException.class, () -> Quantity.parse(text), text);
            assertTrue(e.getMessage().contains("not a finite number") && e.getMessage().contains("position 1"), e.getMessage());
        }
        var e = assertThrows(IllegalArgumentException.class, () -> Quantity.parse("1 V").div(Quantity.parse("0 ohm")));
        assertTrue(e.getMessage().contains("by zero"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> Quantity.of(Double.NaN, "A"));
        assertTrue(e.getMessage().contains("NaN"), e.getMessage());
    }

    @Test
    void equalsIsExactAndCloseToIsRelative() {
        assertEquals(Quantity.parse("4.7 mH"), Quantity.of(4.7e-3, Dimension.INDUCTANCE));
        assertNotEquals(Quantity.parse("4.7 mH"), Quantity.parse("4.7 mA"));
        assertTrue(Quantity.parse("1 mH").isCloseTo(Quantity.parse("1.0001 mH"), 1e-3));
        assertFalse(Quantity.parse("1 mH").isCloseTo(Quantity.parse("1.01 mH"), 1e-3));
    }

    @Test
    void unknownDimensionsPrintInBaseUnitsAndReadBack() {
        Quantity q = Quantity.parse("3 V").div(Quantity.parse("1 s"));
        assertEquals("3.000 kg·m²/(s⁴·A)", q.toString());
        assertEquals(q, Quantity.parse(q.toString()));
    }
}
