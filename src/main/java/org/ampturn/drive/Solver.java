package org.ampturn.drive;

import org.ampturn.units.Require;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CancellationException;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;

/**
 * Runs one transient: walks the switching schedule segment by segment, hands each segment to a
 * stepper (closed form for linear pieces, adaptive Runge-Kutta otherwise), applies the event that
 * ended it, and records samples and metrics. Not thread-safe; one instance per run.
 *
 * <p>State vector: λ, snubber capacitor voltage, position, speed, then the running integrals of
 * supplied power, coil resistive loss, drive loss, clamp power, mechanical power and charge.
 */
final class Solver {
    static final int LAM = 0, VC = 1, X = 2, V = 3, ESUP = 4, ECOIL = 5, EDRV = 6, ECL = 7, EMECH = 8, Q = 9, DIM = 10;
    /** With an eddy ladder: the eddy-current loss integral, then the flux linkage λ_k of each loop. */
    static final int EEDDY = 10, LAD = 11;

    /** Electrical mode: switch closed, switch open with the clamp (or snubber) conducting, or nothing conducting. */
    enum Elec { ON, CLAMP, IDLE }

    /** Mechanical mode: moving, resting on the open stop, resting on the closed stop. */
    enum Mech { FREE, OPEN, CLOSED }

    // outputs of eval()
    static final int O_I = 0, O_VSW = 1, O_DLAM = 2, O_PSUP = 3, O_PCOIL = 4, O_PDRV = 5, O_PCL = 6, O_PMECH = 7,
            O_F = 8, O_DVC = 9, O_ACC = 10, O_PEDDY = 11, O_PCORE = 12, O_I2 = 13, O_DLAM2 = 14, O_PSEC = 15, O_PHYST = 16, O_N = 17;

    /** Most switching segments (each PWM edge, comparator edge or event starts one) a run may take. */
    static final long MAX_SEGMENTS = 20_000_000L;

    /** A current beyond this (A) on an accepted step is taken as a diverging solution. */
    static final double DIVERGED_AMPS = 1e7;

    /** Last flux linkage at which the coil model gave a non-finite current (NaN if never). */
    double nonFiniteLambda = Double.NaN;

    String noCurrentMessage() {
        return "the coil current is not finite at flux linkage " + q(nonFiniteLambda, Dimension.FLUX) + " near t = " + sec(t)
                + ": the core model gives no current there, so the solution diverges (check the resistance and the core's saturation)";
    }

    final Circuit circuit;
    final Drive drive;
    final Load load;
    final Clamp clamp;
    final double vs, rs, ron, rc, v0, rcl, cap, tEnd, offAt;
    final boolean snub, acrossCoil, moves, closedForm, snubberClosedForm;
    /** A sine supply: the supply voltage follows the time of the state being evaluated. */
    final boolean sine;
    /** Time of the state eval() is given (the supply of a sine drive depends on it). */
    double evalT;
    /** Sine supply: start of the last full cycle of the run (NaN if the run is shorter than a cycle), the coil loss and
     *  charge there, and the largest |i| seen since. */
    final double lastCycleFrom;
    double lastCycleECoil = Double.NaN, lastCyclePeak = Double.NaN;
    boolean inLastCycle;
    final double finalCurrent;
    /** A current level whose first rising crossing is wanted (NaN: none), and the time it is reached. */
    final double probe;
    double probeTime = Double.NaN;
    final int n;
    final double dt;

    // run state
    double t;
    final EddyLadder ladder;
    final int loops;   // loops of the ladder
    /** Core loss drawn by the circuit (null without loss data), and the index of its energy integral in the state. */
    final CoreLossBranch core;
    final int ecore;
    /** A coupled secondary winding (null without), and the indices of its flux linkage and loss integral in the state. */
    final Coupling cp;
    final int lam2, esec;
    final int dim;     // state size
    final double restitution;
    /** Iron hysteresis: the coercive current Hc·l/N (0: none), its branch (+1 rising, −1 falling) and the state of its loss integral (−1: none). */
    final double hc;
    final int eHyst;
    double branch = 1;
    /** With hysteresis, after a final switch-off with the coil open at the end: the magnetising flux linkage and the pull left. */
    double residualLambda = Double.NaN, residualPull = Double.NaN;
    final double[] y;
    final double[] ladRate;
    Elec elec = Elec.ON;
    Mech mech = Mech.OPEN;
    boolean switchOn = true;
    boolean holdPhase;
    boolean peakLimited; // in a timed peak phase, after the current first reached the pull-in level
    boolean finalOff;
    boolean firstOn = true;
    double offCurrent = Double.NaN;
    /** Direction of the current the clamp carries: +1, or −1 for a sine supply switched off at a negative current. */
    double clampSign = 1;

    final Recorder rec;
    final List<String> notes = new ArrayList<>();
    final List<Marker> markers = new ArrayList<>();
    final double[] scratch = new double[O_N];
    private final double[] probeScratch = new double[O_N];

    // metrics
    double t63 = Double.NaN, t90 = Double.NaN, t99 = Double.NaN;
    double decayZero = Double.NaN, decay1pct = Double.NaN;
    double peakSw = Double.NEGATIVE_INFINITY, peakSwT;
    double peakI = Double.NEGATIVE_INFINITY, peakIT;
    double peakStored, peakStoredT;
    double pullIn = Double.NaN, dropOut = Double.NaN, startsMoving = Double.NaN;
    double peakReached = Double.NaN;
    double initialStored;
    boolean everClosed;
    double firstImpactSpeed = Double.NaN, maxImpactSpeed;
    int bounces;
    // switching cycles (PWM periods, hold cycles)
    boolean cycleOpen;
    double cycStartT, cycStartQ, cycMin, cycMax;
    double lastRipple = Double.NaN, lastMean = Double.NaN, lastCycleMin, lastCycleMax, lastCycleStart, lastCycleEnd;
    int cycles;
    long steps;

