package org.ampturn.actuator;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import org.ampturn.coil.AirGap;
import org.ampturn.coil.Core;
import org.ampturn.coil.MagneticCircuit;
import org.ampturn.coil.WoundCoil;
import org.ampturn.drive.Drive;
import org.ampturn.drive.Transient;
import org.ampturn.material.Conductor;
import org.ampturn.material.CoreLoss;
import org.ampturn.material.Materials;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;
import org.ampturn.wire.Winding;

/**
 * A solenoid on an AC supply (mains or a low-voltage AC transformer): a coil on a saturable iron path
 * closed through one working gap of pole area A, from the open gap (stroke + residual gap) to the
 * closed one (the residual gap), with an optional leakage permeance across the working gap and an
 * optional shading ring on the pole.
 *
 * <p>Current, impedance and power come from the periodic steady state of a time-domain run, not from a
 * phasor: with saturating iron the current is not sinusoidal. Each operating point runs
 * {@link Drive#sine} into the {@link WoundCoil} at that gap, switched on where the small-signal steady
 * current crosses zero (phase atan(ωL0/R)), so that little DC offset is left to die away, and extends
 * the run until the mean square current of the last cycle differs from the one before by so little that
 * the remaining offset, estimated as that change times the small-signal time constant in cycles, is
 * below 10⁻⁴. The last cycle gives: the RMS current (the run's exact ∫i²R), the peak current, the
 * apparent impedance V/I, the copper loss I²·R, the core loss (the iGSE of each iron piece's B(t) over
 * that cycle, {@link CoreLoss#energyDensityAt}, times its volume, when the material has loss data), the
 * real power P = copper + core loss, and the power factor P/(V·I) (the definition for non-sinusoidal
 * current, IEEE Std 1459-2010, "power factor = P/S"). The run draws the core loss through the drive's
 * core-loss branch (a current beside the magnetising one), so its supply delivers copper and core loss
 * and the current includes the loss current.
 *
 * <p>An AC solenoid draws several times its holding current while open (common practice): the open
 * gap's small inductance lets far more current through than the closed magnet's. {@link #inrushRatio}
 * is that ratio of RMS currents; a coil whose armature sticks open overheats.
 *
 * <p>The shading ring is not part of the time-domain run (the sine drive takes no shorted turn):
 * {@link #holding} gives the closed magnet with its ring by the two-flux phasor model of
 * {@link ShadedPole} (Roters 1941, from memory), with the iron's reluctance linearised as its secant at
 * the closed run's peak flux: the least pull in a cycle against the spring (hum and chatter), the
 * ring's loss, and the holding current with the ring's reflected loss, which is higher than the run's.
 *
 * <p>Range: the lumped magnetic circuit (flux density uniform in each piece, no eddy currents in the
 * iron: laminated iron), a flat working gap small against the pole's width, leakage as one constant
 * permeance. Units SI; immutable.
 */
public final class AcSolenoid {
    /** RMS voltage above which results carry a mains caution (the AC extra-low-voltage limit of IEC 61140, common practice). */
    public static final double CAUTION_VOLTS_RMS = ShadedPole.CAUTION_VOLTS_RMS;
    /** Output samples per supply cycle of each run. */
    static final int SAMPLES_PER_CYCLE = 400;
    /** Most supply cycles one operating point runs. */
    public static final int MAX_CYCLES = 2000;
    /** Remaining offset (relative, in the mean square current) at which a run counts as settled. */
    static final double SETTLED = 1e-4;
    private static final double MU0 = MagneticCircuit.MU0;
    private static final double LEAK_LENGTH = 1e-3; // the leakage permeance as an air piece of this length

    private final int turns;
    private final double r20;
    private final Winding winding; // null when turns and resistance were given
    private final MagneticCircuit iron;
    private final double area, stroke, residual, leakage;
    private final double shaded, ringOhms; // ringOhms NaN: no ring
    private final double kelvin;

    private AcSolenoid(int turns, double r20, Winding winding, MagneticCircuit iron, double area, double stroke, double residual,
            double leakage, double shaded, double ringOhms, double kelvin) {
        this.turns = turns;
        this.r20 = r20;
        this.winding = winding;
        this.iron = iron;
        this.area = area;
        this.stroke = stroke;
        this.residual = residual;
        this.leakage = leakage;
        this.shaded = shaded;
        this.ringOhms = ringOhms;
        this.kelvin = kelvin;
    }

