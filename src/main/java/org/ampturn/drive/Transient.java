package org.ampturn.drive;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;

/**
 * The solved transient of a drive, a coil and a clamp: sampled signals on a common time axis, the
 * metrics, the energy ledger, markers of key instants, solver notes and safety cautions. Immutable.
 *
 * <p>Signals: {@code current}, {@code flux linkage}, {@code coil voltage} (across the coil's terminals,
 * {@code dλ/dt + R·i}), {@code resistor voltage} (the winding resistance's part {@code R·i}),
 * {@code switch voltage}, powers, cumulative energies, and for a moving armature {@code position},
 * {@code speed} and {@code magnetic force}.
 */
public final class Transient {
    /** Switch voltage above which a caution is shown (common practice: the usual extra-low-voltage DC touch limit). */
    public static final double CAUTION_VOLTS = 60;
    /** Stored energy above which a caution is shown (common practice). */
    public static final double CAUTION_JOULES = 1;

    private final String circuit;
    private final Circuit source;
    private final List<Signal> signals;
    private final Signal current, lambda, coilV, resV, switchV, pSup, pCoil, pDrive, pClamp, pMech,
            eSup, eDiss, eClamp, eStored, eMech, position, speed, force, capV, pCore, eCore, i2;
    private final Metrics metrics;
    private final EnergyLedger energy;
    private final List<Marker> markers;
    private final List<String> notes;
    private final List<String> cautions;
    private final double duration;
    private final double acRms, acPeak, coreLoss;
    private final double residualLambda, residualPull;

