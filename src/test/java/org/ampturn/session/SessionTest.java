package org.ampturn.session;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.concurrent.TimeUnit;
import org.ampturn.session.Outcome.Kind;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;

/** What an entry shows (DESIGN.md, "The console"), run through a real embedded JShell. */
class SessionTest {
    private static Session session;

    @BeforeAll
    static void start() {
        session = Session.start();
    }

    @AfterAll
    static void close() {
        session.close();
    }

    @Test
    void theLibraryIsPreloadedAndAValueShowsWithItsUnit() {
        // 1/2 L I^2 = 0.5 * 2 mH * (3 A)^2 = 9 mJ (energy stored in an inductor, common practice)
        Outcome o = session.eval("mH(2).times(A(3).pow(2)).times(0.5)");
        assertEquals(List.of("  = 9.000 mJ"), o.lines());
        assertEquals(Kind.VALUE, o.kind());
        assertFalse(o.failed());
        assertEquals(List.of("9.000 mJ"), o.recorded());
        assertTrue(session.imports().contains("import static org.ampturn.Ampturn.*;"), session.imports().toString());
    }

    @Test
    void aWorksheetClassOfTheSameNameAsALibraryClassWins() {
        session.eval("record Limit(double max) {}");
        assertEquals(List.of("  = 2.000"), session.eval("new Limit(2.0).max()").lines());
    }

    @Test
    void entriesCompileAgainstTheLibraryAndCommonsMathButNotTheConsolesLibraries() {
        assertEquals(List.of("  = 3.000"), session.eval("org.apache.commons.math3.util.FastMath.sqrt(9.0)").lines());
        Outcome o = session.eval("org.jline.reader.LineReader r = null;");
        assertTrue(o.failed(), o.toString());
        assertTrue(o.lines().get(0).contains("org.jline.reader"), o.lines().toString());
    }

    @Test
    void aDeclarationShowsNameAndValue() {
        Outcome o = session.eval("var gap = mm(0.25);");
        assertEquals(List.of("  gap = 250.0 µm"), o.lines());
        assertEquals(Kind.DECLARATION, o.kind());
        assertEquals(List.of("gap = 250.0 µm"), o.recorded());
    }

    @Test
    void aCompileErrorShowsTheMessageAndACaretUnderTheColumn() {
        Outcome o = session.eval("mm(25).times(turnz)");
        assertTrue(o.failed());
        assertEquals(List.of("  ! cannot find symbol: variable turnz", "    mm(25).times(turnz)", "                 ^"), o.lines());
        assertFalse(String.join("\n", o.lines()).contains("$JShell"), o.toString());
        assertFalse(o.kept(), "a rejected entry is not a worksheet entry");
        int before = session.entryCount();
        assertTrue(session.eval("mm(2)").kept());
        assertEquals(before + 1, session.entryCount());
    }

    @Test
    void theCaretFindsTheLineOfAMultiLineEntry() {
        Outcome o = session.eval("int layers(double r) {\n    int n = 2.5 * r;\n    return n;\n}");
        List<String> l = o.lines();
        assertTrue(o.failed());
        assertEquals("  ! incompatible types: possible lossy conversion from double to int", l.get(0));
        assertEquals("        int n = 2.5 * r;", l.get(1));
        assertEquals("    " + " ".repeat("    int n = 2.5 ".length()) + "^", l.get(2));
    }

    @Test
    void aMethodUsingANameNotYetDefinedSaysWhatItNeeds() {
        Outcome o = session.eval("double area(double r) {\n    return Math.PI * r * rr;\n}");
        assertEquals(List.of("  defined method area(double), usable once variable rr is defined"), o.lines());
        assertTrue(session.eval("area(1)").lines().get(0).startsWith("  ! area(...) cannot run until variable rr is defined"));
    }

    @Test
    void aWrongArgumentListNamesTypesWithoutTheirPackages() {
        Outcome o = session.eval("mm(1).times(\"two\", 3)");
        assertTrue(o.failed());
        String first = o.lines().get(0);
        assertTrue(first.startsWith("  ! no suitable method found for times(String,int)"), first);
        assertFalse(first.contains("org.ampturn.") || first.contains("java.lang."), first);
    }

    @Test
    void aLibraryExceptionShowsItsMessageOnly() {
        Outcome o = session.eval("mm(1).plus(A(1))");
        assertEquals(Kind.ERROR, o.kind());
        assertEquals(1, o.lines().size(), o.toString());
        assertTrue(o.lines().get(0).startsWith("  ! cannot add "), o.toString());
        assertTrue(o.lines().get(0).contains("current") && o.lines().get(0).contains("length"), o.toString());
    }

    @Test
    void aJdkExceptionShowsItsTypeAndMessageWithoutWrapperNames() {
        assertEquals(List.of("  ! ArithmeticException: / by zero"), session.eval("1 / 0").lines());
        Outcome npe = session.eval("String label = null; label.length()");
        assertTrue(npe.failed());
        String last = npe.lines().get(npe.lines().size() - 1);
        assertTrue(last.startsWith("  ! NullPointerException"), last);
        assertFalse(last.contains("$JShell") || last.contains("REPL."), last);
    }

    @Test
    void whatAnEntryPrintsIsPartOfItsOutcomeInOrder() {
        java.io.PrintStream before = System.out;
        Outcome o = session.eval("System.out.println(\"L = \" + mH(4.7)); mm(2).times(3)");
        assertEquals(List.of("  | L = 4.700 mH", "  = 6.000 mm"), o.lines());
        assertEquals(List.of("| L = 4.700 mH", "6.000 mm"), o.recorded());
        assertTrue(System.out == before, "standard output is given back after the entry");
        Outcome loop = session.eval("for (int i = 1; i <= 2; i++) System.out.printf(\"row %d%n\", i);");
        assertEquals(List.of("  | row 1", "  | row 2"), loop.lines());
    }

