package org.rosetra.lang.plan;

import java.util.Map;
import org.rosetra.lang.syntax.Check;
import org.rosetra.lang.syntax.ComparisonOp;
import org.rosetra.runtime.criteria.CheckOutcome;
import org.rosetra.runtime.criteria.Comparison;
import org.rosetra.runtime.criteria.Utilization;

/** Tests checks: in every case where both sides have a value, by the runtime's utilization rule. */
final class Checks {
    private Checks() {}

    static CheckResult test(Check check, Evaluation evaluation) {
        Expressions ex = evaluation.expressions();
        Value left = ex.evaluate(check.left(), Map.of());
        Value right = ex.evaluate(check.right(), Map.of());
        var dl = Arithmetic.dimension(left, check.left().span());
        var dr = Arithmetic.dimension(right, check.right().span());
        if (!dl.equals(dr)) {
            throw new EvaluationException(check.span(), "check \"" + check.label().value() + "\" compares "
                    + Expressions.describe(dl) + " with " + Expressions.describe(dr));
        }
        Comparison op = comparison(check.op());
        if (left instanceof Value.Number a && right instanceof Value.Number b) {
            CheckOutcome o = Utilization.evaluate(new double[] {a.si()}, op, new double[] {b.si()}, 1, null, null);
            return new CheckResult(check, o.pass(), o.utilization(), o.unbounded(), new double[] {o.utilization()},
                    new boolean[] {o.pass()}, -1, null, null);
        }
        int n = evaluation.axis().size();
        double[] l = Arithmetic.column(left, n);
        double[] r = Arithmetic.column(right, n);
        int[] defined = new int[n];
        int count = 0;
        for (int i = 0; i < n; i++) {
            if (!Double.isNaN(l[i]) && !Double.isNaN(r[i])) {
                defined[count++] = i;
            }
        }
        double[] lc = new double[count];
        double[] rc = new double[count];
        for (int k = 0; k < count; k++) {
            lc[k] = l[defined[k]];
            rc[k] = r[defined[k]];
        }
        double[] u = new double[count];
        boolean[] p = new boolean[count];
        CheckOutcome o = Utilization.evaluate(lc, op, rc, count, u, p);
        double[] utilization = new double[n];
        boolean[] pass = new boolean[n];
        java.util.Arrays.fill(utilization, Double.NaN);
        for (int k = 0; k < count; k++) {
            utilization[defined[k]] = u[k];
            pass[defined[k]] = p[k];
        }
        int governing = o.governing() < 0 ? -1 : defined[o.governing()];
        String name = governing < 0 ? null : evaluation.axis().get(governing);
        boolean passes = o.pass();
        double highest = count == 0 ? Double.NaN : o.utilization();
        boolean unbounded = o.unbounded();
        Double at = null;
        // Tested at every sample of every series that reads what the check looks at.
        for (SeriesEvaluation.Result series : evaluation.series().values()) {
            SeriesEvaluation.ProbeResult probe = series.checks().get(check);
            if (probe == null || !probe.defined()) {
                continue;
            }
            passes &= probe.pass();
            if (Double.isNaN(highest) || probe.highest() > highest) {
                highest = probe.highest();
                unbounded = probe.unbounded();
                name = series.spec().name();
                governing = -1;
                at = probe.time();
            }
        }
        return new CheckResult(check, passes, highest, unbounded, utilization, pass, governing, name, at);
    }

    static Comparison comparison(ComparisonOp op) {
        return switch (op) {
            case LESS -> Comparison.LESS;
            case LESS_OR_EQUAL -> Comparison.LESS_OR_EQUAL;
            case GREATER -> Comparison.GREATER;
            case GREATER_OR_EQUAL -> Comparison.GREATER_OR_EQUAL;
        };
    }
}
