package org.ampturn.coil;

import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;

/** A coil of constant inductance whose resistance follows copper's temperature coefficient. */
final class LumpedCoil implements Coil {
    static final double T20 = 293.15;
    /** Copper, IEC 60028: resistivity at 20 °C is 1/58 Ω·mm²/m and alpha_20 = 0.00393 /K. */
    static final double ALPHA20 = 0.00393;

    private final double l;
    private final double r20;
    private final double refKelvin;
    private final double kelvin;

    LumpedCoil(double l, double r20, double refKelvin, double kelvin) {
        this.l = l;
        this.r20 = r20;
        this.refKelvin = refKelvin;
        this.kelvin = kelvin;
    }

    @Override public Quantity inductance() { return Quantity.of(l, Dimension.INDUCTANCE); }
    @Override public Quantity resistance() { return Quantity.of(resistanceAt(kelvin), Dimension.RESISTANCE); }
    @Override public Quantity temperature() { return Quantity.temperatureKelvin(kelvin); }
    @Override public double fluxLinkageAt(double amps) { return l * amps; }
    @Override public double currentAt(double weberTurns) { return weberTurns / l; }
    @Override public double incrementalInductanceAt(double amps) { return l; }

    @Override
    public double resistanceAt(double k) {
        return r20 * (1 + ALPHA20 * (k - refKelvin));
    }

    @Override
    public Coil atTemperature(Quantity t) {
        double k = org.ampturn.units.Require.si("temperature", t, Dimension.TEMPERATURE);
        if (k <= 0) throw new IllegalArgumentException("temperature must be above absolute zero, got " + t);
        return new LumpedCoil(l, r20, refKelvin, k);
    }

    @Override
    public String describe() {
        String s = "coil " + inductance() + ", " + resistance();
        if (kelvin != refKelvin) s += " at " + temperature();
        return s;
    }

    @Override
    public String toString() {
        return describe();
    }
}
