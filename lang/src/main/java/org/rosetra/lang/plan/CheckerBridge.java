package org.rosetra.lang.plan;

import org.rosetra.lang.check.Diagnostics;
import org.rosetra.lang.syntax.Script;

/** Runs the checker's passes over the session's statements before anything is computed. */
final class CheckerBridge {
    private CheckerBridge() {}

    static void check(Script script, Diagnostics diagnostics) {
        // The resolver and dimension checker are wired here as they land.
    }
}
