package org.rosetra.runtime.rosette;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class RosetteLayoutTest {

    @Test
    void standardLayoutsHaveTheirArmAngles() {
        // LANGUAGE.md: rectangular 0, 45, 90; delta 0, 60, 120; tee 0, 90 deg.
        assertEquals(Math.PI / 4, RosetteLayout.rectangular().angle(1), 0);
        assertEquals(2 * Math.PI / 3, RosetteLayout.delta().angle(2), 1e-15);
        assertEquals(2, RosetteLayout.tee().armCount());
    }

    @Test
    void anglesAreTakenFromArmA() {
        RosetteLayout l = RosetteLayout.armsDegrees(10, 55, 100);
        assertEquals(0, l.angle(0), 0);
        assertEquals(Math.toRadians(45), l.angle(1), 1e-15);
    }

    @Test
    void conditionNumbersOfTheStandardLayouts() {
        // Reference library: Commons Math SVD of the rows (cos^2, sin^2, sin cos); delta's rows are
        // orthogonal after scaling, cond = 2 (hand calculation).
        assertEquals(2.0, RosetteLayout.condition(RosetteLayout.delta().angles()), 1e-12);
    }

    @Test
    void badLayoutsAreRefusedWithTheAnglesNamed() {
        RosetteException few = assertThrows(RosetteException.class, () -> RosetteLayout.armsDegrees(0, 90));
        assertTrue(few.getMessage().contains("three or more"), few.getMessage());
        RosetteException same = assertThrows(RosetteException.class, () -> RosetteLayout.armsDegrees(0, 45, 45));
        assertTrue(same.getMessage().contains("arms b and c") && same.getMessage().contains("45"), same.getMessage());
        RosetteException opposite = assertThrows(RosetteException.class,
                () -> RosetteLayout.armsDegrees(0, 45, 180));
        assertTrue(opposite.getMessage().contains("arms a and c"), opposite.getMessage());
        assertThrows(RosetteException.class, () -> RosetteLayout.armsDegrees(30, 75, -150));
        RosetteException close = assertThrows(RosetteException.class, () -> RosetteLayout.armsDegrees(0, 2, 4));
        assertTrue(close.getMessage().contains("condition number"), close.getMessage());
        assertThrows(RosetteException.class, () -> RosetteLayout.arms(0, Double.NaN, 1));
    }
}
