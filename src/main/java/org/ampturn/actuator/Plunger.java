package org.ampturn.actuator;

import org.ampturn.coil.MagneticCircuit;
import org.ampturn.drive.Armature;
import org.ampturn.drive.Drive;
import org.ampturn.material.Conductor;
import org.ampturn.wire.Winding;
import org.ampturn.drive.EddyLadder;
import org.ampturn.drive.IronHysteresis;
import org.ampturn.material.MagneticMaterial;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;

/**
 * A plunger (solenoid) actuator for transient runs: a coil of N turns on a magnetic circuit made of
 * a working gap that closes as the plunger travels, a fixed parasitic gap (the sliding gap around
 * the plunger and the residual gap of a non-magnetic stop), and an iron path; a plunger of mass m
 * held open by a return spring with preload, working against a constant load force, between end
 * stops at 0 (open) and the stroke (closed).
 *
 * <p>Magnetic circuit (lumped reluctances; Roters, Electromagnetic Devices, Wiley 1941, ch. 5 and 7;
 * Hughes, Electric Motors and Drives, 4th ed., ch. 1, from memory): with flux φ = λ/N and B = φ/A,
 * <pre>N·i = φ·(g(x)/(μ0·A) + gp/(μ0·Ap)) + l_fe·H_fe(B),   g(x) = stroke + residual − x</pre>
 * so the current follows explicitly from λ and x, even with a saturating iron B-H curve. Field
 * energy {@code W = ½φ²·(Rg + Rp) + A·l_fe·∫H dB}; force at constant λ
 * {@code F = −∂W/∂x = B²·A/(2·μ0)} (Maxwell's pull on the working gap; Fitzgerald, Kingsley and
 * Umans, Electric Machinery, 6th ed., ch. 3). By default the gap is ideal, valid while it is short
 * against the pole's width; {@link #withFringing} adds the fringe at the gap and
 * {@link #withFrameLeakage} the leakage from plunger to frame across the coil (both raise the
 * inductance at large gaps; the force then follows from the gap permeance's slope). Friction other
 * than viscous damping is left out; eddy currents and rebound at the stops are options. See
 * lib-docs/plunger.md.
 *
 * <p>Resistance follows annealed copper, α20 = 0.00393 /K (IEC 60028:1925).
 */
public final class Plunger implements Armature {
    private static final double MU0 = MagneticMaterial.MU0;
    private static final double T20 = org.ampturn.material.Conductor.T20;

    private final int turns;
    private final double area;
    private final double stroke;
    private final double residual;
    private final double parasitic;
    private final double parasiticArea;
    private final double ironLength;
    private final MagneticMaterial iron;
    private final double mass;
    private final double stiffness;
    private final double preload;
    private final double load;
    private final double damping;
    private final double r20;
    private final double kelvin;
    private final Extras ex;

    /** Eddy currents and stops: the parts of the model beyond the magnetic circuit and the spring. */
    private record Extras(Eddy eddy, double restitution, Pole pole, double fringe, MagneticCircuit path, Conductor conductor,
                          double coercivity, double leakage) {
        static final Extras NONE = new Extras(null, 0, Pole.FLAT, Double.NaN, null, Conductor.COPPER, 0, 0);
        Extras eddy(Eddy e) { return new Extras(e, restitution, pole, fringe, path, conductor, coercivity, leakage); }
        Extras restitution(double e) { return new Extras(eddy, e, pole, fringe, path, conductor, coercivity, leakage); }
        Extras pole(Pole p) { return new Extras(eddy, restitution, p, fringe, path, conductor, coercivity, leakage); }
        Extras fringe(double t) { return new Extras(eddy, restitution, pole, t, path, conductor, coercivity, leakage); }
        Extras path(MagneticCircuit c) { return new Extras(eddy, restitution, pole, fringe, c, conductor, coercivity, leakage); }
        Extras conductor(Conductor c) { return new Extras(eddy, restitution, pole, fringe, path, c, coercivity, leakage); }
        Extras coercivity(double hc) { return new Extras(eddy, restitution, pole, fringe, path, conductor, hc, leakage); }
        Extras leakage(double p) { return new Extras(eddy, restitution, pole, fringe, path, conductor, coercivity, p); }
    }

    /**
     * The working gap's pole shape: flat; conical, the face at {@code angle} to the axis of motion
     * (90° is flat), which sets the gap normal to the face to g·sin α over an area A/sin α; or
     * stepped, a share of the area at the gap g and the rest set back by a step s.
     */
    private record Pole(String kind, double angle, double sin2, double innerShare, double step) {
        static final Pole FLAT = new Pole("flat", 90, 1, 1, 0);
    }

    /**
     * Where eddy currents flow: a loop of fixed resistance, a copper slug (resistance follows the
     * copper's temperature), or the solid iron of the plunger (shells of a rod). SI.
     */
    private record Eddy(String kind, double loopOhms, double slugFactor, double radius, double length, double resistivity,
                        int sections, double leakage) {}

    private Plunger(int turns, double area, double stroke, double residual, double parasitic, double parasiticArea,
                    double ironLength, MagneticMaterial iron, double mass, double stiffness, double preload, double load,
                    double damping, double r20, double kelvin) {
        this(turns, area, stroke, residual, parasitic, parasiticArea, ironLength, iron, mass, stiffness, preload, load, damping,
                r20, kelvin, Extras.NONE);
    }

