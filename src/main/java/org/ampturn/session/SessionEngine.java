package org.ampturn.session;

import java.io.ByteArrayOutputStream;
import java.io.DataOutputStream;
import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import jdk.jshell.execution.LocalExecutionControl;
import jdk.jshell.spi.ExecutionControl;
import jdk.jshell.spi.ExecutionControl.ClassBytecodes;
import jdk.jshell.spi.ExecutionControlProvider;
import jdk.jshell.spi.ExecutionEnv;

/**
 * The in-process execution engine of a {@link Session}: the JDK's local engine, plus a guard that
 * keeps a snippet from ending the console.
 *
 * <p>The guard works on the snippet's class files before they are loaded: every constant-pool
 * reference to {@code System.exit(int)}, {@code Runtime.exit(int)} or {@code Runtime.halt(int)} is
 * renamed to a method that does not exist ({@value #BLOCKED}). The class loads, and the call fails
 * only if it is reached, with a {@link NoSuchMethodError} that {@link Session} turns into a plain
 * message. This covers direct calls, calls inside snippet methods and method references such as
 * {@code System::exit}. It does not cover reflection or a call made inside a library jar; the
 * library itself never exits.
 */
final class SessionEngine implements ExecutionControlProvider {
    static final String BLOCKED = "exit$blockedInWorksheet";

    @Override
    public String name() {
        return "ampturn-local";
    }

    @Override
    public Map<String, String> defaultParameters() {
        return Map.of();
    }

    private volatile Guarded engine;

    @Override
    public ExecutionControl generate(ExecutionEnv env, Map<String, String> parameters) {
        Guarded g = new Guarded();
        engine = g;
        return g;
    }

    /**
     * The object a variable of the snippet that ran last holds (an expression's value is held in
     * one too), or null when there is none or it cannot be read. The session keeps it beside the
     * value's text, so what is made of a result (the report's cautions) reads the object itself.
     */
    Object lastValue(String variable) {
        Guarded g = engine;
        return g == null ? null : g.value(variable);
    }

    /**
     * The object a session variable holds, read from the class the engine keeps it in; null when it
     * cannot be read. {@code held[0]} says whether the object's class was made by the session itself
     * (a lambda or an instance of a class an entry declared), which a renewed session could not use.
     */
    Object objectOf(jdk.jshell.JShell shell, jdk.jshell.VarSnippet v, boolean[] held) {
        Guarded g = engine;
        if (g == null) return null;
        shell.varValue(v); // the engine learns the class that holds the variable
        return g.held(v.name(), held);
    }

    /** The local engine with the exit guard applied to every class it loads. */
    static final class Guarded extends LocalExecutionControl {
        private volatile String lastClass;
        private volatile String lastVarClass;

        @Override
        public String varValue(String className, String varName) throws RunException, EngineTerminationException, InternalException {
            lastVarClass = className;
            return super.varValue(className, varName);
        }

        /** The object in {@code variable} of the class the last {@link #varValue} read from. */
        Object held(String variable, boolean[] sessionMade) {
            String c = lastVarClass;
            if (c == null) throw new IllegalStateException("no variable was read");
            try {
                Class<?> k = findClass(c);
                java.lang.reflect.Field f = k.getDeclaredField(variable);
                f.setAccessible(true);
                Object o = f.get(null);
                sessionMade[0] = madeBy(o, k.getClassLoader());
                return o;
            } catch (ReflectiveOperationException e) {
                throw new IllegalStateException(e);
            }
        }

        /** True when the object, or an element of an array, collection or map it is, has a class the session's loader made. */
        private static boolean madeBy(Object o, ClassLoader session) {
            if (o == null) return false;
            if (o.getClass().getClassLoader() == session) return true;
            if (o instanceof Object[] a) {
                for (Object e : a) if (e != null && e.getClass().getClassLoader() == session) return true;
            } else if (o instanceof java.util.Collection<?> c) {
                for (Object e : c) if (e != null && e.getClass().getClassLoader() == session) return true;
            } else if (o instanceof Map<?, ?> m) {
                for (Map.Entry<?, ?> e : m.entrySet()) {
                    if (e.getKey() != null && e.getKey().getClass().getClassLoader() == session) return true;
                    if (e.getValue() != null && e.getValue().getClass().getClassLoader() == session) return true;
                }
            }
            return false;
        }

        @Override
        public String invoke(String className, String methodName) throws RunException, EngineTerminationException, InternalException {
            lastClass = className;
            return super.invoke(className, methodName);
        }

        Object value(String variable) {
            String c = lastClass;
            if (c == null) return null;
            try {
                java.lang.reflect.Field f = findClass(c).getDeclaredField(variable);
                f.setAccessible(true);
                return f.get(null);
            } catch (ReflectiveOperationException | RuntimeException | LinkageError e) {
                return null;
            }
        }

