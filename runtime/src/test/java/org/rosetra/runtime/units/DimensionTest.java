package org.rosetra.runtime.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** Dimensional algebra; the base-unit expressions are the SI definitions of NIST SP 811 (2008) Table 3. */
class DimensionTest {

    @Test
    void derivedDimensionsMatchSiDefinitions() {
        // NIST SP 811 (2008) Table 3: N = kg*m/s^2, Pa = N/m^2 = kg/(m*s^2), ohm = V/A = kg*m^2/(s^3*A^2)
        assertEquals("kg*m/s^2", Dimension.FORCE.siExpression());
        assertEquals("kg/m/s^2", Dimension.STRESS.siExpression());
        assertEquals("kg*m^2/s^3/A^2", Dimension.RESISTANCE.siExpression());
        assertEquals("kg*m^2/s^2", Dimension.MOMENT.siExpression());
        assertEquals("1", Dimension.NONE.siExpression());
        assertEquals(Rational.of(-1), Dimension.STRESS.exponent(BaseDimension.LENGTH));
        assertEquals(Rational.of(-2), Dimension.STRESS.exponent(BaseDimension.TIME));
    }

    @Test
    void momentIsForceTimesLengthAndStressIsForceOverArea() {
        // handbook definitions (common practice): M = F*d, sigma = F/A
        assertEquals(Dimension.MOMENT, Dimension.FORCE.times(Dimension.LENGTH));
        assertEquals(Dimension.STRESS, Dimension.FORCE.over(Dimension.AREA));
        assertEquals(Dimension.FORCE, Dimension.STRESS.times(Dimension.AREA));
        assertEquals(Dimension.STRESS_PER_TEMPERATURE, Dimension.STRESS.over(Dimension.TEMPERATURE));
    }

    @Test
    void squareRootOfAreaIsLength() {
        // dimensional analysis (from memory): sqrt(L^2) = L, and (L^(1/2))^2 = L
        assertEquals(Dimension.LENGTH, Dimension.AREA.sqrt());
        Dimension rootLength = Dimension.LENGTH.sqrt();
        assertEquals(Rational.HALF, rootLength.exponent(BaseDimension.LENGTH));
        assertEquals(Dimension.LENGTH, rootLength.times(rootLength));
        assertEquals(Dimension.LENGTH, rootLength.pow(2));
        assertEquals("m^(1/2)", rootLength.name());
        assertEquals("length^(1/2)", rootLength.toString());
        assertEquals(Dimension.STRESS, Dimension.STRESS.pow(Rational.of(2, 3)).pow(Rational.of(3, 2)));
    }

    @Test
    void strainAndAngleAreDistinct() {
        // LANGUAGE.md: angle is its own dimension; strain is dimensionless
        assertTrue(Dimension.NONE.isNone());
        assertFalse(Dimension.ANGLE.isNone());
        assertNotEquals(Dimension.NONE, Dimension.ANGLE);
        assertTrue(Dimension.LENGTH.over(Dimension.LENGTH).isNone());
        assertEquals(Dimension.NONE, Dimension.STRESS.over(Dimension.STRESS));
    }

    @Test
    void stableNames() {
        // these words are the "dimension" field of results.json (LANGUAGE.md): keep them
        assertEquals("none", Dimension.NONE.name());
        assertEquals("stress", Dimension.STRESS.name());
        assertEquals("angle", Dimension.ANGLE.name());
        assertEquals("temperature", Dimension.TEMPERATURE.name());
        assertEquals("resistance", Dimension.RESISTANCE.name());
        assertEquals("length", Dimension.LENGTH.name());
        assertEquals("force", Dimension.FORCE.name());
        assertEquals("time", Dimension.TIME.name());
        assertEquals("area", Dimension.AREA.name());
        assertEquals("mass", Dimension.MASS.name());
        assertEquals("current", Dimension.CURRENT.name());
        assertEquals("moment", Dimension.MOMENT.name());
        assertEquals("per_temperature", Dimension.PER_TEMPERATURE.name());
        assertEquals("stress_per_temperature", Dimension.STRESS_PER_TEMPERATURE.name());
        assertEquals("kg*m^4/s^2", Dimension.MOMENT.times(Dimension.AREA).name());
        assertEquals("length^4", Dimension.AREA.pow(2).toString());
        assertEquals("1/time^2", Dimension.NONE.over(Dimension.TIME.pow(2)).toString());
        assertEquals(Dimension.STRESS, Dimension.named("stress").orElseThrow());
        assertTrue(Dimension.named("kg*m^4/s^2").isEmpty());
    }

    @Test
    void equalDimensionsHashAlike() {
        Dimension a = Dimension.MASS.times(Dimension.LENGTH).over(Dimension.TIME.pow(2));
        assertEquals(Dimension.FORCE, a);
        assertEquals(Dimension.FORCE.hashCode(), a.hashCode());
    }
}
