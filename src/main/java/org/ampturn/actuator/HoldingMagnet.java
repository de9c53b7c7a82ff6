package org.ampturn.actuator;

import org.ampturn.coil.MagneticCircuit;
import org.ampturn.drive.Armature;
import org.ampturn.drive.IronHysteresis;
import org.ampturn.drive.Marker;
import org.ampturn.drive.Transient;
import org.ampturn.material.Conductor;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;
import org.ampturn.wire.Winding;

/**
 * A holding electromagnet (or a magnetic latch) for transient runs: an {@link Electromagnet} whose
 * armature sits on the poles (at the residual gap, zero unless given) and is pulled off by a load
 * (a weight, a spring, a latch's return force). The drive energises the coil; after switch-off the
 * flux decays through the clamp, and the armature is released at the instant the magnetic pull
 * falls below the load; it then travels its release stroke to a stop.
 *
 * <p><b>Position.</b> As an {@link Armature} the position x is the armature's travel off the poles:
 * x = 0 is held (the drive's start stop, where a run begins), x = travel is released (the drive's
 * far stop). The gap is residual + x in each of the magnet's n gaps. In the drive's terms the
 * "force toward closing" is therefore the magnet's pull with its sign reversed, and the "restoring
 * force" is the load with its sign reversed: the run's force signal is −pull, its position the travel
 * off the poles, its "armature moves" marker the release instant, and its "pull-in" time the instant
 * the armature has travelled the stroke. {@link #release(Transient, Quantity)} reads both as times
 * after switch-off. At t = 0 the armature is taken as held on the poles (placed there, as when a
 * lifting magnet is set down on its load); it stays until the net pull, having held, falls below
 * the load. {@link #holdingCurrent()} says whether the coil current holds the load at all.
 *
 * <p><b>Magnetic circuit.</b> With φ = λ/N, {@code N·i = F_iron(φ) + φ·n·g/(μ0·A)}, the iron path's
 * MMF from its {@link MagneticCircuit} (saturating or not); field energy
 * {@code W = ∫F_iron dφ + ½φ²·n·g/(μ0·A)}; pull {@code −∂W/∂g = n·φ²/(2μ0·A)} (Maxwell's stress on
 * the n pole faces; Roters, Electromagnetic Devices, 1941, ch. 5; Fitzgerald, Kingsley and Umans,
 * Electric Machinery, 6th ed., ch. 3). Fringing and leakage are left out, as in
 * {@link Electromagnet}; valid while the gap is short against the pole's width. Without
 * {@link #withCoercivity} the flux decays to zero with the current; with it the run carries the
 * remanence ({@link #hysteresis()}): the flux falls to the residual, whose pull holds the armature
 * until the load overcomes it, and {@link #release} refuses a run the residual flux would hold
 * (see lib-docs/force.md).
 *
 * <p>Coil resistance follows annealed copper, α20 = 0.00393 /K (IEC 60028:1925), or the winding's
 * conductor.
 */
public final class HoldingMagnet implements Armature {
    private static final double MU0 = MagneticCircuit.MU0;

    private final Electromagnet magnet;
    private final double travel;
    private final double residual;
    private final double mass;
    private final double load;
    private final double rate;
    private final double preload;
    private final double damping;
    private final double r20;
    private final double kelvin;
    private final Conductor conductor;
    private final double coercivity;      // A/m, recoil-line remanence (0: none)
    private final double remanentLength;  // m, iron length that carries it

    private HoldingMagnet(Electromagnet magnet, double travel, double residual, double mass, double load, double rate, double preload,
                          double damping, double r20, double kelvin, Conductor conductor) {
        this(magnet, travel, residual, mass, load, rate, preload, damping, r20, kelvin, conductor, 0, 0);
    }

    private HoldingMagnet(Electromagnet magnet, double travel, double residual, double mass, double load, double rate, double preload,
                          double damping, double r20, double kelvin, Conductor conductor, double coercivity, double remanentLength) {
        this.coercivity = coercivity;
        this.remanentLength = remanentLength;
        this.magnet = magnet;
        this.travel = travel;
        this.residual = residual;
        this.mass = mass;
        this.load = load;
        this.rate = rate;
        this.preload = preload;
        this.damping = damping;
        this.r20 = r20;
        this.kelvin = kelvin;
        this.conductor = conductor;
    }

