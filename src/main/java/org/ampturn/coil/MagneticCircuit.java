package org.ampturn.coil;

import java.util.ArrayList;
import java.util.List;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;

/**
 * A magnetic circuit of lumped parts: {@link Core} pieces (path length, area, material),
 * {@link AirGap}s, and circuits in {@link #series series} and {@link #parallel parallel}.
 *
 * <p>The model is Hopkinson's law, MMF = Φ·R, with R = l/(μ0·μr·A) for a linear part (Hopkinson,
 * Phil. Trans. 1886; any magnetics text, e.g. McLyman, Transformer and Inductor Design Handbook,
 * 3rd ed., 2004, ch. 2). For a nonlinear material each core piece carries H = H(B) from its B-H
 * relation with B = Φ/A uniform over the piece, and the circuit is solved for Φ at a given MMF
 * (series: ΣH·l = N·i; parallel: fluxes add at one MMF). Valid when the flux stays in the parts
 * (no leakage beyond what a gap's fringing factor accounts for) and each part's flux density is
 * roughly uniform. Inductance L = N²/R, A<sub>L</sub> = 1/R.
 *
 * <p>Effective dimensions follow IEC 60205 (C1 = Σl/A, C2 = Σl/A², l<sub>e</sub> = C1²/C2,
 * A<sub>e</sub> = C1/C2) over the series parts, gaps included with their own area; a parallel set
 * counts as one part of area ΣA and the area-weighted mean length (this project's convention,
 * equal to IEC 60205 for identical branches). Effective permeability μ<sub>e</sub> = l<sub>e</sub>/(μ0·A<sub>e</sub>·R).
 *
 * <p>Kernels: {@link #fluxAt(double)} (Wb at ampere-turns) and {@link #mmfAt(double)} (ampere-turns at Wb).
 */
public sealed interface MagneticCircuit permits Core, AirGap, MagneticCircuit.Series, MagneticCircuit.Parallel {
    double MU0 = 4e-7 * Math.PI;

    /** A short name of the part, used in reports. */
    String name();

    /** Small-signal reluctance (A/Wb) at zero flux. */
    double reluctanceSI();

    /** Flux Φ (Wb) at a magnetomotive force (ampere-turns). Increasing and odd. */
    double fluxAt(double ampereTurns);

    /** Magnetomotive force (ampere-turns) that drives flux Φ (Wb): the inverse of {@link #fluxAt(double)}. */
    double mmfAt(double weber);

    /** True when every material in the circuit is linear. */
    boolean isLinear();

    /** IEC 60205 constant C1 = Σ l/A (1/m). */
    double c1();

    /** IEC 60205 constant C2 = Σ l/A² (1/m³). */
    double c2();

    /** Writes the flux density of each core piece and gap, in {@link #parts()} order, for a flux Φ through this circuit. */
    void fluxDensities(double weber, double[] out, int[] next);

    /** The core pieces and gaps of the circuit, depth first. */
    List<MagneticCircuit> parts();

    // ---- factories -------------------------------------------------------------------------

    /** Parts in series: the same flux through each, MMFs add. */
    static MagneticCircuit series(MagneticCircuit... parts) {
        return new Series(List.of(check(parts)));
    }

    /** Parts in parallel: the same MMF across each, fluxes add. */
    static MagneticCircuit parallel(MagneticCircuit... parts) {
        return new Parallel(List.of(check(parts)));
    }

    private static MagneticCircuit[] check(MagneticCircuit[] parts) {
        if (parts == null || parts.length == 0) throw Require.fail("a circuit needs at least one part, got none");
        for (int i = 0; i < parts.length; i++) {
            if (parts[i] == null) throw Require.fail("part " + (i + 1) + " of the circuit is missing (null)");
        }
        return parts;
    }

    // ---- derived values (surface) ----------------------------------------------------------

