package org.ampturn.worksheet;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;

/**
 * Runs a worksheet's entries in order through an {@link Evaluator}, first running the entries of
 * any worksheet it names with {@code #use} (resolved relative to the using file, each at most once,
 * cycles refused). The result is data: one {@link Step} per entry run, in order.
 */
public final class Replay {
    private Replay() {}

    /** Loads a worksheet named by {@code #use}; throwing refuses it (not found, not trusted, ...). */
    @FunctionalInterface
    public interface Loader {
        Worksheet load(Path file) throws Exception;
    }

    /** One entry run: the file it came from, its line there, the entry and what it printed now. */
    public record Step(Path file, int line, Block.Entry entry, Evaluation result) {
        /** True when the entry belongs to {@code top} itself rather than to a worksheet it uses. */
        public boolean isIn(Path top) {
            return file == null ? top == null : top != null && file.toAbsolutePath().normalize().equals(top.toAbsolutePath().normalize());
        }
    }

    /**
     * Runs every entry; {@code onStep} sees each step as soon as it is done (for printing or a
     * journal). An entry that was stopped (Ctrl-C, a time limit) ends the whole run: the steps so far
     * are returned, the stopped one last. {@link Block.Failed} records are never run.
     */
    public static List<Step> run(Worksheet w, Path file, Evaluator evaluator, Loader loader, Consumer<Step> onStep) {
        List<Step> steps = new ArrayList<>();
        run(w, file, evaluator, loader, onStep, steps, new ArrayList<>(), new ArrayList<>(), new boolean[1]);
        return steps;
    }

    /** One entry: a console command is refused as the entry's error; anything the evaluator throws is too. */
    private static Evaluation run(Evaluator ev, String source) {
        if (source.startsWith("#")) {
            String word = source.strip().split("\\s+", 2)[0];
            return Evaluation.error(source, word + " is a console command; a worksheet and ampturn run hold Java entries and #use lines");
        }
        try {
            return ev.eval(source);
        } catch (RuntimeException e) {
            return Evaluation.error(source, "the entry could not run: " + e);
        }
    }

    private static void run(Worksheet w, Path file, Evaluator ev, Loader loader, Consumer<Step> onStep, List<Step> steps,
                            List<Path> stack, List<Path> done, boolean[] stopped) {
        Path self = file == null ? null : file.toAbsolutePath().normalize();
        if (self != null) stack.add(self);
        for (int k = 0; k < w.blocks().size(); k++) {
            Block b = w.blocks().get(k);
            if (b instanceof Block.Entry) {
                Block.Entry e = (Block.Entry) b;
                Step s = new Step(file, w.lineOf(k), e, run(ev, e.source()));
                steps.add(s);
                onStep.accept(s);
                if (s.result().interrupted()) {
                    stopped[0] = true; // Ctrl-C or the entry limit: the whole replay stops, keeping what ran
                    return;
                }
            } else if (b instanceof Block.Use) {
                String name = ((Block.Use) b).path();
                Path used = (self == null || self.getParent() == null ? Path.of(name) : self.getParent().resolve(name)).normalize();
                Block.Entry marker = Block.Entry.of("#use " + name);
                if (stack.contains(used)) {
                    Step s = new Step(file, w.lineOf(k), marker, Evaluation.error(marker.source(), "#use " + name + " would run itself again ("
                            + String.join(" uses ", stack.stream().map(p -> p.getFileName().toString()).toList()) + " uses " + used.getFileName() + ")"));
                    steps.add(s);
                    onStep.accept(s);
                    continue;
                }
                if (done.contains(used)) continue;
                Worksheet other;
                try {
                    other = loader.load(used);
                } catch (Exception ex) {
                    Step s = new Step(file, w.lineOf(k), marker, Evaluation.error(marker.source(), "#use " + name + ": " + ex.getMessage()));
                    steps.add(s);
                    onStep.accept(s);
                    continue;
                }
                done.add(used);
                run(other, used, ev, loader, onStep, steps, stack, done, stopped);
                if (stopped[0]) return;
            }
        }
        if (self != null) stack.remove(stack.size() - 1);
    }
}