    /**
     * A holding magnet: {@code magnet} with its coil of {@code coilResistance} at 20 °C, whose
     * armature travels {@code releaseStroke} off the poles to its stop when released. Defaults:
     * no residual gap, armature mass 50 g, no load, no spring, no damping. The iron path must have
     * some reluctance, or a residual gap be given, so that the closed magnet's inductance is finite.
     */
    public static HoldingMagnet of(Electromagnet magnet, Quantity coilResistance, Quantity releaseStroke) {
        if (magnet == null) throw Require.fail("electromagnet is missing (null)");
        double r = Require.positive("coil resistance", coilResistance, Dimension.RESISTANCE);
        double s = Require.length("release stroke", releaseStroke);
        return new HoldingMagnet(magnet, s, 0, 0.050, 0, 0, 0, 0, r, Conductor.T20, Conductor.COPPER).checked();
    }

    /**
     * A holding magnet whose coil is a {@link Winding}: its turns must match the magnet's; its
     * resistance at 20 °C and its conductor's temperature coefficient come from the winding.
     */
    public static HoldingMagnet of(Electromagnet magnet, Winding winding, Quantity releaseStroke) {
        if (winding == null) throw Require.fail("winding is missing (null)");
        if (magnet == null) throw Require.fail("electromagnet is missing (null)");
        if (winding.turns() != magnet.turns()) {
            throw Require.fail("the winding has " + winding.turns() + " turns but the electromagnet " + magnet.turns());
        }
        HoldingMagnet h = of(magnet, winding.resistance(), releaseStroke);
        return new HoldingMagnet(magnet, h.travel, 0, h.mass, 0, 0, 0, 0, winding.resistance().si(), Conductor.T20, winding.conductor());
    }

    private HoldingMagnet checked() {
        if (!(closedReluctance() > 0)) {
            throw Require.fail("the closed magnet has no reluctance (iron path without reluctance and no residual gap): give a residual gap");
        }
        return this;
    }

    private HoldingMagnet copy(double residual, double mass, double load, double rate, double preload, double damping, double kelvin) {
        return new HoldingMagnet(magnet, travel, residual, mass, load, rate, preload, damping, r20, kelvin, conductor, coercivity,
                remanentLength).checked();
    }

    /**
     * Remanence by the recoil-line model, as for {@link Plunger#withCoercivity}: once magnetised, the
     * iron acts as an MMF source Hc·l behind the iron path's own reluctance (its initial
     * permeability taken as the recoil permeability; the load-line method of permanent-magnet
     * circuits, e.g. Parker, Advances in Permanent Magnetism, Wiley 1990, ch. 4, from memory). Soft
     * iron's Hc is of the order of 50 to 200 A/m (common practice). Statically it gives the
     * residual flux and pull and the drop-out current, and {@link #release} refuses a run when the
     * residual pull alone holds the load. The transient run carries it as a play operator of
     * half-width Hc over that length ({@link #hysteresis()}).
     */
    public HoldingMagnet withCoercivity(Quantity coerciveField, Quantity ironLength) {
        double hc = Require.nonNegative("coercive field", coerciveField, Dimension.CURRENT.div(Dimension.LENGTH));
        double l = Require.length("iron length", ironLength);
        return new HoldingMagnet(magnet, travel, residual, mass, load, rate, preload, damping, r20, kelvin, conductor, hc, l).checked();
    }

    /** The iron's hysteresis for the run: a play operator of half-width Hc over the remanent length, none without {@link #withCoercivity}. */
    @Override
    public IronHysteresis hysteresis() {
        return coercivity > 0 ? IronHysteresis.ofSI(coercivity * remanentLength, magnet.turns()) : IronHysteresis.NONE;
    }

    /** Gap left between armature and poles when held (plating, a non-magnetic shim), in each of the magnet's gaps. */
    public HoldingMagnet withResidualGap(Quantity gap) {
        return copy(Require.lengthOrZero("residual gap", gap), mass, load, rate, preload, damping, kelvin);
    }

    /** Moving mass: armature and whatever it carries. */
    public HoldingMagnet withMass(Quantity m) {
        return copy(residual, Require.positive("moving mass", m, Dimension.MASS), load, rate, preload, damping, kelvin);
    }

    /** Constant load pulling the armature off the poles (a weight, a latch's pull). */
    public HoldingMagnet withLoad(Quantity force) {
        return copy(residual, mass, Require.nonNegative("load force", force, Dimension.FORCE), rate, preload, damping, kelvin);
    }