    /**
     * An AC solenoid of a {@link Winding} on {@code ironPath} (frame and plunger, laminated: any
     * {@link MagneticCircuit}), closing through one working gap of {@code poleArea} over {@code stroke};
     * no residual gap, leakage or ring until given.
     */
    public static AcSolenoid of(Winding winding, MagneticCircuit ironPath, Quantity poleArea, Quantity stroke) {
        Require.present("winding", winding);
        return of(winding.turns(), winding.resistanceAt(Conductor.T20), winding, ironPath, poleArea, stroke);
    }

    /** The same with the coil given by its turns and its copper resistance at 20 °C. */
    public static AcSolenoid of(int turns, Quantity resistance20, MagneticCircuit ironPath, Quantity poleArea, Quantity stroke) {
        Require.turns("turns", turns);
        double r = Require.positive("coil resistance at 20 °C", resistance20, Dimension.RESISTANCE, 1e9);
        return of(turns, r, null, ironPath, poleArea, stroke);
    }

    private static AcSolenoid of(int turns, double r20, Winding winding, MagneticCircuit ironPath, Quantity poleArea, Quantity stroke) {
        Require.present("iron path", ironPath);
        double a = Require.positive("pole area", poleArea, Dimension.AREA, 1);
        double s = Require.length("stroke", stroke);
        return new AcSolenoid(turns, r20, winding, ironPath, a, s, 0, 0, Double.NaN, Double.NaN, Conductor.T20);
    }

    /** The gap left when closed (shims, plating, the non-magnetic stop), in series with the working gap. */
    public AcSolenoid withResidualGap(Quantity gap) {
        double g = Require.lengthOrZero("residual gap", gap);
        return new AcSolenoid(turns, r20, winding, iron, area, stroke, g, leakage, shaded, ringOhms, kelvin);
    }

    /**
     * A constant leakage permeance across the working gap (H): flux that crosses the coil's window from
     * plunger to frame instead of the gap, for instance a third of {@link Permeance#coaxial} over the
     * coil's length (Roters 1941, ch. 7). It matters most open, where it lowers the inrush current.
     */
    public AcSolenoid withLeakage(Quantity permeance) {
        double p = Require.nonNegative("leakage permeance", permeance, Dimension.INDUCTANCE, 1);
        return new AcSolenoid(turns, r20, winding, iron, area, stroke, residual, p, shaded, ringOhms, kelvin);
    }

    /**
     * A shading ring around {@code shadedFraction} of the pole face (0.05 to 0.95; about two thirds is
     * usual, common practice) of resistance {@code ringResistance} as one turn, ρ·(mean length)/(section).
     */
    public AcSolenoid withShadingRing(double shadedFraction, Quantity ringResistance) {
        Require.between("shaded fraction", shadedFraction, 0.05, 0.95);
        double r = Require.positive("ring resistance", ringResistance, Dimension.RESISTANCE, 1e6);
        return new AcSolenoid(turns, r20, winding, iron, area, stroke, residual, leakage, shadedFraction, r, kelvin);
    }

    /** The same solenoid with its coil at {@code temperature} (the resistance changes, the magnetics do not). */
    public AcSolenoid atTemperature(Quantity temperature) {
        double k = Require.absoluteTemperature("coil temperature", temperature, Conductor.LAW_MIN_K, Conductor.LAW_MAX_K,
                "the linear resistance law");
        return new AcSolenoid(turns, r20, winding, iron, area, stroke, residual, leakage, shaded, ringOhms, k);
    }

    public int turns() { return turns; }
    public Quantity poleArea() { return Quantity.of(area, Dimension.AREA); }
    public Quantity stroke() { return Quantity.of(stroke, Dimension.LENGTH); }
    /** The working gap closed: the residual gap. */
    public Quantity closedGap() { return Quantity.of(residual, Dimension.LENGTH); }
    /** The working gap open: stroke plus residual gap. */
    public Quantity openGap() { return Quantity.of(stroke + residual, Dimension.LENGTH); }
    /** Coil resistance at the coil's temperature. */
    public Quantity resistance() { return Quantity.of(coilAt(residual).resistanceAt(kelvin), Dimension.RESISTANCE); }

