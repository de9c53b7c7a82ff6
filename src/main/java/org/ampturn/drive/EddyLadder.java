package org.ampturn.drive;

import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;

/**
 * Eddy currents and shorted turns coupled to a coil, as a ladder network referred to the coil's
 * side. The flux path is split into concentric flux tubes, tube k carrying the share f_k of the
 * pole area (Σ f_k = 1; one tube for a shorted turn or a copper slug). Loop k (a shorted turn, a
 * slug, or shell k of solid iron) encloses tubes k to m; its resistance referred to the coil is
 * R_k = N²·r_k. The coil's leakage inductance L0 (flux that links the coil but no loop) comes first.
 *
 * <pre>coil ── L0 ──┬── tube 1 ──┬─ … ─┬── tube m
 *               R1           R2     Rm</pre>
 *
 * <p>The MMF inside loop k is the coil's minus the eddy currents of loops 1..k, N·j_k; tube k
 * carries the flux the actuator's own model gives at that MMF for its share of the area, so its
 * branch current is {@code j_k = i((λ_k − λ_(k+1))/f_k, x)} and its pull {@code f_k·F(λ_tube/f_k, x)},
 * with i(λ, x), F(λ, x) and W(λ, x) the {@link Armature}'s. Loop k's flux linkage λ_k is a state:
 * {@code dλ_k/dt = R_k·(j_(k−1) − j_k)}, j_0 the coil current {@code (λ − λ_1)/L0}. In the steady
 * state every tube carries the same flux density and the model is the actuator's own.
 *
 * <p>One loop is the equivalent shorted turn: a transformer whose one-turn secondary (a copper slug,
 * a shorted winding, or the eddy path of solid iron) is closed on its resistance (T-equivalent
 * circuit of two coupled coils; Hayt, Kemmerly and Durbin, Engineering Circuit Analysis, 8th ed.,
 * ch. 13). More loops are a ladder (Cauer) model of the diffusion of flux into solid iron, shell
 * by shell from the surface in (e.g. Lammeraner and Štafl, Eddy Currents, Iliffe 1966, ch. 3; from
 * memory). The loss {@code Σ R_k·(j_(k−1) − j_k)²} enters the energy ledger as eddy-current loss.
 */
public final class EddyLadder {
    /** No eddy currents, no shorted turn. */
    public static final EddyLadder NONE = new EddyLadder(0, new double[0], new double[0]);

    /** Most loops a ladder may have. */
    public static final int MAX_SECTIONS = 16;

    final double leakage;  // L0, H
    final double[] shunt;  // R1 .. Rm, Ω referred to the coil
    final double[] share;  // f1 .. fm, area shares of the tubes

    private EddyLadder(double leakage, double[] shunt, double[] share) {
        this.leakage = leakage;
        this.shunt = shunt;
        this.share = share;
    }

    /** One loop around the whole flux: the leakage inductance between coil and loop, and the loop's resistance referred to the coil (N²·r). */
    public static EddyLadder of(Quantity leakage, Quantity loopResistanceReferred) {
        return ofSI(Require.positive("leakage inductance", leakage, Dimension.INDUCTANCE),
                new double[] {Require.positive("loop resistance referred to the coil", loopResistanceReferred, Dimension.RESISTANCE)},
                new double[] {1});
    }

    /**
     * A ladder in SI: leakage L0 (H), loop resistances referred to the coil (Ω, outermost first) and
     * the area share of each tube (each above zero; they must add up to 1).
     */
    public static EddyLadder ofSI(double leakage, double[] shunt, double[] share) {
        Require.present("loop resistances", shunt);
        Require.present("area shares", share);
        if (shunt.length != share.length) {
            throw Require.fail("a ladder needs one area share per loop, got " + shunt.length + " loops and " + share.length + " shares");
        }
        Require.between("ladder loops", shunt.length, 1, MAX_SECTIONS);
        Require.positive("leakage inductance (H)", leakage);
        if (!Double.isFinite(leakage)) throw Require.fail("leakage inductance must be finite, got " + leakage);
        double sum = 0;
        for (int k = 0; k < shunt.length; k++) {
            Require.positive("resistance of loop " + (k + 1) + " (Ω)", shunt[k]);
            Require.between("area share of tube " + (k + 1), share[k], Double.MIN_NORMAL, 1);
            if (!Double.isFinite(shunt[k])) throw Require.fail("resistance of loop " + (k + 1) + " must be finite, got " + shunt[k]);
            sum += share[k];
        }
        if (!(Math.abs(sum - 1) <= 1e-9)) throw Require.fail("the area shares of the tubes must add up to 1, got " + sum);
        return new EddyLadder(leakage, shunt.clone(), share.clone());
    }

    /** Number of loops (0 for none). */
    public int sections() { return shunt.length; }

    /** Leakage inductance between the coil and the first loop (H). */
    public double leakageHenries() { return leakage; }

    /** Resistance of loop k + 1 referred to the coil (Ω). */
    public double shuntOhms(int k) { return shunt[loop(k)]; }

    /** Area share of tube k + 1. */
    public double areaShare(int k) { return share[loop(k)]; }

    private int loop(int k) {
        if (k < 0 || k >= shunt.length) {
            throw Require.fail("loop index must be 0 to " + (shunt.length - 1) + " (" + shunt.length + " loops), got " + k
                    + (shunt.length == 0 ? ": this ladder has no loops" : ""));
        }
        return k;
    }

    @Override
    public String toString() {
        if (shunt.length == 0) return "no eddy currents";
        StringBuilder sb = new StringBuilder(shunt.length == 1 ? "shorted turn" : "eddy ladder of " + shunt.length + " loops");
        sb.append(": leakage ").append(Quantity.of(leakage, Dimension.INDUCTANCE)).append(", loops");
        for (int k = 0; k < shunt.length; k++) sb.append(k == 0 ? " " : ", ").append(Quantity.of(shunt[k], Dimension.RESISTANCE));
        return sb.append(" (referred to the coil)").toString();
    }
}