    @Test
    void doublesShowTheDisplayDigitsOfQuantities() {
        // common practice: an engineering result shows its significant digits, not binary noise
        assertEquals(List.of("  = 0.3333"), session.eval("1.0 / 3").lines());
        assertEquals(List.of("  x = 590.5"), session.eval("double x = 590.4999999999236;").lines());
        assertEquals(List.of("  = 7"), session.eval("3 + 4").lines());
    }

    @Test
    void methodsAndTypesAreDefinitions() {
        Outcome m = session.eval("double twice(double x) {\n  return 2 * x;\n}");
        assertEquals(List.of("  defined method twice(double)"), m.lines());
        assertEquals(Kind.DEFINITION, m.kind());
        assertEquals(List.of("  = 6.000"), session.eval("twice(3)").lines());
        assertEquals(List.of("  redefined method twice(double)"), session.eval("double twice(double x) { return x + x; }").lines());
        assertEquals(List.of("  defined record Spec"), session.eval("record Spec(int turns) {}").lines());
    }

    @Test
    void statementsAndVoidCallsShowNothingAndNullShowsAsNull() {
        Outcome o = session.eval("for (int i = 0; i < 2; i++) {\n  Math.sqrt(i);\n}");
        assertEquals(Kind.NOTHING, o.kind());
        assertTrue(o.lines().isEmpty());
        assertTrue(session.eval("Thread.yield()").lines().isEmpty());
        assertEquals(List.of("  = null"), session.eval("(Object) null").lines());
    }

    @Test
    void severalSnippetsOnOneLineAreOneEntry() {
        Outcome o = session.eval("int nA = 1; int nB = nA + 1;");
        assertEquals(List.of("  nA = 1", "  nB = 2"), o.lines());
    }

    @Test
    void exitAndHaltAreBlockedAndTheSessionGoesOn() {
        for (String call : List.of("System.exit(3)", "Runtime.getRuntime().halt(1);", "Runtime.getRuntime().exit(4);",
                "java.util.function.IntConsumer bye = System::exit; bye.accept(2);", "void leave() { System.exit(5); }\nleave();")) {
            Outcome o = session.eval(call);
            assertTrue(o.failed(), call);
            assertEquals("  ! " + Session.EXIT_BLOCKED, o.lines().get(o.lines().size() - 1), call);
        }
        assertEquals(List.of("  = 42"), session.eval("6 * 7").lines());
    }

    @Test
    @Timeout(value = 20, unit = TimeUnit.SECONDS)
    void stopInterruptsARunawayLoopAndTheSessionSurvives() throws Exception {
        session.eval("int kept = 7;");
        Thread stopper = new Thread(() -> {
            long until = System.nanoTime() + 5_000_000_000L;
            while (!session.isRunning() && System.nanoTime() < until) Thread.onSpinWait();
            session.stop(); // most likely still compiling: the stop must hold until the loop runs
        });
        stopper.start();
        Outcome o = session.eval("while (true) {}");
        stopper.join();
        assertTrue(o.interrupted());
        assertEquals(List.of("  ! " + Session.INTERRUPTED), o.lines());
        assertEquals(List.of("  = 14"), session.eval("kept * 2").lines());
    }

    @Test
    void anUnfinishedEntryNeedsMoreLines() {
        assertTrue(session.needsMore("void f() {"));
        assertTrue(session.needsMore("mm(1).plus("));
        assertFalse(session.needsMore("mm(1)"));
        assertFalse(session.needsMore("// only a note"));
    }

    @Test
    void undoTakesTheLastEntryOut() {
        session.eval("var spare = mm(3);");
        assertTrue(session.names().stream().anyMatch(n -> n.name().equals("spare")));
        assertTrue(session.undoLast());
        assertFalse(session.names().stream().anyMatch(n -> n.name().equals("spare")));
        assertTrue(session.eval("spare").failed());
    }

    @Test
    void anExpressionsValueIsShownAndNotKeptAsAHiddenVariable() {
        session.eval("var keep = mm(1);");
        long before = session.variableCount();
        for (int i = 2; i < 7; i++) assertEquals(List.of("  = " + i + ".000 mm"), session.eval("keep.times(" + i + ")").lines());
        assertEquals(before, session.variableCount(), "each expression would otherwise leave a $n variable behind");
        int entries = session.entryCount();
        assertTrue(session.eval("keep.times(3)").kept(), "an expression that ran is still a worksheet entry");
        assertEquals(entries + 1, session.entryCount());
        assertTrue(session.undoLast(), "undo takes back the expression entry ...");
        assertEquals(List.of("  = 1.000 mm"), session.eval("keep").lines(), "... and not the declaration before it");
    }

    @Test
    void namesListVariablesWithTypeAndValue() {
        session.eval("var wireLength = m(12.5);");
        Session.Name n = session.names().stream().filter(x -> x.name().equals("wireLength")).findFirst().orElseThrow();
        assertEquals(new Session.Name("variable", "wireLength", "Quantity", "12.50 m"), n);
    }

    @Test
    void completionOffersLibraryMethodsAndSessionNames() {
        assertTrue(session.complete("mm(1).ti", 8).candidates().contains("times("));
        session.eval("var coreArea = mm(4).times(mm(4));");
        Session.Completion c = session.complete("core", 4);
        assertEquals(0, c.anchor());
        assertTrue(c.candidates().contains("coreArea"), c.toString());
        assertTrue(session.complete("Quanti", 6).candidates().contains("Quantity"));
        assertTrue(session.complete("Solen", 5).candidates().contains("Solenoid"), "completion offers classes of packages no entry has named yet");
    }
}
