package org.ampturn.worksheet;

/**
 * Runs one entry and reports what it gave. The JShell session is the real one
 * ({@link ShellEvaluator}); tests use fakes. An evaluator keeps state between entries
 * (declarations stay defined).
 */
@FunctionalInterface
public interface Evaluator extends AutoCloseable {
    /** Evaluates one whole entry. Never throws for bad user code: errors come back as typed results. */
    Evaluation eval(String source);

    /** Takes the last entry out of the session's state; false when it cannot. */
    default boolean undoLast() {
        return false;
    }

    /** How this evaluator tells a whole entry from one that needs more lines. */
    default Completeness completeness() {
        return Completeness.BRACKETS;
    }

    /** Stops the entry that is running, if any; safe to call from any thread. */
    default void stop() {}

    /** Forgets every entry (for a replay from the start). */
    default void clear() {}

    /** Ends the evaluator. */
    @Override
    default void close() {}
}
