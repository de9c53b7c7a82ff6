package org.ampturn.drive;

import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;

/**
 * Where the energy of a run went. Each entry is integrated by the solver as its own state (or in
 * closed form on linear pieces), except {@code stored}, which is computed from the final state
 * (flux linkage, capacitor voltage, position), so the balance is a real check of the solution:
 *
 * <pre>supplied = resistive + driveLoss + clamp + stored + mechanical + balanceError</pre>
 *
 * <p>{@code resistive} is the loss in the coil's own winding resistance; {@code driveLoss} the loss
 * in the source resistance and the switch's on-resistance; {@code clamp} the energy taken by the
 * clamp (or by the switch in avalanche when there is no clamp); {@code stored} the change of stored
 * energy over the run (magnetic field plus snubber capacitor); {@code mechanical} the work the
 * magnetic force did on the armature. Values in joules.
 */
public record EnergyLedger(double supplied, double resistive, double driveLoss, double clamp, double stored,
                           double mechanical) {

    /** supplied − (resistive + driveLoss + clamp + stored + mechanical). */
    public double balanceErrorJoules() {
        return supplied - (resistive + driveLoss + clamp + stored + mechanical);
    }

    /** |balance error| / supplied (0 when nothing was supplied and nothing is unaccounted). */
    public double relativeBalanceError() {
        double e = Math.abs(balanceErrorJoules());
        double scale = Math.max(Math.abs(supplied), Math.max(Math.abs(stored), Math.abs(clamp)));
        return scale == 0 ? e : e / scale;
    }

    private static Quantity j(double v) { return Quantity.of(v, Dimension.ENERGY); }

    public Quantity suppliedEnergy() { return j(supplied); }
    public Quantity resistiveEnergy() { return j(resistive); }
    public Quantity driveLossEnergy() { return j(driveLoss); }
    /** resistive + driveLoss. */
    public Quantity dissipatedEnergy() { return j(resistive + driveLoss); }
    public Quantity clampEnergy() { return j(clamp); }
    public Quantity storedEnergy() { return j(stored); }
    public Quantity mechanicalEnergy() { return j(mechanical); }
    public Quantity balanceError() { return j(balanceErrorJoules()); }

    @Override
    public String toString() {
        String s = "supplied " + j(supplied) + " = coil resistance " + j(resistive);
        if (driveLoss != 0) s += " + drive loss " + j(driveLoss);
        s += " + clamp " + j(clamp) + " + stored " + j(stored);
        if (mechanical != 0) s += " + mechanical " + j(mechanical);
        return s + "; balance error " + j(balanceErrorJoules()) + String.format(java.util.Locale.ROOT, " (%.1e of supplied)", relativeBalanceError());
    }
}
