package org.ampturn.drive;

import org.ampturn.coil.Coil;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;

/**
 * A test coil with a soft-saturating core and an analytic inverse:
 * λ(i) = L1·Is·i/(Is + |i|) + La·i. Small-signal inductance L1 + La, falling to the air-core La
 * well above the knee current Is. Invented for tests and benchmarks; not a real part.
 */
public class SaturatingCoil implements Coil {
    final double l1, is, la, r;

    public SaturatingCoil(double l1, double kneeAmps, double la, double ohms) {
        this.l1 = l1;
        this.is = kneeAmps;
        this.la = la;
        this.r = ohms;
    }

    @Override public Quantity inductance() { return Quantity.of(l1 + la, Dimension.INDUCTANCE); }
    @Override public Quantity resistance() { return Quantity.of(r, Dimension.RESISTANCE); }
    @Override public Quantity temperature() { return Quantity.celsius(20); }

    @Override
    public double fluxLinkageAt(double i) {
        return l1 * is * i / (is + Math.abs(i)) + la * i;
    }

    @Override
    public double currentAt(double lam) {
        // positive root of (La/Is)·i² + (L1 + La − λ/Is)·i − λ = 0, for λ ≥ 0; odd in λ
        double x = Math.abs(lam);
        double a = la / is, b = l1 + la - x / is;
        double disc = Math.sqrt(b * b + 4 * a * x);
        double i = b >= 0 ? 2 * x / (b + disc) : (disc - b) / (2 * a);
        return Math.copySign(i, lam);
    }

    @Override
    public double incrementalInductanceAt(double i) {
        double d = is + Math.abs(i);
        return l1 * is * is / (d * d) + la;
    }

    /** Co-energy ∫0^i λ di' in closed form: L1·Is·(i − Is·ln(1 + i/Is)) + La·i²/2 (i ≥ 0). */
    public double coEnergyAt(double i) {
        return l1 * is * (i - is * Math.log1p(i / is)) + la * i * i / 2;
    }

    @Override public double resistanceAt(double kelvin) { return r; }
    @Override public String describe() { return "saturating test coil"; }
    @Override public boolean isLinear() { return false; }
    @Override public Coil atTemperature(Quantity t) { return this; }
}