        @Override
        public void load(ClassBytecodes[] cbcs) throws ClassInstallException, NotImplementedException, EngineTerminationException {
            super.load(guardAll(cbcs));
        }

        @Override
        public void redefine(ClassBytecodes[] cbcs) throws ClassInstallException, NotImplementedException, EngineTerminationException {
            super.redefine(guardAll(cbcs));
        }
    }

    private static ClassBytecodes[] guardAll(ClassBytecodes[] cbcs) {
        ClassBytecodes[] out = new ClassBytecodes[cbcs.length];
        for (int i = 0; i < cbcs.length; i++) {
            out[i] = new ClassBytecodes(cbcs[i].name(), guard(cbcs[i].bytecodes()));
        }
        return out;
    }

    /**
     * Returns the class file with calls that would end the JVM redirected to a missing method, or
     * the same array when it has none. Only the constant pool is touched: a new name and a new
     * name-and-type entry are appended, and the offending method references point at them.
     */
    static byte[] guard(byte[] classFile) {
        try {
            return rewrite(classFile);
        } catch (RuntimeException e) {
            return classFile; // a class file we cannot read is left to the JVM's own verifier
        }
    }

    private static byte[] rewrite(byte[] b) {
        ByteBuffer in = ByteBuffer.wrap(b);
        if (in.getInt() != 0xCAFEBABE) return b;
        in.getShort();
        in.getShort();
        int count = in.getShort() & 0xFFFF;
        int[] tag = new int[count];
        int[] offset = new int[count]; // offset of the entry's data, after the tag
        String[] utf8 = new String[count];
        for (int i = 1; i < count; i++) {
            tag[i] = in.get() & 0xFF;
            offset[i] = in.position();
            switch (tag[i]) {
                case 1: {
                    int len = in.getShort() & 0xFFFF;
                    utf8[i] = new String(b, in.position(), len, StandardCharsets.UTF_8); // modified UTF-8; fine for names
                    in.position(in.position() + len);
                    break;
                }
                case 3: case 4: case 9: case 10: case 11: case 12: case 17: case 18:
                    in.position(in.position() + 4);
                    break;
                case 5: case 6:
                    in.position(in.position() + 8);
                    i++;
                    break;
                case 7: case 8: case 16: case 19: case 20:
                    in.position(in.position() + 2);
                    break;
                case 15:
                    in.position(in.position() + 3);
                    break;
                default:
                    throw new IllegalArgumentException("unknown constant tag " + tag[i]);
            }
        }
        int poolEnd = in.position();
        List<Integer> hits = new ArrayList<>();
        for (int i = 1; i < count; i++) {
            if (tag[i] != 10) continue;
            int cls = u2(b, offset[i]);
            int nat = u2(b, offset[i] + 2);
            String owner = utf8[u2(b, offset[cls])];
            String name = utf8[u2(b, offset[nat])];
            String desc = utf8[u2(b, offset[nat] + 2)];
            boolean ends = "(I)V".equals(desc)
                    && (("java/lang/System".equals(owner) && "exit".equals(name))
                        || ("java/lang/Runtime".equals(owner) && ("exit".equals(name) || "halt".equals(name))));
            if (ends) hits.add(i);
        }
        if (hits.isEmpty()) return b;
        try {
            ByteArrayOutputStream bytes = new ByteArrayOutputStream(b.length + 64);
            DataOutputStream out = new DataOutputStream(bytes);
            out.write(b, 0, 8);
            int nameIndex = count;
            int natIndex = count + 1;
            out.writeShort(count + 2);
            byte[] pool = java.util.Arrays.copyOfRange(b, 10, poolEnd);
            for (int i : hits) {
                // point the method ref at the new name-and-type; the descriptor stays, so the
                // stack shape (static or virtual) is unchanged and the class still verifies
                int at = offset[i] + 2 - 10;
                pool[at] = (byte) (natIndex >> 8);
                pool[at + 1] = (byte) natIndex;
            }
            out.write(pool);
            out.writeByte(1);
            out.writeUTF(BLOCKED);
            out.writeByte(12);
            out.writeShort(nameIndex);
            out.writeShort(descriptorIndex(b, offset, hits.get(0))); // all hits share "(I)V"
            out.write(b, poolEnd, b.length - poolEnd);
            out.flush();
            return bytes.toByteArray();
        } catch (IOException e) {
            throw new IllegalStateException(e);
        }
    }

    private static int descriptorIndex(byte[] b, int[] offset, int methodRef) {
        int nat = u2(b, offset[methodRef] + 2);
        return u2(b, offset[nat] + 2);
    }

    private static int u2(byte[] b, int at) {
        return ((b[at] & 0xFF) << 8) | (b[at + 1] & 0xFF);
    }
}
