package org.ampturn.field;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.concurrent.CancellationException;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;

/**
 * A force-stroke-current map of one part and one winding: flux linkage λ(i, x) and axial force
 * F(i, x) toward closing (Maxwell stress) at each stroke position x (the part moved by x along the
 * closing direction) and each current i. Positions are solved in parallel on a pool of daemon
 * threads, one position per task and its currents in turn; an interrupt (Ctrl-C) stops the pool and
 * keeps the positions already done ({@link #isComplete()} tells). Immutable.
 */
public final class FieldMap {
    private final Geometry geometry;
    private final String part;
    private final String winding;
    private final double travel;   // signed: the part closes toward +z when positive
    private final double[] x;      // 0 .. |travel|
    private final double[] amps;   // ascending, from 0
    private final double[][] lambda; // [position][current], null row when not done
    private final double[][] force;
    private final int newtonMax;

    private FieldMap(Geometry geometry, String part, String winding, double travel, double[] x, double[] amps,
                     double[][] lambda, double[][] force, int newtonMax) {
        this.geometry = geometry;
        this.part = part;
        this.winding = winding;
        this.travel = travel;
        this.x = x;
        this.amps = amps;
        this.lambda = lambda;
        this.force = force;
        this.newtonMax = newtonMax;
    }

    /**
     * Map part {@code part} over {@code positions} evenly spaced positions from 0 to {@code travel}
     * (signed: positive when the part closes toward +z) and the given currents of winding
     * {@code winding} (0 is added; currents must be zero or more), on {@code threads} threads.
     */
    public static FieldMap of(Geometry geometry, String part, String winding, Quantity travel, int positions, double[] currents,
                              int threads, MapProgress progress) {
        Require.present("geometry", geometry);
        double t = Require.si("travel", travel, Dimension.LENGTH);
        if (!(Math.abs(t) >= Require.MIN_LENGTH)) throw Require.fail("travel must not be zero, got " + travel);
        Require.between("positions", positions, 3, 200);
        Require.between("threads", threads, 1, 256);
        Require.present("progress listener", progress);
        if (!geometry.region(winding).isWinding()) throw Require.fail("region " + Require.quote(winding) + " is not a winding");
        if (geometry.region(part).isWinding()) throw Require.fail("region " + Require.quote(part) + " is a winding; map a part of iron");
        Require.present("currents", currents);
        double[] amps = currentsFrom(currents);
        double[] x = new double[positions];
        for (int k = 0; k < positions; k++) x[k] = Math.abs(t) * k / (positions - 1);
        // every position must be reachable without overlap: check before starting
        for (double xk : new double[] {x[0], x[positions - 1]}) geometry.movedAt(part, Math.signum(t) * xk);
        double[][] lambda = new double[positions][], force = new double[positions][];
        int[] newton = new int[1];
        int total = positions * amps.length;
        AtomicInteger done = new AtomicInteger();
        ExecutorService pool = Executors.newFixedThreadPool(threads, r -> {
            Thread th = new Thread(r, "ampturn-field-map");
            th.setDaemon(true);
            return th;
        });
        int part0 = geometry.indexOf(part), wind = windingIndex(geometry, winding);
        List<Future<?>> futures = new ArrayList<>();
        for (int k = 0; k < positions; k++) {
            final int kk = k;
            futures.add(pool.submit(() -> {
                Geometry g = geometry.movedAt(part, Math.signum(t) * x[kk]);
                Fem.Model model = new Fem.Model(g.mesh());
                double[] l = new double[amps.length], f = new double[amps.length];
                int most = 0;
                double[] last = null;
                for (int j = 0; j < amps.length; j++) {
                    if (Thread.interrupted()) throw new CancellationException("field map stopped");
                    // one mesh and model per position; each current starts from the last solution scaled
                    model.amps[wind] = amps[j];
                    double[] start = null;
                    if (last != null && amps[j - 1] > 0) {
                        start = last.clone();
                        for (int n = 0; n < start.length; n++) start[n] *= amps[j] / amps[j - 1];
                    }
                    Solution s = model.run(start);
                    last = s.potential();
                    l[j] = s.fluxLinkageAt(wind);
                    f[j] = Math.signum(t) * s.maxwellForceAt(part0);
                    most = Math.max(most, s.iterations());
                    int d = done.incrementAndGet();
                    synchronized (progress) { progress.solved(d, total); }
                }
                synchronized (lambda) {
                    lambda[kk] = l;
                    force[kk] = f;
                    newton[0] = Math.max(newton[0], most);
                }
                return null;
            }));
        }
        pool.shutdown();
        boolean stopped = false;
        try {
            for (Future<?> fu : futures) fu.get();
        } catch (InterruptedException e) {
            stopped = true;
            pool.shutdownNow();
            // let the workers see the stop and finish storing a position already solved
            try {
                pool.awaitTermination(30, java.util.concurrent.TimeUnit.SECONDS);
            } catch (InterruptedException again) {
                // stopped twice: keep what is stored now
            }
            Thread.currentThread().interrupt();
        } catch (ExecutionException e) {
            pool.shutdownNow();
            Throwable c = e.getCause();
            if (c instanceof RuntimeException re) throw re;
            throw Require.fail("field map failed: " + c, c);
        }
        synchronized (lambda) {
            double[][] lc = new double[positions][], fc = new double[positions][];
            for (int k = 0; k < positions; k++) {
                lc[k] = lambda[k] == null ? null : lambda[k].clone();
                fc[k] = force[k] == null ? null : force[k].clone();
            }
            FieldMap m = new FieldMap(geometry, part, winding, t, x, amps, lc, fc, newton[0]);
            if (stopped) progress.solved(done.get(), total);
            return m;
        }
    }

