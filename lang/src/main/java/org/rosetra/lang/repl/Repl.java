package org.rosetra.lang.repl;

import java.io.IOException;
import java.nio.charset.MalformedInputException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.rosetra.lang.plan.Session;

/**
 * The reading loop without a terminal: lines go in, the text to print comes out. Each entry is
 * submitted to one session that lives as long as the REPL, as source {@code entry-N} (file
 * {@code <entry N>} in messages); {@link EntryRunner} runs it.
 */
public final class Repl {
    private final Session session;
    private final EntryRunner entries;
    private final StringBuilder pending = new StringBuilder();
    private int entryCount;

    public Repl(Session session) {
        this.session = session;
        this.entries = new EntryRunner(session);
    }

    public Session session() {
        return session;
    }

    /** Whether an entry is open and waits for more lines. */
    public boolean continues() {
        return pending.length() > 0;
    }

    /** Drops the open entry (Ctrl-C). */
    public void cancel() {
        pending.setLength(0);
    }

    /** One line typed, or a whole entry of several lines from an editor that collects them. */
    public Reply accept(String line) {
        if (!continues() && line.strip().startsWith(":")) {
            return command(line.strip());
        }
        if (continues()) {
            pending.append('\n');
        }
        pending.append(line);
        String text = pending.toString();
        if (!EntryText.isReady(text)) {
            return Reply.more();
        }
        pending.setLength(0);
        if (EntryText.isBlank(text)) {
            return Reply.print("");
        }
        return Reply.print(run(text));
    }

    /** Adds a script file to the session, as {@code rosetra repl SCRIPT} does before the first prompt. */
    public Reply load(Path script) {
        String text;
        try {
            text = Files.readString(script, StandardCharsets.UTF_8);
        } catch (MalformedInputException e) {
            return Reply.print("rosetra: error: " + script + " is not UTF-8 text");
        } catch (IOException e) {
            return Reply.print("rosetra: error: cannot read " + script + ": " + e.getMessage());
        }
        return Reply.print(entries.statement("file " + script.toAbsolutePath().normalize(), script.toString(), text));
    }

    private Reply command(String line) {
        String[] words = line.split("\\s+", 2);
        switch (words[0]) {
            case ":quit", ":q", ":exit":
                return Reply.quit();
            case ":help", ":h", ":?":
                return Reply.print(HelpText.TEXT);
            case ":reset":
                entries.reset();
                return Reply.print("(the session is empty)");
            case ":names":
                return Reply.print(names());
            case ":load":
                if (words.length < 2 || words[1].isBlank()) {
                    return Reply.print("error: :load needs a file, as in :load survey.strain");
                }
                return load(session.folder().resolve(words[1].strip()));
            default:
                return Reply.print("error: unknown command " + words[0] + "; :help lists the commands");
        }
    }

    private String names() {
        List<String> names = SessionNames.of(session.statements()).all();
        return names.isEmpty() ? "(nothing defined yet)" : String.join("  ", names);
    }

    private String run(String text) {
        int number = ++entryCount;
        String source = "entry-" + number;
        String file = "<entry " + number + ">";
        if (EntryText.isBareExpression(text)) {
            return entries.expression(text, number, source, file);
        }
        return entries.statement(source, file, text);
    }
}
