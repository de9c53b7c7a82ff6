package org.ampturn.study;

import org.ampturn.units.Require;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.ampturn.units.Quantity;

/** One evaluated design of an optimisation: its parameters, outputs and margins to each limit. */
public final class Candidate {
    final Point point;
    final Map<String, Object> outputs; // null when the evaluation failed
    final String error;
    final double objective;            // SI; NaN when failed
    final double[] margins;            // SI margin per limit; NaN when failed
    final double violation;            // sum of relative shortfalls; +inf when failed
    private final List<Limit> limits;

    Candidate(Point point, Map<String, Object> outputs, String error, double objective, double[] margins, double violation, List<Limit> limits) {
        this.point = point;
        this.outputs = outputs;
        this.error = error;
        this.objective = objective;
        this.margins = margins;
        this.violation = violation;
        this.limits = limits;
    }

    /** The parameter values. */
    public Point point() {
        return point;
    }

    /** A parameter or an output by name, as a quantity. */
    public Quantity get(String name) {
        if (outputs != null && outputs.containsKey(name)) {
            Object v = outputs.get(name);
            if (v instanceof Quantity) return (Quantity) v;
            if (v instanceof Number) return Quantity.number(((Number) v).doubleValue());
            throw Require.fail("output " + name + " is " + v + ", not a quantity");
        }
        if (point.names().contains(name)) return point.get(name);
        throw Require.fail("no parameter or output named " + name + "; parameters " + point.names()
                + (outputs == null ? "" : ", outputs " + outputs.keySet()));
    }

    /** A parameter or an output as given (an Integer, a chosen wire, a Quantity...). */
    @SuppressWarnings("unchecked")
    public <T> T value(String name) {
        if (outputs != null && outputs.containsKey(name)) return (T) outputs.get(name);
        return (T) point.value(name);
    }

    /** The outputs by name, in order (empty when the evaluation failed). */
    public Map<String, Object> outputs() {
        return outputs == null ? Map.of() : Collections.unmodifiableMap(outputs);
    }

    /** Why the evaluation failed, or null. */
    public String error() {
        return error;
    }

    /** True when the design was computed and meets every limit. */
    public boolean isFeasible() {
        return error == null && violation == 0;
    }

    /** The margin to each limit: positive inside, negative outside. */
    public Map<Limit, Quantity> margins() {
        LinkedHashMap<Limit, Quantity> m = new LinkedHashMap<>();
        for (int i = 0; i < limits.size(); i++) m.put(limits.get(i), Quantity.of(margins[i], limits.get(i).bound().dimension()));
        return Collections.unmodifiableMap(m);
    }

    /** The limits this design fails. */
    public List<Limit> failedLimits() {
        List<Limit> out = new java.util.ArrayList<>();
        for (int i = 0; i < limits.size(); i++) if (!(margins[i] >= 0)) out.add(limits.get(i));
        return out;
    }

    String describeMargins() {
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < limits.size(); i++) {
            if (i > 0) sb.append("; ");
            Limit l = limits.get(i);
            double m = margins[i];
            Quantity q = Quantity.of(Math.abs(m), l.bound().dimension());
            sb.append(l).append(": ").append(m >= 0 ? "margin " : "short by ").append(q);
            if (l.bound().si() != 0) sb.append(String.format(java.util.Locale.ROOT, " (%.2f %%)", 100 * Math.abs(m / l.bound().si())));
        }
        return sb.toString();
    }

    @Override
    public String toString() {
        if (error != null) return point + "  ! " + error;
        StringBuilder sb = new StringBuilder(point.toString()).append(" → ");
        int k = 0;
        for (Map.Entry<String, Object> e : outputs.entrySet()) {
            if (k++ > 0) sb.append(", ");
            sb.append(e.getKey()).append(" = ").append(e.getValue() instanceof Double
                    ? Column.number((Double) e.getValue(), Quantity.displayDigits()) : e.getValue());
        }
        return sb.toString();
    }
}
