package org.ampturn.actuator;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;
import org.apache.commons.math3.complex.Complex;
import org.apache.commons.math3.complex.ComplexUtils;

/**
 * An AC magnet with a shading ring, in the periodic steady state of a sinusoidal supply: coil
 * current, power factor, the force over a cycle and the ring's loss, at any gap.
 *
 * <p>The two-flux phasor model of the shaded pole (H. C. Roters, Electromagnetic Devices, Wiley 1941,
 * chapter on alternating-current magnets; from memory): the pole face of area A is split into an
 * unshaded part (1 − s)·A and a part s·A enclosed by a ring of resistance r (one turn). The gap
 * reluctances are ℛ1 = g/(μ0(1 − s)A) and ℛ2 = g/(μ0·s·A); the ring's current, driven by −dΦ2/dt,
 * adds the reluctance jω/r to the shaded branch, so Φ2 lags Φ1 by atan(ω/(r·ℛ2)) when the rest of the
 * circuit has no reluctance. The coil of N turns and resistance R sees the complex inductance
 * L* = N²/(ℛs + ℛ1 ∥ (ℛ2 + jω/r)), with ℛs the reluctance of the rest of the path (other gaps, iron),
 * and draws I = V/(R + jωL*). The pull of each part is Φk(t)²/(2μ0Ak) (Maxwell's stress on a flat
 * gap), so the force is F(t) = a(1 + cos(2ωt + 2θ1)) + b(1 + cos(2ωt + 2θ2)) with a, b the parts'
 * mean pulls: without a ring it falls to zero twice a cycle (the hum and chatter of an unshaded AC
 * magnet); with one its minimum is a + b − |a·e^(2jθ1) + b·e^(2jθ2)|.
 *
 * <p>Range: linear iron (no saturation; an AC magnet's iron is laminated and worked well below
 * saturation), flat pole faces with no fringing or leakage, so the open-gap inductance is
 * underestimated and the open-gap current overestimated at gaps not small against the pole width.
 * Checked against a time-domain solution of the coil and ring circuits (tests).
 */
public final class ShadedPole {
    /** RMS supply voltage above which a caution is shown: the extra-low-voltage AC limit (IEC 61140). */
    public static final double CAUTION_VOLTS_RMS = 50;

    private static final double MU0 = 4e-7 * Math.PI;

    private final int turns;
    private final double coilOhms;
    private final double area;
    private final double shaded;
    private final double ringOhms;
    private final double seriesReluctance;

    private ShadedPole(int turns, double coilOhms, double area, double shaded, double ringOhms, double seriesReluctance) {
        this.turns = turns;
        this.coilOhms = coilOhms;
        this.area = area;
        this.shaded = shaded;
        this.ringOhms = ringOhms;
        this.seriesReluctance = seriesReluctance;
    }

    /**
     * A shaded-pole AC magnet.
     *
     * @param turns coil turns
     * @param coilResistance coil resistance at its working temperature
     * @param poleArea pole face area at the working gap
     * @param shadedFraction part of the pole face inside the ring, 0.05 to 0.95 (two thirds is usual, common practice)
     * @param ringResistance resistance of the ring as one turn, ρ·(mean length)/(cross-section)
     */
    public static ShadedPole of(int turns, Quantity coilResistance, Quantity poleArea, double shadedFraction, Quantity ringResistance) {
        Require.turns("turns", turns);
        double r = Require.nonNegative("coil resistance", coilResistance, Dimension.RESISTANCE, 1e9);
        double a = Require.positive("pole area", poleArea, Dimension.AREA, 1);
        Require.between("shaded fraction", shadedFraction, 0.05, 0.95);
        double ring = Require.positive("ring resistance", ringResistance, Dimension.RESISTANCE, 1e6);
        return new ShadedPole(turns, r, a, shadedFraction, ring, 0);
    }

    /** The same magnet with the reluctance of the rest of its path (other gaps, iron) in series with the shaded gap. */
    public ShadedPole withSeriesReluctance(Quantity reluctance) {
        double rs = Require.nonNegative("series reluctance", reluctance, Dimension.RELUCTANCE, 1e15);
        return new ShadedPole(turns, coilOhms, area, shaded, ringOhms, rs);
    }

