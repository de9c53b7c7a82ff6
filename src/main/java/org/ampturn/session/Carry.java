package org.ampturn.session;

import java.util.HashMap;
import java.util.Map;

/**
 * Values handed from a session's old engine to its renewed one: the renewed session declares each
 * variable as {@code TYPE name = (TYPE) org.ampturn.session.Carry.take("name");}. Public only so that
 * the entries the session compiles can reach it; not part of the library.
 */
public final class Carry {
    private static final Map<String, Object> VALUES = new HashMap<>();

    private Carry() {}

    static synchronized void put(Map<String, Object> values) {
        VALUES.clear();
        VALUES.putAll(values);
    }

    /** The value carried for {@code name}, once. */
    public static synchronized Object take(String name) {
        if (!VALUES.containsKey(name)) throw new IllegalStateException("nothing carried for " + name);
        return VALUES.remove(name);
    }

    static synchronized void clear() {
        VALUES.clear();
    }
}
