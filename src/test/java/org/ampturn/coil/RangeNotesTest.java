package org.ampturn.coil;

import static org.junit.jupiter.api.Assertions.*;

import org.ampturn.units.Quantity;
import org.junit.jupiter.api.Test;

/** Each approximate inductance formula says so exactly when it is used outside its stated range. */
class RangeNotesTest {
    private static Quantity mm(double x) { return Quantity.of(x, "mm"); }

    @Test
    void wheeler1928LongCoilHoldsAboveLengthOverDiameterPoint4() {
        // Wheeler, Proc. IRE 16 (1928): within 1 % for l > 0.8a, i.e. l/D > 0.4
        Solenoid inside = Solenoid.singleLayer(20, mm(4.1), mm(10));
        Solenoid outside = Solenoid.singleLayer(20, mm(3.9), mm(10));
        assertTrue(inside.rangeNotes().isEmpty(), inside.rangeNotes().toString());
        assertEquals(1, outside.rangeNotes().size());
        assertTrue(outside.rangeNotes().get(0).contains("l/D = 0.3900") && outside.rangeNotes().get(0).contains("0.4"),
                outside.rangeNotes().get(0));
        assertTrue(outside.compare().row("Wheeler 1928").validity().startsWith("OUTSIDE"));
        assertFalse(inside.compare().row("Wheeler 1928").validity().startsWith("OUTSIDE"));
    }

    @Test
    void rosaCorrectionHoldsForPitchUpToATenthOfTheDiameter() {
        // range taken as pitch/D ≤ 0.1 (common practice for "pitch ≪ radius")
        Solenoid inside = Solenoid.singleLayer(110, mm(100), mm(10)).withWire(mm(0.5));   // pitch/D = 0.0909
        Solenoid outside = Solenoid.singleLayer(90, mm(100), mm(10)).withWire(mm(0.5));   // pitch/D = 0.111
        assertTrue(inside.rangeNotes().isEmpty(), inside.rangeNotes().toString());
        assertEquals(1, outside.rangeNotes().size());
        assertTrue(outside.rangeNotes().get(0).startsWith("Rosa's round-wire correction"), outside.rangeNotes().get(0));
        assertTrue(outside.compare().row("sheet less Rosa").validity().startsWith("OUTSIDE"));
        // without the wire the correction is not used, so there is nothing to note
        assertTrue(Solenoid.singleLayer(90, mm(100), mm(10)).rangeNotes().isEmpty());
    }

    @Test
    void wheelerMultilayerHoldsWhenItsTermsAreWithinThreeTimes() {
        // ID 20, OD 30 mm: 6a = 75 mm, 10c = 50 mm; 9b = 148.5 mm (2.97×) inside, 153 mm (3.06×) outside
        Multilayer inside = Multilayer.of(20, 10, mm(20), mm(30), mm(16.5));
        Multilayer outside = Multilayer.of(20, 10, mm(20), mm(30), mm(17));
        assertTrue(inside.rangeNotes().isEmpty(), inside.rangeNotes().toString());
        assertEquals(1, outside.rangeNotes().size());
        assertTrue(outside.rangeNotes().get(0).contains("3.060×"), outside.rangeNotes().get(0));
        assertTrue(outside.compare().row("Wheeler 1928").validity().startsWith("OUTSIDE"));
        assertFalse(inside.compare().row("Wheeler 1928").validity().startsWith("OUTSIDE"));
    }
}
