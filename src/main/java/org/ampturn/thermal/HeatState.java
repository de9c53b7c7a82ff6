package org.ampturn.thermal;

import java.util.ArrayList;
import java.util.List;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;

/**
 * The steady state of a {@link Heating}: winding temperature, hot-spot estimate, hot resistance,
 * current and losses, and the cautions that apply. Immutable.
 */
public final class HeatState {
    /** Surfaces above this temperature (°C) can burn on contact (order of the touch limits in safety standards; common practice). */
    static final double TOUCH_LIMIT_C = 60;

    private final Heating setup;
    private final double kelvin;
    private final double resistance;
    private final double current;
    private final double copperLoss;
    private final double extraLoss;
    private final double allowance;
    private final InsulationClass insulation;
    private final int iterations;
    private final String method;

    HeatState(Heating setup, double kelvin, double resistance, double current, double copperLoss, double extraLoss, double allowance,
            InsulationClass insulation, int iterations, String method) {
        this.setup = setup;
        this.kelvin = kelvin;
        this.resistance = resistance;
        this.current = current;
        this.copperLoss = copperLoss;
        this.extraLoss = extraLoss;
        this.allowance = allowance;
        this.insulation = insulation;
        this.iterations = iterations;
        this.method = method;
    }

    /** Winding (and surface) temperature. */
    public Quantity temperature() { return Quantity.temperatureKelvin(kelvin); }

    /** Rise over ambient. */
    public Quantity rise() { return Quantity.of(kelvin - setup.ambientK(), Dimension.TEMPERATURE); }

    /** Hot-spot estimate: winding temperature + allowance. */
    public Quantity hotSpot() { return Quantity.temperatureKelvin(kelvin + allowance); }

    /** Resistance at the winding temperature. */
    public Quantity resistance() { return Quantity.of(resistance, Dimension.RESISTANCE); }

    public Quantity current() { return Quantity.of(current, Dimension.CURRENT); }

    public Quantity copperLoss() { return Quantity.of(copperLoss, Dimension.POWER); }

    /** Copper loss plus the fixed extra loss. */
    public Quantity totalLoss() { return Quantity.of(copperLoss + extraLoss, Dimension.POWER); }

    public InsulationClass insulationClass() { return insulation; }

    /** Iterations the solve took. */
    public int iterations() { return iterations; }

    /** True when the hot-spot estimate is within the insulation class. */
    public boolean withinClass() { return kelvin + allowance <= insulation.limit().si(); }

    /** Margin of the hot spot below the class limit (negative when over). */
    public Quantity margin() { return Quantity.of(insulation.limit().si() - kelvin - allowance, Dimension.TEMPERATURE); }

    /**
     * The warnings that apply: hot spot over (or within 10 K of) the insulation class, a cooling rule
     * used outside the range it was drawn from, and a hot surface that can burn. Empty when none apply.
     */
    public List<String> warnings() {
        List<String> w = new ArrayList<>();
        double over = kelvin + allowance - insulation.limit().si();
        if (over > 0) {
            w.add("hot-spot estimate " + hotSpot() + " exceeds thermal " + insulation + " (IEC 60085) by " + Quantity.of(over, Dimension.TEMPERATURE)
                    + ": lower the loss, enlarge the cooling surface or use a higher insulation class");
        } else if (over > -10) {
            w.add("hot-spot estimate " + hotSpot() + " is within " + Quantity.of(-over, Dimension.TEMPERATURE) + " of thermal " + insulation
                    + " (IEC 60085): the estimate is rough, so measure the coil (resistance method) before relying on it");
        }
        String range = setup.cooling().rangeNote(totalLoss().si(), setup.areaM2());
        if (range != null) w.add(range);
        double surfaceC = kelvin - 273.15;
        if (surfaceC > TOUCH_LIMIT_C) {
            w.add("caution: the coil surface reaches about " + temperature() + ", hot enough to burn skin on contact (above about "
                    + (int) TOUCH_LIMIT_C + " °C) and to char nearby materials; guard or mark hot surfaces, keep it clear of flammable material, "
                    + "and follow local codes and licensed practice");
        }
        return List.copyOf(w);
    }

    /** e.g. "steady at 12.00 V: 78.3 °C (rise 53.3 K), hot spot 88.3 °C, class 130 (B) ok, 5.12 Ω, 2.34 A, 28.1 W". */
    @Override
    public String toString() {
        String ok = withinClass() ? "within " + insulation : "OVER " + insulation;
        return "steady " + temperature() + " (rise " + rise() + "), hot spot " + hotSpot() + " " + ok + ", " + resistance() + ", "
                + current() + ", loss " + totalLoss() + (warnings().isEmpty() ? "" : " — " + warnings().size() + " warning(s), see warnings()");
    }
}
