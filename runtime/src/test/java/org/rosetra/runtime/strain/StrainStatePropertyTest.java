package org.rosetra.runtime.strain;

import static org.junit.jupiter.api.Assertions.assertEquals;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;

class StrainStatePropertyTest {

    @Property(tries = 2000)
    void rotationKeepsTheInvariantsAndShiftsTheDirection(
            @ForAll @DoubleRange(min = -3000, max = 3000) double epsXue,
            @ForAll @DoubleRange(min = -3000, max = 3000) double epsYue,
            @ForAll @DoubleRange(min = -3000, max = 3000) double gammaXYue,
            @ForAll @DoubleRange(min = -7, max = 7) double theta) {
        StrainState s = new StrainState(1e-6 * epsXue, 1e-6 * epsYue, 1e-6 * gammaXYue);
        StrainState r = s.rotated(theta);
        // Common practice (strain transformation): eps_x + eps_y and the Mohr radius are invariant.
        assertEquals(s.epsX() + s.epsY(), r.epsX() + r.epsY(), 1e-17);
        assertEquals(s.mohr().radius(), r.mohr().radius(), 1e-17);
        PrincipalStrains p = s.principal();
        PrincipalStrains q = r.principal();
        assertEquals(p.eps1(), q.eps1(), 1e-17);
        assertEquals(p.eps2(), q.eps2(), 1e-17);
        if (p.maxShear() > 1e-9) {
            // Axes turned by theta see the principal direction at theta1 - theta (mod 180 deg).
            double tol = 1e-15 / p.maxShear();
            assertEquals(0, StrainAngles.differenceModPi(q.theta1(), p.theta1() - theta), tol);
        }
    }
}
