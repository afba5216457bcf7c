package org.rosetra.runtime.strain;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.EigenDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.RealVector;
import org.junit.jupiter.api.Test;

class StrainStateTest {

    private static final double UE = 1e-6;

    @Test
    void principalValuesAndDirectionAgreeWithEigenDecompositionOfTheStrainTensor() {
        Random random = new Random(20261201L);
        for (int k = 0; k < 5000; k++) {
            double scale = Math.pow(10, -6 + 4 * random.nextDouble());
            StrainState s = new StrainState(scale * (2 * random.nextDouble() - 1),
                    scale * (2 * random.nextDouble() - 1), scale * (2 * random.nextDouble() - 1));
            PrincipalStrains p = s.principal();
            // Source: Commons Math 3.6.1 EigenDecomposition of [[eps_x, gamma/2], [gamma/2, eps_y]].
            EigenDecomposition eig = new EigenDecomposition(new Array2DRowRealMatrix(new double[][] {
                    {s.epsX(), s.gammaXY() / 2}, {s.gammaXY() / 2, s.epsY()}}));
            double[] values = eig.getRealEigenvalues();
            int big = values[0] >= values[1] ? 0 : 1;
            assertEquals(values[big], p.eps1(), 1e-12 * scale);
            assertEquals(values[1 - big], p.eps2(), 1e-12 * scale);
            assertTrue(p.theta1() > -Math.PI / 2 && p.theta1() <= Math.PI / 2, "theta1 in (-pi/2, pi/2]");
            if (p.eps1() - p.eps2() > 1e-6 * scale) {
                RealVector v = eig.getEigenvector(big);
                double eigenAngle = Math.atan2(v.getEntry(1), v.getEntry(0));
                assertEquals(0, StrainAngles.differenceModPi(eigenAngle, p.theta1()), 1e-8);
            }
        }
    }

    @Test
    void directionRulesAtTheEdges() {
        // Common practice: with no shear and eps_y > eps_x the larger principal strain lies along y;
        // the range (-90, 90] deg (LANGUAGE.md) puts it at +90 deg whatever the sign of the zero.
        assertEquals(Math.PI / 2, new StrainState(100 * UE, 300 * UE, 0.0).principal().theta1(), 0);
        assertEquals(Math.PI / 2, new StrainState(100 * UE, 300 * UE, -0.0).principal().theta1(), 0);
        // LANGUAGE.md: theta_p is 0 when eps_1 = eps_2 (exactly, and within the tolerance).
        assertEquals(0.0, new StrainState(250 * UE, 250 * UE, 0).principal().theta1(), 0);
        assertEquals(0.0, new StrainState(250 * UE, 250 * UE, 1e-20).principal().theta1(), 0);
        assertEquals(0.0, StrainState.ZERO.principal().theta1(), 0);
        // Common practice: pure positive shear has eps_1 = gamma/2 at +45 deg, negative shear at -45 deg.
        PrincipalStrains shear = new StrainState(0, 0, 400 * UE).principal();
        assertEquals(200 * UE, shear.eps1(), 1e-18);
        assertEquals(-200 * UE, shear.eps2(), 1e-18);
        assertEquals(Math.PI / 4, shear.theta1(), 1e-15);
        assertEquals(-Math.PI / 4, new StrainState(0, 0, -400 * UE).principal().theta1(), 1e-15);
    }

    @Test
    void normalAndShearAtADirectionAgreeWithTheTensorProjection() {
        Random random = new Random(7L);
        for (int k = 0; k < 2000; k++) {
            StrainState s = new StrainState(1e-3 * random.nextGaussian(), 1e-3 * random.nextGaussian(),
                    1e-3 * random.nextGaussian());
            double theta = Math.PI * (2 * random.nextDouble() - 1);
            RealMatrix e = new Array2DRowRealMatrix(new double[][] {
                    {s.epsX(), s.gammaXY() / 2}, {s.gammaXY() / 2, s.epsY()}});
            RealVector n = new ArrayRealVector(new double[] {Math.cos(theta), Math.sin(theta)});
            RealVector t = new ArrayRealVector(new double[] {-Math.sin(theta), Math.cos(theta)});
            // Source: tensor transformation eps_nn = n . E n, gamma_nt = 2 t . E n (common practice),
            // evaluated with Commons Math matrix products.
            assertEquals(n.dotProduct(e.operate(n)), s.normalAt(theta), 1e-15);
            assertEquals(2 * t.dotProduct(e.operate(n)), s.shearAt(theta), 1e-15);
            StrainState r = s.rotated(theta);
            assertEquals(s.normalAt(theta), r.epsX(), 1e-15);
            assertEquals(s.normalAt(theta + Math.PI / 2), r.epsY(), 1e-15);
            assertEquals(s.shearAt(theta), r.gammaXY(), 1e-15);
        }
        StrainState s = new StrainState(420 * UE, -135 * UE, 260 * UE);
        // Definition (LANGUAGE.md): shear_at(0) is gamma_xy and strain_at(0) is eps_x.
        assertEquals(s.gammaXY(), s.shearAt(0), 0);
        assertEquals(s.epsX(), s.normalAt(0), 0);
        // Common practice: pure shear gamma reads gamma/2 on a gauge at 45 deg.
        assertEquals(130 * UE, new StrainState(0, 0, 260 * UE).normalAt(Math.PI / 4), 1e-18);
    }

