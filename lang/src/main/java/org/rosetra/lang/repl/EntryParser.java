package org.rosetra.lang.repl;

import org.jline.reader.EOFError;
import org.jline.reader.ParsedLine;
import org.jline.reader.Parser;

/**
 * Tells JLine when an entry goes on (a block or parenthesis left open: Enter then starts a new
 * line of the same entry) and which word completion replaces. Knows no quoting or escapes, so
 * Java bodies and strings pass through as typed.
 */
final class EntryParser implements Parser {
    private final ScriptCompleter completer;

    EntryParser(ScriptCompleter completer) {
        this.completer = completer;
    }

    @Override
    public ParsedLine parse(String line, int cursor, ParseContext context) {
        if (context == ParseContext.ACCEPT_LINE && !line.strip().startsWith(":") && !EntryText.isReady(line)) {
            throw new EOFError(-1, -1, "the entry goes on");
        }
        Completions c = completer.complete(line, cursor);
        return new EntryLine(line, cursor, Math.min(c.start(), cursor), Math.max(c.end(), cursor));
    }
}