    private static int windingIndex(Geometry g, String name) {
        int k = g.indexOf(name), w = 0;
        for (int i = 0; i < k; i++) if (g.regions().get(i).isWinding()) w++;
        return w;
    }

    private static double[] currentsFrom(double[] currents) {
        double[] a = new double[currents.length + 1];
        for (int j = 0; j < currents.length; j++) a[j + 1] = Require.between("current[" + j + "] (A)", currents[j], 0, 1e6);
        Arrays.sort(a);
        double[] out = Arrays.stream(a).distinct().toArray();
        if (out.length < 3) throw Require.fail("a field map needs at least two currents above zero, got " + Arrays.toString(currents));
        return out;
    }

    /** True when every position was solved (false after a stop). */
    public boolean isComplete() {
        for (double[] l : lambda) if (l == null) return false;
        return true;
    }

    /** Positions solved. */
    public int positionsDone() {
        int n = 0;
        for (double[] l : lambda) if (l != null) n++;
        return n;
    }

    public String part() { return part; }
    public String winding() { return winding; }
    public Geometry geometry() { return geometry; }
    /** Travel from open to closed (positive). */
    public Quantity stroke() { return Quantity.of(Math.abs(travel), Dimension.LENGTH); }
    double strokeAt() { return Math.abs(travel); }
    /** Most Newton steps any solve of the map took. */
    public int newtonSteps() { return newtonMax; }
    /** Stroke positions (m), from open. */
    public double[] positions() { return x.clone(); }
    /** Currents (A), from 0. */
    public double[] currents() { return amps.clone(); }

    /** Flux linkage (Wb) at current index j and position index k; NaN where not solved. */
    public double fluxLinkageAt(int j, int k) {
        return lambda[k] == null ? Double.NaN : lambda[k][j];
    }

    /** Force toward closing (N, Maxwell stress) at current index j and position index k; NaN where not solved. */
    public double forceAt(int j, int k) {
        return force[k] == null ? Double.NaN : force[k][j];
    }

    double[][] lambdaTable() {
        if (!isComplete()) throw Require.fail("the field map of " + Require.quote(part) + " was stopped after " + positionsDone() + " of " + x.length + " positions; make it again to use it");
        double[][] out = new double[x.length][];
        for (int k = 0; k < x.length; k++) out[k] = lambda[k].clone();
        return out;
    }

    /**
     * The map as an armature a drive integrates, with the mechanical side (spring, load, mass,
     * damping, coil resistance and temperature) of {@code mechanics}, e.g. a lumped
     * {@code Plunger} of the same stroke.
     */
    public FieldArmature armature(org.ampturn.drive.Armature mechanics) {
        return FieldArmature.of(this, mechanics);
    }

    @Override
    public String toString() {
        return "field map of " + part + " over " + stroke() + " in " + x.length + " positions × " + amps.length + " currents to "
                + Quantity.of(amps[amps.length - 1], Dimension.CURRENT) + (isComplete() ? "" : ", stopped after " + positionsDone() + " positions")
                + ", at most " + newtonMax + " Newton steps";
    }
}
