package org.rosetra.lang.e2e;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Plane stress against plane strain for a rosette (LANGUAGE.md, "Results of a rosette":
 * eps_z, sigma_z; "rosette fields": state). Hooke's law for an isotropic material
 * (textbook). Inputs: E = 200 GPa, nu = 0.3; rectangular rosette at 0 deg reading
 * e_a = 500, e_b = 300, e_c = -100 ue, so eps_x = 500, eps_y = -100, gamma_xy = 200 ue.
 */
class PlaneConditionTest {
    private static final double E = 200e9;
    private static final double NU = 0.3;
    private static final double EX = 500e-6;
    private static final double EY = -100e-6;
    private static final double G_XY = 2 * 300e-6 - 500e-6 - -100e-6;
    private static final double STRESS = 1e-3;

    @TempDir
    Path dir;

    private ScriptRun run(String stateLine) {
        return ScriptRun.run(dir, """
                material steel {
                  E  = 200 GPa
                  nu = 0.3
                }
                gauge foil {
                  factor = 2.00
                }
                rosette r {
                  layout   = rectangular
                  gauge    = foil
                  material = steel
                %s
                }
                case c1 {
                  r = 500, 300, -100 ue
                }
                """.formatted(stateLine)).ok();
    }

    @Test
    void planeStressIsTheDefault() {
        ScriptRun run = run("");
        assertEquals("plane_stress", run.stateOf("r"));   // LANGUAGE.md: plane_stress is the default
        assertPlaneStress(run);
    }

    @Test
    void planeStressWhenAskedFor() {
        ScriptRun run = run("  state = plane_stress");
        assertEquals("plane_stress", run.stateOf("r"));
        assertPlaneStress(run);
    }

    private static void assertPlaneStress(ScriptRun run) {
        // Hooke's law, plane stress (textbook): sigma_x = E / (1 - nu^2) (eps_x + nu eps_y), tau = G gamma
        double sx = E / (1 - NU * NU) * (EX + NU * EY);
        double sy = E / (1 - NU * NU) * (EY + NU * EX);
        double tau = E / (2 * (1 + NU)) * G_XY;
        assertEquals(sx, run.member("r", "c1", "sigma_x"), STRESS);
        assertEquals(sy, run.member("r", "c1", "sigma_y"), STRESS);
        assertEquals(tau, run.member("r", "c1", "tau_xy"), STRESS);
        // LANGUAGE.md: eps_z = -nu / (1 - nu) (eps_x + eps_y), sigma_z = 0 in plane stress
        assertEquals(-NU / (1 - NU) * (EX + EY), run.member("r", "c1", "eps_z"), 1e-12);
        assertEquals(0.0, run.member("r", "c1", "sigma_z"), STRESS);
    }

    @Test
    void planeStrain() {
        ScriptRun run = run("  state = plane_strain");
        assertEquals("plane_strain", run.stateOf("r"));
        // Hooke's law, plane strain (textbook):
        // sigma_x = E / ((1 + nu)(1 - 2 nu)) ((1 - nu) eps_x + nu eps_y), tau = G gamma
        double k = E / ((1 + NU) * (1 - 2 * NU));
        double sx = k * ((1 - NU) * EX + NU * EY);
        double sy = k * ((1 - NU) * EY + NU * EX);
        assertEquals(sx, run.member("r", "c1", "sigma_x"), STRESS);
        assertEquals(sy, run.member("r", "c1", "sigma_y"), STRESS);
        assertEquals(E / (2 * (1 + NU)) * G_XY, run.member("r", "c1", "tau_xy"), STRESS);
        // LANGUAGE.md: eps_z = 0 and sigma_z = nu (sigma_x + sigma_y) in plane strain
        assertEquals(0.0, run.member("r", "c1", "eps_z"), 1e-15);
        assertEquals(NU * (sx + sy), run.member("r", "c1", "sigma_z"), STRESS);
    }
}
