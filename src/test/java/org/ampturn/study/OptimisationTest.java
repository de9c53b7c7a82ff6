package org.ampturn.study;

import static org.ampturn.Ampturn.*;
import static org.junit.jupiter.api.Assertions.*;

import java.util.List;
import org.junit.jupiter.api.Test;

class OptimisationTest {
    static final double MU0 = SweepTest.MU0;
    static final double RHO = 1.0 / 58e6; // annealed copper at 20 °C, IEC 60028 (1/58 Ω·mm²/m)

    /**
     * A close-wound long solenoid of length l = 20 mm: wire diameter l/N, L = μ0 N² π r² / l
     * (long-solenoid formula, any textbook) and R = ρ 2π r N / (π (l/N)²/4) = 8 ρ r N³ / l².
     * With L ≥ L0, N r ≥ k = sqrt(L0 l / (μ0 π)); R ∝ N² (N r) falls with N, so the least R has the
     * fewest turns that reach L0 at the largest radius: N* = ceil(k / r_max), r* = k / N*
     * (worked out by hand for this test).
     */
    static Outputs solenoid(Point p) {
        double l = 0.020;
        int n = p.integer("turns");
        double r = p.si("radius");
        return Outputs.of("R", ohm(8 * RHO * r * n * n * n / (l * l)), "L", H(MU0 * n * n * Math.PI * r * r / l));
    }

    @Test
    void leastResistanceForAnInductanceByExhaustiveSearch() {
        double k = Math.sqrt(1e-3 * 0.020 / (MU0 * Math.PI));
        int nStar = (int) Math.ceil(k / 0.015);
        Optimum o = minimise("R").over(Param.integer("turns", 20, 2000), Param.real("radius", mm(5), mm(15)))
                .subjectTo("L >= 1 mH").run(OptimisationTest::solenoid);
        assertTrue(o.isFeasible(), o.toString());
        assertEquals(nStar, o.winner().<Integer>value("turns"));
        assertEquals(k / nStar, o.get("radius").si(), 1e-6 * k / nStar);
        double margin = o.margins().get(limit("L >= 1 mH")).si();
        assertTrue(margin >= 0 && margin < 1e-8, "margin " + margin);
        assertEquals(nStar + 1, o.runnersUp().get(0).<Integer>value("turns"));
        assertTrue(o.toString().contains("best: turns = " + nStar), o.toString());
    }

    @Test
    void theSameAnswerByCompassSearchOverAWideRange() {
        double k = Math.sqrt(1e-3 * 0.020 / (MU0 * Math.PI));
        int nStar = (int) Math.ceil(k / 0.015);
        Optimum o = minimise("R").over(Param.integer("turns", 20, 20_000), Param.real("radius", mm(5), mm(15)))
                .subjectTo(Limit.atLeast("L", mH(1))).run(OptimisationTest::solenoid);
        assertEquals(nStar, o.winner().<Integer>value("turns"), o.toString());
        assertTrue(o.toString().contains("compass search"), o.toString());
    }

    @Test
    void brooksCoilIsTheLargestInductanceForALengthOfWire() {
        // Brooks (1931): for a given length of wire, a square winding section (b = c) with mean
        // radius a = 3c/2 gives the greatest inductance, L = 0.025491 c N² µH with c in cm
        // (from memory; the ThickCoil fixture reproduces it to 0.02 %). Wire: 100 m, 0.5 mm pitch.
        double w = 100, pitch = 0.5e-3;
        Optimum o = maximise("L").over(Param.real("a", mm(10), mm(40)), Param.real("b", mm(5), mm(40))).withThreads(1)
                .run(p -> {
                    double a = p.si("a"), b = p.si("b");
                    double n = w / (2 * Math.PI * a);
                    double c = n * pitch * pitch / b;
                    return Outputs.of("L", H(ThickCoil.inductance(a, b, c, n, 8)), "c", m(c), "N", n);
                });
        double a = o.get("a").si(), b = o.get("b").si(), c = o.get("c").si();
        assertEquals(1.5, a / c, 0.05, o.toString());
        assertEquals(1.0, b / c, 0.05, o.toString());
        // the Brooks coil of this wire: c³ = W pitch² / (3π), N = c² / pitch²
        double cb = Math.cbrt(w * pitch * pitch / (3 * Math.PI)), nb = cb * cb / (pitch * pitch);
        assertEquals(0.025491 * cb * 100 * nb * nb * 1e-6, o.value().si(), 2e-3 * o.value().si());
    }

