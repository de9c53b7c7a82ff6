package org.ampturn.drive;

/**
 * A transient that could not be solved: the integrator's step fell below its floor (a stiff circuit
 * or a diverging solution), it ran out of evaluations, or the state left the physical range. The
 * message says which quantity, at what time and by how much.
 */
public final class TransientException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    TransientException(String message) {
        super(message);
    }

    TransientException(String message, Throwable cause) {
        super(message, cause);
    }
}
