package org.rosetra.lang.e2e;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.rosetra.lang.e2e.ScriptRun.script;

import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.EigenDecomposition;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Every member of "Results of a rosette" (LANGUAGE.md) with its definition, for a
 * rectangular rosette at 0 deg (textbook: e_a = eps_x, e_c = eps_y, e_b = (eps_x + eps_y +
 * gamma_xy) / 2), E = 200 GPa, nu = 0.3. Principal values from Commons Math's
 * EigenDecomposition of the strain tensor [[eps_x, gamma/2], [gamma/2, eps_y]].
 */
class ResultMembersTest {
    private static final double E = 200e9;
    private static final double NU = 0.3;
    private static final double STRAIN = 1e-12;
    private static final double STRESS = 1e-3;

    @TempDir
    Path dir;

    private ScriptRun run(double exUe, double eyUe, double gUe, String state) {
        double eb = (exUe + eyUe + gUe) / 2;
        return ScriptRun.run(dir, script("""
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
                  state    = %s
                }
                case c1 {
                  r = %s, %s, %s ue
                }
                """, state, exUe, eb, eyUe)).ok();
    }

    @ParameterizedTest(name = "eps_x {0}, eps_y {1}, gamma_xy {2} ue, {3}")
    @CsvSource({
        "420, -135, 260, plane_stress",
        "-300, -80, -500, plane_stress",
        "150, 600, 90, plane_strain",
        "-200, -350, 40, plane_strain",
    })
    void everyMemberFollowsItsDefinition(double exUe, double eyUe, double gUe, String state) {
        ScriptRun run = run(exUe, eyUe, gUe, state);
        Map<String, Object> numbers = run.resultsOf("r", "c1");
        // LANGUAGE.md: every member of the table appears for every rosette in every case
        List<String> members = List.of("eps_x", "eps_y", "gamma_xy", "eps_1", "eps_2", "theta_p", "gamma_max",
                "eps_z", "sigma_x", "sigma_y", "tau_xy", "sigma_1", "sigma_2", "sigma_z", "tau_max", "tau_abs",
                "von_mises", "tresca");
        for (String m : members) {
            assertTrue(numbers.containsKey(m), () -> "member " + m + " in " + numbers.keySet());
        }
        double ex = exUe * 1e-6;
        double ey = eyUe * 1e-6;
        double g = gUe * 1e-6;
        assertEquals(ex, run.member("r", "c1", "eps_x"), STRAIN);
        assertEquals(ey, run.member("r", "c1", "eps_y"), STRAIN);
        assertEquals(g, run.member("r", "c1", "gamma_xy"), STRAIN);

        // Principal strains: Commons Math EigenDecomposition (eigenvalues in descending order)
        double[] pe = new EigenDecomposition(new Array2DRowRealMatrix(new double[][] {
            {ex, g / 2}, {g / 2, ey}})).getRealEigenvalues();
        double e1 = Math.max(pe[0], pe[1]);
        double e2 = Math.min(pe[0], pe[1]);
        assertEquals(e1, run.member("r", "c1", "eps_1"), STRAIN);
        assertEquals(e2, run.member("r", "c1", "eps_2"), STRAIN);
        assertEquals(e1 - e2, run.member("r", "c1", "gamma_max"), STRAIN);   // LANGUAGE.md: eps_1 - eps_2
        // theta_p: textbook tan 2 theta_p = gamma / (eps_x - eps_y), taken to the eps_1 branch
        double thetaP = 0.5 * Math.toDegrees(Math.atan2(g, ex - ey));
        assertEquals(thetaP, run.member("r", "c1", "theta_p"), 1e-9);

        // Hooke's law (textbook) for the state, then LANGUAGE.md's eps_z and sigma_z
        boolean planeStrain = state.equals("plane_strain");
        double sx;
        double sy;
        double sz;
        double ez;
        if (planeStrain) {
            double k = E / ((1 + NU) * (1 - 2 * NU));
            sx = k * ((1 - NU) * ex + NU * ey);
            sy = k * ((1 - NU) * ey + NU * ex);
            sz = NU * (sx + sy);
            ez = 0;
        } else {
            sx = E / (1 - NU * NU) * (ex + NU * ey);
            sy = E / (1 - NU * NU) * (ey + NU * ex);
            sz = 0;
            ez = -NU / (1 - NU) * (ex + ey);
        }
        double tau = E / (2 * (1 + NU)) * g;
        assertEquals(ez, run.member("r", "c1", "eps_z"), STRAIN);
        assertEquals(sx, run.member("r", "c1", "sigma_x"), STRESS);
        assertEquals(sy, run.member("r", "c1", "sigma_y"), STRESS);
        assertEquals(tau, run.member("r", "c1", "tau_xy"), STRESS);
        assertEquals(sz, run.member("r", "c1", "sigma_z"), STRESS);

        // Principal stresses: Commons Math EigenDecomposition of [[sx, tau], [tau, sy]]
        double[] ps = new EigenDecomposition(new Array2DRowRealMatrix(new double[][] {
            {sx, tau}, {tau, sy}})).getRealEigenvalues();
        double s1 = Math.max(ps[0], ps[1]);
        double s2 = Math.min(ps[0], ps[1]);
        assertEquals(s1, run.member("r", "c1", "sigma_1"), STRESS);
        assertEquals(s2, run.member("r", "c1", "sigma_2"), STRESS);
        assertEquals((s1 - s2) / 2, run.member("r", "c1", "tau_max"), STRESS);
        double[] three = {s1, s2, sz};
        Arrays.sort(three);
        // LANGUAGE.md: tau_abs over sigma_1, sigma_2, sigma_z (textbook: half the largest difference)
        assertEquals((three[2] - three[0]) / 2, run.member("r", "c1", "tau_abs"), STRESS);
        // von Mises from principal stresses (textbook)
        double vm = Math.sqrt(((s1 - s2) * (s1 - s2) + (s2 - sz) * (s2 - sz) + (sz - s1) * (sz - s1)) / 2);
        assertEquals(vm, run.member("r", "c1", "von_mises"), STRESS);
        // Tresca: largest minus smallest of the three (LANGUAGE.md)
        assertEquals(three[2] - three[0], run.member("r", "c1", "tresca"), STRESS);
    }

