package org.ampturn.worksheet;

/** The text is not a worksheet this tool can read: wrong first line, newer format or newer tool. */
public final class WorksheetFormatException extends Exception {
    private final int line;

    public WorksheetFormatException(String message, int line) {
        super(message);
        this.line = line;
    }

    /** The 1-based line the problem was found on, or 0 when it concerns the whole file. */
    public int line() {
        return line;
    }
}
