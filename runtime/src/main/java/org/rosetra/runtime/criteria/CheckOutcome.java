package org.rosetra.runtime.criteria;

/**
 * The outcome of a check over its cases: whether it holds in every case, the governing case
 * (index of the highest utilization, the first of equals) and that utilization, which is
 * {@code Double.POSITIVE_INFINITY} when {@code unbounded} (see {@link Utilization}).
 * {@code governing} is -1 when there were no cases; such a check passes with utilization 0.
 */
public record CheckOutcome(boolean pass, int governing, double utilization, boolean unbounded) {
}
