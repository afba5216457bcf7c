package org.rosetra.lang.java;

import java.util.List;
import java.util.Locale;
import org.rosetra.lang.plan.EvaluationException;
import org.rosetra.lang.plan.Value;
import org.rosetra.lang.syntax.SourceSpan;
import org.rosetra.runtime.units.Dimension;

/**
 * Calls a compiled function once, or once per case when an argument is a column (or once per
 * sample of a series). An exception or a result that is not a finite number is an error naming
 * the function and the case.
 */
final class CaseLoop {
    private final CompiledFunction function;
    private final SourceSpan callSite;
    private final List<String> cases;

    CaseLoop(CompiledFunction function, SourceSpan callSite, List<String> cases) {
        this.function = function;
        this.callSite = callSite;
        this.cases = cases;
    }

    Value apply(List<Value> arguments, Dimension result) {
        Value.Column column = null;
        Value.History history = null;
        for (Value v : arguments) {
            if (v instanceof Value.Column c) {
                column = c;
            } else if (v instanceof Value.History h) {
                if (history != null && !history.series().equals(h.series())) {
                    throw new EvaluationException(callSite, "the arguments of " + function.name()
                            + " come from two series, " + history.series() + " and " + h.series());
                }
                history = h;
            }
        }
        if (column != null && history != null) {
            throw new EvaluationException(callSite, "the arguments of " + function.name()
                    + " mix values per case with the samples of series " + history.series());
        }
        if (column != null) {
            return new Value.Column(loop(arguments, column.values().length, null), result);
        }
        if (history != null) {
            return new Value.History(history.series(), loop(arguments, history.values().length, history),
                    history.time(), result);
        }
        double[] single = new double[arguments.size()];
        for (int k = 0; k < single.length; k++) {
            single[k] = ((Value.Number) arguments.get(k)).si();
        }
        return new Value.Number(callOnce(single, -1, null), result);
    }

    private double[] loop(List<Value> arguments, int n, Value.History history) {
        double[] out = new double[n];
        double[] args = new double[arguments.size()];
        for (int i = 0; i < n; i++) {
            boolean defined = true;
            for (int k = 0; k < args.length; k++) {
                args[k] = at(arguments.get(k), i);
                defined &= !Double.isNaN(args[k]);
            }
            out[i] = defined ? callOnce(args, i, history) : Double.NaN;
        }
        return out;
    }

    private static double at(Value v, int i) {
        if (v instanceof Value.Column c) {
            return c.values()[i];
        }
        if (v instanceof Value.History h) {
            return h.values()[i];
        }
        return ((Value.Number) v).si();
    }

    private double callOnce(double[] args, int index, Value.History history) {
        double value;
        try {
            value = function.call(args);
        } catch (RuntimeException | StackOverflowError | AssertionError | LinkageError e) {
            String message = e.getMessage() == null ? "" : ": " + e.getMessage();
            throw new EvaluationException(callSite, "the Java function " + function.name() + " threw "
                    + e.getClass().getSimpleName() + message + where(args, index, history));
        }
        if (!Double.isFinite(value)) {
            throw new EvaluationException(callSite, "the Java function " + function.name() + " gave "
                    + (Double.isNaN(value) ? "NaN" : "an infinite result") + where(args, index, history),
                    "return a finite number in SI for every case");
        }
        return value;
    }

    private String where(double[] args, int index, Value.History history) {
        if (history != null) {
            return String.format(Locale.ROOT, " at sample %d of series %s (t = %s s)", index + 1,
                    history.series(), history.time()[index]);
        }
        if (index >= 0 && index < cases.size()) {
            return " in case " + cases.get(index);
        }
        StringBuilder s = new StringBuilder(" for arguments (");
        for (int k = 0; k < args.length; k++) {
            s.append(k > 0 ? ", " : "").append(args[k]);
        }
        return s.append(") in SI").toString();
    }
}
