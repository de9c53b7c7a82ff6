package org.ampturn.drive;

/** A state event the solver watches in one segment: a crossing of a level in a given direction. */
final class Ev {
    /** What the crossing measures. */
    enum Kind { CURRENT, POSITION, NET_FORCE, SECONDARY_CURRENT, SECONDARY_VOLTAGE }

    /** What happens when it fires. */
    enum Act {
        PEAK_REACHED, PEAK_LOW, HOLD_HIGH, HOLD_LOW, HOLD_PWM_OFF, CLAMP_ZERO, SNUBBER_ZERO, DECAY_1PCT,
        REC_63, REC_90, REC_99, PROBE, HIT_OPEN, HIT_CLOSED, RELEASE_OPEN, RELEASE_CLOSED, SECONDARY_ON, SECONDARY_OFF
    }

    final Kind kind;
    final double level;
    final int direction; // +1 fires when rising through the level, -1 when falling
    final Act act;

    Ev(Kind kind, double level, int direction, Act act) {
        this.kind = kind;
        this.level = level;
        this.direction = direction;
        this.act = act;
    }
}