    private Transient(Solver sv) {
        Recorder r = sv.rec;
        double[] t = r.time;
        this.circuit = sv.circuit.toString();
        this.source = sv.circuit;
        this.duration = sv.tEnd;
        List<Signal> all = new ArrayList<>();
        current = add(all, "current", Dimension.CURRENT, t, r.current);
        lambda = add(all, "flux linkage", Dimension.FLUX, t, r.lambda);
        coilV = add(all, "coil voltage", Dimension.VOLTAGE, t, r.coilV);
        resV = add(all, "resistor voltage", Dimension.VOLTAGE, t, r.resV);
        switchV = add(all, "switch voltage", Dimension.VOLTAGE, t, r.switchV);
        pSup = add(all, "supply power", Dimension.POWER, t, r.pSup);
        pCoil = add(all, "coil resistance power", Dimension.POWER, t, r.pCoil);
        pDrive = add(all, "drive loss power", Dimension.POWER, t, r.pDrive);
        pClamp = add(all, "clamp power", Dimension.POWER, t, r.pClamp);
        pMech = sv.moves ? add(all, "mechanical power", Dimension.POWER, t, r.pMech) : Signal.wrap("mechanical power", Dimension.POWER, t, new double[t.length]);
        eSup = add(all, "supplied energy", Dimension.ENERGY, t, r.eSup);
        eDiss = add(all, "dissipated energy", Dimension.ENERGY, t, r.eDiss);
        eClamp = add(all, "clamp energy", Dimension.ENERGY, t, r.eClamp);
        eStored = add(all, "stored energy", Dimension.ENERGY, t, r.eStored);
        eMech = sv.moves ? add(all, "mechanical energy", Dimension.ENERGY, t, r.eMech) : null;
        position = sv.moves ? add(all, "position", Dimension.LENGTH, t, r.x) : null;
        speed = sv.moves ? add(all, "speed", Dimension.VELOCITY, t, r.v) : null;
        force = sv.moves ? add(all, "magnetic force", Dimension.FORCE, t, r.force) : null;
        capV = sv.snub ? add(all, "snubber capacitor voltage", Dimension.VOLTAGE, t, r.capV) : null;
        i2 = r.i2 != null ? add(all, "secondary current", Dimension.CURRENT, t, r.i2) : null;
        pCore = r.pCore != null ? add(all, "core loss power", Dimension.POWER, t, r.pCore) : null;
        eCore = r.eCore != null ? add(all, "core loss energy", Dimension.ENERGY, t, r.eCore) : null;
        signals = Collections.unmodifiableList(all);

        double[] y = sv.y;
        double stored = sv.storedAt(y) - sv.initialStored;
        energy = new EnergyLedger(y[Solver.ESUP], y[Solver.ECOIL], y[Solver.EDRV], y[Solver.ECL], stored, y[Solver.EMECH],
                sv.loops > 0 ? y[Solver.EEDDY] : 0, sv.core != null ? y[sv.ecore] : 0, sv.cp != null ? y[sv.esec] : 0)
                .withArmatureHysteresis(sv.eHyst >= 0 ? y[sv.eHyst] : 0);

        residualLambda = sv.residualLambda;
        residualPull = sv.residualPull;

        double tau = sv.load.linear() && !sv.moves && sv.cp == null ? sv.load.inductance() / (sv.rs + sv.ron + sv.rc) : sv.t63;
        metrics = new Metrics(tq(tau), tq(sv.t63), tq(sv.t90), tq(sv.t99),
                Quantity.of(sv.finalCurrent, Dimension.CURRENT), Quantity.of(sv.peakI, Dimension.CURRENT),
                Quantity.of(sv.peakSw, Dimension.VOLTAGE), Quantity.of(sv.peakStored, Dimension.ENERGY),
                Quantity.of(y[Solver.ECL], Dimension.ENERGY),
                tq(Double.isNaN(sv.decayZero) ? sv.decay1pct : sv.decayZero),
                Quantity.of(sv.lastRipple, Dimension.CURRENT), Quantity.of(sv.lastMean, Dimension.CURRENT),
                tq(sv.peakReached), tq(sv.pullIn), tq(sv.dropOut),
                Quantity.of(sv.firstImpactSpeed, Dimension.VELOCITY), sv.bounces);

        List<Marker> mk = new ArrayList<>(sv.markers);
        if (sv.peakSw > Double.NEGATIVE_INFINITY) {
            mk.add(new Marker("peak switch voltage", tq(sv.peakSwT), Quantity.of(sv.peakSw, Dimension.VOLTAGE), "switch voltage"));
        }
        mk.sort((a, b) -> Double.compare(a.time().si(), b.time().si()));
        markers = Collections.unmodifiableList(mk);

        List<String> nt = new ArrayList<>(sv.notes);
        if (sv.finalOff && Double.isNaN(sv.decayZero) && Math.abs(sv.offCurrent) > 0) {
            nt.add(Double.isNaN(sv.decay1pct) ? "the current had not decayed to 1 % of its turn-off value by the end of the run"
                    : "the current only approaches zero; the decay time is the time to 1 % of the turn-off current");
        }
        if (sv.moves && Double.isNaN(sv.pullIn)) nt.add("the armature did not reach the closed stop");


        double rcoil = sv.rc;
        acPeak = sv.inLastCycle ? sv.lastCyclePeak : Double.NaN;
        acRms = sv.inLastCycle && rcoil > 0 ? Math.sqrt(Math.max(0, y[Solver.ECOIL] - sv.lastCycleECoil) * sv.drive.frequency / rcoil)
                : Double.NaN;
        if (sv.sine && !sv.inLastCycle) nt.add("the run is shorter than one cycle of the supply: no last-cycle RMS and peak current");
        if (sv.sine && sv.inLastCycle && !(rcoil > 0)) nt.add("the coil has no resistance: the last cycle's RMS current is not reported");
        if (sv.sine) nt.add("the last cycle's peak current is the largest of the samples and solver steps in it");

        coreLoss = sv.circuit.coil != null ? CoreLossOfRun.energy(sv.circuit.coil, r.time, r.lambda) : Double.NaN;
        if (!Double.isNaN(coreLoss) && sv.core == null) {
            nt.add("core loss " + Quantity.of(coreLoss, Dimension.ENERGY) + " by the iGSE of the run's flux density B = λ/(N·A) "
                    + "(from the output samples); beside the energy ledger, not in it: the core loss is left out of this circuit");
        } else if (!Double.isNaN(coreLoss)) {
            nt.add("core loss " + Quantity.of(y[sv.ecore], Dimension.ENERGY) + " drawn by the circuit, in the ledger; the iGSE of the run's "
                    + "flux afterwards (rainflow loops, output samples) gives " + Quantity.of(coreLoss, Dimension.ENERGY));
        }

        List<String> cs = new ArrayList<>();
        if (sv.sine && sv.vs > Drive.MAINS_CAUTION_RMS) {
            cs.add("the supply is " + Quantity.of(sv.vs, Dimension.VOLTAGE) + " RMS, above 50 V RMS: mains-type voltage can kill; "
                    + "wiring, fusing, insulation and enclosure must follow local codes and licensed practice");
        }
        if (sv.peakSw > CAUTION_VOLTS) {
            cs.add("the switch sees " + Quantity.of(sv.peakSw, Dimension.VOLTAGE) + ", above 60 V (a common-practice threshold for "
                    + "touchable low-voltage circuits): the flyback spike can shock and can destroy parts; rate the switch and clamp for it");
        }
        if (sv.peakStored > CAUTION_JOULES) {
            cs.add("the coil stores up to " + Quantity.of(sv.peakStored, Dimension.ENERGY) + ", above 1 J (a common-practice threshold): "
                    + "opening the circuit can arc, shock or burn; give the energy a safe path");
        }
        if (sv.clamp != null && sv.clamp.kind() == Clamp.Kind.NONE && y[Solver.ECL] > 0) {
            cs.add("the switch absorbs " + Quantity.of(y[Solver.ECL], Dimension.ENERGY) + " in avalanche at each turn-off; "
                    + "check it against the switch's rated avalanche energy");
        }
        notes = Collections.unmodifiableList(nt);
        if (!cs.isEmpty()) cs.add("these thresholds are common practice, not limits: defer to local codes and licensed practice");
        cautions = Collections.unmodifiableList(cs);
    }

