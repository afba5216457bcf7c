package org.rosetra.lang.plan;

import org.rosetra.lang.syntax.Check;

/**
 * A check tested in every case where it is defined.
 *
 * @param utilization per position of the case axis (NaN where the check is not defined)
 * @param pass        per position (false where not defined)
 * @param governing   position of the highest utilization, or -1 when no case defines it (or
 *                    when both sides are single numbers)
 * @param at          time in seconds of the governing sample when a series governs, else null
 * @param governingName the governing case's (or series') name, or null
 */
public record CheckResult(Check check, boolean passes, double highest, boolean unbounded,
                          double[] utilization, boolean[] pass, int governing, String governingName,
                          Double at) {}