    Solver(Circuit c, double tEnd) {
        this(c, tEnd, Double.NaN);
    }

    Solver(Circuit c, double tEnd, double probeAmps) {
        this.circuit = c;
        this.probe = probeAmps;
        this.drive = c.drive;
        this.load = c.coil != null ? Load.of(c.coil) : Load.of(c.armature);
        this.clamp = c.clamp;
        this.vs = drive.volts;
        this.rs = drive.sourceOhms;
        this.ron = drive.switchOhms;
        this.rc = load.resistance();
        this.tEnd = tEnd;
        this.offAt = c.offAt;
        this.n = c.samples;
        this.dt = tEnd / (n - 1);
        this.snub = clamp != null && clamp.placement() == Clamp.Placement.SNUBBER;
        this.acrossCoil = clamp != null && clamp.placement() == Clamp.Placement.ACROSS_COIL;
        this.v0 = clamp != null ? clamp.offsetVolts() : 0;
        this.rcl = clamp != null ? clamp.seriesOhms() : 0;
        this.cap = clamp != null ? clamp.capacitanceFarads() : 0;
        this.moves = load.moves();
        this.ladder = load.ladder();
        this.loops = ladder.sections();
        this.core = c.coil != null && c.coreLoss && c.secondary == null ? CoreLossBranch.of(c.coil, load.inductance() * Math.max(1e-9, Math.abs(c.drive.volts)
                / Math.max(c.drive.sourceOhms + c.drive.switchOhms + load.resistance(), 1e-9))) : null;
        this.ecore = core != null ? (loops > 0 ? LAD + loops : DIM) : -1;
        this.cp = c.secondary != null ? new Coupling(c.secondary, load.inductance()) : null;
        int base = (loops > 0 ? LAD + loops : DIM) + (core != null ? 1 : 0);
        this.lam2 = cp != null ? base : -1;
        this.esec = cp != null ? base + 1 : -1;
        base += cp != null ? 2 : 0;
        this.hc = load.hysteresis().amps();
        this.eHyst = hc > 0 ? base : -1;
        this.dim = base + (hc > 0 ? 1 : 0);
        this.y = new double[dim];
        this.ladRate = new double[loops];
        this.restitution = load.restitution();
        this.sine = drive.isAc();
        this.lastCycleFrom = sine && tEnd * drive.frequency >= 1 ? tEnd - 1 / drive.frequency : Double.NaN;
        this.closedForm = load.linear() && !moves && !snub && !c.numeric && loops == 0 && !sine && core == null && cp == null;
        this.snubberClosedForm = load.linear() && !moves && snub && !c.numeric && loops == 0 && core == null && cp == null;
        double rTot = rs + ron + rc;
        // a sine supply: the scale of the current is the inrush bound, twice the peak of the steady current of the small-signal L
        // (a rectified one: at least the DC bound √2·V/R)
        double acBound = 2 * Math.sqrt(2) * vs / Math.hypot(rTot, 2 * Math.PI * drive.frequency * load.inductance());
        this.finalCurrent = sine ? (drive.scheme != Drive.Scheme.SINE && rTot > 0 ? Math.max(acBound, Math.sqrt(2) * vs / rTot) : acBound)
                : rTot > 0 ? vs / rTot : Double.POSITIVE_INFINITY;
        validate();
        // the recorder's arrays and the transient's copies of them
        org.ampturn.units.Require.fitsInMemory("samples of a transient", n, 2 * 8 * (14 + (moves ? 5 : 0) + (snub ? 1 : 0) + (ecore >= 0 ? 2 : 0) + (cp != null ? 1 : 0)));
        this.rec = new Recorder(n, moves, snub, ecore, cp != null);
        if (core != null) notes.add(core.describe(c.coil.temperature().si()));
        if (cp != null && c.coil != null && c.coreLoss && CoreLossBranch.of(c.coil, 1) != null) {
            notes.add("the core's loss is left out of the circuit with a coupled secondary winding (the ledger has no core-loss entry)");
        }
    }

    private static String q(double v, Dimension d) { return Quantity.of(v, d).toString(); }
    private static String sec(double v) { return q(v, Dimension.TIME); }
    private static String amp(double v) { return q(v, Dimension.CURRENT); }
    private static String volt(double v) { return q(v, Dimension.VOLTAGE); }

