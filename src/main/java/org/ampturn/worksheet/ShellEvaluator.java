package org.ampturn.worksheet;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Supplier;
import org.ampturn.chart.Figures;
import org.ampturn.session.Outcome;
import org.ampturn.session.Session;

/**
 * The real {@link Evaluator}: a JShell {@link Session}, with its completeness analysis for splitting
 * worksheet text into entries. Each entry records the chart files it made (from the chart layer's
 * registry of figures).
 */
public final class ShellEvaluator implements Evaluator {
    private final Supplier<Session> session;
    private final boolean owned;

    private ShellEvaluator(Supplier<Session> session, boolean owned) {
        this.session = session;
        this.owned = owned;
    }

    /** Starts a new session (about a second on a cold JVM); closing this evaluator ends it. */
    public static ShellEvaluator start() {
        Session s = Session.start();
        return new ShellEvaluator(() -> s, true);
    }

    /**
     * Runs entries in a session that someone else owns (the console, whose session may still be
     * starting: {@code session} waits for it); closing this evaluator leaves the session open.
     */
    public static ShellEvaluator over(Supplier<Session> session) {
        return new ShellEvaluator(session, false);
    }

    public Session session() {
        return session.get();
    }

    @Override
    public Evaluation eval(String source) {
        List<Path> before = chartFiles();
        Outcome o = session.get().eval(source);
        return new Evaluation(o, fresh(before, chartFiles()));
    }

    /** The chart files that appeared between two snapshots of the chart layer's append-only log. */
    static List<String> fresh(List<Path> before, List<Path> after) {
        List<Path> tail = after.size() >= before.size() && after.subList(0, before.size()).equals(before)
                ? after.subList(before.size(), after.size())
                : after.stream().filter(p -> !before.contains(p)).toList();
        List<String> figs = new ArrayList<>();
        for (Path p : tail) if (!figs.contains(p.toString())) figs.add(p.toString());
        return figs;
    }

    /** Every chart file written so far in this JVM (the chart layer's registry). */
    static List<Path> chartFiles() {
        return Figures.written();
    }

    @Override
    public Completeness completeness() {
        return text -> !session.get().needsMore(text);
    }

    @Override
    public boolean undoLast() {
        return session.get().undoLast();
    }

    @Override
    public void stop() {
        session.get().stop();
    }

    @Override
    public void clear() {
        session.get().clear();
        Figures.clear();
    }

    @Override
    public void close() {
        if (owned) session.get().close();
    }
}
