package org.ampturn.console;

import java.util.function.Predicate;
import org.jline.reader.EOFError;
import org.jline.reader.ParsedLine;
import org.jline.reader.impl.DefaultParser;

/**
 * Splits the line for completion like JLine's default parser (no quotes, no escapes: the text is
 * Java) and, on Enter, asks for another line while the entry is not complete. Completeness comes
 * from JShell's own analysis, so a method or an unfinished expression continues on the next line.
 */
final class ConsoleParser extends DefaultParser {
    private final Predicate<String> needsMore;

    /** @param needsMore true when the text typed so far is not a whole entry yet */
    ConsoleParser(Predicate<String> needsMore) {
        this.needsMore = needsMore;
        setQuoteChars(new char[0]);
        setEscapeChars(new char[0]);
        setEofOnUnclosedQuote(false);
        setEofOnEscapedNewLine(false);
    }

    @Override
    public ParsedLine parse(String line, int cursor, ParseContext context) {
        if (context == ParseContext.ACCEPT_LINE && !line.stripLeading().startsWith("#") && needsMore.test(line)) {
            throw new EOFError(-1, cursor, "entry continues");
        }
        return super.parse(line, cursor, context);
    }
}
