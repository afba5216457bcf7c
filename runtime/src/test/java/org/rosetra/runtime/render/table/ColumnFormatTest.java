package org.rosetra.runtime.render.table;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class ColumnFormatTest {

  // The rule documented in ColumnFormat: four significant digits for the column's largest
  // magnitude, the same decimals for the rest (common practice for engineering tables).
  @ParameterizedTest
  @CsvSource({
    "412.34,  412.34,  412.3",
    "412.34,  -38.06,  -38.1",
    "0.36127, 0.36127, 0.3613",
    "169.0,   84.512,  84.5",
    "2051.0,  2051.4,  2051",
    "1.5,     1.25,    1.250",
    "1.5,     -0.00001, 0.000",
    "205000,  205000,  205000",
    "2.05e6,  2.05e6,  2.050e+06",
    "0.0004,  0.00041, 4.100e-04",
  })
  void decimalsFollowTheLargestMagnitude(double largest, double value, String expected) {
    assertEquals(expected, ColumnFormat.forMagnitude(Math.abs(largest)).format(value));
  }

  @Test
  void anAllZeroColumnPrintsPlainZeros() {
    assertEquals("0", ColumnFormat.forMagnitude(0).format(0.0));
    assertEquals("0", ColumnFormat.forMagnitude(0).format(-0.0));
  }

  @Test
  void halfUpOnTheExactBinaryValue() {
    // 0.125 is exact in binary, so half up gives 0.13 at two decimals (common practice).
    assertEquals("0.1250", ColumnFormat.forMagnitude(0.125).format(0.125));
    assertEquals("2.500", ColumnFormat.forMagnitude(2.5).format(2.5));
    assertEquals("1.000", ColumnFormat.forMagnitude(1.0).format(0.9995));
  }
}
