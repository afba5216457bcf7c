package org.rosetra.lang.repl;

import java.util.regex.Pattern;

/**
 * A bare expression is shown by naming it for a moment: it becomes
 * {@code let NAME = (} on a line of its own, the expression on the lines after, and {@code )}.
 * The parentheses let it span lines; the columns of the user's text stay as typed.
 */
final class ExpressionEntry {
    private static final Pattern ASSIGNMENT = Pattern.compile("^\\s*[\\p{L}_][\\p{L}\\p{Nd}_]*\\s*=(?!=)");
    private static final String EXPECTED_CLOSE = "expected ')',";

    /** Lines put before the user's text. */
    static final int LINES_ADDED = 1;

    private ExpressionEntry() {
    }

    /** A name no script would choose, unique to the entry. */
    static String valueName(int entry) {
        return "_value_of_entry_" + entry;
    }

    /** {@code x = 3}: the user meant {@code let x = 3}. */
    static boolean looksLikeAnAssignment(String text) {
        return ASSIGNMENT.matcher(text).find();
    }

    /** The wrapper's closing parenthesis is not the user's: a parser wish for it reads as the end. */
    static String inUserTerms(String message) {
        return message.startsWith(EXPECTED_CLOSE)
                ? "expected the end of the expression" + message.substring(EXPECTED_CLOSE.length() - 1) : message;
    }

    static String wrap(String expression, int entry) {
        return "let " + valueName(entry) + " = (\n" + expression + "\n)";
    }
}
