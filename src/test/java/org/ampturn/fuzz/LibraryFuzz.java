package org.ampturn.fuzz;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.lang.reflect.Array;
import java.lang.reflect.InvocationTargetException;
import java.lang.reflect.Method;
import java.lang.reflect.Modifier;
import java.lang.reflect.ParameterizedType;
import java.lang.reflect.Proxy;
import java.lang.reflect.Type;
import java.net.URISyntaxException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collection;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import java.util.stream.Stream;
import org.ampturn.Ampturn;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;
import org.ampturn.units.Unit;

/**
 * Seeded fuzzing of the library's public surface, called directly (no console). Library calls:
 * every public method of the domain packages and the facade's unit and study helpers, with
 * arguments drawn from a pool of ordinary and hostile values (NaN, infinities, zero, negatives,
 * 1e±300, null, quantities of the wrong kind, huge counts) and receivers drawn from a pool of valid
 * objects that grows with what the calls return. Parser strings: numbers, units, operators,
 * brackets, superscripts and noise run through {@link Quantity#parse} and {@link Unit#parse}.
 *
 * <p>Each case runs on a worker thread with a time limit. A case is a fault when it hangs, returns
 * NaN or an infinity (a {@code double}, {@code Double} or {@link Quantity}) without an exception,
 * throws a raw JDK exception (one thrown from JDK code, any NullPointerException,
 * ClassCastException, index or number-format exception, or an Error such as StackOverflowError),
 * or gives a message that is several lines or whose headline is longer than about 120 characters.
 * A parsed quantity must also read back from its own {@code toString()}.
 *
 * <p>{@code main} runs the long fuzz for {@code bench/fuzz}; {@code LibraryFuzzTest} a short one.
 */
public final class LibraryFuzz {
    /** Counts of each outcome and the first examples of each fault. */
    public static final class Report {
        public long calls, normal, refused, hangs, nonFinite, raw, unclear, roundTrip, slow;
        public final Map<String, List<String>> examples = new LinkedHashMap<>();

        void example(String kind, String text) {
            List<String> l = examples.computeIfAbsent(kind, k -> new ArrayList<>());
            String method = text.indexOf('(') > 0 ? text.substring(0, text.indexOf('(')) : text;
            if (l.size() < 30 && l.stream().noneMatch(x -> x.startsWith(method + "("))) l.add(text);
        }

        public long faults() {
            return hangs + nonFinite + raw + unclear + roundTrip;
        }

        @Override
        public String toString() {
            StringBuilder sb = new StringBuilder();
            sb.append(String.format("%d calls: %d returned a value, %d refused with the library's message, %d took over 1 s; "
                    + "hangs %d, unexplained NaN/∞ %d, raw exceptions %d, unclear messages %d, round-trip failures %d%n",
                    calls, normal, refused, slow, hangs, nonFinite, raw, unclear, roundTrip));
            for (Map.Entry<String, List<String>> e : examples.entrySet()) {
                sb.append("  ").append(e.getKey()).append(":\n");
                for (String x : e.getValue()) sb.append("    ").append(x).append('\n');
            }
            return sb.toString();
        }
    }

    private static final String[] PACKAGES = {"units", "material", "wire", "coil", "drive", "actuator", "thermal", "study"};
    /** Method names never called: they write files, change global state or only describe the object. */
    private static final List<String> SKIP = List.of("save", "saveCsv", "setDisplayDigits", "install", "wait", "notify", "notifyAll",
            "getClass", "hashCode", "equals", "toString", "describe", "main", "compareTo");

    private final Random random;
    private final long timeoutMillis;
    private final List<Method> methods = new ArrayList<>();
    private final Map<Class<?>, List<Object>> pool = new HashMap<>();
    private ExecutorService worker = newWorker();