    /** The coil with the armature at {@code gap}: what a drive sees (at the coil's temperature). */
    public WoundCoil coil(Quantity gap) {
        return coilAt(Require.lengthOrZero("gap", gap));
    }

    /** The whole magnetic circuit with the armature at {@code gap}. */
    public MagneticCircuit circuitAt(Quantity gap) {
        return circuitAt(Require.lengthOrZero("gap", gap));
    }

    /** The periodic steady state on a sine of {@code rmsVoltage} and {@code frequency}, armature closed. */
    public OperatingPoint closed(Quantity rmsVoltage, Quantity frequency) {
        return solve(volts(rmsVoltage), hertz(frequency), residual, "closed");
    }

    /** The periodic steady state with the armature held open (the current it draws before it closes, or if it sticks). */
    public OperatingPoint open(Quantity rmsVoltage, Quantity frequency) {
        return solve(volts(rmsVoltage), hertz(frequency), stroke + residual, "open");
    }

    /** The periodic steady state with the armature held at any {@code gap}. */
    public OperatingPoint at(Quantity rmsVoltage, Quantity frequency, Quantity gap) {
        double v = volts(rmsVoltage), f = hertz(frequency);
        return solve(v, f, Require.lengthOrZero("gap", gap), "held");
    }

    /** RMS current open over RMS current closed, both from the runs (without the ring's reflected loss). */
    public double inrushRatio(Quantity rmsVoltage, Quantity frequency) {
        double v = volts(rmsVoltage), f = hertz(frequency);
        double c = solve(v, f, residual, "closed").amps;
        double o = solve(v, f, stroke + residual, "open").amps;
        return Require.result("inrush ratio", o / c);
    }

    /**
     * The switch-on transient at {@code gap}: the supply switched on at {@code phaseDegrees} of its
     * voltage (0 a rising zero crossing, 90 the peak) for {@code duration}. At a zero crossing the flux
     * is driven towards twice its steady peak; with a closed iron path that saturates, the first peaks
     * of current are many times the steady ones. {@link Transient#peakCurrent()} reads the inrush.
     * The duration is at most 10 s and {@value #MAX_CYCLES} cycles.
     */
    public Transient switchOn(Quantity rmsVoltage, Quantity frequency, double phaseDegrees, Quantity gap, Quantity duration) {
        double v = volts(rmsVoltage), f = hertz(frequency);
        double g = Require.lengthOrZero("gap", gap);
        double d = Require.positive("duration", duration, Dimension.TIME, 10);
        if (!(d * f <= MAX_CYCLES)) {
            throw Require.fail("switch-on duration " + duration + " is " + Require.show(d * f) + " cycles of the supply; at most " + MAX_CYCLES
                    + " cycles are run");
        }
        int samples = (int) Math.min(2_000_001, Math.max(2001, Math.ceil(d * f * SAMPLES_PER_CYCLE) + 1));
        return Drive.sine(Quantity.of(v, Dimension.VOLTAGE), Quantity.of(f, Dimension.FREQUENCY)).withSwitchOnPhase(phaseDegrees)
                .into(coilAt(g)).samples(samples).simulate(Quantity.of(d, Dimension.TIME));
    }

    /**
     * The closed magnet with its shading ring as the two-flux phasor model: coil resistance at the
     * coil's temperature, the iron's reluctance as its secant at the closed run's peak flux (the
     * leakage across the closed gap is left out). Without a ring, the unshaded pole.
     */
    public ShadedPole shadedPole(Quantity rmsVoltage, Quantity frequency) {
        double v = volts(rmsVoltage), f = hertz(frequency);
        return shadedPoleAt(v, f);
    }

    /**
     * The holding point: the closed magnet with its ring on the supply ({@link #shadedPole}) —
     * least pull in a cycle, {@code margin(spring)}, ring loss, and the holding current with the
     * ring's loss reflected into the coil.
     */
    public ShadedPole.OperatingPoint holding(Quantity rmsVoltage, Quantity frequency) {
        double v = volts(rmsVoltage), f = hertz(frequency);
        return shadedPoleAt(v, f).at(Quantity.of(v, Dimension.VOLTAGE), Quantity.of(f, Dimension.FREQUENCY), closedGap());
    }