    private void validate() {
        if (!(load.inductance() > 0)) {
            throw Require.fail("the coil's inductance must be greater than zero, got "
                    + q(load.inductance(), Dimension.INDUCTANCE) + ": with no inductance there is no transient to solve");
        }
        if (!(rc >= 0)) throw Require.fail("the coil's resistance must be zero or more, got " + q(rc, Dimension.RESISTANCE));
        if (!Double.isNaN(offAt) && offAt > tEnd) {
            throw Require.fail("off time (" + sec(offAt) + ") is after the end of the run (" + sec(tEnd)
                    + "); simulate for longer or switch off earlier");
        }
        if (cp != null && !load.linear()) {
            throw Require.fail("a coupled secondary winding needs a linear coil: " + load.describe() + " is not (its core saturates)");
        }
        if (sine && (moves || loops > 0)) {
            throw Require.fail("a sine supply drives a fixed coil: moving armatures and eddy ladders are not modelled with it");
        }
        if (sine && clamp != null && !acrossCoil) {
            throw Require.fail("with a sine supply the clamp must sit across the coil (Clamp.bidirectional(..) on a sine; diode(), zener(..) "
                    + "or resistor(..) on a rectified sine), not the "
                    + clamp + ": a clamp across the switch would see the supply's changing voltage, which is not modelled");
        }
        if (drive.scheme == Drive.Scheme.SINE && clamp != null && clamp.kind() != Clamp.Kind.BIDIRECTIONAL) {
            throw Require.fail("a one-way clamp across a coil on a sine supply shorts it in the negative half cycles: use "
                    + "Clamp.bidirectional(..) (back-to-back zeners, a bidirectional TVS or a varistor), not the " + clamp);
        }
        if (drive.scheme == Drive.Scheme.HALF_WAVE && clamp == null) {
            throw Require.fail("a half-wave rectified supply needs the coil's freewheel path in the negative half cycles: "
                    + "add .clamp(Clamp.diode()) (or a zener or resistor clamp across the coil)");
        }
        boolean opens = !Double.isNaN(offAt) || (drive.scheme != Drive.Scheme.DC && !sine);
        if (opens && clamp == null) {
            throw Require.fail("the switch opens during this run but no clamp was given: add .clamp(Clamp.diode()), "
                    + "or Clamp.none(V(..)) to let the switch avalanche");
        }
        if (clamp != null && clamp.placement() == Clamp.Placement.ACROSS_SWITCH && !(v0 > vs)) {
            throw Require.fail("clamp voltage (" + volt(v0) + ") of the " + clamp + " must be above the supply ("
                    + volt(vs) + "): it would conduct with the switch open and the coil would never switch off");
        }
        if (drive.scheme == Drive.Scheme.PEAK_AND_HOLD && !Double.isNaN(drive.peakSeconds)
                && drive.regulation == Drive.Regulation.HYSTERETIC && !(drive.band < drive.peakAmps)) {
            throw Require.fail("hysteresis band (" + amp(drive.band) + ") must be below the pull-in current ("
                    + amp(drive.peakAmps) + "): with a peak time the current is limited between the two");
        }
        if (drive.scheme == Drive.Scheme.PEAK_AND_HOLD && Double.isNaN(drive.peakSeconds)) {
            if (!(drive.peakAmps < finalCurrent)) {
                throw Require.fail("pull-in current (" + amp(drive.peakAmps) + ") is never reached: the steady current is V/R = "
                        + amp(finalCurrent));
            }
        }
        if (drive.scheme == Drive.Scheme.PWM && drive.frequency * tEnd > 5e6) {
            throw Require.fail("the run spans " + Math.round(drive.frequency * tEnd) + " PWM periods; at most 5000000 are solved");
        }
        if (drive.scheme == Drive.Scheme.PWM && n / (drive.frequency * tEnd) < 10) {
            notes.add(String.format(java.util.Locale.ROOT, "samples are coarse for the PWM period (%.1f a period): curves alias, "
                    + "ripple and mean come from the exact switching instants; use .samples(n) for smooth curves", n / (drive.frequency * tEnd)));
        }
    }

    // ---------------------------------------------------------------- the circuit's equations

    /** Current, switch voltage, dλ/dt, powers, force and acceleration in a mode. */
    void eval(Elec e, Mech m, double[] s, double[] o) {
        if (cp != null) {
            evalCoupled(e, s, o);
            return;
        }
        double lam = s[LAM], x = s[X], v = s[V];
        double i = loops > 0 ? (e == Elec.IDLE ? 0 : (lam - s[LAD]) / ladder.leakage)
                : e == Elec.IDLE && (!moves || hc > 0) ? 0 : load.currentAt(lam, x) + branch * hc;
        if (!Double.isFinite(i)) {
            // a trial stage beyond the core model's range: a huge current makes the integrator reject the step
            nonFiniteLambda = lam;
            i = Math.copySign(1e150, lam);
        }
        double pcore = 0, dl;
        if (core != null) {
            // the core-loss branch in parallel: the terminal current is i_m + i_c(λ̇), with λ̇ = a − b·i in every mode
            core.coefficients(lam);
            if (e == Elec.IDLE) {
                branch(e, s, 0, o);
                double im = load.currentAt(lam, x);
                dl = Double.isFinite(im) ? core.idleRate(im) : 0;
                pcore = -im * dl;
                o[O_VSW] -= dl; // the open coil's voltage is its flux decaying through the core
            } else {
                double a = branch(e, s, 0, o), b = a - branch(e, s, 1, o);
                double im = i;
                double rate = core.rate(a - b * im, b);
                double ic = core.current(rate);
                i = im + ic;
                dl = branch(e, s, i, o);
                pcore = ic * dl;
            }
        } else {
            dl = branch(e, s, i, o);
        }
        if (e == Elec.IDLE) i = 0;
        double pEddy = loops > 0 ? ladderRates(s, i, ladRate) : 0;
        if (loops > 0 && e == Elec.IDLE) dl = ladRate[0]; // the open coil carries no current: λ follows the first loop
        double f = moves ? magnetForce(s) : 0;
        double acc = 0, pm = 0;
        if (m == Mech.FREE) {
            acc = (f - load.restoringForceAt(x, v)) / load.mass();
            pm = f * v;
        }
        o[O_I] = i;
        o[O_DLAM] = dl;
        o[O_PCOIL] = i * i * rc;
        o[O_PMECH] = pm;
        o[O_F] = f;
        o[O_ACC] = acc;
        o[O_PEDDY] = pEddy;
        o[O_PCORE] = pcore;
        // the play operator's loss Hc·l·|dφ|: the magnetising flux moves only along the branch the switch set
        o[O_PHYST] = hc > 0 ? branch * hc * (loops > 0 ? ladRate[0] : dl) : 0;
    }