    private Plunger(int turns, double area, double stroke, double residual, double parasitic, double parasiticArea,
                    double ironLength, MagneticMaterial iron, double mass, double stiffness, double preload, double load,
                    double damping, double r20, double kelvin, Extras ex) {
        this.ex = ex;
        this.turns = turns;
        this.area = area;
        this.stroke = stroke;
        this.residual = residual;
        this.parasitic = parasitic;
        this.parasiticArea = parasiticArea;
        this.ironLength = ironLength;
        this.iron = iron;
        this.mass = mass;
        this.stiffness = stiffness;
        this.preload = preload;
        this.load = load;
        this.damping = damping;
        this.r20 = r20;
        this.kelvin = kelvin;
    }

    /**
     * A plunger of {@code turns} on a pole face of {@code poleArea} with the given stroke. Defaults:
     * residual gap 0.05 mm, parasitic gap 0.1 mm of the pole area, no iron reluctance, mass 10 g,
     * no spring, no load, no damping, coil resistance 10 Ω at 20 °C. Change them with the {@code with…} methods.
     */
    public static Plunger of(int turns, Quantity poleArea, Quantity stroke) {
        Require.turns("turns", turns);
        double a = Require.positive("pole area", poleArea, Dimension.AREA);
        double s = Require.length("stroke", stroke);
        return new Plunger(turns, a, s, 0.05e-3, 0.1e-3, a, 0, null, 0.010, 0, 0, 0, 0, 10, T20);
    }

    /**
     * A plunger whose coil is a {@link Winding}: its turns, and its resistance at 20 °C with its
     * conductor's temperature coefficient, come from the winding. The other defaults are those of
     * {@link #of(int, Quantity, Quantity)}.
     */
    public static Plunger of(Winding winding, Quantity poleArea, Quantity stroke) {
        if (winding == null) throw Require.fail("winding is missing (null)");
        Plunger p = of(winding.turns(), poleArea, stroke);
        Plunger q = p.copy(p.residual, p.parasitic, p.parasiticArea, p.ironLength, p.iron, p.mass, p.stiffness, p.preload, p.load,
                p.damping, winding.resistance().si(), p.kelvin);
        return q.with(q.ex.conductor(winding.conductor()));
    }

    /**
     * The iron path (frame, pole pieces, any fixed gaps of it) as a {@link MagneticCircuit} in
     * series with the working and parasitic gaps: its MMF at the gap's flux, {@code mmfAt(φ)}, adds
     * to the coil's, so a saturating frame limits the pull. Adds to {@link #withIron}'s path if
     * both are given.
     */
    public Plunger withIronPath(MagneticCircuit path) {
        if (path == null) throw Require.fail("iron path is missing (null)");
        return with(ex.path(path));
    }

    private Plunger copy(double residual, double parasitic, double parasiticArea, double ironLength, MagneticMaterial iron,
                         double mass, double stiffness, double preload, double load, double damping, double r20, double kelvin) {
        return new Plunger(turns, area, stroke, residual, parasitic, parasiticArea, ironLength, iron, mass, stiffness, preload,
                load, damping, r20, kelvin, ex);
    }

    private Plunger with(Extras e) {
        return new Plunger(turns, area, stroke, residual, parasitic, parasiticArea, ironLength, iron, mass, stiffness, preload,
                load, damping, r20, kelvin, e);
    }

    // ---------------------------------------------------------------- eddy currents and stops

    /**
     * A shorted turn coupled to the coil: one loop of {@code loopResistance}, with {@code leakage}
     * the inductance (seen from the coil) of the flux that links the coil but not the loop. The
     * loop acts as a transformer's shorted secondary (see {@link EddyLadder}); it slows the rise and
     * the decay of the flux (a time-delay relay). Replaces any other eddy-current model.
     */
    public Plunger withShortedTurn(Quantity loopResistance, Quantity leakage) {
        double r = Require.positive("shorted-turn resistance", loopResistance, Dimension.RESISTANCE);
        double l = Require.positive("leakage inductance", leakage, Dimension.INDUCTANCE);
        return with(ex.eddy(new Eddy("shorted turn", r, 0, 0, 0, 0, 1, l)));
    }

    /**
     * A copper slug (a tube around the flux path): one turn of mean diameter D, radial thickness t and
     * axial length l, resistance {@code ρ·π·D/(l·t)} with annealed copper's ρ at the plunger's
     * temperature (IEC 60028); {@code radialSpace} is the room it sits in, which the thickness may not
     * exceed. {@code leakage} as in {@link #withShortedTurn}.
     */
    public Plunger withCopperSlug(Quantity meanDiameter, Quantity thickness, Quantity length, Quantity radialSpace, Quantity leakage) {
        double d = Require.length("slug mean diameter", meanDiameter);
        double t = Require.length("slug thickness", thickness);
        double l = Require.length("slug length", length);
        double space = Require.length("radial space for the slug", radialSpace);
        if (!(t <= space)) {
            throw Require.fail("slug thickness (" + thickness + ") must not exceed the radial space it sits in (" + radialSpace + ")");
        }
        if (!(t < d)) throw Require.fail("slug thickness (" + thickness + ") must be less than its mean diameter (" + meanDiameter + ")");
        double lk = Require.positive("leakage inductance", leakage, Dimension.INDUCTANCE);
        return with(ex.eddy(new Eddy("copper slug", 0, Math.PI * d / (l * t), 0, 0, 0, 1, lk)));
    }

