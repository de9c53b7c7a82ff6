package org.ampturn.session;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;

/** A long session renews its engine: every name keeps its value (the same object), methods still see the variables, nothing runs twice. */
class SessionRenewalTest {
    private Session session;

    @BeforeEach
    void start() {
        session = Session.start();
        session.renewAt(30);
    }

    @AfterEach
    void close() {
        session.close();
    }

    private List<String> eval(String s) {
        Outcome o = session.eval(s);
        return o.lines();
    }

    @Test
    void valuesMethodsAndImportsCarryOverAndNothingRunsTwice() {
        eval("var gap = mm(2);");
        eval("double k = 3;");
        eval("double f(double x) { return x * k; }");
        eval("import java.util.concurrent.atomic.AtomicInteger;");
        eval("var runs = new AtomicInteger();");
        eval("runs.incrementAndGet();"); // a side effect that must not happen again
        eval("var names = new java.util.ArrayList<String>(java.util.List.of(\"a\"));");
        eval("int count = 7;");
        eval("var s = Solenoid.singleLayer(100, mm(30), mm(10));");
        for (int i = 0; i < 36; i++) eval("gap.times(" + i + ")");
        assertTrue(session.renewals() >= 1, "renewed after 30 snippets: " + session.renewals());
        assertEquals(List.of("  = 4.000 mm"), eval("gap.times(2)"));
        assertEquals(List.of("  = 6.000"), eval("f(2)"));
        assertEquals(List.of("  = 1"), eval("runs.get()"), "the increment ran once");
        eval("names.add(\"b\");");
        assertEquals(List.of("  = 2"), eval("names.size()"), "the same list, not a copy made again");
        eval("k = 5;");
        assertEquals(List.of("  = 5.000"), eval("f(1)"), "the method reads the variable of the renewed session");
        assertEquals(List.of("  = 8"), eval("count + 1"));
        assertTrue(eval("s.inductance()").get(0).startsWith("  = "), "a library object carried over");
        // undo still takes back a declaration made before the renewal
        eval("var late = mm(9);");
        for (int i = 0; i < 36; i++) eval("gap.times(" + i + ")");
        assertTrue(session.renewals() >= 2, "renewed again: " + session.renewals());
        for (int i = 0; i < 36; i++) assertTrue(session.undoLast());
        assertTrue(session.undoLast(), "the entry that declared late");
        assertTrue(eval("late").get(0).contains("cannot find symbol"), "late is gone: " + eval("late"));
        assertEquals(List.of("  = 4.000 mm"), eval("gap.times(2)"));
    }

    @Test
    void aSessionWithADeclaredTypeOrALambdaIsNotRenewed() {
        eval("record Pair(double a, double b) {}");
        for (int i = 0; i < 36; i++) eval("mm(" + i + ")");
        assertEquals(0, session.renewals(), "a declared record keeps the session as it is");
        assertEquals(List.of("  = 3.000"), eval("new Pair(1, 2).a() + new Pair(1, 2).b()"));

        session.close();
        session = Session.start();
        session.renewAt(30);
        eval("java.util.function.DoubleUnaryOperator twice = x -> 2 * x;");
        for (int i = 0; i < 36; i++) eval("mm(" + i + ")");
        assertEquals(0, session.renewals(), "a lambda made by the session keeps the session as it is");
        assertEquals(List.of("  = 6.000"), eval("twice.applyAsDouble(3)"));
    }

    @Test
    void expressionValuesDoNotHoldTheSessionBackAndManyNamesWaitLonger() {
        // 300 expressions leave 300 unnamed values ($1, $2, ...): they are not moved, so they do not count
        for (int i = 0; i < 300; i++) eval("mm(" + i + ")");
        assertTrue(session.renewals() >= 5, "renewed every 30 or so snippets: " + session.renewals());

        session.close();
        session = Session.start();
        session.renewAt(30);
        // 30 names to move: the session waits for four snippets per name (120) before it renews
        for (int i = 0; i < 30; i++) eval("double v" + i + " = " + i + ";");
        int more = 0;
        while (session.renewals() == 0 && more < 300) eval("v1 + " + more++);
        assertTrue(more >= 90 && more < 200, "renewed once past four snippets per name, after " + more + " more entries");
        assertEquals(List.of("  = 29.00"), eval("v29"));
    }
}
