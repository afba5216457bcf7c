package org.rosetra.runtime.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class UnitParserTest {

    @Test
    void newtonPerSquareMillimetreIsMegapascal() {
        // SI definition (NIST SP 811 (2008) Table 3): 1 N/mm^2 = 1e6 N/m^2 = 1 MPa
        Unit unit = UnitParser.parse("N/mm^2");
        assertEquals(Dimension.STRESS, unit.dimension());
        assertEquals(1e6, unit.scale(), 1e6 * 1e-15);
        assertEquals("N/mm^2", unit.symbol());
        assertEquals(Units.MPA.scale(), UnitParser.parse("N/mm/mm").scale(), 1e-9);
        assertEquals(Dimension.STRESS, UnitParser.parse("N/mm/mm").dimension());
    }

    @Test
    void kilonewtonMetreIsMoment() {
        // SI definition: moment = force * length, 1 kN*m = 1e3 N*m
        Unit unit = UnitParser.parse("kN*m");
        assertEquals(Dimension.MOMENT, unit.dimension());
        assertEquals("moment", unit.dimension().name());
        assertEquals(1e3, unit.scale(), 1e-12);
    }

    @Test
    void microstrainPerDegreeCelsiusIsADifferenceWithoutOffset() {
        // common practice: in a compound, degC is a temperature difference, 1 degC step = 1 K
        Unit unit = UnitParser.parse("ue/degC");
        assertEquals(Dimension.PER_TEMPERATURE, unit.dimension());
        assertEquals(1e-6, unit.scale(), 1e-21);
        assertEquals(0.0, unit.offset());
        assertFalse(unit.isAffine());
        assertEquals(11.7e-6, unit.toSi(11.7), 1e-18);
    }

    @Test
    void fahrenheitStepInACompoundIsFiveNinthsOfAKelvin() {
        // NIST SP 811 (2008) B.9: a temperature interval of 1 degF = 5/9 K
        Unit unit = UnitParser.parse("ue/degF");
        assertEquals(1e-6 * 1.8, unit.scale(), 1e-20);
        assertEquals(0.0, unit.offset());
        Unit squared = UnitParser.parse("degC^2");
        assertEquals(0.0, squared.offset());
        assertEquals(Dimension.TEMPERATURE.pow(2), squared.dimension());
    }

    @Test
    void bareTemperatureKeepsItsOffset() {
        // NIST SP 811 (2008) 4.2.1.1: T/K = t/degC + 273.15
        Unit unit = UnitParser.parse("degC");
        assertTrue(unit.isAffine());
        assertEquals(293.15, unit.toSi(20.0), 1e-12);
        assertEquals(Units.DEG_F, UnitParser.parse(" degF "));
    }

    @Test
    void microstrainWithEitherMu() {
        // common practice: µε with Greek mu U+03BC or micro sign U+00B5
        assertEquals(1e-6, UnitParser.parse("\u03BC\u03B5").scale(), 1e-21);
        assertEquals(1e-6, UnitParser.parse("\u00B5\u03B5").scale(), 1e-21);
        assertEquals(Dimension.PER_TEMPERATURE, UnitParser.parse("\u00B5\u03B5/degC").dimension());
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        // SI definitions, NIST SP 811 (2008) Tables 3 and 5; in, lbf, kip from its Appendix B.8 (exact);
        // kip*in = 4448.2216152605 * 0.0254 N*m; mm^(1/2) = sqrt(1e-3) m^(1/2) (from memory: 0.0316227766...)
        "s^-1         | frequency    | 1",
        "1/s          | frequency    | 1",
        "m/s^2        | acceleration | 1",
        "kN/m         | force_per_length | 1000",
        "MPa/degC     | stress_per_temperature | 1e6",
        "mm^2         | area         | 1e-6",
        "in^2         | area         | 0.00064516",
        "kip*in       | moment       | 112.98482902761670",
        "lbf/in^2     | stress       | 6894.75729316836",
        "N*m/rad      | kg*m^2/s^2/rad | 1",
        "(N*m)/(mm*mm) | force_per_length | 1e6",
        "m^(1/2)      | m^(1/2)      | 1",
        "mm^(1/2)     | m^(1/2)      | 0.031622776601683794",
        "(mm^2)^(1/2) | length       | 1e-3",
        "m^(-1/2)     | 1/m^(1/2)    | 1",
        "N * mm       | moment       | 1e-3",
        "m^0          | none         | 1",
        "%            | none         | 0.01",
        "1^2/s        | frequency    | 1",
    })
    void compoundUnits(String text, String dimension, double scale) {
        Unit unit = UnitParser.parse(text);
        assertEquals(dimension, unit.dimension().name());
        assertEquals(scale, unit.scale(), Math.abs(scale) * 1e-14);
    }

    @Test
    void canonicalSiExpressionsReadBack() {
        // round trip: every named dimension's SI expression is a unit of scale 1 (SI coherence)
        for (Dimension dimension : Dimension.namedDimensions().values()) {
            Unit unit = UnitParser.parse(dimension.siExpression());
            assertEquals(dimension, unit.dimension(), dimension.siExpression());
            assertEquals(1.0, unit.scale(), 1e-15, dimension.siExpression());
        }
    }

    @Test
    void caseSlipSuggestsTheKnownSymbol() {
        UnitException error = assertThrows(UnitException.class, () -> UnitParser.parse("Mpa"));
        assertEquals(0, error.offset());
        assertEquals(3, error.length());
        assertEquals("MPa", error.suggestion().orElseThrow());
        assertTrue(error.getMessage().contains("did you mean 'MPa'?"), error.getMessage());
    }

    @Test
    void unknownSymbolInsideACompoundPointsAtIt() {
        UnitException error = assertThrows(UnitException.class, () -> UnitParser.parse("kN/mn^2"));
        assertEquals(3, error.offset());
        assertEquals(2, error.length());
        // case-insensitive match first: "mn" is "MN"
        assertEquals("MN", error.suggestion().orElseThrow());
    }

    @Test
    void typoSuggestsByEditDistance() {
        UnitException error = assertThrows(UnitException.class, () -> UnitParser.parse("N/mmm^2"));
        assertEquals(2, error.offset());
        assertEquals(3, error.length());
        assertEquals("mm", error.suggestion().orElseThrow());
        assertEquals("degC", assertThrows(UnitException.class,
                () -> UnitParser.parse("ue/degc")).suggestion().orElseThrow());
        assertEquals("kip", assertThrows(UnitException.class,
                () -> UnitParser.parse("kips")).suggestion().orElseThrow());
    }

    @Test
    void farFromAnythingGivesNoSuggestion() {
        UnitException error = assertThrows(UnitException.class, () -> UnitParser.parse("furlong"));
        assertTrue(error.suggestion().isEmpty(), error.getMessage());
        assertTrue(error.getMessage().contains("unknown unit 'furlong'"), error.getMessage());
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "N/     | 1 | 1",
        "N*     | 1 | 1",
        "mm^    | 3 | 0",
        "mm^x   | 3 | 1",
        "mm2    | 2 | 1",
        "m^1/2  | 4 | 1",
        "N mm   | 2 | 1",
        "(N*m   | 0 | 1",
        "N*m)   | 3 | 1",
        "N/#    | 2 | 1",
        "2*m    | 0 | 1",
        "m^(1/0) | 5 | 1",
        "m^99999999999 | 2 | 11",
        "GPa^100       | 0 | 7",
        "N*mm^-400     | 2 | 7",
        "(m^2147483647)^2 | 0 | 16",
    })
    void malformedTextReportsWhere(String text, int offset, int length) {
        UnitException error = assertThrows(UnitException.class, () -> UnitParser.parse(text));
        assertEquals(offset, error.offset(), error.getMessage());
        assertEquals(length, error.length(), error.getMessage());
        assertEquals(text, error.text());
        assertFalse(error.getMessage().isBlank());
    }

    @Test
    void emptyTextIsAnError() {
        assertThrows(UnitException.class, () -> UnitParser.parse(""));
        assertThrows(UnitException.class, () -> UnitParser.parse("   "));
        assertThrows(UnitException.class, () -> UnitParser.parse(null));
    }

    @Test
    void fractionalPowerWithoutParenthesesIsExplained() {
        UnitException error = assertThrows(UnitException.class, () -> UnitParser.parse("m^1/2"));
        assertTrue(error.getMessage().contains("m^(1/2)"), error.getMessage());
    }

    @Test
    void pastedSuperscriptsAndDegreeSignsAreExplained() {
        UnitException squared = assertThrows(UnitException.class, () -> UnitParser.parse("N/mm\u00B2"));
        assertEquals(4, squared.offset());
        assertTrue(squared.getMessage().contains("mm^2"), squared.getMessage());
        UnitException degree = assertThrows(UnitException.class, () -> UnitParser.parse("\u00B0C"));
        assertEquals(0, degree.offset());
        assertTrue(degree.getMessage().contains("degC"), degree.getMessage());
    }

    @Test
    void aNumberAfterAPlainDivisionIsNotTakenForAPower() {
        UnitException error = assertThrows(UnitException.class, () -> UnitParser.parse("N/2"));
        assertFalse(error.getMessage().contains("fractional"), error.getMessage());
    }
}
