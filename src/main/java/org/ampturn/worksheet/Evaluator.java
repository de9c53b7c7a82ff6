package org.ampturn.worksheet;

/**
 * Runs one entry and reports what it printed. The console's JShell session is the real one; tests
 * use fakes. An evaluator keeps state between entries (declarations stay defined).
 */
@FunctionalInterface
public interface Evaluator extends AutoCloseable {
    /** Evaluates one whole entry. Never throws for bad user code: errors come back as {@code !} lines. */
    Evaluation eval(String source);

    /** Takes the last entry out of the session's state; false when it cannot. */
    default boolean undoLast() {
        return false;
    }

    /** How this evaluator tells a whole entry from one that needs more lines. */
    default Completeness completeness() {
        return Completeness.BRACKETS;
    }

    /** Forgets every entry (for a replay from the start). */
    default void clear() {}

    /** Ends the evaluator. */
    @Override
    default void close() {}
}
