package org.ampturn.worksheet;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Supplier;

/**
 * The real {@link Evaluator}: the console's JShell {@link Session}, with its completeness analysis
 * for splitting worksheet text into entries. Each entry records the chart files it made (from the
 * chart layer's registry of figures, or another source given with {@link #withFigures}).
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
        return new ShellEvaluator(Session.start(), ShellEvaluator::chartFiles, true);
    }

    /** Wraps a session the console owns; closing this evaluator leaves the session open. */
    public static ShellEvaluator over(Session session) {
        return new ShellEvaluator(session, ShellEvaluator::chartFiles, false);
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
        return evaluation(o, before, figureFiles.get());
    }

    /** An outcome as an evaluation, with the chart files that appeared between {@code before} and {@code after}. */
    static Evaluation evaluation(Outcome o, List<Path> before, List<Path> after) {
        // before and after are snapshots of an append-only log of writes: the entry wrote the tail
        List<Path> fresh = after.size() >= before.size() && after.subList(0, before.size()).equals(before)
                ? after.subList(before.size(), after.size())
                : after.stream().filter(p -> !before.contains(p)).toList();
        List<String> figs = new ArrayList<>();
        for (Path p : fresh) if (!figs.contains(p.toString())) figs.add(p.toString());
        return new Evaluation(o.lines(), figs, o.failed());
    }

    /** Every chart file written so far in this JVM (the chart layer's registry). */
    public static List<Path> chartFiles() {
        return org.ampturn.chart.Figures.written();
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
        org.ampturn.chart.Figures.clear();
    }

    @Override
    public void close() {
        if (owned) session.close();
    }
}
