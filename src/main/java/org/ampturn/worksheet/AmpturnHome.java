package org.ampturn.worksheet;

import java.nio.file.Path;

/**
 * Where Ampturn keeps per-user state: the trust store ({@code trusted}) and session journals
 * ({@code journal/}). {@code ~/.ampturn} unless the system property {@code ampturn.home} names
 * another directory (tests and portable installs use it).
 */
public final class AmpturnHome {
    private AmpturnHome() {}

    /** The name of the system property that moves the state directory. */
    public static final String PROPERTY = "ampturn.home";

    public static Path dir() {
        String p = System.getProperty(PROPERTY);
        if (p != null && !p.isBlank()) return Path.of(p);
        return Path.of(System.getProperty("user.home"), ".ampturn");
    }

    public static Path trustStore() {
        return dir().resolve("trusted");
    }

    public static Path journals() {
        return dir().resolve("journal");
    }
}
