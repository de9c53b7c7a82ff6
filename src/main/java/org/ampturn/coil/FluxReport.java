package org.ampturn.coil;

import org.ampturn.units.Require;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;

/** Flux density in each part of a magnetic circuit at one current: a small immutable table. */
public final class FluxReport {
    /** One part: its name, flux density (T), and saturation flux density (T; NaN for a gap or air). */
    public record Part(String name, double tesla, double saturationTesla) {
        public Quantity fluxDensity() {
            return Quantity.of(tesla, Dimension.FLUX_DENSITY);
        }

        /** True when a core piece is at or above its material's saturation flux density. */
        public boolean isSaturated() {
            return !Double.isNaN(saturationTesla) && Math.abs(tesla) >= saturationTesla;
        }
    }

    private final int turns;
    private final double amps;
    private final double flux;
    private final List<Part> parts;
    private final boolean[] isGap;

    private FluxReport(int turns, double amps, double flux, List<Part> parts, boolean[] isGap) {
        this.turns = turns;
        this.amps = amps;
        this.flux = flux;
        this.parts = List.copyOf(parts);
        this.isGap = isGap;
    }

    static FluxReport of(MagneticCircuit c, int turns, double amps) {
        List<MagneticCircuit> leaves = c.parts();
        double phi = c.fluxAt(turns * amps);
        double[] b = new double[leaves.size()];
        c.fluxDensities(phi, b, new int[1]);
        List<Part> rows = new ArrayList<>();
        boolean[] gap = new boolean[b.length];
        for (int i = 0; i < b.length; i++) {
            MagneticCircuit p = leaves.get(i);
            gap[i] = p instanceof AirGap;
            double bsat = p instanceof Core ? ((Core) p).saturationSI() : Double.NaN;
            if (!(bsat < 1e300)) bsat = Double.NaN; // air, or no saturation flux density given
            rows.add(new Part(p.name(), b[i], bsat));
        }
        return new FluxReport(turns, amps, phi, rows, gap);
    }

    public List<Part> parts() { return parts; }
    /** Total flux Φ through the circuit. */
    public Quantity flux() { return Quantity.of(flux, Dimension.FLUX); }
    public Quantity current() { return Quantity.of(amps, Dimension.CURRENT); }

    /** The part named {@code name} (the first, if several share it). */
    public Part part(String name) {
        for (Part p : parts) if (p.name().equals(name)) return p;
        throw Require.fail("no part named " + name + "; parts: " + parts.stream().map(Part::name).toList());
    }

    /** The highest |B| in any core piece (gaps excluded). */
    public Quantity peakCoreFluxDensity() {
        double m = 0;
        for (int i = 0; i < parts.size(); i++) if (!isGap[i]) m = Math.max(m, Math.abs(parts.get(i).tesla()));
        return Quantity.of(m, Dimension.FLUX_DENSITY);
    }

    @Override
    public String toString() {
        StringBuilder sb = new StringBuilder("flux density at " + turns + " turns × " + current() + " (Φ = " + flux() + ")");
        for (Part p : parts) {
            sb.append("\n  ").append(String.format(Locale.ROOT, "%-18s %10s", p.name(), p.fluxDensity()));
            if (!Double.isNaN(p.saturationTesla())) {
                sb.append(String.format(Locale.ROOT, "  %3.0f %% of %s", 100 * Math.abs(p.tesla()) / p.saturationTesla(),
                        Quantity.of(p.saturationTesla(), Dimension.FLUX_DENSITY)));
                if (p.isSaturated()) sb.append("  SATURATED");
            }
        }
        return sb.toString();
    }
}
