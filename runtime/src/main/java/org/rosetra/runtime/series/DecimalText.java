package org.rosetra.runtime.series;

import ch.randelshofer.fastdoubleparser.JavaDoubleParser;

/**
 * Numbers as CSV exports write them: optional sign, digits with an optional decimal mark
 * ({@code .} or {@code ,}), an optional exponent, spaces around allowed. Java's own extras
 * ({@code NaN}, {@code Infinity}, hex, {@code d}/{@code f} suffixes) are not numbers here,
 * so a bad cell never becomes a silent NaN.
 */
final class DecimalText {

    /** Exact powers of ten: a double holds 10^k exactly up to k = 22. */
    static final double[] POWERS_OF_TEN = {
        1e0, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11,
        1e12, 1e13, 1e14, 1e15, 1e16, 1e17, 1e18, 1e19, 1e20, 1e21, 1e22
    };

    /** Largest integer below which every long converts to double exactly. */
    static final long EXACT_INTEGER_LIMIT = 1L << 53;

    private DecimalText() {
    }

    /**
     * Parses {@code text[from..to)} in full; NaN when it is not a number as described above.
     * {@code scratch} must hold {@code to - from} bytes; it receives the text with a decimal point.
     */
    static double parse(byte[] text, int from, int to, byte decimalMark, byte[] scratch) {
        while (from < to && text[from] == ' ') {
            from++;
        }
        while (to > from && text[to - 1] == ' ') {
            to--;
        }
        int p = from;
        if (p < to && (text[p] == '+' || text[p] == '-')) {
            p++;
        }
        int digits = 0;
        while (p < to && isDigit(text[p])) {
            p++;
            digits++;
        }
        if (p < to && text[p] == decimalMark) {
            p++;
            while (p < to && isDigit(text[p])) {
                p++;
                digits++;
            }
        }
        if (digits == 0) {
            return Double.NaN;
        }
        if (p < to && (text[p] == 'e' || text[p] == 'E')) {
            p++;
            if (p < to && (text[p] == '+' || text[p] == '-')) {
                p++;
            }
            int exponentDigits = 0;
            while (p < to && isDigit(text[p])) {
                p++;
                exponentDigits++;
            }
            if (exponentDigits == 0) {
                return Double.NaN;
            }
        }
        if (p != to) {
            return Double.NaN;
        }
        int n = to - from;
        for (int i = 0; i < n; i++) {
            byte c = text[from + i];
            scratch[i] = c == decimalMark ? (byte) '.' : c;
        }
        return JavaDoubleParser.parseDouble(scratch, 0, n);
    }

    static boolean isDigit(byte c) {
        return c >= '0' && c <= '9';
    }
}