    static Transient of(Solver sv) {
        return new Transient(sv);
    }

    private static Signal add(List<Signal> all, String name, Dimension d, double[] t, double[] v) {
        Signal s = Signal.wrap(name, d, t, v);
        all.add(s);
        return s;
    }

    private static Quantity tq(double s) {
        return Quantity.of(s, Dimension.TIME);
    }

    public Signal current() { return current; }
    public Signal fluxLinkage() { return lambda; }
    public Signal coilVoltage() { return coilV; }
    public Signal resistorVoltage() { return resV; }
    public Signal switchVoltage() { return switchV; }
    public Signal storedEnergy() { return eStored; }
    public Signal suppliedEnergy() { return eSup; }
    public Signal dissipatedEnergy() { return eDiss; }
    /** Cumulative clamp energy over time (the total is {@code metrics().clampEnergy()}). */
    public Signal clampEnergy() { return eClamp; }
    /** Current of the coupled secondary winding, into its dotted end; only with {@code Circuit.withSecondary}. */
    public Signal secondaryCurrent() { return require(i2, "a coupled secondary winding"); }
    /** Core-loss power drawn by the coil's core-loss branch; only for a coil whose core has loss data. */
    public Signal coreLossPower() { return require(pCore, "a core with loss data"); }
    /** Cumulative core-loss energy (the total is {@code energy().core()}); only for a coil whose core has loss data. */
    public Signal coreEnergy() { return require(eCore, "a core with loss data"); }
    /** Voltage on the snubber capacitor; only for an RC snubber. */
    public Signal capacitorVoltage() { return require(capV, "an RC snubber"); }
    /** Armature position from the open stop; only for a moving armature. */
    public Signal position() { return require(position, "a moving armature"); }
    public Signal speed() { return require(speed, "a moving armature"); }
    public Signal force() { return require(force, "a moving armature"); }
    public Signal mechanicalEnergy() { return require(eMech, "a moving armature"); }

    private Signal require(Signal s, String what) {
        if (s == null) throw new IllegalStateException("this run has no " + what.replaceFirst("^an? ", "") + "; the signal exists only for " + what);
        return s;
    }

