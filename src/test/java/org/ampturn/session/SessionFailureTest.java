package org.ampturn.session;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/** A failure of the compiler, the engine or the library inside one entry is that entry's error; the session goes on. */
class SessionFailureTest {
    static Session session;

    @BeforeAll
    static void start() {
        session = Session.start();
    }

    @AfterAll
    static void close() {
        session.close();
    }

    @Test
    void aCompilerCrashIsTheEntrysErrorAndTheSessionGoesOn() {
        // "x catch" makes the JDK's JShell analysis throw an InternalError (JDK 17 to 25)
        Outcome o = session.eval("x catch");
        assertTrue(o.failed());
        assertEquals(1, o.lines().size(), o.toString());
        assertTrue(o.lines().get(0).startsWith("  ! the Java compiler failed on this entry"), o.toString());
        assertTrue(o.lines().get(0).length() <= 120, o.toString());
        assertEquals(List.of("  = 4"), session.eval("2+2").lines());
    }

    @Test
    void anEntryTooDeepForTheCompilerIsTheEntrysError() {
        String sum = String.join("+", java.util.Collections.nCopies(3000, "1"));
        Outcome o = session.eval(sum);
        assertTrue(o.failed());
        assertEquals(List.of("  ! this entry is nested or chained too deeply for the Java compiler; split it into smaller entries"), o.lines());
        assertEquals(List.of("  = 6"), session.eval("2*3").lines());
        assertTrue(session.needsMore("mm(1).plus(") && !session.needsMore("x catch"), "the analysis does not throw either");
    }

    @Test
    void aVariableWhoseEntryFailedIsNamedWhenUsed() {
        Outcome failed = session.eval("var r = Solenoid.singleLayer(0, mm(1), mm(1));");
        assertTrue(failed.failed(), failed.toString());
        assertEquals(List.of("  ! r has no value: its entry failed"), session.eval("r.inductance()").lines());
        session.eval("var r = Solenoid.singleLayer(10, mm(10), mm(5));");
        assertTrue(!session.eval("r.inductance()").failed(), "declared again, it has a value");
        assertTrue(session.eval("String s = null; s.length()").lines().stream().anyMatch(l -> l.contains("NullPointerException")),
                "a null pointer of another cause keeps its own message");
    }
}