    /** The mode's circuit at terminal current i: writes the switch voltage and the supply, drive, clamp and capacitor terms into o; returns dλ/dt. */
    private double branch(Elec e, double[] s, double i, double[] o) {
        double vsw, dl, psup = 0, pdrv = 0, pcl = 0, dvc = 0;
        switch (e) {
            case ON:
                if (snub) {
                    double vc = s[VC];
                    double node = ron > 0 ? (i + vc / rcl) / (1 / ron + 1 / rcl) : 0;
                    double ic = (node - vc) / rcl;
                    dvc = ic / cap;
                    vsw = node;
                    dl = vs - i * (rs + rc) - node;
                    psup = vs * i;
                    pdrv = i * i * rs + (ron > 0 ? node * node / ron : 0);
                    pcl = ic * ic * rcl;
                } else {
                    double vsup = sine ? drive.voltsAt(evalT) : vs;
                    vsw = i * ron;
                    dl = vsup - i * (rs + ron + rc);
                    psup = vsup * i;
                    pdrv = i * i * (rs + ron);
                }
                break;
            case CLAMP:
                if (snub) {
                    double vc = s[VC];
                    vsw = vc + i * rcl;
                    dvc = i / cap;
                    dl = vs - i * (rs + rc) - vsw;
                    psup = vs * i;
                    pdrv = i * i * rs;
                    pcl = i * i * rcl;
                } else if (acrossCoil) {
                    // clampSign −1: a sine supply switched off at a negative current, the clamp taken as bidirectional
                    double vcl = clampSign * v0 + rcl * i;
                    dl = -vcl - i * rc;
                    vsw = (sine ? drive.voltsAt(evalT) : vs) + vcl;
                    pcl = vcl * i;
                } else {
                    double vcl = v0 + rcl * i;
                    dl = vs - i * (rs + rc) - vcl;
                    vsw = vcl;
                    psup = vs * i;
                    pdrv = i * i * rs;
                    pcl = vcl * i;
                }
                break;
            default:
                dl = hc > 0 && loops == 0 ? Remanence.idleFluxRate(this, s) : 0;
                vsw = (sine ? drive.voltsAt(evalT) : vs) - dl; // the open coil's voltage is dλ/dt
        }
        o[O_VSW] = vsw;
        o[O_PSUP] = psup;
        o[O_PDRV] = pdrv;
        o[O_PCL] = pcl;
        o[O_DVC] = dvc;
        return dl;
    }

    /** eval() with a coupled secondary winding (fixed linear coil): both windings' currents from their flux linkages. */
    private void evalCoupled(Elec e, double[] s, double[] o) {
        boolean idle = e == Elec.IDLE;
        double l1 = s[LAM], l2 = s[lam2];
        double i1 = cp.i1(l1, l2, idle), i2 = cp.i2(l1, l2, idle);
        double dl2on = -cp.diodeVolts - cp.loopOhms * i2, dl1, dl2;
        if (!idle) {
            dl1 = branch(e, s, i1, o);
            dl2 = cp.on ? dl2on : cp.m / cp.l1 * dl1;
        } else {
            branch(e, s, 0, o);
            dl2 = cp.on ? dl2on : 0;
            dl1 = cp.on ? cp.m / cp.l2 * dl2 : 0;
            o[O_VSW] = vs - dl1; // the open coil shows the secondary's voltage, reflected
        }
        o[O_I] = i1;
        o[O_DLAM] = dl1;
        o[O_PCOIL] = i1 * i1 * rc;
        o[O_PMECH] = 0;
        o[O_F] = 0;
        o[O_ACC] = 0;
        o[O_PEDDY] = 0;
        o[O_PCORE] = 0;
        o[O_PHYST] = 0;
        o[O_I2] = i2;
        o[O_DLAM2] = dl2;
        o[O_PSEC] = cp.on ? i2 * (cp.diodeVolts + cp.loopOhms * i2) : 0;
    }

    /** A diode-loaded secondary starts or stops conducting where the state says so (after a switching edge). */
    private void settleSecondary() {
        if (cp == null || !cp.diode) return;
        evalT = t;
        if (!cp.on) {
            eval(elec, mech, y, probeScratch);
            if (probeScratch[O_DLAM2] < -cp.diodeVolts) cp.on = true;
        } else {
            eval(elec, mech, y, probeScratch);
            if (!(probeScratch[O_I2] > 0) && !(probeScratch[O_DLAM2] > 0)) cp.on = false;
        }
    }

    /** The pull of the magnet: the actuator's, or the sum over the ladder's flux tubes. */
    double magnetForce(double[] s) {
        if (loops == 0) return load.forceAt(s[LAM], s[X]);
        double f = 0;
        for (int k = 0; k < loops; k++) {
            double fk = ladder.share[k];
            f += fk * load.forceAt(tubeLambda(s, k) / fk, s[X]);
        }
        return f;
    }

    /** Flux linkage of tube k: λ_k − λ_(k+1), the innermost λ_m. */
    private double tubeLambda(double[] s, int k) {
        return k < loops - 1 ? s[LAD + k] - s[LAD + k + 1] : s[LAD + k];
    }

    /** Sign of the flux: the coil's, or the outermost loop's. */
    private double fluxSign(double[] s) {
        return loops > 0 ? s[LAD] : s[LAM];
    }

    /** The coil current of a state (zero with the coil open and idle). */
    double coilCurrent(double[] s) {
        if (core != null || cp != null) {
            eval(elec, mech, s, probeScratch);
            return probeScratch[O_I];
        }
        if (loops > 0) return elec == Elec.IDLE ? 0 : (s[LAM] - s[LAD]) / ladder.leakage;
        if (elec == Elec.IDLE && (!moves || hc > 0)) return 0;
        return load.currentAt(s[LAM], s[X]) + branch * hc;
    }

    /**
     * dλ_k/dt of each loop into {@code rate} for coil current i; returns the eddy-current loss (W).
     * Branch currents j_k = (λ_k − λ_{k+1})/L_k, j_0 = i, j_m = i(λ_m, x); dλ_k/dt = R_k·(j_{k−1} − j_k).
     */
    private double ladderRates(double[] s, double i, double[] rate) {
        double prev = i, loss = 0;
        for (int k = 0; k < loops; k++) {
            double fk = ladder.share[k];
            double lamTube = tubeLambda(s, k);
            double next = load.currentAt(lamTube / fk, s[X]) + branch * hc;
            if (!Double.isFinite(next)) {
                nonFiniteLambda = lamTube;
                next = Math.copySign(1e150, lamTube);
            }
            double eddy = prev - next;
            rate[k] = ladder.shunt[k] * eddy;
            loss += ladder.shunt[k] * eddy * eddy;
            prev = next;
        }
        return loss;
    }

