package org.rosetra.lang.kernel;

import java.util.List;

/**
 * Names offered at the cursor. They replace the code between {@code cursorStart} and
 * {@code cursorEnd} (code-point offsets), usually the partial name before the cursor.
 */
public record CompletionResult(List<String> matches, int cursorStart, int cursorEnd) {
    public CompletionResult {
        matches = List.copyOf(matches);
        if (cursorStart < 0 || cursorEnd < cursorStart) {
            throw new IllegalArgumentException(
                    "completion range " + cursorStart + ".." + cursorEnd + " is not a range");
        }
    }

    /** Nothing to offer at {@code cursorPos}. */
    public static CompletionResult none(int cursorPos) {
        return new CompletionResult(List.of(), cursorPos, cursorPos);
    }
}
