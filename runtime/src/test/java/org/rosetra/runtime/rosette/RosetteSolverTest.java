package org.rosetra.runtime.rosette;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.QRDecomposition;
import org.apache.commons.math3.linear.RealVector;
import org.junit.jupiter.api.Test;
import org.rosetra.runtime.strain.StrainState;

class RosetteSolverTest {

    private static final double UE = 1e-6;
    private static final double TOL = 1e-12 * 1000 * UE;

    /** LANGUAGE.md step 4, forward: what arm i at θi in the part's axes reads. */
    static double[] readings(StrainState s, RosetteLayout layout, double rotation, double kt, double nu0) {
        double[] r = new double[layout.armCount()];
        for (int i = 0; i < r.length; i++) {
            double theta = rotation + layout.angle(i);
            r[i] = (s.normalAt(theta) + kt * s.normalAt(theta + Math.PI / 2)) / (1 - nu0 * kt);
        }
        return r;
    }

    private static void assertState(StrainState expected, StrainState actual, double tol) {
        assertEquals(expected.epsX(), actual.epsX(), tol, "eps_x");
        assertEquals(expected.epsY(), actual.epsY(), tol, "eps_y");
        assertEquals(expected.gammaXY(), actual.gammaXY(), tol, "gamma_xy");
    }

    @Test
    void rectangularWithoutTransverseSensitivity() {
        // Common practice: eps_x = a, eps_y = c, gamma_xy = 2 b - a - c for arms at 0, 45, 90 deg.
        RosetteSolver solver = new RosetteSolver(RosetteLayout.rectangular(), 0, 0, 0.285);
        StrainState s = solver.solve(412 * UE, -38 * UE, -121 * UE).state();
        assertState(new StrainState(412 * UE, -121 * UE, (-76 - 412 + 121) * UE), s, TOL);
    }

    @Test
    void rectangularTransverseCorrectionMatchesThePublishedClosedForm() {
        // Dally & Riley, Experimental Stress Analysis, strain-gauge rosettes, transverse
        // sensitivity correction of a rectangular rosette (from memory):
        //   eps_a = (1 - nu0 Kt)/(1 - Kt^2) (a' - Kt c')
        //   eps_c = (1 - nu0 Kt)/(1 - Kt^2) (c' - Kt a')
        //   eps_b = (1 - nu0 Kt)/(1 - Kt^2) ((1 + Kt) b' - Kt (a' + c'))
        // and then gamma_xy = 2 eps_b - eps_a - eps_c (common practice).
        double kt = 0.035;
        double nu0 = 0.285;
        double a = 812 * UE;
        double b = -260 * UE;
        double c = 147 * UE;
        double k = (1 - nu0 * kt) / (1 - kt * kt);
        double ea = k * (a - kt * c);
        double ec = k * (c - kt * a);
        double eb = k * ((1 + kt) * b - kt * (a + c));
        RosetteSolver solver = new RosetteSolver(RosetteLayout.rectangular(), 0, kt, nu0);
        assertState(new StrainState(ea, ec, 2 * eb - ea - ec), solver.solve(a, b, c).state(), TOL);
    }

    @Test
    void deltaTransverseCorrectionMatchesThePublishedClosedForm() {
        // Dally & Riley, Experimental Stress Analysis, strain-gauge rosettes, transverse
        // sensitivity correction of a delta rosette (from memory):
        //   eps_i = (1 - nu0 Kt)/(1 - Kt^2) ((1 + Kt/3) i' - (2 Kt/3)(j' + k'))
        // and then eps_x = eps_a, eps_y = (2 (eps_b + eps_c) - eps_a)/3,
        // gamma_xy = 2 (eps_b - eps_c)/sqrt(3) (common practice for 0, 60, 120 deg).
        double kt = -0.02;
        double nu0 = 0.30;
        double a = -310 * UE;
        double b = 505 * UE;
        double c = 90 * UE;
        double k = (1 - nu0 * kt) / (1 - kt * kt);
        double ea = k * ((1 + kt / 3) * a - 2 * kt / 3 * (b + c));
        double eb = k * ((1 + kt / 3) * b - 2 * kt / 3 * (c + a));
        double ec = k * ((1 + kt / 3) * c - 2 * kt / 3 * (a + b));
        RosetteSolver solver = new RosetteSolver(RosetteLayout.delta(), 0, kt, nu0);
        StrainState expected = new StrainState(ea, (2 * (eb + ec) - ea) / 3, 2 * (eb - ec) / Math.sqrt(3));
        assertState(expected, solver.solve(a, b, c).state(), TOL);
    }

