package org.ampturn.drive;

import org.ampturn.units.Quantity;

/**
 * A key point of a transient on its time axis, for charts and reports: a label ("τ", "switch off",
 * "peak switch voltage", "pull-in"), its time, the value there, and the name of the signal it sits on.
 */
public record Marker(String label, Quantity time, Quantity value, String signal) {
    @Override
    public String toString() {
        return label + " at " + time + ": " + signal + " " + value;
    }
}
