package org.rosetra.lang.plan;

import java.util.List;
import org.rosetra.lang.check.Diagnostics;
import org.rosetra.runtime.units.DisplayUnits;

/**
 * The result of checking and evaluating a session's statements. When {@link #diagnostics()}
 * has errors nothing was computed: {@code results} and {@code evaluation} are null.
 */
public record Outcome(Diagnostics diagnostics, RunResults results, List<Output> outputs,
                      List<CheckResult> checks, Evaluation evaluation, DisplayUnits display) {

    public boolean ok() {
        return !diagnostics.hasErrors();
    }
}
