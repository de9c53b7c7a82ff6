package org.ampturn.actuator;

import static org.ampturn.Ampturn.Hz;
import static org.ampturn.Ampturn.N;
import static org.ampturn.Ampturn.V;
import static org.ampturn.Ampturn.mm;
import static org.ampturn.Ampturn.mm2;
import static org.ampturn.Ampturn.ohm;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;
import org.junit.jupiter.api.Test;

/**
 * The shaded pole's phasor solution against (1) the textbook two-flux model's phase lag
 * atan(ω/(r·ℛ2)) (Roters 1941, from memory), and (2) an independent time-domain solution of the same
 * coil and ring circuits by Commons Math's Dormand-Prince 8(5,3), run from switch-on for 60 cycles,
 * its last cycle sampled for RMS current, mean and least pull, ring loss and input power.
 */
class ShadedPoleTest {
    private static final double MU0 = 4e-7 * Math.PI;
    private static final int TURNS = 1200;
    private static final double R = 40, AREA = 2e-4, SHADED = 0.67, RING = 0.5e-3, RS = 2e5, VRMS = 230, F = 50, GAP = 0.1e-3;

    private final ShadedPole magnet = ShadedPole.of(TURNS, ohm(R), mm2(AREA * 1e6), SHADED, ohm(RING))
            .withSeriesReluctance(Quantity.of(RS, Dimension.RELUCTANCE));

    @Test
    void theShadedFluxLagsByTheTwoFluxModelsAngle() {
        ShadedPole bare = ShadedPole.of(TURNS, ohm(R), mm2(AREA * 1e6), SHADED, ohm(RING));
        double r2 = GAP / (MU0 * SHADED * AREA);
        double expected = Math.toDegrees(Math.atan(2 * Math.PI * F / (RING * r2)));
        assertEquals(expected, bare.at(V(VRMS), Hz(F), mm(GAP * 1e3)).shadedFluxLagDegrees(), 1e-9);
    }

    @Test
    void theSteadyStateMatchesATimeDomainSolutionOfTheCoilAndRing() {
        var p = magnet.at(V(VRMS), Hz(F), mm(GAP * 1e3));
        double[] sim = simulate(RING);
        assertEquals(sim[0], p.current().si(), 2e-4 * sim[0], "RMS current");
        assertEquals(sim[1], p.meanForce().si(), 2e-4 * sim[1], "mean pull");
        assertEquals(sim[2], p.minimumForce().si(), 2e-3 * sim[1], "least pull");
        assertEquals(sim[3], p.ringLoss().si(), 2e-4 * sim[3], "ring loss");
        assertEquals(sim[4], p.power().si(), 2e-4 * sim[4], "input power = copper + ring loss");
        assertEquals(sim[4] / (VRMS * sim[0]), p.powerFactor(), 1e-3, "power factor");
        assertTrue(p.minimumForce().si() > 0.2 * p.meanForce().si(), "a ring keeps the pull up through the cycle: " + p);
    }

    @Test
    void withoutARingThePullFallsToZeroTwiceACycle() {
        var p = magnet.withoutRing().at(V(VRMS), Hz(F), mm(GAP * 1e3));
        assertEquals(0, p.minimumForce().si(), 1e-9 * p.meanForce().si());
        assertEquals(2 * p.meanForce().si(), p.maximumForce().si(), 1e-9 * p.meanForce().si());
        assertEquals(0, p.ringLoss().si());
        assertTrue(p.margin(N(1)).si() < 0, "chatters against any load");
    }

    @Test
    void anOpenArmatureDrawsSeveralTimesTheHoldingCurrentAndMainsCarriesACaution() {
        double ratio = magnet.openToClosedCurrentRatio(V(VRMS), Hz(F), mm(0.1), mm(4));
        assertTrue(ratio > 2, "open/closed current ratio " + ratio);
        var p = magnet.at(V(VRMS), Hz(F), mm(0.1));
        assertEquals(1, p.cautions().size());
        assertTrue(p.cautions().get(0).contains("local codes and licensed practice"), p.cautions().toString());
        assertTrue(magnet.at(V(24), Hz(F), mm(0.1)).cautions().isEmpty());
    }

    @Test
    void badValuesAreRefusedByName() {
        var e = assertThrows(IllegalArgumentException.class, () -> magnet.at(V(230), Hz(0), mm(0.1)));
        assertTrue(e.getMessage().contains("frequency"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> magnet.at(V(230), Hz(Double.NaN), mm(0.1)));
        assertTrue(e.getMessage().contains("Hz must be a finite number"), e.getMessage()); // refused where the value is made
        e = assertThrows(IllegalArgumentException.class, () -> ShadedPole.of(100, ohm(1), mm2(100), 1.2, ohm(1e-3)));
        assertTrue(e.getMessage().contains("shaded fraction"), e.getMessage());
    }

    /** RMS current, mean pull, least pull, ring loss and input power over the 60th cycle, by direct integration. */
    private static double[] simulate(double ring) {
        double w = 2 * Math.PI * F;
        double a1 = (1 - SHADED) * AREA, a2 = SHADED * AREA;
        double r1 = GAP / (MU0 * a1), r2 = GAP / (MU0 * a2);
        // states: the fluxes of the unshaded and the shaded part
        FirstOrderDifferentialEquations ode = new FirstOrderDifferentialEquations() {
            public int getDimension() { return 2; }
            public void computeDerivatives(double t, double[] y, double[] dy) {
                double i = (RS * (y[0] + y[1]) + r1 * y[0]) / TURNS; // N i = ℛs Φ + ℛ1 Φ1
                double iRing = r2 * y[1] - r1 * y[0];                // N i + i_r = ℛs Φ + ℛ2 Φ2
                double v = Math.sqrt(2) * VRMS * Math.sin(w * t);
                dy[1] = -ring * iRing;                                // the ring: r i_r = −dΦ2/dt
                dy[0] = (v - R * i) / TURNS - dy[1];                  // the coil: v = R i + N dΦ/dt
            }
        };
        var dp = new DormandPrince853Integrator(1e-12, 1e-4, 1e-15, 1e-11);
        double[] y = new double[2];
        double period = 1 / F;
        double t = 0;
        dp.integrate(ode, t, y, 59 * period, y);
        t = 59 * period;
        int n = 4000;
        double i2 = 0, fSum = 0, fMin = Double.MAX_VALUE, ringLoss = 0, power = 0;
        for (int k = 0; k < n; k++) {
            double t1 = t + period / n;
            dp.integrate(ode, t, y, t1, y);
            t = t1;
            double i = (RS * (y[0] + y[1]) + r1 * y[0]) / TURNS;
            double iRing = r2 * y[1] - r1 * y[0];
            double force = y[0] * y[0] / (2 * MU0 * a1) + y[1] * y[1] / (2 * MU0 * a2);
            i2 += i * i / n;
            fSum += force / n;
            fMin = Math.min(fMin, force);
            ringLoss += ring * iRing * iRing / n;
            power += Math.sqrt(2) * VRMS * Math.sin(w * t) * i / n;
        }
        return new double[] {Math.sqrt(i2), fSum, fMin, ringLoss, power};
    }
}
