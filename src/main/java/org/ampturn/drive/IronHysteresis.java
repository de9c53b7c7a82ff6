package org.ampturn.drive;

import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;

/**
 * Hysteresis of an armature's iron for the transient run, by the rate-independent <b>play
 * operator</b> (backlash) of half-width Hc (Krasnosel'skii and Pokrovskii, Systems with Hysteresis,
 * Springer 1989, ch. 1; Mayergoyz, Mathematical Models of Hysteresis, Springer 1991, ch. 1; from
 * memory). The iron's reversible field p follows the applied field H with a lag of at most Hc:
 * {@code p = H − Hc} while H rises, {@code p = H + Hc} while it falls, and p stays put while H
 * turns round inside the band. The flux density follows p on the actuator's own B-H curve. So the
 * rising and falling branches are that curve shifted by ±Hc (a parallelogram for a linear iron),
 * and at zero current the falling branch is the recoil line of the static remanence figures
 * ({@code φr = Hc·l / R_closed} for a linear iron). The loss is {@code Hc·|dB|} per unit volume,
 * {@code Hc·l·|dφ|} over the iron path.
 *
 * <p>Referred to the coil it is one number, the coercive current {@code c = Hc·l/N}: the coil
 * current is the actuator's {@link Armature#currentAt} (the curve without hysteresis) plus c on the
 * rising branch, minus c on the falling one. In the drive the branch follows the switch: rising
 * while the switch conducts, falling from switch-off. After switch-off the current reaches zero
 * with the flux at the iron's residual; with the coil open the flux stays there, and falls further
 * only as the armature opens and the residual at the new gap is lower. The band's interior has no
 * permeability (a simplification; real iron has a small reversible permeability there), so the
 * coil current steps by 2c at each switching edge. Loss enters the energy ledger as
 * {@link EnergyLedger#armatureHysteresis()}. Immutable.
 */
public final class IronHysteresis {
    /** No hysteresis: the flux returns to zero with the current. */
    public static final IronHysteresis NONE = new IronHysteresis(0, 1);

    private final double mmf;  // Hc·l, A
    private final int turns;

    private IronHysteresis(double mmf, int turns) {
        this.mmf = mmf;
        this.turns = turns;
    }

    /** A play operator of half-width {@code coerciveField} (A/m) over an iron path of {@code ironLength}, seen by a coil of {@code turns}. */
    public static IronHysteresis play(Quantity coerciveField, Quantity ironLength, int turns) {
        double hc = Require.nonNegative("coercive field", coerciveField, Dimension.CURRENT.div(Dimension.LENGTH));
        double l = Require.lengthOrZero("iron path length", ironLength);
        return ofSI(hc * l, turns);
    }

    /** SI: the coercive MMF Hc·l (A, zero or more) and the coil's turns. */
    public static IronHysteresis ofSI(double coerciveMmf, int turns) {
        Require.nonNegative("coercive MMF (A)", coerciveMmf);
        if (!Double.isFinite(coerciveMmf)) throw Require.fail("coercive MMF must be finite, got " + coerciveMmf);
        Require.turns("turns", turns);
        return coerciveMmf == 0 ? NONE : new IronHysteresis(coerciveMmf, turns);
    }

    /** True for {@link #NONE} (no coercive field). */
    public boolean isNone() { return mmf == 0; }

    /** The coercive MMF Hc·l of the iron path (A). */
    public Quantity coerciveMmf() { return Quantity.of(mmf, Dimension.CURRENT); }

    /** The coercive current referred to the coil, Hc·l/N (A): half the width of the loop in coil current. */
    public Quantity coerciveCurrent() { return Quantity.of(amps(), Dimension.CURRENT); }

    double amps() { return mmf / turns; }

    @Override
    public String toString() {
        return isNone() ? "no hysteresis" : "play-operator hysteresis: coercive MMF " + coerciveMmf() + " (" + coerciveCurrent()
                + " in the coil)";
    }
}
