package org.rosetra.runtime.series;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.Locale;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** The slow path of number parsing, checked against {@link Double#parseDouble}. */
class DecimalTextTest {

    private static double parse(String s, char mark) {
        byte[] b = s.getBytes(StandardCharsets.US_ASCII);
        return DecimalText.parse(b, 0, b.length, (byte) mark, new byte[b.length]);
    }

    @Test
    void agreesWithDoubleParseDoubleBitForBit() {
        Random random = new Random(8);
        for (int i = 0; i < 20_000; i++) {
            double x = Double.longBitsToDouble(random.nextLong());
            if (!Double.isFinite(x)) {
                continue;
            }
            String s = i % 2 == 0 ? Double.toString(x) : String.format(Locale.ROOT, "%." + (i % 20) + "e", x);
            assertEquals(Double.parseDouble(s), parse(s, '.'), 0.0, s);
            assertEquals(Double.parseDouble(s), parse(s.replace('.', ','), ','), 0.0, s);
        }
    }

    @ParameterizedTest
    @ValueSource(strings = {"NaN", "Infinity", "-Infinity", "0x1p3", "1d", "1f", "", " ", "+", "-.", "e5", "1e+", "1 2", "1..2"})
    void notNumbers(String s) {
        assertTrue(Double.isNaN(parse(s, '.')), s);
    }

    @ParameterizedTest
    @ValueSource(strings = {"1", "-0", ".5", "5.", "+1e3", "1E-3", "  12.5 ", "123456789012345678901234567890"})
    void numbers(String s) {
        assertEquals(Double.parseDouble(s), parse(s, '.'), 0.0, s);
    }
}