    /**
     * Eddy currents in the solid iron of a round plunger of {@code diameter} over {@code length}, of
     * the iron's {@code resistivity} (Ω·m; low-carbon steel is near 1.5e-7 Ω·m, common practice),
     * as a ladder of {@code sections} concentric shells of equal thickness (1 to 16; see
     * {@link EddyLadder}). Shell k, between radii a_(k+1) and a_k, is a loop of resistance
     * {@code 8πρ·a_k⁴/(l·(a_k⁴ − a_(k+1)⁴))}: under a uniform dB/dt it dissipates exactly its part of
     * the rod's loss {@code (dB/dt)²·π·l·a⁴/(8ρ)} (E = (r/2)·dB/dt inside a rod; Lammeraner and Štafl,
     * Eddy Currents, 1966, ch. 3, from memory), so one section is the rod's low-frequency equivalent
     * shorted turn {@code 8πρ/l}. Each shell's flux tube has its area share of the pole. More
     * sections follow the diffusion of flux into the rod from its surface, which is what delays the
     * pull of a solid plunger; the lumped tubes hold while the plunger's cross-section carries the
     * pole's flux. {@code leakage} as in {@link #withShortedTurn}.
     */
    public Plunger withSolidIron(Quantity diameter, Quantity length, Quantity resistivity, int sections, Quantity leakage) {
        double dia = Require.length("plunger diameter", diameter);
        double l = Require.length("eddy-current path length", length);
        double rho = Require.positive("iron resistivity", resistivity, Dimension.RESISTIVITY);
        Require.between("sections", sections, 1, EddyLadder.MAX_SECTIONS);
        double lk = Require.positive("leakage inductance", leakage, Dimension.INDUCTANCE);
        return with(ex.eddy(new Eddy("solid iron", 0, 0, dia / 2, l, rho, sections, lk)));
    }

    /** No eddy currents and no shorted turn (the default). */
    public Plunger withoutEddyCurrents() {
        return with(ex.eddy(null));
    }

    /**
     * Coefficient of restitution e at both stops, from 0 (the plunger stops dead, the default) to 1:
     * the plunger rebounds at e times its impact speed (Newton's law of impact); the run counts the
     * bounces and reports the impact speed.
     */
    public Plunger withRestitution(double coefficient) {
        Require.between("coefficient of restitution", coefficient, 0, 1);
        return with(ex.restitution(coefficient));
    }

    @Override
    public double restitution() { return ex.restitution(); }

    // ---------------------------------------------------------------- pole shape and fringing

    /**
     * A conical pole: the faces of plunger and stop are cones whose surface makes {@code degrees}
     * with the axis of motion (strictly between 0° and 90°; 90° would be flat). At axial gap g the
     * gap across the faces is g·sin α over the area A/sin α, so the gap permeance is
     * μ0·A/(g·sin²α): more pull at long stroke, less when nearly closed, than a flat face
     * (Roters, Electromagnetic Devices, 1941, ch. 8, from memory). Valid while the cone's gap is
     * small against its slant height.
     */
    public Plunger withConicalPole(double degrees) {
        if (!(degrees > 0 && degrees < 90)) {
            throw Require.fail("cone angle must be between 0° and 90° (exclusive), got " + Require.show(degrees) + "°");
        }
        double a = Math.toRadians(degrees);
        double sin = Math.sin(a);
        return with(ex.pole(new Pole("conical", degrees, sin * sin, 1, 0)));
    }

    /**
     * A stepped pole: the share {@code innerShare} of the pole area (0 to 1, exclusive) meets the
     * stop at the gap g, the rest is set back by {@code step}: permeance μ0·(A1/g + A2/(g + s)).
     */
    public Plunger withSteppedPole(double innerShare, Quantity step) {
        Require.between("inner share of the pole area", innerShare, 1e-6, 1 - 1e-6);
        double s = Require.length("pole step", step);
        return with(ex.pole(new Pole("stepped", Math.PI / 2, 1, innerShare, s)));
    }

    /** A flat pole face (the default). */
    public Plunger withFlatPole() {
        return with(ex.pole(Pole.FLAT));
    }

    /**
     * Fringing at the working gap by Roters' probable flux paths ({@link Permeance}): around the
     * edge of a round pole (perimeter 2√(πA)) a half cylinder, 0.264·μ0 per metre of edge, and a
     * half annulus from the side faces, (μ0/π)·ln(1 + 2t/g) per metre, t the {@code width} of side
     * face the fringe reaches (the exposed length of the plunger, say). Both add to the gap
     * permeance, so the inductance at large gaps rises, and the force follows from the permeance's
     * slope: F = ½·(φ/P)²·(−dP/dg).
     */
    public Plunger withFringing(Quantity width) {
        double t = Require.length("fringe width", width);
        return with(ex.fringe(t));
    }

