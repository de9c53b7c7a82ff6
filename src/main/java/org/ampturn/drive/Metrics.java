package org.ampturn.drive;

import java.util.ArrayList;
import java.util.List;
import org.ampturn.units.Quantity;

/**
 * Key figures of a transient. A figure that does not apply to the run (a drop-out time with no
 * armature, a ripple with no switching cycle) is NaN. Times to a fraction of the final current are
 * measured in the first on-interval; the final current is the steady on-state current
 * {@code V/(Rs + Ron + R)} (shown as the "on-state limit" of a run with switching cycles, whose
 * current is the cycle mean); ripple and cycle mean are those of the last complete switching cycle
 * (PWM period or hold cycle) before the switch opened for good, from the exact switching instants.
 * The impact speed is the armature's speed as it first reaches the closed stop; bounces count the
 * rebounds at both stops (none with a restitution of 0).
 */
public record Metrics(Quantity timeConstant, Quantity timeTo63, Quantity timeTo90, Quantity timeTo99,
                      Quantity finalCurrent, Quantity peakCurrent, Quantity peakSwitchVoltage, Quantity peakStoredEnergy,
                      Quantity clampEnergy, Quantity decayTime, Quantity ripple, Quantity cycleMean,
                      Quantity pullInCurrentTime, Quantity pullInTime, Quantity dropOutTime,
                      Quantity impactSpeed, int bounces) {

    private static void add(List<String> out, String label, Quantity q) {
        if (!Double.isNaN(q.si())) out.add(label + " " + q);
    }

    /** One line with the figures that apply. */
    @Override
    public String toString() {
        List<String> s = new ArrayList<>();
        add(s, "τ", timeConstant);
        // with switching cycles the on-state current V/R is only the limit the cycles never reach: the cycle mean is the current
        add(s, Double.isNaN(cycleMean.si()) ? "final" : "on-state limit", finalCurrent);
        add(s, "peak", peakCurrent);
        add(s, "peak switch", peakSwitchVoltage);
        add(s, "clamp", clampEnergy);
        add(s, "decay", decayTime);
        add(s, "ripple", ripple);
        add(s, "cycle mean", cycleMean);
        add(s, "pull-in", pullInTime);
        add(s, "drop-out", dropOutTime);
        if (bounces > 0) {
            add(s, "impact", impactSpeed);
            s.add(bounces + (bounces == 1 ? " bounce" : " bounces"));
        }
        return String.join(", ", s);
    }
}
