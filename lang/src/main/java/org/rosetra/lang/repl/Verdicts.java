package org.rosetra.lang.repl;

import java.util.Locale;
import org.rosetra.lang.plan.CheckResult;

/** One line per check: pass or FAIL, the highest utilization and the governing case. */
final class Verdicts {
    private Verdicts() {
    }

    static String of(CheckResult c) {
        StringBuilder s = new StringBuilder();
        s.append(c.passes() ? "pass" : "FAIL").append("  check \"").append(c.check().label().value()).append('"');
        if (c.unbounded()) {
            s.append("  utilization unbounded (the limit is zero)");
        } else if (!Double.isNaN(c.highest())) {
            s.append(String.format(Locale.ROOT, "  utilization %.3f", c.highest()));
        } else {
            s.append("  (no case defines it)");
        }
        if (c.governingName() != null) {
            s.append("  governing ").append(c.governingName());
        }
        if (c.at() != null) {
            s.append(String.format(Locale.ROOT, " at %.3f s", c.at()));
        }
        return s.toString();
    }
}