    /** dy/dt in the current mode. */
    void derivatives(double[] s, double[] d) {
        evalT = t;
        eval(elec, mech, s, scratch);
        d[LAM] = scratch[O_DLAM];
        d[VC] = scratch[O_DVC];
        d[X] = mech == Mech.FREE ? s[V] : 0;
        d[V] = scratch[O_ACC];
        d[ESUP] = scratch[O_PSUP];
        d[ECOIL] = scratch[O_PCOIL];
        d[EDRV] = scratch[O_PDRV];
        d[ECL] = scratch[O_PCL];
        d[EMECH] = scratch[O_PMECH];
        d[Q] = scratch[O_I];
        if (loops > 0) {
            d[EEDDY] = scratch[O_PEDDY];
            System.arraycopy(ladRate, 0, d, LAD, loops);
        }
        if (core != null) d[ecore] = scratch[O_PCORE];
        if (cp != null) {
            d[lam2] = scratch[O_DLAM2];
            d[esec] = scratch[O_PSEC];
        }
        if (eHyst >= 0) d[eHyst] = scratch[O_PHYST];
    }

    double storedAt(double[] s) {
        double w;
        if (cp != null) {
            boolean idle = elec == Elec.IDLE;
            w = 0.5 * (cp.i1(s[LAM], s[lam2], idle) * s[LAM] + cp.i2(s[LAM], s[lam2], idle) * s[lam2]);
        } else if (loops == 0) {
            w = load.fieldEnergyAt(s[LAM], s[X]);
        } else {
            double i = elec == Elec.IDLE ? 0 : (s[LAM] - s[LAD]) / ladder.leakage;
            w = 0.5 * ladder.leakage * i * i;
            for (int k = 0; k < loops; k++) {
                double fk = ladder.share[k];
                w += fk * load.fieldEnergyAt(tubeLambda(s, k) / fk, s[X]);
            }
        }
        if (snub) w += 0.5 * cap * s[VC] * s[VC];
        return w;
    }

    /** The crossing function of an event: zero at the level. */
    double g(Ev ev, double[] s) {
        switch (ev.kind) {
            case CURRENT: return coilCurrent(s) - ev.level;
            case POSITION: return s[X] - ev.level;
            case SECONDARY_CURRENT:
                eval(elec, mech, s, probeScratch);
                return probeScratch[O_I2] - ev.level;
            case SECONDARY_VOLTAGE:
                eval(elec, mech, s, probeScratch);
                return probeScratch[O_DLAM2] - ev.level;
            default:
                // the magnetic force grows as λ², so F − Fr can dip below zero and back within one step as λ
                // swings through zero; ±√F − √Fr changes sign once, where F − Fr does
                double f = magnetForce(s), fr = load.restoringForceAt(s[X], 0);
                if (fr < 0 || f < 0) return f - fr;
                return Math.copySign(Math.sqrt(f), fluxSign(s)) - Math.sqrt(fr);
        }
    }

    // ---------------------------------------------------------------- sampling and observing

    private int nextSample;

    double sampleTime(int k) {
        return k == n - 1 ? tEnd : k * dt;
    }

    /** Index of the next grid sample not yet recorded. */
    int nextSample() { return nextSample; }

    void record(int k, double[] s) {
        if (k != nextSample) throw new IllegalStateException("sample " + k + " out of order, expected " + nextSample);
        double tk = sampleTime(k);
        evalT = tk;
        eval(elec, mech, s, scratch);
        double stored = storedAt(s);
        rec.put(k, tk, s, scratch, stored, rc);
        observe(tk, s, scratch, stored);
        nextSample++;
    }

    void observe(double tt, double[] s) {
        evalT = tt;
        eval(elec, mech, s, scratch);
        observe(tt, s, scratch, Double.NaN);
    }

    private void observe(double tt, double[] s, double[] o, double stored) {
        double vsw = o[O_VSW], i = o[O_I];
        if (!(Math.abs(i) <= DIVERGED_AMPS)) {
            if (Math.abs(i) >= 1e150) throw new TransientException(noCurrentMessage());
            throw new TransientException("the coil current reaches " + amp(i) + " at t = " + sec(tt) + " (flux linkage "
                    + q(s[LAM], Dimension.FLUX) + "): the solution diverges (check the resistance and the core's saturation)");
        }
        if (core != null) core.accept(tt, s[LAM], o[O_DLAM]);
        if (vsw > peakSw) { peakSw = vsw; peakSwT = tt; }
        if (inLastCycle) lastCyclePeak = Math.max(lastCyclePeak, Math.abs(i));
        if (i > peakI) { peakI = i; peakIT = tt; }
        if (stored > peakStored) { peakStored = stored; peakStoredT = tt; }
        if (cycleOpen) {
            cycMin = Math.min(cycMin, i);
            cycMax = Math.max(cycMax, i);
        }
        steps++;
        if ((steps & 63) == 0 && Thread.currentThread().isInterrupted()) {
            throw new CancellationException("transient stopped at t = " + sec(tt) + ": the thread was interrupted");
        }
    }

    /** A new switching cycle starts now: the previous one's ripple and mean become the latest complete cycle. */
    private void startCycle() {
        double i = coilCurrent(y);
        if (cycleOpen && t > cycStartT) {
            cycMin = Math.min(cycMin, i);
            cycMax = Math.max(cycMax, i);
            lastRipple = cycMax - cycMin;
            lastMean = (y[Q] - cycStartQ) / (t - cycStartT);
            lastCycleMin = cycMin;
            lastCycleMax = cycMax;
            lastCycleStart = cycStartT;
            lastCycleEnd = t;
            cycles++;
        }
        cycleOpen = true;
        cycStartT = t;
        cycStartQ = y[Q];
        cycMin = i;
        cycMax = i;
    }

    // ---------------------------------------------------------------- the schedule