    /** The same magnet without its ring (an unshaded AC magnet), for comparison. */
    public ShadedPole withoutRing() {
        return new ShadedPole(turns, coilOhms, area, shaded, Double.POSITIVE_INFINITY, seriesReluctance);
    }

    /** The periodic steady state on a sine of {@code rmsVoltage} and {@code frequency} with the armature at {@code gap}. */
    public OperatingPoint at(Quantity rmsVoltage, Quantity frequency, Quantity gap) {
        double v = Require.positive("RMS supply voltage", rmsVoltage, Dimension.VOLTAGE, 1e6);
        double f = Require.positive("frequency", frequency, Dimension.FREQUENCY, 1e6);
        double g = Require.length("gap", gap);
        return solve(v, f, g);
    }

    /**
     * The ratio of the RMS current with the armature open to the current with it closed: an AC
     * magnet draws several times its holding current until it closes (common practice), and the coil
     * burns out if the armature sticks open.
     */
    public double openToClosedCurrentRatio(Quantity rmsVoltage, Quantity frequency, Quantity closedGap, Quantity openGap) {
        double c = at(rmsVoltage, frequency, closedGap).rmsCurrentAmps;
        double o = at(rmsVoltage, frequency, openGap).rmsCurrentAmps;
        return Require.result("current ratio", o / c);
    }

    private OperatingPoint solve(double v, double f, double g) {
        double w = 2 * Math.PI * f;
        double a1 = (1 - shaded) * area;
        double a2 = shaded * area;
        double r1 = g / (MU0 * a1);
        double r2 = g / (MU0 * a2);
        // shaded branch reluctance ℛ2 + jω/r; an absent ring adds nothing
        double x2 = Double.isInfinite(ringOhms) ? 0 : w / ringOhms;
        Complex z2 = new Complex(r2, x2);
        Complex zp = Complex.ONE.divide(new Complex(1 / r1).add(Complex.ONE.divide(z2)));
        Complex zm = zp.add(new Complex(seriesReluctance));
        Complex lStar = new Complex((double) turns * turns).divide(zm);
        Complex z = new Complex(coilOhms).add(new Complex(0, w).multiply(lStar));
        Complex i = new Complex(v).divide(z); // RMS phasor, voltage at angle 0
        Complex phi = i.multiply(new Complex(turns)).divide(zm);
        Complex phi1 = phi.multiply(zp).divide(new Complex(r1));
        Complex phi2 = phi.multiply(zp).divide(z2);
        double ringLoss = Double.isInfinite(ringOhms) ? 0 : w * w * sq(phi2.abs()) / ringOhms;
        double a = sq(phi1.abs()) / (2 * MU0 * a1); // RMS² / (2 μ0 A): each part's mean pull
        double b = sq(phi2.abs()) / (2 * MU0 * a2);
        Complex ripple = ComplexUtils.polar2Complex(a, 2 * phi1.getArgument()).add(ComplexUtils.polar2Complex(b, 2 * phi2.getArgument()));
        double mean = a + b;
        double least = mean - ripple.abs();
        if (least < 1e-12 * mean) least = 0; // rounding of a pull that touches zero (no ring)
        return new OperatingPoint(v, f, g, i.abs(), Math.cos(z.getArgument()), sq(i.abs()) * coilOhms, ringLoss, mean, least,
                mean + ripple.abs(), phi1.getArgument() - phi2.getArgument(), Math.sqrt(2) * phi.abs() / area, lStar.abs());
    }

