package org.rosetra.lang.repl;

import java.util.List;
import org.jline.reader.Candidate;
import org.jline.reader.Completer;
import org.jline.reader.LineReader;
import org.jline.reader.ParsedLine;

/** Hands JLine the candidates of a {@link ScriptCompleter}. */
final class CompletionAdapter implements Completer {
    private final ScriptCompleter completer;

    CompletionAdapter(ScriptCompleter completer) {
        this.completer = completer;
    }

    @Override
    public void complete(LineReader reader, ParsedLine line, List<Candidate> candidates) {
        for (String word : completer.complete(line.line(), line.cursor()).candidates()) {
            // Not "complete": no space is added, so a member or a unit can go on.
            candidates.add(new Candidate(word, word, null, null, null, null, false));
        }
    }
}
