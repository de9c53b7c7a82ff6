package org.ampturn.thermal;

import static org.junit.jupiter.api.Assertions.*;

import java.util.stream.Stream;
import org.ampturn.material.Conductor;
import org.ampturn.units.Quantity;
import org.ampturn.wire.Bobbin;
import org.ampturn.wire.Packing;
import org.ampturn.wire.Winding;
import org.ampturn.wire.Wire;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

class ThermalTest {
    private static Quantity q(String s) { return Quantity.parse(s); }

    /** IEC 60085:2007 Table 1, thermal classes and their letters (from memory of the published table). */
    static Stream<Arguments> iec60085() {
        return Stream.of(Arguments.of(90, "Y"), Arguments.of(105, "A"), Arguments.of(120, "E"), Arguments.of(130, "B"),
                Arguments.of(155, "F"), Arguments.of(180, "H"), Arguments.of(200, "N"), Arguments.of(220, "R"), Arguments.of(250, ""));
    }

    @ParameterizedTest(name = "class {0} ({1}), IEC 60085")
    @MethodSource("iec60085")
    void thermalClassesOfIec60085(int celsius, String letter) {
        InsulationClass c = InsulationClass.of(celsius);
        assertEquals(letter, c.letter());
        assertEquals(celsius + 273.15, c.limit().si(), 1e-9);
        if (!letter.isEmpty()) assertEquals(c, InsulationClass.of(letter.toLowerCase()));
        assertEquals(c, InsulationClass.of(String.valueOf(celsius)));
    }

