package org.ampturn.thermal;

import org.ampturn.units.Require;

/** ΔT = c · (P/A)^n with P/A in W/m² (the rules of {@link Cooling} converted to SI). */
final class PowerLawCooling implements Cooling {
    // 450 ψ^0.826, ψ in W/cm² = 1e-4 · (W/m²)
    static final PowerLawCooling HANDBOOK = new PowerLawCooling(450 * Math.pow(1e-4, 0.826), 0.826,
            "handbook rule ΔT = 450·(P/A in W/cm²)^0.826 (McLyman, Transformer and Inductor Design Handbook, 3rd ed.)", 50, 1500);
    // (mW/cm²)^0.833 ; mW/cm² = 0.1 · W/m²
    static final PowerLawCooling FERRITE = new PowerLawCooling(Math.pow(0.1, 0.833), 0.833,
            "ferrite-catalogue rule ΔT = (P in mW / A in cm²)^0.833", Math.pow(5, 1 / 0.833) * 10, Math.pow(100, 1 / 0.833) * 10);

    private final double c;
    private final double n;
    private final String text;

    /**
     * The loss per area (W/m²) the rule was drawn from. Handbook rule: 0.005 to 0.15 W/cm² (McLyman,
     * from memory). Ferrite-catalogue rule: the catalogues give no range; the loss densities at which
     * the rule itself gives rises of 5 to 100 K (0.0069 to 0.25 W/cm²) are taken (assumed).
     */
    private final double lo, hi;

    private PowerLawCooling(double c, double n, String text, double lo, double hi) {
        this.lo = lo;
        this.hi = hi;
        this.c = c;
        this.n = n;
        this.text = text;
    }

    @Override
    public double riseAt(double watts, double squareMetres) {
        Require.finite("power (W)", watts);
        Require.finite("area (m²)", squareMetres);
        Require.nonNegative("power (W)", watts);
        Require.positive("surface area (m²)", squareMetres);
        return Require.result("rise", c * Math.pow(watts / squareMetres, n));
    }

    @Override public String describe() { return text; }

    @Override
    public String rangeNote(double watts, double squareMetres) {
        double psi = watts / squareMetres;
        if (Double.isNaN(lo) || psi >= lo && psi <= hi) return null;
        return String.format(java.util.Locale.ROOT, "the cooling rule is used outside its range: P/A = %.3g W/cm², meant for %.3g to %.3g W/cm²;"
                + " the rise is an extrapolation", psi * 1e-4, lo * 1e-4, hi * 1e-4);
    }

    @Override public String toString() { return text; }
}