    /** A power over time: "supply", "coil" (winding resistance), "drive" (source and switch), "clamp" or "mechanical". */
    public Signal power(String which) {
        switch (which == null ? "" : which.toLowerCase(Locale.ROOT)) {
            case "supply": return pSup;
            case "coil": case "resistance": case "resistive": return pCoil;
            case "drive": case "switch": case "source": return pDrive;
            case "clamp": return pClamp;
            case "mechanical": return pMech;
            case "core": return coreLossPower();
            default: throw new IllegalArgumentException("power (" + org.ampturn.units.Require.quote(which) + ") must be one of supply, coil, drive, clamp, mechanical");
        }
    }

    /** What was solved: the drive, the coil and the clamp, in words. */
    public String circuit() { return circuit; }

    /** The length of the run, from switch-on at t = 0. */
    public Quantity duration() { return tq(duration); }

    /** Every signal of the run, current first, for charts. */
    public List<Signal> signals() { return signals; }

    public List<Marker> markers() { return markers; }

    public EnergyLedger energy() { return energy; }

    public Metrics metrics() { return metrics; }

    public Quantity timeConstant() { return metrics.timeConstant(); }
    public Quantity finalCurrent() { return metrics.finalCurrent(); }
    public Quantity peakCurrent() { return metrics.peakCurrent(); }
    public Quantity peakSwitchVoltage() { return metrics.peakSwitchVoltage(); }
    public Quantity decayTime() { return metrics.decayTime(); }
    public Quantity ripple() { return metrics.ripple(); }
    public Quantity cycleMean() { return metrics.cycleMean(); }

    /**
     * Sine supply: the RMS coil current over the last full cycle of the run, from the exact integral of
     * the coil's i²·R (NaN for other drives, a run shorter than a cycle, or a coil without resistance).
     */
    public Quantity lastCycleRmsCurrent() { return Quantity.of(acRms, Dimension.CURRENT); }

    /**
     * Core-loss energy of the run (J) afterwards: the iGSE of each core piece's flux density
     * B(t) = λ(t)/(N·A) over the output samples, split into loops by the rainflow count, times the
     * piece's volume, for a {@code WoundCoil} whose core material has a {@code CoreLoss}; NaN otherwise.
     * A check beside the ledger: the loss the circuit drew through its core-loss branch (causal swing)
     * is {@code energy().core()}.
     */
    public Quantity coreLossEnergy() { return Quantity.of(coreLoss, Dimension.ENERGY); }

    /** Sine supply: the largest |i| over the last full cycle of the run, from its samples and solver steps (NaN otherwise). */
    public Quantity lastCyclePeakCurrent() { return Quantity.of(acPeak, Dimension.CURRENT); }
    public Quantity pullInTime() { return metrics.pullInTime(); }
    public Quantity dropOutTime() { return metrics.dropOutTime(); }
    /** Speed of the armature as it first reaches the closed stop (NaN if it never does). */
    public Quantity impactSpeed() { return metrics.impactSpeed(); }
    /** Rebounds at the stops over the run (0 with a restitution of 0). */
    public int bounceCount() { return metrics.bounces(); }

    /**
     * Time at which the current first reaches {@code fraction} of the final current V/R. 0.63 (taken as
     * 1 − 1/e), 0.9 and 0.99 are the run's own metrics; any other fraction is located as
     * {@link #timeTo(Quantity)} does. NaN when not reached.
     */
    public Quantity timeTo(double fraction) {
        if (!(fraction > 0 && fraction < 1)) throw new IllegalArgumentException("fraction (" + fraction + ") must be between 0 and 1");
        if (Math.abs(fraction - 0.63) < 0.0025) return metrics.timeTo63();
        if (fraction == 0.9) return metrics.timeTo90();
        if (fraction == 0.99) return metrics.timeTo99();
        double level = fraction * metrics.finalCurrent().si();
        if (!Double.isFinite(level)) return tq(Double.NaN);
        return tq(timeToCurrent(level));
    }

