package org.ampturn.worksheet;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.ampturn.units.Quantity;
import org.ampturn.units.Unit;

/**
 * Compares a recorded result line with a fresh one: text must match exactly, and each number must
 * agree to the digits recorded. A recorded {@code 2.103 mH} holds for a fresh {@code 2.1034 mH}
 * (it rounds to the record) and for {@code 2103 uH}, but not for {@code 2.113 mH} or
 * {@code 2.103 mA}. A number followed by a unit is read with {@link Quantity}, so a change of SI
 * prefix is not a mismatch and a change of dimension is.
 */
public final class ResultMatch {
    private ResultMatch() {}

    private static final Pattern NUMBER = Pattern.compile("(?<![\\w.])[-+]?(?:\\d+\\.?\\d*|\\.\\d+)(?:[eE][-+]?\\d+)?");
    private static final Pattern UNIT = Pattern.compile("\\G ([^\\s,;()\\[\\]{}]+)");

    /** A number in the text, with the unit written after it (or null) and the text before it. */
    public record Piece(String textBefore, String number, String unit) {}

    /** True when {@code fresh} shows the same result as {@code recorded}, to the digits recorded. */
    public static boolean matches(String recorded, String fresh) {
        return why(recorded, fresh) == null;
    }

    /** Null when the lines match; else a short reason ("2.113 mH is not 2.103 mH to the digits shown"). */
    public static String why(String recorded, String fresh) {
        if (recorded.equals(fresh)) return null;
        List<Piece> a = pieces(recorded), b = pieces(fresh);
        if (a.size() != b.size()) return "the text differs";
        for (int k = 0; k < a.size(); k++) {
            Piece p = a.get(k), q = b.get(k);
            if (!p.textBefore().equals(q.textBefore())) return "the text differs";
            if (p.number() == null || q.number() == null) {
                if (p.number() != q.number()) return "the text differs";
                continue;
            }
            String r = compareNumbers(p, q);
            if (r != null) return r;
        }
        return null;
    }

    private static String compareNumbers(Piece rec, Piece fresh) {
        double r = Double.parseDouble(rec.number()), f = Double.parseDouble(fresh.number());
        double half = halfStep(rec.number());
        if (rec.unit() == null && fresh.unit() == null) {
            return Math.abs(f - r) <= half * (1 + 1e-9) ? null : shown(fresh) + " is not " + shown(rec) + " to the digits shown";
        }
        if (rec.unit() == null || fresh.unit() == null) return "the unit changed: " + shown(rec) + " became " + shown(fresh);
        Quantity qr = Quantity.of(r, rec.unit()), qf = Quantity.of(f, fresh.unit());
        if (!qr.dimension().equals(qf.dimension())) {
            return "the unit changed: " + shown(rec) + " (" + qr.dimension().name() + ") became " + shown(fresh) + " (" + qf.dimension().name() + ")";
        }
        double tol = Math.abs(Quantity.of(r + half, rec.unit()).si() - qr.si());
        return Math.abs(qf.si() - qr.si()) <= tol * (1 + 1e-9) ? null : shown(fresh) + " is not " + shown(rec) + " to the digits shown";
    }

    private static String shown(Piece p) {
        return p.unit() == null ? p.number() : p.number() + " " + p.unit();
    }

    /** Half of one step in the last digit written: "2.103" -> 0.0005, "400" -> 0.5, "1.5e-6" -> 5e-8. */
    static double halfStep(String number) {
        BigDecimal b = new BigDecimal(number.startsWith("+") ? number.substring(1) : number);
        return BigDecimal.ONE.scaleByPowerOfTen(-b.scale()).doubleValue() / 2;
    }

    /** The numbers in the text with the text before each; the last piece holds the rest (number null). */
    public static List<Piece> pieces(String s) {
        List<Piece> out = new ArrayList<>();
        Matcher m = NUMBER.matcher(s);
        int from = 0;
        while (from <= s.length() && m.find(from)) {
            String before = s.substring(from, m.start());
            int end = m.end();
            String unit = null;
            Matcher u = UNIT.matcher(s);
            if (u.find(end)) {
                String token = u.group(1).replaceAll("[.:]+$", "");
                if (isUnit(token)) {
                    unit = token;
                    end = u.start(1) + token.length();
                }
            }
            out.add(new Piece(before, m.group(), unit));
            from = end;
        }
        out.add(new Piece(s.substring(Math.min(from, s.length())), null, null));
        return out;
    }

    private static boolean isUnit(String token) {
        if (token.isEmpty() || !Character.isLetter(token.codePointAt(0)) && token.charAt(0) != '°' && token.charAt(0) != 'µ') return false;
        try {
            Unit.parse(token);
            return true;
        } catch (RuntimeException e) {
            return false;
        }
    }
}