    @ParameterizedTest(name = "eps_x {0}, eps_y {1}, gamma_xy {2} ue: theta_p {3} deg")
    @CsvSource({
        // eps_x, eps_y, gamma_xy (ue), theta_p (deg) worked by hand from tan 2t = gamma / (eps_x - eps_y)
        "300, 100, 200, 22.5",
        "100, 300, 200, 67.5",
        "100, 300, -200, -67.5",
        "300, 100, -200, -22.5",
        "100, 300, 0, 90",      // LANGUAGE.md: in (-90, 90], so eps_1 along y is +90, not -90
        "200, 200, 100, 45",
        "200, 200, -100, -45",
        "200, 200, 0, 0",       // LANGUAGE.md: 0 when eps_1 = eps_2
        "0, 0, 0, 0",
    })
    void principalDirectionLiesInItsRange(double exUe, double eyUe, double gUe, double expected) {
        ScriptRun run = run(exUe, eyUe, gUe, "plane_stress");
        assertEquals(expected, run.member("r", "c1", "theta_p"), 1e-9);
    }

    @ParameterizedTest(name = "{0} at {1} deg, every arm 250 ue")
    @CsvSource(delimiter = ';', value = {
        "rectangular; 0",
        "rectangular; 30",
        "delta; 0",
        "delta; -40",
        "arms(0 deg, 45 deg, 90 deg, 135 deg); 15",
        "arms(0 deg, 60 deg, 120 deg, 90 deg); 90",
    })
    void equalBiaxialStrainHasNoPrincipalDirection(String layout, double angle) {
        ScriptRun run = ScriptRun.run(dir, script("""
                material steel {
                  E  = 200 GPa
                  nu = 0.3
                }
                gauge foil {
                  factor = 2.00
                }
                rosette r {
                  layout   = %s
                  gauge    = foil
                  material = steel
                  angle    = %s deg
                }
                case c1 {
                  r = %s ue
                }
                """, layout, angle, layout.contains("135") || layout.contains("120 deg, 90") ? "250, 250, 250, 250"
                        : "250, 250, 250")).ok();
        // every arm reads the same: equal biaxial strain, a point of Mohr's circle (textbook)
        assertEquals(250e-6, run.member("r", "c1", "eps_1"), STRAIN);
        assertEquals(250e-6, run.member("r", "c1", "eps_2"), STRAIN);
        assertEquals(0.0, run.member("r", "c1", "gamma_max"), STRAIN);
        // LANGUAGE.md: theta_p is 0 when eps_1 = eps_2, however the arms lie
        assertEquals(0.0, run.member("r", "c1", "theta_p"), 1e-9);
    }
}
