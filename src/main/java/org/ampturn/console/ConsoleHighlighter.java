package org.ampturn.console;

import java.util.Set;
import java.util.regex.Pattern;
import org.jline.reader.Highlighter;
import org.jline.reader.LineReader;
import org.jline.utils.AttributedString;
import org.jline.utils.AttributedStringBuilder;
import org.jline.utils.AttributedStyle;

/**
 * Colours the entry as it is typed: Java keywords, string and character literals, numbers,
 * comments, and a command word at the start of the line. A small scanner, not a parser: it only
 * needs to be right for what one types at a prompt.
 */
final class ConsoleHighlighter implements Highlighter {
    static final AttributedStyle KEYWORD = AttributedStyle.BOLD.foreground(AttributedStyle.BLUE);
    static final AttributedStyle LITERAL = AttributedStyle.DEFAULT.foreground(AttributedStyle.GREEN);
    static final AttributedStyle NUMBER = AttributedStyle.DEFAULT.foreground(AttributedStyle.CYAN);
    static final AttributedStyle COMMENT = AttributedStyle.DEFAULT.foreground(AttributedStyle.BRIGHT + AttributedStyle.BLACK);
    static final AttributedStyle COMMAND = AttributedStyle.BOLD.foreground(AttributedStyle.MAGENTA);

    private static final Set<String> KEYWORDS = Set.of("abstract", "assert", "boolean", "break", "byte", "case",
            "catch", "char", "class", "continue", "default", "do", "double", "else", "enum", "extends", "final",
            "finally", "float", "for", "if", "implements", "import", "instanceof", "int", "interface", "long", "new",
            "package", "private", "protected", "public", "record", "return", "short", "static", "super", "switch",
            "this", "throw", "throws", "try", "var", "void", "while", "true", "false", "null", "yield");

    @Override
    public AttributedString highlight(LineReader reader, String buffer) {
        return highlight(buffer);
    }

    static AttributedString highlight(String buffer) {
        AttributedStringBuilder sb = new AttributedStringBuilder(buffer.length() + 16);
        if (buffer.stripLeading().startsWith("#")) {
            int end = 0;
            while (end < buffer.length() && Character.isWhitespace(buffer.charAt(end))) end++;
            while (end < buffer.length() && !Character.isWhitespace(buffer.charAt(end))) end++;
            sb.styled(COMMAND, buffer.substring(0, end)).append(buffer.substring(end));
            return sb.toAttributedString();
        }
        int i = 0;
        int n = buffer.length();
        while (i < n) {
            char c = buffer.charAt(i);
            if (c == '/' && i + 1 < n && buffer.charAt(i + 1) == '/') {
                int end = buffer.indexOf('\n', i);
                if (end < 0) end = n;
                sb.styled(COMMENT, buffer.substring(i, end));
                i = end;
            } else if (c == '/' && i + 1 < n && buffer.charAt(i + 1) == '*') {
                int end = buffer.indexOf("*/", i + 2);
                end = end < 0 ? n : end + 2;
                sb.styled(COMMENT, buffer.substring(i, end));
                i = end;
            } else if (c == '"' || c == '\'') {
                int end = i + 1;
                while (end < n && buffer.charAt(end) != c && buffer.charAt(end) != '\n') {
                    if (buffer.charAt(end) == '\\') end++;
                    end++;
                }
                end = Math.min(n, end + 1);
                sb.styled(LITERAL, buffer.substring(i, end));
                i = end;
            } else if (Character.isJavaIdentifierStart(c)) {
                int end = i + 1;
                while (end < n && Character.isJavaIdentifierPart(buffer.charAt(end))) end++;
                String word = buffer.substring(i, end);
                if (KEYWORDS.contains(word)) sb.styled(KEYWORD, word);
                else sb.append(word);
                i = end;
            } else if (Character.isDigit(c) || (c == '.' && i + 1 < n && Character.isDigit(buffer.charAt(i + 1)))) {
                int end = i + 1;
                while (end < n && (Character.isLetterOrDigit(buffer.charAt(end)) || buffer.charAt(end) == '.' || buffer.charAt(end) == '_'
                        || ((buffer.charAt(end) == '-' || buffer.charAt(end) == '+') && (buffer.charAt(end - 1) == 'e' || buffer.charAt(end - 1) == 'E')))) end++;
                sb.styled(NUMBER, buffer.substring(i, end));
                i = end;
            } else {
                sb.append(c);
                i++;
            }
        }
        return sb.toAttributedString();
    }

    @Override
    public void setErrorPattern(Pattern errorPattern) {}

    @Override
    public void setErrorIndex(int errorIndex) {}
}
