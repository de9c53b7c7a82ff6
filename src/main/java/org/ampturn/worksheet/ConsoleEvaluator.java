package org.ampturn.worksheet;

/**
 * The {@link Evaluator} of a {@link Workspace} inside the interactive console: entries run through
 * the console itself ({@link SessionConsole#enter}), so they are shown as typed entries are, and the
 * console's history stays in step with the session.
 */
final class ConsoleEvaluator implements Evaluator {
    private final SessionConsole console;
    private final java.util.function.Supplier<java.util.List<java.nio.file.Path>> figureFiles;

    ConsoleEvaluator(SessionConsole console, java.util.function.Supplier<java.util.List<java.nio.file.Path>> figureFiles) {
        this.console = console;
        this.figureFiles = figureFiles;
    }

    @Override
    public Evaluation eval(String source) {
        java.util.List<java.nio.file.Path> before = figureFiles.get();
        Outcome o = console.enter(source, true);
        return ShellEvaluator.evaluation(o, before, figureFiles.get());
    }

    @Override
    public Completeness completeness() {
        return text -> !console.session().needsMore(text);
    }

    @Override
    public boolean undoLast() {
        return console.session().undoLast();
    }

    @Override
    public void clear() {
        console.clear();
    }
}
