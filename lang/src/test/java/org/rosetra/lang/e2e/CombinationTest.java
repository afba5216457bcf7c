package org.rosetra.lang.e2e;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Load combinations (LANGUAGE.md, "Readings": combine): the solved strain states are
 * superposed with the factors; stresses and criteria follow from the combined state; only
 * rosettes present in every term appear; a rosette missing from a case has no result there.
 * Rectangular rosettes at 0 deg (textbook: eps_x = e_a, eps_y = e_c, gamma = 2 e_b - e_a - e_c),
 * E = 200 GPa, nu = 0.3, plane stress.
 */
class CombinationTest {
    private static final double STRAIN = 1e-12;
    private static final double STRESS = 1e-3;

    @TempDir
    Path dir;

    private ScriptRun run;

    @BeforeEach
    void runSurvey() {
        run = ScriptRun.run(dir, """
                material steel {
                  E  = 200 GPa
                  nu = 0.3
                }
                gauge foil {
                  factor = 2.00
                }
                rosette a {
                  layout   = rectangular
                  gauge    = foil
                  material = steel
                }
                rosette b {
                  layout   = rectangular
                  gauge    = foil
                  material = steel
                }
                case lift {
                  a = 400, 100, -120 ue
                  b = 200, 50, 10 ue
                }
                combine half_lift = 0.5 * lift
                # b was not read during the side pull
                case side {
                  a = -50, 180, 90 ue
                }
                combine design = 1.35 * lift + 1.5 * side
                """).ok();
    }

    @Test
    void casesThenCombinationsInTheOrderWritten() {
        // LANGUAGE.md, "Running and results": cases lists cases then combinations in the order written
        assertEquals(List.of("lift", "side", "half_lift", "design"), run.cases());
    }

    @Test
    void strainStatesAreSuperposedWithTheFactors() {
        // eps = 1.35 eps(lift) + 1.5 eps(side), from the rectangular relations of each case
        double ex = 1.35 * 400e-6 + 1.5 * -50e-6;
        double ey = 1.35 * -120e-6 + 1.5 * 90e-6;
        double g = 1.35 * (2 * 100e-6 - 400e-6 + 120e-6) + 1.5 * (2 * 180e-6 + 50e-6 - 90e-6);
        assertEquals(ex, run.member("a", "design", "eps_x"), STRAIN);
        assertEquals(ey, run.member("a", "design", "eps_y"), STRAIN);
        assertEquals(g, run.member("a", "design", "gamma_xy"), STRAIN);
        assertEquals(0.5 * 400e-6, run.member("a", "half_lift", "eps_x"), STRAIN);
        assertEquals(0.5 * 200e-6, run.member("b", "half_lift", "eps_x"), STRAIN);
    }

    @Test
    void stressesAndCriteriaComeFromTheCombinedState() {
        double ex = 1.35 * 400e-6 + 1.5 * -50e-6;
        double ey = 1.35 * -120e-6 + 1.5 * 90e-6;
        double g = 1.35 * (2 * 100e-6 - 400e-6 + 120e-6) + 1.5 * (2 * 180e-6 + 50e-6 - 90e-6);
        // Hooke's law, plane stress (textbook)
        double sx = 200e9 / (1 - 0.09) * (ex + 0.3 * ey);
        double sy = 200e9 / (1 - 0.09) * (ey + 0.3 * ex);
        double tau = 200e9 / 2.6 * g;
        // von Mises in plane stress (textbook): sqrt(sx^2 - sx sy + sy^2 + 3 tau^2)
        double vm = Math.sqrt(sx * sx - sx * sy + sy * sy + 3 * tau * tau);
        assertEquals(sx, run.member("a", "design", "sigma_x"), STRESS);
        assertEquals(vm, run.member("a", "design", "von_mises"), STRESS);
        // ... which is not the factored sum of the cases' von Mises stresses
        double summed = 1.35 * run.member("a", "lift", "von_mises") + 1.5 * run.member("a", "side", "von_mises");
        assertNotEquals(summed, run.member("a", "design", "von_mises"), 1e3);
    }

    @Test
    void aRosetteMissingFromACaseHasNoResultThereNorInItsCombinations() {
        // LANGUAGE.md: a rosette missing from a case has no result in it (not zero), and only
        // rosettes present in every term appear in a combination
        assertNull(run.resultsOf("b", "side"), "b has no result in side");
        assertNull(run.resultsOf("b", "design"), "b has no result in design");
        assertEquals(200e-6, run.member("b", "lift", "eps_x"), STRAIN);
    }
}
