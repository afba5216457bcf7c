package org.rosetra.lang.e2e;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Strain and stress states given directly (LANGUAGE.md, "Strain and stress states given
 * directly"): single values, in JSON under "states", stresses from Hooke's law for the
 * state's condition, and only the strain (or stress) members without a material.
 */
class GivenStatesTest {
    private static final double STRAIN = 1e-12;
    private static final double STRESS = 1e-3;

    @TempDir
    Path dir;

    private static final String MATERIAL = """
            material s355 {
              E     = 205 GPa
              nu    = 0.29
              yield = 355 MPa
            }
            """;

    @Test
    void strainStateInPlaneStrain() {
        ScriptRun run = ScriptRun.run(dir, MATERIAL + """
                strain lug_fe {
                  eps_x    = 420 ue
                  eps_y    = -135 ue
                  gamma_xy = 260 ue
                  material = s355
                  state    = plane_strain
                }
                """).ok();
        // Hooke's law, plane strain (textbook), E = 205 GPa, nu = 0.29
        double e = 205e9;
        double nu = 0.29;
        double k = e / ((1 + nu) * (1 - 2 * nu));
        double sx = k * ((1 - nu) * 420e-6 + nu * -135e-6);
        double sy = k * ((1 - nu) * -135e-6 + nu * 420e-6);
        double tau = e / (2 * (1 + nu)) * 260e-6;
        assertEquals(420e-6, run.stateMember("lug_fe", "eps_x"), STRAIN);
        assertEquals(sx, run.stateMember("lug_fe", "sigma_x"), STRESS);
        assertEquals(sy, run.stateMember("lug_fe", "sigma_y"), STRESS);
        assertEquals(tau, run.stateMember("lug_fe", "tau_xy"), STRESS);
        assertEquals(nu * (sx + sy), run.stateMember("lug_fe", "sigma_z"), STRESS);   // LANGUAGE.md
        assertEquals(0.0, run.stateMember("lug_fe", "eps_z"), STRAIN);
        // a state is not a rosette: no per-case results under "rosettes"
        assertFalse(run.rosettes().containsKey("lug_fe"));
    }

    @Test
    void stressStateGivesItsStrainsByHookesLaw() {
        ScriptRun run = ScriptRun.run(dir, MATERIAL + """
                stress pin_hand {
                  sigma_x  = 120 MPa
                  sigma_y  = -40 MPa
                  tau_xy   = 35 MPa
                  material = s355
                }
                """).ok();
        // Hooke's law, plane stress (textbook): eps_x = (sx - nu sy) / E, gamma = tau / G,
        // eps_z = -nu (sx + sy) / E
        double e = 205e9;
        double nu = 0.29;
        double g = e / (2 * (1 + nu));
        assertEquals((120e6 - nu * -40e6) / e, run.stateMember("pin_hand", "eps_x"), STRAIN);
        assertEquals((-40e6 - nu * 120e6) / e, run.stateMember("pin_hand", "eps_y"), STRAIN);
        assertEquals(35e6 / g, run.stateMember("pin_hand", "gamma_xy"), STRAIN);
        assertEquals(-nu * (120e6 - 40e6) / e, run.stateMember("pin_hand", "eps_z"), STRAIN);
        // principal stresses by Mohr's circle (textbook): centre (sx + sy) / 2, radius sqrt(((sx - sy) / 2)^2 + tau^2)
        double c = (120e6 - 40e6) / 2;
        double rad = Math.hypot((120e6 + 40e6) / 2, 35e6);
        assertEquals(c + rad, run.stateMember("pin_hand", "sigma_1"), STRESS);
        assertEquals(c - rad, run.stateMember("pin_hand", "sigma_2"), STRESS);
        // von Mises in plane stress (textbook): sqrt(sx^2 - sx sy + sy^2 + 3 tau^2)
        double vm = Math.sqrt(120e6 * 120e6 - 120e6 * -40e6 + 40e6 * 40e6 + 3 * 35e6 * 35e6);
        assertEquals(vm, run.stateMember("pin_hand", "von_mises"), STRESS);
    }

    @Test
    void withoutMaterialOnlyTheGivenKindOfMembersExist() {
        ScriptRun run = ScriptRun.run(dir, """
                strain fe_point {
                  eps_x    = 300 ue
                  eps_y    = 100 ue
                  gamma_xy = 200 ue
                }
                stress hand_point {
                  sigma_x  = 80 MPa
                  sigma_y  = 20 MPa
                  tau_xy   = 40 MPa
                }
                """).ok();
        Map<String, Object> strain = run.givenState("fe_point");
        Map<String, Object> stress = run.givenState("hand_point");
        // LANGUAGE.md: without a material only the strain (or only the stress) members exist
        assertFalse(strain.containsKey("sigma_x"), () -> "no stresses in " + strain.keySet());
        assertFalse(strain.containsKey("von_mises"), () -> "no von Mises in " + strain.keySet());
        assertFalse(stress.containsKey("eps_x"), () -> "no strains in " + stress.keySet());
        assertTrue(stress.containsKey("von_mises"), () -> "von Mises from the stresses in " + stress.keySet());
        // principal strain by Mohr's circle (textbook): (ex + ey) / 2 + sqrt(((ex - ey) / 2)^2 + (g / 2)^2)
        assertEquals(200e-6 + Math.hypot(100e-6, 100e-6), run.stateMember("fe_point", "eps_1"), STRAIN);
        assertEquals(22.5, run.stateMember("fe_point", "theta_p"), 1e-9);   // 0.5 atan(200 / 200)
        // principal stress by Mohr's circle (textbook): 50 + sqrt(30^2 + 40^2) = 100 MPa
        assertEquals(100e6, run.stateMember("hand_point", "sigma_1"), STRESS);
        assertEquals(0.0, run.stateMember("hand_point", "sigma_2"), STRESS);
        assertEquals(50e6, run.stateMember("hand_point", "tau_max"), STRESS);
    }

    @Test
    void stressStateInPlaneStrainGivesItsStrainsByHookesLaw() {
        ScriptRun run = ScriptRun.run(dir, MATERIAL + """
                stress deep {
                  sigma_x  = 60 MPa
                  sigma_y  = -20 MPa
                  tau_xy   = 15 MPa
                  material = s355
                  state    = plane_strain
                }
                """).ok();
        // Hooke's law, plane strain inverted (textbook):
        //   eps_x = (1 + nu) / E ((1 - nu) sx - nu sy), gamma = tau / G, eps_z = 0, sigma_z = nu (sx + sy)
        double e = 205e9;
        double nu = 0.29;
        assertEquals((1 + nu) / e * ((1 - nu) * 60e6 - nu * -20e6), run.stateMember("deep", "eps_x"), STRAIN);
        assertEquals((1 + nu) / e * ((1 - nu) * -20e6 - nu * 60e6), run.stateMember("deep", "eps_y"), STRAIN);
        assertEquals(15e6 / (e / (2 * (1 + nu))), run.stateMember("deep", "gamma_xy"), STRAIN);
        assertEquals(0.0, run.stateMember("deep", "eps_z"), STRAIN);
        assertEquals(nu * (60e6 - 20e6), run.stateMember("deep", "sigma_z"), STRESS);
        assertEquals(60e6, run.stateMember("deep", "sigma_x"), STRESS);
    }
}