    @Test
    void teeOnThePrincipalAxesRotatesIntoThePartsAxes() {
        // Principal strains 600 and -180 ue, eps_1 at 30 deg from x. Arm a lies along eps_1.
        double beta = Math.toRadians(30);
        double kt = 0.01;
        double nu0 = 0.285;
        // Common practice: a tee's transverse correction eps_a = (1 - nu0 Kt)/(1 - Kt^2) (a' - Kt b'),
        // the rectangular formula without the middle arm (from memory).
        double a = 600 * UE;
        double b = -180 * UE;
        double k = (1 - nu0 * kt) / (1 - kt * kt);
        double e1 = k * (a - kt * b);
        double e2 = k * (b - kt * a);
        RosetteSolver solver = new RosetteSolver(RosetteLayout.tee(), beta, kt, nu0);
        StrainState s = solver.solve(a, b).state();
        // Mohr's circle (common practice): strains along and across arm a are e1 and e2, no shear.
        assertEquals(e1, s.normalAt(beta), TOL);
        assertEquals(e2, s.normalAt(beta + Math.PI / 2), TOL);
        assertEquals(0, s.shearAt(beta), TOL);
        assertFalse(solver.isRedundant());
    }

    @Test
    void recoversAKnownStateWithAnyLayoutAndAngle() {
        StrainState s = new StrainState(420 * UE, -135 * UE, 260 * UE);
        RosetteLayout[] layouts = {RosetteLayout.rectangular(), RosetteLayout.delta(),
            RosetteLayout.armsDegrees(0, 30, 90), RosetteLayout.armsDegrees(0, 45, 90, 135),
            RosetteLayout.armsDegrees(10, 50, 95, 130, 170)};
        for (RosetteLayout layout : layouts) {
            for (double deg = -90; deg <= 180; deg += 22.5) {
                double rot = Math.toRadians(deg);
                RosetteSolver solver = new RosetteSolver(layout, rot, 0.012, 0.285);
                RosetteSolution sol = solver.solve(readings(s, layout, rot, 0.012, 0.285));
                // The forward model of LANGUAGE.md step 4, inverted (exact readings give the state back).
                assertState(s, sol.state(), 1e-9 * UE);
                assertEquals(0, sol.rms(), 1e-9 * UE);
            }
        }
    }

    @Test
    void invariantsDoNotDependOnTheRosettesAngle() {
        // Mohr's circle (common practice): eps_x + eps_y and the radius are invariant under rotation.
        double[] arms = {300 * UE, 520 * UE, -140 * UE};
        StrainState first = new RosetteSolver(RosetteLayout.rectangular(), 0, 0.02, 0.285).solve(arms).state();
        double radius = Math.hypot((first.epsX() - first.epsY()) / 2, first.gammaXY() / 2);
        for (double deg = -170; deg <= 180; deg += 17) {
            StrainState s = new RosetteSolver(RosetteLayout.rectangular(), Math.toRadians(deg), 0.02, 0.285)
                    .solve(arms).state();
            assertEquals(first.epsX() + first.epsY(), s.epsX() + s.epsY(), TOL);
            assertEquals(radius, Math.hypot((s.epsX() - s.epsY()) / 2, s.gammaXY() / 2), TOL);
        }
    }

    @Test
    void aRotatedRosetteAndARotatedStateGiveTheSamePrincipalValues() {
        // Common practice: principal values are properties of the state, not of the axes.
        StrainState s = new StrainState(-210 * UE, 640 * UE, -330 * UE);
        for (double deg = 0; deg < 360; deg += 15) {
            double beta = Math.toRadians(deg);
            RosetteSolver turned = new RosetteSolver(RosetteLayout.delta(), beta, 0.015, 0.3);
            RosetteSolver straight = new RosetteSolver(RosetteLayout.delta(), 0, 0.015, 0.3);
            StrainState a = turned.solve(readings(s, RosetteLayout.delta(), beta, 0.015, 0.3)).state();
            StrainState b = straight.solve(readings(s.rotated(beta), RosetteLayout.delta(), 0, 0.015, 0.3)).state();
            assertEquals(a.principal().eps1(), b.principal().eps1(), TOL);
            assertEquals(a.principal().eps2(), b.principal().eps2(), TOL);
        }
    }

    @Test
    void leastSquaresAgreesWithCommonsMathQr() {
        RosetteLayout layout = RosetteLayout.armsDegrees(0, 40, 85, 130, 160);
        double kt = 0.02;
        double nu0 = 0.285;
        double rot = Math.toRadians(12);
        double[] arms = {410 * UE, -25 * UE, 130 * UE, 260 * UE, 390 * UE};
        double[][] design = new double[5][];
        for (int i = 0; i < 5; i++) {
            double t = rot + layout.angle(i);
            double c = Math.cos(t);
            double s = Math.sin(t);
            design[i] = new double[] {(c * c + kt * s * s) / (1 - nu0 * kt), (s * s + kt * c * c) / (1 - nu0 * kt),
                (1 - kt) * s * c / (1 - nu0 * kt)};
        }
        // Reference library: Commons Math QRDecomposition solves least squares for a tall matrix.
        RealVector x = new QRDecomposition(new Array2DRowRealMatrix(design)).getSolver()
                .solve(new ArrayRealVector(arms));
        RosetteSolution sol = new RosetteSolver(layout, rot, kt, nu0).solve(arms);
        assertState(new StrainState(x.getEntry(0), x.getEntry(1), x.getEntry(2)), sol.state(), TOL);
        RealVector r = new ArrayRealVector(arms).subtract(new Array2DRowRealMatrix(design).operate(x));
        assertArrayEquals(r.toArray(), sol.residuals(), TOL);
        assertEquals(r.getNorm() / Math.sqrt(5), sol.rms(), TOL);
    }