    @Test
    void choicesFromAListAreTriedInTurn() {
        // pick the wire that carries 2 A at the lowest copper mass per metre while J ≤ 4 A/mm²:
        // areas π d²/4 of 0.6, 0.7, 0.8, 0.9 mm wire: 0.283, 0.385, 0.503, 0.636 mm²; J = 7.07, 5.20, 3.98, 3.14
        List<Double> diameters = List.of(0.9e-3, 0.6e-3, 0.8e-3, 0.7e-3);
        Optimum o = minimise("area").over(Param.choice("d", diameters)).subjectTo("J <= 4 A/mm^2").run(p -> {
            double d = p.<Double>choice("d");
            double area = Math.PI * d * d / 4;
            return Outputs.of("area", mm2(area * 1e6), "J", q((2 / area / 1e6) + " A/mm^2"));
        });
        assertEquals(0.8e-3, o.winner().<Double>value("d"));
        assertEquals(1, o.runnersUp().stream().filter(Candidate::isFeasible).count());
        assertEquals(4, o.candidates().size());
    }

    @Test
    void whenNothingMeetsTheLimitsTheClosestIsNamed() {
        Optimum o = minimise("R").over(Param.integer("turns", 20, 100), Param.real("radius", mm(5), mm(15)))
                .subjectTo("L >= 10 mH").run(OptimisationTest::solenoid);
        assertFalse(o.isFeasible());
        String s = o.toString();
        assertTrue(s.contains("no design meets every limit"), s);
        assertTrue(s.contains("short by"), s);
        // 100 turns at 15 mm give the most inductance: L = μ0 100² π 0.015² / 0.02 = 0.444 mH, far short of 10 mH
        assertEquals(100, o.winner().<Integer>value("turns"));
        assertEquals(0.015, o.get("radius").si(), 1e-9);
        assertEquals(limit("L >= 10 mH"), o.closestToBeingMet());

        Optimum two = minimise("R").over(Param.integer("turns", 20, 100), Param.real("radius", mm(5), mm(15)))
                .subjectTo("L >= 10 mH", "R <= 1 mohm").run(OptimisationTest::solenoid);
        assertFalse(two.isFeasible());
        // the failed limit with the smaller relative shortfall at the closest design
        double shortL = -two.margins().get(limit("L >= 10 mH")).si() / 10e-3;
        double shortR = -two.margins().get(limit("R <= 1 mohm")).si() / 1e-3;
        assertTrue(shortL > 0 && shortR > 0);
        assertEquals(shortL < shortR ? limit("L >= 10 mH") : limit("R <= 1 mohm"), two.closestToBeingMet());
        assertTrue(two.toString().contains("closest to being met: " + two.closestToBeingMet()), two.toString());
    }

    @Test
    void sameWinnerOnOneOrTwoThreads() {
        var problem = minimise("R").over(Param.integer("turns", 20, 400), Param.real("radius", mm(5), mm(15))).subjectTo("L >= 1 mH");
        Optimum one = problem.withThreads(1).run(OptimisationTest::solenoid);
        Optimum two = problem.withThreads(2).run(OptimisationTest::solenoid);
        assertEquals(one.winner().point(), two.winner().point());
        assertEquals(one.evaluations(), two.evaluations());
    }

    @Test
    void badProblemsSaySo() {
        var e = assertThrows(IllegalArgumentException.class, () -> minimise("R").run(p -> 1));
        assertTrue(e.getMessage().contains("nothing to optimise"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> Param.real("gap", mm(2), mm(1)));
        assertTrue(e.getMessage().contains("empty"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> limit("L = 1 mH"));
        assertTrue(e.getMessage().contains("\"L >= 1 mH\""), e.getMessage());
        var st = assertThrows(IllegalStateException.class, () -> minimise("R").over(Param.integer("n", 1, 3)).run(p -> Outputs.of("L", mH(1))));
        assertTrue(st.getMessage().contains("no output named \"R\""), st.getMessage());
    }
}
