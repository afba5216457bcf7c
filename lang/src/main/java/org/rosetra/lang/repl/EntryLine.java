package org.rosetra.lang.repl;

import java.util.List;
import org.jline.reader.CompletingParsedLine;

/** The entry as JLine's completion sees it: one word, the one {@link ScriptCompleter} replaces. */
record EntryLine(String line, int cursor, int start, int end) implements CompletingParsedLine {

    @Override
    public String word() {
        return line.substring(start, end);
    }

    @Override
    public int wordCursor() {
        return cursor - start;
    }

    @Override
    public int wordIndex() {
        return 0;
    }

    @Override
    public List<String> words() {
        return List.of(word());
    }

    @Override
    public CharSequence escape(CharSequence candidate, boolean complete) {
        return candidate;
    }

    @Override
    public int rawWordCursor() {
        return wordCursor();
    }

    @Override
    public int rawWordLength() {
        return end - start;
    }
}
