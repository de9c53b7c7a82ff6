package org.ampturn.worksheet;

/** The compiler-free completeness check behind {@link Completeness#BRACKETS}. */
final class BracketCompleteness {
    private BracketCompleteness() {}

    static boolean isComplete(String src) {
        int depth = 0;
        char last = 0;     // last significant character outside strings and comments
        char beforeLast = 0;
        int n = src.length();
        for (int i = 0; i < n; i++) {
            char c = src.charAt(i);
            char next = i + 1 < n ? src.charAt(i + 1) : 0;
            if (c == '/' && next == '/') {
                int nl = src.indexOf('\n', i);
                if (nl < 0) break;
                i = nl;
                continue;
            }
            if (c == '/' && next == '*') {
                int end = src.indexOf("*/", i + 2);
                if (end < 0) return false;
                i = end + 1;
                continue;
            }
            if (c == '"' && src.startsWith("\"\"\"", i)) {
                int end = src.indexOf("\"\"\"", i + 3);
                while (end > 0 && src.charAt(end - 1) == '\\') end = src.indexOf("\"\"\"", end + 1);
                if (end < 0) return false;
                i = end + 2;
                beforeLast = last;
                last = '"';
                continue;
            }
            if (c == '"' || c == '\'') {
                int j = i + 1;
                while (j < n && src.charAt(j) != c && src.charAt(j) != '\n') {
                    if (src.charAt(j) == '\\') j++;
                    j++;
                }
                if (j >= n || src.charAt(j) == '\n') return true; // broken literal: let the compiler say so
                i = j;
                beforeLast = last;
                last = c;
                continue;
            }
            if (Character.isWhitespace(c)) continue;
            if (c == '(' || c == '[' || c == '{') depth++;
            if (c == ')' || c == ']' || c == '}') depth--;
            beforeLast = last;
            last = c;
        }
        if (depth > 0) return false;
        if ("+-".indexOf(last) >= 0 && beforeLast == last) return true; // x++ / x--
        return "+-*/%=&|^<>?:.,!~".indexOf(last) < 0 || last == 0;
    }
}
