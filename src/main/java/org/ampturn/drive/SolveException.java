package org.ampturn.drive;

/**
 * A transient that could not be solved: the integrator's step fell below its floor (a stiff circuit
 * or a diverging solution), it ran out of evaluations, or the state left the physical range. The
 * message says which quantity, at what time and by how much.
 */
public final class SolveException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    SolveException(String message) {
        super(message);
    }

    SolveException(String message, Throwable cause) {
        super(message, cause);
    }
}
