package org.ampturn.actuator;

import static org.ampturn.Ampturn.Hz;
import static org.ampturn.Ampturn.T;
import static org.ampturn.Ampturn.V;
import static org.ampturn.Ampturn.mm;
import static org.ampturn.Ampturn.mm2;
import static org.ampturn.Ampturn.mohm;
import static org.ampturn.Ampturn.ms;
import static org.ampturn.Ampturn.nH;
import static org.ampturn.Ampturn.ohm;
import static org.ampturn.Ampturn.q;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.ampturn.coil.Core;
import org.ampturn.coil.MagneticCircuit;
import org.ampturn.material.CoreLoss;
import org.ampturn.material.MagneticMaterial;
import org.ampturn.material.Materials;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.junit.jupiter.api.Test;

/**
 * The AC solenoid's steady state from its time-domain runs, against closed forms from outside the
 * project: the phasor solution of a series RL on a sine (Hayt, Kemmerly and Durbin, Engineering Circuit
 * Analysis, 8th ed., ch. 10: I = V/|R + jωL|, power factor cos θ = R/|Z|), Steinmetz's loss of a
 * sinusoidal flux (Steinmetz 1892; the iGSE equals it for a sine, Venkatachalam et al. 2002), the energy
 * balance of a periodic steady state (the stored energy returns to its value each cycle, so the mean
 * supplied power is the mean resistive loss), and the two-flux phasor model of the shaded pole.
 */
class AcSolenoidTest {
    private static final double MU0 = 4e-7 * Math.PI;
    private static final int TURNS = 2000;
    private static final double R = 60, AREA = 150e-6, IRON_L = 0.1, MUR = 4000, STROKE = 3e-3, RESIDUAL = 0.1e-3, LEAK = 60e-9;

    /** RMS volts at which the silicon-steel frame reaches about 1.5 T peak closed: √2·V/(ω·N·A). */
    private static final double SAT_V = 100;

    private static final MagneticMaterial LINEAR = MagneticMaterial.linear("test laminations", MUR, T(1.6));

    private static AcSolenoid linear() {
        return AcSolenoid.of(TURNS, ohm(R), Core.of("frame", mm(IRON_L * 1e3), mm2(AREA * 1e6), LINEAR), mm2(AREA * 1e6), mm(STROKE * 1e3))
                .withResidualGap(mm(RESIDUAL * 1e3)).withLeakage(nH(LEAK * 1e9));
    }

    private static AcSolenoid saturating() {
        return AcSolenoid.of(TURNS, ohm(R), Core.of("frame", mm(IRON_L * 1e3), mm2(AREA * 1e6), Materials.SILICON_STEEL), mm2(AREA * 1e6),
                mm(STROKE * 1e3)).withResidualGap(mm(RESIDUAL * 1e3)).withLeakage(nH(LEAK * 1e9));
    }

    /** L = N²·(permeance of iron in series with the gap and the leakage in parallel). */
    private static double inductance(double gap) {
        double iron = IRON_L / (MU0 * MUR * AREA);
        double gapPermeance = MU0 * AREA / gap + LEAK;
        return TURNS * (double) TURNS / (iron + 1 / gapPermeance);
    }

    @Test
    void aLinearCoilDrawsThePhasorCurrentWithItsPowerFactor() {
        double v = 120, f = 60, w = 2 * Math.PI * f;
        for (boolean closed : new boolean[] {true, false}) {
            double gap = closed ? RESIDUAL : STROKE + RESIDUAL;
            var p = closed ? linear().closed(V(v), Hz(f)) : linear().open(V(v), Hz(f));
            double z = Math.hypot(R, w * inductance(gap)); // Hayt et al. ch. 10: |Z| = |R + jωL|
            String where = p.state() + ": " + p;
            assertEquals(v / z, p.current().si(), 1e-5 * v / z, "RMS current V/|Z|, " + where);
            assertEquals(Math.sqrt(2) * v / z, p.peakCurrent().si(), 1e-4 * v / z, "peak √2·I, " + where);
            assertEquals(z, p.impedance().si(), 1e-5 * z, "|Z|, " + where);
            assertEquals(R / z, p.powerFactor(), 1e-5, "power factor R/|Z|, " + where);
            assertEquals(v * v / z * (R / z), p.power().si(), 1e-5 * v * v / z * (R / z), "real power I²R, " + where);
            assertTrue(Double.isNaN(p.coreLoss().si()), "no loss data, no core loss");
            // mean pull ⟨B²⟩A/(2μ0) of the gap's sinusoidal flux: B̂ = √2·N·I·(gap permeance share)/A
            double phi = Math.sqrt(2) * TURNS * p.current().si() / (IRON_L / (MU0 * MUR * AREA) + 1 / (MU0 * AREA / gap + LEAK));
            double bGap = phi * (MU0 * AREA / gap) / (MU0 * AREA / gap + LEAK) / AREA;
            double force = bGap * bGap / 2 * AREA / (2 * MU0);
            assertEquals(force, p.meanForce().si(), 1e-4 * force, "mean pull, " + where);
        }
    }

