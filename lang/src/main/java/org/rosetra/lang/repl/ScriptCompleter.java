package org.rosetra.lang.repl;

import java.util.ArrayList;
import java.util.List;
import java.util.TreeSet;
import java.util.function.Supplier;
import java.util.regex.Pattern;
import org.rosetra.lang.plan.Session;
import org.rosetra.lang.syntax.Statement;
import org.rosetra.runtime.units.Units;

/**
 * Completion for script text, shared by the REPL and the notebook kernel: keywords at the start
 * of a line, fields inside a block, declared names, members after a dot ({@code web_top.} offers
 * eps_x ... tresca), cases inside {@code [ ]}, and units after a number.
 */
public final class ScriptCompleter {
    /** A number (not the end of a name) right before the cursor, perhaps with a unit and "/" after it. */
    private static final Pattern AFTER_NUMBER = Pattern.compile(
            "(?<![\\p{L}\\p{Nd}_.])(\\d+\\.?\\d*([eE][+-]?\\d+)?|\\.\\d+)\\s*"
                    + "([\\p{L}%]+(\\^-?\\d+)?\\s*[*/]\\s*)*$");

    private final Supplier<List<Statement>> statements;
    private final List<String> commands;

    /**
     * @param statements the statements in force, asked at each completion
     * @param commands   words such as ":help" offered at the start of an entry (none for a notebook)
     */
    public ScriptCompleter(Supplier<List<Statement>> statements, List<String> commands) {
        this.statements = statements;
        this.commands = List.copyOf(commands);
    }

    /** Completion over a session's statements, without front-end commands. */
    public ScriptCompleter(Session session) {
        this(session::statements, List.of());
    }

    /** The candidates for the word at {@code cursor} in {@code text} (a whole entry or cell). */
    public Completions complete(String text, int cursor) {
        int at = Math.max(0, Math.min(cursor, text.length()));
        String before = text.substring(0, at);
        int start = at;
        while (start > 0 && isWordChar(before.charAt(start - 1))) {
            start--;
        }
        int end = at;
        while (end < text.length() && isWordChar(text.charAt(end))) {
            end++;
        }
        String prefix = before.substring(start);
        int lineStart = before.lastIndexOf('\n', start - 1) + 1;
        String lead = before.substring(lineStart, start);
        if (!commands.isEmpty() && lineStart == 0 && lead.strip().equals(":")) {
            int colon = before.indexOf(':');
            return filtered(colon, end, ":" + prefix, commands);
        }
        return filtered(start, end, prefix, candidates(before, start, lineStart, lead));
    }

    private List<String> candidates(String before, int start, int lineStart, String lead) {
        String block = OpenBlock.kindAt(before.substring(0, lineStart));
        if ("java".equals(block)) {
            return List.of();
        }
        SessionNames names = SessionNames.of(statements.get());
        if (start > 0 && before.charAt(start - 1) == '.') {
            String target = OpenBlock.wordBeforeDot(before, start - 1);
            return names.materials().contains(target) ? Vocabulary.MATERIAL_MEMBERS : Vocabulary.resultMembers();
        }
        if (AFTER_NUMBER.matcher(before.substring(0, start)).find()) {
            return Units.symbols();
        }
        if (lead.lastIndexOf('[') > lead.lastIndexOf(']')) {
            return new ArrayList<>(names.cases());
        }
        List<String> all = new ArrayList<>();
        if (lead.isBlank() && block != null) {
            all.addAll(Vocabulary.fields(block));
            if (block.equals("case") || block.equals("baseline") || block.equals("series")) {
                all.addAll(names.rosettes());
            }
            return all;
        }
        if (lead.isBlank()) {
            all.addAll(Vocabulary.STATEMENT_KEYWORDS);
        }
        all.addAll(names.all());
        all.addAll(Vocabulary.functions());
        all.addAll(Vocabulary.WORDS);
        return all;
    }

    /** Candidates that start with the prefix, each once, keeping the order given. */
    private static Completions filtered(int start, int end, String prefix, List<String> words) {
        List<String> out = new ArrayList<>();
        TreeSet<String> seen = new TreeSet<>();
        for (String w : words) {
            if (w.startsWith(prefix) && seen.add(w)) {
                out.add(w);
            }
        }
        return new Completions(start, end, out);
    }

    static boolean isWordChar(char c) {
        return Character.isLetterOrDigit(c) || c == '_';
    }
}
