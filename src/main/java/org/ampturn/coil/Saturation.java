package org.ampturn.coil;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;

/**
 * The saturation check of a magnetic circuit for N turns: for each core piece, the current at which
 * its flux density reaches its material's saturation flux density, solved through the whole circuit
 * (for a B-H material, with the nonlinear solution). Sorted so that the first row saturates first.
 */
public final class Saturation {
    /** One core piece: its name, saturation flux density (T) and the coil current (A) that brings it there. */
    public record Part(String name, double saturationTesla, double amps) {
        public Quantity current() {
            return Quantity.of(amps, Dimension.CURRENT);
        }

        public Quantity saturationFluxDensity() {
            return Quantity.of(saturationTesla, Dimension.FLUX_DENSITY);
        }
    }

    private final int turns;
    private final List<Part> parts;

    private Saturation(int turns, List<Part> parts) {
        this.turns = turns;
        this.parts = List.copyOf(parts);
    }

    static Saturation of(MagneticCircuit c, int turns) {
        List<MagneticCircuit> leaves = c.parts();
        int n = leaves.size();
        double[] b = new double[n];
        // B of each part per ampere of coil current, from the small-signal (linear) solution
        double phi1 = turns / c.reluctanceSI();
        c.fluxDensities(phi1, b, new int[1]);
        double[] perAmp = b.clone();
        List<Part> rows = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            if (!(leaves.get(i) instanceof Core)) continue;
            Core core = (Core) leaves.get(i);
            double bsat = core.saturationSI();
            if (!(bsat < 1e300)) continue; // air or a core given without a saturation flux density
            double amps;
            if (c.isLinear()) {
                amps = bsat / Math.abs(perAmp[i]);
            } else {
                final int k = i;
                try {
                    amps = Monotone.solve(current -> {
                        double[] bb = new double[n];
                        c.fluxDensities(c.fluxAt(turns * current), bb, new int[1]);
                        return bb[k];
                    }, bsat, bsat / Math.abs(perAmp[k]));
                } catch (ArithmeticException never) {
                    amps = Double.POSITIVE_INFINITY; // the B-H relation never reaches bsat
                }
            }
            rows.add(new Part(core.name(), bsat, amps));
        }
        rows.sort(Comparator.comparingDouble(Part::amps));
        return new Saturation(turns, rows);
    }

    /** Core pieces, the first to saturate first. */
    public List<Part> parts() { return parts; }

    /** The first part to saturate. */
    public Part first() {
        if (parts.isEmpty()) throw new IllegalStateException("the circuit has no core piece to saturate (air gaps only)");
        return parts.get(0);
    }

    /** The current at which the first part saturates. */
    public Quantity current() {
        return first().current();
    }

    /** True when {@code current} (in magnitude) stays below the first saturation current. */
    public boolean isClearAt(Quantity current) {
        return parts.isEmpty() || Math.abs(current.si(Dimension.CURRENT)) < first().amps();
    }

    /**
     * The check at one current: "clear" with the margin, or which part saturates, at what current,
     * and by how much the given current exceeds it.
     */
    public String at(Quantity current) {
        double i = Math.abs(org.ampturn.units.Require.si("current", current, Dimension.CURRENT));
        if (parts.isEmpty()) return "no core piece: nothing saturates";
        Part p = first();
        if (i < p.amps()) {
            return String.format(Locale.ROOT, "clear at %s: %s saturates first, at %s (%s), %.0f %% above", current, p.name(), p.current(),
                    p.saturationFluxDensity(), 100 * (p.amps() / i - 1));
        }
        return String.format(Locale.ROOT, "SATURATED at %s: %s reaches %s at %s; the current is %.0f %% above that", current, p.name(),
                p.saturationFluxDensity(), p.current(), 100 * (i / p.amps() - 1));
    }

    @Override
    public String toString() {
        StringBuilder sb = new StringBuilder("saturation with " + turns + " turns");
        if (parts.isEmpty()) return sb.append(": no core piece").toString();
        for (Part p : parts) {
            sb.append("\n  ").append(String.format(Locale.ROOT, "%-18s reaches %s at %s", p.name(), p.saturationFluxDensity(), p.current()));
        }
        return sb.toString();
    }
}
