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
        LibraryFuzz.Report r = new LibraryFuzz.Report();
        // two seeds of 3,000 calls each, a few seconds in all; bench/fuzz runs 10,000 and more seeds
        for (long seed : new long[] {3, 4}) {
            LibraryFuzz fuzz = new LibraryFuzz(seed, 20_000);
            try {
                fuzz.libraryCalls(3000, r);
            } finally {
                fuzz.close();
            }
        }
        LibraryFuzz fuzz = new LibraryFuzz(3, 20_000);
        fuzz.close();
        assertTrue(fuzz.methodCount() > 300, "methods covered: " + fuzz.methodCount());
        assertTrue(r.normal > 1000 && r.refused > 1000, "too few calls got anywhere: " + r);
        assertEquals(0, r.faults(), r.toString());
    }

    @Test
    void parserStringsGiveAFiniteQuantityOrAMessageWithThePosition() {
        LibraryFuzz fuzz = new LibraryFuzz(2, 20_000);
        LibraryFuzz.Report r = new LibraryFuzz.Report();
        try {
            fuzz.parserStrings(5000, r);
        } finally {
            fuzz.close();
        }
        assertTrue(r.normal > 1000 && r.refused > 1000, r.toString());
        assertEquals(0, r.faults(), r.toString());
    }
}
