package org.ampturn.material;

import static org.junit.jupiter.api.Assertions.*;

import org.ampturn.units.Quantity;
import org.junit.jupiter.api.Test;

class ConductorTest {
    @Test
    void annealedCopperPerIec60028() {
        // IEC 60028: 1/58 Ω·mm²/m = 0.017241 µΩ·m at 20 °C, α20 = 0.00393 /K, 8.89 g/cm³
        Conductor cu = Conductor.COPPER;
        assertEquals(0.017241e-6, cu.resistivity20().si(), 0.0000005e-6);
        assertEquals(0.00393, cu.alpha20().si(), 0);
        assertEquals(8890, cu.density().si(), 0);
        // 1 m of 1 mm² at 20 °C is 17.24 mΩ (IEC 60028 definition of 100 % IACS)
        assertEquals(17.241e-3, cu.resistivityAt(293.15) / 1e-6, 0.001e-3);
        // the "inferred zero-resistance temperature" of annealed copper: 20 − 1/α20 = −234.45 °C (common practice: 234.5)
        assertEquals(-234.45, cu.temperatureAtResistanceRatio(0) - 273.15, 0.01);
        // R75/R20 = 1 + 0.00393·55 = 1.21615
        assertEquals(1.21615, cu.resistanceRatioAt(273.15 + 75), 1e-12);
        assertEquals(cu.resistivityAt(273.15 + 75), cu.resistivity(Quantity.celsius(75)).si(), 1e-20);
    }

    @Test
    void aluminiumPerIec60889() {
        // IEC 60889: 0.028264 Ω·mm²/m at 20 °C, α20 = 0.00403 /K, 2.703 g/cm³
        Conductor al = Conductor.ALUMINIUM;
        assertEquals(0.028264e-6, al.resistivity20().si(), 1e-16);
        assertEquals(0.00403, al.alpha20().si(), 0);
        assertEquals(2703, al.density().si(), 0);
        // 61 % IACS: (1/58)/0.028264 = 0.610
        assertEquals(0.610, Conductor.COPPER.rho20() / al.rho20(), 0.001);
    }

    @Test
    void userConductorFromDatasheetNumbers() {
        Conductor c = Conductor.of("test alloy", Quantity.parse("0.07 uohm*m"), Quantity.parse("0.0015 1/K"), Quantity.parse("8500 kg/m^3"));
        assertEquals(0.07e-6 * (1 + 0.0015 * 30), c.resistivityAt(323.15), 1e-18);
        var e = assertThrows(IllegalArgumentException.class,
                () -> Conductor.of("x", Quantity.parse("-1 uohm*m"), Quantity.parse("0.001 1/K"), Quantity.parse("8000 kg/m^3")));
        assertTrue(e.getMessage().contains("resistivity"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> Conductor.COPPER.resistivity(Quantity.parse("3 A")));
        assertTrue(e.getMessage().contains("temperature"), e.getMessage());
    }
}
