package org.rosetra.runtime.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

/** The unit table against NIST SP 811 (2008), Appendix B, and exact definitions. */
class UnitsTest {

    private static Unit unit(String symbol) {
        return Units.find(symbol).orElseThrow();
    }

    private static void assertRelative(double expected, double actual, double tolerance) {
        assertEquals(expected, actual, Math.abs(expected) * tolerance);
    }

    @ParameterizedTest(name = "1 {0} = {2} SI")
    @CsvSource({
        // NIST SP 811 (2008) B.8: inch = 2.54 E-02 m (exact)
        "in,   length, 0.0254",
        // NIST SP 811 (2008) B.8: foot = 3.048 E-01 m (exact)
        "ft,   length, 0.3048",
        // NIST SP 811 (2008) B.8: pound-force = 4.448 222 E+00 N; exact value 0.45359237 kg * 9.80665 m/s^2
        "lbf,  force,  4.4482216152605",
        // NIST SP 811 (2008) B.8: kip (1 kip = 1000 lbf) = 4.448 222 E+03 N; exact from lbf
        "kip,  force,  4448.2216152605",
        // NIST SP 811 (2008) B.8: psi = 6.894 757 E+03 Pa; exact lbf / in^2 = 6894.75729316836...
        "psi,  stress, 6894.75729316836",
        // NIST SP 811 (2008) B.8: ksi = 6.894 757 E+06 Pa; exact from lbf and in
        "ksi,  stress, 6894757.29316836",
        // common practice: Msi = 1e6 psi (not in NIST SP 811); exact from lbf and in
        "Msi,  stress, 6894757293.16836",
        // NIST SP 811 (2008) B.8: bar = 1.0 E+05 Pa (exact)
        "bar,  stress, 100000",
        // SI prefixes, NIST SP 811 (2008) Table 5
        "Pa,   stress, 1",
        "kPa,  stress, 1e3",
        "MPa,  stress, 1e6",
        "GPa,  stress, 1e9",
        "m,    length, 1",
        "cm,   length, 1e-2",
        "mm,   length, 1e-3",
        "um,   length, 1e-6",
        "N,    force,  1",
        "kN,   force,  1e3",
        "MN,   force,  1e6",
        "s,    time,   1",
        "ms,   time,   1e-3",
        "ohm,  resistance, 1",
        "kohm, resistance, 1e3",
        "rad,  angle,  1",
        "K,    temperature, 1",
        // NIST SP 811 (2008) B.8: minute = 6.0 E+01 s, hour = 3.6 E+03 s (exact)
        "min,  time,   60",
        "h,    time,   3600",
        // NIST SP 811 (2008) B.8: degree (of angle) = 1.745 329 E-02 rad; exact value pi/180
        "deg,  angle,  0.017453292519943295",
        // common practice: percent = 0.01, microstrain = 1e-6 (LANGUAGE.md table)
        "%,    none,   0.01",
        "ue,   none,   1e-6",
    })
    void factorToSi(String symbol, String dimension, double expected) {
        Unit unit = unit(symbol);
        assertEquals(dimension, unit.dimension().name());
        assertRelative(expected, unit.toSi(1.0), 1e-15);
        assertFalse(unit.isAffine());
    }

    @Test
    void nistRoundedFactorsAgreeToTheirSevenDigits() {
        // NIST SP 811 (2008) B.8, printed to 7 significant digits
        assertRelative(6.894757E+03, unit("psi").scale(), 1e-7);
        assertRelative(6.894757E+06, unit("ksi").scale(), 1e-7);
        assertRelative(4.448222E+00, unit("lbf").scale(), 1e-7);
        assertRelative(1.745329E-02, unit("deg").scale(), 1e-6);
    }

    @Test
    void microstrainAcceptsBothMuCharacters() {
        // common practice: µε is written with either the Greek mu U+03BC or the micro sign U+00B5
        assertEquals(1e-6, unit("\u03BC\u03B5").toSi(1.0), 1e-21);
        assertEquals(1e-6, unit("\u00B5\u03B5").toSi(1.0), 1e-21);
        assertTrue(unit("\u00B5\u03B5").dimension().isNone());
    }

    @Test
    void ohmHasGreekAlias() {
        // common practice: the ohm symbol is the Greek capital omega, U+03A9
        assertEquals(Units.OHM.dimension(), unit("\u03A9").dimension());
        assertEquals(1.0, unit("\u03A9").scale());
    }

    @Test
    void celsiusToKelvin() {
        // NIST SP 811 (2008) 4.2.1.1 and B.9: T/K = t/degC + 273.15
        assertEquals(273.15, Units.DEG_C.toSi(0.0), 1e-12);
        assertEquals(294.15, Units.DEG_C.toSi(21.0), 1e-12);
        assertEquals(233.15, Units.DEG_C.toSi(-40.0), 1e-12);
        assertEquals(21.0, Units.DEG_C.fromSi(294.15), 1e-12);
    }

    @Test
    void fahrenheitToKelvin() {
        // NIST SP 811 (2008) B.9: T/K = (t/degF + 459.67) / 1.8
        for (double f : new double[] {-459.67, -40.0, 32.0, 70.0, 212.0, 1000.0}) {
            assertEquals((f + 459.67) / 1.8, Units.DEG_F.toSi(f), 1e-12, "degF " + f);
        }
        // NIST SP 811 (2008) B.9: 32 degF = 273.15 K, 212 degF = 373.15 K; -40 degF = -40 degC
        assertEquals(273.15, Units.DEG_F.toSi(32.0), 1e-12);
        assertEquals(373.15, Units.DEG_F.toSi(212.0), 1e-12);
        assertEquals(Units.DEG_C.toSi(-40.0), Units.DEG_F.toSi(-40.0), 1e-12);
    }

    @ParameterizedTest
    @CsvSource({"degC, -40", "degC, 21.5", "degF, -40", "degF, 70.3", "K, 300", "psi, 1234.5", "deg, -15"})
    void roundTripThroughSi(String symbol, double value) {
        // round trip: fromSi inverts toSi (NIST SP 811 B.9 formulas for the temperatures)
        Unit unit = unit(symbol);
        assertEquals(value, unit.fromSi(unit.toSi(value)), Math.abs(value) * 1e-14 + 1e-12);
    }

    @Test
    void everyLanguageTableUnitIsPresent() {
        // LANGUAGE.md, "Quantities and units": the units that must work
        List<String> required = List.of("%", "ue", "\u03BC\u03B5", "\u00B5\u03B5",
                "Pa", "kPa", "MPa", "GPa", "psi", "ksi", "Msi", "deg", "rad", "degC", "degF", "K",
                "ohm", "m", "mm", "in", "ft", "N", "kN", "lbf", "kip", "s", "ms", "min", "h");
        for (String symbol : required) {
            assertTrue(Units.find(symbol).isPresent(), symbol);
            assertTrue(Units.symbols().contains(symbol), symbol);
        }
    }

    @Test
    void findIsCaseSensitive() {
        // common practice (SI): prefixes are case-sensitive, "mPa" would be millipascal
        assertTrue(Units.find("mpa").isEmpty());
        assertTrue(Units.find("Mpa").isEmpty());
    }
}