    private double nextScheduled() {
        double next = tEnd;
        if (!Double.isNaN(offAt) && offAt > t && !finalOff) next = Math.min(next, offAt);
        if (finalOff) return next;
        if (sine && !inLastCycle && lastCycleFrom > t) next = Math.min(next, lastCycleFrom);
        if (timedPeak() && drive.peakSeconds > t) next = Math.min(next, drive.peakSeconds);
        if (drive.scheme == Drive.Scheme.HALF_WAVE) { // the series diode commutates at the supply's zero crossings
            double edge = ((drive.halfCycleAt(t) + 1) / 2.0 - drive.phaseDegrees / 360) / drive.frequency;
            if (edge > t) next = Math.min(next, edge);
        }
        double f = drive.frequency;
        if (drive.scheme == Drive.Scheme.PWM || (drive.scheme == Drive.Scheme.PEAK_AND_HOLD && (holdPhase || peakLimited)
                && drive.regulation == Drive.Regulation.PWM)) {
            double period = 1 / f;
            long k = (long) Math.floor(t * f);
            double eps = 1e-9 * period;
            double[] cand = drive.scheme == Drive.Scheme.PWM
                    ? new double[] {k * period, (k + drive.duty) * period, (k + 1) * period, (k + 1 + drive.duty) * period}
                    : new double[] {k * period, (k + 1) * period};
            for (double c : cand) {
                if (c > t + eps) {
                    next = Math.min(next, c);
                    break;
                }
            }
        }
        return next;
    }

    private void scheduledEdge() {
        if (sine && !inLastCycle && Math.abs(t - lastCycleFrom) <= 1e-12 * Math.max(tEnd, 1e-300)) {
            inLastCycle = true;
            lastCycleECoil = y[ECOIL];
            lastCyclePeak = Math.abs(currentNow());
        }
        if (t >= tEnd) return;
        if (!finalOff && !Double.isNaN(offAt) && Math.abs(t - offAt) <= 1e-12 * Math.max(tEnd, 1e-300)) {
            finalOff = true;
            offCurrent = currentNow();
            double w = storedAt(y);
            if (w > peakStored) {
                peakStored = w;
                peakStoredT = t;
            }
            if (cycleOpen) cycleOpen = false;
            setSwitch(false);
            markers.add(new Marker("switch off", tq(t), Quantity.of(offCurrent, Dimension.CURRENT), "current"));
            return;
        }
        if (timedPeak() && Math.abs(t - drive.peakSeconds) <= 1e-12 * Math.max(tEnd, 1e-300)) beginHold();
        if (drive.scheme == Drive.Scheme.HALF_WAVE) {
            if (!finalOff) setSwitch(drive.halfCycleAt(t) % 2 == 0);
            return;
        }
        double f = drive.frequency;
        double phase = t * f - Math.floor(t * f + 1e-9);
        boolean periodStart = Math.abs(phase) < 1e-6;
        if (drive.scheme == Drive.Scheme.PWM) {
            if (periodStart) {
                startCycle();
                setSwitch(true);
            } else {
                setSwitch(false);
            }
        } else if (drive.scheme == Drive.Scheme.PEAK_AND_HOLD && holdPhase && drive.regulation == Drive.Regulation.PWM && periodStart) {
            startCycle();
            if (currentNow() < drive.holdAmps) setSwitch(true);
        } else if (drive.scheme == Drive.Scheme.PEAK_AND_HOLD && peakLimited && !holdPhase && drive.regulation == Drive.Regulation.PWM
                && periodStart) {
            if (currentNow() < drive.peakAmps) setSwitch(true);
        }
    }

    /** True in the peak phase of a peak-and-hold drive with a peak time. */
    private boolean timedPeak() {
        return drive.scheme == Drive.Scheme.PEAK_AND_HOLD && !holdPhase && !Double.isNaN(drive.peakSeconds);
    }

    /** The end of a timed peak phase: the hold's regulation takes over from where the current is. */
    private void beginHold() {
        holdPhase = true;
        double i = currentNow();
        markers.add(new Marker("hold begins", tq(t), Quantity.of(i, Dimension.CURRENT), "current"));
        if (Double.isNaN(peakReached)) {
            notes.add("the current reached " + amp(i) + " in the peak time of " + q(drive.peakSeconds, Dimension.TIME)
                    + ", not the pull-in level of " + amp(drive.peakAmps));
        }
        if (drive.regulation == Drive.Regulation.HYSTERETIC) {
            setSwitch(i < drive.holdAmps - drive.band / 2 || (switchOn && i < drive.holdAmps + drive.band / 2));
            startCycle();
        } else {
            setSwitch(switchOn && i < drive.holdAmps);
        }
    }

    private double currentNow() {
        evalT = t;
        return coilCurrent(y);
    }

    private void setSwitch(boolean on) {
        if (!on && switchOn) firstOn = false;
        switchOn = on;
        if (hc > 0) branch = on ? 1 : -1;
        if (on) {
            elec = Elec.ON;
        } else if (snub) {
            elec = Elec.CLAMP;
        } else {
            elec = Elec.CLAMP; // the clamp conducts if the coil's current is above zero with it conducting
            clampSign = 1;
            double i = currentNow();
            if (clamp.kind() == Clamp.Kind.BIDIRECTIONAL && i < 0) { // a bidirectional clamp carries a negative current on
                clampSign = -1;
                i = currentNow();
            }
            if (!(clampSign * i > 0)) elec = Elec.IDLE;
            if (elec == Elec.IDLE && core == null && cp == null) y[LAM] = loops > 0 ? y[LAD] : hc > 0 ? y[LAM] : 0;
        }
    }

    private static Quantity tq(double s) { return Quantity.of(s, Dimension.TIME); }

    // ---------------------------------------------------------------- events

