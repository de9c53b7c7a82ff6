package org.ampturn.worksheet;

/**
 * Runs one entry and reports what it printed. The console's JShell session is the real one; tests
 * use fakes. An evaluator keeps state between entries (declarations stay defined).
 */
@FunctionalInterface
public interface Evaluator {
    /** Evaluates one whole entry. Never throws for bad user code: errors come back as {@code !} lines. */
    Evaluation eval(String source);
}