    /**
     * Leakage between plunger and frame: the flux that crosses the coil space radially from the
     * plunger (radius r1) to the frame's shell (inner radius r2) over the coil's {@code length}
     * instead of the working gap. The coaxial-cylinder permeance 2π·μ0·l/ln(r2/r1)
     * ({@link Permeance#coaxialAt}) sees the gap's MMF rising linearly along the coil, so one third
     * of it counts for the stored energy and the flux linkage (Roters, Electromagnetic Devices,
     * 1941, ch. 7, from memory); that third shunts the working gap. It does not change with the
     * stroke, so it adds to the inductance (most at large gaps, where the gap's own permeance is
     * small) and leaves the pull at a given gap MMF alone; at a given coil current the pull falls
     * a little where the parasitic gap or the iron takes part of the MMF.
     */
    public Plunger withFrameLeakage(Quantity coilLength, Quantity plungerRadius, Quantity frameInnerRadius) {
        double l = Require.length("coil length", coilLength);
        double r1 = Require.length("plunger radius", plungerRadius), r2 = Require.length("frame inner radius", frameInnerRadius);
        if (!(r2 > r1)) {
            throw Require.fail("frame inner radius (" + frameInnerRadius + ") must be greater than the plunger radius (" + plungerRadius + ")");
        }
        return with(ex.leakage(Permeance.coaxialAt(l, r1, r2) / 3));
    }

    /** No plunger-to-frame leakage (the default). */
    public Plunger withoutFrameLeakage() {
        return with(ex.leakage(0));
    }

    /** The leakage permeance that shunts the working gap (H): a third of the coaxial one, zero without {@link #withFrameLeakage}. */
    public Quantity frameLeakagePermeance() {
        return Quantity.of(ex.leakage(), Dimension.INDUCTANCE);
    }

    /** Working-gap permeance (H) at axial gap g (m), with the frame leakage across it; {@code slope[0]} gets dP/dg when not null. */
    private double gapPermeance(double g, double[] slope) {
        Pole p = ex.pole();
        double a1 = area * p.innerShare(), a2 = area - a1;
        double perm = MU0 * a1 / (g * p.sin2());
        double d = -perm / g;
        double edge = g;
        if (a2 > 0) {
            double g2 = g + p.step();
            perm += MU0 * a2 / g2;
            d -= MU0 * a2 / (g2 * g2);
            edge = g2;
        }
        double t = ex.fringe();
        if (!Double.isNaN(t)) {
            double perimeter = 2 * Math.sqrt(Math.PI * area);
            perm += Permeance.halfCylinderAt(perimeter) + Permeance.halfAnnulusAt(perimeter, edge, t);
            d += Permeance.halfAnnulusSlopeAt(perimeter, edge, t);
        }
        perm += ex.leakage();
        if (slope != null) slope[0] = d;
        return perm;
    }

    private boolean idealGap() {
        return ex.pole() == Pole.FLAT && Double.isNaN(ex.fringe()) && ex.leakage() == 0;
    }

    /** The working gap's permeance at a position: with fringing, the pole's shape and the frame leakage across it. */
    public Quantity gapPermeance(Quantity position) {
        double x = Require.between("position (m)", Require.distance("position", position), 0, stroke);
        double g = stroke + residual - x;
        if (!(g > 0)) throw Require.fail("the gap is closed at " + position + " (no residual gap): its permeance is unbounded");
        return Quantity.of(gapPermeance(g, null), Dimension.INDUCTANCE);
    }

    @Override
    public EddyLadder eddyLadder() {
        Eddy e = ex.eddy();
        if (e == null) return EddyLadder.NONE;
        double n2 = (double) turns * turns;
        switch (e.kind()) {
            case "shorted turn":
                return EddyLadder.ofSI(e.leakage(), new double[] {n2 * e.loopOhms()}, new double[] {1});
            case "copper slug":
                return EddyLadder.ofSI(e.leakage(),
                        new double[] {n2 * org.ampturn.material.Conductor.COPPER.resistivityAt(kelvin) * e.slugFactor()}, new double[] {1});
            default: {
                int m = e.sections();
                double[] shunt = new double[m], share = new double[m];
                double sum = 0;
                for (int k = 0; k < m; k++) {
                    double outer = (double) (m - k) / m, inner = (double) (m - k - 1) / m; // radii over a
                    double o4 = Math.pow(outer, 4), i4 = Math.pow(inner, 4);
                    shunt[k] = n2 * 8 * Math.PI * e.resistivity() * o4 / (e.length() * (o4 - i4));
                    share[k] = outer * outer - inner * inner;
                    sum += share[k];
                }
                share[m - 1] += 1 - sum; // rounding
                return EddyLadder.ofSI(e.leakage(), shunt, share);
            }
        }
    }

    /** Gap left when closed (a non-magnetic stop or plating), in series with the working gap. */
    public Plunger withResidualGap(Quantity gap) {
        double g = Require.lengthOrZero("residual gap", gap);
        return copy(g, parasitic, parasiticArea, ironLength, iron, mass, stiffness, preload, load, damping, r20, kelvin);
    }

    /** Fixed parasitic gap (the radial sliding gap) of the given length and area. */
    public Plunger withParasiticGap(Quantity gap, Quantity gapArea) {
        double g = Require.lengthOrZero("parasitic gap", gap);
        double a = Require.positive("parasitic gap area", gapArea, Dimension.AREA);
        return copy(residual, g, a, ironLength, iron, mass, stiffness, preload, load, damping, r20, kelvin);
    }

    /** Iron path of the given mean length and material, with the pole's cross-section. */
    public Plunger withIron(Quantity pathLength, MagneticMaterial material) {
        double l = Require.length("iron path length", pathLength);
        if (material == null) throw Require.fail("iron material is missing (null)");
        return copy(residual, parasitic, parasiticArea, l, material, mass, stiffness, preload, load, damping, r20, kelvin);
    }

