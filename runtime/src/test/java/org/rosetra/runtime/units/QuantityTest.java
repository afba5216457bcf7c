package org.rosetra.runtime.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class QuantityTest {

    @Test
    void storesSiAndDisplaysInAnyUnitOfTheDimension() {
        // NIST SP 811 (2008) B.8: 1 ksi = 6.894757E+06 Pa, so 30 ksi = 206.8427 MPa
        Quantity stress = Quantity.of(30, Units.KSI);
        assertEquals(Dimension.STRESS, stress.dimension());
        assertEquals(30 * 6894757.29316836, stress.si(), 1e-3);
        assertEquals(206.8427187950508, stress.in(Units.MPA), 1e-9);
        assertEquals(30.0, stress.in(Units.KSI), 1e-12);
    }

    @Test
    void temperatureInAndOut() {
        // NIST SP 811 (2008) B.9: 70 degF = (70 + 459.67)/1.8 K = 21.1111 degC
        Quantity room = Quantity.of(70, Units.DEG_F);
        assertEquals((70 + 459.67) / 1.8, room.si(), 1e-12);
        assertEquals((70 - 32) / 1.8, room.in(Units.DEG_C), 1e-12);
    }

    @Test
    void stressFromForceOverArea() {
        // handbook closed form sigma = F / A: 10 kN on 100 mm^2 is 100 MPa
        Quantity force = Quantity.of(10, Units.KILONEWTON);
        Quantity area = Quantity.of(100, UnitParser.parse("mm^2"));
        Quantity stress = force.over(area);
        assertEquals(Dimension.STRESS, stress.dimension());
        assertEquals(100.0, stress.in(Units.MPA), 1e-9);
        assertEquals(Dimension.LENGTH, area.sqrt().dimension());
        assertEquals(10.0, area.sqrt().in(Units.MILLIMETRE), 1e-12);
        assertEquals(Dimension.FORCE, stress.times(area).dimension());
    }

    @Test
    void likeDimensionsAddAndCompare() {
        // unit factors from NIST SP 811 (2008) Table 5 (prefixes): 1 MPa + 500 kPa = 1.5 MPa
        Quantity sum = Quantity.of(1, Units.MPA).plus(Quantity.of(500, Units.KPA));
        assertEquals(1.5e6, sum.si(), 1e-6);
        assertEquals(0.5e6, Quantity.of(1, Units.MPA).minus(Quantity.of(500, Units.KPA)).si(), 1e-6);
        assertTrue(Quantity.of(1, Units.KSI).isGreaterThan(Quantity.of(6, Units.MPA)));
        assertTrue(Quantity.of(6, Units.MPA).isLessThan(Quantity.of(1, Units.KSI)));
        assertEquals(0, Quantity.of(0.0, Units.PA).compareTo(Quantity.of(-0.0, Units.PA)));
        assertEquals(Quantity.of(2, Units.MPA), Quantity.of(1, Units.MPA).times(2.0));
    }

    @Test
    void unlikeDimensionsAreRefusedWithBothNamed() {
        Quantity stress = Quantity.of(1, Units.MPA);
        Quantity length = Quantity.of(1, Units.MILLIMETRE);
        DimensionMismatchException error =
                assertThrows(DimensionMismatchException.class, () -> stress.plus(length));
        assertTrue(error.getMessage().contains("stress"), error.getMessage());
        assertTrue(error.getMessage().contains("length"), error.getMessage());
        assertEquals(Dimension.STRESS, error.left());
        assertEquals(Dimension.LENGTH, error.right());
        assertThrows(DimensionMismatchException.class, () -> stress.minus(length));
        assertThrows(DimensionMismatchException.class, () -> stress.compareTo(length));
        assertThrows(DimensionMismatchException.class, () -> stress.in(Units.DEG));
        // LANGUAGE.md: angle is its own dimension, so 1 rad is not the number 1
        assertThrows(DimensionMismatchException.class, () -> Quantity.of(1, Units.RAD).plus(Quantity.number(1)));
    }

    @Test
    void neverProducesNaN() {
        assertThrows(QuantityException.class, () -> Quantity.of(Double.NaN, Units.MPA));
        assertThrows(QuantityException.class, () -> Quantity.of(Double.POSITIVE_INFINITY, Units.MPA));
        assertThrows(QuantityException.class, () -> Quantity.of(1, Units.MPA).over(Quantity.of(0, Units.PA)));
        assertThrows(QuantityException.class, () -> Quantity.of(-4, UnitParser.parse("mm^2")).sqrt());
        assertThrows(QuantityException.class, () -> Quantity.of(0, Units.MILLIMETRE).pow(Rational.of(-1)));
        assertThrows(QuantityException.class, () -> Quantity.of(1e300, Units.GPA).times(Quantity.of(1e300, Units.GPA)));
    }

    @Test
    void microstrainIsAPlainFraction() {
        // common practice: 412 ue is a strain of 412e-6
        Quantity strain = Quantity.of(412, Units.MICROSTRAIN);
        assertTrue(strain.dimension().isNone());
        assertEquals(412e-6, strain.si(), 1e-18);
        assertEquals(41.2e-3, strain.in(Units.PERCENT), 1e-15);
    }

    @Test
    void temperatureDifferencesIgnoreTheOffset() {
        // NIST SP 811 (2008) 4.2.1.1 and B.9: an interval of 1 degC = 1 K, of 1 degF = 5/9 K
        assertEquals(10.0, Quantity.ofDifference(10, Units.DEG_C).si(), 1e-12);
        assertEquals(10.0 / 1.8, Quantity.ofDifference(10, Units.DEG_F).si(), 1e-12);
        assertEquals(18.0 * 1.8, Quantity.ofDifference(18, Units.KELVIN).differenceIn(Units.DEG_F), 1e-12);
        assertEquals(283.15, Quantity.of(10, Units.DEG_C).si(), 1e-12);
    }
}
