package org.ampturn.drive;

import java.util.Locale;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;

/**
 * Where the energy of a run went. Each entry is integrated by the solver as its own state (or in
 * closed form on linear pieces), except {@link #stored()}, which is computed from the final state
 * (flux linkage, capacitor voltage, position), so the balance is a real check of the solution:
 *
 * <pre>supplied = resistive + driveLoss + clamp + eddy + core + secondary + armatureHysteresis + stored + mechanical + balanceError</pre>
 *
 * <p>{@code resistive} is the loss in the coil's own winding resistance; {@code driveLoss} the loss
 * in the source resistance and the switch's on-resistance; {@code clamp} the energy taken by the
 * clamp (or by the switch in avalanche when there is no clamp); {@code stored} the change of stored
 * energy over the run (magnetic field plus snubber capacitor); {@code mechanical} the work the
 * magnetic force did on the armature; {@code eddy} the loss in eddy currents and shorted turns
 * ({@link EddyLadder}); {@code core} the core loss drawn through the coil's core-loss branch;
 * {@code secondary} the energy taken by a coupled secondary winding; {@code armatureHysteresis} the
 * hysteresis loss in an armature's iron ({@link IronHysteresis}, zero without it). Immutable.
 */
public final class EnergyLedger {
    private final double supplied, resistive, driveLoss, clamp, stored, mechanical, eddy, core, secondary;
    private final double armatureHysteresis;

    EnergyLedger(double supplied, double resistive, double driveLoss, double clamp, double stored, double mechanical) {
        this(supplied, resistive, driveLoss, clamp, stored, mechanical, 0);
    }

    EnergyLedger(double supplied, double resistive, double driveLoss, double clamp, double stored, double mechanical, double eddy) {
        this(supplied, resistive, driveLoss, clamp, stored, mechanical, eddy, 0);
    }

    EnergyLedger(double supplied, double resistive, double driveLoss, double clamp, double stored, double mechanical, double eddy,
                 double core) {
        this(supplied, resistive, driveLoss, clamp, stored, mechanical, eddy, core, 0);
    }

    EnergyLedger(double supplied, double resistive, double driveLoss, double clamp, double stored, double mechanical, double eddy,
                 double core, double secondary) {
        this.secondary = secondary;
        this.core = core;
        this.eddy = eddy;
        this.armatureHysteresis = 0;
        this.supplied = supplied;
        this.resistive = resistive;
        this.driveLoss = driveLoss;
        this.clamp = clamp;
        this.stored = stored;
        this.mechanical = mechanical;
    }

    /** This ledger with the hysteresis loss of an armature's iron (J) as an entry of its own. */
    EnergyLedger withArmatureHysteresis(double joules) {
        return new EnergyLedger(this, joules);
    }

    private EnergyLedger(EnergyLedger b, double armatureHysteresis) {
        this.supplied = b.supplied;
        this.resistive = b.resistive;
        this.driveLoss = b.driveLoss;
        this.clamp = b.clamp;
        this.stored = b.stored;
        this.mechanical = b.mechanical;
        this.eddy = b.eddy;
        this.core = b.core;
        this.secondary = b.secondary;
        this.armatureHysteresis = armatureHysteresis;
    }

    private static Quantity j(double v) { return Quantity.of(v, Dimension.ENERGY); }

    /** Energy delivered by the supply. */
    public Quantity supplied() { return j(supplied); }
    /** Loss in the coil's winding resistance. */
    public Quantity resistive() { return j(resistive); }
    /** Loss in the source resistance and the switch's on-resistance. */
    public Quantity driveLoss() { return j(driveLoss); }
    /** resistive + driveLoss. */
    public Quantity dissipated() { return j(resistive + driveLoss); }
    /** Energy taken by the clamp, or by the switch in avalanche. */
    public Quantity clamp() { return j(clamp); }
    /** Change of stored energy (field and snubber capacitor) from the start to the end of the run. */
    public Quantity stored() { return j(stored); }
    /** Work of the magnetic force on the armature. */
    public Quantity mechanical() { return j(mechanical); }
    /** Loss in eddy currents and shorted turns (zero without an {@link EddyLadder}). */
    public Quantity eddy() { return j(eddy); }
    /**
     * Core loss drawn by the circuit through its core-loss branch (zero for a coil without core-loss
     * data, or with {@code Circuit.withoutCoreLoss()}); see {@code CoreLossBranch}.
     */
    public Quantity core() { return j(core); }
    /**
     * Energy taken by a coupled secondary winding ({@link Secondary}): its resistance and load, and a
     * diode load's voltage (with a clamp winding into the supply, the energy returned to it).
     */
    public Quantity secondary() { return j(secondary); }
    /** Hysteresis loss in an armature's iron, by its play operator (zero without {@link IronHysteresis}). */
    public Quantity armatureHysteresis() { return j(armatureHysteresis); }
    /** supplied − (resistive + driveLoss + clamp + eddy + core + secondary + armatureHysteresis + stored + mechanical). */
    public Quantity balanceError() { return j(balanceErrorJoules()); }

    /** SI kernel of {@link #balanceError()}. */
    public double balanceErrorJoules() {
        return supplied - (resistive + driveLoss + clamp + eddy + core + secondary + armatureHysteresis + stored + mechanical);
    }

    /** |balance error| / supplied (or over the largest entry when nothing was supplied). */
    public double relativeBalanceError() {
        double e = Math.abs(balanceErrorJoules());
        double scale = Math.max(Math.abs(supplied), Math.max(Math.abs(stored), Math.abs(clamp)));
        return scale == 0 ? e : e / scale;
    }

    /** One line: each entry and the balance error. */
    @Override
    public String toString() {
        String s = "supplied " + j(supplied) + " = coil resistance " + j(resistive);
        if (driveLoss != 0) s += " + drive loss " + j(driveLoss);
        s += " + clamp " + j(clamp);
        if (eddy != 0) s += " + eddy currents " + j(eddy);
        if (core != 0) s += " + core loss " + j(core);
        if (secondary != 0) s += " + secondary " + j(secondary);
        if (armatureHysteresis != 0) s += " + armature iron hysteresis " + j(armatureHysteresis);
        s += " + stored " + j(stored);
        if (mechanical != 0) s += " + mechanical " + j(mechanical);
        // the exact error is solver noise that changes with any solver detail; a worksheet records
        // whether the ledger closes, and balanceErrorJoules() gives the number
        if (Math.abs(relativeBalanceError()) <= 1e-6) return s + "; balances within 1e-6 of supplied";
        return s + "; does not balance: error " + j(balanceErrorJoules())
                + String.format(Locale.ROOT, " (%.1e of supplied)", relativeBalanceError());
    }
}
