package org.rosetra.lang.repl;

import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.rosetra.lang.syntax.ScriptParser;

/** Questions about the text of one entry: is it whole yet, and is it a statement or a value to show. */
public final class EntryText {
    private static final Pattern FIRST_WORD = Pattern.compile("^[\\p{L}_][\\p{L}\\p{Nd}_]*");

    private EntryText() {
    }

    /**
     * Whether the entry can be run: nothing is left open, or the user gave two blank lines in a
     * row after it (a way out of an entry they cannot finish; the parser then says what is missing).
     */
    public static boolean isReady(String text) {
        if (ScriptParser.isComplete(text)) {
            return true;
        }
        String[] lines = text.split("\n", -1);
        int n = lines.length;
        return n >= 3 && lines[n - 1].isBlank() && lines[n - 2].isBlank();
    }

    /** An entry that does not begin with a statement keyword is an expression whose value is shown. */
    public static boolean isBareExpression(String text) {
        String code = withoutComments(text).strip();
        if (code.isEmpty()) {
            return false;
        }
        Matcher m = FIRST_WORD.matcher(code);
        return !(m.find() && Vocabulary.isStatementKeyword(m.group()));
    }

    /** Whether the entry holds nothing but blank lines and comments. */
    public static boolean isBlank(String text) {
        return withoutComments(text).isBlank();
    }

    private static String withoutComments(String text) {
        return text.replaceAll("(?m)^\\s*#.*$", "");
    }
}
