package org.ampturn.field;

/**
 * Listens to a field map being made: solves done out of the total. Called from worker threads,
 * never two at once; the last call has {@code done == total} unless the map was stopped.
 */
@FunctionalInterface
public interface MapProgress {
    void solved(int done, int total);

    /** A listener that ignores every update. */
    MapProgress NONE = (done, total) -> {};
}