    /** Small-signal reluctance. */
    default Quantity reluctance() {
        return Quantity.of(reluctanceSI(), Dimension.RELUCTANCE);
    }

    /** Small-signal inductance N²/R of {@code turns} turns linking the whole circuit. */
    default Quantity inductance(int turns) {
        Require.turns("turns", turns);
        return Quantity.of((double) turns * turns / reluctanceSI(), Dimension.INDUCTANCE);
    }

    /** Inductance factor A<sub>L</sub> = 1/R (H per turn²; shown in nH). */
    default Quantity alValue() {
        return Quantity.of(1 / reluctanceSI(), Dimension.INDUCTANCE);
    }

    /** IEC 60205 effective magnetic path length l<sub>e</sub> = C1²/C2. */
    default Quantity effectiveLength() {
        return Quantity.of(Require.result("effective length C1²/C2", c1() * c1() / c2()), Dimension.LENGTH);
    }

    /** IEC 60205 effective area A<sub>e</sub> = C1/C2. */
    default Quantity effectiveArea() {
        return Quantity.of(Require.result("effective area C1/C2", c1() / c2()), Dimension.AREA);
    }

    /**
     * Magnetic energy ∫0^φ F dφ' (J) held in the circuit at flux φ (Wb): ½φ²ℛ when linear, else
     * 5-point Gauss–Legendre on 8 panels of the circuit's own F(φ).
     */
    default double energyAt(double weber) {
        org.ampturn.units.Require.finite("flux (Wb)", weber);
        if (isLinear()) return org.ampturn.units.Require.result("energy", 0.5 * weber * weber * reluctanceSI());
        int panels = 8;
        double h = weber / panels, sum = 0;
        for (int p = 0; p < panels; p++) {
            double mid = (p + 0.5) * h;
            for (int k = 0; k < 5; k++) sum += GAUSS_W[k] * mmfAt(mid + 0.5 * h * GAUSS_X[k]);
        }
        return org.ampturn.units.Require.result("energy", sum * 0.5 * h);
    }

    /** 5-point Gauss–Legendre nodes and weights on [−1, 1]. */
    double[] GAUSS_X = {0, -0.5384693101056831, 0.5384693101056831, -0.9061798459386640, 0.9061798459386640};
    double[] GAUSS_W = {0.5688888888888889, 0.4786286704993665, 0.4786286704993665, 0.2369268850561891, 0.2369268850561891};

    /** Effective (relative) permeability μ<sub>e</sub> = C1/(μ0·R): what a uniform core of l<sub>e</sub>, A<sub>e</sub> would need. */
    default double effectivePermeability() {
        return c1() / (MU0 * reluctanceSI());
    }

    /** Flux density in each part at {@code turns} × {@code current}, as a small table. */
    default FluxReport fluxDensities(int turns, Quantity current) {
        Require.turns("turns", turns);
        double i = Require.si("current", current, Dimension.CURRENT);
        return FluxReport.of(this, turns, i);
    }

    /** The highest flux density in any core piece at {@code turns} × {@code current}. */
    default Quantity peakFluxDensity(int turns, Quantity current) {
        return fluxDensities(turns, current).peakCoreFluxDensity();
    }

    /** Which part saturates first, and at what current, for {@code turns} turns. */
    default Saturation saturation(int turns) {
        Require.turns("turns", turns);
        return Saturation.of(this, turns);
    }

    // ---- composites ------------------------------------------------------------------------

    /** Parts in series. */
    final class Series implements MagneticCircuit {
        private final List<MagneticCircuit> parts;
        private final double r;
        private final boolean linear;

        Series(List<MagneticCircuit> parts) {
            this.parts = parts;
            double s = 0;
            boolean lin = true;
            for (MagneticCircuit p : parts) {
                s += p.reluctanceSI();
                lin &= p.isLinear();
            }
            this.r = s;
            this.linear = lin;
        }

