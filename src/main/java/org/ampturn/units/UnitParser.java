package org.ampturn.units;

/**
 * Recursive-descent reader of unit expressions. Brackets nest at most {@link #MAX_DEPTH} deep and an
 * exponent has at most three digits, so no text can exhaust the stack or overflow an exponent.
 * <pre>
 *   expr   := term (('·' | '*' | '.' | ' ' | '/') term)*
 *   term   := '1' | '(' expr ')' | symbol power?
 *   power  := '^' '-'? digits | superscript digits
 * </pre>
 * A '/' divides by the single term that follows it, as in {@code W/(m²·K)}.
 */
final class UnitParser {
    /** Deepest nesting of brackets accepted. */
    static final int MAX_DEPTH = 16;

    private final String text;
    private int pos;
    private int depth;

    UnitParser(String text) {
        this.text = text;
    }

    Unit parse() {
        if (text == null || text.isBlank()) {
            return new Unit("", 1, 0, Dimension.NONE);
        }
        String trimmed = text.strip();
        Unit special = Units.offsetUnit(trimmed);
        if (special != null) return special;
        skipSpaces();
        double[] f = {1};
        Dimension d = expr(f);
        skipSpaces();
        if (pos < text.length()) {
            throw error("unexpected '" + text.charAt(pos) + "'");
        }
        return new Unit(trimmed, f[0], 0, d);
    }

    private Dimension expr(double[] f) {
        Dimension d = term(f);
        while (true) {
            int save = pos;
            skipSpaces();
            if (pos >= text.length() || text.charAt(pos) == ')') {
                pos = save;
                return d;
            }
            char c = text.charAt(pos);
            boolean divide = false;
            if (c == '/') {
                divide = true;
                pos++;
            } else if (c == '·' || c == '*' || c == '.' || c == '⋅') {
                pos++;
            } else if (pos == save) {
                throw error("expected '·', '*' or '/' between units");
            }
            skipSpaces();
            double[] g = {1};
            Dimension e = term(g);
            int at = pos;
            try {
                if (divide) {
                    f[0] /= g[0];
                    d = d.div(e);
                } else {
                    f[0] *= g[0];
                    d = d.times(e);
                }
            } catch (IllegalArgumentException x) {
                pos = at;
                throw error("the units make an exponent beyond ±" + Dimension.MAX_EXPONENT);
            }
            if (!(f[0] > 0 && Double.isFinite(f[0]) && f[0] >= Double.MIN_NORMAL)) {
                pos = at;
                throw error("the units make a scale factor a double cannot hold");
            }
        }
    }

    private Dimension term(double[] f) {
        if (pos >= text.length()) throw error("a unit is missing");
        char c = text.charAt(pos);
        Dimension d;
        if (c == '(') {
            if (++depth > MAX_DEPTH) throw error("brackets nest more than " + MAX_DEPTH + " deep");
            pos++;
            skipSpaces();
            d = expr(f);
            skipSpaces();
            if (pos >= text.length() || text.charAt(pos) != ')') throw error("')' expected");
            pos++;
            depth--;
        } else if (c == '1') {
            pos++;
            d = Dimension.NONE;
        } else {
            int start = pos;
            while (pos < text.length() && isSymbolChar(text.charAt(pos))) pos++;
            if (pos == start) throw error("a unit symbol is expected");
            String sym = text.substring(start, pos);
            Unit u = Units.simple(sym);
            if (u == null) {
                pos = start;
                throw error("unknown unit " + Quantity.quote(sym));
            }
            f[0] *= u.factor();
            d = u.dimension();
        }
        int at = pos;
        int p = power();
        if (p != 1) {
            f[0] = Math.pow(f[0], p);
            try {
                d = d.pow(p);
            } catch (IllegalArgumentException e) {
                pos = at;
                throw error("the power " + p + " makes an exponent beyond ±" + Dimension.MAX_EXPONENT);
            }
            if (!(f[0] > 0 && Double.isFinite(f[0]) && f[0] >= Double.MIN_NORMAL)) {
                pos = at;
                throw error("the power " + p + " makes a scale factor a double cannot hold");
            }
        }
        return d;
    }

    private int power() {
        if (pos < text.length() && text.charAt(pos) == '^') {
            pos++;
            int start = pos;
            if (pos < text.length() && (text.charAt(pos) == '-' || text.charAt(pos) == '+')) pos++;
            while (pos < text.length() && Character.isDigit(text.charAt(pos))) pos++;
            String s = text.substring(start, pos);
            if (s.isEmpty() || s.equals("-") || s.equals("+")) throw error("an exponent is expected after '^'");
            if (s.replaceFirst("^[+-]", "").length() > 3) {
                pos = start;
                throw error("an exponent of at most 3 digits is expected");
            }
            return Integer.parseInt(s);
        }
        int sign = 1;
        int start = pos;
        if (pos < text.length() && text.charAt(pos) == '⁻') {
            sign = -1;
            pos++;
        }
        int value = 0;
        boolean any = false;
        while (pos < text.length()) {
            int dgt = Units.superscriptDigit(text.charAt(pos));
            if (dgt < 0) break;
            if (value >= 100) {
                pos = start;
                throw error("an exponent of at most 3 digits is expected");
            }
            value = value * 10 + dgt;
            any = true;
            pos++;
        }
        if (!any) {
            pos = start;
            return 1;
        }
        return sign * value;
    }

    private static boolean isSymbolChar(char c) {
        return Character.isLetter(c) || c == 'Ω' || c == 'µ' || c == 'μ' || c == '°' || c == '%';
    }

    private void skipSpaces() {
        while (pos < text.length() && text.charAt(pos) == ' ') pos++;
    }

    private Failure error(String what) {
        return new Failure(text, what, pos);
    }

    /** A unit text that cannot be read: the reason and the position (from 0) kept apart for callers that quote more text. */
    static final class Failure extends IllegalArgumentException {
        private static final long serialVersionUID = 1L;
        final String reason;
        final int position;

        Failure(String text, String reason, int position) {
            super("cannot read unit " + Quantity.quote(text) + ": " + reason + " at position " + (position + 1)
                    + "; expected units such as mH, kΩ, mm, A/mm^2, W/(m²·K), degC");
            this.reason = reason;
            this.position = position;
        }
    }
}
