package org.rosetra.lang.repl;

/**
 * A bare expression is shown by naming it for a moment: it becomes
 * {@code let NAME = (} on a line of its own, the expression on the lines after, and {@code )}.
 * The parentheses let it span lines; the columns of the user's text stay as typed.
 */
final class ExpressionEntry {
    /** Lines put before the user's text. */
    static final int LINES_ADDED = 1;

    private ExpressionEntry() {
    }

    /** A name no script would choose, unique to the entry. */
    static String valueName(int entry) {
        return "_value_of_entry_" + entry;
    }

    static String wrap(String expression, int entry) {
        return "let " + valueName(entry) + " = (\n" + expression + "\n)";
    }
}
