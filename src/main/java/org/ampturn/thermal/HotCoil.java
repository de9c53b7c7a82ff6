package org.ampturn.thermal;

import java.util.ArrayList;
import java.util.List;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;

/** The warnings a winding temperature calls for: the insulation class and the hot-surface caution (one place for their text). */
final class HotCoil {
    private HotCoil() {}

    /** Differences in K, as a person reads them ("0.66 K"). */
    static Quantity kelvin(double k) { return Quantity.of(k, Dimension.TEMPERATURE); }

    /**
     * Warnings for a winding whose mean temperature reaches {@code peakK}: hot spot (peak + allowance)
     * over or within 10 K of the class, and a surface hot enough to burn.
     */
    static List<String> warnings(String what, double peakK, double allowance, InsulationClass insulation) {
        List<String> w = new ArrayList<>();
        double hot = peakK + allowance;
        double over = hot - insulation.limit().si();
        if (over > 0) {
            w.add(what + ": hot-spot estimate " + Quantity.temperatureKelvin(hot) + " exceeds thermal " + insulation + " (IEC 60085) by "
                    + kelvin(over) + ": shorten the on-time, lower the loss, improve the cooling or use a higher insulation class");
        } else if (over > -10) {
            w.add(what + ": hot-spot estimate " + Quantity.temperatureKelvin(hot) + " is within " + kelvin(-over) + " of thermal " + insulation
                    + " (IEC 60085): the estimate is rough, so measure the coil (resistance method) before relying on it");
        }
        if (peakK - 273.15 > HeatState.TOUCH_LIMIT_C) {
            w.add("caution: the coil reaches about " + Quantity.temperatureKelvin(peakK) + ", hot enough to burn skin on contact (above about "
                    + (int) HeatState.TOUCH_LIMIT_C + " °C) and to char nearby materials; guard or mark hot surfaces, keep it clear of "
                    + "flammable material, and follow local codes and licensed practice");
        }
        return List.copyOf(w);
    }
}
