package org.ampturn.worksheet;

/**
 * Tells whether accumulated source lines form a whole entry or need more lines (an open brace, an
 * unfinished expression). The console's JShell session supplies the real analysis; {@link #BRACKETS}
 * is a fallback that needs no compiler.
 */
@FunctionalInterface
public interface Completeness {
    /** True when {@code source} is a whole entry; false when more lines are needed. */
    boolean isComplete(String source);

    /** Bracket, string and comment balance plus a trailing-operator check; no compiler needed. */
    Completeness BRACKETS = BracketCompleteness::isComplete;
}