    @Test
    void theInrushRatioIsOpenOverClosedCurrentAndSeveralTimes() {
        var s = saturating();
        double ratio = s.inrushRatio(V(SAT_V), Hz(50));
        assertEquals(s.open(V(SAT_V), Hz(50)).current().si() / s.closed(V(SAT_V), Hz(50)).current().si(), ratio, 1e-12);
        assertTrue(ratio > 3, "an AC solenoid draws several times its holding current open (common practice): " + ratio);
    }

    @Test
    void aSaturatingCoilsRmsCurrentClosesTheEnergyBalanceOfItsLastCycle() {
        var p = saturating().closed(V(SAT_V), Hz(50));
        assertTrue(p.crestFactor() > 1.5, "the iron saturates, the current is peaky: crest factor " + p.crestFactor());
        assertTrue(p.peakIronFluxDensity().si() > 1.3, "into the knee: " + p.peakIronFluxDensity());
        // mean supplied power over the last cycle (stored energy periodic) = I²rms·R + core loss: the run
        // draws the core loss through its core-loss branch, and the iGSE of the last cycle's B(t) gives it again
        var e = p.run().suppliedEnergy();
        double[] t = e.times(), v = e.values();
        int n = t.length, from = n - 1 - AcSolenoid.SAMPLES_PER_CYCLE;
        double supplied = (v[n - 1] - v[from]) / (t[n - 1] - t[from]);
        double copper = p.current().si() * p.current().si() * R;
        assertEquals(copper, p.copperLoss().si(), 1e-12 * copper);
        assertTrue(p.coreLoss().si() > 0, "silicon steel has loss data");
        assertEquals(supplied, copper + p.coreLoss().si(), 2e-4 * supplied, "supplied = I²rms·R + core loss over the last cycle");
        var ec = p.run().coreEnergy().values();
        double drawn = (ec[n - 1] - ec[from]) / (t[n - 1] - t[from]);
        assertEquals(drawn, p.coreLoss().si(), 1e-3 * drawn, "the run's core-loss branch over the last cycle = the iGSE of its B(t)");
        // real power = I²rms·R + core loss, and the power factor is P/(V·I)
        assertEquals(supplied, p.power().si(), 2e-4 * p.power().si());
        assertEquals(p.power().si() / (SAT_V * p.current().si()), p.powerFactor(), 1e-12);
        assertFalse(p.notes().toString().contains("not settled"), p.notes().toString());
        assertEquals(1, p.cautions().size(), "above 50 V RMS: " + p.cautions());
        assertTrue(p.toString().contains("local codes and licensed practice"), p.toString());
    }

    @Test
    void theCoreLossOfASinusoidalFluxIsSteinmetzs() {
        CoreLoss loss = CoreLoss.steinmetz(5.0, 1.4, 2.0);
        var lossy = AcSolenoid.of(TURNS, ohm(R), Core.of("frame", mm(IRON_L * 1e3), mm2(AREA * 1e6), LINEAR.withCoreLoss(loss)),
                mm2(AREA * 1e6), mm(STROKE * 1e3)).withResidualGap(mm(RESIDUAL * 1e3));
        var p = lossy.closed(V(120), Hz(60));
        double w = 2 * Math.PI * 60, reluctance = IRON_L / (MU0 * MUR * AREA) + RESIDUAL / (MU0 * AREA);
        double l = TURNS * (double) TURNS / reluctance;
        double current = 120 / Math.hypot(R, w * l);
        double bPeak = Math.sqrt(2) * TURNS * current / reluctance / AREA;
        // the run's core-loss current adds to the coil current, so its R·i lowers the flux a little below the phasor's
        assertEquals(bPeak, p.peakIronFluxDensity().si(), 2e-3 * bPeak);
        double b = p.peakIronFluxDensity().si();
        double expected = 5.0 * Math.pow(60, 1.4) * b * b * IRON_L * AREA; // Steinmetz 1892: k·f^α·B̂^β·volume
        assertEquals(expected, p.coreLoss().si(), 1e-4 * expected);
    }

