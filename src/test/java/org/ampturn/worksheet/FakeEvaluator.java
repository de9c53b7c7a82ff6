package org.ampturn.worksheet;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.ampturn.session.Outcome;

/** An evaluator that answers from a table (source -> display lines) and remembers what it ran. */
public final class FakeEvaluator implements Evaluator {
    final Map<String, Evaluation> answers = new LinkedHashMap<>();
    public final List<String> ran = java.util.Collections.synchronizedList(new ArrayList<>());
    final Map<String, List<String>> needs = new LinkedHashMap<>();
    final java.util.Set<String> defined = new java.util.HashSet<>();

    /** A three-entry worksheet (stored energy of a choke) that {@link #truth()} answers as recorded. */
    public static final String SHEET = "// ampturn worksheet 1\n// title: t\n\n"
            + "var L = mH(4.7);\n//= L = 4.700 mH\n"
            + "var I = A(2);\n//= I = 2.000 A\n"
            + "L.times(I.pow(2)).div(2)\n//= 9.400 mJ\n";

    /** Answers {@link #SHEET}'s entries as recorded (E = L I² / 2 = 4.7 mH × 4 A² / 2 = 9.4 mJ, common practice). */
    public static FakeEvaluator truth() {
        return new FakeEvaluator()
                .answer("var L = mH(4.7);", "  L = 4.700 mH")
                .answer("var I = A(2);", "  I = 2.000 A")
                .answer("L.times(I.pow(2)).div(2)", "  = 9.4000 mJ")
                .needs("L.times(I.pow(2)).div(2)", "L", "I");
    }

    public FakeEvaluator answer(String source, String... displayLines) {
        answers.put(source, evaluation(source, displayLines));
        return this;
    }

    /**
     * A typed evaluation from display lines as the console shows them: {@code "  = v"} a value,
     * {@code "  name = v"} a declaration, {@code "  ! m"} an error, {@code "  | t"} printed text,
     * anything else a definition.
     */
    static Evaluation evaluation(String source, String... displayLines) {
        List<Outcome.Result> results = new ArrayList<>();
        Outcome.Kind kind = Outcome.Kind.NOTHING;
        boolean failed = false;
        for (String l : displayLines) {
            String t = l.substring(2);
            Outcome.Result r;
            if (t.startsWith("= ")) r = Outcome.Result.of(Outcome.Kind.VALUE, t.substring(2));
            else if (t.startsWith("! ")) r = Outcome.Result.of(Outcome.Kind.ERROR, t.substring(2));
            else if (t.startsWith("| ")) r = Outcome.Result.of(Outcome.Kind.PRINTED, t.substring(2));
            else if (t.matches("^\\w+ = .*")) r = Outcome.Result.of(Outcome.Kind.DECLARATION, t);
            else r = Outcome.Result.of(Outcome.Kind.DEFINITION, t);
            results.add(r);
            if (r.kind() == Outcome.Kind.ERROR) failed = true;
            else if (r.kind() != Outcome.Kind.PRINTED) kind = r.kind();
        }
        return new Evaluation(new Outcome(source, failed ? Outcome.Kind.ERROR : kind, results, false, !failed), List.of());
    }

    /** The entry fails unless these names were declared (by {@code var NAME =} entries) before it. */
    /** The entry is stopped as by Ctrl-C: it fails with "interrupted". */
    public FakeEvaluator interrupts(String source) {
        answers.put(source, new Evaluation(new Outcome(source, Outcome.Kind.ERROR,
                List.of(Outcome.Result.of(Outcome.Kind.ERROR, "interrupted")), true, false), List.of()));
        return this;
    }

    /** The entry runs until {@link #stop()} is called (a runaway loop that still looks at the interrupt). */
    public FakeEvaluator runsAway(String source) {
        runaway.add(source);
        return this;
    }

    private final java.util.Set<String> runaway = new java.util.HashSet<>();
    private final java.util.concurrent.Semaphore stopped = new java.util.concurrent.Semaphore(0);

    @Override
    public void stop() {
        stopped.release();
    }

    public FakeEvaluator needs(String source, String... names) {
        needs.put(source, List.of(names));
        return this;
    }

    @Override
    public Evaluation eval(String source) {
        ran.add(source);
        if (runaway.contains(source)) {
            stopped.acquireUninterruptibly();
            return new Evaluation(new Outcome(source, Outcome.Kind.ERROR, List.of(Outcome.Result.of(Outcome.Kind.ERROR, "interrupted")), true, false),
                    List.of());
        }
        for (String n : needs.getOrDefault(source, List.of())) {
            if (!defined.contains(n)) return Evaluation.error(source, "cannot find symbol: variable " + n);
        }
        java.util.regex.Matcher m = java.util.regex.Pattern.compile("^var (\\w+) =").matcher(source);
        if (m.find()) defined.add(m.group(1));
        Evaluation e = answers.get(source);
        return e != null ? e : Evaluation.error(source, "cannot find symbol in " + source);
    }
}