    @Test
    void columnsAgreeWithTheScalarPath() {
        RosetteLayout[] layouts = {RosetteLayout.rectangular(), RosetteLayout.tee(),
            RosetteLayout.armsDegrees(0, 45, 90, 135), RosetteLayout.armsDegrees(0, 36, 72, 108, 144)};
        int n = 500;
        for (RosetteLayout layout : layouts) {
            RosetteSolver solver = new RosetteSolver(layout, 0.4, 0.02, 0.285);
            double[][] columns = new double[layout.armCount()][n];
            for (int k = 0; k < columns.length; k++) {
                for (int i = 0; i < n; i++) {
                    columns[k][i] = Math.sin(0.01 * i * (k + 1) + k) * 800 * UE;
                }
            }
            double[] ex = new double[n];
            double[] ey = new double[n];
            double[] g = new double[n];
            double[] rms = new double[n];
            solver.solve(columns, n, ex, ey, g, rms);
            for (int i = 0; i < n; i++) {
                double[] one = new double[columns.length];
                for (int k = 0; k < one.length; k++) {
                    one[k] = columns[k][i];
                }
                RosetteSolution sol = solver.solve(one);
                assertEquals(sol.state().epsX(), ex[i], 1e-20);
                assertEquals(sol.state().epsY(), ey[i], 1e-20);
                assertEquals(sol.state().gammaXY(), g[i], 1e-20);
                assertEquals(sol.rms(), rms[i], 1e-18);
            }
        }
    }

    @Test
    void fourArmsRecoverTheStateAndFlagACorruptedArm() {
        StrainState s = new StrainState(350 * UE, -120 * UE, 410 * UE);
        RosetteLayout four = RosetteLayout.armsDegrees(0, 45, 90, 135);
        RosetteSolver solver = new RosetteSolver(four, 0.3, 0.01, 0.285);
        double[] clean = readings(s, four, 0.3, 0.01, 0.285);
        RedundancyCheck check = new RedundancyCheck(solver, 5 * UE);
        RosetteSolution good = solver.solve(clean);
        assertState(s, good.state(), 1e-9 * UE);
        assertTrue(check.agrees(good));
        double[] bad = clean.clone();
        bad[2] += 60 * UE;
        int[] suspects = check.suspectArms(solver.solve(bad));
        // With one redundant reading the error of arm c shows in every arm (hand calculation:
        // arms 0/45/90/135 obey a + c = b + d, so each residual is a quarter of the error, 15 ue).
        assertTrue(java.util.Arrays.stream(suspects).anyMatch(i -> i == 2));
        assertEquals(15 * UE, Math.abs(solver.solve(bad).residual(2)), 1e-3 * UE);
        // Five arms single it out.
        RosetteLayout five = RosetteLayout.armsDegrees(0, 36, 72, 108, 144);
        RosetteSolver fiveSolver = new RosetteSolver(five, 0.3, 0.01, 0.285);
        double[] fiveBad = readings(s, five, 0.3, 0.01, 0.285);
        fiveBad[3] -= 60 * UE;
        assertArrayEquals(new int[] {3}, new RedundancyCheck(fiveSolver, 20 * UE).suspectArms(fiveSolver.solve(fiveBad)));
    }

    @Test
    void badInputIsRefusedWithAnActionableMessage() {
        RosetteException near = assertThrows(RosetteException.class,
                () -> new RosetteSolver(RosetteLayout.rectangular(), 0, 0.999, 1.0005));
        assertTrue(near.getMessage().contains("1 - nu0 * Kt"), near.getMessage());
        assertThrows(RosetteException.class, () -> new RosetteSolver(RosetteLayout.rectangular(), 0, 1.0, 0.285));
        assertThrows(RosetteException.class, () -> new RosetteSolver(RosetteLayout.rectangular(), 0, 0.99, 0.285));
        assertThrows(RosetteException.class, () -> new RosetteSolver(RosetteLayout.rectangular(), Double.NaN, 0, 0.285));
        RosetteSolver solver = new RosetteSolver(RosetteLayout.rectangular(), 0, 0, 0.285);
        RosetteException nan = assertThrows(RosetteException.class, () -> solver.solve(1e-4, Double.NaN, 0));
        assertTrue(nan.getMessage().contains("arm b"), nan.getMessage());
        assertThrows(RosetteException.class, () -> solver.solve(1e-4, Double.POSITIVE_INFINITY, 0));
        assertThrows(RosetteException.class, () -> solver.solve(1e-4, 0));
        double[][] columns = {{0, 1e-4}, {0, 1e-4}, {0, Double.NaN}};
        RosetteException column = assertThrows(RosetteException.class,
                () -> solver.solve(columns, 2, new double[2], new double[2], new double[2]));
        assertTrue(column.getMessage().contains("sample 1"), column.getMessage());
        assertThrows(RosetteException.class, () -> new RedundancyCheck(solver, 5 * UE));
    }
}
