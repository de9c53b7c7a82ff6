package org.ampturn.study;

/** A solve that could not find its answer: the target not bracketed, the function failing, or too many steps. */
public final class SolveException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    SolveException(String message) {
        super(message);
    }

    SolveException(String message, Throwable cause) {
        super(message, cause);
    }
}
