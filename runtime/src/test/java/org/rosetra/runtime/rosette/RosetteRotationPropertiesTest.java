package org.rosetra.runtime.rosette;

import static org.junit.jupiter.api.Assertions.assertEquals;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.rosetra.runtime.strain.StrainState;

/** Invariants of the solve under rotation, over random states and rosette angles. */
class RosetteRotationPropertiesTest {

    private static final double UE = 1e-6;

    @Property(tries = 300)
    void invariantsAndPrincipalValuesDoNotDependOnTheRosettesAngle(
            @ForAll @DoubleRange(min = -3000, max = 3000) double exUe,
            @ForAll @DoubleRange(min = -3000, max = 3000) double eyUe,
            @ForAll @DoubleRange(min = -3000, max = 3000) double gUe,
            @ForAll @DoubleRange(min = -180, max = 180) double angleDeg,
            @ForAll @DoubleRange(min = -0.05, max = 0.05) double kt) {
        StrainState s = new StrainState(exUe * UE, eyUe * UE, gUe * UE);
        double beta = Math.toRadians(angleDeg);
        RosetteLayout layout = RosetteLayout.rectangular();
        // A rosette at beta on s reads what a rosette at 0 reads on s seen in axes turned by beta.
        RosetteSolver turned = new RosetteSolver(layout, beta, kt, 0.285);
        RosetteSolver straight = new RosetteSolver(layout, 0, kt, 0.285);
        StrainState a = turned.solve(RosetteSolverTest.readings(s, layout, beta, kt, 0.285)).state();
        StrainState b = straight.solve(RosetteSolverTest.readings(s.rotated(beta), layout, 0, kt, 0.285)).state();
        double tol = 1e-9 * 3000 * UE;
        // Mohr's circle (common practice): the centre eps_x + eps_y and the radius are invariants,
        // so are the principal values.
        assertEquals(s.epsX() + s.epsY(), a.epsX() + a.epsY(), tol);
        assertEquals(s.epsX() + s.epsY(), b.epsX() + b.epsY(), tol);
        assertEquals(s.maxShear(), a.maxShear(), tol);
        assertEquals(a.principal().eps1(), b.principal().eps1(), tol);
        assertEquals(a.principal().eps2(), b.principal().eps2(), tol);
    }
}