    /**
     * A kick-off spring, compressed when the armature is held: it pushes the armature off with
     * {@code preload − stiffness·x}, relaxing as the armature travels x.
     */
    public HoldingMagnet withSpring(Quantity stiffness, Quantity preload) {
        double k = Require.nonNegative("spring stiffness", stiffness, Dimension.STIFFNESS);
        double f0 = Require.nonNegative("spring preload", preload, Dimension.FORCE);
        return copy(residual, mass, load, k, f0, damping, kelvin);
    }

    /** Viscous damping coefficient in N·s/m. */
    public HoldingMagnet withDamping(double newtonSecondsPerMetre) {
        return copy(residual, mass, load, rate, preload, Require.nonNegative("damping (N·s/m)", newtonSecondsPerMetre), kelvin);
    }

    @Override
    public HoldingMagnet atTemperature(Quantity temperature) {
        return copy(residual, mass, load, rate, preload, damping, Conductor.kelvin("temperature", temperature));
    }

    public Electromagnet magnet() { return magnet; }

    // ---------------------------------------------------------------- kernels (SI)

    private double gapReluctance(double x) {
        return magnet.gaps() * Math.max(residual + x, 0) / (MU0 * magnet.areaSI());
    }

    private double closedReluctance() {
        return magnet.ironPath().reluctanceSI() + gapReluctance(0);
    }

    @Override
    public double currentAt(double weberTurns, double metres) {
        Require.finite("flux linkage (Wb)", weberTurns);
        Require.finite("position (m)", metres);
        double phi = weberTurns / magnet.turns();
        return Require.result("current", (magnet.ironPath().mmfAt(phi) + phi * gapReluctance(metres)) / magnet.turns());
    }


    @Override
    public double fieldEnergyAt(double weberTurns, double metres) {
        Require.finite("flux linkage (Wb)", weberTurns);
        Require.finite("position (m)", metres);
        double phi = weberTurns / magnet.turns();
        double w = 0.5 * phi * phi * gapReluctance(metres);
        MagneticCircuit c = magnet.ironPath();
        w += c.energyAt(phi);
        return Require.result("field energy", w);
    }

    /** −∂W/∂x at constant λ: the pull n·φ²/(2μ0A) toward the poles, negative in the drive's sense. */
    @Override
    public double forceAt(double weberTurns, double metres) {
        Require.finite("flux linkage (Wb)", weberTurns);
        Require.finite("position (m)", metres);
        if (residual + metres < 0) return 0;
        double phi = weberTurns / magnet.turns();
        return Require.result("force", -pullAt(phi));
    }

    private double pullAt(double phi) {
        return magnet.gaps() * phi * phi / (2 * MU0 * magnet.areaSI());
    }

    /** Load and spring pulling the armature off (negative: away from the drive's start stop), plus damping. */
    @Override
    public double restoringForceAt(double metres, double metresPerSecond) {
        Require.finite("position (m)", metres);
        Require.finite("speed (m/s)", metresPerSecond);
        return Require.result("restoring force", damping * metresPerSecond - (load + preload - rate * metres));
    }

    @Override public double massKg() { return mass; }
    @Override public double strokeMetres() { return travel; }
    @Override public double resistanceOhms() { return r20 * conductor.resistanceRatioAt(kelvin); }

    @Override
    public double inductanceAt(double metres) {
        Require.finite("position (m)", metres);
        return Require.result("inductance", magnet.turns() * (double) magnet.turns() / (magnet.ironPath().reluctanceSI() + gapReluctance(metres)));
    }

    @Override public Quantity temperature() { return Quantity.temperatureKelvin(kelvin); }

    // ---------------------------------------------------------------- static figures

    /** Force pulling the armature off while it is held: load plus spring preload. */
    public Quantity releaseForce() { return Quantity.of(load + preload, Dimension.FORCE); }

    /** Small-signal inductance with the armature held. */
    public Quantity inductanceHeld() { return Quantity.of(inductanceAt(0), Dimension.INDUCTANCE); }

    /** Gap flux (Wb) at which the pull on the held armature equals the release force: √(2μ0A·F/n). */
    double releaseFlux() {
        return Math.sqrt(2 * MU0 * magnet.areaSI() * (load + preload) / magnet.gaps());
    }

