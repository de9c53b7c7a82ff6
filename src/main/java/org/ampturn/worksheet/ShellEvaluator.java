package org.ampturn.worksheet;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Supplier;

/**
 * The real {@link Evaluator}: the console's JShell {@link Session}, with its completeness analysis
 * for splitting worksheet text into entries. Optionally told where charts are written, so each
 * entry records the chart files it made.
 */
public final class ShellEvaluator implements Evaluator {
    private final Session session;
    private final Supplier<List<Path>> figureFiles;
    private final boolean owned;

    private ShellEvaluator(Session session, Supplier<List<Path>> figureFiles, boolean owned) {
        this.session = session;
        this.figureFiles = figureFiles;
        this.owned = owned;
    }

    /** Starts a new session (about a second on a cold JVM); closing this evaluator ends it. */
    public static ShellEvaluator start() {
        return new ShellEvaluator(Session.start(), List::of, true);
    }

    /** Wraps a session the console owns; closing this evaluator leaves the session open. */
    public static ShellEvaluator over(Session session) {
        return new ShellEvaluator(session, List::of, false);
    }

    /**
     * A copy that records, for each entry, the chart files that {@code figureFiles} lists after the
     * entry and did not list before it.
     */
    public ShellEvaluator withFigures(Supplier<List<Path>> files) {
        return new ShellEvaluator(session, files, owned);
    }

    public Session session() {
        return session;
    }

    @Override
    public Evaluation eval(String source) {
        List<Path> before = figureFiles.get();
        Outcome o = session.eval(source);
        List<String> figs = new ArrayList<>();
        for (Path p : figureFiles.get()) if (!before.contains(p)) figs.add(p.toString());
        return new Evaluation(o.lines(), figs, o.failed());
    }

    @Override
    public Completeness completeness() {
        return text -> !session.needsMore(text);
    }

    @Override
    public boolean undoLast() {
        return session.undoLast();
    }

    @Override
    public void clear() {
        session.clear();
    }

    @Override
    public void close() {
        if (owned) session.close();
    }
}