    private ShadedPole shadedPoleAt(double v, double f) {
        if (!(residual >= Require.MIN_LENGTH)) {
            throw Require.fail("the holding point needs a residual gap above zero (withResidualGap), got " + closedGap()
                    + ": the two-flux model divides by the gap");
        }
        OperatingPoint c = solve(v, f, residual, "closed");
        double phi = c.peakFlux;
        double secant = phi > 0 ? iron.mmfAt(phi) / phi : iron.reluctanceSI();
        Quantity r = Quantity.of(coilAt(residual).resistanceAt(kelvin), Dimension.RESISTANCE);
        ShadedPole p = Double.isNaN(ringOhms)
                ? ShadedPole.of(turns, r, poleArea(), 0.5, Quantity.of(1, Dimension.RESISTANCE)).withoutRing()
                : ShadedPole.of(turns, r, poleArea(), shaded, Quantity.of(ringOhms, Dimension.RESISTANCE));
        return p.withSeriesReluctance(Quantity.of(secant, Dimension.RELUCTANCE));
    }

    // ---- the steady state ----------------------------------------------------------------------

    private static double volts(Quantity v) {
        return Require.positive("RMS supply voltage", v, Dimension.VOLTAGE, Drive.MAX_VOLTS);
    }

    private static double hertz(Quantity f) {
        return Require.inRange("supply frequency", f, Dimension.FREQUENCY, 1e-3, Drive.MAX_SINE_HZ);
    }

    private MagneticCircuit circuitAt(double gap) {
        if (gap == 0) return iron;
        MagneticCircuit g = AirGap.of(Quantity.of(gap, Dimension.LENGTH), poleArea());
        if (leakage > 0) {
            g = MagneticCircuit.parallel(g, Core.of("leakage", Quantity.of(LEAK_LENGTH, Dimension.LENGTH),
                    Quantity.of(leakage * LEAK_LENGTH / MU0, Dimension.AREA), Materials.AIR));
        }
        return MagneticCircuit.series(iron, g);
    }

    private WoundCoil coilAt(double gap) {
        MagneticCircuit c = circuitAt(gap);
        WoundCoil w = winding != null ? WoundCoil.of(winding, c) : WoundCoil.of(turns, Quantity.of(r20, Dimension.RESISTANCE), c);
        return kelvin == Conductor.T20 ? w : (WoundCoil) w.atTemperature(Quantity.temperatureKelvin(kelvin));
    }

    private OperatingPoint solve(double v, double f, double gap, String state) {
        WoundCoil coil = coilAt(gap);
        double r = coil.resistanceAt(kelvin);
        double l0 = coil.incrementalInductanceAt(0);
        double w = 2 * Math.PI * f;
        // switched on where the small-signal steady current crosses zero: no offset for a linear coil
        double phase = Math.toDegrees(Math.atan2(w * l0, r));
        if (phase >= 360) phase = 0;
        double tauCycles = l0 / r * f;
        int cycles = 8;
        Transient run;
        double remaining;
        while (true) {
            Require.notInterrupted("the AC steady-state run");
            int n = cycles * SAMPLES_PER_CYCLE + 1;
            run = Drive.sine(Quantity.of(v, Dimension.VOLTAGE), Quantity.of(f, Dimension.FREQUENCY)).withSwitchOnPhase(phase).into(coil)
                    .samples(n).simulate(Quantity.of(cycles / f, Dimension.TIME));
            double[] i = run.current().values();
            double last = meanSquare(i, n - 1 - SAMPLES_PER_CYCLE), before = meanSquare(i, n - 1 - 2 * SAMPLES_PER_CYCLE);
            remaining = Math.abs(last - before) / last * Math.max(1, tauCycles);
            if (remaining <= SETTLED || cycles >= MAX_CYCLES) break;
            cycles = Math.min(MAX_CYCLES, cycles * 4);
        }
        return new OperatingPoint(this, coil, state, v, f, gap, r, run, phase, cycles, remaining);
    }

    /** Trapezoidal mean of i² over one cycle of samples from index {@code from}. */
    private static double meanSquare(double[] i, int from) {
        double s = 0.5 * (i[from] * i[from] + i[from + SAMPLES_PER_CYCLE] * i[from + SAMPLES_PER_CYCLE]);
        for (int k = from + 1; k < from + SAMPLES_PER_CYCLE; k++) s += i[k] * i[k];
        return s / SAMPLES_PER_CYCLE;
    }