    private static double sq(double x) {
        return x * x;
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "shaded-pole AC magnet: %d turns, %s, pole %s, %.0f %% shaded, ring %s", turns,
                Quantity.of(coilOhms, Dimension.RESISTANCE), Quantity.of(area, Dimension.AREA), 100 * shaded,
                Double.isInfinite(ringOhms) ? "none" : Quantity.of(ringOhms, Dimension.RESISTANCE).toString());
    }

    /** The periodic steady state at one supply and gap. RMS values; forces toward closing. */
    public static final class OperatingPoint {
        private final double volts;
        private final double hertz;
        private final double gap;
        private final double rmsCurrentAmps;
        private final double powerFactor;
        private final double copperWatts;
        private final double ringWatts;
        private final double meanForce;
        private final double minForce;
        private final double maxForce;
        private final double lag;
        private final double peakFluxDensity;
        private final double inductanceMagnitude;

        private OperatingPoint(double volts, double hertz, double gap, double rmsCurrentAmps, double powerFactor, double copperWatts,
                double ringWatts, double meanForce, double minForce, double maxForce, double lag, double peakFluxDensity,
                double inductanceMagnitude) {
            this.volts = volts;
            this.hertz = hertz;
            this.gap = gap;
            this.rmsCurrentAmps = rmsCurrentAmps;
            this.powerFactor = powerFactor;
            this.copperWatts = copperWatts;
            this.ringWatts = ringWatts;
            this.meanForce = meanForce;
            this.minForce = Math.max(0, minForce);
            this.maxForce = maxForce;
            this.lag = lag;
            this.peakFluxDensity = peakFluxDensity;
            this.inductanceMagnitude = inductanceMagnitude;
        }

        /** RMS coil current. */
        public Quantity current() { return Quantity.of(rmsCurrentAmps, Dimension.CURRENT); }
        /** cos φ of the coil's impedance. */
        public double powerFactor() { return powerFactor; }
        /** Real power drawn: the coil's copper loss plus the ring's loss. */
        public Quantity power() { return Quantity.of(copperWatts + ringWatts, Dimension.POWER); }
        /** Copper loss of the coil. */
        public Quantity copperLoss() { return Quantity.of(copperWatts, Dimension.POWER); }
        /** Loss in the shading ring, ω²|Φ2|²/r. */
        public Quantity ringLoss() { return Quantity.of(ringWatts, Dimension.POWER); }
        /** Pull averaged over a cycle. */
        public Quantity meanForce() { return Quantity.of(meanForce, Dimension.FORCE); }
        /** The least pull during a cycle; zero for an unshaded pole. */
        public Quantity minimumForce() { return Quantity.of(minForce, Dimension.FORCE); }
        /** The greatest pull during a cycle. */
        public Quantity maximumForce() { return Quantity.of(maxForce, Dimension.FORCE); }
        /** The phase by which the shaded flux lags the unshaded flux, in degrees. */
        public double shadedFluxLagDegrees() { return Math.toDegrees(lag); }
        /** Peak of the mean gap flux density over the whole pole face (a check against the iron's saturation). */
        public Quantity peakFluxDensity() { return Quantity.of(peakFluxDensity, Dimension.FLUX_DENSITY); }
        /** |L*|, the magnitude of the coil's complex inductance at this gap. */
        public Quantity inductance() { return Quantity.of(inductanceMagnitude, Dimension.INDUCTANCE); }

        /** Least pull less the load held against it: negative means the armature chatters (lifts off twice a cycle). */
        public Quantity margin(Quantity load) {
            double l = Require.nonNegative("load force", load, Dimension.FORCE, 1e9);
            return Quantity.of(minForce - l, Dimension.FORCE);
        }

        /** Safety notes of this operating point: the supply voltage, when it is above extra-low voltage. */
        public List<String> cautions() {
            List<String> c = new ArrayList<>();
            if (volts > CAUTION_VOLTS_RMS) {
                c.add("caution: " + Quantity.of(volts, Dimension.VOLTAGE) + " RMS is above the " + CAUTION_VOLTS_RMS
                        + " V AC extra-low-voltage limit: a mains coil needs insulation, protection and wiring to local codes and licensed practice");
            }
            return c;
        }

        @Override
        public String toString() {
            String s = String.format(Locale.ROOT, "at %s RMS %s, gap %s: %s RMS, PF %.3f, pull %s mean, %s min, ring %s, shaded flux lags %.1f°",
                    Quantity.of(volts, Dimension.VOLTAGE), Quantity.of(hertz, Dimension.FREQUENCY), Quantity.of(gap, Dimension.LENGTH),
                    current(), powerFactor, meanForce(), minimumForce(), ringLoss(), shadedFluxLagDegrees());
            return cautions().isEmpty() ? s : s + " (" + cautions().size() + " caution)";
        }
    }
}
