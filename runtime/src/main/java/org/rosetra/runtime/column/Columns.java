package org.rosetra.runtime.column;

import java.util.function.DoubleBinaryOperator;
import java.util.function.DoubleUnaryOperator;

/**
 * Element-wise arithmetic over columns of doubles, the way a script's expressions run over the
 * cases or samples. A NaN in a column means "no value here" (a rosette not read in that case):
 * it passes through every operation. A NaN or infinity that an operation would make out of
 * defined inputs is never returned: it is a {@link ColumnDomainException} at that position.
 */
public final class Columns {
    private Columns() {}

    /** A column of length n holding one value. */
    public static double[] constant(double value, int n) {
        double[] out = new double[n];
        java.util.Arrays.fill(out, value);
        return out;
    }

    public static double[] add(double[] a, double[] b) {
        return binary(a, b, Double::sum, "sum");
    }

    public static double[] subtract(double[] a, double[] b) {
        return binary(a, b, (x, y) -> x - y, "difference");
    }

    public static double[] multiply(double[] a, double[] b) {
        return binary(a, b, (x, y) -> x * y, "product");
    }

    public static double[] divide(double[] a, double[] b) {
        requireSameLength(a, b);
        double[] out = new double[a.length];
        for (int i = 0; i < a.length; i++) {
            if (b[i] == 0 && !Double.isNaN(a[i])) {
                throw new ColumnDomainException(i, "division by zero");
            }
            out[i] = a[i] / b[i];
        }
        return checked(out, a, b, "quotient");
    }

    public static double[] power(double[] a, double exponent) {
        return unary(a, x -> Math.pow(x, exponent), "power");
    }

    public static double[] negate(double[] a) {
        return unary(a, x -> -x, "negation");
    }

    public static double[] sqrt(double[] a) {
        for (int i = 0; i < a.length; i++) {
            if (a[i] < 0) {
                throw new ColumnDomainException(i, "square root of a negative value (" + a[i] + ")");
            }
        }
        return unary(a, Math::sqrt, "square root");
    }

    public static double[] abs(double[] a) {
        return unary(a, Math::abs, "absolute value");
    }

    public static double[] sin(double[] a) {
        return unary(a, Math::sin, "sine");
    }

    public static double[] cos(double[] a) {
        return unary(a, Math::cos, "cosine");
    }

    public static double[] tan(double[] a) {
        return unary(a, Math::tan, "tangent");
    }

    public static double[] atan2(double[] y, double[] x) {
        return binary(y, x, Math::atan2, "atan2");
    }

    /** Element-wise maximum; a position where any input has no value has none. */
    public static double[] max(double[] a, double[] b) {
        return binary(a, b, Math::max, "maximum");
    }

    public static double[] min(double[] a, double[] b) {
        return binary(a, b, Math::min, "minimum");
    }

    /** Index of the largest defined value (the first of equals), or -1 when none is defined. */
    public static int indexOfMax(double[] a) {
        int best = -1;
        for (int i = 0; i < a.length; i++) {
            if (!Double.isNaN(a[i]) && (best < 0 || a[i] > a[best])) {
                best = i;
            }
        }
        return best;
    }

    /** Index of the smallest defined value (the first of equals), or -1 when none is defined. */
    public static int indexOfMin(double[] a) {
        int best = -1;
        for (int i = 0; i < a.length; i++) {
            if (!Double.isNaN(a[i]) && (best < 0 || a[i] < a[best])) {
                best = i;
            }
        }
        return best;
    }

    private static double[] unary(double[] a, DoubleUnaryOperator op, String what) {
        double[] out = new double[a.length];
        for (int i = 0; i < a.length; i++) {
            out[i] = op.applyAsDouble(a[i]);
        }
        return checked(out, a, a, what);
    }

    private static double[] binary(double[] a, double[] b, DoubleBinaryOperator op, String what) {
        requireSameLength(a, b);
        double[] out = new double[a.length];
        for (int i = 0; i < a.length; i++) {
            out[i] = op.applyAsDouble(a[i], b[i]);
        }
        return checked(out, a, b, what);
    }

    private static double[] checked(double[] out, double[] a, double[] b, String what) {
        for (int i = 0; i < out.length; i++) {
            if (!Double.isFinite(out[i]) && Double.isFinite(a[i]) && Double.isFinite(b[i])) {
                throw new ColumnDomainException(i, "the " + what + " is not a finite number");
            }
        }
        return out;
    }

    private static void requireSameLength(double[] a, double[] b) {
        if (a.length != b.length) {
            throw new IllegalArgumentException("columns of different lengths: " + a.length + " and " + b.length);
        }
    }
}
