package org.ampturn.worksheet;

import java.io.IOException;
import java.nio.file.Path;

/** A save that did not happen; the message says why and that the old file on disk is unchanged. */
public final class SaveException extends IOException {
    private final Path target;

    SaveException(Path target, boolean existed, Throwable cause) {
        super("could not save " + target + ": " + reason(cause)
                + (existed ? "; the file on disk is unchanged" : "; nothing was written"), cause);
        this.target = target;
    }

    public Path target() {
        return target;
    }

    private static String reason(Throwable t) {
        String m = t.getMessage();
        String kind = t.getClass().getSimpleName().replace("Exception", "").replaceAll("([a-z])([A-Z])", "$1 $2").toLowerCase();
        return m == null || m.isBlank() ? kind : kind + " (" + m + ")";
    }
}
