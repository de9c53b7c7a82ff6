package org.ampturn.coil;

import org.ampturn.units.Require;
import org.ampturn.material.Conductor;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;

/** A coil of constant inductance whose resistance follows copper's temperature coefficient. */
final class LumpedCoil implements Coil {

    private final double l;
    private final double r20;
    private final double kelvin;

    /** The resistance {@code r20} is at 20 °C and follows copper (IEC 60028) at {@code kelvin}. */
    LumpedCoil(double l, double r20, double kelvin) {
        this.l = l;
        this.r20 = r20;
        this.kelvin = kelvin;
    }

    @Override public Quantity inductance() { return Quantity.of(l, Dimension.INDUCTANCE); }
    @Override public Quantity resistance() { return Quantity.of(resistanceAt(kelvin), Dimension.RESISTANCE); }
    @Override public Quantity temperature() { return Quantity.temperatureKelvin(kelvin); }
    @Override public double fluxLinkageAt(double amps) {
        Require.finite("current (A)", amps);
        return Require.result("flux linkage", l * amps);
    }
    @Override public double currentAt(double weberTurns) {
        Require.finite("flux linkage (Wb)", weberTurns);
        return Require.result("current", weberTurns / l);
    }
    @Override public double incrementalInductanceAt(double amps) {
        Require.finite("current (A)", amps);
        return Require.result("incremental inductance", l);
    }

    @Override
    public double resistanceAt(double k) {
        Require.finite("temperature (K)", k);
        return Require.result("resistance", r20 * Conductor.COPPER.resistanceRatioAt(k));
    }

    @Override
    public Coil atTemperature(Quantity t) {
        double k = Conductor.kelvin("temperature", t);
        return new LumpedCoil(l, r20, k);
    }

    @Override
    public String describe() {
        String s = "coil " + inductance() + ", " + resistance();
        if (kelvin != Conductor.T20) s += " at " + temperature();
        return s;
    }

    @Override
    public String toString() {
        return describe();
    }
}