    @Test
    void unknownClassesAreRefused() {
        var e = assertThrows(IllegalArgumentException.class, () -> InsulationClass.of(140));
        assertTrue(e.getMessage().contains("140") && e.getMessage().contains("155"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> InsulationClass.of("Z"));
    }

    @Test
    void empiricalRulesInTheirOwnUnits() {
        // McLyman's rule: ΔT = 450·ψ^0.826, ψ in W/cm²; 1 W on 20 cm² is ψ = 0.05
        assertEquals(450 * Math.pow(0.05, 0.826), Cooling.handbookRule().riseAt(1, 20e-4), 1e-9);
        assertEquals(450 * Math.pow(0.05, 0.826), Cooling.handbookRule().rise(q("1 W"), q("20 cm^2")).si(), 1e-9);
        // ferrite-catalogue rule: ΔT = (mW/cm²)^0.833; 1 W on 20 cm² is 50 mW/cm²
        assertEquals(Math.pow(50, 0.833), Cooling.ferriteCatalogueRule().riseAt(1, 20e-4), 1e-9);
        // the handbook rule gives about 38 K at 0.05 W/cm², the catalogue rule about 26 K
        assertEquals(37.9, Cooling.handbookRule().riseAt(1, 20e-4), 0.1);
        assertEquals(26.1, Cooling.ferriteCatalogueRule().riseAt(1, 20e-4), 0.1);
        assertEquals(1 / (12 * 20e-4), Cooling.surfaceCoefficient(q("12 W/(m^2*K)")).riseAt(1, 20e-4), 1e-9);
    }

    @Test
    void currentDriveAgreesWithTheLinearClosedForm() {
        // h constant, I constant: u = k(c)/(1 − kα) with k = I²R20/(hA), c = 1 + α(Ta − 20) (algebra of the IEC 60028 linear law)
        double r20 = 10, h = 12, a = 50e-4, i = 0.4, ta = 40, alpha = 0.00393;
        Heating heat = Heating.of(q(r20 + " ohm"), Conductor.COPPER, q("50 cm^2")).withAmbient(Quantity.celsius(ta))
                .withCooling(Cooling.surfaceCoefficient(q(h + " W/(m^2*K)")));
        HeatState s = heat.atCurrent(q(i + " A"));
        double k = i * i * r20 / (h * a), c = 1 + alpha * (ta - 20);
        double u = k * c / (1 - k * alpha);
        assertEquals(u, s.rise().si(), 1e-6);
        assertEquals(r20 * (1 + alpha * (ta + u - 20)), s.resistance().si(), 1e-6);
    }

    @Test
    void voltageDriveAgreesWithTheQuadraticClosedForm() {
        // V constant: α u² + c u − K = 0 with K = V²/(R20 h A)
        double r20 = 10, h = 12, a = 50e-4, v = 6, ta = 25, alpha = 0.00393;
        HeatState s = Heating.of(q(r20 + " ohm"), Conductor.COPPER, q("50 cm^2")).withAmbient(Quantity.celsius(ta))
                .withCooling(Cooling.surfaceCoefficient(q(h + " W/(m^2*K)"))).atVoltage(q(v + " V"));
        double kk = v * v / (r20 * h * a), c = 1 + alpha * (ta - 20);
        double u = (-c + Math.sqrt(c * c + 4 * alpha * kk)) / (2 * alpha);
        assertEquals(u, s.rise().si(), 1e-6);
        assertEquals(v / s.resistance().si(), s.current().si(), 1e-12);
        assertTrue(s.iterations() > 1);
    }

    @Test
    void handbookRuleBalanceHoldsAtTheSolution() {
        Winding w = Winding.full(Wire.awg(30), Bobbin.of(q("25 mm"), q("12 mm"), q("8 mm")), Packing.LAYERED);
        Heating heat = Heating.of(w).withAmbient(Quantity.celsius(40)).withExtraLoss(q("0.3 W"));
        HeatState s = heat.atVoltage(q("12 V"));
        double p = 12 * 12 / s.resistance().si() + 0.3;
        assertEquals(Cooling.handbookRule().riseAt(p, w.surfaceArea().si()), s.rise().si(), 1e-6);
        // the resistance method reads the same temperature back (IEC 60028 linear law)
        double ratio = s.resistance().si() / w.resistance().si();
        assertEquals(s.temperature().si(), Conductor.COPPER.temperatureAtResistanceRatio(ratio), 1e-6);
        assertEquals(s.temperature().si() + 10, s.hotSpot().si(), 1e-9);
    }

    @Test
    void currentDriveThatCannotSettleIsReportedAndASlowOneEndsByBisection() {
        // a large current through a small surface: the fixed point leaves, bisection finds the (very hot) balance
        Heating heat = Heating.of(q("10 ohm"), Conductor.COPPER, q("5 cm^2")).withCooling(Cooling.surfaceCoefficient(q("12 W/(m^2*K)")));
        var e = assertThrows(IllegalStateException.class, () -> heat.atCurrent(q("2 A")));
        assertTrue(e.getMessage().contains("no steady temperature"), e.getMessage());
        // k·α = 0.9: the fixed point creeps (error × 0.9 a step), bisection finishes it at the closed form
        double alpha = 0.00393, k = 0.9 / alpha, i = Math.sqrt(k * 12 * 50e-4 / 10);
        HeatState slow = Heating.of(q("10 ohm"), Conductor.COPPER, q("50 cm^2")).withCooling(Cooling.surfaceCoefficient(q("12 W/(m^2*K)")))
                .atCurrent(q(i + " A"));
        double c = 1 + alpha * 5;
        assertEquals(k * c / (1 - k * alpha), slow.rise().si(), 1e-5);
    }

    @Test
    void theHandbookRuleSaysWhenItIsUsedOutsideItsRange() {
        // McLyman's rule is drawn from 0.005 to 0.15 W/cm² (Cooling.handbookRule's documentation, from memory)
        HeatState inside = Heating.of(q("100 ohm"), Conductor.COPPER, q("50 cm^2")).atVoltage(q("12 V")); // about 1.4 W: 0.03 W/cm²
        assertTrue(inside.warnings().stream().noneMatch(w -> w.contains("outside its range")), inside.warnings().toString());
        HeatState tiny = Heating.of(q("1000 ohm"), Conductor.COPPER, q("500 cm^2")).atVoltage(q("1 V")); // 1 mW: 2e-6 W/cm²
        assertTrue(tiny.warnings().stream().anyMatch(w -> w.contains("outside its range") && w.contains("0.005")), tiny.warnings().toString());
        assertTrue(tiny.toString().contains("warning"), tiny.toString());
    }

    @Test
    void warningsNameTheClassAndTheBurnHazard() {
        Winding w = Winding.full(Wire.awg(30), Bobbin.of(q("25 mm"), q("12 mm"), q("8 mm")), Packing.LAYERED);
        HeatState cool = Heating.of(w).atVoltage(q("3 V"));
        assertTrue(cool.warnings().isEmpty(), cool.warnings().toString());
        assertTrue(cool.withinClass());
        HeatState hot = Heating.of(w).withAmbient(Quantity.celsius(40)).atVoltage(q("24 V"));
        assertFalse(hot.withinClass());
        String all = String.join("\n", hot.warnings());
        assertTrue(all.contains("exceeds thermal class 130 (B) (IEC 60085) by"), all);
        assertTrue(all.contains("burn") && all.contains("local codes and licensed practice"), all);
        assertTrue(hot.margin().si() < 0);
        HeatState f = Heating.of(w).withAmbient(Quantity.celsius(40)).withInsulationClass(InsulationClass.H).atVoltage(q("24 V"));
        assertTrue(f.withinClass() || f.warnings().get(0).contains("within"), f.toString());
        assertTrue(hot.toString().startsWith("steady "), hot.toString());
    }

    @Test
    void badInputNamesTheParameter() {
        var e = assertThrows(IllegalArgumentException.class, () -> Heating.of(q("0 ohm"), Conductor.COPPER, q("5 cm^2")));
        assertTrue(e.getMessage().contains("resistance at 20 °C"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> Heating.of(q("5 ohm"), Conductor.COPPER, q("-5 cm^2")));
        assertTrue(e.getMessage().contains("surface area"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> Heating.of(q("5 ohm"), Conductor.COPPER, q("5 cm^2")).atVoltage(org.ampturn.units.Quantity.of(Double.NaN, org.ampturn.units.Dimension.VOLTAGE)));
        assertTrue(e.getMessage().contains("voltage"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> Cooling.surfaceCoefficient(q("0 W/(m^2*K)")));
        assertTrue(e.getMessage().contains("heat transfer coefficient"), e.getMessage());
    }
}