    public Plunger withMass(Quantity m) {
        double v = Require.positive("moving mass", m, Dimension.MASS);
        return copy(residual, parasitic, parasiticArea, ironLength, iron, v, stiffness, preload, load, damping, r20, kelvin);
    }

    /** Return spring: force {@code preload + stiffness·x} toward open. */
    public Plunger withSpring(Quantity stiffness, Quantity preload) {
        double k = Require.nonNegative("spring stiffness", stiffness, Dimension.STIFFNESS);
        double f0 = Require.nonNegative("spring preload", preload, Dimension.FORCE);
        return copy(residual, parasitic, parasiticArea, ironLength, iron, mass, k, f0, load, damping, r20, kelvin);
    }

    /** Constant load force against closing (a valve's pressure force, a latch). */
    public Plunger withLoad(Quantity force) {
        double f = Require.nonNegative("load force", force, Dimension.FORCE);
        return copy(residual, parasitic, parasiticArea, ironLength, iron, mass, stiffness, preload, f, damping, r20, kelvin);
    }

    /** Viscous damping coefficient in N·s/m (air or oil in the plunger tube). */
    public Plunger withDamping(double newtonSecondsPerMetre) {
        double c = Require.nonNegative("damping (N·s/m)", newtonSecondsPerMetre);
        return copy(residual, parasitic, parasiticArea, ironLength, iron, mass, stiffness, preload, load, c, r20, kelvin);
    }

    /** Coil resistance at 20 °C. */
    public Plunger withResistance(Quantity r) {
        double v = Require.positive("coil resistance", r, Dimension.RESISTANCE);
        return copy(residual, parasitic, parasiticArea, ironLength, iron, mass, stiffness, preload, load, damping, v, kelvin);
    }

    @Override
    public Plunger atTemperature(Quantity temperature) {
        double k = org.ampturn.material.Conductor.kelvin("temperature", temperature);
        return copy(residual, parasitic, parasiticArea, ironLength, iron, mass, stiffness, preload, load, damping, r20, k);
    }

    // ---------------------------------------------------------------- kernels

    private double gapReluctance(double x) {
        double g = Math.max(stroke + residual - x, 0);
        double rp = parasitic / (MU0 * parasiticArea);
        if (idealGap()) return g / (MU0 * area) + rp;
        return (g > 0 ? 1 / gapPermeance(g, null) : 0) + rp;
    }

    private double ironField(double b) {
        return iron == null ? 0 : iron.fieldAt(b);
    }

    @Override
    public double currentAt(double weberTurns, double metres) {
        Require.finite("flux linkage (Wb)", weberTurns);
        Require.finite("position (m)", metres);
        double phi = weberTurns / turns;
        double pathMmf = ex.path() == null ? 0 : ex.path().mmfAt(phi);
        return Require.result("current", (phi * gapReluctance(metres) + ironLength * ironField(phi / area) + pathMmf) / turns);
    }


    @Override
    public double fieldEnergyAt(double weberTurns, double metres) {
        Require.finite("flux linkage (Wb)", weberTurns);
        Require.finite("position (m)", metres);
        double phi = weberTurns / turns;
        double w = 0.5 * phi * phi * gapReluctance(metres);
        if (iron != null) {
            double b = phi / area;
            double ironEnergyDensity;
            if (iron.isLinear()) {
                ironEnergyDensity = b * b / (2 * MU0 * iron.relativePermeability());
            } else {
                int panels = 8;
                double h = b / panels, sum = 0;
                for (int p = 0; p < panels; p++) {
                    double mid = (p + 0.5) * h;
                    for (int k = 0; k < 5; k++) sum += MagneticCircuit.GAUSS_W[k] * iron.fieldAt(mid + 0.5 * h * MagneticCircuit.GAUSS_X[k]);
                }
                ironEnergyDensity = sum * 0.5 * h;
            }
            w += area * ironLength * ironEnergyDensity;
        }
        if (ex.path() != null) {
            MagneticCircuit c = ex.path();
            w += c.energyAt(phi);
        }
        return Require.result("field energy", w);
    }

    @Override
    public double forceAt(double weberTurns, double metres) {
        Require.finite("flux linkage (Wb)", weberTurns);
        Require.finite("position (m)", metres);
        double g = stroke + residual - metres;
        if (g <= 0) return Require.result("force", 0);
        if (idealGap()) {
            double b = weberTurns / turns / area;
            return Require.result("force", b * b * area / (2 * MU0));
        }
        // F = −∂W/∂x at constant λ = ½φ²·∂Rg/∂g = ½·(φ/P)²·(−dP/dg)
        double[] slope = new double[1];
        double p = gapPermeance(g, slope);
        double mmf = weberTurns / turns / p;
        return Require.result("force", 0.5 * mmf * mmf * -slope[0]);
    }

    @Override
    public double restoringForceAt(double metres, double metresPerSecond) {
        Require.finite("position (m)", metres);
        Require.finite("speed (m/s)", metresPerSecond);
        return Require.result("restoring force", preload + stiffness * metres + load + damping * metresPerSecond);
    }

    @Override public double massKg() { return mass; }
    @Override public double strokeMetres() { return stroke; }

    @Override
    public double resistanceOhms() {
        return r20 * ex.conductor().resistanceRatioAt(kelvin);
    }

