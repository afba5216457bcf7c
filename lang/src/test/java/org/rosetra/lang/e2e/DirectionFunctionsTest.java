package org.rosetra.lang.e2e;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.rosetra.lang.e2e.ScriptRun.script;

import java.nio.file.Path;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * strain_at, shear_at, stress_at and shear_stress_at (LANGUAGE.md, "Functions of a rosette
 * and a direction"), on a rosette (one case picked with [CASE]) and on a given state.
 * Transformation of plane strain and stress (textbook):
 *   e(t)   = eps_x cos^2 t + eps_y sin^2 t + gamma sin t cos t
 *   g(t)   = -(eps_x - eps_y) sin 2t + gamma cos 2t          (engineering shear, t to t + 90)
 *   s(t)   = sigma_x cos^2 t + sigma_y sin^2 t + 2 tau sin t cos t
 *   tau(t) = -(sigma_x - sigma_y) / 2 sin 2t + tau cos 2t
 */
class DirectionFunctionsTest {
    private static final double STRAIN = 1e-12;
    private static final double STRESS = 1e-3;

    @TempDir
    Path dir;

    @ParameterizedTest(name = "direction {0} deg")
    @ValueSource(doubles = {0, 30, 45, 90, 112.5, -60})
    void directionFunctionsOnARosetteAndOnAState(double degrees) {
        // rosette at 0 deg reading e_a = 500, e_b = 300, e_c = -100 ue: eps_x 500, eps_y -100, gamma 200 ue
        ScriptRun run = ScriptRun.run(dir, script("""
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
                }
                case c1 {
                  r = 500, 300, -100 ue
                }
                stress hand {
                  sigma_x  = 80 MPa
                  sigma_y  = 20 MPa
                  tau_xy   = 40 MPa
                  material = steel
                }
                let t = %s deg
                let r_e   = strain_at(r, t)[c1]
                let r_g   = shear_at(r, t)[c1]
                let r_s   = stress_at(r, t)[c1]
                let r_tau = shear_stress_at(r, t)[c1]
                let h_e   = strain_at(hand, t)
                let h_s   = stress_at(hand, t)
                let h_tau = shear_stress_at(hand, t)
                """, degrees)).ok();
        double t = Math.toRadians(degrees);
        double c = Math.cos(t);
        double s = Math.sin(t);
        double ex = 500e-6;
        double ey = -100e-6;
        double g = 200e-6;
        assertEquals(ex * c * c + ey * s * s + g * s * c, run.number("r_e"), STRAIN);
        assertEquals(-(ex - ey) * Math.sin(2 * t) + g * Math.cos(2 * t), run.number("r_g"), STRAIN);
        // Hooke's law, plane stress (textbook), E = 200 GPa, nu = 0.3
        double sx = 200e9 / (1 - 0.09) * (ex + 0.3 * ey);
        double sy = 200e9 / (1 - 0.09) * (ey + 0.3 * ex);
        double tau = 200e9 / 2.6 * g;
        assertEquals(sx * c * c + sy * s * s + 2 * tau * s * c, run.number("r_s"), STRESS);
        assertEquals(-(sx - sy) / 2 * Math.sin(2 * t) + tau * Math.cos(2 * t), run.number("r_tau"), STRESS);

        // the given stress state: 80, 20, 40 MPa; its strains from Hooke's law (textbook)
        double hx = 80e6;
        double hy = 20e6;
        double ht = 40e6;
        assertEquals(hx * c * c + hy * s * s + 2 * ht * s * c, run.number("h_s"), STRESS);
        assertEquals(-(hx - hy) / 2 * Math.sin(2 * t) + ht * Math.cos(2 * t), run.number("h_tau"), STRESS);
        double hex = (hx - 0.3 * hy) / 200e9;
        double hey = (hy - 0.3 * hx) / 200e9;
        double hg = ht / (200e9 / 2.6);
        assertEquals(hex * c * c + hey * s * s + hg * s * c, run.number("h_e"), STRAIN);
    }
}