    @Override
    public String toString() {
        String s = "AC solenoid: " + turns + " turns, " + resistance() + (kelvin == Conductor.T20 ? "" : " at " + Quantity.temperatureKelvin(kelvin))
                + ", pole " + poleArea() + ", stroke " + stroke() + ", residual gap " + closedGap();
        if (leakage > 0) s += ", leakage " + Quantity.of(leakage, Dimension.INDUCTANCE);
        s += ", iron " + iron.name();
        if (!Double.isNaN(ringOhms)) {
            s += String.format(Locale.ROOT, ", ring on %.0f %% of the pole, %s", 100 * shaded, Quantity.of(ringOhms, Dimension.RESISTANCE));
        }
        return s;
    }

    /**
     * The periodic steady state at one supply and gap, from the last cycle of the run: RMS and peak
     * current, apparent impedance, copper and core loss, real power, power factor, the mean pull of the
     * working gap (Maxwell's stress, without the ring) and the peak flux density in the iron.
     */
    public static final class OperatingPoint {
        private final String state;
        private final double volts, hertz, gap, ohms;
        private final double amps, peakAmps, copper, core, meanForce, peakIronB;
        final double peakFlux;
        private final int cycles;
        private final double remaining;
        private final Transient run;
        private final List<String> notes;

        private OperatingPoint(AcSolenoid s, WoundCoil coil, String state, double volts, double hertz, double gap, double ohms, Transient run,
                double phase, int cycles, double remaining) {
            this.state = state;
            this.volts = volts;
            this.hertz = hertz;
            this.gap = gap;
            this.ohms = ohms;
            this.run = run;
            this.cycles = cycles;
            this.remaining = remaining;
            this.amps = run.lastCycleRmsCurrent().si();
            this.peakAmps = run.lastCyclePeakCurrent().si();
            this.copper = amps * amps * ohms;

            double[] t = run.fluxLinkage().times(), lambda = run.fluxLinkage().values();
            int n = t.length, from = n - 1 - SAMPLES_PER_CYCLE;
            MagneticCircuit circuit = coil.circuit();
            List<MagneticCircuit> parts = circuit.parts();
            int m = parts.size(), ironParts = s.iron.parts().size();
            double[][] b = new double[m][SAMPLES_PER_CYCLE];
            double[] out = new double[m];
            int[] next = new int[1];
            double phiMax = 0, bIron = 0, force = 0;
            for (int j = 0; j < SAMPLES_PER_CYCLE; j++) {
                double phi = lambda[from + j] / coil.turns();
                phiMax = Math.max(phiMax, Math.abs(phi));
                next[0] = 0;
                circuit.fluxDensities(phi, out, next);
                for (int k = 0; k < m; k++) b[k][j] = out[k];
                for (int k = 0; k < ironParts; k++) if (parts.get(k) instanceof Core) bIron = Math.max(bIron, Math.abs(out[k]));
                if (gap > 0) force += out[ironParts] * out[ironParts]; // the working gap follows the iron in parts()
            }
            this.peakFlux = phiMax;
            this.peakIronB = bIron;
            this.meanForce = gap > 0 ? force / SAMPLES_PER_CYCLE * s.area / (2 * MU0) : Double.NaN;

            double energy = 0;
            boolean lossData = false;
            double dt = (t[n - 1] - t[from]) / SAMPLES_PER_CYCLE;
            for (int k = 0; k < ironParts; k++) {
                if (!(parts.get(k) instanceof Core)) continue;
                Core c = (Core) parts.get(k);
                if (c.material().coreLoss().isEmpty()) continue;
                lossData = true;
                energy += c.material().coreLoss().get().energyDensityAt(times(dt), fromMinimum(b[k])) * c.pathLength().si() * c.area().si();
            }
            this.core = lossData ? energy * hertz : Double.NaN;

            List<String> nt = new ArrayList<>();
            nt.add(String.format(Locale.ROOT, "periodic steady state from the last of %d cycles of a run switched on at %.1f°", cycles, phase));
            if (remaining > SETTLED) {
                nt.add(String.format(Locale.ROOT, "not settled after %d cycles: the mean square current may still change by %.1e", cycles, remaining));
            }
            if (!lossData) nt.add("the iron has no core-loss data: the real power is the copper loss alone");
            else nt.add("core loss by the iGSE of the iron's B(t) over the last cycle; the run draws it through its core-loss branch, so the supply delivers copper and core loss");
            if (!Double.isNaN(s.ringOhms)) nt.add("the shading ring is not in this run: its loss and reflected current are in holding()");
            notes = Collections.unmodifiableList(nt);
        }