    @Override
    public double inductanceAt(double metres) {
        Require.finite("position (m)", metres);
        double rel = gapReluctance(metres);
        if (iron != null) rel += ironLength / (MU0 * iron.relativePermeability() * area);
        if (ex.path() != null) rel += ex.path().reluctanceSI();
        return Require.result("inductance", (double) turns * turns / rel);
    }

    /** Small-signal inductance open (x = 0). */
    public Quantity inductanceOpen() { return Quantity.of(inductanceAt(0), Dimension.INDUCTANCE); }

    /** Small-signal inductance closed (x = stroke). */
    public Quantity inductanceClosed() { return Quantity.of(inductanceAt(stroke), Dimension.INDUCTANCE); }

    /** Magnetic force at a current and position (N): solves the magnetic circuit for λ. */
    public Quantity force(Quantity current, Quantity position) {
        double i = Require.si("current", current, Dimension.CURRENT);
        double x = Require.between("position (m)", Require.distance("position", position), 0, stroke);
        return Quantity.of(forceAt(fluxLinkageAt(i, x), x), Dimension.FORCE);
    }

    /**
     * Magnetic force at a current and position by virtual work at constant current,
     * F = ∂W′/∂x with W′(i, x) = ∫0^i λ(i′, x) di′ (Woodson and Melcher, Electromechanical Dynamics,
     * 1968, ch. 3): ∂λ/∂x by a fourth-order central difference (step 10⁻⁴ of the stroke) inside an
     * 8-point Gauss-Legendre quadrature in i (48 panels for a B-H table). A check on {@link #force}, which takes the force
     * from the flux; the two agree wherever the model holds.
     */
    public Quantity forceByCoenergy(Quantity current, Quantity position) {
        double i = Require.si("current", current, Dimension.CURRENT);
        double x = Require.between("position (m)", Require.distance("position", position), 0, stroke);
        double h = 1e-4 * stroke;
        // the model holds beyond the open stop (a longer gap) and up to the residual gap at the closed one
        if (!(stroke + residual - x > 2 * h)) {
            throw Require.fail("the co-energy's slope needs a gap of at least " + Quantity.of(2 * h, Dimension.LENGTH) + " at "
                    + position + "; give a residual gap or a position short of the closed stop");
        }
        // composite panels: a B-H table's kinks cost little accuracy
        int panels = iron == null || iron.isLinear() ? 1 : 48;
        double w = i / panels, sum = 0;
        for (int p = 0; p < panels; p++) {
            for (int k = 0; k < 8; k++) {
                double ik = w * (p + 0.5 * (1 + X8[k]));
                double d = (-fluxLinkageAt(ik, x + 2 * h) + 8 * fluxLinkageAt(ik, x + h) - 8 * fluxLinkageAt(ik, x - h)
                        + fluxLinkageAt(ik, x - 2 * h)) / (12 * h);
                sum += W8[k] * d;
            }
        }
        return Quantity.of(Require.result("force by co-energy", 0.5 * w * sum), Dimension.FORCE);
    }

    private static final double[] X8 = new double[8];
    private static final double[] W8 = new double[8];

    static {
        var rule = new org.apache.commons.math3.analysis.integration.gauss.GaussIntegratorFactory().legendre(8);
        for (int k = 0; k < 8; k++) {
            X8[k] = rule.getPoint(k);
            W8[k] = rule.getWeight(k);
        }
    }

    // ---------------------------------------------------------------- remanence (static)

    /**
     * Remanence of the iron path by the recoil-line model: once magnetised, the iron of
     * {@link #withIron} acts as an MMF source Hc·l_fe (its coercive field times its length) behind
     * its own reluctance l_fe/(μ0·μr·A), μr the material's initial relative permeability taken as
     * the recoil permeability (the load-line method of permanent-magnet circuits; e.g. Parker,
     * Advances in Permanent Magnetism, Wiley 1990, ch. 4, from memory). Soft iron's Hc is of the
     * order of 50 to 200 A/m (common practice). Statically it gives the residual flux and pull
     * after switch-off, the drop-out current and voltage and the residual shim that ensures release.
     * The transient run carries it through {@link #hysteresis()}: a play operator of half-width Hc on
     * the iron's curve, whose falling branch at zero current is this recoil line, so after
     * switch-off the flux falls to {@link #residualFlux()} (not to zero), the residual pull holds or
     * releases the plunger, and the loss Hc·l_fe·|dφ| enters the ledger.
     */
    public Plunger withCoercivity(Quantity coerciveField) {
        if (iron == null) throw Require.fail("remanence needs the iron path's length and material: give withIron(..) first");
        double hc = Require.nonNegative("coercive field", coerciveField, Dimension.CURRENT.div(Dimension.LENGTH));
        return with(ex.coercivity(hc));
    }

    /**
     * The iron's hysteresis for the transient run: with {@link #withCoercivity}, a play operator of
     * half-width Hc over the iron path's length (see {@link IronHysteresis}); none otherwise.
     */
    @Override
    public IronHysteresis hysteresis() {
        return ex.coercivity() > 0 ? IronHysteresis.ofSI(ex.coercivity() * ironLength, turns) : IronHysteresis.NONE;
    }

