package org.rosetra.lang.repl;

/**
 * What the REPL answers to a line: text to print (possibly empty), whether it waits for more
 * lines of an open entry, and whether the user asked to leave.
 */
public record Reply(String text, boolean continues, boolean quits) {

    static Reply print(String text) {
        return new Reply(text, false, false);
    }

    static Reply more() {
        return new Reply("", true, false);
    }

    static Reply quit() {
        return new Reply("", false, true);
    }
}
