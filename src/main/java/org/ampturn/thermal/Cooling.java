package org.ampturn.thermal;

import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;

/**
 * How a surface sheds heat in still air: the steady temperature rise of the surface over ambient for a
 * dissipated power and a surface area. Kernels in SI (W, m², K).
 */
public interface Cooling {
    /** Kernel: surface temperature rise (K) for power P (W) over area A (m²). */
    double riseAt(double watts, double squareMetres);

    /** One line naming the rule and its source. */
    String describe();

    /**
     * Null where the rule holds at this loss and surface, else a note that it is used outside the
     * range it was drawn from (an empirical rule extrapolated).
     */
    default String rangeNote(double watts, double squareMetres) {
        return null;
    }

    /** The rise on the Quantity surface. */
    default Quantity rise(Quantity power, Quantity area) {
        double p = Require.nonNegative("power", power, Dimension.POWER);
        double a = Require.positive("surface area", area, Dimension.AREA);
        return Quantity.of(riseAt(p, a), Dimension.TEMPERATURE);
    }

    /**
     * The empirical rule of C. W. T. McLyman, "Transformer and Inductor Design Handbook", 3rd ed.
     * (Marcel Dekker, 2004), chapter on temperature rise: ΔT = 450 · ψ^0.826 °C with ψ = P/A in W/cm²,
     * for a component in still air cooled by natural convection and radiation (from memory). Meant for
     * ψ of about 0.005 to 0.15 W/cm² (rises of about 5 to 100 K); the default of {@link Heating}.
     */
    static Cooling handbookRule() {
        return PowerLawCooling.HANDBOOK;
    }

    /**
     * The rule printed in ferrite-core catalogues for cores in still air: ΔT = (P/A)^0.833 °C with P in
     * mW and A in cm² (from memory). It gives rises about a third lower than {@link #handbookRule()} at
     * 0.05 W/cm²; use whichever your parts were measured against. The catalogues state no range; the
     * range taken is that of rises of 5 to 100 K (0.0069 to 0.25 W/cm²; assumed), outside which the
     * result's warnings say so.
     */
    static Cooling ferriteCatalogueRule() {
        return PowerLawCooling.FERRITE;
    }

    /**
     * A constant surface heat-transfer coefficient h (convection plus radiation): ΔT = P/(h·A).
     * Still air gives about 10 to 15 W/(m²·K) over the range of coil temperatures (common practice);
     * forced air more.
     */
    static Cooling surfaceCoefficient(Quantity h) {
        double v = Require.positive("heat transfer coefficient", h, Dimension.HEAT_TRANSFER_COEFFICIENT);
        return new Cooling() {
            @Override public double riseAt(double watts, double squareMetres) {
                Require.finite("power (W)", watts);
                Require.finite("area (m²)", squareMetres);
                return Require.result("rise", Require.nonNegative("power (W)", watts) / (v * Require.positive("surface area (m²)", squareMetres)));
            }
            @Override public String describe() { return "surface coefficient h = " + h; }
            @Override public String toString() { return describe(); }
        };
    }
}
