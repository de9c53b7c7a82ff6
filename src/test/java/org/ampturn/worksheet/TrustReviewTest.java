package org.ampturn.worksheet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/** The trust review: risky lines flagged by kind and line, control characters made visible, changes since the last trust. */
class TrustReviewTest {
    @TempDir
    Path dir;

    static Stream<Arguments> risky() {
        return Stream.of(
                Arguments.of("java.nio.file.Files.writeString(java.nio.file.Path.of(\"x\"), \"y\");", "files"),
                Arguments.of("new java.io.FileOutputStream(\"/tmp/x\").write(1);", "files"),
                Arguments.of("new ProcessBuilder(\"rm\", \"-rf\", \"x\").start();", "processes"),
                Arguments.of("Runtime.getRuntime().exec(\"sh\");", "processes"),
                Arguments.of("new java.net.Socket(\"example.org\", 80);", "network"),
                Arguments.of("java.net.http.HttpClient.newHttpClient();", "network"),
                Arguments.of("Class.forName(\"x.Y\");", "class loading"),
                Arguments.of("var l = new java.net.URLClassLoader(new java.net.URL[0]);", "class loading"),
                Arguments.of("String.class.getDeclaredField(\"value\").setAccessible(true);", "reflection"),
                Arguments.of("Math.class.getMethod(\"abs\", double.class).invoke(null, 1.0);", "reflection"),
                Arguments.of("System.exit(3);", "System.exit"),
                Arguments.of("Runtime.getRuntime().halt(1);", "System.exit"),
                Arguments.of("System.setProperty(\"ampturn.home\", \"/tmp\");", "environment"),
                Arguments.of("var s = \"\\u0046iles\"; // \u001B[2K", "hidden text"),
                Arguments.of("#use other.atw", "runs another worksheet"));
    }

    @ParameterizedTest
    @MethodSource("risky")
    void eachKindOfRiskyLineIsFlaggedWithItsLine(String line, String kind) {
        String text = "// ampturn worksheet 1\n\nmm(1)\n" + line + "\n";
        List<TrustReview.Risk> risks = TrustReview.risks(text);
        assertTrue(risks.stream().anyMatch(r -> r.line() == 4 && r.kind().equals(kind)), risks.toString());
        assertTrue(risks.stream().noneMatch(r -> r.line() != 4), "only the risky line: " + risks);
    }

    @Test
    void aPlainCalculationIsNotFlagged() {
        assertEquals(List.of(), TrustReview.risks("// ampturn worksheet 1\n// title: choke\n\nvar L = mH(4.7);\n//= L = 4.700 mH\n"
                + "var run = Drive.dc(V(12)).into(coil).simulate(ms(40));\nplot(run).save(\"current.svg\")\nsweep(\"n\", 1, 9, 9, n -> n)\n"));
    }

    @Test
    void escapeSequencesCannotHideAnEntry() {
        // a record that clears the line above and moves the cursor up, to hide the entry before it
        String text = "// ampturn worksheet 1\n\nwriteEvil()\n//= ok \u001B[1A\u001B[2K\u001B[1A\u001B[2K\nmm(1)\n";
        List<String> review = TrustReview.lines(Path.of("w.atw"), text, null);
        for (String l : review) assertFalse(l.chars().anyMatch(c -> c < 0x20 || c == 0x7F), "no control character reaches the terminal: " + l);
        assertTrue(review.contains("3 | writeEvil()"), review.toString());
        assertTrue(review.contains("4 | //= ok \\x1B[1A\\x1B[2K\\x1B[1A\\x1B[2K"), review.toString());
        assertTrue(review.stream().anyMatch(l -> l.contains("line 4: hidden text")), review.toString());
        assertEquals("a\\u202Eb\\x0D", TrustReview.visible("a\u202Eb\r"), "bidirectional overrides and carriage returns too");
    }

    @Test
    void theChangesSinceTheLastTrustAreShown() throws Exception {
        Path f = dir.resolve("valve.atw");
        String v1 = "// ampturn worksheet 1\n\nvar L = mH(4.7);\nvar I = A(2);\n";
        String v2 = "// ampturn worksheet 1\n\nvar L = mH(4.7);\njava.nio.file.Files.delete(java.nio.file.Path.of(\"x\"));\nvar I = A(2);\n";
        TrustStore store = TrustStore.of(dir.resolve("home/trusted"), null);
        Files.writeString(f, v1);
        store.trust(f, Files.readAllBytes(f));
        Files.writeString(f, v2);
        assertEquals(v1, store.earlier(f));
        List<String> review = TrustReview.lines(f, v2, store.earlier(f));
        int summary = review.indexOf("  ! line 4: files: java.nio.file.Files.delete(java.nio.file.Path.of(\"x\"));");
        int changed = review.indexOf("Changed since it was last trusted at this path (1 lines):");
        int text = review.indexOf("The whole text:");
        assertTrue(summary > 0 && changed > summary && text > changed, "summary and changes come before the text: " + review);
        assertEquals("  + 4: java.nio.file.Files.delete(java.nio.file.Path.of(\"x\"));", review.get(changed + 1));
        assertTrue(review.get(review.size() - 1).startsWith("Do more than calculate: line 4 (files)"), "and again by the question: " + review);
        List<String> none = new ArrayList<>(TrustReview.changes(v1, v1));
        assertEquals(List.of(), none);
    }
}
