package org.rosetra.lang.e2e;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.rosetra.lang.e2e.ScriptRun.script;

import java.nio.file.Path;
import java.util.stream.Stream;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.QRDecomposition;
import org.apache.commons.math3.linear.RealVector;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Rosette layouts and the direction of arm a (LANGUAGE.md, "rosette fields": layout, angle):
 * the arm strains of a known state in the part's axes are made with the strain
 * transformation e(t) = eps_x cos^2 t + eps_y sin^2 t + gamma_xy sin t cos t (textbook),
 * read in, and the solve must give the state back in the part's axes.
 */
class RosetteLayoutsTest {
    private static final double STRAIN = 1e-12;

    @TempDir
    Path dir;

    private static double strainAt(double ex, double ey, double g, double degrees) {
        double t = Math.toRadians(degrees);
        return ex * Math.cos(t) * Math.cos(t) + ey * Math.sin(t) * Math.sin(t) + g * Math.sin(t) * Math.cos(t);
    }

    private ScriptRun run(String layout, double angle, double[] readingsUe) {
        StringBuilder readings = new StringBuilder();
        for (double r : readingsUe) {
            readings.append(readings.length() == 0 ? "" : ", ").append(script("%.12f", r));
        }
        return ScriptRun.run(dir, script("""
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
                """, layout, angle, readings)).ok();
    }

    static Stream<Arguments> layouts() {
        // layout, arm angles from arm a, direction of arm a in the part's axes (deg)
        return Stream.of(
                Arguments.of("rectangular", new double[] {0, 45, 90}, 0.0),
                Arguments.of("rectangular", new double[] {0, 45, 90}, 30.0),
                Arguments.of("rectangular", new double[] {0, 45, 90}, -75.0),
                Arguments.of("delta", new double[] {0, 60, 120}, 0.0),
                Arguments.of("delta", new double[] {0, 60, 120}, 40.0),
                Arguments.of("arms(0 deg, 30 deg, 100 deg)", new double[] {0, 30, 100}, 10.0),
                Arguments.of("arms(0 deg, 45 deg, 90 deg, 135 deg)", new double[] {0, 45, 90, 135}, 0.0),
                Arguments.of("arms(0 deg, 60 deg, 120 deg, 90 deg)", new double[] {0, 60, 120, 90}, 90.0));
    }

    @ParameterizedTest(name = "{0} at {2} deg")
    @MethodSource("layouts")
    void solveGivesTheStateBackInThePartsAxes(String layout, double[] arms, double angle) {
        double ex = 400e-6;
        double ey = -150e-6;
        double g = 300e-6;
        double[] readings = new double[arms.length];
        for (int i = 0; i < arms.length; i++) {
            readings[i] = strainAt(ex, ey, g, angle + arms[i]) * 1e6;
        }
        ScriptRun run = run(layout, angle, readings);
        assertEquals(ex, run.member("r", "c1", "eps_x"), STRAIN);
        assertEquals(ey, run.member("r", "c1", "eps_y"), STRAIN);
        assertEquals(g, run.member("r", "c1", "gamma_xy"), STRAIN);
    }

    @Test
    void deltaRosetteClosedForm() {
        ScriptRun run = run("delta", 0, new double[] {320, -80, 150});
        // Delta rosette at 0/60/120 deg (textbook): eps_x = e_a,
        // eps_y = (2 (e_b + e_c) - e_a) / 3, gamma_xy = 2 (e_b - e_c) / sqrt(3)
        double a = 320e-6;
        double b = -80e-6;
        double c = 150e-6;
        assertEquals(a, run.member("r", "c1", "eps_x"), STRAIN);
        assertEquals((2 * (b + c) - a) / 3, run.member("r", "c1", "eps_y"), STRAIN);
        assertEquals(2 * (b - c) / Math.sqrt(3), run.member("r", "c1", "gamma_xy"), STRAIN);
    }

    @Test
    void teeArmsLieOnThePrincipalAxes() {
        ScriptRun run = run("tee", 20, new double[] {545, -160});
        // LANGUAGE.md, step 4: a tee has no shear in its arm axes; rotated by 20 deg into the
        // part's axes with the strain transformation (textbook):
        //   eps_x = e_a cos^2 t + e_b sin^2 t, eps_y = e_a sin^2 t + e_b cos^2 t,
        //   gamma_xy = 2 (e_a - e_b) sin t cos t
        double a = 545e-6;
        double b = -160e-6;
        double t = Math.toRadians(20);
        double c = Math.cos(t);
        double s = Math.sin(t);
        assertEquals(a * c * c + b * s * s, run.member("r", "c1", "eps_x"), STRAIN);
        assertEquals(a * s * s + b * c * c, run.member("r", "c1", "eps_y"), STRAIN);
        assertEquals(2 * (a - b) * s * c, run.member("r", "c1", "gamma_xy"), STRAIN);
        // principal strains are the arm readings, eps_1 along arm a
        assertEquals(a, run.member("r", "c1", "eps_1"), STRAIN);
        assertEquals(b, run.member("r", "c1", "eps_2"), STRAIN);
        assertEquals(20.0, run.member("r", "c1", "theta_p"), 1e-9);
    }

    @Test
    void fourArmsAreFittedByLeastSquares() {
        // inconsistent readings: one arm disagrees with the other three
        double[] arms = {0, 45, 90, 135};
        double[] readings = {-38, -12, 30, 9};
        ScriptRun run = run("arms(0 deg, 45 deg, 90 deg, 135 deg)", 0, readings);
        // Least squares of the arm model e(t_i) = [cos^2, sin^2, sin cos] . (eps_x, eps_y, gamma)
        // solved with Commons Math (QR decomposition, least squares for an overdetermined system)
        double[][] model = new double[4][];
        double[] e = new double[4];
        for (int i = 0; i < 4; i++) {
            double t = Math.toRadians(arms[i]);
            model[i] = new double[] {Math.cos(t) * Math.cos(t), Math.sin(t) * Math.sin(t), Math.sin(t) * Math.cos(t)};
            e[i] = readings[i] * 1e-6;
        }
        RealVector fit = new QRDecomposition(new Array2DRowRealMatrix(model)).getSolver().solve(new ArrayRealVector(e));
        assertEquals(fit.getEntry(0), run.member("r", "c1", "eps_x"), STRAIN);
        assertEquals(fit.getEntry(1), run.member("r", "c1", "eps_y"), STRAIN);
        assertEquals(fit.getEntry(2), run.member("r", "c1", "gamma_xy"), STRAIN);
    }
}