    private double closedReluctance(double residualGap) {
        double rel = (residualGap > 0 ? (idealGap() ? residualGap / (MU0 * area) : 1 / gapPermeance(residualGap, null)) : 0)
                + parasitic / (MU0 * parasiticArea);
        if (iron != null) rel += ironLength / (MU0 * iron.relativePermeability() * area);
        if (ex.path() != null) rel += ex.path().reluctanceSI();
        return rel;
    }

    private double residualFluxAt(double residualGap) {
        return ex.coercivity() * ironLength / closedReluctance(residualGap);
    }

    /** Flux (Wb) left in the closed magnet at zero current, by the recoil-line model of {@link #withCoercivity}. */
    public Quantity residualFlux() {
        return Quantity.of(residualFluxAt(residual), Dimension.FLUX);
    }

    /** Pull (N) of the residual flux on the closed plunger at zero current. */
    public Quantity residualForce() {
        return Quantity.of(forceAt(turns * residualFluxAt(residual), stroke), Dimension.FORCE);
    }

    /** True when spring, preload and load overcome the residual pull, so that the plunger releases at zero current. */
    public boolean releasesAtZeroCurrent() {
        return residualForce().si() < restoringForceAt(stroke, 0);
    }

    /** Gap flux (Wb) at which the pull at the closed stop meets the spring, preload and load; by bisection. */
    private double holdingFlux() {
        double need = restoringForceAt(stroke, 0);
        double lo = 0, hi = Math.sqrt(2 * MU0 * area * Math.max(need, 1e-12));
        while (forceAt(turns * hi, stroke) < need) {
            lo = hi;
            hi *= 2;
            if (!(hi < 1e3)) throw Require.fail("no flux holds the plunger against " + Quantity.of(need, Dimension.FORCE));
        }
        for (int k = 0; k < 200 && hi - lo > 1e-15 * hi; k++) {
            double mid = 0.5 * (lo + hi);
            if (forceAt(turns * mid, stroke) < need) lo = mid;
            else hi = mid;
        }
        return 0.5 * (lo + hi);
    }

    /**
     * Drop-out current with remanence: the coil current at which the closed plunger releases,
     * {@code (φ_hold·R − Hc·l_fe)/N} on the recoil line (negative: it needs a reverse current to
     * release; zero coercivity gives the plain static value).
     */
    public Quantity dropOutCurrent() {
        double r = closedReluctance(residual);
        return Quantity.of((holdingFlux() * r - ex.coercivity() * ironLength) / turns, Dimension.CURRENT);
    }

    /** The least non-magnetic residual gap (shim) at which the residual pull no longer holds the plunger (zero if none is needed). */
    public Quantity residualShimForRelease() {
        double need = holdingFlux();
        if (residualFluxAt(0) <= need) return Quantity.of(0, Dimension.LENGTH);
        double lo = 0, hi = Math.max(residual, 1e-6);
        while (residualFluxAt(hi) > need) {
            lo = hi;
            hi *= 2;
            if (!(hi < 1)) throw Require.fail("no shim up to 1 m releases the plunger");
        }
        for (int k = 0; k < 200 && hi - lo > 1e-12 * hi; k++) {
            double mid = 0.5 * (lo + hi);
            if (residualFluxAt(mid) > need) lo = mid;
            else hi = mid;
        }
        return Quantity.of(hi, Dimension.LENGTH);
    }

    /**
     * Force-stroke curves at the given steady currents over {@code points} evenly spaced positions
     * from the open to the closed stop, with the spring, preload and load line (see
     * {@link ForceStroke}).
     */
    public ForceStroke forceStroke(int points, Quantity... currents) {
        Require.between("points", points, 2, 10_000);
        Require.present("currents", currents);
        if (currents.length == 0) throw Require.fail("give at least one current for the force-stroke curves");
        double[] xs = new double[points], mech = new double[points], is = new double[currents.length];
        double[][] pull = new double[currents.length][points];
        for (int j = 0; j < points; j++) {
            xs[j] = j == points - 1 ? stroke : stroke * j / (points - 1);
            mech[j] = restoringForceAt(xs[j], 0);
        }
        for (int k = 0; k < currents.length; k++) {
            is[k] = Require.si("current", currents[k], Dimension.CURRENT);
            for (int j = 0; j < points; j++) pull[k][j] = forceAt(fluxLinkageAt(is[k], xs[j]), xs[j]);
        }
        return new ForceStroke("plunger " + turns + " turns, stroke " + Quantity.of(stroke, Dimension.LENGTH), xs, is, pull, mech);
    }

    /**
     * Pick-up voltage: the least DC supply that closes the plunger from rest within {@code within},
     * with the coil at {@code coilTemperature} (its resistance follows the conductor). Each trial is
     * a transient run (eddy currents, stops and all); the search brackets the supply from the static
     * pull-in current up, then bisects to 10⁻⁶ of it. Fails when 10 kV does not close it; the time
     * may be at most 10 s.
     */
    public Quantity pickUpVoltage(Quantity within, Quantity coilTemperature) {
        double t = Require.positive("time to close", within, Dimension.TIME, MAX_PICK_UP_TIME);
        Plunger hot = atTemperature(coilTemperature);
        double r = hot.resistanceOhms();
        double lo = 0, hi = Math.max(r * hot.staticCurrentAt(0), 1e-3);
        while (!hot.closesWithin(hi, t)) {
            lo = hi;
            hi *= 2;
            if (hi > 1e4) throw Require.fail("no supply up to 10 kV closes the plunger within " + within);
        }
        for (int k = 0; k < 60 && hi - lo > 1e-6 * hi; k++) {
            Require.notInterrupted("the pick-up voltage search");
            double mid = 0.5 * (lo + hi);
            if (hot.closesWithin(mid, t)) hi = mid;
            else lo = mid;
        }
        return Quantity.of(hi, Dimension.VOLTAGE);
    }

