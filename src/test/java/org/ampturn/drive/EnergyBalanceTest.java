package org.ampturn.drive;

import static org.ampturn.Ampturn.*;
import static org.junit.jupiter.api.Assertions.*;

import java.util.function.Supplier;
import java.util.stream.Stream;
import org.ampturn.coil.Coil;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Conservation of energy on every drive and clamp: supplied = resistive + drive loss + clamp +
 * Δstored + mechanical within 1e-6 of the supplied energy. Stored energy is computed from the final
 * state, the other terms are integrated, so a wrong power or a wrong current breaks the balance.
 */
class EnergyBalanceTest {
    static Stream<Arguments> cases() {
        Coil lin = Coil.lumped(mH(10), ohm(5));
        Coil sat = new SaturatingCoil(30e-3, 0.8, 1e-3, 4);
        Drive dc = Drive.dc(V(12)).withSourceResistance(ohm(0.3)).withSwitchResistance(mohm(50));
        Drive pwm = Drive.pwm(V(24), kHz(5), 0.35).withSwitchResistance(mohm(100));
        Drive ph = Drive.peakAndHold(V(24), A(3), A(1));
        Clamp[] clamps = {Clamp.diode(), Clamp.zener(V(18)), Clamp.resistor(ohm(20)), Clamp.tvs(V(40), ohm(0.5)), Clamp.none(V(60)),
                Clamp.snubber(ohm(47), nF(220))};
        Stream.Builder<Arguments> b = Stream.builder();
        for (Clamp c : clamps) {
            b.add(Arguments.of("DC, linear, " + c, (Supplier<Transient>) () -> dc.into(lin).offAt(ms(10), c).simulate(ms(20))));
            b.add(Arguments.of("DC, linear, numeric, " + c, (Supplier<Transient>) () -> dc.into(lin).offAt(ms(10), c).numeric().simulate(ms(20))));
            b.add(Arguments.of("DC, saturating, " + c, (Supplier<Transient>) () -> dc.into(sat).offAt(ms(10), c).simulate(ms(20))));
            b.add(Arguments.of("PWM, linear, " + c, (Supplier<Transient>) () -> pwm.into(lin).offAt(ms(8), c).simulate(ms(12))));
            b.add(Arguments.of("PWM, saturating, " + c, (Supplier<Transient>) () -> pwm.into(sat).offAt(ms(8), c).simulate(ms(12))));
        }
        b.add(Arguments.of("peak-and-hold hysteretic", (Supplier<Transient>) () -> ph.into(lin).offAt(ms(20), Clamp.zener(V(30))).simulate(ms(25))));
        b.add(Arguments.of("peak-and-hold PWM", (Supplier<Transient>) () -> ph.withHoldPwm(kHz(20)).into(sat).offAt(ms(20), Clamp.diode()).simulate(ms(25))));
        b.add(Arguments.of("hot coil", (Supplier<Transient>) () -> dc.into(lin).at(degC(90)).offAt(ms(10), Clamp.diode()).simulate(ms(20))));
        b.add(Arguments.of("switch stays on", (Supplier<Transient>) () -> dc.into(sat).simulate(ms(20))));
        return b.build();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void balances(String name, Supplier<Transient> run) {
        Transient t = run.get();
        EnergyLedger e = t.energy();
        assertTrue(e.supplied().si() > 0, name + ": " + e);
        assertTrue(Math.abs(e.balanceErrorJoules()) <= 1e-6 * e.supplied().si(), name + ": " + e);
        assertTrue(e.resistive().si() > 0 && e.clamp().si() >= 0 && e.driveLoss().si() >= 0, name + ": " + e);
        // the cumulative signals end on the ledger's figures
        assertEquals(e.supplied().si(), t.suppliedEnergy().last().si(), 1e-12 * e.supplied().si() + 1e-15);
        assertEquals(e.clamp().si(), t.clampEnergy().last().si(), 1e-12 * e.supplied().si() + 1e-15);
    }
}
