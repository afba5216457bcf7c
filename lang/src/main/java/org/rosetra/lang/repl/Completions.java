package org.rosetra.lang.repl;

import java.util.List;

/**
 * What completion offers at a cursor: the candidates, each of which replaces the text from
 * {@code start} (inclusive) to {@code end} (exclusive), the word the cursor is in.
 */
public record Completions(int start, int end, List<String> candidates) {
    public Completions {
        candidates = List.copyOf(candidates);
    }
}