    public LibraryFuzz(long seed, long timeoutMillis) {
        this.random = new Random(seed);
        this.timeoutMillis = timeoutMillis;
        for (Class<?> c : libraryClasses()) {
            for (Method m : c.getMethods()) {
                if (m.getDeclaringClass() == Object.class || SKIP.contains(m.getName()) || m.isSynthetic()) continue;
                if (!Modifier.isPublic(m.getDeclaringClass().getModifiers())) continue;
                if (!supported(m)) continue;
                // an enum's valueOf(String) and values() are the JDK's, not the library's
                if (c.isEnum() && (m.getName().equals("valueOf") || m.getName().equals("values"))) continue;
                methods.add(m);
            }
        }
        List<Method> facade = new ArrayList<>(List.of(Ampturn.class.getMethods()));
        facade.sort((a, b) -> a.toString().compareTo(b.toString()));
        for (Method m : facade) {
            if (!Modifier.isStatic(m.getModifiers()) || !supported(m)) continue;
            String pkg = m.getReturnType().getPackageName();
            boolean domain = m.getReturnType().isPrimitive() || m.getReturnType() == Quantity.class
                    || Stream.of(PACKAGES).anyMatch(p -> pkg.equals("org.ampturn." + p));
            if (domain && !m.getName().startsWith("plot") && !m.getName().startsWith("save")) methods.add(m);
        }
        // the JVM lists methods in no fixed order: sort them, so that a seed gives the same cases
        methods.sort((a, b) -> (a.getDeclaringClass().getName() + a).compareTo(b.getDeclaringClass().getName() + b));
        seedPool();
    }

    /** The number of distinct methods the library fuzz calls. */
    public int methodCount() {
        return methods.size();
    }

    private static ExecutorService newWorker() {
        return Executors.newSingleThreadExecutor(r -> {
            Thread t = new Thread(r, "fuzz-case");
            t.setDaemon(true);
            return t;
        });
    }

