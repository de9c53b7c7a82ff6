package org.ampturn.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.ampturn.units.Dimension;
import org.ampturn.units.Quantity;
import org.ampturn.worksheet.ResultMatch;

/**
 * The safety cautions that apply to what a worksheet computed, found by reading the quantities in
 * its entries and results. The thresholds are common practice, not a standard's verdict on a
 * design; each caution says so, and every report adds that results defer to local codes and
 * licensed practice.
 * <ul>
 *   <li>Voltage above 60 V (flyback spikes, switch and clamp voltages): 60 V DC is the usual
 *       limit for circuits a person may touch (common practice; it is the DC limit of the lowest
 *       electrical energy class, ES1, in IEC 62368-1, from memory).</li>
 *   <li>A voltage of 100 V to 277 V: a mains-level voltage (common practice: the nominal single-phase
 *       mains voltages in use lie in that range, from memory).</li>
 *   <li>Energy above 1 J: stored or clamp energy that can burn, arc or move a plunger hard (common
 *       practice threshold).</li>
 *   <li>Temperature above 60 °C: a surface that burns on brief contact (common practice, from
 *       memory); above 105 °C also the limit of thermal class A insulation (IEC 60085 classes
 *       105, 120, 130, 155, 180 °C).</li>
 * </ul>
 */
public final class Cautions {
    private Cautions() {}

    /** One caution: a heading, why it applies (common practice named), and where it was seen. */
    public record Caution(String heading, String text, List<String> where) {}

    /**
     * What a worksheet's entry gave, for scanning: its line, source and result lines, and the
     * objects behind its results when it ran just now ({@code values}; empty for results known
     * only as recorded text). Cautions come from the objects when there are any: a quantity is
     * checked by its dimension and SI value, a drive's transient brings its own cautions.
     */
    public record Seen(int line, String source, List<String> results, List<Object> values) {
        public Seen {
            results = List.copyOf(results);
            values = List.copyOf(values);
        }

        /** An entry known only by its recorded text. */
        public Seen(int line, String source, List<String> results) {
            this(line, source, results, List.of());
        }
    }

    /** The cautions that apply, in a fixed order; empty when none does. */
    public static List<Caution> scan(List<Seen> entries) {
        Map<String, List<String>> hits = new LinkedHashMap<>();
        for (String k : List.of("volt", "mains", "energy", "hot", "classA", "drive")) hits.put(k, new ArrayList<>());
        for (Seen s : entries) {
            if (!s.values().isEmpty()) {
                for (Object v : s.values()) typed(hits, s.line(), v);
                continue;
            }
            List<String> texts = new ArrayList<>(s.results());
            texts.add(s.source());
            for (String t : texts) {
                for (ResultMatch.Piece p : ResultMatch.pieces(t)) {
                    if (p.number() == null || p.unit() == null) continue;
                    Quantity q;
                    try {
                        q = Quantity.parse(p.number() + " " + p.unit());
                    } catch (RuntimeException e) {
                        continue;
                    }
                    quantity(hits, "line " + s.line() + ": " + p.number() + " " + p.unit(), q);
                }
            }
        }
        List<Caution> out = new ArrayList<>();
        if (!hits.get("drive").isEmpty()) {
            out.add(new Caution("Cautions of the drive simulation",
                    "The simulated drive raised these cautions itself (common-practice thresholds: switch voltage above 60 V, "
                    + "stored energy above 1 J, avalanche of the switch).", hits.get("drive")));
        }
        if (!hits.get("volt").isEmpty()) {
            out.add(new Caution("Voltage above 60 V",
                    "A switch that opens an inductive circuit sees the coil's flyback voltage, which can far exceed the supply. "
                    + "Common practice treats a circuit above 60 V DC as no longer safe to touch: guard it, "
                    + "rate the switch and clamp for the peak, and keep clearances.", hits.get("volt")));
        }
        if (!hits.get("mains").isEmpty()) {
            out.add(new Caution("Mains-level voltage",
                    "A voltage in the range of mains supplies (100 V to 277 V) appears. A mains-powered coil needs insulation, "
                    + "protective earthing or double insulation, fusing and wiring done to the local electrical code, "
                    + "by a qualified person (common practice).", hits.get("mains")));
        }
        if (!hits.get("energy").isEmpty()) {
            out.add(new Caution("Stored energy above 1 J",
                    "More than a joule stored in the coil (or dumped into a clamp) can burn contacts, arc, heat a clamp "
                    + "part past its rating or drive a plunger hard; discharge it safely before handling (common-practice threshold).",
                    hits.get("energy")));
        }
        if (!hits.get("hot").isEmpty()) {
            out.add(new Caution("Hot surface",
                    "A temperature above 60 °C appears; surfaces that hot can burn on brief contact (common practice). "
                    + "Guard or label hot coils and check the duty cycle.", hits.get("hot")));
        }
        if (!hits.get("classA").isEmpty()) {
            out.add(new Caution("Above the class A insulation limit",
                    "A temperature above 105 °C, the limit of thermal class A insulation (IEC 60085 classes: 105, 120, 130, "
                    + "155, 180 °C). Check the magnet wire's and the bobbin's thermal class against the hot-spot temperature.",
                    hits.get("classA")));
        }
        return out;
    }

    /** The cautions a result object raises: a quantity by its value, a drive transient by its own cautions. */
    private static void typed(Map<String, List<String>> hits, int line, Object v) {
        if (v instanceof Quantity) {
            quantity(hits, "line " + line + ": " + v, (Quantity) v);
        } else if (v instanceof org.ampturn.drive.Transient) {
            for (String c : ((org.ampturn.drive.Transient) v).cautions()) add(hits, "drive", "line " + line + ": " + c);
        }
    }

    private static void quantity(Map<String, List<String>> hits, String at, Quantity q) {
        double v = Math.abs(q.si());
        if (q.is(Dimension.VOLTAGE)) {
            if (v > 60) add(hits, "volt", at);
            if (v >= 100 && v <= 277) add(hits, "mains", at);
        } else if (q.is(Dimension.ENERGY) && v > 1) {
            add(hits, "energy", at);
        } else if (q.isAbsoluteTemperature()) {
            double c = q.si() - 273.15;
            if (c > 60) add(hits, "hot", at);
            if (c > 105) add(hits, "classA", at);
        }
    }

    private static void add(Map<String, List<String>> hits, String key, String at) {
        List<String> l = hits.get(key);
        if (l.size() < 6 && !l.contains(at)) l.add(at);
    }

    /** The statement every report carries. */
    public static final String DEFER = "These results come from simplified models and typical material values. "
            + "They support design work but do not replace it: they defer to local codes and standards and to licensed "
            + "professional practice, and a design is safe only once it is built and tested by qualified people.";
}
