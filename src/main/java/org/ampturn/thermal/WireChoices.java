package org.ampturn.thermal;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.ampturn.units.Require;

/**
 * The outcome of a {@link WireChoice}: every wire of the series, those that meet the requirements
 * best first (lowest highest-power, then most ampere-turns), then the others nearest first, each
 * saying which requirement fails and by how much. Immutable.
 */
public final class WireChoices {
    private final String setup;
    private final List<WireCandidate> meeting;
    private final List<WireCandidate> failing;

    WireChoices(String setup, List<WireCandidate> meeting, List<WireCandidate> failing) {
        this.setup = setup;
        this.meeting = List.copyOf(meeting);
        this.failing = List.copyOf(failing);
    }

    /** The wires that meet every requirement, best first. */
    public List<WireCandidate> meeting() { return meeting; }

    /** The others, nearest to meeting first. */
    public List<WireCandidate> failing() { return failing; }

    /** All, meeting ones first. */
    public List<WireCandidate> all() {
        List<WireCandidate> a = new ArrayList<>(meeting);
        a.addAll(failing);
        return List.copyOf(a);
    }

    /** The best wire; fails, naming the nearest miss, when none meets the requirements. */
    public WireCandidate best() {
        if (meeting.isEmpty()) {
            throw Require.fail("no wire of the series meets the requirements; nearest: "
                    + (failing.isEmpty() ? "none" : failing.get(0).wire().size() + " " + failing.get(0).wire().insulation().name() + " fails "
                            + String.join("; ", failing.get(0).fails())));
        }
        return meeting.get(0);
    }

    static String at(double ampereTurns) {
        return String.format(Locale.ROOT, "%.0f At", ampereTurns);
    }

    /** The whole table: every wire, one line each. */
    public String table() {
        StringBuilder sb = new StringBuilder(header()).append('\n');
        String fmt = "  %-11s %-12s %6s %10s %10s %10s %10s %8s %9s  %s%n";
        sb.append(String.format(Locale.ROOT, fmt, "size", "grade", "turns", "R20", "R hot", "P max", "I min", "NI min", "T hot", "verdict"));
        for (WireCandidate c : all()) {
            if (c.turns() == 0) {
                sb.append(String.format(Locale.ROOT, fmt, c.wire().size(), c.wire().insulation().name(), "0", "", "", "", "", "", "",
                        String.join("; ", c.fails())));
                continue;
            }
            sb.append(String.format(Locale.ROOT, fmt, c.wire().size(), c.wire().insulation().name(), c.turns(), c.resistance20(),
                    c.resistanceHot(), c.powerCold(), c.currentHot(), at(c.ampereTurnsHot().si()), c.hotTemperature(),
                    c.meets() ? "meets" : String.join("; ", c.fails())));
        }
        return sb.toString().lines().map(String::stripTrailing).collect(java.util.stream.Collectors.joining("\n"));
    }

    private String header() {
        return "wire choice, " + setup + ": " + meeting.size() + " of " + (meeting.size() + failing.size()) + " wires meet the requirements";
    }

    /** The header and the best few (up to five); {@link #table()} has them all. */
    @Override
    public String toString() {
        StringBuilder sb = new StringBuilder(header());
        if (meeting.isEmpty()) {
            if (!failing.isEmpty()) sb.append("; nearest: ").append(failing.get(0));
            return sb.toString();
        }
        sb.append("; best: ").append(meeting.get(0));
        return sb.toString();
    }
}
