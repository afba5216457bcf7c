package org.rosetra.lang.plan;

import java.util.List;
import java.util.function.DoubleUnaryOperator;
import java.util.function.UnaryOperator;
import org.rosetra.lang.syntax.BinaryOp;
import org.rosetra.lang.syntax.SourceSpan;
import org.rosetra.runtime.column.Columns;
import org.rosetra.runtime.units.Dimension;
import org.rosetra.runtime.units.Rational;

/**
 * Arithmetic on values: a number with a number, a number with a column (the number is used in
 * every case), a column with a column (case by case). The dimensions follow the operation;
 * the columns are computed by the runtime's {@link Columns}.
 */
final class Arithmetic {
    private Arithmetic() {}

    static Value negate(Value v, SourceSpan at) {
        return map(v, Columns::negate, x -> -x, at);
    }

    static Value binary(BinaryOp op, Value left, Value right, SourceSpan at) {
        if (op == BinaryOp.POWER) {
            return power(left, right, at);
        }
        Dimension dl = dimension(left, at);
        Dimension dr = dimension(right, at);
        Dimension result;
        switch (op) {
            case ADD:
            case SUBTRACT:
                if (!dl.equals(dr)) {
                    throw new EvaluationException(at, "cannot " + (op == BinaryOp.ADD ? "add " : "subtract ")
                            + Expressions.describe(dr) + (op == BinaryOp.ADD ? " to " : " from ") + Expressions.describe(dl));
                }
                result = dl;
                break;
            case MULTIPLY:
                result = dl.times(dr);
                break;
            default:
                result = dl.over(dr);
                break;
        }
        if (left instanceof Value.Number a && right instanceof Value.Number b) {
            double v = apply(op, a.si(), b.si(), at);
            return new Value.Number(v, result);
        }
        if (left instanceof Value.History || right instanceof Value.History) {
            return historyBinary(op, left, right, result, at);
        }
        int n = length(left, right);
        double[] a = column(left, n);
        double[] b = column(right, n);
        double[] out = switch (op) {
            case ADD -> Columns.add(a, b);
            case SUBTRACT -> Columns.subtract(a, b);
            case MULTIPLY -> Columns.multiply(a, b);
            default -> Columns.divide(a, b);
        };
        return new Value.Column(out, result);
    }

    private static Value historyBinary(BinaryOp op, Value left, Value right, Dimension result, SourceSpan at) {
        Value.History h = left instanceof Value.History x ? x : (Value.History) right;
        if (left instanceof Value.Column || right instanceof Value.Column) {
            throw new EvaluationException(at, "a history of a series and a value per load case cannot be combined");
        }
        if (left instanceof Value.History l && right instanceof Value.History r && !l.series().equals(r.series())) {
            throw new EvaluationException(at, "histories of two different series cannot be combined");
        }
        int n = h.values().length;
        double[] a = left instanceof Value.History l ? l.values() : Columns.constant(((Value.Number) left).si(), n);
        double[] b = right instanceof Value.History r ? r.values() : Columns.constant(((Value.Number) right).si(), n);
        double[] out = switch (op) {
            case ADD -> Columns.add(a, b);
            case SUBTRACT -> Columns.subtract(a, b);
            case MULTIPLY -> Columns.multiply(a, b);
            default -> Columns.divide(a, b);
        };
        return new Value.History(h.series(), out, h.time(), result);
    }

    private static double apply(BinaryOp op, double a, double b, SourceSpan at) {
        double v = switch (op) {
            case ADD -> a + b;
            case SUBTRACT -> a - b;
            case MULTIPLY -> a * b;
            default -> {
                if (b == 0) {
                    throw new EvaluationException(at, "division by zero");
                }
                yield a / b;
            }
        };
        if (!Double.isFinite(v)) {
            throw new EvaluationException(at, "the result is not a finite number");
        }
        return v;
    }

    private static Value power(Value base, Value exponent, SourceSpan at) {
        if (!(exponent instanceof Value.Number e) || !e.dimension().isNone()) {
            throw new EvaluationException(at, "the power after ^ must be a plain number");
        }
        Dimension d = dimension(base, at);
        Dimension result = Dimension.NONE;
        if (!d.isNone()) {
            Rational r = Expressions.exponentOf(e.si());
            if (r == null) {
                throw new EvaluationException(at, "a " + d.name() + " can only be raised to a whole or half power");
            }
            result = d.pow(r);
        }
        double p = e.si();
        Value out = map(base, col -> Columns.power(col, p), x -> Math.pow(x, p), at);
        return withDimension(out, result);
    }