    /**
     * The steady coil current below which the held armature is released: the current that carries
     * the release flux through the closed circuit (the static drop-out current; zero without a load).
     */
    public Quantity holdingCurrent() {
        return Quantity.of(currentAt(magnet.turns() * releaseFlux(), 0), Dimension.CURRENT);
    }

    /** Flux (Wb) left in the held magnet at zero current: Hc·l over the closed circuit's reluctance (recoil line). */
    public Quantity residualFlux() {
        return Quantity.of(coercivity * remanentLength / closedReluctance(), Dimension.FLUX);
    }

    /** Pull of the residual flux on the held armature at zero current, n·φr²/(2μ0A). */
    public Quantity residualForce() {
        return Quantity.of(pullAt(residualFlux().si()), Dimension.FORCE);
    }

    /** True when load and spring overcome the residual pull, so that the armature is released at zero current. */
    public boolean releasesAtZeroCurrent() {
        return residualForce().si() < load + preload;
    }

    /**
     * Drop-out current on the recoil line: {@code (φ_release·R_closed − Hc·l)/N}; the
     * {@link #holdingCurrent()} without remanence, negative when the residual flux alone holds the load.
     */
    public Quantity dropOutCurrent() {
        return Quantity.of(holdingCurrent().si() - coercivity * remanentLength / magnet.turns(), Dimension.CURRENT);
    }

    /**
     * Release times of a run of this magnet whose switch opened at {@code switchOff}: when the
     * armature starts to leave the poles and when it reaches its stop, both after switch-off (NaN
     * for what did not happen within the run). Fails when the current at switch-off was below the
     * {@link #holdingCurrent()}: the magnet never held the load, so no release time exists; and,
     * with {@link #withCoercivity}, when the residual pull alone holds the load. With a remanence
     * that does release, the run carries it: the flux falls to the residual and the armature leaves
     * once the falling pull meets the load.
     */
    public Release release(Transient run, Quantity switchOff) {
        if (run == null) throw Require.fail("run is missing (null)");
        double off = Require.si("switch-off time", switchOff, Dimension.TIME);
        if (!releasesAtZeroCurrent()) {
            throw Require.fail("the residual flux holds the load: its pull (" + residualForce() + ") is not below the release force ("
                    + releaseForce() + "), so the armature is not released after switch-off; a thicker residual gap releases it");
        }
        double start = Double.NaN;
        for (Marker m : run.markers()) {
            if (m.label().equals("armature moves")) {
                start = m.time().si();
                break;
            }
        }
        double hold = holdingCurrent().si();
        if (Double.isNaN(start)) {
            double iOff = run.current().valueAt(Math.min(off, run.duration().si()));
            if (!(iOff > hold)) {
                throw Require.fail("the magnet never held the load: the current at switch-off (" + Quantity.of(iOff, Dimension.CURRENT)
                        + ") is not above the holding current (" + Quantity.of(hold, Dimension.CURRENT) + ")");
            }
        } else if (start < off) {
            throw Require.fail("the armature left the poles at " + Quantity.of(start, Dimension.TIME) + ", before the switch-off at " + switchOff);
        }
        double end = run.pullInTime().si();
        return new Release(Quantity.of(start - off, Dimension.TIME), Quantity.of(end - off, Dimension.TIME));
    }

    /** Times after switch-off: the armature starts to leave the poles, and reaches its stop. */
    public record Release(Quantity start, Quantity travelled) {
        @Override
        public String toString() {
            return "release starts " + start + " after switch-off, stroke travelled at " + travelled;
        }
    }

    @Override
    public String describe() {
        return "holding magnet " + magnet.turns() + " turns, " + magnet.gaps() + " gap" + (magnet.gaps() == 1 ? "" : "s") + " of "
                + magnet.poleArea() + ", L " + inductanceHeld() + " held, " + Quantity.of(resistanceOhms(), Dimension.RESISTANCE)
                + ", release force " + releaseForce() + ", stroke " + Quantity.of(travel, Dimension.LENGTH)
                + (residual > 0 ? ", residual gap " + Quantity.of(residual, Dimension.LENGTH) : "")
                + ", mass " + Quantity.of(mass, Dimension.MASS)
                + (coercivity > 0 ? ", coercive field " + Quantity.of(coercivity, Dimension.CURRENT.div(Dimension.LENGTH)) : "");
    }

    @Override
    public String toString() { return describe(); }
}
