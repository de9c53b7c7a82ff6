package org.ampturn.units;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;

/**
 * Comma-separated values as the library writes them (RFC 4180 quoting, one header line, a line feed
 * after each record), shared by transients and study tables so that both read the same way.
 *
 * <p>Numbers are SI values written with the shortest text that reads back to the same double
 * ({@link Double#toString}; whole numbers without a decimal point), so a script loses nothing.
 * Each numeric column's header carries its SI unit in ASCII: {@code current (A)}, {@code R (ohm)},
 * {@code area (m^2)}, temperatures in kelvin. Plain ASCII headers read the same in every
 * spreadsheet and every code page and can be typed in a script ({@code df["R (ohm)"]}); the
 * console's symbols (Ω, µ, ², ·) are spelled the way {@link Quantity#parse} also accepts them.
 *
 * <p>The file is UTF-8. When some text cell holds a character outside ASCII (a label or an error
 * message), the file starts with a byte-order mark, which spreadsheets read as "this is UTF-8";
 * without one, several open a UTF-8 file in the machine's legacy code page and garble the text. A
 * file that is pure ASCII (every transient, most tables) gets no mark, so tools that do not expect
 * one never see it. lib-docs/units.md says the same for users.
 */
public final class Csv {
    private Csv() {}

    /** The UTF-8 byte-order mark. */
    public static final String BOM = "\uFEFF";

    /** A column header: the name and the ASCII SI unit, e.g. {@code coil voltage (V)}; the bare name for a pure number. */
    public static String header(String name, Dimension d) {
        String u = d == null ? "" : asciiUnit(d);
        return cell(u.isEmpty() ? name : name + " (" + u + ")");
    }

    /** The SI unit of a dimension in ASCII: {@code A}, {@code ohm}, {@code m^2}, {@code W/(m^2*K)}; "" for a pure number. */
    public static String asciiUnit(Dimension d) {
        if (Require.present("dimension", d).isNone()) return "";
        if (d.equals(Dimension.TEMPERATURE)) return "K";
        String symbol = null;
        for (Unit u : Units.displayUnits(d)) {
            if (u.factor() == 1 && !u.isOffset()) symbol = u.symbol();
        }
        return ascii(symbol != null ? symbol : d.baseSymbols());
    }

    /** Unit text in ASCII: Ω as ohm, µ as u, ° as deg, superscripts as ^n, the middle dot as *. */
    public static String ascii(String text) {
        StringBuilder sb = new StringBuilder(Require.present("unit text", text).length() + 4);
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            switch (c) {
                case '\u03A9': case '\u2126': sb.append("ohm"); break;
                case '\u00B5': case '\u03BC': sb.append('u'); break;
                case '°': sb.append("deg"); break;
                case '²': sb.append("^2"); break;
                case '³': sb.append("^3"); break;
                case '⁴': sb.append("^4"); break;
                case '·': sb.append('*'); break;
                default: sb.append(c);
            }
        }
        return sb.toString();
    }

    /** An SI number: shortest round-trip text, whole numbers without ".0"; "" for NaN (a missing value). */
    public static String number(double v) {
        if (Double.isNaN(v)) return "";
        if (v == Math.rint(v) && Math.abs(v) < 1e15) return Long.toString((long) v);
        return Double.toString(v);
    }

    /** A text cell, quoted when it holds a comma, a quote or a line break (RFC 4180). */
    public static String cell(String s) {
        if (s == null) return "";
        if (s.indexOf(',') >= 0 || s.indexOf('"') >= 0 || s.indexOf('\n') >= 0 || s.indexOf('\r') >= 0) {
            return '"' + s.replace("\"", "\"\"") + '"';
        }
        return s;
    }

    /** The bytes of a CSV text as written: UTF-8, with a byte-order mark only when the text is not pure ASCII. */
    public static byte[] bytes(CharSequence text) {
        String s = Require.present("CSV text", text).toString();
        boolean ascii = true;
        for (int i = 0; i < s.length() && ascii; i++) ascii = s.charAt(i) < 0x80;
        return (ascii ? s : BOM + s).getBytes(StandardCharsets.UTF_8);
    }

    /** Writes CSV text to a file atomically with the user's normal permissions ({@link AtomicFile}); returns the absolute path. */
    public static Path save(Path target, CharSequence text) {
        byte[] b = bytes(text);
        return AtomicFile.write(target, b);
    }
}
