package org.rosetra.lang.repl;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Optional;
import org.jline.reader.EndOfFileException;
import org.jline.reader.LineReader;
import org.jline.reader.LineReaderBuilder;
import org.jline.reader.UserInterruptException;
import org.jline.terminal.Terminal;

/** The thin JLine side of the REPL: prompts, line editing, history and Tab; the {@link Repl} does the rest. */
final class TerminalLoop {
    static final String PROMPT = "rosetra> ";
    static final String GOES_ON = "    ...> ";

    private final Terminal terminal;
    private final Optional<Path> history;

    TerminalLoop(Terminal terminal, Optional<Path> history) {
        this.terminal = terminal;
        this.history = history;
    }

    void run(Repl repl, ScriptCompleter completer) {
        LineReaderBuilder builder = LineReaderBuilder.builder().terminal(terminal).appName("rosetra")
                .parser(new EntryParser(completer)).completer(new CompletionAdapter(completer))
                .variable(LineReader.SECONDARY_PROMPT_PATTERN, GOES_ON)
                .option(LineReader.Option.DISABLE_EVENT_EXPANSION, true);
        history.ifPresent(file -> builder.variable(LineReader.HISTORY_FILE, file));
        LineReader reader = builder.build();
        PrintWriter out = terminal.writer();
        while (true) {
            String line;
            try {
                line = reader.readLine(repl.continues() ? GOES_ON : PROMPT);
            } catch (UserInterruptException e) {
                repl.cancel();
                continue;
            } catch (EndOfFileException e) {
                break;
            }
            Reply reply;
            try {
                reply = repl.accept(line);
            } catch (RuntimeException e) {
                repl.cancel();
                reply = Reply.print("rosetra: internal error: " + e + " (please report it with the entry)");
            }
            if (!reply.text().isEmpty()) {
                out.println(reply.text().stripTrailing());
            }
            out.flush();
            if (reply.quits()) {
                break;
            }
        }
    }
}