    private List<Ev> events() {
        List<Ev> ev = new ArrayList<>(6);
        boolean ph = drive.scheme == Drive.Scheme.PEAK_AND_HOLD && !finalOff;
        if (switchOn) {
            if (ph && !holdPhase) ev.add(new Ev(Ev.Kind.CURRENT, drive.peakAmps, 1, Ev.Act.PEAK_REACHED));
            if (ph && holdPhase && drive.regulation == Drive.Regulation.HYSTERETIC) {
                ev.add(new Ev(Ev.Kind.CURRENT, drive.holdAmps + drive.band / 2, 1, Ev.Act.HOLD_HIGH));
            }
            if (ph && holdPhase && drive.regulation == Drive.Regulation.PWM) ev.add(new Ev(Ev.Kind.CURRENT, drive.holdAmps, 1, Ev.Act.HOLD_PWM_OFF));
            if (firstOn && Double.isFinite(finalCurrent) && !sine) {
                if (Double.isNaN(t63)) ev.add(new Ev(Ev.Kind.CURRENT, (1 - Math.exp(-1)) * finalCurrent, 1, Ev.Act.REC_63));
                else if (Double.isNaN(t90)) ev.add(new Ev(Ev.Kind.CURRENT, 0.9 * finalCurrent, 1, Ev.Act.REC_90));
                else if (Double.isNaN(t99)) ev.add(new Ev(Ev.Kind.CURRENT, 0.99 * finalCurrent, 1, Ev.Act.REC_99));
            }
        } else {
            if (ph && peakLimited && !holdPhase && drive.regulation == Drive.Regulation.HYSTERETIC) {
                ev.add(new Ev(Ev.Kind.CURRENT, drive.peakAmps - drive.band, -1, Ev.Act.PEAK_LOW));
            }
            if (ph && holdPhase && drive.regulation == Drive.Regulation.HYSTERETIC) {
                ev.add(new Ev(Ev.Kind.CURRENT, drive.holdAmps - drive.band / 2, -1, Ev.Act.HOLD_LOW));
            }
            if (elec == Elec.CLAMP && !snub) ev.add(new Ev(Ev.Kind.CURRENT, 0, clampSign > 0 ? -1 : 1, Ev.Act.CLAMP_ZERO));
            if (finalOff && snub && Double.isNaN(decayZero)) ev.add(new Ev(Ev.Kind.CURRENT, 0, -1, Ev.Act.SNUBBER_ZERO));
            if (finalOff && elec != Elec.IDLE && Double.isNaN(decay1pct) && offCurrent != 0 && !Double.isNaN(offCurrent)) {
                ev.add(new Ev(Ev.Kind.CURRENT, 0.01 * offCurrent, offCurrent > 0 ? -1 : 1, Ev.Act.DECAY_1PCT));
            }
        }
        if (cp != null && cp.diode) {
            ev.add(cp.on ? new Ev(Ev.Kind.SECONDARY_CURRENT, 0, -1, Ev.Act.SECONDARY_OFF)
                    : new Ev(Ev.Kind.SECONDARY_VOLTAGE, -cp.diodeVolts, -1, Ev.Act.SECONDARY_ON));
        }
        if (!Double.isNaN(probe) && Double.isNaN(probeTime) && elec != Elec.IDLE) {
            ev.add(new Ev(Ev.Kind.CURRENT, probe, 1, Ev.Act.PROBE));
        }
        if (moves) {
            switch (mech) {
                case FREE:
                    ev.add(new Ev(Ev.Kind.POSITION, 0, -1, Ev.Act.HIT_OPEN));
                    ev.add(new Ev(Ev.Kind.POSITION, load.stroke(), 1, Ev.Act.HIT_CLOSED));
                    break;
                case OPEN:
                    ev.add(new Ev(Ev.Kind.NET_FORCE, 0, 1, Ev.Act.RELEASE_OPEN));
                    break;
                default:
                    ev.add(new Ev(Ev.Kind.NET_FORCE, 0, -1, Ev.Act.RELEASE_CLOSED));
            }
        }
        return ev;
    }

    private void fire(Ev ev) {
        double i = currentNow();
        Quantity iq = Quantity.of(i, Dimension.CURRENT);
        switch (ev.act) {
            case PEAK_REACHED:
                if (Double.isNaN(peakReached)) {
                    peakReached = t;
                    markers.add(new Marker("pull-in current reached", tq(t), iq, "current"));
                }
                setSwitch(false);
                if (!Double.isNaN(drive.peakSeconds)) {
                    peakLimited = true; // the peak time, not the current, ends the peak phase
                    break;
                }
                holdPhase = true;
                if (drive.regulation == Drive.Regulation.HYSTERETIC) startCycle();
                break;
            case PEAK_LOW:
                setSwitch(true);
                break;
            case HOLD_HIGH:
            case HOLD_PWM_OFF:
                setSwitch(false);
                break;
            case HOLD_LOW:
                startCycle();
                setSwitch(true);
                break;
            case CLAMP_ZERO:
                elec = Elec.IDLE;
                // with hysteresis the current reaches zero on the falling branch with the iron's residual flux left
                if (core == null && cp == null) y[LAM] = loops > 0 ? y[LAD] : hc > 0 ? y[LAM] : 0;
                if (finalOff && Double.isNaN(decayZero)) {
                    decayZero = t - offAt;
                    markers.add(new Marker("current zero", tq(t), Quantity.of(0, Dimension.CURRENT), "current"));
                }
                break;
            case SNUBBER_ZERO:
                decayZero = t - offAt;
                markers.add(new Marker("current zero", tq(t), Quantity.of(0, Dimension.CURRENT), "current"));
                break;
            case DECAY_1PCT:
                decay1pct = t - offAt;
                break;
            case REC_63:
                t63 = t;
                markers.add(new Marker("τ", tq(t), iq, "current"));
                break;
            case REC_90:
                t90 = t;
                markers.add(new Marker("90 %", tq(t), iq, "current"));
                break;
            case REC_99:
                t99 = t;
                markers.add(new Marker("99 %", tq(t), iq, "current"));
                break;
            case PROBE:
                probeTime = t;
                break;
            case SECONDARY_ON:
                cp.on = true;
                break;
            case SECONDARY_OFF:
                cp.on = false;
                break;
            case HIT_OPEN: {
                double impact = Math.abs(y[V]);
                maxImpactSpeed = Math.max(maxImpactSpeed, impact);
                y[X] = 0;
                y[V] = 0;
                mech = Mech.OPEN;
                if (everClosed && Double.isNaN(dropOut) && finalOff) {
                    dropOut = t - offAt;
                    markers.add(new Marker("drop-out", tq(t), Quantity.of(0, Dimension.LENGTH), "position"));
                }
                if (rebounds(impact)) {
                    y[V] = restitution * impact;
                    mech = Mech.FREE;
                    break;
                }
                if (netForce() > 0) mech = Mech.FREE;
                break;
            }
            case HIT_CLOSED: {
                double impact = Math.abs(y[V]);
                maxImpactSpeed = Math.max(maxImpactSpeed, impact);
                y[X] = load.stroke();
                y[V] = 0;
                mech = Mech.CLOSED;
                if (!everClosed) {
                    everClosed = true;
                    pullIn = t;
                    firstImpactSpeed = impact;
                    markers.add(new Marker("pull-in", tq(t), Quantity.of(load.stroke(), Dimension.LENGTH), "position"));
                }
                if (rebounds(impact)) {
                    y[V] = -restitution * impact;
                    mech = Mech.FREE;
                    break;
                }
                if (netForce() < 0) {
                    mech = Mech.FREE;
                    markers.add(new Marker("release", tq(t), Quantity.of(load.stroke(), Dimension.LENGTH), "position"));
                }
                break;
            }
            case RELEASE_OPEN:
                mech = Mech.FREE;
                if (Double.isNaN(startsMoving)) {
                    startsMoving = t;
                    markers.add(new Marker("armature moves", tq(t), Quantity.of(0, Dimension.LENGTH), "position"));
                }
                break;
            case RELEASE_CLOSED:
                mech = Mech.FREE;
                markers.add(new Marker("release", tq(t), Quantity.of(load.stroke(), Dimension.LENGTH), "position"));
                break;
            default:
                throw new IllegalStateException(ev.act.toString());
        }
    }

