package org.rosetra.runtime.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class DisplayUnitsTest {

    // The presets are project choices (the brief for this package), not computations;
    // only the scales checked below are numbers with an outside source.

    @Test
    void siPreset() {
        DisplayUnits si = DisplayUnits.si();
        assertEquals(Units.MPA, si.unitFor(Dimension.STRESS));
        assertEquals(Units.DEG, si.unitFor(Dimension.ANGLE));
        assertEquals(Units.DEG_C, si.unitFor(Dimension.TEMPERATURE));
        assertEquals(Units.MILLIMETRE, si.unitFor(Dimension.LENGTH));
        assertEquals(Units.KILONEWTON, si.unitFor(Dimension.FORCE));
        assertEquals(Units.OHM, si.unitFor(Dimension.RESISTANCE));
        assertEquals(Units.SECOND, si.unitFor(Dimension.TIME));
        assertEquals("\u03BC\u03B5", si.strainUnit().symbol());
        // common practice: microstrain = 1e-6
        assertEquals(1e-6, si.strainUnit().scale(), 1e-21);
        assertEquals("kN*m", si.unitFor(Dimension.MOMENT).symbol());
    }

    @Test
    void usPreset() {
        DisplayUnits us = DisplayUnits.us();
        assertEquals(Units.KSI, us.unitFor(Dimension.STRESS));
        assertEquals(Units.DEG, us.unitFor(Dimension.ANGLE));
        assertEquals(Units.DEG_F, us.unitFor(Dimension.TEMPERATURE));
        assertEquals(Units.INCH, us.unitFor(Dimension.LENGTH));
        assertEquals(Units.KIP, us.unitFor(Dimension.FORCE));
        assertEquals("\u03BC\u03B5", us.strainUnit().symbol());
        // NIST SP 811 (2008) B.9: interval of 1 degF = 5/9 K, so 1 ue/degF = 1.8e-6 per K
        assertEquals(1.8e-6, us.unitFor(Dimension.PER_TEMPERATURE).scale(), 1e-20);
    }

    @Test
    void fallsBackToTheCoherentSiUnit() {
        Unit density = DisplayUnits.si().unitFor(Dimension.DENSITY);
        assertEquals("kg/m^3", density.symbol());
        assertEquals(1.0, density.scale());
        assertEquals(Unit.ONE, DisplayUnits.si().unitFor(Dimension.NONE));
    }

    @Test
    void overrideOneDimension() {
        DisplayUnits chosen = DisplayUnits.si().with(Dimension.STRESS, Units.GPA);
        assertEquals(Units.GPA, chosen.unitFor(Dimension.STRESS));
        assertEquals(Units.MPA, DisplayUnits.si().unitFor(Dimension.STRESS));
        assertEquals(Units.MILLIMETRE, chosen.unitFor(Dimension.LENGTH));
        assertThrows(DimensionMismatchException.class, () -> DisplayUnits.si().with(Dimension.STRESS, Units.MILLIMETRE));
        assertEquals(Units.PERCENT, DisplayUnits.si().withStrainUnit(Units.PERCENT).strainUnit());
        assertThrows(DimensionMismatchException.class, () -> DisplayUnits.si().withStrainUnit(Units.MPA));
    }
}