    private static List<Class<?>> libraryClasses() {
        List<Class<?>> out = new ArrayList<>();
        try {
            Path root = Path.of(Quantity.class.getProtectionDomain().getCodeSource().getLocation().toURI());
            for (String p : PACKAGES) {
                Path dir = root.resolve("org/ampturn/" + p);
                try (Stream<Path> files = Files.list(dir)) {
                    for (Path f : (Iterable<Path>) files.sorted()::iterator) {
                        String n = f.getFileName().toString();
                        if (!n.endsWith(".class") || n.contains("$") || n.equals("package-info.class")) continue;
                        Class<?> c = Class.forName("org.ampturn." + p + "." + n.substring(0, n.length() - 6));
                        if (Modifier.isPublic(c.getModifiers())) out.add(c);
                    }
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } catch (URISyntaxException | ClassNotFoundException e) {
            throw new IllegalStateException(e);
        }
        return out;
    }

    private static boolean supported(Method m) {
        for (Class<?> p : m.getParameterTypes()) {
            if (p == Object.class || p == Class.class || p == Path.class || p == Runnable.class) return false;
            // int[] is the cursor of the magnetic circuit's internal walk (MagneticCircuit.fluxDensities), not a user's argument
            if (p == int[].class) return false;
        }
        return true;
    }

    // ---- the pool of valid objects ------------------------------------------------------------

    private void seedPool() {
        // objects built through the same public calls the fuzz makes, with ordinary arguments
        add(org.ampturn.coil.Solenoid.singleLayer(200, Ampturn.mm(30), Ampturn.mm(12)));
        add(org.ampturn.coil.Solenoid.singleLayer(50, Ampturn.mm(10), Ampturn.mm(20)).withWire(Ampturn.mm(0.15)));
        add(org.ampturn.wire.Wire.awg(24));
        add(org.ampturn.wire.Wire.metric(Ampturn.mm(0.5)));
        add(org.ampturn.coil.Coil.lumped(Ampturn.mH(10), Ampturn.ohm(5)));
        add(org.ampturn.drive.Drive.dc(Ampturn.V(12)));
        add(org.ampturn.drive.Drive.pwm(Ampturn.V(12), Ampturn.kHz(20), 0.5));
        add(org.ampturn.drive.Drive.peakAndHold(Ampturn.V(24), Ampturn.A(2), Ampturn.A(0.5)));
        add(org.ampturn.drive.Clamp.diode());
        add(org.ampturn.drive.Clamp.zener(Ampturn.V(30)));
        add(org.ampturn.coil.Multilayer.of(20, 5, Ampturn.mm(10), Ampturn.mm(20), Ampturn.mm(15)));
        add(org.ampturn.coil.Toroid.rectangular(50, Ampturn.mm(20), Ampturn.mm(40), Ampturn.mm(10), 2000));
        add(org.ampturn.material.Conductor.COPPER);
        add(org.ampturn.drive.Drive.dc(Ampturn.V(12)).into(org.ampturn.coil.Coil.lumped(Ampturn.mH(10), Ampturn.ohm(5))));
        add(org.ampturn.drive.Drive.dc(Ampturn.V(12)).into(org.ampturn.coil.Coil.lumped(Ampturn.mH(10), Ampturn.ohm(5)))
                .offAt(Ampturn.ms(20), org.ampturn.drive.Clamp.diode()).simulate(Ampturn.ms(40)));
        add(Ampturn.sweep("n", 1, 5, 5, n -> Ampturn.mm(n)));
    }

    private void add(Object o) {
        if (o == null) return;
        for (Class<?> c = o.getClass(); c != null && c != Object.class; c = c.getSuperclass()) {
            addAs(c, o);
            for (Class<?> i : c.getInterfaces()) addAs(i, o);
        }
    }

    private void addAs(Class<?> c, Object o) {
        if (!c.getName().startsWith("org.ampturn.")) return;
        List<Object> l = pool.computeIfAbsent(c, k -> new ArrayList<>());
        if (l.size() < 40) l.add(o);
        else l.set(random.nextInt(l.size()), o);
    }

    // ---- arguments ----------------------------------------------------------------------------

    private static final double[] DOUBLES = {Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY, 0, -0.0, -1, 1, 0.5, 2,
        12, 100, 1e-3, 1e-6, 1e-9, 1e-12, 1e-300, -1e-300, 1e200, 1e300, -1e200, Double.MIN_VALUE, Double.MAX_VALUE, 1e6, 1e9};
    private static final int[] INTS = {0, -1, 1, 2, 3, 10, 100, 1000, 100_000, Integer.MAX_VALUE, Integer.MIN_VALUE, 1_000_000_000};
    private static final Dimension[] DIMENSIONS = {Dimension.LENGTH, Dimension.LENGTH, Dimension.LENGTH, Dimension.CURRENT,
        Dimension.VOLTAGE, Dimension.TIME, Dimension.TEMPERATURE, Dimension.RESISTANCE, Dimension.INDUCTANCE, Dimension.FREQUENCY,
        Dimension.AREA, Dimension.FLUX_DENSITY, Dimension.FIELD_STRENGTH, Dimension.POWER, Dimension.CAPACITANCE, Dimension.NONE,
        Dimension.FORCE, Dimension.MASS, Dimension.STIFFNESS, Dimension.RESISTIVITY, Dimension.DENSITY, Dimension.PER_KELVIN};
    private static final String[] STRINGS = {"", " ", "x", "turns", "L >= 1 mH", "4.7 mH", "loss", "V", "n", "gap < 2 mm", "24", "5/0",
        "copper", "abc(", "#", "x".repeat(2000), "a\nb", "μ", "result"};

    private double aDouble() {
        if (random.nextInt(3) == 0) return Math.exp((random.nextDouble() - 0.5) * 40) * (random.nextBoolean() ? 1 : -0.1);
        return DOUBLES[random.nextInt(DOUBLES.length)];
    }

    private int anInt() {
        if (random.nextInt(3) == 0) return random.nextInt(2000) - 10;
        return INTS[random.nextInt(INTS.length)];
    }

    private Quantity aQuantity() {
        if (random.nextInt(25) == 0) return null;
        Dimension d = DIMENSIONS[random.nextInt(DIMENSIONS.length)];
        double v = aDouble();
        if (d == Dimension.TEMPERATURE && random.nextBoolean()) return Quantity.temperatureKelvin(random.nextBoolean() ? 293.15 + 100 * random.nextDouble() : v);
        if (random.nextInt(3) == 0) {
            // an ordinary magnitude for the kind, so that calls get past their first check
            double[] typical = {0.01, 1, 12, 1e-3, 0.5, 100, 1e-6};
            v = typical[random.nextInt(typical.length)];
        }
        return Quantity.of(v, d);
    }

    private Object argument(Class<?> type, Type generic) {
        if (type == double.class || type == Double.class) return aDouble();
        if (type == int.class || type == Integer.class) return anInt();
        if (type == long.class || type == Long.class) return (long) anInt() * (random.nextInt(4) == 0 ? 1_000_000L : 1);
        if (type == boolean.class || type == Boolean.class) return random.nextBoolean();
        if (type == float.class) return (float) aDouble();
        if (type == short.class) return (short) anInt();
        if (type == byte.class) return (byte) anInt();
        if (type == char.class) return (char) ('a' + random.nextInt(26));
        if (random.nextInt(30) == 0) return null;
        if (type == Quantity.class) return aQuantity();
        if (type == Dimension.class) return DIMENSIONS[random.nextInt(DIMENSIONS.length)];
        if (type == String.class) return STRINGS[random.nextInt(STRINGS.length)];
        if (type == Number.class) return random.nextBoolean() ? (Object) anInt() : (Object) aDouble();
        if (type.isEnum()) {
            Object[] cs = type.getEnumConstants();
            return cs[random.nextInt(cs.length)];
        }
        if (type.isArray()) {
            int n = random.nextInt(5);
            Object a = Array.newInstance(type.getComponentType(), n);
            for (int i = 0; i < n; i++) {
                Object x = argument(type.getComponentType(), type.getComponentType());
                if (x == null && type.getComponentType().isPrimitive()) continue;
                Array.set(a, i, x);
            }
            return a;
        }
        if (List.class.isAssignableFrom(type) || Collection.class.isAssignableFrom(type)) {
            Class<?> element = Object.class;
            if (generic instanceof ParameterizedType) {
                Type t = ((ParameterizedType) generic).getActualTypeArguments()[0];
                if (t instanceof Class) element = (Class<?>) t;
                else if (t instanceof ParameterizedType) element = (Class<?>) ((ParameterizedType) t).getRawType();
            }
            int n = random.nextInt(5);
            List<Object> l = new ArrayList<>();
            for (int i = 0; i < n; i++) l.add(element == Object.class ? aQuantity() : argument(element, element));
            return l;
        }
        if (type.isInterface() && type.getName().startsWith("java.util.function")) return function(type);
        List<Object> l = pool.get(type);
        if (l == null || l.isEmpty()) return null;
        return l.get(random.nextInt(l.size()));
    }

    /** A user function for a study: gives back its argument (as a double where a double is due). */
    private Object function(Class<?> type) {
        return Proxy.newProxyInstance(type.getClassLoader(), new Class<?>[] {type}, (proxy, m, args) -> {
            if (m.getDeclaringClass() == Object.class) {
                if (m.getName().equals("toString")) return "f";
                if (m.getName().equals("hashCode")) return 0;
                return proxy == args[0];
            }
            Object a = args == null || args.length == 0 ? null : args[0];
            Class<?> r = m.getReturnType();
            if (r == double.class) return a instanceof Number ? ((Number) a).doubleValue() : a instanceof Quantity ? ((Quantity) a).si() : 1.0;
            if (r == int.class) return a instanceof Number ? ((Number) a).intValue() : 1;
            if (r == long.class) return a instanceof Number ? ((Number) a).longValue() : 1L;
            if (r == boolean.class) return true;
            if (r == void.class) return null;
            if (a instanceof Double) return Quantity.number((Double) a);
            return a;
        });
    }

    // ---- running cases ------------------------------------------------------------------------

    /** {@code n} random library calls. */
    public void libraryCalls(int n, Report report) {
        long end = report.calls + n;
        while (report.calls < end) {
            Method m = methods.get(random.nextInt(methods.size()));
            Object receiver = null;
            if (!Modifier.isStatic(m.getModifiers())) {
                List<Object> l = pool.get(m.getDeclaringClass());
                if (l == null || l.isEmpty()) continue; // no object of that class made yet
                receiver = l.get(random.nextInt(l.size()));
            }
            Class<?>[] types = m.getParameterTypes();
            Type[] generics = m.getGenericParameterTypes();
            Object[] args = new Object[types.length];
            for (int k = 0; k < types.length; k++) args[k] = argument(types[k], generics[k]);
            Object r = receiver;
            String what = describe(m, receiver, args);
            boolean mayBeNaN = documentedNaN(m);
            run(report, what, () -> {
                Object x;
                try {
                    x = m.invoke(r, args);
                } catch (InvocationTargetException e) {
                    throw e.getCause();
                }
                return mayBeNaN && isNonFinite(x) ? "NaN: does not apply" : x;
            }, true);
        }
    }

    /** {@code n} random strings through the quantity and unit parsers. */
    public void parserStrings(int n, Report report) {
        for (int i = 0; i < n; i++) {
            String s = ParserText.random(random);
            run(report, "q(" + clip(s) + ")", () -> {
                Quantity q = Quantity.parse(s);
                Quantity back;
                try {
                    back = Quantity.parse(q.toString());
                } catch (IllegalArgumentException e) {
                    throw new RoundTrip(q + " does not read back: " + e.getMessage());
                }
                // to the digits shown: the text read back prints as the same text
                if (!back.dimension().equals(q.dimension()) || !back.toString().equals(q.toString())) {
                    throw new RoundTrip(q + " reads back as " + back);
                }
                return q;
            }, false);
            String u = ParserText.unitText(random);
            run(report, "Unit.parse(" + clip(u) + ")", () -> Unit.parse(u).factor(), false);
        }
    }

    /** A parsed quantity that did not read back from its own text. */
    static final class RoundTrip extends RuntimeException {
        private static final long serialVersionUID = 1L;

        RoundTrip(String m) {
            super(m);
        }
    }

    @FunctionalInterface
    interface Body {
        Object call() throws Throwable;
    }

    private void run(Report report, String what, Body body, boolean keep) {
        report.calls++;
        Future<Object> f = worker.submit(() -> {
            try {
                return body.call();
            } catch (Exception | Error e) {
                throw e;
            } catch (Throwable t) {
                throw new IllegalStateException(t);
            }
        });
        Object result;
        long t0 = System.nanoTime();
        try {
            result = f.get(timeoutMillis, TimeUnit.MILLISECONDS);
            long ms = (System.nanoTime() - t0) / 1_000_000;
            if (ms > 1000) {
                report.slow++;
                report.example("slow (over 1 s, not a fault)", what + ": " + ms + " ms");
            }
        } catch (TimeoutException e) {
            f.cancel(true);
            worker.shutdownNow();
            worker = newWorker();
            report.hangs++;
            report.example("hang (no result within " + timeoutMillis + " ms)", what);
            return;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("the fuzz was interrupted", e);
        } catch (ExecutionException e) {
            classify(report, what, e.getCause());
            return;
        }
        if (isNonFinite(result)) {
            report.nonFinite++;
            report.example("NaN or ∞ without a word", what + " = " + result);
            return;
        }
        report.normal++;
        if (keep && !isLargeStudy(result)) add(result);
    }

    /**
     * The figures of a transient that do not apply to a run (a drop-out time with no armature, a
     * ripple with no switching cycle) are NaN, as {@code Metrics} documents; they are shown as
     * absent, not as numbers.
     */
    private static boolean documentedNaN(Method m) {
        String c = m.getDeclaringClass().getSimpleName();
        // a limit's margin of a missing output (NaN) is NaN, as Limit documents; the studies read it as "not met"
        if (c.equals("Limit") && (m.getName().equals("marginAt") || m.getName().equals("relativeMarginAt"))) return true;
        if (c.equals("Metrics")) return true;
        // the longest on-time is ∞ when the steady state stays below the class (ThermalNetwork's documentation)
        if ((c.equals("ThermalNetwork") || c.equals("DutyCycle")) && m.getName().equals("longestOnTime")) return true;
        // a wire that does not fit, or could not settle, has no resistance, current or temperature (WireCandidate)
        if (c.equals("WireCandidate")) return true;
        // a failed row's numbers are NaN and the row carries its error (Row's documentation)
        if (c.equals("Row") && (m.getName().equals("get") || m.getName().equals("value"))) return true;
        // the kernels' wrappers check nothing by design (Quantity.of's documentation): NaN in, NaN out
        if (c.equals("Quantity") && List.of("of", "number", "temperatureKelvin").contains(m.getName())
                && m.getParameterTypes().length > 0 && m.getParameterTypes()[m.getParameterCount() - 1] != String.class) {
            return true;
        }
        return c.equals("Transient") && List.of("timeTo", "timeConstant", "timeTo63", "timeTo90", "timeTo99", "decayTime", "ripple", "cycleMean",
                "pullInCurrentTime", "pullInTime", "dropOutTime", "impactSpeed", "lastCycleRmsCurrent", "lastCyclePeakCurrent",
                "coreLossEnergy", "residualFluxLinkage", "residualForce").contains(m.getName());
    }

    /**
     * A result of many rows or samples stays out of the pool: the library checks each large result
     * against the memory left, but kept by the fuzz, a few of them would fill the heap for later calls.
     */
    private static boolean isLargeStudy(Object r) {
        return r instanceof org.ampturn.drive.Transient && ((org.ampturn.drive.Transient) r).current().size() > 100_000
                || r instanceof org.ampturn.drive.Signal && ((org.ampturn.drive.Signal) r).size() > 100_000
                || r instanceof org.ampturn.study.Table && ((org.ampturn.study.Table) r).size() > 10_000
                || r instanceof org.ampturn.study.MonteCarlo && ((org.ampturn.study.MonteCarlo) r).table().size() > 10_000
                || r instanceof org.ampturn.study.Corners && ((org.ampturn.study.Corners) r).table().size() > 10_000;
    }

    private static boolean isNonFinite(Object r) {
        if (r instanceof Double) return !Double.isFinite((Double) r);
        if (r instanceof Float) return !Float.isFinite((Float) r);
        if (r instanceof Quantity) return !Double.isFinite(((Quantity) r).si());
        return false;
    }

    private static void classify(Report report, String what, Throwable e) {
        if (e instanceof RoundTrip) {
            report.roundTrip++;
            report.example("round trip", what + ": " + e.getMessage());
            return;
        }
        if (isRaw(e)) {
            report.raw++;
            report.example("raw exception", what + " -> " + e + " at " + (e.getStackTrace().length > 0 ? e.getStackTrace()[0] : "?"));
            return;
        }
        String m = e.getMessage();
        if (!isClear(m)) {
            report.unclear++;
            report.example("unclear message", what + " -> " + (m == null ? "(no message)" : clip(m)));
            return;
        }
        report.refused++;
    }

    /** Thrown from JDK code, or of a kind that never carries the library's message. */
    static boolean isRaw(Throwable e) {
        if (e instanceof Error) return true;
        if (e instanceof NullPointerException || e instanceof ClassCastException || e instanceof ArrayIndexOutOfBoundsException
                || e instanceof StringIndexOutOfBoundsException || e instanceof NumberFormatException || e instanceof ArrayStoreException || e instanceof NegativeArraySizeException) {
            return true;
        }
        StackTraceElement[] st = e.getStackTrace();
        if (st.length == 0) return true;
        String top = st[0].getClassName();
        return !(top.startsWith("org.ampturn.") || top.startsWith("java.util.concurrent.CompletableFuture"));
    }

    /** One line, a headline (before the first ": " or "; ") of at most about 120 characters, and some text. */
    static boolean isClear(String m) {
        if (m == null || m.isBlank() || m.indexOf('\n') >= 0) return false;
        int a = m.indexOf(": "), b = m.indexOf("; ");
        int head = a < 0 ? (b < 0 ? m.length() : b) : (b < 0 ? a : Math.min(a, b));
        return head <= Require.HEADLINE + 20 && m.length() <= 4 * Require.HEADLINE;
    }

    private static String describe(Method m, Object receiver, Object[] args) {
        StringBuilder sb = new StringBuilder();
        sb.append(m.getDeclaringClass().getSimpleName()).append(receiver == null ? "." : "#").append(m.getName()).append('(');
        for (int i = 0; i < args.length; i++) {
            if (i > 0) sb.append(", ");
            Object a = args[i];
            String s;
            try {
                s = a == null ? "null" : a.getClass().isArray() ? a.getClass().getComponentType().getSimpleName() + "[" + Array.getLength(a) + "]"
                        : Proxy.isProxyClass(a.getClass()) ? "f" : String.valueOf(a);
            } catch (RuntimeException e) {
                s = a.getClass().getSimpleName();
            }
            sb.append(clip(s));
        }
        return sb.append(')').toString();
    }

    private static String clip(String s) {
        String t = s.replace('\n', '⏎');
        return t.length() <= 60 ? t : t.substring(0, 57) + "…";
    }

    public void close() {
        worker.shutdownNow();
    }

    /** The long fuzz of {@code bench/fuzz}: library calls, parser strings, seed, per-case limit in ms. */
    public static void main(String[] a) {
        int calls = a.length > 0 ? Integer.parseInt(a[0]) : 10_000;
        int strings = a.length > 1 ? Integer.parseInt(a[1]) : 100_000;
        long seed = a.length > 2 ? Long.parseLong(a[2]) : 20261202L;
        long limit = a.length > 3 ? Long.parseLong(a[3]) : 30_000;
        LibraryFuzz fuzz = new LibraryFuzz(seed, limit);
        long t0 = System.nanoTime();
        Report lib = new Report();
        fuzz.libraryCalls(calls, lib);
        long t1 = System.nanoTime();
        Report parse = new Report();
        fuzz.parserStrings(strings, parse);
        long t2 = System.nanoTime();
        fuzz.close();
        System.out.printf("seed %d, %d library methods, per-case limit %d ms%n", seed, fuzz.methodCount(), limit);
        System.out.printf("library calls (%.1f s): %s", (t1 - t0) / 1e9, lib);
        System.out.printf("parser strings, each through Quantity.parse and Unit.parse (%.1f s): %s", (t2 - t1) / 1e9, parse);
        System.out.printf("FUZZ SUMMARY hangs %d, unexplained NaN/∞ %d, raw exceptions %d, unclear messages %d, round-trip failures %d%n",
                lib.hangs + parse.hangs, lib.nonFinite + parse.nonFinite, lib.raw + parse.raw, lib.unclear + parse.unclear,
                lib.roundTrip + parse.roundTrip);
        System.exit(lib.faults() + parse.faults() == 0 ? 0 : 1);
    }
}
