package org.ampturn.worksheet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Trust by content hash; demo worksheets are trusted as shipped. */
class TrustStoreTest {
    @TempDir
    Path dir;

    @Test
    void hashIsSha256() {
        // FIPS 180-2, appendix B.1: SHA-256("abc")
        assertEquals("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad",
                TrustStore.hash("abc".getBytes(StandardCharsets.US_ASCII)));
    }

    @Test
    void trustedContentOnlyWhileUnchanged() throws Exception {
        TrustStore t = TrustStore.of(dir.resolve("home/trusted"), null);
        Path f = dir.resolve("w.atw");
        byte[] content = "// ampturn worksheet 1\n\n1 + 1\n".getBytes(StandardCharsets.UTF_8);
        Files.write(f, content);
        assertFalse(t.isTrusted(f, content));
        t.trust(f, content);
        assertTrue(t.isTrusted(f, content));
        assertTrue(TrustStore.of(dir.resolve("home/trusted"), null).isTrusted(f, content), "the store persists");
        byte[] edited = "// ampturn worksheet 1\n\nSystem.exit(1)\n".getBytes(StandardCharsets.UTF_8);
        assertFalse(t.isTrusted(f, edited), "an edited file needs trusting again");
        t.trust(f, content);
        assertEquals(1, Files.readAllLines(t.location()).size(), "trusting twice adds one line");
    }

    @Test
    void demoDirectoryIsTrusted() throws Exception {
        Path demos = Files.createDirectories(dir.resolve("tool/worksheets"));
        Path demo = demos.resolve("gate.atw");
        Files.writeString(demo, "// ampturn worksheet 1\n");
        Path other = dir.resolve("gate.atw");
        Files.writeString(other, "// ampturn worksheet 1\n");
        TrustStore t = TrustStore.of(dir.resolve("trusted"), demos);
        assertTrue(t.isTrusted(demo, Files.readAllBytes(demo)));
        assertFalse(t.isTrusted(other, Files.readAllBytes(other)), "same content outside the demo directory");
    }

    @Test
    void homeFollowsTheSystemProperty() {
        String old = System.getProperty(AmpturnHome.PROPERTY);
        try {
            System.setProperty(AmpturnHome.PROPERTY, dir.toString());
            assertEquals(dir.resolve("trusted"), AmpturnHome.trustStore());
            assertEquals(dir.resolve("trusted"), TrustStore.user().location());
        } finally {
            if (old == null) System.clearProperty(AmpturnHome.PROPERTY);
            else System.setProperty(AmpturnHome.PROPERTY, old);
        }
    }
}