        @Override public String name() { return String.join(" + ", parts.stream().map(MagneticCircuit::name).toList()); }
        @Override public double reluctanceSI() { return r; }
        @Override public boolean isLinear() { return linear; }

        @Override
        public double mmfAt(double weber) {
            Require.finite("flux (Wb)", weber);
            if (linear) return Require.result("mmf", weber * r);
            double f = 0;
            for (MagneticCircuit p : parts) f += p.mmfAt(weber);
            return Require.result("mmf", f);
        }

        @Override
        public double fluxAt(double ampereTurns) {
            Require.finite("mmf (A)", ampereTurns);
            if (linear) return Require.result("flux", ampereTurns / r);
            return Require.result("flux", Monotone.solve(this::mmfAt, ampereTurns, ampereTurns / r));
        }

        @Override public double c1() { return parts.stream().mapToDouble(MagneticCircuit::c1).sum(); }
        @Override public double c2() { return parts.stream().mapToDouble(MagneticCircuit::c2).sum(); }

        @Override
        public void fluxDensities(double weber, double[] out, int[] next) {
            for (MagneticCircuit p : parts) p.fluxDensities(weber, out, next);
        }

        @Override
        public List<MagneticCircuit> parts() {
            List<MagneticCircuit> all = new ArrayList<>();
            for (MagneticCircuit p : parts) all.addAll(p.parts());
            return all;
        }

        @Override
        public String toString() {
            return "magnetic circuit: " + name() + "; R = " + reluctance() + ", AL = " + alValue();
        }
    }

    /** Parts in parallel. */
    final class Parallel implements MagneticCircuit {
        private final List<MagneticCircuit> parts;
        private final double r;
        private final boolean linear;

        Parallel(List<MagneticCircuit> parts) {
            this.parts = parts;
            double g = 0;
            boolean lin = true;
            for (MagneticCircuit p : parts) {
                g += 1 / p.reluctanceSI();
                lin &= p.isLinear();
            }
            this.r = 1 / g;
            this.linear = lin;
        }

        @Override public String name() { return "(" + String.join(" | ", parts.stream().map(MagneticCircuit::name).toList()) + ")"; }
        @Override public double reluctanceSI() { return r; }
        @Override public boolean isLinear() { return linear; }

        @Override
        public double fluxAt(double ampereTurns) {
            Require.finite("mmf (A)", ampereTurns);
            if (linear) return Require.result("flux", ampereTurns / r);
            double f = 0;
            for (MagneticCircuit p : parts) f += p.fluxAt(ampereTurns);
            return Require.result("flux", f);
        }

        @Override
        public double mmfAt(double weber) {
            Require.finite("flux (Wb)", weber);
            if (linear) return Require.result("mmf", weber * r);
            return Require.result("mmf", Monotone.solve(this::fluxAt, weber, weber * r));
        }

        /** One part of area ΣA and the area-weighted mean length (see the interface's note). */
        @Override
        public double c1() {
            double area = 0, la = 0;
            for (MagneticCircuit p : parts) {
                double ae = p.c1() / p.c2(), le = p.c1() * ae;
                area += ae;
                la += le * ae;
            }
            return la / area / area;
        }

        @Override
        public double c2() {
            double area = 0;
            for (MagneticCircuit p : parts) area += p.c1() / p.c2();
            return c1() / area;
        }

        @Override
        public void fluxDensities(double weber, double[] out, int[] next) {
            double f = mmfAt(weber);
            for (MagneticCircuit p : parts) p.fluxDensities(p.fluxAt(f), out, next);
        }

        @Override
        public List<MagneticCircuit> parts() {
            List<MagneticCircuit> all = new ArrayList<>();
            for (MagneticCircuit p : parts) all.addAll(p.parts());
            return all;
        }

        @Override
        public String toString() {
            return "magnetic circuit: " + name() + "; R = " + reluctance() + ", AL = " + alValue();
        }
    }
}