    @Test
    void switchedOnAtAZeroCrossingTheClosedIronSaturatesIntoAnInrush() {
        var s = saturating();
        double steady = s.closed(V(SAT_V), Hz(50)).peakCurrent().si();
        double atZero = s.switchOn(V(SAT_V), Hz(50), 0, s.closedGap(), ms(60)).peakCurrent().si();
        double atPeak = s.switchOn(V(SAT_V), Hz(50), 90, s.closedGap(), ms(60)).peakCurrent().si();
        // the flux is driven towards twice its steady peak, far into saturation (common practice)
        assertTrue(atZero > 10 * steady, atZero + " A against " + steady + " A");
        assertEquals(steady, atPeak, 0.1 * steady, "at the voltage peak the flux starts at its steady zero crossing");
    }

    @Test
    void theHoldingPointIsTheTwoFluxModelWithTheIronsSecantReluctance() {
        var ringed = linear().withShadingRing(0.67, mohm(0.5));
        var h = ringed.holding(V(230), Hz(50));
        // linear iron: the secant is the small-signal reluctance
        var expected = ShadedPole.of(TURNS, ohm(R), mm2(AREA * 1e6), 0.67, mohm(0.5))
                .withSeriesReluctance(Quantity.of(IRON_L / (MU0 * MUR * AREA), Dimension.RELUCTANCE)).at(V(230), Hz(50), mm(RESIDUAL * 1e3));
        assertEquals(expected.current().si(), h.current().si(), 1e-9 * expected.current().si());
        assertEquals(expected.minimumForce().si(), h.minimumForce().si(), 1e-9 * expected.meanForce().si());
        assertTrue(h.minimumForce().si() > 0, "a ring keeps the pull up");
        assertEquals(0, linear().holding(V(230), Hz(50)).minimumForce().si(), "no ring: the pull falls to zero twice a cycle");
        assertTrue(h.current().si() > ringed.closed(V(230), Hz(50)).current().si(), "the ring's loss raises the holding current");
    }

    @Test
    void aWarmCoilHasItsHotResistance() {
        var warm = linear().atTemperature(q("100 degC"));
        assertEquals(R * (1 + 0.00393 * 80), warm.resistance().si(), 1e-3 * R, "IEC 60028 copper, α20 = 0.00393/K");
        assertTrue(warm.closed(V(120), Hz(60)).copperLoss().si() > 0);
    }

    @Test
    void badInputIsNamed() {
        var s = linear();
        assertMessage("supply frequency", () -> s.closed(V(230), Hz(0)));
        assertMessage("supply frequency", () -> s.open(V(230), Quantity.of(Double.NaN, Dimension.FREQUENCY)));
        assertMessage("RMS supply voltage", () -> s.closed(V(-1), Hz(50)));
        assertMessage("stroke", () -> AcSolenoid.of(TURNS, ohm(R), Core.of("frame", mm(100), mm2(150), LINEAR), mm2(150), mm(0)));
        assertMessage("shaded fraction", () -> s.withShadingRing(1.2, mohm(1)));
        assertMessage("ring resistance", () -> s.withShadingRing(0.6, ohm(0)));
        assertMessage("leakage permeance", () -> s.withLeakage(nH(-1)));
        assertMessage("switch-on duration", () -> s.switchOn(V(230), Hz(50_000), 0, s.closedGap(), ms(1000)));
        assertMessage("iron path", () -> AcSolenoid.of(TURNS, ohm(R), (MagneticCircuit) null, mm2(150), mm(3)));
        assertMessage("residual gap", () -> AcSolenoid.of(TURNS, ohm(R), Core.of("frame", mm(100), mm2(150), LINEAR), mm2(150), mm(3))
                .holding(V(230), Hz(50)));
    }

    private static void assertMessage(String part, org.junit.jupiter.api.function.Executable e) {
        var x = assertThrows(IllegalArgumentException.class, e);
        assertTrue(x.getMessage().contains(part), "message names " + part + ": " + x.getMessage());
    }
}
