package org.rosetra.lang.plan;

import org.rosetra.lang.check.Diagnostics;
import org.rosetra.lang.check.ScriptChecker;
import org.rosetra.lang.syntax.Script;

/** Runs the checker's passes (names, then dimensions) before anything is computed. */
final class CheckerBridge {
    private CheckerBridge() {}

    static void check(Script script, Diagnostics diagnostics) {
        ScriptChecker.check(script, diagnostics);
    }
}
