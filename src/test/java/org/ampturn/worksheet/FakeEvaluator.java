package org.ampturn.worksheet;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/** An evaluator that answers from a table (source -> display lines) and remembers what it ran. */
final class FakeEvaluator implements Evaluator {
    final Map<String, Evaluation> answers = new LinkedHashMap<>();
    final List<String> ran = new ArrayList<>();
    final Map<String, List<String>> needs = new LinkedHashMap<>();
    final java.util.Set<String> defined = new java.util.HashSet<>();

    FakeEvaluator answer(String source, String... displayLines) {
        answers.put(source, Evaluation.of(displayLines));
        return this;
    }

    /** The entry fails unless these names were declared (by {@code var NAME =} entries) before it. */
    FakeEvaluator needs(String source, String... names) {
        needs.put(source, List.of(names));
        return this;
    }

    @Override
    public Evaluation eval(String source) {
        ran.add(source);
        for (String n : needs.getOrDefault(source, List.of())) {
            if (!defined.contains(n)) return Evaluation.error("cannot find symbol: variable " + n);
        }
        java.util.regex.Matcher m = java.util.regex.Pattern.compile("^var (\\w+) =").matcher(source);
        if (m.find()) defined.add(m.group(1));
        Evaluation e = answers.get(source);
        return e != null ? e : Evaluation.error("cannot find symbol in " + source);
    }
}
