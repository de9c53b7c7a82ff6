package org.ampturn.fuzz;

import static org.junit.jupiter.api.Assertions.*;

import org.junit.jupiter.api.Test;

/**
 * A short seeded fuzz of the library's public calls and of the quantity parser (see
 * {@link LibraryFuzz}): no hang, no NaN or ∞ without an exception, no raw JDK exception, messages on
 * one short line. {@code bench/fuzz} runs the long one.
 */
class LibraryFuzzTest {
    @Test
    void libraryCallsFailOnlyWithTheLibrarysOwnClearMessages() {
        LibraryFuzz fuzz = new LibraryFuzz(1, 20_000);
        LibraryFuzz.Report r = new LibraryFuzz.Report();
        try {
            fuzz.libraryCalls(3000, r);
        } finally {
            fuzz.close();
        }
        assertTrue(fuzz.methodCount() > 300, "methods covered: " + fuzz.methodCount());
        assertTrue(r.normal > 300 && r.refused > 300, "too few calls got anywhere: " + r);
        assertEquals(0, r.faults(), r.toString());
    }

    @Test
    void parserStringsGiveAFiniteQuantityOrAMessageWithThePosition() {
        LibraryFuzz fuzz = new LibraryFuzz(2, 20_000);
        LibraryFuzz.Report r = new LibraryFuzz.Report();
        try {
            fuzz.parserStrings(2000, r);
        } finally {
            fuzz.close();
        }
        assertTrue(r.normal > 500 && r.refused > 500, r.toString());
        assertEquals(0, r.faults(), r.toString());
    }
}
