package org.ampturn.worksheet;

import java.io.BufferedReader;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * A minimal console for {@link JournalKillTest}, run as a separate JVM: reads entries from standard
 * input, runs them through a {@link Workspace} (journal in {@code -Dampturn.home}), and prints each
 * result after the workspace returns, then {@code shown N}. It never ends by itself; the test kills it.
 */
public final class JournalChild {
    private JournalChild() {}

    /** Answers {@code var x = v;} with {@code   x = v} and anything else with {@code   = <source>}. */
    static final class Echo implements Evaluator {
        private static final Pattern VAR = Pattern.compile("^var (\\w+) = (.*);$");

        @Override
        public Evaluation eval(String source) {
            Matcher m = VAR.matcher(source);
            return m.matches() ? FakeEvaluator.evaluation(source, "  " + m.group(1) + " = " + m.group(2)) : FakeEvaluator.evaluation(source, "  = " + source);
        }
    }

    public static void main(String[] args) throws Exception {
        Workspace ws = Workspace.forUser(new Echo(), Echo::new);
        BufferedReader in = new BufferedReader(new InputStreamReader(System.in, StandardCharsets.UTF_8));
        System.out.println("journal " + ws.journal().file());
        System.out.flush();
        String line;
        int n = 0;
        while ((line = in.readLine()) != null) {
            if (line.startsWith("#note ")) {
                ws.note(line.substring(6));
            } else {
                for (String l : ws.enter(line).lines()) System.out.println(l);
            }
            System.out.println("shown " + ++n);
            System.out.flush();
        }
        Thread.sleep(Long.MAX_VALUE);
    }
}