        private static double[] times(double dt) {
            double[] t = new double[SAMPLES_PER_CYCLE + 1];
            for (int j = 0; j <= SAMPLES_PER_CYCLE; j++) t[j] = j * dt;
            return t;
        }

        /** One period of samples turned to start (and end) at its least value, so the iGSE sees one whole loop. */
        private static double[] fromMinimum(double[] b) {
            int p = b.length, at = 0;
            for (int j = 1; j < p; j++) if (b[j] < b[at]) at = j;
            double[] r = new double[p + 1];
            for (int j = 0; j <= p; j++) r[j] = b[(at + j) % p];
            return r;
        }

        /** Closed, open or held. */
        public String state() { return state; }
        public Quantity gap() { return Quantity.of(gap, Dimension.LENGTH); }
        /** RMS coil current over the last cycle. */
        public Quantity current() { return Quantity.of(amps, Dimension.CURRENT); }
        /** Largest |i| in the last cycle. */
        public Quantity peakCurrent() { return Quantity.of(peakAmps, Dimension.CURRENT); }
        /** Peak over RMS current: √2 for a sine, more when the iron saturates. */
        public double crestFactor() { return peakAmps / amps; }
        /** The apparent impedance V/I (RMS over RMS). */
        public Quantity impedance() { return Quantity.of(volts / amps, Dimension.RESISTANCE); }
        /** Coil resistance at its temperature. */
        public Quantity resistance() { return Quantity.of(ohms, Dimension.RESISTANCE); }
        /** I²·R with the RMS current of the last cycle. */
        public Quantity copperLoss() { return Quantity.of(copper, Dimension.POWER); }
        /** Core loss of the iron over the last cycle (iGSE), as a power; NaN without loss data. */
        public Quantity coreLoss() { return Quantity.of(core, Dimension.POWER); }
        /** Real power: copper loss plus core loss (the copper loss alone without loss data). */
        public Quantity power() { return Quantity.of(copper + (Double.isNaN(core) ? 0 : core), Dimension.POWER); }
        /** P/(V·I): the power factor of a non-sinusoidal current (IEEE Std 1459-2010). */
        public double powerFactor() { return power().si() / (volts * amps); }
        /** Mean pull of the working gap over the last cycle, ⟨B²⟩·A/(2μ0), without the ring; NaN with no gap. */
        public Quantity meanForce() { return Quantity.of(meanForce, Dimension.FORCE); }
        /** The highest flux density in any iron piece over the last cycle. */
        public Quantity peakIronFluxDensity() { return Quantity.of(peakIronB, Dimension.FLUX_DENSITY); }
        /** Supply cycles run to reach the steady state. */
        public int cycles() { return cycles; }
        /** The run whose last cycle this is. */
        public Transient run() { return run; }
        /** How the point was found, and what it leaves out. */
        public List<String> notes() { return notes; }

        /** The mains caution above 50 V RMS, deferring to local codes and licensed practice. */
        public List<String> cautions() {
            if (!(volts > CAUTION_VOLTS_RMS)) return List.of();
            return List.of("caution: " + Quantity.of(volts, Dimension.VOLTAGE) + " RMS is above the 50 V AC extra-low-voltage limit: "
                    + "mains wiring, fusing, insulation and enclosure follow local codes and licensed practice");
        }

        @Override
        public String toString() {
            String s = String.format(Locale.ROOT, "%s, gap %s, at %s RMS %s: %s RMS, %s peak (crest %.2f), |Z| %s, PF %.3f, %s (copper %s",
                    state, gap(), Quantity.of(volts, Dimension.VOLTAGE), Quantity.of(hertz, Dimension.FREQUENCY), current(), peakCurrent(),
                    crestFactor(), impedance(), powerFactor(), power(), copperLoss());
            s += Double.isNaN(core) ? ", no core-loss data)" : " + core " + coreLoss() + ")";
            if (gap > 0) s += ", pull " + meanForce() + " mean";
            if (!cautions().isEmpty()) {
                s += "; CAUTION: " + Quantity.of(volts, Dimension.VOLTAGE) + " RMS mains: wiring, fusing, insulation and enclosure to local codes and licensed practice";
            }
            return s;
        }
    }
}