    /**
     * Rebound speeds below this share of the largest impact speed of the run end the bouncing: the
     * armature comes to rest on the stop (the series of ever shorter bounces is cut off there).
     */
    static final double REST_FRACTION = 1e-3;

    /** True when an impact at this speed rebounds (restitution e > 0 and e·v above the rest threshold); counts the bounce. */
    private boolean rebounds(double impact) {
        if (!(restitution > 0)) return false;
        if (!(restitution * impact > REST_FRACTION * maxImpactSpeed)) return false;
        bounces++;
        markers.add(new Marker("bounce", tq(t), Quantity.of(y[X], Dimension.LENGTH), "position"));
        return true;
    }

    private double netForce() {
        return magnetForce(y) - load.restoringForceAt(y[X], 0);
    }

    // ---------------------------------------------------------------- the run

    Transient run() {
        y[VC] = snub ? vs : 0;
        initialStored = storedAt(y);
        peakStored = initialStored;
        elec = Elec.ON;
        switchOn = true;
        if (drive.scheme == Drive.Scheme.PWM) startCycle();
        if (drive.scheme == Drive.Scheme.HALF_WAVE && drive.halfCycleAt(0) % 2 != 0) setSwitch(false); // switched on in a negative half
        if (!Double.isNaN(offAt) && offAt == 0) scheduledEdge();
        Stepper stepper = closedForm ? new ClosedFormStepper(this)
                : snubberClosedForm ? new SnubberStepper(this) : new OdeStepper(this, circuit.relTol);
        notes.add(closedForm ? "solved in closed form (linear coil, piecewise-linear circuit)"
                : snubberClosedForm ? "solved in closed form (linear coil and RC snubber: matrix exponential of each linear piece)"
                : "solved with " + ((OdeStepper) stepper).describe());
        int stuck = 0;
        long segments = 0;
        double lastT = -1;
        int[] fired = new int[1];
        while (t < tEnd) {
            if (Thread.currentThread().isInterrupted()) {
                throw new CancellationException("transient stopped at t = " + sec(t) + ": the thread was interrupted");
            }
            if (++segments > MAX_SEGMENTS) {
                throw new TransientException("the run needs over " + MAX_SEGMENTS + " switching segments (at t = " + sec(t) + " of " + sec(tEnd)
                        + "); widen the hysteresis band, lower the PWM frequency or shorten the run");
            }
            double t1 = nextScheduled();
            List<Ev> evs = events();
            fired[0] = -1;
            double tStop = stepper.advance(t, t1, y, evs, fired);
            boolean atEdge = fired[0] < 0 || t1 - tStop <= 1e-12 * tEnd;
            t = atEdge ? t1 : tStop;
            observe(t, y);
            if (fired[0] >= 0) fire(evs.get(fired[0]));
            if (atEdge) scheduledEdge();
            settleSecondary();
            observe(t, y);
            if (t == lastT) {
                if (++stuck > 200) {
                    throw new TransientException("the switching chatters at t = " + sec(t) + " (current " + amp(currentNow())
                            + "): events repeat without time advancing; widen the hysteresis band or lower the PWM frequency");
                }
            } else {
                stuck = 0;
                lastT = t;
            }
        }
        while (nextSample < n) record(nextSample, y);
        if (hc > 0) Remanence.atEnd(this);
        if (stepper instanceof OdeStepper) {
            OdeStepper o = (OdeStepper) stepper;
            notes.add(o.steps() + " accepted steps, " + o.evaluations() + " derivative evaluations");
        }
        return Transient.of(this);
    }

    /** Advances the state over one segment, recording the samples it passes. */
    interface Stepper {
        /** From t0 toward t1; returns the stop time and sets fired[0] to the index of the event that stopped it, or −1. */
        double advance(double t0, double t1, double[] y, List<Ev> evs, int[] fired);
    }
}