    static Value sqrt(Value v, SourceSpan at) {
        Value out = map(v, Columns::sqrt, x -> {
            if (x < 0) {
                throw new EvaluationException(at, "square root of a negative value (" + x + ")");
            }
            return Math.sqrt(x);
        }, at);
        return withDimension(out, dimension(v, at).sqrt());
    }

    static Value trig(Value v, UnaryOperator<double[]> columnOp, DoubleUnaryOperator op, SourceSpan at, String name) {
        if (!dimension(v, at).equals(Dimension.ANGLE)) {
            throw new EvaluationException(at, name + " needs an angle, got " + Expressions.describe(dimension(v, at)),
                    "give the angle a unit, such as 30 deg");
        }
        return withDimension(map(v, columnOp, op, at), Dimension.NONE);
    }

    static Value atan2(Value y, Value x, SourceSpan at) {
        if (!dimension(y, at).equals(dimension(x, at))) {
            throw new EvaluationException(at, "atan2 needs two values of the same dimension");
        }
        if (y instanceof Value.Number a && x instanceof Value.Number b) {
            return new Value.Number(Math.atan2(a.si(), b.si()), Dimension.ANGLE);
        }
        int n = length(y, x);
        return new Value.Column(Columns.atan2(column(y, n), column(x, n)), Dimension.ANGLE);
    }

    /** {@code max(x)} / {@code min(x)} reduce over the cases; with more arguments, case by case. */
    static Value extreme(List<Value> args, boolean max, SourceSpan at, List<String> axis) {
        String name = max ? "max" : "min";
        if (args.isEmpty()) {
            throw new EvaluationException(at, name + " needs at least one argument");
        }
        if (args.size() == 1) {
            Value v = args.get(0);
            if (v instanceof Value.Number) {
                return v;
            }
            double[] values;
            Dimension d;
            if (v instanceof Value.Column c) {
                values = c.values();
                d = c.dimension();
            } else if (v instanceof Value.History h) {
                values = h.values();
                d = h.dimension();
            } else {
                throw new EvaluationException(at, name + " needs numbers, got " + Expressions.kindOf(v));
            }
            int i = max ? Columns.indexOfMax(values) : Columns.indexOfMin(values);
            if (i < 0) {
                throw new EvaluationException(at, name + " has no value to reduce: no case has a result");
            }
            return new Value.Number(values[i], d);
        }
        Value acc = args.get(0);
        Dimension d = dimension(acc, at);
        for (Value next : args.subList(1, args.size())) {
            if (!dimension(next, at).equals(d)) {
                throw new EvaluationException(at, name + " needs arguments of one dimension");
            }
            if (acc instanceof Value.Number a && next instanceof Value.Number b) {
                acc = new Value.Number(max ? Math.max(a.si(), b.si()) : Math.min(a.si(), b.si()), d);
            } else {
                int n = length(acc, next);
                double[] a = column(acc, n);
                double[] b = column(next, n);
                acc = new Value.Column(max ? Columns.max(a, b) : Columns.min(a, b), d);
            }
        }
        return acc;
    }

    static Value map(Value v, UnaryOperator<double[]> columnOp, DoubleUnaryOperator op, SourceSpan at) {
        if (v instanceof Value.Number n) {
            double r = op.applyAsDouble(n.si());
            if (!Double.isFinite(r)) {
                throw new EvaluationException(at, "the result is not a finite number");
            }
            return new Value.Number(r, n.dimension());
        }
        if (v instanceof Value.Column c) {
            return new Value.Column(columnOp.apply(c.values()), c.dimension());
        }
        if (v instanceof Value.History h) {
            return new Value.History(h.series(), columnOp.apply(h.values()), h.time(), h.dimension());
        }
        throw new EvaluationException(at, "arithmetic needs numbers, got " + Expressions.kindOf(v));
    }

    private static Value withDimension(Value v, Dimension d) {
        if (v instanceof Value.Number n) {
            return new Value.Number(n.si(), d);
        }
        if (v instanceof Value.Column c) {
            return new Value.Column(c.values(), d);
        }
        Value.History h = (Value.History) v;
        return new Value.History(h.series(), h.values(), h.time(), d);
    }

    static Dimension dimension(Value v, SourceSpan at) {
        Dimension d = v.dimensionOrNull();
        if (d != null) {
            return d;
        }
        throw new EvaluationException(at, "arithmetic needs numbers, got " + Expressions.kindOf(v),
                v instanceof Value.Rosette ? "pick a member, such as .von_mises" : null);
    }

    private static int length(Value a, Value b) {
        if (a instanceof Value.Column c) {
            return c.values().length;
        }
        return ((Value.Column) b).values().length;
    }

    static double[] column(Value v, int n) {
        if (v instanceof Value.Column c) {
            return c.values();
        }
        return Columns.constant(((Value.Number) v).si(), n);
    }
}
