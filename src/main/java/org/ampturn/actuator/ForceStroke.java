package org.ampturn.actuator;

import java.util.Arrays;
import java.util.List;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.units.Require;

/**
 * Force-stroke curves of an actuator: the magnetic pull over the stroke at several steady coil
 * currents, and the mechanical line it works against (spring with preload plus the load, at rest),
 * on the same positions. The margin at a current is the smallest pull minus that line over the
 * stroke: above zero, the armature closes from any position at that current (statically). SI
 * arrays inside, copied in and out. Immutable.
 */
public final class ForceStroke {
    private final String actuator;
    private final double[] positions;
    private final double[] currents;
    private final double[][] pull;
    private final double[] mechanical;

    ForceStroke(String actuator, double[] positions, double[] currents, double[][] pull, double[] mechanical) {
        this.actuator = actuator;
        this.positions = positions;
        this.currents = currents;
        this.pull = pull;
        this.mechanical = mechanical;
    }

    /** What the curves are of. */
    public String actuator() { return actuator; }

    /** Positions from the open stop (m). */
    public double[] positions() { return positions.clone(); }

    /** The coil currents of the curves (A). */
    public double[] currents() { return currents.clone(); }

    /** The pull (N) at each position at the k-th current. */
    public double[] pull(int k) {
        if (k < 0 || k >= currents.length) throw Require.fail("curve " + k + " does not exist: there are " + currents.length);
        return pull[k].clone();
    }

    /** Spring, preload and load at rest (N) at each position: the line the pull must stay above. */
    public double[] mechanical() { return mechanical.clone(); }

    /** The least of pull − mechanical line over the stroke at the k-th current (N). */
    public Quantity margin(int k) {
        double[] p = pull(k);
        double m = Double.POSITIVE_INFINITY;
        for (int j = 0; j < p.length; j++) m = Math.min(m, p[j] - mechanical[j]);
        return Quantity.of(m, Dimension.FORCE);
    }

    /** Currents as quantities. */
    public List<Quantity> currentList() {
        return Arrays.stream(currents).mapToObj(i -> Quantity.of(i, Dimension.CURRENT)).toList();
    }

    @Override
    public String toString() {
        StringBuilder sb = new StringBuilder("force-stroke of ").append(actuator).append(": ").append(positions.length)
                .append(" positions; margin over the stroke");
        for (int k = 0; k < currents.length; k++) {
            sb.append(k == 0 ? " " : ", ").append(Quantity.of(currents[k], Dimension.CURRENT)).append(' ').append(margin(k));
        }
        return sb.toString();
    }
}