    @Test
    void smallStrainNormalAtDiffersFromExactStretchBySquareOfStrain() {
        // Source: continuum kinematics (common practice): a fibre along n in a body deformed by
        // F = I + H stretches by |F n| - 1 exactly; small-strain theory keeps n . sym(H) n.
        // Here H = [[eps_x, gamma/2], [gamma/2, eps_y]], so the small-strain tensor is the state.
        double previous = Double.NaN;
        for (double scale : new double[] {4e-3, 2e-3, 1e-3, 5e-4}) {
            StrainState s = new StrainState(0.8 * scale, -0.3 * scale, 1.1 * scale);
            RealMatrix f = new Array2DRowRealMatrix(new double[][] {
                    {1 + s.epsX(), s.gammaXY() / 2}, {s.gammaXY() / 2, 1 + s.epsY()}});
            double worst = 0;
            for (int k = 0; k < 360; k++) {
                double theta = Math.toRadians(k * 0.5);
                RealVector n = new ArrayRealVector(new double[] {Math.cos(theta), Math.sin(theta)});
                double exact = f.operate(n).getNorm() - 1;
                worst = Math.max(worst, Math.abs(exact - s.normalAt(theta)));
            }
            assertTrue(worst < scale * scale, "error is of second order in the strain");
            if (!Double.isNaN(previous)) {
                double ratio = previous / worst;
                assertEquals(4.0, ratio, 0.1, "halving the strain quarters the error");
            }
            previous = worst;
        }
    }

    @Test
    void mohrCircleGeometry() {
        StrainState s = new StrainState(420 * UE, -135 * UE, 260 * UE);
        MohrCircle m = s.mohr();
        PrincipalStrains p = s.principal();
        // Definitions (the class comment of MohrCircle, after Gere & Goodno sec. 7.4, from memory):
        // x-face (eps_x, gamma/2), y-face (eps_y, -gamma/2), centre the mean, radius gamma_max / 2.
        assertEquals(s.epsX(), m.xNormal(), 0);
        assertEquals(s.gammaXY() / 2, m.xShear(), 0);
        assertEquals(s.epsY(), m.yNormal(), 0);
        assertEquals(-s.gammaXY() / 2, m.yShear(), 0);
        assertEquals((s.epsX() + s.epsY()) / 2, m.centre(), 1e-18);
        assertEquals(s.maxShear() / 2, m.radius(), 1e-18);
        assertEquals(p.eps1(), m.p1(), 1e-18);
        assertEquals(p.eps2(), m.p2(), 1e-18);
        assertEquals(2 * p.theta1(), m.twoThetaP(), 1e-15);
        // Both face points lie on the circle.
        assertEquals(m.radius(), Math.hypot(m.xNormal() - m.centre(), m.xShear()), 1e-18);
        assertEquals(m.radius(), Math.hypot(m.yNormal() - m.centre(), m.yShear()), 1e-18);
        // With the shear ordinate drawn downward, turning the x-face point by 2 theta_p
        // counter-clockwise about the centre lands on p1 (the plotting convention).
        double angleOfXFace = Math.atan2(-m.xShear(), m.xNormal() - m.centre());
        assertEquals(0, StrainAngles.differenceMod2Pi(angleOfXFace + m.twoThetaP(), 0), 1e-12);
    }

    @Test
    void rejectsComponentsThatAreNotNumbers() {
        StateException e = assertThrows(StateException.class, () -> new StrainState(Double.NaN, 0, 0));
        assertTrue(e.getMessage().contains("eps_x"), e.getMessage());
        assertThrows(StateException.class, () -> new StrainState(0, Double.POSITIVE_INFINITY, 0));
        assertThrows(StateException.class, () -> StrainState.ZERO.normalAt(Double.NaN));
    }

    @Test
    void superpositionOfStates() {
        // Common practice: small strains superpose component by component.
        StrainState a = new StrainState(412 * UE, -38 * UE, -121 * UE);
        StrainState b = new StrainState(-50 * UE, 220 * UE, 75 * UE);
        StrainState sum = a.plus(b.times(2));
        assertEquals(312 * UE, sum.epsX(), 1e-18);
        assertEquals(402 * UE, sum.epsY(), 1e-18);
        assertEquals(29 * UE, sum.gammaXY(), 1e-18);
        // Every direction's strain superposes too (the transformation is linear).
        assertEquals(a.normalAt(0.3) + 2 * b.normalAt(0.3), sum.normalAt(0.3), 1e-18);
    }
}
