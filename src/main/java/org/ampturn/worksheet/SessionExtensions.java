package org.ampturn.worksheet;

import java.util.ArrayList;
import java.util.List;
import java.util.ServiceLoader;

/** The {@link SessionExtension}s on the class path, loaded once, in class-path order. */
public final class SessionExtensions {
    private static volatile List<SessionExtension> all;

    private SessionExtensions() {}

    /** Every extension listed in {@code META-INF/services/org.ampturn.worksheet.SessionExtension}. */
    public static List<SessionExtension> all() {
        List<SessionExtension> a = all;
        if (a == null) {
            List<SessionExtension> found = new ArrayList<>();
            for (SessionExtension e : ServiceLoader.load(SessionExtension.class, SessionExtensions.class.getClassLoader())) found.add(e);
            all = a = List.copyOf(found);
        }
        return a;
    }
}
