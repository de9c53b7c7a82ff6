package org.ampturn;

import org.ampturn.units.Quantity;

/**
 * The facade the console preloads with {@code import static org.ampturn.Ampturn.*}: unit helpers
 * and the study and chart entry points. Every helper is a plain static method, so a worksheet is
 * ordinary Java.
 */
public final class Ampturn {
    private Ampturn() {}

    /** The tool's version, from the jar manifest (or "dev" when run from classes). */
    public static String version() {
        String v = Ampturn.class.getPackage().getImplementationVersion();
        return v != null ? v : "0.1.0";
    }

    // ---- units: each returns a Quantity in SI ------------------------------------------------
    public static Quantity m(double x) { return Quantity.of(x, "m"); }
    public static Quantity cm(double x) { return Quantity.of(x, "cm"); }
    public static Quantity mm(double x) { return Quantity.of(x, "mm"); }
    public static Quantity um(double x) { return Quantity.of(x, "um"); }
    public static Quantity inch(double x) { return Quantity.of(x, "inch"); }
    public static Quantity mil(double x) { return Quantity.of(x, "mil"); }
    public static Quantity mm2(double x) { return Quantity.of(x, "mm^2"); }
    public static Quantity cm2(double x) { return Quantity.of(x, "cm^2"); }

    public static Quantity A(double x) { return Quantity.of(x, "A"); }
    public static Quantity mA(double x) { return Quantity.of(x, "mA"); }
    public static Quantity uA(double x) { return Quantity.of(x, "uA"); }
    public static Quantity V(double x) { return Quantity.of(x, "V"); }
    public static Quantity mV(double x) { return Quantity.of(x, "mV"); }
    public static Quantity kV(double x) { return Quantity.of(x, "kV"); }
    public static Quantity ohm(double x) { return Quantity.of(x, "ohm"); }
    public static Quantity mohm(double x) { return Quantity.of(x, "mohm"); }
    public static Quantity kohm(double x) { return Quantity.of(x, "kohm"); }
    public static Quantity Mohm(double x) { return Quantity.of(x, "Mohm"); }

    public static Quantity H(double x) { return Quantity.of(x, "H"); }
    public static Quantity mH(double x) { return Quantity.of(x, "mH"); }
    public static Quantity uH(double x) { return Quantity.of(x, "uH"); }
    public static Quantity nH(double x) { return Quantity.of(x, "nH"); }
    public static Quantity F(double x) { return Quantity.of(x, "F"); }
    public static Quantity uF(double x) { return Quantity.of(x, "uF"); }
    public static Quantity nF(double x) { return Quantity.of(x, "nF"); }
    public static Quantity pF(double x) { return Quantity.of(x, "pF"); }

    public static Quantity s(double x) { return Quantity.of(x, "s"); }
    public static Quantity ms(double x) { return Quantity.of(x, "ms"); }
    public static Quantity us(double x) { return Quantity.of(x, "us"); }
    public static Quantity ns(double x) { return Quantity.of(x, "ns"); }
    public static Quantity Hz(double x) { return Quantity.of(x, "Hz"); }
    public static Quantity kHz(double x) { return Quantity.of(x, "kHz"); }
    public static Quantity MHz(double x) { return Quantity.of(x, "MHz"); }

    public static Quantity T(double x) { return Quantity.of(x, "T"); }
    public static Quantity mT(double x) { return Quantity.of(x, "mT"); }
    public static Quantity gauss(double x) { return Quantity.of(x, "G"); }
    public static Quantity Wb(double x) { return Quantity.of(x, "Wb"); }
    public static Quantity Apm(double x) { return Quantity.of(x, "A/m"); }
    public static Quantity Oe(double x) { return Quantity.of(x, "Oe"); }

    public static Quantity W(double x) { return Quantity.of(x, "W"); }
    public static Quantity mW(double x) { return Quantity.of(x, "mW"); }
    public static Quantity J(double x) { return Quantity.of(x, "J"); }
    public static Quantity mJ(double x) { return Quantity.of(x, "mJ"); }
    public static Quantity N(double x) { return Quantity.of(x, "N"); }
    public static Quantity kg(double x) { return Quantity.of(x, "kg"); }
    public static Quantity g(double x) { return Quantity.of(x, "g"); }

    /** An absolute temperature in degrees Celsius (kelvin inside). */
    public static Quantity degC(double x) { return Quantity.celsius(x); }
    /** A temperature difference in kelvin. */
    public static Quantity K(double x) { return Quantity.of(x, "K"); }

    /** A quantity from text: {@code q("4.7 mH")}, {@code q("2.5 A/mm^2")}. */
    public static Quantity q(String text) { return Quantity.parse(text); }

    // ---- coils and magnetic circuits ----------------------------------------------------------
    /** Magnetic-circuit parts in series (same flux, MMFs add): {@code series(core, gap(mm(0.5), mm2(80)))}. */
    public static org.ampturn.coil.MagneticCircuit series(org.ampturn.coil.MagneticCircuit... parts) {
        return org.ampturn.coil.MagneticCircuit.series(parts);
    }

    /** Magnetic-circuit parts in parallel (same MMF, fluxes add). */
    public static org.ampturn.coil.MagneticCircuit parallel(org.ampturn.coil.MagneticCircuit... parts) {
        return org.ampturn.coil.MagneticCircuit.parallel(parts);
    }

    /** An air gap of {@code length} across pole faces of {@code area}, no fringing. */
    public static org.ampturn.coil.AirGap gap(Quantity length, Quantity area) {
        return org.ampturn.coil.AirGap.of(length, area);
    }
}
