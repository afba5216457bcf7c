package org.rosetra.lang.e2e;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.rosetra.lang.e2e.ScriptRun.script;

import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * mohr_coulomb and rankine (LANGUAGE.md, "Failure indices"): with sA and sB the largest and
 * smallest of sigma_1, sigma_2, sigma_z,
 *   mohr_coulomb = max(sA, 0) / ultimate + max(-sB, 0) / ultimate_c
 *   rankine      = max(sA / ultimate, -sB / ultimate_c).
 * The stresses are worked by hand: rectangular rosette at 0 deg (textbook relations), Hooke's
 * law (textbook), principal stresses by Mohr's circle. Concrete-like material: E = 34 GPa,
 * nu = 0.2, ultimate 3.5 MPa, ultimate_c 40 MPa.
 */
class FailureIndicesTest {
    @TempDir
    Path dir;

    private ScriptRun run(String material, String state, double exUe, double eyUe, double gUe) {
        double eb = (exUe + eyUe + gUe) / 2;
        return ScriptRun.run(dir, script("""
                %s
                gauge embed {
                  factor = 2.10
                }
                rosette r {
                  layout   = rectangular
                  gauge    = embed
                  material = wall
                  state    = %s
                }
                case c1 {
                  r = %s, %s, %s ue
                }
                let mc = mohr_coulomb(r)[c1]
                let rk = rankine(r)[c1]
                """, material, state, exUe, eb, eyUe)).ok();
    }

    /** sigma_1, sigma_2, sigma_z by hand for E, nu. */
    private static double[] principal(double e, double nu, boolean planeStrain, double ex, double ey, double g) {
        double sx;
        double sy;
        if (planeStrain) {
            double k = e / ((1 + nu) * (1 - 2 * nu));
            sx = k * ((1 - nu) * ex + nu * ey);
            sy = k * ((1 - nu) * ey + nu * ex);
        } else {
            sx = e / (1 - nu * nu) * (ex + nu * ey);
            sy = e / (1 - nu * nu) * (ey + nu * ex);
        }
        double tau = e / (2 * (1 + nu)) * g;
        double c = (sx + sy) / 2;
        double rad = Math.hypot((sx - sy) / 2, tau);
        return new double[] {c + rad, c - rad, planeStrain ? nu * (sx + sy) : 0};
    }

    @ParameterizedTest(name = "{0}: eps_x {1}, eps_y {2}, gamma {3} ue")
    @CsvSource({
        "plane_strain, -38, 30, 12",
        "plane_strain, -120, -90, 40",
        "plane_strain, 60, 45, 10",
        "plane_stress, 80, 20, 30",
        "plane_stress, -600, -250, 100",
        "plane_stress, 50, -400, 0",
    })
    void indicesAsLanguageMdDefinesThem(String state, double exUe, double eyUe, double gUe) {
        ScriptRun run = run("""
                material wall {
                  E          = 34 GPa
                  nu         = 0.2
                  ultimate   = 3.5 MPa
                  ultimate_c = 40 MPa
                }
                """, state, exUe, eyUe, gUe);
        double[] s = principal(34e9, 0.2, state.equals("plane_strain"), exUe * 1e-6, eyUe * 1e-6, gUe * 1e-6);
        double sA = Math.max(s[0], Math.max(s[1], s[2]));
        double sB = Math.min(s[0], Math.min(s[1], s[2]));
        // LANGUAGE.md, "Failure indices"
        assertEquals(Math.max(sA, 0) / 3.5e6 + Math.max(-sB, 0) / 40e6, run.number("mc"), 1e-12);
        assertEquals(Math.max(sA / 3.5e6, -sB / 40e6), run.number("rk"), 1e-12);
    }

    @Test
    void ultimateCDefaultsToUltimate() {
        ScriptRun run = run("""
                material wall {
                  E        = 34 GPa
                  nu       = 0.2
                  ultimate = 3.5 MPa
                }
                """, "plane_stress", 50, -400, 0);
        double[] s = principal(34e9, 0.2, false, 50e-6, -400e-6, 0);
        double sA = Math.max(s[0], Math.max(s[1], s[2]));
        double sB = Math.min(s[0], Math.min(s[1], s[2]));
        // LANGUAGE.md: ultimate_c defaults to ultimate
        assertEquals(Math.max(sA, 0) / 3.5e6 + Math.max(-sB, 0) / 3.5e6, run.number("mc"), 1e-12);
        assertEquals(Math.max(sA / 3.5e6, -sB / 3.5e6), run.number("rk"), 1e-12);
    }

    @Test
    void anIndexInACheck() {
        ScriptRun run = ScriptRun.run(dir, """
                material wall {
                  E          = 34 GPa
                  nu         = 0.2
                  ultimate   = 3.5 MPa
                  ultimate_c = 40 MPa
                }
                gauge embed {
                  factor = 2.00
                }
                rosette r {
                  layout   = rectangular
                  gauge    = embed
                  material = wall
                }
                case c1 {
                  r = 40, 40, 40 ue
                }
                check "cracking": mohr_coulomb(r) < 1.0
                """).expectStatus(0);
        // equal biaxial 40 ue in plane stress (textbook): sigma_1 = sigma_2 = E e / (1 - nu) = 1.7 MPa, sigma_z = 0
        double s = 34e9 * 40e-6 / (1 - 0.2);
        assertEquals(s / 3.5e6, (Double) run.check("cracking").get("utilization"), 1e-12);
    }
}