    /**
     * The exact crossing time of a level; a level below 1e-12 of the run's largest finite current (peak or final) is crossed
     * within 1e-12 of a time constant of the start (a run starts at zero current), below what the
     * solver's events resolve: 0 s.
     */
    private double timeToCurrent(double amps) {
        double fin = Math.abs(metrics.finalCurrent().si()), peak = Math.abs(metrics.peakCurrent().si());
        double scale = Math.max(Double.isFinite(fin) ? fin : 0, Double.isFinite(peak) ? peak : 0);
        if (amps <= 1e-12 * scale) return 0;
        return source.timeToCurrent(amps, duration);
    }

    /**
     * Time at which the current first rises through {@code level} (any current above zero), exact
     * to the solver's tolerance: the same circuit is solved again with the level as one of the
     * solver's events, located by root finding on the integrator's dense output (or solved in
     * closed form for a linear coil), not read from the samples. NaN when the current never
     * reaches the level in the run.
     */
    public Quantity timeTo(Quantity level) {
        double amps = Require.positive("current level", level, Dimension.CURRENT);
        return tq(timeToCurrent(amps));
    }

    /**
     * Every signal of the run as CSV: a {@code time (s)} column, then one column per signal in the
     * order of {@link #signals()}, each header with its SI unit in ASCII ({@code current (A)},
     * {@code flux linkage (Wb)}); SI values that read back exactly. See lib-docs/transients.md.
     */
    public String toCsv() {
        return SignalCsv.text(signals);
    }

    /** The chosen signals of this run as CSV, in the order given, after a {@code time (s)} column. */
    public String toCsv(Signal... chosen) {
        return SignalCsv.text(chosen(chosen));
    }

    /** Writes {@link #toCsv()} to a file atomically, with the user's normal permissions; returns the absolute path. */
    public Path saveCsv(String path) {
        return SignalCsv.save(path, signals);
    }

    /** Writes the chosen signals ({@link #toCsv(Signal...)}) to a file atomically; returns the absolute path. */
    public Path saveCsv(String path, Signal... chosen) {
        return SignalCsv.save(path, chosen(chosen));
    }

    private List<Signal> chosen(Signal... chosen) {
        if (chosen == null || chosen.length == 0) throw new IllegalArgumentException("name at least one signal of the run, e.g. run.current()");
        for (Signal s : chosen) {
            if (s == null) throw new IllegalArgumentException("a signal is missing (null)");
            if (s.timesShared() != current.timesShared()) {
                throw new IllegalArgumentException("signal " + s.name() + " is not from this run; give signals such as run.current()");
            }
        }
        return List.of(chosen);
    }

    /** How the run was solved, and what to know about the result. */
    public List<String> notes() { return notes; }

    /**
     * With an armature whose iron has {@link IronHysteresis}: the magnetising flux linkage left at the
     * end of the run, after a final switch-off with the current at zero (the iron's residual at the
     * armature's last position); NaN without hysteresis or when the run did not end so.
     */
    public Quantity residualFluxLinkage() { return Quantity.of(residualLambda, Dimension.FLUX); }

    /**
     * The magnetic force of that residual flux on the armature at the end of the run, in the
     * drive's sign (toward closing); NaN as for {@link #residualFluxLinkage()}.
     */
    public Quantity residualForce() { return Quantity.of(residualPull, Dimension.FORCE); }

    /** Safety cautions (switch voltage above 60 V, stored energy above 1 J, avalanche), deferring to local codes and licensed practice. */
    public List<String> cautions() { return cautions; }

    /** One line: the circuit, key figures and cautions. */
    @Override
    public String toString() {
        String s = "transient " + tq(duration) + " of " + circuit + ": " + metrics;
        if (!Double.isNaN(residualPull)) s += ", residual force " + Quantity.of(residualPull, Dimension.FORCE);
        if (!cautions.isEmpty()) s += "; CAUTION: " + String.join("; ", cautions);
        return s;
    }
}