    /** Longest time to close a pick-up search accepts (s): each of its trials is a transient run that long. */
    public static final double MAX_PICK_UP_TIME = 10;

    private boolean closesWithin(double volts, double seconds) {
        var run = Drive.dc(Quantity.of(volts, Dimension.VOLTAGE)).into(this).simulate(Quantity.of(seconds, Dimension.TIME));
        return run.pullInTime().si() <= seconds;
    }

    /**
     * Drop-out voltage: the DC supply below which the closed plunger releases, with the coil at
     * {@code coilTemperature}: the steady current V/R at which the magnetic force at the closed stop
     * equals the spring, preload and load there (static). Without {@link #withCoercivity} the flux
     * follows the current to zero; with it, the drop-out current of the recoil-line model (negative
     * when the remanence alone holds the plunger).
     */
    public Quantity dropOutVoltage(Quantity coilTemperature) {
        Plunger hot = atTemperature(coilTemperature);
        double amps = ex.coercivity() > 0 ? hot.dropOutCurrent().si() : hot.staticCurrentAt(stroke);
        return Quantity.of(amps * hot.resistanceOhms(), Dimension.VOLTAGE);
    }

    /** The current (A) at which the pull at x equals the restoring force there at rest, by bisection. */
    double staticCurrentAt(double x) {
        double need = restoringForceAt(x, 0);
        if (!(need > 0)) return 0;
        double lo = 0, hi = 1e-3;
        for (int k = 0; forceAt(fluxLinkageAt(hi, x), x) < need; k++) {
            if (k > 80) throw Require.fail("no current up to " + Quantity.of(hi, Dimension.CURRENT) + " holds the plunger against "
                    + Quantity.of(need, Dimension.FORCE) + " at " + Quantity.of(x, Dimension.LENGTH) + " (the iron saturates)");
            lo = hi;
            hi *= 2;
        }
        for (int k = 0; k < 100 && hi - lo > 1e-12 * hi; k++) {
            double mid = 0.5 * (lo + hi);
            if (forceAt(fluxLinkageAt(mid, x), x) < need) lo = mid;
            else hi = mid;
        }
        return 0.5 * (lo + hi);
    }

    /** λ at current i and position x: inverse of {@link #currentAt} by bisection (the current rises with λ). */
    double fluxLinkageAt(double amps, double x) {
        double lo = 0, hi = Math.max(inductanceAt(x) * Math.abs(amps), 1e-12);
        for (int k = 0; currentAt(hi, x) < Math.abs(amps); k++) {
            if (k > 2000 || !Double.isFinite(hi)) {
                throw Require.fail("no flux linkage gives a current of " + Quantity.of(amps, Dimension.CURRENT) + " at position "
                        + Quantity.of(x, Dimension.LENGTH) + ": the current is outside the model's range");
            }
            hi *= 2;
        }
        for (int k = 0; k < 200 && hi - lo > 1e-15 * hi; k++) {
            double mid = 0.5 * (lo + hi);
            if (currentAt(mid, x) < Math.abs(amps)) lo = mid;
            else hi = mid;
        }
        return Math.copySign(0.5 * (lo + hi), amps);
    }

    @Override
    public Quantity temperature() { return Quantity.temperatureKelvin(kelvin); }

    @Override
    public String describe() {
        return "plunger " + turns + " turns, pole " + Quantity.of(area, Dimension.AREA) + ", stroke " + Quantity.of(stroke, Dimension.LENGTH)
                + ", L " + inductanceOpen() + " open to " + inductanceClosed() + " closed, " + Quantity.of(resistanceOhms(), Dimension.RESISTANCE)
                + ", mass " + Quantity.of(mass, Dimension.MASS) + ", spring " + Quantity.of(preload, Dimension.FORCE) + " + "
                + Quantity.of(stiffness, Dimension.STIFFNESS) + (load > 0 ? ", load " + Quantity.of(load, Dimension.FORCE) : "")
                + (ex.eddy() != null ? ", " + ex.eddy().kind() + (ex.eddy().sections() > 1 ? " (" + ex.eddy().sections() + " shells)" : "") : "")
                + (ex.pole() != Pole.FLAT ? ", " + ex.pole().kind() + " pole" + (ex.pole().kind().equals("conical")
                        ? " " + Require.show(ex.pole().angle()) + "°" : "") : "")
                + (!Double.isNaN(ex.fringe()) ? ", fringing over " + Quantity.of(ex.fringe(), Dimension.LENGTH) : "")
                + (ex.leakage() > 0 ? ", frame leakage " + frameLeakagePermeance() : "")
                + (ex.coercivity() > 0 ? ", coercive field " + Quantity.of(ex.coercivity(), Dimension.CURRENT.div(Dimension.LENGTH)) : "")
                + (ex.restitution() > 0 ? ", restitution " + String.format(java.util.Locale.ROOT, "%.3g", ex.restitution()) : "");
    }

    @Override
    public String toString() { return describe(); }
}
